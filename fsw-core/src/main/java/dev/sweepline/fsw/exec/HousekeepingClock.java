package dev.sweepline.fsw.exec;

/**
 * When housekeeping is due (telemetry ICD §3.3: every period, default 16 s): the first packet at the
 * first cycle, then one period after each. A new period takes effect at once if it brings the next
 * packet forward. Time is the caller's; deadlines compare as {@code now - next >= 0}.
 */
final class HousekeepingClock {
    private long periodMicros;
    private long nextMicros;

    HousekeepingClock(long periodMicros) {
        this.periodMicros = periodMicros;
    }

    /** True when a packet is due at {@code nowMicros}; the next one is then one period later. */
    boolean due(long nowMicros) {
        if (nowMicros - nextMicros < 0) {
            return false;
        }
        nextMicros = nowMicros + periodMicros;
        return true;
    }

    /** A new period (a committed table's), from {@code nowMicros}. */
    void period(long micros, long nowMicros) {
        periodMicros = micros;
        nextMicros = Math.min(nextMicros, nowMicros + micros);
    }
}
