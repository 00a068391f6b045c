package dev.sweepline.sim.serve;

/**
 * What the fault injector did to one direction of the stream, and what that must do to the receiver.
 *
 * <p>It sees the clean stream, so it knows each frame's span (octets up to and including its 0x00
 * delimiter). A frame is <b>intact</b> when no fault touched its octets, its own delimiter was not
 * destroyed, and the delimiter before it was not destroyed (else it merges with its neighbour);
 * a duplicated delimiter only adds an empty chunk. Every other frame is <b>damaged</b>. The receiver's
 * chunk count is then fixed exactly: one chunk per clean delimiter, plus each 0x00 the faults
 * created, minus each one they destroyed ({@link #expectedChunks()}).
 *
 * <p>Threading: written by the injector's thread.
 */
public final class FaultLedger {
    /** Octets of the clean stream. */
    public long octets;
    /** Frames of the clean stream (its delimiters). */
    public long frames;
    /** Frames no fault touched. */
    public long intactFrames;
    /** Frames a fault touched (or merged with a damaged neighbour). */
    public long damagedFrames;
    /** Bits flipped. */
    public long bitFlips;
    /** Octets dropped. */
    public long drops;
    /** Octets duplicated. */
    public long duplicates;
    /** Stalls. */
    public long stalls;
    /** 0x00 octets the faults put into the stream (data flipped to 0, a 0x00 duplicated). */
    public long zerosCreated;
    /** Delimiters the faults took out (dropped, or flipped to non-zero). */
    public long zerosDestroyed;

    /** Every fault injected: bit flips, drops, duplicates and stalls. */
    public long faults() {
        return bitFlips + drops + duplicates + stalls;
    }

    /** Chunks the receiver must see once everything sent has arrived. */
    public long expectedChunks() {
        return frames + zerosCreated - zerosDestroyed;
    }
}
