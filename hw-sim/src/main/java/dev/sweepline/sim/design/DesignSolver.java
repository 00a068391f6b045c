package dev.sweepline.sim.design;

import java.util.Arrays;

/**
 * The D-optimal approximate design on a finite set of candidates: shares s_j ≥ 0, Σ s_j = 1, that
 * maximise det F(s), F(s) = Σ_j s_j M_j, for the candidates' 3 x 3 (p = 3) information matrices M_j.
 *
 * <p>Method: the multiplicative algorithm s_j ← s_j d_j(s) / p, with d_j(s) = tr(F(s)⁻¹ M_j) the
 * standardised variance of candidate j (Silvey, Titterington and Torsney 1978, "An algorithm for
 * optimal designs on a finite design space", Communications in Statistics A 7, 1379-1389 [memory]),
 * which increases det F monotonically from any design with all shares positive. Candidates that
 * cannot support an optimal design are dropped as soon as the bound of Harman and Pronzato (2007,
 * "Improvements on removing nonoptimal support points in D-optimum design algorithms", Statistics and
 * Probability Letters 77, 90-94 [memory]) shows it: with ε = max_j d_j − p, no support point of a
 * D-optimal design has d_j below h = p (1 + ε/2 − √(ε (4 + ε − 4/p)) / 2). Dropping them only speeds
 * the convergence; the stopping rule is checked on every candidate, dropped or not, and if a dropped
 * one violates it the solver runs again without dropping.
 *
 * <p>Stopping rule, from the general equivalence theorem (Kiefer and Wolfowitz 1960, "The equivalence
 * of two extremum problems", Canadian Journal of Mathematics 12, 363-366 [memory]): for every design
 * Σ_j s_j d_j = tr(F⁻¹ F) = p, so max_j d_j ≥ p, with equality exactly at the D-optimum. The solver
 * stops when max_j d_j ≤ p (1 + tolerance); then log det F* − log det F ≤ max_j d_j − p (the same
 * theorem's bound, from the concavity of log det), so the D-efficiency of the found design is at
 * least exp(−tolerance) and the yardstick is low by at most that fraction.
 */
public final class DesignSolver {
    /** Iteration limit; the demo cup's designs converge to 1e-6 in far fewer (DesignSolverTest). */
    static final int MAX_ITERATIONS = 200_000;

    /**
     * A converged design.
     *
     * @param shares       the share of each candidate (0 for dropped ones)
     * @param information  F(s) = Σ_j s_j M_j
     * @param variances    d_j = tr(F⁻¹ M_j) for every candidate
     * @param maxVariance  max_j d_j, ≥ p; p (1 + tolerance) or less when converged
     * @param iterations   multiplicative updates made
     * @param converged    whether the stopping rule was met within the iteration limit
     */
    public record Solution(double[] shares, double[][] information, double[] variances, double maxVariance,
            int iterations, boolean converged) {
    }

    private DesignSolver() {
    }

    /** The D-optimal design over the candidates {@code m} (each 3 x 3, positive semi-definite); null if F stays singular. */
    public static Solution solve(double[][][] m, double tolerance) {
        Solution s = solve(m, tolerance, true);
        if (s != null && !s.converged()) {
            return solve(m, tolerance, false);
        }
        return s;
    }

