package dev.sweepline.sim.design;

import java.util.Arrays;

/**
 * The D-optimal approximate design on a finite set of candidates: shares s_j ≥ 0, Σ s_j = 1, that
 * maximise det F(s), F(s) = Σ_j s_j M_j, for the candidates' 3 x 3 (p = 3) information matrices M_j.
 *
 * <p>Method, in two stages. First a few updates of the multiplicative algorithm s_j ← s_j d_j(s) / p,
 * with d_j(s) = tr(F(s)⁻¹ M_j) the standardised variance of candidate j, and the support-point deletion
 * of Harman and Pronzato ({@link MultiplicativeAlgorithm}): its shares gather on the region of the
 * optimum's support, but the last digits would take it thousands of updates. Then {@link SupportNewton}:
 * Newton's method for the shares on the candidates holding a sizeable share, and a vertex step onto the
 * candidate of largest d_j whenever one exceeds the stopping rule, until the rule holds on every
 * candidate. Should that stall, the multiplicative algorithm is run to the end instead (first with
 * deletion, then, if a dropped candidate violates the rule, without), as the solver did alone before.
 *
 * <p>Stopping rule, from the general equivalence theorem (Kiefer and Wolfowitz 1960, "The equivalence
 * of two extremum problems", Canadian Journal of Mathematics 12, 363-366 [memory]): for every design
 * Σ_j s_j d_j = tr(F⁻¹ F) = p, so max_j d_j ≥ p, with equality exactly at the D-optimum. The solver
 * stops when max_j d_j ≤ p (1 + tolerance), checked on every candidate; then log det F* − log det F ≤
 * max_j d_j − p (the same theorem's bound, from the concavity of log det), so the D-efficiency of the
 * found design is at least exp(−tolerance) and the yardstick is low by at most that fraction.
 */
public final class DesignSolver {
    /** Iteration limit of the multiplicative algorithm when it runs alone (the fallback). */
    static final int MAX_ITERATIONS = 200_000;
    /**
     * Multiplicative updates before Newton takes over: on the built-in scenarios' runs they leave
     * the optimum's support among the candidates holding at least {@link #SUPPORT_FRACTION} of the
     * largest share (a support point missed is added back by the vertex step; DesignSolverTest).
     */
    static final int START_ITERATIONS = 40;
    /** Share, relative to the largest, of the candidates Newton starts on. */
    static final double SUPPORT_FRACTION = 0.2;

    /**
     * A converged design.
     *
     * @param shares       the share of each candidate (0 for those off the support)
     * @param information  F(s) = Σ_j s_j M_j
     * @param variances    d_j = tr(F⁻¹ M_j) for every candidate
     * @param maxVariance  max_j d_j, ≥ p; p (1 + tolerance) or less when converged
     * @param iterations   multiplicative updates and Newton steps made
     * @param converged    whether the stopping rule was met within the iteration limit
     */
    public record Solution(double[] shares, double[][] information, double[] variances, double maxVariance,
            int iterations, boolean converged) {
    }

    private DesignSolver() {
    }

    /** The D-optimal design over the candidates {@code m} (each 3 x 3, positive semi-definite); null if F stays singular. */
    public static Solution solve(double[][][] m, double tolerance) {
        int p = m[0].length;
        // the candidates in one array (candidate j's element (a, b) at j p² + a p + b)
        double[] flat = flatten(m, p);
        MultiplicativeAlgorithm start = new MultiplicativeAlgorithm(flat, p, true);
        switch (start.run(tolerance, START_ITERATIONS)) {
            case SINGULAR:
                return null;
            case MET:
                Solution met = solution(start, p, tolerance);
                if (met.converged()) {
                    return met;
                }
                break;
            case LIMIT:
                break;
        }
        Solution s = new SupportNewton(flat, p).solve(start.share, SUPPORT_FRACTION, tolerance, start.iterations);
        return s != null ? s : multiplicative(flat, p, tolerance);
    }

    /** The multiplicative algorithm alone, to the stopping rule (with deletion, and without if that fails). */
    static Solution multiplicative(double[] flat, int p, double tolerance) {
        Solution s = multiplicative(flat, p, tolerance, true);
        return s == null || s.converged() ? s : multiplicative(flat, p, tolerance, false);
    }

