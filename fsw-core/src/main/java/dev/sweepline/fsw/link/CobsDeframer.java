package dev.sweepline.fsw.link;

import dev.sweepline.fsw.octets.Crc16;

/**
 * Streaming receiver of wire frames (hardware ICD §2, §5): fed one octet at a time, in whatever
 * chunks the transport delivers, it COBS-decodes on the fly, and at each 0x00 delimiter checks the
 * block structure, the length and the CRC-16 of the frame that ends there.
 *
 * <p>Every delimiter ends exactly one chunk, and every chunk gets exactly one result: {@link #FRAME},
 * {@link #EMPTY} (two delimiters in a row: ignored, as senders may flush with an extra 0x00),
 * {@link #BAD_COBS}, {@link #BAD_LENGTH} or {@link #BAD_CRC}. An over-long chunk stops being stored
 * at once and is reported at its delimiter, so the receiver resynchronises there. Accepts both forms
 * of a chunk ending in a full 254-octet block (standards.md, COBS). Allocation-free.
 *
 * <p>Threading: one thread.
 */
public final class CobsDeframer {
    /** No delimiter yet: keep feeding. */
    public static final int MORE = 0;
    /** A frame with a good CRC ended: its payload (CRC removed) is in {@link #payload()}. */
    public static final int FRAME = 1;
    /** An empty chunk (two delimiters in a row): ignore it. */
    public static final int EMPTY = 2;
    /** A block ran into the delimiter (a code octet pointed past the chunk's end). */
    public static final int BAD_COBS = 3;
    /** Decoded length too long for the largest payload, or too short to hold a type and the CRC. */
    public static final int BAD_LENGTH = 4;
    /** CRC-16 mismatch. */
    public static final int BAD_CRC = 5;

    private final byte[] decoded;
    private final int maxDecoded;
    private int length;
    private int remaining;
    private boolean zeroPending;
    private boolean overflow;
    private int chunkOctets;
    private int payloadLength;
    private int lastDecodedLength;

    /** A deframer for payloads up to {@code maxPayload} octets. */
    public CobsDeframer(int maxPayload) {
        this.maxDecoded = maxPayload + FrameEncoder.CRC_OCTETS;
        this.decoded = new byte[maxDecoded];
    }

    /** A deframer for the hardware ICD's largest payload. */
    public CobsDeframer() {
        this(FrameEncoder.MAX_PAYLOAD);
    }

    /** Feeds one octet; returns {@link #MORE} or, at a delimiter, the result of the chunk it ends. */
    public int accept(byte octet) {
        if (octet == Cobs.DELIMITER) {
            int result = finish();
            reset();
            return result;
        }
        chunkOctets++;
        if (remaining == 0) { // a code octet: the previous block's implied zero is due only now
            if (zeroPending) {
                store((byte) 0);
            }
            int code = octet & 0xFF;
            remaining = code - 1;
            zeroPending = code != 0xFF;
        } else {
            store(octet);
            remaining--;
        }
        return MORE;
    }

    private void store(byte b) {
        if (length < maxDecoded) {
            decoded[length++] = b;
        } else {
            overflow = true;
        }
    }

    private int finish() {
        if (chunkOctets == 0) {
            return EMPTY;
        }
        if (remaining != 0) {
            return BAD_COBS;
        }
        if (overflow || length < 1 + FrameEncoder.CRC_OCTETS) {
            return BAD_LENGTH;
        }
        // CRC-16/IBM-3740 over payload and its big-endian CRC leaves residue 0 (standards.md, CRC)
        return Crc16.of(decoded, 0, length) == 0 ? FRAME : BAD_CRC;
    }

    private void reset() {
        chunkOctets = 0;
        remaining = 0;
        zeroPending = false;
        overflow = false;
        lastDecodedLength = length;
        payloadLength = Math.max(0, length - FrameEncoder.CRC_OCTETS);
        length = 0;
    }

    /** The last good frame's payload (valid until the next octet is fed). */
    public byte[] payload() {
        return decoded;
    }

    /** Length of the last good frame's payload, octets (CRC removed). */
    public int payloadLength() {
        return payloadLength;
    }

    /** Octets the last chunk decoded to, CRC included, whatever its result (for tests of the COBS layer). */
    int lastDecodedLength() {
        return lastDecodedLength;
    }
}