    private static Solution solve(double[][][] m, double tolerance, boolean dropping) {
        int n = m.length;
        int p = m[0].length;
        // the candidates in one array (candidate j's element (a, b) at j p² + a p + b): the same sums in the
        // same order as over m, without the rows' indirection
        double[] flat = flatten(m, p);
        double[] share = new double[n];
        boolean[] active = new boolean[n];
        int count = 0;
        for (int j = 0; j < n; j++) {
            active[j] = trace(m[j]) > 0;
            count += active[j] ? 1 : 0;
        }
        for (int j = 0; j < n; j++) {
            share[j] = active[j] ? 1.0 / count : 0;
        }
        double[] d = new double[n];
        double[][] f = new double[p][p];
        for (int it = 0; it < MAX_ITERATIONS; it++) {
            combine(flat, p, share, f);
            double[][] inv = invert(f);
            if (inv == null) {
                return null;
            }
            double worst = 0;
            for (int j = 0; j < n; j++) {
                if (active[j]) {
                    d[j] = traceOfProduct(inv, flat, j * p * p);
                    worst = Math.max(worst, d[j]);
                }
            }
            if (worst <= p * (1 + tolerance)) {
                // the dropped candidates' variances are needed only now, for the stopping rule on every candidate
                double all = 0;
                for (int j = 0; j < n; j++) {
                    if (!active[j]) {
                        d[j] = traceOfProduct(inv, flat, j * p * p);
                    }
                    all = Math.max(all, d[j]);
                }
                return new Solution(share, f, d, all, it, all <= p * (1 + tolerance));
            }
            double eps = worst - p;
            double bound = dropping ? p * (1 + eps / 2 - Math.sqrt(eps * (4 + eps - 4.0 / p)) / 2) : 0;
            double sum = 0;
            for (int j = 0; j < n; j++) {
                if (!active[j]) {
                    continue;
                }
                if (d[j] < bound) {
                    active[j] = false;
                    share[j] = 0;
                } else {
                    share[j] *= d[j] / p;
                    sum += share[j];
                }
            }
            for (int j = 0; j < n; j++) {
                share[j] /= sum; // renormalise after dropping (the update alone keeps Σ s_j = 1)
            }
        }
        combine(flat, p, share, f);
        double[][] inv = invert(f);
        if (inv == null) {
            return null;
        }
        double all = 0;
        for (int j = 0; j < n; j++) {
            d[j] = traceOfProduct(inv, flat, j * p * p);
            all = Math.max(all, d[j]);
        }
        return new Solution(share, f, d, all, MAX_ITERATIONS, false);
    }

    /** d(M) = tr(F⁻¹ M) for the design {@code shares} over {@code m}: the standardised variance of a candidate. */
    public static double[] variances(double[][][] m, double[] shares) {
        double[][] f = new double[m[0].length][m[0].length];
        combine(m, shares, f);
        double[][] inv = invert(f);
        double[] d = new double[m.length];
        for (int j = 0; j < m.length; j++) {
            d[j] = inv == null ? Double.POSITIVE_INFINITY : traceOfProduct(inv, m[j]);
        }
        return d;
    }

    static void combine(double[][][] m, double[] share, double[][] f) {
        for (double[] row : f) {
            Arrays.fill(row, 0);
        }
        for (int j = 0; j < m.length; j++) {
            if (share[j] == 0) {
                continue;
            }
            for (int a = 0; a < f.length; a++) {
                for (int b = 0; b < f.length; b++) {
                    f[a][b] += share[j] * m[j][a][b];
                }
            }
        }
    }

    private static double[] flatten(double[][][] m, int p) {
        double[] flat = new double[m.length * p * p];
        for (int j = 0; j < m.length; j++) {
            for (int a = 0; a < p; a++) {
                System.arraycopy(m[j][a], 0, flat, (j * p + a) * p, p);
            }
        }
        return flat;
    }

    /** {@link #combine(double[][][], double[], double[][])} over the flattened candidates. */
    private static void combine(double[] flat, int p, double[] share, double[][] f) {
        for (double[] row : f) {
            Arrays.fill(row, 0);
        }
        for (int j = 0, n = share.length; j < n; j++) {
            if (share[j] == 0) {
                continue;
            }
            double sj = share[j];
            int off = j * p * p;
            for (int a = 0; a < p; a++) {
                double[] fa = f[a];
                for (int b = 0; b < p; b++) {
                    fa[b] += sj * flat[off + a * p + b];
                }
            }
        }
    }

    /** {@link #traceOfProduct(double[][], double[][])} with candidate j's matrix at {@code off} of the flattened. */
    private static double traceOfProduct(double[][] inv, double[] flat, int off) {
        int p = inv.length;
        double t = 0;
        for (int a = 0; a < p; a++) {
            double[] ia = inv[a];
            for (int b = 0; b < p; b++) {
                t += ia[b] * flat[off + b * p + a];
            }
        }
        return t;
    }

    private static double[][] invert(double[][] f) {
        return ProtonInformation.inverse(f);
    }

    private static double trace(double[][] mj) {
        double t = 0;
        for (int a = 0; a < mj.length; a++) {
            t += mj[a][a];
        }
        return t;
    }

    private static double traceOfProduct(double[][] inv, double[][] mj) {
        double t = 0;
        for (int a = 0; a < inv.length; a++) {
            for (int b = 0; b < inv.length; b++) {
                t += inv[a][b] * mj[b][a];
            }
        }
        return t;
    }
}
