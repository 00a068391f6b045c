package dev.sweepline.ground.frame;

/**
 * CRC-16/IBM-3740 (alias CCITT-FALSE): poly 0x1021, init 0xFFFF, no reflection, xorout 0
 * (Cook, <i>Catalogue of parametrised CRC algorithms</i>). The TM frame error control field of
 * CCSDS 132.0-B-3 §4.1.6, as the telemetry ICD §1 requires.
 *
 * <p>Written here from the catalogue parameters, table driven (one 256-entry table, MSB first).
 * Stateless and thread-safe.
 */
public final class Crc16Ibm3740 {
    /** Initial register value (catalogue: init 0xFFFF). */
    public static final int INIT = 0xFFFF;
    /** Generator polynomial x^16 + x^12 + x^5 + 1 (catalogue: poly 0x1021). */
    public static final int POLY = 0x1021;

    private static final char[] TABLE = buildTable();

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
        for (int i = off; i < end; i++) {
            c = ((c << 8) & 0xFFFF) ^ TABLE[((c >>> 8) ^ buf[i]) & 0xFF];
        }
        return c;
    }

    /** Continues a CRC over one octet. */
    public static int update(int crc, int octet) {
        return ((crc << 8) & 0xFFFF) ^ TABLE[((crc >>> 8) ^ octet) & 0xFF];
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
