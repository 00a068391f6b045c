package dev.sweepline.sim.plasma;

import java.util.List;
import java.util.Objects;

/**
 * The plasma at the cup at one instant: its ion populations and the magnetic field direction
 * (instrument frame, see {@link IonPopulation}).
 *
 * <p>The field direction sets the thermal speed each bi-Maxwellian shows along the cup normal,
 * w_n^2 = w_par^2 cos^2 psi + w_perp^2 sin^2 psi, with psi the angle between field and normal
 * (physics.md "Oblique flow and a split collector", anisotropy).
 *
 * <p>A value: equal by its components. Immutable once built, except the one a {@link ReusablePlasma}
 * owns and refills (the bench's per-step plasma, to allocate nothing per step).
 */
public final class PlasmaState {
    private List<IonPopulation> populations;
    private double bx;
    private double by;
    private double bz;

    /**
     * Copies the population list and normalises the field direction; rejects a zero or non-finite field.
     *
     * @param populations ion populations (copied, unmodifiable)
     * @param bx          field direction x (normalised by the constructor)
     * @param by          field direction y
     * @param bz          field direction z, along the cup normal
     */
    public PlasmaState(List<IonPopulation> populations, double bx, double by, double bz) {
        set(List.copyOf(populations), bx, by, bz);
    }

    /** Takes {@code populations} as they are (an unmodifiable list) and normalises the field direction. */
    void set(List<IonPopulation> populations, double bx, double by, double bz) {
        double norm = Math.sqrt(bx * bx + by * by + bz * bz);
        if (!(norm > 0) || !Double.isFinite(norm)) {
            throw new IllegalArgumentException("field direction must be a non-zero finite vector");
        }
        this.populations = populations;
        this.bx = bx / norm;
        this.by = by / norm;
        this.bz = bz / norm;
    }

    /** A plasma of the given populations with the field along the cup normal. */
    public static PlasmaState alongNormal(List<IonPopulation> populations) {
        return new PlasmaState(populations, 0, 0, 1);
    }

    /** Ion populations (unmodifiable). */
    public List<IonPopulation> populations() {
        return populations;
    }

    /** Field direction x (unit vector). */
    public double bx() {
        return bx;
    }

    /** Field direction y (unit vector). */
    public double by() {
        return by;
    }

    /** Field direction z, along the cup normal (unit vector). */
    public double bz() {
        return bz;
    }

    /** Thermal speed of {@code population} along the cup normal (bi-Maxwellian projection), metres per second. */
    public double normalThermalSpeed(IonPopulation population) {
        double cos2 = bz * bz;
        double wPar = population.wParallelMetresPerSecond();
        double wPerp = population.wPerpMetresPerSecond();
        return Math.sqrt(wPar * wPar * cos2 + wPerp * wPerp * (1 - cos2));
    }

    /** Equal when the populations and the field direction are (doubles compared by {@link Double#compare}). */
    @Override
    public boolean equals(Object o) {
        return o instanceof PlasmaState p && populations.equals(p.populations)
                && Double.compare(bx, p.bx) == 0 && Double.compare(by, p.by) == 0 && Double.compare(bz, p.bz) == 0;
    }

    @Override
    public int hashCode() {
        return Objects.hash(populations, bx, by, bz);
    }

    @Override
    public String toString() {
        return "PlasmaState[populations=" + populations + ", bx=" + bx + ", by=" + by + ", bz=" + bz + "]";
    }
}
