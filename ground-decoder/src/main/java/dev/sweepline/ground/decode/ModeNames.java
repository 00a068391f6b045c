package dev.sweepline.ground.decode;

/**
 * Names of the instrument modes of ICD §5–§6 (0 safe, 1 survey, 2 focus), of the mode-change reasons
 * (ICD §6) and of the HV interlock states (ICD §5).
 */
public final class ModeNames {
    private ModeNames() {
    }

    /** "safe", "survey", "focus" or "mode N". */
    public static String of(int mode) {
        switch (mode) {
            case 0:
                return "safe";
            case 1:
                return "survey";
            case 2:
                return "focus";
            default:
                return "mode " + mode;
        }
    }

    /** Mode-change reasons of telemetry ICD §6 (event 1, the reason field), by code. */
    private static final String[] REASONS = {"NONE", "START", "LOCK_ACQUIRED", "PEAK_ON_EDGE", "CURRENT_COLLAPSE",
        "PEAK_JUMP", "RESURVEY", "COMMANDED", "NO_PEAK", "TABLE_LOADED", "NO_BAND", "LINK_TIMEOUT", "FAULT_RESPONSE"};

    /** The name of a mode-change reason (ICD §6), or "reason N" for a code the ICD does not list. */
    public static String reason(int code) {
        return code >= 0 && code < REASONS.length ? REASONS[code] : "reason " + code;
    }

    /** The HV interlock state of housekeeping (ICD §5): "off", "armed", "enabled" or "state N". */
    public static String interlock(int state) {
        return switch (state) {
            case 0 -> "off";
            case 1 -> "armed";
            case 2 -> "enabled";
            default -> "state " + state;
        };
    }
}
