package dev.sweepline.sim.plasma;

import dev.sweepline.sim.physics.PhysicalConstants;
import java.util.Objects;

/**
 * One drifting bi-Maxwellian ion population in the instrument frame.
 *
 * <p>Frame: +z is the cup normal pointing into the cup, so solar wind flowing into the aperture has
 * {@code vz > 0}; x and y lie in the collector plane, along the quadrant split lines. Thermal
 * speeds are the most probable speeds w = sqrt(2kT/m) along and across the magnetic field.
 *
 * <p>A value: equal by its components. Immutable once built, except the populations a
 * {@link ReusablePlasma} owns and refills (the bench's per-step plasma, to allocate nothing per step).
 */
public final class IonPopulation {
    private IonSpecies species;
    private double densityPerM3;
    private double vxMetresPerSecond;
    private double vyMetresPerSecond;
    private double vzMetresPerSecond;
    private double wParallelMetresPerSecond;
    private double wPerpMetresPerSecond;

    /** Checks the density is non-negative and the thermal speeds positive. */
    public IonPopulation(IonSpecies species, double densityPerM3,
                         double vxMetresPerSecond, double vyMetresPerSecond, double vzMetresPerSecond,
                         double wParallelMetresPerSecond, double wPerpMetresPerSecond) {
        set(species, densityPerM3, vxMetresPerSecond, vyMetresPerSecond, vzMetresPerSecond,
                wParallelMetresPerSecond, wPerpMetresPerSecond);
    }

    /**
     * Gives this population new values, checked as by the constructor; only for the reused populations
     * of a {@link ReusablePlasma} (every other population is immutable once built).
     */
    void set(IonSpecies species, double densityPerM3,
             double vxMetresPerSecond, double vyMetresPerSecond, double vzMetresPerSecond,
             double wParallelMetresPerSecond, double wPerpMetresPerSecond) {
        if (species == null) {
            throw new IllegalArgumentException("species is required");
        }
        if (!(densityPerM3 >= 0) || !(wParallelMetresPerSecond > 0) || !(wPerpMetresPerSecond > 0)
                || !Double.isFinite(vxMetresPerSecond + vyMetresPerSecond + vzMetresPerSecond)) {
            throw new IllegalArgumentException("bad population: n " + densityPerM3 + " /m3, w " + wParallelMetresPerSecond
                    + ", " + wPerpMetresPerSecond + " m/s");
        }
        this.species = species;
        this.densityPerM3 = densityPerM3;
        this.vxMetresPerSecond = vxMetresPerSecond;
        this.vyMetresPerSecond = vyMetresPerSecond;
        this.vzMetresPerSecond = vzMetresPerSecond;
        this.wParallelMetresPerSecond = wParallelMetresPerSecond;
        this.wPerpMetresPerSecond = wPerpMetresPerSecond;
    }

    /** Ion species. */
    public IonSpecies species() {
        return species;
    }

    /** Number density, per cubic metre. */
    public double densityPerM3() {
        return densityPerM3;
    }

    /** Bulk velocity x, metres per second. */
    public double vxMetresPerSecond() {
        return vxMetresPerSecond;
    }

    /** Bulk velocity y, metres per second. */
    public double vyMetresPerSecond() {
        return vyMetresPerSecond;
    }

    /** Bulk velocity z (into the cup), metres per second. */
    public double vzMetresPerSecond() {
        return vzMetresPerSecond;
    }

    /** Thermal speed along the field, metres per second. */
    public double wParallelMetresPerSecond() {
        return wParallelMetresPerSecond;
    }

    /** Thermal speed across the field, metres per second. */
    public double wPerpMetresPerSecond() {
        return wPerpMetresPerSecond;
    }

    /** Equal when every component is (as a record's equality: doubles compared by {@link Double#compare}). */
    @Override
    public boolean equals(Object o) {
        return o instanceof IonPopulation p && species.equals(p.species)
                && Double.compare(densityPerM3, p.densityPerM3) == 0
                && Double.compare(vxMetresPerSecond, p.vxMetresPerSecond) == 0
                && Double.compare(vyMetresPerSecond, p.vyMetresPerSecond) == 0
                && Double.compare(vzMetresPerSecond, p.vzMetresPerSecond) == 0
                && Double.compare(wParallelMetresPerSecond, p.wParallelMetresPerSecond) == 0
                && Double.compare(wPerpMetresPerSecond, p.wPerpMetresPerSecond) == 0;
    }

    @Override
    public int hashCode() {
        return Objects.hash(species, densityPerM3, vxMetresPerSecond, vyMetresPerSecond, vzMetresPerSecond,
                wParallelMetresPerSecond, wPerpMetresPerSecond);
    }

    @Override
    public String toString() {
        return "IonPopulation[species=" + species + ", densityPerM3=" + densityPerM3
                + ", vxMetresPerSecond=" + vxMetresPerSecond + ", vyMetresPerSecond=" + vyMetresPerSecond
                + ", vzMetresPerSecond=" + vzMetresPerSecond + ", wParallelMetresPerSecond=" + wParallelMetresPerSecond
                + ", wPerpMetresPerSecond=" + wPerpMetresPerSecond + "]";
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
