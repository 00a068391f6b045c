package dev.sweepline.ground.fit;

/**
 * The protons' flow angles once the spectrum fit has said how much of each window's current is protons and
 * how much alphas. Alphas drift relative to the protons, in the solar wind along the magnetic field, so
 * their aperture image sits at another shift; a current-weighted ratio over the spectrum ({@link
 * FlowAngleEstimator}) then returns a mix of the two angles, pulled toward the field direction by the alphas'
 * share of the current. With each species' image shifted by its own bulk angle (ICD §8 beam model), the
 * difference of window j is exactly
 * <pre>
 *   X_j = Σ_q s_q Q_qj = D(u_p)·P_j + D(u_α)·A_j
 * </pre>
 * with P_j, A_j the fitted proton and alpha currents of the window and D the half-difference ratio of
 * physics.md (split collector). D(u_p) and D(u_α) are then the two coefficients of a linear model, found by
 * weighted least squares with weights 1/Var X_j = 1/Σ_q σ_qj² (independent quadrants, ICD §8 noise). Their
 * covariance (MᵀWM)⁻¹ is the Cramér–Rao bound of the two ratios for known P_j, A_j (Kay 1993, linear model
 * [memory]), so the proton ratio's 1σ accounts for what the alpha column takes from it. Without alphas the
 * model is X_j = D(u_p)·P_j alone. The noise of P_j, A_j (they come from the summed currents) is ignored:
 * the sum and the difference of the quadrants are uncorrelated when the quadrants' variances are equal,
 * Cov(X_j, S_j) = Σ_q s_q σ_qj², which is a few per cent of Var X_j at the angles that matter here.
 */
final class SpeciesFlowAngles {
    private static final int[] SIGN_X = {1, -1, -1, 1};
    private static final int[] SIGN_Y = {1, 1, -1, -1};
    /** Smallest determinant of the scaled 2×2 normal matrix for a two-column model (common practice: ~√ε). */
    private static final double MIN_SCALED_DETERMINANT = 1e-8;

    private SpeciesFlowAngles() {
    }

    /**
     * The proton angles of {@code in} given the fitted species currents; {@code preliminary} where it is not
     * measured or beyond the split's reach (the ratio carries no shape there), or when the model's columns
     * cannot be separated.
     *
     * @param protonAmps fitted proton current per window, A
     * @param alphaAmps  fitted alpha current per window, A; null for a proton-only fit
     */
    static FlowAngles refine(SpectrumInput in, CupGeometry cup, FlowAngles preliminary, double[] protonAmps,
            double[] alphaAmps) {
        if (!preliminary.measured() || !in.hasQuadrants() || FlowAngleEstimator.saturated(preliminary.ratioX())
                || FlowAngleEstimator.saturated(preliminary.ratioY())
                || FlowAngleEstimator.beyondReach(preliminary, cup)) {
            return preliminary;
        }
        double[] x = ratio(in, protonAmps, alphaAmps, SIGN_X);
        double[] y = ratio(in, protonAmps, alphaAmps, SIGN_Y);
        if (x == null || y == null || FlowAngleEstimator.saturated(x[0]) || FlowAngleEstimator.saturated(y[0])) {
            return preliminary;
        }
        return new FlowAngles(FlowAngleEstimator.angle(cup, x[0]), FlowAngleEstimator.angle(cup, y[0]),
                FlowAngleEstimator.sigma(cup, x[0], x[1]), FlowAngleEstimator.sigma(cup, y[0], y[1]),
                preliminary.ratioX(), preliminary.ratioY());
    }

    /** {D(u_p), its 1σ} for one axis, or null when the normal equations are degenerate. */
    private static double[] ratio(SpectrumInput in, double[] protonAmps, double[] alphaAmps, int[] sign) {
        double spp = 0;
        double spa = 0;
        double saa = 0;
        double spx = 0;
        double sax = 0;
        double[][] q = in.quadrantAmps();
        double[][] qs = in.quadrantSigmaAmps();
        for (int j = 0; j < in.windows(); j++) {
            double xj = 0;
            double var = 0;
            for (int k = 0; k < 4; k++) {
                xj += sign[k] * q[k][j];
                var += qs[k][j] * qs[k][j];
            }
            if (!(var > 0)) {
                continue;
            }
            double w = 1 / var;
            double p = protonAmps[j];
            double a = alphaAmps == null ? 0 : alphaAmps[j];
            spp += w * p * p;
            spa += w * p * a;
            saa += w * a * a;
            spx += w * p * xj;
            sax += w * a * xj;
        }
        if (!(spp > 0)) {
            return null;
        }
        // the scaled determinant 1 − ρ² says how far the two columns are from parallel
        if (saa > 0 && 1 - spa * spa / (spp * saa) > MIN_SCALED_DETERMINANT) {
            double det = spp * saa - spa * spa;
            return new double[] {(saa * spx - spa * sax) / det, Math.sqrt(saa / det)};
        }
        return new double[] {spx / spp, Math.sqrt(1 / spp)};
    }
}
