package dev.sweepline.ground.packet;

import dev.sweepline.ground.frame.BigEndian;

/**
 * Reader of the space packet primary header (CCSDS 133.0-B-2 §4.1.3, ICD §3.1), static accessors over
 * a byte array holding the packet at {@code off}:
 *
 * <pre>
 *  0                   1                   2                   3                   4
 *  0 1 2 3 4 5 6 7 8 9 0 1 2 3 4 5 6 7 8 9 0 1 2 3 4 5 6 7 8 9 0 1 2 3 4 5 6 7 8 9 0 1 2 3 4 5 6 7
 * +-----+-+-+---------------------+---+---------------------------+-------------------------------+
 * | ver |T|S|       APID (11)     |SF |   sequence count (14)     |   data length (16)            |
 * +-----+-+-+---------------------+---+---------------------------+-------------------------------+
 * </pre>
 */
public final class SpacePacketHeader {
    /** Primary header length, octets (CCSDS 133.0-B-2 §4.1.3). */
    public static final int OCTETS = 6;
    /** Idle packet APID (CCSDS 133.0-B-2 §4.1.3.3.4.4, ICD §3.3). */
    public static final int IDLE_APID = 0x7FF;
    /** Sequence count modulus: 14 bits (CCSDS 133.0-B-2 §4.1.3.4.3). */
    public static final int SEQUENCE_COUNT_MODULUS = 1 << 14;
    /** Sequence flags value of an unsegmented packet, binary 11 (CCSDS 133.0-B-2 §4.1.3.4.2). */
    public static final int UNSEGMENTED = 3;
    /** Longest packet: 6 header octets + 65536 data octets (CCSDS 133.0-B-2 §4.1.3.5). */
    public static final int MAX_PACKET_OCTETS = OCTETS + 65536;

    private SpacePacketHeader() {
    }

    private static int word(byte[] b, int off) {
        return BigEndian.u16(b, off);
    }

    /** Packet version number (3 bits); 0 for version 1. */
    public static int version(byte[] b, int off) {
        return (b[off] & 0xFF) >>> 5;
    }

    /** Packet type: 0 telemetry, 1 telecommand. */
    public static int type(byte[] b, int off) {
        return (b[off] >>> 4) & 1;
    }

    /** Secondary header flag. */
    public static boolean secondaryHeaderFlag(byte[] b, int off) {
        return (b[off] & 0x08) != 0;
    }

    /** Application process id (11 bits). */
    public static int apid(byte[] b, int off) {
        return word(b, off) & 0x7FF;
    }

    /** Sequence flags (2 bits). */
    public static int sequenceFlags(byte[] b, int off) {
        return word(b, off + 2) >>> 14;
    }

    /** Packet sequence count (14 bits). */
    public static int sequenceCount(byte[] b, int off) {
        return word(b, off + 2) & 0x3FFF;
    }

    /** The data length field: data field octets − 1. */
    public static int dataLengthField(byte[] b, int off) {
        return word(b, off + 4);
    }

    /** Whole packet length in octets: header + data field. */
    public static int totalOctets(byte[] b, int off) {
        return OCTETS + dataLengthField(b, off) + 1;
    }

    /** True for a version-1 telemetry packet header, the only kind the ICD §3.1 allows. */
    public static boolean isTelemetryVersion1(byte[] b, int off) {
        return (b[off] & 0xF0) == 0;
    }
}
