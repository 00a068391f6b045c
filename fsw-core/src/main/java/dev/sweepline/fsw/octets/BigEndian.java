package dev.sweepline.fsw.octets;

/**
 * Big-endian (most significant octet first) field access for every codec of the flight software:
 * the hardware ICD's link messages, the telemetry ICD's packets and frames, the parameter table
 * images and the non-volatile records. Static, allocation-free; values are truncated to the field
 * width on write and read back unsigned.
 */
public final class BigEndian {
    private BigEndian() {
    }

    /** Writes the low 16 bits of {@code v} at {@code p}; returns {@code p + 2}. */
    public static int put16(byte[] b, int p, int v) {
        b[p] = (byte) (v >>> 8);
        b[p + 1] = (byte) v;
        return p + 2;
    }

    /** Writes the low 24 bits of {@code v} at {@code p}; returns {@code p + 3}. */
    public static int put24(byte[] b, int p, int v) {
        b[p] = (byte) (v >>> 16);
        b[p + 1] = (byte) (v >>> 8);
        b[p + 2] = (byte) v;
        return p + 3;
    }

    /** Writes the low 32 bits of {@code v} at {@code p}; returns {@code p + 4}. */
    public static int put32(byte[] b, int p, long v) {
        b[p] = (byte) (v >>> 24);
        b[p + 1] = (byte) (v >>> 16);
        b[p + 2] = (byte) (v >>> 8);
        b[p + 3] = (byte) v;
        return p + 4;
    }

    /**
     * Writes the low {@code 8 * octets} bits of {@code v} at {@code p}, {@code octets} = 1..4 (a sample
     * of the instrument's width); returns {@code p + octets}.
     */
    public static int putN(byte[] b, int p, int v, int octets) {
        for (int k = octets - 1; k >= 0; k--) {
            b[p + octets - 1 - k] = (byte) (v >>> (8 * k));
        }
        return p + octets;
    }

    /** The unsigned 16-bit field at {@code p}. */
    public static int get16(byte[] b, int p) {
        return ((b[p] & 0xFF) << 8) | (b[p + 1] & 0xFF);
    }

    /** The unsigned 24-bit field at {@code p}. */
    public static int get24(byte[] b, int p) {
        return ((b[p] & 0xFF) << 16) | ((b[p + 1] & 0xFF) << 8) | (b[p + 2] & 0xFF);
    }

    /** The 32-bit field at {@code p} as an int (two's complement). */
    public static int get32(byte[] b, int p) {
        return ((b[p] & 0xFF) << 24) | ((b[p + 1] & 0xFF) << 16) | ((b[p + 2] & 0xFF) << 8) | (b[p + 3] & 0xFF);
    }

    /** The unsigned 32-bit field at {@code p}. */
    public static long getUnsigned32(byte[] b, int p) {
        return get32(b, p) & 0xFFFF_FFFFL;
    }

    /** The unsigned field of {@code octets} = 1..4 octets at {@code p} (4 octets: the low 32 bits, as an int). */
    public static int getN(byte[] b, int p, int octets) {
        int v = 0;
        for (int k = 0; k < octets; k++) {
            v = (v << 8) | (b[p + k] & 0xFF);
        }
        return v;
    }
}
