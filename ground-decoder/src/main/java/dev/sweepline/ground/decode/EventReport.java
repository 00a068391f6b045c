package dev.sweepline.ground.decode;

import dev.sweepline.ground.packet.CucTime;

/**
 * An event packet (APID 0x120), ICD §6.
 *
 * @param time          CUC time of the event
 * @param sequenceCount packet sequence count
 * @param eventId       1 mode change
 * @param argumentA     mode change: from-mode (0 safe, 1 survey, 2 focus)
 * @param argumentB     mode change: to-mode
 * @param reasonCode    the scheduler's mode-change reason code
 */
public record EventReport(CucTime time, int sequenceCount, int eventId, int argumentA, int argumentB,
        int reasonCode) {
    /** APID (ICD §3.3). */
    public static final int APID = 0x120;
    /** User data length, octets (ICD §6: offsets 0..5). */
    public static final int USER_DATA_OCTETS = 6;
    /** Event id of a mode change (ICD §6). */
    public static final int MODE_CHANGE = 1;

    /** A one-line description for listings. */
    public String describe() {
        if (eventId == MODE_CHANGE) {
            return "mode change " + ModeNames.of(argumentA) + " -> " + ModeNames.of(argumentB) + " reason " + reasonCode;
        }
        return "event " + eventId + " a=" + argumentA + " b=" + argumentB + " reason " + reasonCode;
    }
}
