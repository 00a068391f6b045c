package dev.sweepline.fsw.telemetry;

import java.nio.ByteBuffer;

/**
 * The housekeeping user data of the telemetry ICD §5, written field by field from the ICD table with
 * {@link ByteBuffer} (big-endian, ICD: "all multi-octet fields are big-endian"), independently of
 * {@code FlightSoftware}'s writer: the golden frames pin this image, and {@link FlightSoftwareHousekeepingTest}
 * checks that the flight software writes the same image of its own counters.
 */
final class HousekeepingImage {
    /** User data octets (ICD §5: offsets 0..39). */
    static final int LENGTH = 40;

    private HousekeepingImage() {
    }

    /** The 40 octets of ICD §5; 16- and 32-bit counters are taken modulo their field width. */
    static byte[] of(int mode, int hvEnabled, long stepsSent, long repliesAccepted, int sequenceErrors,
            int timeouts, int retries, int surveySweeps, int focusSweeps, int lockLosses, long telemetryOctets,
            int commandsAccepted, int commandsRejected, int executionFailures, int lastRejection, int hvState,
            int tableId, int faultTrips, int linkFramesBad) {
        return ByteBuffer.allocate(LENGTH)
                .put((byte) mode)                    // offset 0
                .put((byte) hvEnabled)               // 1
                .putInt((int) stepsSent)             // 2..5
                .putInt((int) repliesAccepted)       // 6..9
                .putShort((short) sequenceErrors)    // 10..11
                .putShort((short) timeouts)          // 12..13
                .putShort((short) retries)           // 14..15
                .putShort((short) surveySweeps)      // 16..17
                .putShort((short) focusSweeps)       // 18..19
                .putShort((short) lockLosses)        // 20..21
                .putInt((int) telemetryOctets)       // 22..25
                .putShort((short) commandsAccepted)  // 26..27
                .putShort((short) commandsRejected)  // 28..29
                .putShort((short) executionFailures) // 30..31
                .put((byte) lastRejection)           // 32
                .put((byte) hvState)                 // 33
                .putShort((short) tableId)           // 34..35
                .putShort((short) faultTrips)        // 36..37
                .putShort((short) linkFramesBad)     // 38..39
                .array();
    }

    /**
     * The 26-octet form of ICD §5 before issue 6 appended the command and fault fields: the golden
     * frames carry it (the ground accepts both lengths, ICD §5).
     */
    static byte[] firstForm(int mode, int hvEnabled, long stepsSent, long repliesAccepted, int sequenceErrors,
            int timeouts, int retries, int surveySweeps, int focusSweeps, int lockLosses, long telemetryOctets) {
        return java.util.Arrays.copyOf(of(mode, hvEnabled, stepsSent, repliesAccepted, sequenceErrors, timeouts,
                retries, surveySweeps, focusSweeps, lockLosses, telemetryOctets, 0, 0, 0, 0, 0, 0, 0, 0), 26);
    }
}
