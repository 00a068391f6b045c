package dev.sweepline.fsw.command;

import dev.sweepline.fsw.octets.BigEndian;
/**
 * The telecommand packet (commands.md §1), a CCSDS 133.0-B-2 space packet of type TC: offsets and
 * readers over a byte array. Big-endian.
 *
 * <pre>
 *  0      6 primary header: version 000, type 1 (TC), sec hdr 1, APID 0x1C0, seq flags 11, count, length
 *  6      4 authentication sequence number (unsigned 32 bits)
 * 10      1 command code
 * 11      a arguments (a from the code, commands.md §2)
 * 11+a   16 HMAC-SHA256 over octets 0 .. 10+a, truncated to its first 16 octets
 * </pre>
 */
public final class Telecommand {
    /** APID of the instrument's telecommands (commands.md §1). */
    public static final int APID = 0x1C0;
    /** Octets of the primary header. */
    public static final int PRIMARY_HEADER = 6;
    /** Offset of the authentication sequence number. */
    public static final int SEQUENCE_AT = 6;
    /** Offset of the command code. */
    public static final int CODE_AT = 10;
    /** Offset of the arguments. */
    public static final int ARGUMENTS_AT = 11;
    /** Octets of the truncated MAC (RFC 4868 truncation of HMAC-SHA-256 to 128 bits). */
    public static final int MAC_OCTETS = 16;
    /** Shortest telecommand: no arguments. */
    public static final int MIN_OCTETS = ARGUMENTS_AT + MAC_OCTETS;
    /** Longest telecommand: a full table load. */
    public static final int MAX_OCTETS = MIN_OCTETS + CommandCode.LOAD_HEADER_OCTETS + CommandCode.MAX_LOAD_OCTETS;

    private Telecommand() {
    }

    /** Unsigned 16-bit field. */
    static int u16(byte[] b, int i) {
        return BigEndian.get16(b, i);
    }

    /** Unsigned 32-bit field. */
    static long u32(byte[] b, int i) {
        return BigEndian.getUnsigned32(b, i);
    }

    /**
     * Checks the primary header of a packet of {@code length} octets at {@code off}.
     *
     * @return {@link CommandReason#OK}, {@link CommandReason#PACKET_LENGTH} or {@link CommandReason#BAD_HEADER}
     */
    public static int checkHeader(byte[] b, int off, int length) {
        if (length < MIN_OCTETS || length > MAX_OCTETS) {
            return CommandReason.PACKET_LENGTH;
        }
        if (u16(b, off + 4) + 1 != length - PRIMARY_HEADER) {
            return CommandReason.PACKET_LENGTH;
        }
        int word = u16(b, off);
        boolean ok = (word >>> 13) == 0 // version 000
            && ((word >>> 12) & 1) == 1 // type TC
            && ((word >>> 11) & 1) == 1 // secondary header present
            && (word & 0x7FF) == APID
            && (u16(b, off + 2) >>> 14) == 3; // unsegmented
        return ok ? CommandReason.OK : CommandReason.BAD_HEADER;
    }

    /** The packet sequence count (14 bits) of the primary header. */
    public static int packetSequence(byte[] b, int off) {
        return u16(b, off + 2) & 0x3FFF;
    }

    /** The authentication sequence number. */
    public static long authSequence(byte[] b, int off) {
        return u32(b, off + SEQUENCE_AT);
    }

    /** Octets of arguments in a packet of {@code length} octets. */
    public static int argumentOctets(int length) {
        return length - MIN_OCTETS;
    }

    /**
     * Writes a telecommand's header, code and arguments (the MAC is left to the signer); a ground
     * or bench helper, not used by the flight path.
     *
     * @return the packet length including the MAC
     */
    public static int writeUnsigned(byte[] b, int off, int packetSequence, long authSequence, int code,
                                    byte[] args, int argOff, int argOctets) {
        int length = MIN_OCTETS + argOctets;
        int dataLength = length - PRIMARY_HEADER - 1;
        b[off] = (byte) (0x18 | (APID >>> 8));
        b[off + 1] = (byte) APID;
        b[off + 2] = (byte) (0xC0 | ((packetSequence >>> 8) & 0x3F));
        b[off + 3] = (byte) packetSequence;
        BigEndian.put16(b, off + 4, dataLength);
        BigEndian.put32(b, off + 6, authSequence);
        b[off + CODE_AT] = (byte) code;
        System.arraycopy(args, argOff, b, off + ARGUMENTS_AT, argOctets);
        return length;
    }
}
