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
 * The fit as the ground made it before its own optimiser: Hipparchus' {@code LevenbergMarquardtOptimizer}
 * (default tolerances, QR-based steps, covariance by QR with threshold 1e-14) on the same rows, weights,
 * (ln n, U, ln w) parameters and clamps. Kept in test scope as the outside reference that {@link
 * LevenbergMarquardt} is checked against ({@code LevenbergMarquardtAgreementTest}).
 */
final class HipparchusLeastSquares {
    private HipparchusLeastSquares() {
    }

    /** n and w as logarithms; U and a drift model's ΔU (its last parameter, {@code drift}) as they are. */
    private static boolean isLog(int a, int drift) {
        return a != drift && a % 3 != 1;
    }

    /** Fits with {@code prior} rows (joint model only; null for none). */
    static LeastSquaresRun.Outcome fit(PlasmaModel model, double[] amps, double[] sigma, double[] startPhysical, AlphaPrior prior) {
        return fit(new LevenbergMarquardtOptimizer(), model, amps, sigma, startPhysical, prior);
    }

    /**
     * The same with tolerances 1e-14 (cost, parameters, orthogonality): the minimum to rounding, the judge
     * between two points that differ at the default tolerances' level.
     */
    static LeastSquaresRun.Outcome fitTight(PlasmaModel model, double[] amps, double[] sigma, double[] startPhysical,
            AlphaPrior prior) {
        return fit(new LevenbergMarquardtOptimizer().withCostRelativeTolerance(TIGHT)
                .withParameterRelativeTolerance(TIGHT).withOrthoTolerance(TIGHT), model, amps, sigma, startPhysical, prior);
    }

    /** Tolerances of {@link #fitTight}: a hundred times the double epsilon, above Hipparchus' floor of 2 ε. */
    static final double TIGHT = 1e-14;

    private static LeastSquaresRun.Outcome fit(LevenbergMarquardtOptimizer optimizer, PlasmaModel model, double[] amps,
            double[] sigma, double[] startPhysical, AlphaPrior prior) {
        int np = model.parameters();
        int m = model.windows();
        int d = model.driftIndex();
        int rows = m + (prior == null ? 0 : AlphaPrior.ROWS);
        double[] start = new double[np];
        for (int a = 0; a < np; a++) {
            start[a] = isLog(a, d) ? Math.log(startPhysical[a]) : startPhysical[a];
        }
        double[] weights = new double[rows];
        double[] target = new double[rows];
        for (int j = 0; j < m; j++) {
            double s = Math.max(sigma[j], LeastSquaresRun.MIN_SIGMA_AMPS);
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
                        phys[a] = isLog(a, d) ? Math.exp(p.getEntry(a)) : p.getEntry(a);
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
                            ji[j][a] = isLog(a, d) ? jac[j][a] * phys[a] : jac[j][a];
                        }
                    }
                    return new Pair<>(new ArrayRealVector(cur, true), new Array2DRowRealMatrix(ji, false));
                })
                .parameterValidator(p -> {
                    for (int a = 1; a < np; a += 3) {
                        p.setEntry(a, Math.max(LeastSquaresRun.MIN_SPEED, Math.min(LeastSquaresRun.MAX_SPEED, p.getEntry(a))));
                    }
                    for (int a = 0; a < np; a++) {
                        if (isLog(a, d)) {
                            p.setEntry(a, Math.max(-50, Math.min(80, p.getEntry(a))));
                        }
                    }
                    if (d >= 0) {
                        p.setEntry(d, Math.max(-PlasmaModel.MAX_SPEED_CHANGE, Math.min(PlasmaModel.MAX_SPEED_CHANGE, p.getEntry(d))));
                    }
                    return p;
                })
                .lazyEvaluation(false)
                .maxIterations(LeastSquaresRun.MAX_ITERATIONS)
                .maxEvaluations(LeastSquaresRun.MAX_EVALUATIONS)
                .build();
        LeastSquaresOptimizer.Optimum opt;
        try {
            opt = optimizer.optimize(problem);
        } catch (MathIllegalStateException | MathIllegalArgumentException e) {
            return null;
        }
        double[] p = opt.getPoint().toArray();
        double[] out = new double[np];
        for (int a = 0; a < np; a++) {
            out[a] = isLog(a, d) ? Math.exp(p[a]) : p[a];
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
                    double sa = isLog(a, d) ? out[a] : 1;
                    double sb = isLog(b, d) ? out[b] : 1;
                    cov[a][b] = c.getEntry(a, b) * sa * sb;
                }
            }
        } catch (MathIllegalArgumentException e) {
            cov = null;
        }
        double priorChi2 = prior == null ? 0 : prior.chiSquare(out);
        double leverage = prior == null || cov == null ? 0 : prior.leverage(out, cov);
        return new LeastSquaresRun.Outcome(out, cov, opt.getChiSquare() - priorChi2, opt.getIterations(), priorChi2, leverage);
    }
}
