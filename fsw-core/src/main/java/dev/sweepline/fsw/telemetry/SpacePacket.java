package dev.sweepline.fsw.telemetry;

import dev.sweepline.fsw.octets.BigEndian;
/**
 * CCSDS 133.0-B-2 §4.1.3 space-packet primary header codec (telemetry ICD §3.1), over a byte array:
 *
 * <pre>
 * octet 0-1: version(3)=000 | type(1) | sec-hdr flag(1) | APID(11)
 * octet 2-3: sequence flags(2) | sequence count(14)
 * octet 4-5: packet data length = octets of the packet data field - 1
 * </pre>
 */
public final class SpacePacket {
    /** Octets of the primary header. */
    public static final int PRIMARY_HEADER_LENGTH = 6;
    /** Packet type bit value of telemetry. */
    public static final int TYPE_TM = 0;
    /** Packet type bit value of telecommand. */
    public static final int TYPE_TC = 1;
    /** Sequence flags of an unsegmented packet. */
    public static final int UNSEGMENTED = 0b11;
    /** APID of idle packets. */
    public static final int IDLE_APID = 0x7FF;
    /** Largest APID (11 bits). */
    public static final int MAX_APID = 0x7FF;
    /** Sequence counts wrap at this modulus (14 bits). */
    public static final int SEQUENCE_MODULUS = 1 << 14;
    /** Smallest packet: the header and one data octet. */
    public static final int MIN_LENGTH = PRIMARY_HEADER_LENGTH + 1;

    private SpacePacket() {
    }

    /**
     * Writes a primary header at {@code offset}.
     *
     * @param dataFieldLength octets after the primary header (1..65536)
     */
    public static void writePrimaryHeader(byte[] buffer, int offset, int type, boolean secondaryHeader, int apid,
            int sequenceFlags, int sequenceCount, int dataFieldLength) {
        int word0 = (type & 1) << 12 | (secondaryHeader ? 1 << 11 : 0) | (apid & MAX_APID);
        int word1 = (sequenceFlags & 0b11) << 14 | (sequenceCount & (SEQUENCE_MODULUS - 1));
        int word2 = (dataFieldLength - 1) & 0xFFFF;
        BigEndian.put16(buffer, offset, word0);
        BigEndian.put16(buffer, offset + 2, word1);
        BigEndian.put16(buffer, offset + 4, word2);
    }

    /** APID of the header at {@code offset}. */
    public static int apid(byte[] buffer, int offset) {
        return BigEndian.get16(buffer, offset) & MAX_APID;
    }

    /** Total packet length (header included) of the header at {@code offset}. */
    public static int totalLength(byte[] buffer, int offset) {
        return PRIMARY_HEADER_LENGTH + 1 + BigEndian.get16(buffer, offset + 4);
    }
}
