package dev.sweepline.ground.fit;

import org.hipparchus.exception.MathIllegalArgumentException;
import org.hipparchus.exception.MathIllegalStateException;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.DiagonalMatrix;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresBuilder;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresOptimizer;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresProblem;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LevenbergMarquardtOptimizer;
import org.hipparchus.util.Pair;

/**
 * One weighted Levenberg–Marquardt fit of a {@link PlasmaModel} (Hipparchus). The optimiser works in
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

    /** Fits with {@code prior} rows (joint model only; null for none). */
    static Outcome fit(PlasmaModel model, double[] amps, double[] sigma, double[] startPhysical, AlphaPrior prior) {
        int np = model.parameters();
        int m = model.windows();
        int rows = m + (prior == null ? 0 : AlphaPrior.ROWS);
        double[] start = new double[np];
        for (int a = 0; a < np; a++) {
            start[a] = isLog(a) ? Math.log(startPhysical[a]) : startPhysical[a];
        }
        double[] weights = new double[rows];
        double[] target = new double[rows];
        for (int j = 0; j < m; j++) {
            double s = Math.max(sigma[j], MIN_SIGMA_AMPS);
            weights[j] = 1 / (s * s);
            target[j] = amps[j];
        }
        for (int j = m; j < rows; j++) {
            weights[j] = 1;
        }
        double[] cur = new double[rows];
        double[][] jac = new double[rows][np];
        double[] priorResidual = new double[AlphaPrior.ROWS];
        double[][] priorGradient = new double[AlphaPrior.ROWS][np];
        double[] phys = new double[np];
        LeastSquaresProblem problem = new LeastSquaresBuilder()
                .start(start)
                .target(target)
                .weight(new DiagonalMatrix(weights))
                .model((RealVector p) -> {
                    for (int a = 0; a < np; a++) {
                        phys[a] = isLog(a) ? Math.exp(p.getEntry(a)) : p.getEntry(a);
                    }
                    model.evaluate(phys, cur, jac);
                    if (prior != null) {
                        prior.rows(phys, priorResidual, priorGradient);
                        for (int i = 0; i < AlphaPrior.ROWS; i++) {
                            cur[m + i] = priorResidual[i];
                            System.arraycopy(priorGradient[i], 0, jac[m + i], 0, np);
                        }
                    }
                    double[][] ji = new double[rows][np];
                    for (int j = 0; j < rows; j++) {
                        for (int a = 0; a < np; a++) {
                            ji[j][a] = isLog(a) ? jac[j][a] * phys[a] : jac[j][a];
                        }
                    }
                    return new Pair<>(new ArrayRealVector(cur, true), new Array2DRowRealMatrix(ji, false));
                })
                .parameterValidator(p -> {
                    for (int a = 1; a < np; a += 3) {
                        p.setEntry(a, Math.max(MIN_SPEED, Math.min(MAX_SPEED, p.getEntry(a))));
                    }
                    for (int a = 0; a < np; a++) {
                        if (isLog(a)) {
                            p.setEntry(a, Math.max(-50, Math.min(80, p.getEntry(a))));
                        }
                    }
                    return p;
                })
                .lazyEvaluation(false)
                .maxIterations(MAX_ITERATIONS)
                .maxEvaluations(MAX_EVALUATIONS)
                .build();
        LeastSquaresOptimizer.Optimum opt;
        try {
            opt = new LevenbergMarquardtOptimizer().optimize(problem);
        } catch (MathIllegalStateException | MathIllegalArgumentException e) {
            return null;
        }
        double[] p = opt.getPoint().toArray();
        double[] out = new double[np];
        for (int a = 0; a < np; a++) {
            out[a] = isLog(a) ? Math.exp(p[a]) : p[a];
            if (!Double.isFinite(out[a])) {
                return null;
            }
        }
        double[][] cov = null;
        try {
            RealMatrix c = opt.getCovariances(1e-14);
            cov = new double[np][np];
            for (int a = 0; a < np; a++) {
                for (int b = 0; b < np; b++) {
                    double sa = isLog(a) ? out[a] : 1;
                    double sb = isLog(b) ? out[b] : 1;
                    cov[a][b] = c.getEntry(a, b) * sa * sb;
                }
            }
        } catch (MathIllegalArgumentException e) {
            cov = null;
        }
        double priorChi2 = prior == null ? 0 : prior.chiSquare(out);
        double leverage = prior == null || cov == null ? 0 : prior.leverage(out, cov);
        return new Outcome(out, cov, opt.getChiSquare() - priorChi2, opt.getIterations(), priorChi2, leverage);
    }
}
