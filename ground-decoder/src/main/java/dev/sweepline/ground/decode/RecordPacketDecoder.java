package dev.sweepline.ground.decode;

import static dev.sweepline.ground.frame.BigEndian.u16;
import static dev.sweepline.ground.frame.BigEndian.u32;

import dev.sweepline.ground.packet.CucTime;
import dev.sweepline.ground.packet.SpacePacketHeader;

/**
 * Decodes housekeeping (ICD §5), event (ICD §6) and command report (ICD §9) packets. A packet without
 * the secondary header or of the wrong length gives null; the caller counts it. Housekeeping of the
 * issue-3 baseline (26 octets, before the command and fault fields) and of 38 octets (before the link
 * bad-frame count) is still read, the missing fields 0.
 * Stateless.
 */
public final class RecordPacketDecoder {
    private static final int USER_DATA_OFFSET = SpacePacketHeader.OCTETS + CucTime.OCTETS;

    private RecordPacketDecoder() {
    }

    private static boolean shaped(byte[] b, int off, int len, int userOctets) {
        return len == USER_DATA_OFFSET + userOctets && SpacePacketHeader.secondaryHeaderFlag(b, off);
    }

    /** The housekeeping packet of {@code len} octets at {@code off}, or null when malformed. */
    public static HousekeepingReport housekeeping(byte[] b, int off, int len) {
        boolean full = shaped(b, off, len, HousekeepingReport.USER_DATA_OCTETS);
        boolean extended = full || shaped(b, off, len, HousekeepingReport.COMMAND_USER_DATA_OCTETS);
        if (!extended && !shaped(b, off, len, HousekeepingReport.BASELINE_USER_DATA_OCTETS)) {
            return null;
        }
        int u = off + USER_DATA_OFFSET;
        return new HousekeepingReport(CucTime.read(b, off + SpacePacketHeader.OCTETS),
                SpacePacketHeader.sequenceCount(b, off), b[u] & 0xFF, b[u + 1] != 0, u32(b, u + 2), u32(b, u + 6),
                u16(b, u + 10), u16(b, u + 12), u16(b, u + 14), u16(b, u + 16), u16(b, u + 18), u16(b, u + 20),
                u32(b, u + 22), extended ? u16(b, u + 26) : 0, extended ? u16(b, u + 28) : 0,
                extended ? u16(b, u + 30) : 0, extended ? b[u + 32] & 0xFF : 0, extended ? b[u + 33] & 0xFF : 0,
                extended ? u16(b, u + 34) : 0, extended ? u16(b, u + 36) : 0, full ? u16(b, u + 38) : 0);
    }

    /** The event packet of {@code len} octets at {@code off}, or null when malformed. */
    public static EventReport event(byte[] b, int off, int len) {
        if (!shaped(b, off, len, EventReport.USER_DATA_OCTETS)) {
            return null;
        }
        int u = off + USER_DATA_OFFSET;
        return new EventReport(CucTime.read(b, off + SpacePacketHeader.OCTETS), SpacePacketHeader.sequenceCount(b, off),
                u16(b, u), b[u + 2] & 0xFF, b[u + 3] & 0xFF, u16(b, u + 4));
    }

    /** The command report of {@code len} octets at {@code off}, or null when malformed. */
    public static CommandReport commandReport(byte[] b, int off, int len) {
        if (len < USER_DATA_OFFSET + CommandReport.USER_DATA_OCTETS || !SpacePacketHeader.secondaryHeaderFlag(b, off)) {
            return null;
        }
        int u = off + USER_DATA_OFFSET;
        int extra = len - USER_DATA_OFFSET - CommandReport.USER_DATA_OCTETS;
        int type = b[u] & 0xFF;
        int code = b[u + 1] & 0xFF;
        int status = b[u + 8] & 0xFF;
        int copy = -1;
        int dumpOffset = 0;
        byte[] data = new byte[0];
        boolean dump = type == CommandReport.EXECUTION && code == CommandReport.TABLE_DUMP && status == 0;
        if (dump) {
            int d = u + CommandReport.USER_DATA_OCTETS;
            if (extra < 5 || u16(b, d + 3) != extra - 5) {
                return null;
            }
            copy = b[d] & 0xFF;
            dumpOffset = u16(b, d + 1);
            data = java.util.Arrays.copyOfRange(b, d + 5, d + extra);
        } else if (extra != 0) {
            return null;
        }
        return new CommandReport(CucTime.read(b, off + SpacePacketHeader.OCTETS), SpacePacketHeader.sequenceCount(b, off),
                type, code, u16(b, u + 2), u32(b, u + 4), status, b[u + 9] & 0xFF, u16(b, u + 10), u16(b, u + 12),
                copy, dumpOffset, data);
    }
}
