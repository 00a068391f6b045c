package dev.sweepline.ground.frame;

/**
 * Unsigned big-endian fields of 1 to 4 octets, most significant octet first, as every layer of the
 * telemetry ICD writes them (frame headers, packet headers, CUC time, packet user data, table images).
 * The caller has checked that the octets are there. Stateless.
 */
public final class BigEndian {
    private BigEndian() {
    }

    /** The unsigned 16-bit field at {@code at}. */
    public static int u16(byte[] b, int at) {
        return ((b[at] & 0xFF) << 8) | (b[at + 1] & 0xFF);
    }

    /** The unsigned 32-bit field at {@code at}. */
    public static long u32(byte[] b, int at) {
        return ((long) u16(b, at) << 16) | u16(b, at + 2);
    }

    /** The unsigned field of {@code octets} (1..3) octets at {@code at}. */
    public static int unsigned(byte[] b, int at, int octets) {
        int v = 0;
        for (int i = 0; i < octets; i++) {
            v = (v << 8) | (b[at + i] & 0xFF);
        }
        return v;
    }
}
