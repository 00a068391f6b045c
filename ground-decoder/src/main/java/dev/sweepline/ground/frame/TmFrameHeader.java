package dev.sweepline.ground.frame;

/**
 * Reader of the TM transfer frame primary header (CCSDS 132.0-B-3 §4.1.2, ICD §2), a flyweight of
 * static accessors over a byte array holding the frame at {@code off}:
 *
 * <pre>
 *  0                   1                   2                   3
 *  0 1 2 3 4 5 6 7 8 9 0 1 2 3 4 5 6 7 8 9 0 1 2 3 4 5 6 7 8 9 0 1
 * +---+-------------------+-----+-+---------------+---------------+
 * |TFV|       SCID        | VCID|O|  MC count     |  VC count     |
 * +-+-+-+---+-------------+-----+-+---------------+---------------+
 * |S|Y|O|SLI|  first header pointer (11)  |
 * +-+-+-+---+-----------------------------+
 * </pre>
 */
public final class TmFrameHeader {
    /** Offset of the MC frame count octet. */
    public static final int MC_COUNT_OFFSET = 2;
    /** Offset of the VC frame count octet. */
    public static final int VC_COUNT_OFFSET = 3;
    /** Offset of the 16-bit data field status. */
    public static final int DATA_FIELD_STATUS_OFFSET = 4;

    private TmFrameHeader() {
    }

    private static int id(byte[] b, int off) {
        return BigEndian.u16(b, off);
    }

    private static int status(byte[] b, int off) {
        return BigEndian.u16(b, off + DATA_FIELD_STATUS_OFFSET);
    }

    /** Transfer frame version number (2 bits); 0 for a TM frame. */
    public static int version(byte[] b, int off) {
        return id(b, off) >>> 14;
    }

    /** Spacecraft id (10 bits). */
    public static int scid(byte[] b, int off) {
        return (id(b, off) >>> 4) & 0x3FF;
    }

    /** Virtual channel id (3 bits). */
    public static int vcid(byte[] b, int off) {
        return (id(b, off) >>> 1) & 0x7;
    }

    /** Operational control field flag. */
    public static boolean ocfFlag(byte[] b, int off) {
        return (id(b, off) & 1) != 0;
    }

    /** Master channel frame count (8 bits). */
    public static int mcCount(byte[] b, int off) {
        return b[off + MC_COUNT_OFFSET] & 0xFF;
    }

    /** Virtual channel frame count (8 bits). */
    public static int vcCount(byte[] b, int off) {
        return b[off + VC_COUNT_OFFSET] & 0xFF;
    }

    /** Transfer frame secondary header flag. */
    public static boolean secondaryHeaderFlag(byte[] b, int off) {
        return (status(b, off) & 0x8000) != 0;
    }

    /** Synchronisation flag (0: packets in the data field). */
    public static boolean syncFlag(byte[] b, int off) {
        return (status(b, off) & 0x4000) != 0;
    }

    /** Packet order flag. */
    public static boolean packetOrderFlag(byte[] b, int off) {
        return (status(b, off) & 0x2000) != 0;
    }

    /** Segment length identifier (2 bits); 3 when the sync flag is 0. */
    public static int segmentLengthId(byte[] b, int off) {
        return (status(b, off) >>> 11) & 0x3;
    }

    /** First header pointer (11 bits). */
    public static int firstHeaderPointer(byte[] b, int off) {
        return status(b, off) & 0x7FF;
    }

    /** True when the data field status is what the ICD §2 allows: S=0, Y=0, O=0, SLI=11. */
    public static boolean dataFieldStatusValid(byte[] b, int off) {
        return (status(b, off) & 0xF800) == 0x1800;
    }
}
