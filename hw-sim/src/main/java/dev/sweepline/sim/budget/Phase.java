package dev.sweepline.sim.budget;

/**
 * One phase of an orbit plan.
 *
 * @param name                    phase name
 * @param startHours              start, hours from the plan's start
 * @param endHours                end, hours from the plan's start
 * @param distanceStartAu         heliocentric distance at the start
 * @param distanceEndAu           heliocentric distance at the end (linear in between)
 * @param mode                    how the instrument is operated
 * @param allocationBitsPerSecond downlink allocation of the phase
 */
public record Phase(String name, double startHours, double endHours, double distanceStartAu, double distanceEndAu,
        Mode mode, double allocationBitsPerSecond) {

    /** Instrument operation in a phase. */
    public enum Mode {
        /** The adaptive sweep: survey and focus as the scheduler decides. */
        ADAPTIVE("adaptive"),
        /** Survey only (focus disabled). */
        SURVEY("survey"),
        /** High voltage off: housekeeping only. */
        SAFE("safe");

        private final String key;

        Mode(String key) {
            this.key = key;
        }

        /** Name in the plan file. */
        public String key() {
            return key;
        }
    }

    /** Distance at {@code hours} (linear over the phase). */
    public double distanceAt(double hours) {
        double f = endHours == startHours ? 0 : (hours - startHours) / (endHours - startHours);
        return distanceStartAu + (distanceEndAu - distanceStartAu) * f;
    }

    /** Duration, hours. */
    public double hours() {
        return endHours - startHours;
    }
}
