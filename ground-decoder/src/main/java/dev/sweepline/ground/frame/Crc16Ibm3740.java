package dev.sweepline.ground.frame;

/**
 * CRC-16/IBM-3740 (alias CCITT-FALSE): poly 0x1021, init 0xFFFF, no reflection, xorout 0
 * (Cook, <i>Catalogue of parametrised CRC algorithms</i>). The TM frame error control field of
 * CCSDS 132.0-B-3 §4.1.6, as the telemetry ICD §1 requires.
 *
 * <p>Written here from the catalogue parameters, table driven MSB first, eight octets (one 8-octet load) at a time
 * ("slice-by-8": table k gives the register after an octet followed by k zero octets, so the eight
 * lookups of one step are independent). Stateless and thread-safe.
 */
public final class Crc16Ibm3740 {
    /** Initial register value (catalogue: init 0xFFFF). */
    public static final int INIT = 0xFFFF;
    /** Generator polynomial x^16 + x^12 + x^5 + 1 (catalogue: poly 0x1021). */
    public static final int POLY = 0x1021;

    private static final char[] TABLE = buildTable();
    /** Eight octets read as one big-endian long. */
    private static final java.lang.invoke.VarHandle LONG_BE = java.lang.invoke.MethodHandles
            .byteArrayViewVarHandle(long[].class, java.nio.ByteOrder.BIG_ENDIAN);
    /** SLICES[k][v]: the register after octet v then k zero octets, from 0; SLICES[0] is {@link #TABLE}. */
    private static final char[][] SLICES = buildSlices();

    private Crc16Ibm3740() {
    }

    /** CRC of {@code len} octets of {@code buf} from {@code off}, starting from {@link #INIT}. */
    public static int compute(byte[] buf, int off, int len) {
        return update(INIT, buf, off, len);
    }

    /**
     * Continues a CRC over more octets. Running it over a frame including its FECF gives 0
     * (the residue of a non-reflected CRC with xorout 0), which the synchroniser uses.
     */
    public static int update(int crc, byte[] buf, int off, int len) {
        int c = crc & 0xFFFF;
        final int end = off + len;
        int i = off;
        final char[] t0 = SLICES[0];
        final char[] t1 = SLICES[1];
        final char[] t2 = SLICES[2];
        final char[] t3 = SLICES[3];
        final char[] t4 = SLICES[4];
        final char[] t5 = SLICES[5];
        final char[] t6 = SLICES[6];
        final char[] t7 = SLICES[7];
        for (; end - i >= 8; i += 8) {
            // the eight octets in one big-endian load; the register is XORed into the first two octets
            // (the CRC is linear in the octets)
            long v = (long) LONG_BE.get(buf, i);
            c = t7[(int) ((c >>> 8) ^ (v >>> 56)) & 0xFF] ^ t6[(int) (c ^ (v >>> 48)) & 0xFF]
                    ^ t5[(int) (v >>> 40) & 0xFF] ^ t4[(int) (v >>> 32) & 0xFF] ^ t3[(int) (v >>> 24) & 0xFF]
                    ^ t2[(int) (v >>> 16) & 0xFF] ^ t1[(int) (v >>> 8) & 0xFF] ^ t0[(int) v & 0xFF];
        }
        for (; i < end; i++) {
            c = ((c << 8) & 0xFFFF) ^ TABLE[((c >>> 8) ^ buf[i]) & 0xFF];
        }
        return c;
    }

    /** Continues a CRC over one octet. */
    public static int update(int crc, int octet) {
        return ((crc << 8) & 0xFFFF) ^ TABLE[((crc >>> 8) ^ octet) & 0xFF];
    }

    private static char[][] buildSlices() {
        char[][] t = new char[8][];
        t[0] = TABLE;
        for (int k = 1; k < 8; k++) {
            t[k] = new char[256];
            for (int v = 0; v < 256; v++) {
                int r = t[k - 1][v];
                t[k][v] = (char) (((r << 8) & 0xFFFF) ^ TABLE[r >>> 8]);
            }
        }
        return t;
    }

    private static char[] buildTable() {
        char[] t = new char[256];
        for (int i = 0; i < 256; i++) {
            int r = i << 8;
            for (int b = 0; b < 8; b++) {
                r = (r & 0x8000) != 0 ? (r << 1) ^ POLY : r << 1;
            }
            t[i] = (char) (r & 0xFFFF);
        }
        return t;
    }
}
