package dev.sweepline.fsw.fault;

/**
 * Responses of a tripped monitor (commands.md §6, telemetry ICD §6 event 2 argument b). RETRY means
 * "reset the monitor and try again" (the link monitor resumes SURVEY) until the monitor's retry
 * budget is spent, then SAFE: the response reported is the one actually taken.
 */
public final class FaultResponse {
    /** Event only. */
    public static final int NONE = 0;
    /** Reset the monitor and carry on (link: resume SURVEY); SAFE once the retry budget is spent. */
    public static final int RETRY = 1;
    /** Halve both gain-switch thresholds (ranges change to less sensitive ones earlier). */
    public static final int GAIN = 2;
    /** Leave FOCUS for SURVEY (nothing to do when already surveying). */
    public static final int SURVEY = 3;
    /** SAFE: HV off; leaving it needs HV arm, HV enable and a mode command. */
    public static final int SAFE = 4;
    /** Highest response code. */
    public static final int MAX = SAFE;
    /**
     * Mode-change reason the fault responses give the scheduler (telemetry ICD §6, reason code 12):
     * the scheduler's ModeChangeReason.FAULT_RESPONSE (12), so mode-change events name it.
     */
    public static final int MODE_CHANGE_REASON = dev.sweepline.fsw.sweep.ModeChangeReason.FAULT_RESPONSE;

    private static final String[] NAMES = {"NONE", "RETRY", "GAIN", "SURVEY", "SAFE"};

    private FaultResponse() {
    }

    /** Name of a response code, or {@code "UNKNOWN"}. */
    public static String name(int code) {
        return code >= 0 && code < NAMES.length ? NAMES[code] : "UNKNOWN";
    }
}
