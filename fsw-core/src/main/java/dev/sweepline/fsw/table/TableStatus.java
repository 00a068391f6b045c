package dev.sweepline.fsw.table;

/**
 * Reason codes for refusing a window table or a parameter set (commands.md, "reason codes for
 * rejection"). A command that loads a table or parameters returns one of these; {@link #OK} means
 * accepted. Codes are plain ints so that they can be returned and telemetered without allocation.
 */
public final class TableStatus {
    /** Accepted. */
    public static final int OK = 0;
    /** The table has no windows. */
    public static final int EMPTY = 1;
    /** More windows than {@link WindowTable#CAPACITY}. */
    public static final int TOO_MANY_WINDOWS = 2;
    /** A DAC code lies outside 0..the DAC's top code (InstrumentDescription#dacTopCode). */
    public static final int OUT_OF_DAC_RANGE = 3;
    /** Lows or highs are not strictly increasing, or a window has low &gt;= high. */
    public static final int NOT_MONOTONIC = 4;
    /** An array is missing (null) or shorter than the window count. */
    public static final int MISSING_DATA = 5;
    /** Parameter: integration periods outside 1..{@link SweepParameters#MAX_INTEGRATION_PERIODS}. */
    public static final int BAD_INTEGRATION = 6;
    /** Parameter: settle time or slew allowance negative or above its limit. */
    public static final int BAD_SETTLE = 7;
    /** Parameter: focus-band widths inconsistent (see {@link SweepParameters#validate()}). */
    public static final int BAD_BAND = 8;
    /** Parameter: re-survey period below 1. */
    public static final int BAD_RESURVEY = 9;
    /** Parameter: loss-of-lock thresholds outside their ranges. */
    public static final int BAD_LOCK_LOSS = 10;
    /** Parameter: gain-switch thresholds outside (0, 1) or without hysteresis. */
    public static final int BAD_GAIN_THRESHOLDS = 11;
    /** Parameter: alpha ratio or tolerance outside its range. */
    public static final int BAD_ALPHA = 12;
    /** Parameter: noise model or significance outside its range. */
    public static final int BAD_NOISE = 13;
    /** A window level lies above the instrument's modulator voltage limit (InstrumentLimits). */
    public static final int ABOVE_VOLTAGE_LIMIT = 14;
    /** The settle per code of rail change is shorter than the HV supply's slew limit needs. */
    public static final int SETTLE_BELOW_SLEW = 15;
    /** The fixed settle is shorter than the HV supply's first-order settling needs. */
    public static final int SETTLE_TOO_SHORT = 16;
    /** Parameter: edge-search reach outside 0..{@link WindowTable#CAPACITY} windows. */
    public static final int BAD_EDGE_SEARCH = 17;
    /** Parameter: focus style, sweep-time budget, robustness margin, survey dwell or focus floor dwell outside its range. */
    public static final int BAD_STYLE = 18;
    /** Parameter: engineering flush interval outside 0..600 s (SweepParameters#engineeringFlushSeconds). */
    public static final int BAD_FLUSH = 19;

    private static final String[] NAMES = {
        "OK", "EMPTY", "TOO_MANY_WINDOWS", "OUT_OF_DAC_RANGE", "NOT_MONOTONIC", "MISSING_DATA",
        "BAD_INTEGRATION", "BAD_SETTLE", "BAD_BAND", "BAD_RESURVEY", "BAD_LOCK_LOSS",
        "BAD_GAIN_THRESHOLDS", "BAD_ALPHA", "BAD_NOISE", "ABOVE_VOLTAGE_LIMIT", "SETTLE_BELOW_SLEW",
        "SETTLE_TOO_SHORT", "BAD_EDGE_SEARCH", "BAD_STYLE", "BAD_FLUSH",
    };

    private TableStatus() {
    }

    /** Name of a reason code, or {@code "UNKNOWN"} for a code that is not defined (for logs and ground tools). */
    public static String name(int code) {
        return code >= 0 && code < NAMES.length ? NAMES[code] : "UNKNOWN";
    }
}
