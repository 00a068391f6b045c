package dev.sweepline.fsw.octets;

/**
 * CRC-16/IBM-3740 (also known as CCITT-FALSE): polynomial 0x1021, initial value 0xFFFF, no
 * reflection, no final xor. The frame error control field of CCSDS 132.0-B-3 §4.1.6.
 * Table-driven, allocation-free; the table is built once at class load.
 */
public final class Crc16 {
    /** Initial register value. */
    public static final int INITIAL = 0xFFFF;
    private static final int POLYNOMIAL = 0x1021;
    private static final int[] TABLE = new int[256];

    static {
        for (int i = 0; i < 256; i++) {
            int crc = i << 8;
            for (int bit = 0; bit < 8; bit++) {
                crc = (crc & 0x8000) != 0 ? (crc << 1) ^ POLYNOMIAL : crc << 1;
            }
            TABLE[i] = crc & 0xFFFF;
        }
    }

    private Crc16() {
    }

    /** Continues {@code crc} over {@code length} octets of {@code data} from {@code offset}. */
    public static int update(int crc, byte[] data, int offset, int length) {
        int c = crc;
        for (int i = offset, end = offset + length; i < end; i++) {
            c = ((c << 8) ^ TABLE[((c >>> 8) ^ data[i]) & 0xFF]) & 0xFFFF;
        }
        return c;
    }

    /** The CRC of {@code length} octets of {@code data} from {@code offset}. */
    public static int of(byte[] data, int offset, int length) {
        return update(INITIAL, data, offset, length);
    }
}
