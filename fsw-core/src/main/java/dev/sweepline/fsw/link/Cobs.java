package dev.sweepline.fsw.link;

/**
 * Consistent Overhead Byte Stuffing (Cheshire and Baker, IEEE/ACM Trans. Networking 7(2), 1999):
 * removes every 0x00 from a message so that 0x00 can delimit frames on a byte stream. Overhead is
 * at most one octet per 254, plus one. Allocation-free: the caller provides the output array.
 */
public final class Cobs {
    /** The frame delimiter. */
    public static final byte DELIMITER = 0;
    /** Decoding failed: a code octet pointed beyond the input. */
    public static final int ERROR_TRUNCATED = -1;
    /** Decoding failed: a 0x00 inside the encoded data. */
    public static final int ERROR_ZERO_IN_DATA = -2;
    /** Decoding failed: the output array is too small. */
    public static final int ERROR_OUTPUT_TOO_SMALL = -3;

    private Cobs() {
    }

    /** Largest encoded length of {@code length} octets (without the delimiter). */
    public static int maxEncodedLength(int length) {
        return length + length / 254 + 1;
    }

    /**
     * Encodes {@code length} octets of {@code in} into {@code out} at {@code outOffset} (no delimiter).
     *
     * @return octets written
     */
    public static int encode(byte[] in, int offset, int length, byte[] out, int outOffset) {
        int codeAt = outOffset;
        int write = outOffset + 1;
        int code = 1;
        for (int i = offset, end = offset + length; i < end; i++) {
            byte b = in[i];
            if (b == 0) {
                out[codeAt] = (byte) code;
                codeAt = write++;
                code = 1;
            } else {
                out[write++] = b;
                code++;
                if (code == 0xFF) { // a full block of 254 non-zero octets: close it, no zero implied
                    out[codeAt] = (byte) code;
                    if (i + 1 == end) {
                        return write - outOffset; // the short form: no empty block after the last one
                    }
                    codeAt = write++;
                    code = 1;
                }
            }
        }
        out[codeAt] = (byte) code;
        return write - outOffset;
    }

    /**
     * Decodes {@code length} octets of COBS data (without the delimiter) into {@code out}.
     * Accepts both forms of a message ending in a full 254-octet block (with or without the final
     * {@code 01} code octet).
     *
     * @return octets decoded, or a negative {@code ERROR_*} status
     */
    public static int decode(byte[] in, int offset, int length, byte[] out, int outOffset) {
        int read = offset;
        int end = offset + length;
        int write = outOffset;
        while (read < end) {
            int code = in[read++] & 0xFF;
            if (code == 0) {
                return ERROR_ZERO_IN_DATA;
            }
            if (read + code - 1 > end) {
                return ERROR_TRUNCATED;
            }
            if (write + code - 1 > out.length) {
                return ERROR_OUTPUT_TOO_SMALL;
            }
            for (int i = 1; i < code; i++) {
                byte b = in[read++];
                if (b == 0) {
                    return ERROR_ZERO_IN_DATA;
                }
                out[write++] = b;
            }
            if (code != 0xFF && read < end) { // the implied zero, except after the last block
                if (write >= out.length) {
                    return ERROR_OUTPUT_TOO_SMALL;
                }
                out[write++] = 0;
            }
        }
        return write - outOffset;
    }
}
