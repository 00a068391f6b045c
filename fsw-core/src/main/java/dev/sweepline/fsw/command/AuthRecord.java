package dev.sweepline.fsw.command;

import dev.sweepline.fsw.octets.BigEndian;
import dev.sweepline.fsw.octets.Crc16;

/**
 * The anti-replay record kept in non-volatile memory (commands.md §1.3), 10 octets, big-endian:
 *
 * <pre>
 *   0  2  marker 0x5341 ("SA")
 *   2  1  format version 1
 *   3  1  reserved, 0
 *   4  4  last accepted authentication sequence number (0: none yet)
 *   8  2  CRC-16/IBM-3740 over octets 0..7
 * </pre>
 *
 * Allocation-free; decoding never throws on bad bytes.
 */
public final class AuthRecord {
    /** Octets of the record. */
    public static final int OCTETS = 10;
    /** Marker "SA". */
    public static final int MARKER = 0x5341;
    /** Format version. */
    public static final int VERSION = 1;
    /** {@link #decode} result: the record is not intact. */
    public static final long CORRUPT = -1;

    private AuthRecord() {
    }

    /** Writes the record of {@code lastAccepted} into {@code b}; returns {@link #OCTETS}. */
    public static int encode(long lastAccepted, byte[] b) {
        BigEndian.put16(b, 0, MARKER);
        b[2] = VERSION;
        b[3] = 0;
        BigEndian.put32(b, 4, lastAccepted);
        BigEndian.put16(b, 8, Crc16.of(b, 0, OCTETS - 2));
        return OCTETS;
    }

    /** The last accepted sequence of a record of {@code length} octets, or {@link #CORRUPT}. */
    public static long decode(byte[] b, int length) {
        if (length != OCTETS || b.length < OCTETS || Telecommand.u16(b, 0) != MARKER || (b[2] & 0xFF) != VERSION
            || Crc16.of(b, 0, OCTETS - 2) != Telecommand.u16(b, OCTETS - 2)) {
            return CORRUPT;
        }
        return Telecommand.u32(b, 4);
    }
}
