package dev.sweepline.fsw.link;

import dev.sweepline.fsw.octets.BigEndian;
import dev.sweepline.fsw.octets.Crc16;

/**
 * Builds one wire frame (hardware ICD §2): {@code COBS(payload | CRC-16) | 0x00}, the CRC-16/IBM-3740
 * of the payload appended big-endian. Allocation-free after construction.
 *
 * <p>Threading: one thread (it owns a scratch buffer).
 */
public final class FrameEncoder {
    /** Largest payload, octets (hardware ICD §2). */
    public static final int MAX_PAYLOAD = 64;
    /** CRC octets after the payload. */
    public static final int CRC_OCTETS = 2;
    /** Largest wire frame, octets: COBS of the largest payload with its CRC, plus the delimiter. */
    public static final int MAX_WIRE_FRAME = Cobs.maxEncodedLength(MAX_PAYLOAD + CRC_OCTETS) + 1;

    private final byte[] scratch = new byte[MAX_PAYLOAD + CRC_OCTETS];

    /** Wire length of a frame carrying {@code payloadLength} octets with no 0x00 to stuff beyond one code octet per 254. */
    public static int wireLength(int payloadLength) {
        return Cobs.maxEncodedLength(payloadLength + CRC_OCTETS) + 1;
    }

    /**
     * Frames {@code length} octets of {@code payload} into {@code out} at {@code outOffset}.
     *
     * @return octets written (delimiter included)
     * @throws IllegalArgumentException when the payload exceeds {@link #MAX_PAYLOAD} (programmer misuse)
     */
    public int encode(byte[] payload, int offset, int length, byte[] out, int outOffset) {
        if (length > MAX_PAYLOAD) {
            throw new IllegalArgumentException("payload over " + MAX_PAYLOAD + " octets");
        }
        System.arraycopy(payload, offset, scratch, 0, length);
        BigEndian.put16(scratch, length, Crc16.of(payload, offset, length));
        int n = Cobs.encode(scratch, 0, length + CRC_OCTETS, out, outOffset);
        out[outOffset + n] = Cobs.DELIMITER;
        return n + 1;
    }
}
