package dev.sweepline.ground.decode;

import dev.sweepline.ground.packet.CucTime;
import dev.sweepline.ground.packet.SpacePacketHeader;

/**
 * Decodes housekeeping (ICD §5) and event (ICD §6) packets. A packet without the secondary header or of
 * the wrong length gives null; the caller counts it. Stateless.
 */
public final class RecordPacketDecoder {
    private static final int USER_DATA_OFFSET = SpacePacketHeader.OCTETS + CucTime.OCTETS;

    private RecordPacketDecoder() {
    }

    private static int u16(byte[] b, int i) {
        return ((b[i] & 0xFF) << 8) | (b[i + 1] & 0xFF);
    }

    private static long u32(byte[] b, int i) {
        return ((long) u16(b, i) << 16) | u16(b, i + 2);
    }

    private static boolean shaped(byte[] b, int off, int len, int userOctets) {
        return len == USER_DATA_OFFSET + userOctets && SpacePacketHeader.secondaryHeaderFlag(b, off);
    }

    /** The housekeeping packet of {@code len} octets at {@code off}, or null when malformed. */
    public static HousekeepingReport housekeeping(byte[] b, int off, int len) {
        if (!shaped(b, off, len, HousekeepingReport.USER_DATA_OCTETS)) {
            return null;
        }
        int u = off + USER_DATA_OFFSET;
        return new HousekeepingReport(CucTime.read(b, off + SpacePacketHeader.OCTETS),
                SpacePacketHeader.sequenceCount(b, off), b[u] & 0xFF, b[u + 1] != 0, u32(b, u + 2), u32(b, u + 6),
                u16(b, u + 10), u16(b, u + 12), u16(b, u + 14), u16(b, u + 16), u16(b, u + 18), u16(b, u + 20),
                u32(b, u + 22));
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
}
