package dev.sweepline.ground.fit;


/**
 * One weighted Levenberg–Marquardt fit of a {@link PlasmaModel} ({@link LevenbergMarquardt}). The optimiser works in
 * (ln n, U, ln w) per species, so that densities and thermal speeds stay positive; the covariance
 * (JᵀWJ)⁻¹ is mapped back to physical parameters. A joint fit may carry an {@link AlphaPrior}: its rows
 * are appended to the window rows as whitened pseudo-observations (target 0, weight 1), so that the
 * optimiser minimises χ²_data + χ²_prior and the covariance is (F_data + F_prior)⁻¹.
 */
final class LeastSquaresRun {
    /** Iterations allowed: a converging fit of this model needs well under 50 (measured on the tests). */
    static final int MAX_ITERATIONS = 200;
    /** Model evaluations allowed. */
    static final int MAX_EVALUATIONS = 400;
    /** Smallest 1σ used as a weight, A: guards against a zero noise estimate. */
    static final double MIN_SIGMA_AMPS = 1e-18;
    /** Bounds of the speed while iterating, m/s: a guard, far outside any solar wind. */
    static final double MIN_SPEED = 1e3;
    static final double MAX_SPEED = 1e7;

    /**
     * The outcome.
     *
     * @param parameters physical parameters
     * @param covariance physical covariance, or null when singular
     * @param chiSquare  Σ (r_j/σ_j)² over the windows
     * @param iterations iterations used
     * @param priorChiSquare the prior rows' part of the minimised χ², 0 without a prior
     * @param leverage   parameters the prior pins down ({@link AlphaPrior#leverage}), 0 without a prior
     */
    record Outcome(double[] parameters, double[][] covariance, double chiSquare, int iterations,
            double priorChiSquare, double leverage) {
        /** The minimised χ²: windows and prior rows. */
        double totalChiSquare() {
            return chiSquare + priorChiSquare;
        }

        /**
         * The same fit with every density times {@code factor}: the window currents are linear in n·A, so a
         * change of the acceptance A(θ)/A(0) by 1/factor leaves the fit as it is but for n (and its
         * covariance rows).
         */
        Outcome withDensityScale(double factor) {
            double[] p = parameters.clone();
            double[][] c = covariance == null ? null : new double[p.length][];
            for (int a = 0; a < p.length; a++) {
                p[a] *= a % 3 == 0 ? factor : 1;
                if (c != null) {
                    c[a] = covariance[a].clone();
                    for (int b = 0; b < p.length; b++) {
                        c[a][b] *= (a % 3 == 0 ? factor : 1) * (b % 3 == 0 ? factor : 1);
                    }
                }
            }
            return new Outcome(p, c, chiSquare, iterations, priorChiSquare, leverage);
        }

        /** Free parameters in effect: the model's count less what the prior pins down. */
        double effectiveParameters() {
            return parameters.length - leverage;
        }
    }

    private LeastSquaresRun() {
    }

    private static boolean isLog(int a) {
        return a % 3 != 1;
    }

    /** Fits; returns null when the optimiser fails to converge or leaves finite numbers. */
    static Outcome fit(PlasmaModel model, double[] amps, double[] sigma, double[] startPhysical) {
        return fit(model, amps, sigma, startPhysical, null);
    }

    /** Fits with {@code prior} rows (joint model only; null for none), with a workspace of its own. */
    static Outcome fit(PlasmaModel model, double[] amps, double[] sigma, double[] startPhysical, AlphaPrior prior) {
        return fit(new LevenbergMarquardt(), model, amps, sigma, startPhysical, prior);
    }

    /** Fits in the workspace {@code lm}; null when it fails to converge or leaves no finite numbers. */
    static Outcome fit(LevenbergMarquardt lm, PlasmaModel model, double[] amps, double[] sigma,
            double[] startPhysical, AlphaPrior prior) {
        if (!lm.fit(model, amps, sigma, startPhysical, prior)) {
            return null;
        }
        return outcome(lm, prior);
    }

    /** The outcome of {@code lm}'s last successful fit, with the prior's part of χ² and its leverage. */
    static Outcome outcome(LevenbergMarquardt lm, AlphaPrior prior) {
        int np = lm.parameterCount();
        double[] out = java.util.Arrays.copyOf(lm.parameters(), np);
        double[][] cov = null;
        if (lm.hasCovariance()) {
            cov = new double[np][np];
            for (int a = 0; a < np; a++) {
                System.arraycopy(lm.covariance(), a * np, cov[a], 0, np);
            }
        }
        double priorChi2 = prior == null ? 0 : prior.chiSquare(out);
        double leverage = prior == null || cov == null ? 0 : prior.leverage(out, cov);
        return new Outcome(out, cov, lm.chiSquare() - priorChi2, lm.iterations(), priorChi2, leverage);
    }
}
