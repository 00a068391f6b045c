package dev.sweepline.fsw.telemetry;

import java.nio.ByteBuffer;

/**
 * The housekeeping user data of the telemetry ICD §5, written field by field from the ICD table with
 * {@link ByteBuffer} (big-endian, ICD: "all multi-octet fields are big-endian"), independently of
 * {@code FlightSoftware}'s writer: the golden frames pin this image, and {@link FlightSoftwareHousekeepingTest}
 * checks that the flight software writes the same image of its own counters.
 */
final class HousekeepingImage {
    /** User data octets (ICD §5: offsets 0..25). */
    static final int LENGTH = 26;

    private HousekeepingImage() {
    }

    /** The 26 octets of ICD §5; 16- and 32-bit counters are taken modulo their field width. */
    static byte[] of(int mode, int hvEnabled, long stepsSent, long repliesAccepted, int sequenceErrors,
            int timeouts, int retries, int surveySweeps, int focusSweeps, int lockLosses, long telemetryOctets) {
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
                .array();
    }
}
