package dev.sweepline.ground.bound;

/**
 * The Cramér–Rao bound of a window set: the square roots of the diagonal of F⁻¹ (physics.md,
 * "Cramér–Rao bound"). Parameter order follows the model: n, U, w per species (SI units).
 *
 * @param sigma           1σ lower bounds per parameter; NaN when singular
 * @param singular        true when F cannot be inverted (the window set cannot pin the parameters down)
 * @param conditionNumber condition number of F scaled to a unit diagonal
 */
public record CramerRaoBound(double[] sigma, boolean singular, double conditionNumber) {
    /** Index of n in {@link #sigma} for species {@code k} (0 protons, 1 alphas). */
    public static int densityIndex(int k) {
        return 3 * k;
    }

    /** Bound of n_p, m⁻³. */
    public double sigmaDensity() {
        return sigma[0];
    }

    /** Bound of U_p, m/s. */
    public double sigmaSpeed() {
        return sigma[1];
    }

    /** Bound of w_p, m/s. */
    public double sigmaThermalSpeed() {
        return sigma[2];
    }

    /** Bound of T for a thermal speed {@code w} and temperature {@code t}: σ_T = 2 T σ_w / w (physics.md). */
    public double sigmaTemperature(int species, double w, double t) {
        return 2 * t * sigma[3 * species + 2] / w;
    }
}
