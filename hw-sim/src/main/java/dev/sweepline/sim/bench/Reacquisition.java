package dev.sweepline.sim.bench;

import dev.sweepline.sim.scenario.Scenario.Jump;
import java.util.List;

/**
 * How long the sweep took to hold the proton peak again after one jump of the scenario.
 *
 * <p>Sweeps are counted from the first one that starts after the front (the end of the jump's
 * ramp): 1 means the first sweep after the front was already a focus sweep on the new peak; 2 means
 * one sweep (typically the survey that found the new peak) came first.
 *
 * @param label     the jump's label in the scenario
 * @param frontMicros end of the jump's ramp, simulated time
 * @param sweeps    sweeps until and including the first locked focus sweep; -1 if never within the run
 * @param seconds   from the front to the start of that sweep; NaN if never
 *
 * <p>{@link #after} counts until the band merely contains the new peak; {@link #strictAfter} until
 * the band is centred within {@link #STRICT_CENTRE_WINDOWS} windows of it.
 */
public record Reacquisition(String label, long frontMicros, int sweeps, double seconds) {

    /** True when the band held the peak again before the run ended. */
    public boolean reacquired() {
        return sweeps > 0;
    }

    /**
     * Tolerance of the strict reacquisition: the band centre within this many windows of the true
     * proton peak. A bench choice, the width of a few windows against bands of 15-63.
     */
    public static final double STRICT_CENTRE_WINDOWS = 2.0;

    /** The reacquisition after {@code jump}, from the recorded sweeps: the band contains the peak. */
    public static Reacquisition after(Jump jump, List<SweepRecord> records) {
        return after(jump, records, SweepRecord::locked);
    }

    /**
     * The strict reacquisition after {@code jump}: until a focus sweep whose band centre lies within
     * {@link #STRICT_CENTRE_WINDOWS} of the true proton peak.
     */
    public static Reacquisition strictAfter(Jump jump, List<SweepRecord> records) {
        return after(jump, records, Reacquisition::centred);
    }

    /** True when a focus sweep's band is centred within {@link #STRICT_CENTRE_WINDOWS} of the true peak. */
    static boolean centred(SweepRecord r) {
        return r.mode() == dev.sweepline.fsw.sweep.SweepMode.FOCUS && r.trueProtonWindow() >= 0
                && !Double.isNaN(r.bandCentre())
                && Math.abs(r.bandCentre() - r.trueProtonWindow()) <= STRICT_CENTRE_WINDOWS;
    }

    /** The end of the jump's ramp, simulated time, microseconds: sweeps are counted from the first starting then. */
    static long frontMicros(Jump jump) {
        return Math.round((jump.atSeconds() + jump.rampSeconds()) * 1e6);
    }

    private static Reacquisition after(Jump jump, List<SweepRecord> records,
            java.util.function.Predicate<SweepRecord> held) {
        long front = frontMicros(jump);
        int counted = 0;
        for (SweepRecord r : records) {
            if (r.startMicros() < front) {
                continue;
            }
            counted++;
            if (held.test(r)) {
                return new Reacquisition(jump.label(), front, counted, (r.startMicros() - front) / 1e6);
            }
        }
        return new Reacquisition(jump.label(), front, -1, Double.NaN);
    }
}