    private static Solution multiplicative(double[] flat, int p, double tolerance, boolean dropping) {
        MultiplicativeAlgorithm run = new MultiplicativeAlgorithm(flat, p, dropping);
        switch (run.run(tolerance, MAX_ITERATIONS)) {
            case SINGULAR:
                return null;
            case MET:
                return solution(run, p, tolerance);
            case LIMIT:
                break;
        }
        // the limit reached: the figures of every candidate at the last shares
        combine(flat, p, run.share, run.f);
        double[] inv = new double[p * p];
        if (!invert3(run.f, inv)) {
            return null;
        }
        for (int j = 0; j < run.d.length; j++) {
            run.d[j] = traceOfProduct(inv, flat, j * p * p, p);
        }
        Solution s = solution(run, p, tolerance);
        return new Solution(s.shares(), s.information(), s.variances(), s.maxVariance(), s.iterations(), false);
    }

    /** The solution at the algorithm's last evaluated design, converged if the rule holds on every candidate. */
    private static Solution solution(MultiplicativeAlgorithm run, int p, double tolerance) {
        double all = 0;
        for (double v : run.d) {
            all = Math.max(all, v);
        }
        double[][] f = new double[p][p];
        for (int r = 0; r < p; r++) {
            System.arraycopy(run.f, r * p, f[r], 0, p);
        }
        return new Solution(run.share.clone(), f, run.d.clone(), all, run.iterations, all <= p * (1 + tolerance));
    }

    /** d(M) = tr(F⁻¹ M) for the design {@code shares} over {@code m}: the standardised variance of a candidate. */
    public static double[] variances(double[][][] m, double[] shares) {
        double[][] f = new double[m[0].length][m[0].length];
        combine(m, shares, f);
        double[][] inv = ProtonInformation.inverse(f);
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

    /** F = Σ_j s_j M_j over the flattened candidates, into {@code f} (p x p, row-major). */
    static void combine(double[] flat, int p, double[] share, double[] f) {
        Arrays.fill(f, 0);
        int pp = p * p;
        for (int j = 0, n = share.length; j < n; j++) {
            double sj = share[j];
            if (sj == 0) {
                continue;
            }
            int off = j * pp;
            for (int e = 0; e < pp; e++) {
                f[e] += sj * flat[off + e];
            }
        }
    }

    /** F = Σ_i w_i M_{support_i} over the first {@code size} support points, into {@code f}. */
    static void combine(double[] flat, int p, int[] support, double[] w, int size, double[] f) {
        Arrays.fill(f, 0);
        int pp = p * p;
        for (int i = 0; i < size; i++) {
            double wi = w[i];
            int off = support[i] * pp;
            for (int e = 0; e < pp; e++) {
                f[e] += wi * flat[off + e];
            }
        }
    }

    /** tr(inv M_j) with candidate j's matrix at {@code off} of the flattened, inv p x p row-major. */
    static double traceOfProduct(double[] inv, double[] flat, int off, int p) {
        double t = 0;
        for (int a = 0; a < p; a++) {
            for (int b = 0; b < p; b++) {
                t += inv[a * p + b] * flat[off + b * p + a];
            }
        }
        return t;
    }

    /** Determinant of a 3 x 3 matrix, row-major. */
    static double det3(double[] f) {
        return f[0] * (f[4] * f[8] - f[5] * f[7]) - f[1] * (f[3] * f[8] - f[5] * f[6])
                + f[2] * (f[3] * f[7] - f[4] * f[6]);
    }

    /** Inverse of a 3 x 3 matrix, row-major (adjugate over determinant), into {@code inv}; false when singular. */
    static boolean invert3(double[] f, double[] inv) {
        double det = det3(f);
        if (!(Math.abs(det) > 0) || !Double.isFinite(det)) {
            return false;
        }
        inv[0] = (f[4] * f[8] - f[5] * f[7]) / det;
        inv[1] = (f[2] * f[7] - f[1] * f[8]) / det;
        inv[2] = (f[1] * f[5] - f[2] * f[4]) / det;
        inv[3] = (f[5] * f[6] - f[3] * f[8]) / det;
        inv[4] = (f[0] * f[8] - f[2] * f[6]) / det;
        inv[5] = (f[2] * f[3] - f[0] * f[5]) / det;
        inv[6] = (f[3] * f[7] - f[4] * f[6]) / det;
        inv[7] = (f[1] * f[6] - f[0] * f[7]) / det;
        inv[8] = (f[0] * f[4] - f[1] * f[3]) / det;
        return true;
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
