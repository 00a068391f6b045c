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
 */
public record Reacquisition(String label, long frontMicros, int sweeps, double seconds) {

    /** True when the band held the peak again before the run ended. */
    public boolean reacquired() {
        return sweeps > 0;
    }

    /** The reacquisition after {@code jump}, from the recorded sweeps. */
    public static Reacquisition after(Jump jump, List<SweepRecord> records) {
        long front = Math.round((jump.atSeconds() + jump.rampSeconds()) * 1e6);
        int counted = 0;
        for (SweepRecord r : records) {
            if (r.startMicros() < front) {
                continue;
            }
            counted++;
            if (r.locked()) {
                return new Reacquisition(jump.label(), front, counted, (r.startMicros() - front) / 1e6);
            }
        }
        return new Reacquisition(jump.label(), front, -1, Double.NaN);
    }
}
