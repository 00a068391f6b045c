package dev.sweepline.sim.scenario;

import java.util.Map;

/**
 * One timed change of a scenario: from {@code atSeconds} the changed parameters go linearly to their
 * targets, reaching them at {@code atSeconds + rampSeconds} (a step when the ramp is 0). A target is
 * either an absolute value ({@code set}) or a factor on the value the parameter has when the event
 * starts ({@code scale}).
 *
 * @param atSeconds   start of the change, s from the scenario start
 * @param rampSeconds duration of the linear change, s; 0 for a step
 * @param label       name of the event, for logs and reports
 * @param jump        whether the bench should treat the change as a discontinuity and time the reacquisition
 * @param set         absolute targets, in each parameter's unit
 * @param scale       factors on the value at the event start
 */
public record ScenarioEvent(double atSeconds, double rampSeconds, String label, boolean jump,
        Map<PlasmaParameter, Double> set, Map<PlasmaParameter, Double> scale) {

    /** Copies the maps so the event stays immutable. */
    public ScenarioEvent {
        set = Map.copyOf(set);
        scale = Map.copyOf(scale);
    }

    /** End of the ramp, s. */
    public double endSeconds() {
        return atSeconds + rampSeconds;
    }

    /** Whether this event changes {@code p}. */
    public boolean changes(PlasmaParameter p) {
        return set.containsKey(p) || scale.containsKey(p);
    }

    /** The value {@code p} reaches through this event when it starts from {@code start}. */
    public double target(PlasmaParameter p, double start) {
        Double v = set.get(p);
        return v != null ? v : start * scale.getOrDefault(p, 1.0);
    }
}
