package dev.sweepline.sim.plasma;

import java.util.List;

/**
 * The plasma at the cup at one instant: its ion populations and the magnetic field direction
 * (instrument frame, see {@link IonPopulation}).
 *
 * <p>The field direction sets the thermal speed each bi-Maxwellian shows along the cup normal,
 * w_n^2 = w_par^2 cos^2 psi + w_perp^2 sin^2 psi, with psi the angle between field and normal
 * (physics.md "Oblique flow and a split collector", anisotropy).
 *
 * @param populations ion populations (copied, unmodifiable)
 * @param bx          field direction x (normalised by the constructor)
 * @param by          field direction y
 * @param bz          field direction z, along the cup normal
 */
public record PlasmaState(List<IonPopulation> populations, double bx, double by, double bz) {

    /** Copies the population list and normalises the field direction; rejects a zero or non-finite field. */
    public PlasmaState {
        populations = List.copyOf(populations);
        double norm = Math.sqrt(bx * bx + by * by + bz * bz);
        if (!(norm > 0) || !Double.isFinite(norm)) {
            throw new IllegalArgumentException("field direction must be a non-zero finite vector");
        }
        bx /= norm;
        by /= norm;
        bz /= norm;
    }

    /** A plasma of the given populations with the field along the cup normal. */
    public static PlasmaState alongNormal(List<IonPopulation> populations) {
        return new PlasmaState(populations, 0, 0, 1);
    }

    /** Thermal speed of {@code population} along the cup normal (bi-Maxwellian projection), metres per second. */
    public double normalThermalSpeed(IonPopulation population) {
        double cos2 = bz * bz;
        double wPar = population.wParallelMetresPerSecond();
        double wPerp = population.wPerpMetresPerSecond();
        return Math.sqrt(wPar * wPar * cos2 + wPerp * wPerp * (1 - cos2));
    }
}
