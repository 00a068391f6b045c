package dev.sweepline.fsw.sweep;

/**
 * The scheduler's modes (architecture.md, naming), each with its code in the telemetry ICD (§4 spectra,
 * §5 housekeeping, §6 events) and in the SET_MODE telecommand (commands.md §2). The one place the codes
 * are written down: every switch over a mode is an exhaustive switch expression without a default, so a
 * new mode fails to compile wherever it matters.
 */
public enum SweepMode {
    /** Every window of the table, alternating direction. ICD code 1. */
    SURVEY(1),
    /** A band of windows around the proton peak. ICD code 2. */
    FOCUS(2),
    /** High voltage off, nothing stepped; left only by a commanded mode. ICD code 0. */
    SAFE(0);

    private static final SweepMode[] BY_CODE = {SAFE, SURVEY, FOCUS};

    private final int icdCode;

    SweepMode(int icdCode) {
        this.icdCode = icdCode;
    }

    /** The mode's code in telemetry and telecommands: 0 safe, 1 survey, 2 focus. */
    public int icdCode() {
        return icdCode;
    }

    /** The mode of ICD code {@code code}, or null for a code no mode has (the caller refuses it). */
    public static SweepMode fromIcdCode(int code) {
        return code >= 0 && code < BY_CODE.length ? BY_CODE[code] : null;
    }
}
