package dev.sweepline.sim.budget;

import dev.sweepline.sim.instrument.InstrumentModel;
import dev.sweepline.sim.scenario.Scenario;
import java.util.List;

/**
 * An orbit plan: phases back to back, the plasma of a reference scenario scaled to each distance,
 * and the downlink passes that empty the onboard store.
 *
 * @param name              plan name
 * @param description       what it covers
 * @param scenario          reference plasma (at its own distance) with its fluctuations and events
 * @param sampleMinutes     simulated closed-loop minutes at each representative point
 * @param sampleEveryHours  spacing of representative points within a phase (plus both phase ends)
 * @param storageMegabits   onboard store for science telemetry; NaN: no store, every hour must fit its allocation
 * @param phases            the phases, in time order
 * @param passes            downlink passes
 * @param instrument       the instrument flown in every phase
 * @param engineeringFlushSeconds the start-up table's engineering frame flush interval, seconds (0: the
 *                          build's; commands.md §4.1 engineeringFlushSeconds)
 */
public record OrbitPlan(String name, String description, Scenario scenario, double sampleMinutes,
        double sampleEveryHours, double storageMegabits, List<Phase> phases, List<Pass> passes,
        InstrumentModel instrument, int engineeringFlushSeconds) {

    /**
     * A downlink pass.
     *
     * @param startHours    start, hours from the plan's start
     * @param hours         duration
     * @param bitsPerSecond downlink rate during the pass
     */
    public record Pass(double startHours, double hours, double bitsPerSecond) {
    }

    /** End of the last phase, hours. */
    public double endHours() {
        return phases.get(phases.size() - 1).endHours();
    }

    /** The phase holding {@code hours} (the last one at the very end). */
    public Phase phaseAt(double hours) {
        for (Phase p : phases) {
            if (hours < p.endHours()) {
                return p;
            }
        }
        return phases.get(phases.size() - 1);
    }
}
