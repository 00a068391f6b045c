package dev.sweepline.fsw.sweep;

/** Reason codes of mode changes, passed to {@link SweepListener#onModeChange} and folded into the decision hash. */
public final class ModeChangeReason {
    /** No change (internal: the lock holds). */
    public static final int NONE = 0;
    /** The scheduler started (reported at the first step, from SAFE to SURVEY). */
    public static final int START = 1;
    /** A survey found a significant proton peak: SURVEY to FOCUS. */
    public static final int LOCK_ACQUIRED = 2;
    /** The focus peak lay within the edge margin of an unclipped band edge. */
    public static final int PEAK_ON_EDGE = 3;
    /** The focus peak current fell below the collapse fraction of the reference peak. */
    public static final int CURRENT_COLLAPSE = 4;
    /** The focus peak moved by more than the jump limit, or to about the alpha ratio of the reference. */
    public static final int PEAK_JUMP = 5;
    /** K focus sweeps since the last survey. */
    public static final int RESURVEY = 6;
    /** Ground command (requestMode). */
    public static final int COMMANDED = 7;
    /** The focus sweep held no significant peak. */
    public static final int NO_PEAK = 8;
    /** A new window table took effect; the old band means nothing in it. */
    public static final int TABLE_LOADED = 9;
    /** FOCUS was commanded but there is no valid band yet, so SURVEY instead. */
    public static final int NO_BAND = 10;
    /** The executive got no reply within its retries. */
    public static final int LINK_TIMEOUT = 11;
    /** A fault-protection monitor responded (the event packet says which; commands.md §6). */
    public static final int FAULT_RESPONSE = 12;

    private static final String[] NAMES = {
        "NONE", "START", "LOCK_ACQUIRED", "PEAK_ON_EDGE", "CURRENT_COLLAPSE", "PEAK_JUMP",
        "RESURVEY", "COMMANDED", "NO_PEAK", "TABLE_LOADED", "NO_BAND", "LINK_TIMEOUT", "FAULT_RESPONSE",
    };

    private ModeChangeReason() {
    }

    /** Name of a reason code, or {@code "UNKNOWN"}. */
    public static String name(int reason) {
        return reason >= 0 && reason < NAMES.length ? NAMES[reason] : "UNKNOWN";
    }
}
