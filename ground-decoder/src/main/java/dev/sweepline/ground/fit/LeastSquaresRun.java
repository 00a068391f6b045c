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
 * (JᵀWJ)⁻¹ is mapped back to physical parameters.
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
     * @param chiSquare  Σ (r_j/σ_j)²
     * @param iterations iterations used
     */
    record Outcome(double[] parameters, double[][] covariance, double chiSquare, int iterations) {
    }

    private LeastSquaresRun() {
    }

    private static boolean isLog(int a) {
        return a % 3 != 1;
    }

    /** Fits; returns null when the optimiser fails to converge or leaves finite numbers. */
    static Outcome fit(PlasmaModel model, double[] amps, double[] sigma, double[] startPhysical) {
        int np = model.parameters();
        int m = model.windows();
        double[] start = new double[np];
        for (int a = 0; a < np; a++) {
            start[a] = isLog(a) ? Math.log(startPhysical[a]) : startPhysical[a];
        }
        double[] weights = new double[m];
        for (int j = 0; j < m; j++) {
            double s = Math.max(sigma[j], MIN_SIGMA_AMPS);
            weights[j] = 1 / (s * s);
        }
        double[] cur = new double[m];
        double[][] jac = new double[m][np];
        double[] phys = new double[np];
        LeastSquaresProblem problem = new LeastSquaresBuilder()
                .start(start)
                .target(amps)
                .weight(new DiagonalMatrix(weights))
                .model((RealVector p) -> {
                    for (int a = 0; a < np; a++) {
                        phys[a] = isLog(a) ? Math.exp(p.getEntry(a)) : p.getEntry(a);
                    }
                    model.evaluate(phys, cur, jac);
                    double[][] ji = new double[m][np];
                    for (int j = 0; j < m; j++) {
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
        return new Outcome(out, cov, opt.getChiSquare(), opt.getIterations());
    }
}
