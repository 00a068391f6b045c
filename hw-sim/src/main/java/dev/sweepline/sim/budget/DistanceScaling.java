package dev.sweepline.sim.budget;

import dev.sweepline.sim.scenario.PlasmaConditions;
import dev.sweepline.sim.scenario.PlasmaParameter;
import dev.sweepline.sim.scenario.Scenario;

/**
 * The reference scenario's plasma moved to another heliocentric distance at constant speed:
 * density as r^-2 (physics.md, radial scaling row) and proton temperature as r^-0.92 (polytropic
 * index 1.46, Totten, Freeman and Arya 1995, physics.md [read]); abundance, ratios and angles kept.
 */
public final class DistanceScaling {
    /** Exponent of the temperature's radial fall-off (physics.md: r^-0.92). */
    public static final double TEMPERATURE_EXPONENT = -0.92;

    private DistanceScaling() {
    }

    /** {@code scenario} at {@code distanceAu}, lasting {@code seconds}. */
    public static Scenario at(Scenario scenario, double distanceAu, double seconds) {
        double ratio = distanceAu / scenario.distanceAu();
        PlasmaConditions c = scenario.start();
        c = c.with(PlasmaParameter.PROTON_DENSITY, c.protonDensityPerCc() * Math.pow(ratio, -2));
        c = c.with(PlasmaParameter.PROTON_TEMPERATURE, c.protonTemperatureK() * Math.pow(ratio, TEMPERATURE_EXPONENT));
        return scenario.withStart(scenario.name() + String.format(java.util.Locale.ROOT, "-at-%.3f-au", distanceAu),
                c, distanceAu, seconds);
    }
}
