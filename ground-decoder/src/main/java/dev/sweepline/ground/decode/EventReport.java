package dev.sweepline.ground.decode;

import dev.sweepline.ground.packet.CucTime;

/**
 * An event packet (APID 0x120), ICD §6.
 *
 * @param time          CUC time of the event
 * @param sequenceCount packet sequence count
 * @param eventId       1 mode change, 2 fault response, 4 table committed, 5 table restored at start-up,
 *                      6 command authentication restored at start-up, 7 authentication locked (challenge)
 * @param argumentA     mode change: from-mode (0 safe, 1 survey, 2 focus); fault: monitor id; restore: result
 * @param argumentB     mode change: to-mode; fault: the response taken
 * @param reasonCode    mode change: reason code; fault: detail; table events: the table id
 */
public record EventReport(CucTime time, int sequenceCount, int eventId, int argumentA, int argumentB,
        int reasonCode) {
    /** APID (ICD §3.3). */
    public static final int APID = 0x120;
    /** User data length, octets (ICD §6: offsets 0..5). */
    public static final int USER_DATA_OCTETS = 6;
    /** Event id of a mode change (ICD §6). */
    public static final int MODE_CHANGE = 1;
    /** Event id of a fault response (ICD §6). */
    public static final int FAULT = 2;
    /** Event id of a table commit (ICD §6). */
    public static final int TABLE_COMMITTED = 4;
    /** Event id of the start-up table restore (ICD §6). */
    public static final int TABLE_RESTORED = 5;
    /** Event id of the start-up anti-replay restore: argument a = result (ICD §6). */
    public static final int AUTH_RESTORED = 6;
    /** Event id of a locked authenticator's challenge: a, b, reason = its 32 bits (ICD §6). */
    public static final int AUTH_CHALLENGE = 7;

    private static final String[] AUTH_RESULTS = {"RESTORED", "NEW_MEMORY", "LOCKED"};

    private static final String[] MONITORS = {
        "?", "HV_READBACK", "ADC_SATURATION", "STUCK_CHANNEL", "LINK_TIMEOUT", "PEAK_LOST", "CYCLE_OVERRUN",
    };
    private static final String[] RESPONSES = {"NONE", "RETRY", "GAIN", "SURVEY", "SAFE"};

    /** Name of a fault monitor id (ICD §6), or "UNKNOWN". */
    public static String monitorName(int id) {
        return id > 0 && id < MONITORS.length ? MONITORS[id] : "UNKNOWN";
    }

    /** Name of a fault response code (ICD §6), or "UNKNOWN". */
    public static String responseName(int code) {
        return code >= 0 && code < RESPONSES.length ? RESPONSES[code] : "UNKNOWN";
    }

    /** Name of an anti-replay restore result (ICD §6 event 6), or "UNKNOWN". */
    public static String authResultName(int code) {
        return code >= 0 && code < AUTH_RESULTS.length ? AUTH_RESULTS[code] : "UNKNOWN";
    }

    /** The 32-bit challenge of an AUTH_CHALLENGE event (a, b, reason, most significant first). */
    public long challenge() {
        return ((long) (argumentA & 0xFF) << 24) | ((argumentB & 0xFF) << 16) | (reasonCode & 0xFFFF);
    }

    /** A one-line description for listings. */
    public String describe() {
        if (eventId == MODE_CHANGE) {
            return "mode change " + ModeNames.of(argumentA) + " -> " + ModeNames.of(argumentB) + " reason " + ModeNames.reason(reasonCode);
        }
        if (eventId == FAULT) {
            return "fault " + monitorName(argumentA) + " response " + responseName(argumentB) + " detail " + reasonCode;
        }
        if (eventId == TABLE_COMMITTED) {
            return String.format("table committed id 0x%04X", reasonCode);
        }
        if (eventId == TABLE_RESTORED) {
            return String.format("table restore result %d id 0x%04X", argumentA, reasonCode);
        }
        if (eventId == AUTH_RESTORED) {
            return "command authentication restore " + authResultName(argumentA);
        }
        if (eventId == AUTH_CHALLENGE) {
            return String.format("command authentication LOCKED: recovery challenge 0x%08X", challenge());
        }
        return "event " + eventId + " a=" + argumentA + " b=" + argumentB + " reason " + reasonCode;
    }
}
