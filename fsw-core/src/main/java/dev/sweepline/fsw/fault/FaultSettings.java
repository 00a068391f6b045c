package dev.sweepline.fsw.fault;

/**
 * The fault-protection part of the parameter table (commands.md §4, table image): for each monitor
 * its response, retry budget, threshold (a count of steps, sweeps or cycles; 0 disables the monitor)
 * and limit (a tolerance in the monitor's own unit). Arrays indexed by {@link FaultMonitorId}; index 0
 * is unused. Mutable for building; {@link FaultProtection} copies a validated set.
 */
public final class FaultSettings {
    /** Largest threshold the table image can carry (16 bits). */
    public static final int MAX_THRESHOLD = 0xFFFF;
    /** Largest retry budget the table image can carry (8 bits). */
    public static final int MAX_RETRIES = 0xFF;

    /**
     * The range a parameter table may set, per monitor (commands.md §6.1): thresholds at least 1
     * (a table may relax a monitor, never silence it) and at most these; index 0 unused.
     */
    static final int[] SAFE_MAX_THRESHOLD = {0, 64, 1024, 4096, 16, 4096, 64};
    /** Smallest limit a table may set per monitor (HV: 2 V; stuck: 1 count; overrun: 1 ms). */
    static final int[] SAFE_MIN_LIMIT = {0, 20, 0, 1, 0, 0, 1_000};
    /** Largest limit a table may set per monitor (HV: 200 V; overrun: 1 s). */
    static final int[] SAFE_MAX_LIMIT = {0, 2_000, 0xFFFF, 0xFFFF, 0xFFFF, 0xFFFF, 1_000_000};
    /** Largest retry budget a table may set. */
    public static final int SAFE_MAX_RETRIES = 16;

    /** Response per monitor, {@link FaultResponse} codes. */
    public final int[] response = new int[FaultMonitorId.COUNT + 1];
    /** RETRY budget per monitor before SAFE. */
    public final int[] retries = new int[FaultMonitorId.COUNT + 1];
    /** Trip threshold per monitor (steps / sweeps / cycles in a row); 0 disables it. */
    public final int[] threshold = new int[FaultMonitorId.COUNT + 1];
    /** Limit per monitor: HV codes, -, ADC counts, -, -, ticks (microseconds). */
    public final int[] limit = new int[FaultMonitorId.COUNT + 1];

    /**
     * The default set. Thresholds are chosen so that no built-in scenario trips a monitor (the
     * closed-loop tests of hw-sim run every scenario with them on):
     * HV readback 200 codes (20 V, 40x the 0.5 V rms monitor noise of the demo HV supply) for 8 steps;
     * saturation 32 steps (longer than any peak at the least sensitive range needs to re-range);
     * stuck channel 64 steps while another quadrant moves by more than 64 counts;
     * link: every SAFE entry, 3 retries; peak lost 64 sweeps; overrun 3 cycles over 50 ms.
     */
    public static FaultSettings defaults() {
        FaultSettings s = new FaultSettings();
        s.set(FaultMonitorId.HV_READBACK, FaultResponse.RETRY, 2, 8, 200);
        s.set(FaultMonitorId.ADC_SATURATION, FaultResponse.GAIN, 0, 32, 0);
        s.set(FaultMonitorId.STUCK_CHANNEL, FaultResponse.SURVEY, 0, 64, 64);
        s.set(FaultMonitorId.LINK_TIMEOUT, FaultResponse.RETRY, 3, 1, 0);
        s.set(FaultMonitorId.PEAK_LOST, FaultResponse.SURVEY, 0, 64, 0);
        s.set(FaultMonitorId.CYCLE_OVERRUN, FaultResponse.RETRY, 2, 3, 50_000);
        return s;
    }

    /** Sets one monitor's entry. */
    public void set(int monitor, int responseCode, int retryBudget, int thresholdCount, int limitValue) {
        response[monitor] = responseCode;
        retries[monitor] = retryBudget;
        threshold[monitor] = thresholdCount;
        limit[monitor] = limitValue;
    }

    /** Copies every entry of {@code other}. */
    public void copyFrom(FaultSettings other) {
        System.arraycopy(other.response, 0, response, 0, response.length);
        System.arraycopy(other.retries, 0, retries, 0, retries.length);
        System.arraycopy(other.threshold, 0, threshold, 0, threshold.length);
        System.arraycopy(other.limit, 0, limit, 0, limit.length);
    }

    /**
     * Checks the set against the ranges a parameter table may set (commands.md §6.1): no monitor
     * silenced (threshold 0, response NONE), thresholds, limits and retries inside their safe ranges,
     * and the HV-readback, link and overrun monitors ending in RETRY or SAFE (never a mere mode change).
     *
     * @return 0 when safe, else the id of the first monitor whose entry is outside its range
     */
    public int validateSafe() {
        int basic = validate();
        if (basic != 0) {
            return basic;
        }
        for (int m = 1; m <= FaultMonitorId.COUNT; m++) {
            boolean safetyMonitor = m == FaultMonitorId.HV_READBACK || m == FaultMonitorId.LINK_TIMEOUT
                || m == FaultMonitorId.CYCLE_OVERRUN;
            boolean responseOk = safetyMonitor
                ? response[m] == FaultResponse.RETRY || response[m] == FaultResponse.SAFE
                : response[m] != FaultResponse.NONE;
            if (!responseOk || threshold[m] < 1 || threshold[m] > SAFE_MAX_THRESHOLD[m]
                || limit[m] < SAFE_MIN_LIMIT[m] || limit[m] > SAFE_MAX_LIMIT[m] || retries[m] > SAFE_MAX_RETRIES) {
                return m;
            }
        }
        return 0;
    }

    /**
     * Checks the set.
     *
     * @return 0 when valid, else the id of the first monitor whose entry is out of range
     */
    public int validate() {
        for (int m = 1; m <= FaultMonitorId.COUNT; m++) {
            if (response[m] < 0 || response[m] > FaultResponse.MAX || retries[m] < 0 || retries[m] > MAX_RETRIES
                || threshold[m] < 0 || threshold[m] > MAX_THRESHOLD || limit[m] < 0) {
                return m;
            }
        }
        return 0;
    }
}
