package dev.sweepline.sim.budget;

import java.util.List;

/**
 * What the budget check found.
 *
 * @param plan       the plan checked
 * @param samples    the representative closed loops: phase, hour, distance, generated bits per second
 * @param hours      hour by hour: phase, distance, rate, allocation, store occupancy
 * @param phases     per phase: volume generated against the allocation
 * @param violations every problem, each naming its phase and hour; empty for a plan that fits
 */
public record BudgetResult(OrbitPlan plan, List<Sample> samples, List<Hour> hours, List<PhaseBudget> phases,
        List<String> violations) {

    /**
     * One representative closed loop.
     *
     * @param virtualChannels      per virtual channel: frames sent against packets carried
     * @param flushIntervalSeconds the flight software's frame flush interval of the loop
     */
    public record Sample(String phase, double hours, double distanceAu, double bitsPerSecond, double spectraPerSecond,
            java.util.Map<String, dev.sweepline.sim.bench.TelemetryFigures.VcFill> virtualChannels,
            double flushIntervalSeconds) {
    }

    /** One hour of the plan. */
    public record Hour(int hour, String phase, double distanceAu, double bitsPerSecond, double allocationBitsPerSecond,
            double storeMegabits) {
    }

    /**
     * One phase's volume.
     *
     * @param name             phase
     * @param generatedMegabits telemetry generated over the phase
     * @param allocatedMegabits allocation x duration
     * @param worstHour        hour (from the plan's start) with the highest rate over allocation
     * @param worstHourRatio   that hour's rate over the allocation
     */
    public record PhaseBudget(String name, double generatedMegabits, double allocatedMegabits, int worstHour,
            double worstHourRatio) {
        /** (allocated - generated) / allocated; negative: over budget. */
        public double margin() {
            return (allocatedMegabits - generatedMegabits) / allocatedMegabits;
        }
    }

    /** True when nothing was flagged. */
    public boolean fits() {
        return violations.isEmpty();
    }
}
