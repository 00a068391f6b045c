package dev.sweepline.sim.plasma;

import java.util.List;

/**
 * One {@link PlasmaState} of protons and optional alphas, refilled in place: a source that hands out
 * a new plasma many times a second (the bench's per-step plasma) allocates nothing per call. The
 * plasma it hands out is valid until the next {@link #set}: a caller that keeps a plasma builds its own
 * {@link PlasmaState}. Not thread-safe.
 */
public final class ReusablePlasma {
    private static final double UNSET = 1.0;

    private final IonPopulation protons = new IonPopulation(IonSpecies.PROTON, 0, 0, 0, 0, UNSET, UNSET);
    private final IonPopulation alphas = new IonPopulation(IonSpecies.ALPHA, 0, 0, 0, 0, UNSET, UNSET);
    private final List<IonPopulation> protonsOnly = List.of(protons);
    private final List<IonPopulation> protonsAndAlphas = List.of(protons, alphas);
    private final PlasmaState plasma = new PlasmaState(protonsOnly, 0, 0, 1);

    /** Protons of the given values, no alphas (the values in the units of {@link IonPopulation}). */
    public ReusablePlasma protons(double densityPerM3, double vx, double vy, double vz, double wParallel,
            double wPerp) {
        protons.set(IonSpecies.PROTON, densityPerM3, vx, vy, vz, wParallel, wPerp);
        return this;
    }

    /** Alphas of the given values (the values in the units of {@link IonPopulation}). */
    public ReusablePlasma alphas(double densityPerM3, double vx, double vy, double vz, double wParallel,
            double wPerp) {
        alphas.set(IonSpecies.ALPHA, densityPerM3, vx, vy, vz, wParallel, wPerp);
        return this;
    }

    /**
     * The plasma of the last {@link #protons} (and the last {@link #alphas} when {@code withAlphas}),
     * field direction (bx, by, bz) normalised as by {@link PlasmaState}'s constructor.
     */
    public PlasmaState set(boolean withAlphas, double bx, double by, double bz) {
        plasma.set(withAlphas ? protonsAndAlphas : protonsOnly, bx, by, bz);
        return plasma;
    }
}
