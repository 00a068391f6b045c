package dev.sweepline.sim.plasma;

import dev.sweepline.sim.physics.PhysicalConstants;

/**
 * One drifting bi-Maxwellian ion population in the instrument frame.
 *
 * <p>Frame: +z is the cup normal pointing into the cup, so solar wind flowing into the aperture has
 * {@code vz > 0}; x and y lie in the collector plane, along the quadrant split lines. Thermal
 * speeds are the most probable speeds w = sqrt(2kT/m) along and across the magnetic field.
 *
 * @param species                  ion species
 * @param densityPerM3             number density, per cubic metre
 * @param vxMetresPerSecond        bulk velocity x, metres per second
 * @param vyMetresPerSecond        bulk velocity y, metres per second
 * @param vzMetresPerSecond        bulk velocity z (into the cup), metres per second
 * @param wParallelMetresPerSecond thermal speed along the field, metres per second
 * @param wPerpMetresPerSecond     thermal speed across the field, metres per second
 */
public record IonPopulation(IonSpecies species, double densityPerM3,
                            double vxMetresPerSecond, double vyMetresPerSecond, double vzMetresPerSecond,
                            double wParallelMetresPerSecond, double wPerpMetresPerSecond) {

    /** Checks the density is non-negative and the thermal speeds positive. */
    public IonPopulation {
        if (species == null) {
            throw new IllegalArgumentException("species is required");
        }
        if (!(densityPerM3 >= 0) || !(wParallelMetresPerSecond > 0) || !(wPerpMetresPerSecond > 0)
                || !Double.isFinite(vxMetresPerSecond + vyMetresPerSecond + vzMetresPerSecond)) {
            throw new IllegalArgumentException("bad population: n " + densityPerM3 + " /m3, w " + wParallelMetresPerSecond
                    + ", " + wPerpMetresPerSecond + " m/s");
        }
    }

    /** An isotropic population (w parallel = w perpendicular). */
    public static IonPopulation isotropic(IonSpecies species, double densityPerM3,
                                          double vxMetresPerSecond, double vyMetresPerSecond, double vzMetresPerSecond,
                                          double wMetresPerSecond) {
        return new IonPopulation(species, densityPerM3, vxMetresPerSecond, vyMetresPerSecond, vzMetresPerSecond,
                wMetresPerSecond, wMetresPerSecond);
    }

    /** Thermal (most probable) speed w = sqrt(2kT/m), metres per second, for a temperature in kelvin. */
    public static double thermalSpeed(double temperatureK, double massKg) {
        return Math.sqrt(2 * PhysicalConstants.BOLTZMANN_JOULE_PER_KELVIN * temperatureK / massKg);
    }

    /** Bulk speed, metres per second. */
    public double bulkSpeedMetresPerSecond() {
        return Math.sqrt(vxMetresPerSecond * vxMetresPerSecond + vyMetresPerSecond * vyMetresPerSecond
                + vzMetresPerSecond * vzMetresPerSecond);
    }
}
