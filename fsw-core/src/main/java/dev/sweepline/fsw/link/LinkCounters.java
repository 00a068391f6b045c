package dev.sweepline.fsw.link;

/**
 * What one side's receiver and sender saw (hardware ICD §5). Every chunk (octets up to a delimiter)
 * lands in exactly one of: good, empty, or one bad reason, so
 * {@code chunks() == framesGood + emptyChunks + framesBad()} always holds.
 *
 * <p>Threading: written by the link's thread; other threads may read stale values.
 */
public final class LinkCounters {
    /** Frames with a good CRC, a known type and that type's length. */
    public long framesGood;
    /** Chunks whose COBS blocks ran into the delimiter. */
    public long badCobs;
    /** Chunks too long for the largest payload, or too short for a type and the CRC. */
    public long badLength;
    /** Chunks with a CRC mismatch. */
    public long badCrc;
    /** Good-CRC frames of a type the ICD does not define. */
    public long unknownType;
    /** Good-CRC frames whose length is not their type's. */
    public long wrongLength;
    /** Empty chunks (delimiter after delimiter), ignored. */
    public long emptyChunks;
    /** Good frames of a type this side does not expect (counted within {@link #framesGood}). */
    public long unexpected;
    /** Frames written. */
    public long framesSent;
    /** Octets read from the transport. */
    public long octetsRead;
    /** Octets written to the transport. */
    public long octetsWritten;

    /** All discarded chunks: the ICD's "frames received bad". */
    public long framesBad() {
        return badCobs + badLength + badCrc + unknownType + wrongLength;
    }

    /** Chunks seen: one per delimiter received. */
    public long chunks() {
        return framesGood + emptyChunks + framesBad();
    }
}
