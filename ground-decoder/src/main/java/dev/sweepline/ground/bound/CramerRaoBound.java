package dev.sweepline.ground.bound;

import dev.sweepline.ground.fit.FlowAngles;

/**
 * The Cramér–Rao bound of a window set: the square roots of the diagonal of F⁻¹ (physics.md,
 * "Cramér–Rao bound"). Parameter order follows the model: n, U, w per species (SI units), then a drift
 * model's ΔU (physics.md, "Speed drift within an interleaved sweep"): the bounds of the others are then with ΔU unknown.
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

    /**
     * Bound of n_p with the angles' uncertainty: the windows fix only n·A(θ), so with ln n = ln(nA) − ln A(θ)
     * and the angle measured apart (the quadrant differences, independent of the summed current),
     * σ_n² = σ_n|θ² + n² σ_lnA² (physics.md, "Density and speed beyond the split's reach").
     *
     * @param densityPerM3 the fitted n_p, m⁻³
     * @param sigmaLogArea 1σ of ln A(θ) from the angles ({@code PlasmaFit.sigmaLogArea}); 0 inside full acceptance
     */
    public double sigmaDensity(double densityPerM3, double sigmaLogArea) {
        return Math.hypot(sigmaDensity(), densityPerM3 * sigmaLogArea);
    }

    /** Bound of U_p, m/s. */
    public double sigmaSpeed() {
        return sigma[1];
    }

    /**
     * Bound of the proton bulk speed |U| = U_n / cos θ: the normal speed's bound with the angles' 1σ
     * propagated, σ_U² = S² σ_Un² + [U_n tx (1+tx²)/S]² σθx² + [U_n ty (1+ty²)/S]² σθy², S = 1/cos θ
     * (derivation in {@link FlowAngles#sigmaBulkSpeed} and physics.md "Bulk speed from the normal speed and
     * the angles"). The angles' 1σ are the bound of the quadrant differences for the fitted species shares
     * ({@code SpeciesFlowAngles}).
     *
     * @param normalSpeedMPerS the fitted U_n, m/s
     */
    public double sigmaBulkSpeed(FlowAngles angles, double normalSpeedMPerS) {
        return angles.sigmaBulkSpeed(normalSpeedMPerS, sigmaSpeed());
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
