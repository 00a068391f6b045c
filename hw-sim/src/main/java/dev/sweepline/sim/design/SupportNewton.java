package dev.sweepline.sim.design;

/**
 * The D-optimal shares found on a small support and extended until the equivalence theorem holds on
 * every candidate: Newton's method for log det F on the simplex of the support, then a vertex step
 * onto the candidate of largest d_j when one exceeds p (1 + tolerance), and Newton again.
 *
 * <p>Newton on the support S: φ(s) = log det Σ_{i∈S} s_i M_i has the gradient ∂φ/∂s_i = d_i =
 * tr(F⁻¹ M_i) and the Hessian ∂²φ/∂s_i∂s_k = −tr(F⁻¹ M_i F⁻¹ M_k) (the derivatives of log det, e.g.
 * Boyd and Vandenberghe 2004, Convex Optimization, §7.5.2 and appendix A.4.1 [memory]). The step Δ
 * maximises the quadratic model under Σ Δ_i = 0: Q Δ + λ 1 = d, 1ᵀ Δ = 0 with Q the negated Hessian
 * (plus 1e-10 of its largest diagonal element, for supports of more than p (p + 1) / 2 points, where
 * Q is singular); the step is cut where a share reaches 0 (that candidate leaves the support) and
 * halved until det F rises enough (Armijo's rule, Nocedal and Wright 2006, Numerical Optimization,
 * §3.1 [memory]). At the optimum on S every d_i equals p (the Lagrange condition with Σ s_i d_i = p),
 * and Newton reaches it quadratically: a handful of steps where the multiplicative algorithm takes
 * thousands of updates.
 *
 * <p>The vertex step is that of Fedorov and Wynn (Fedorov 1972, Theory of Optimal Experiments,
 * §2.5 [memory]; Wynn 1970, Annals of Mathematical Statistics 41, 1655-1664 [memory]): s ← (1 − α) s
 * + α e_k with α = (d_k − p) / (p (d_k − 1)), the exact line search for a rank-one M_k and a start
 * for Newton otherwise. Together they are the vertex-exchange scheme with an exact weight optimisation
 * on the current support, as in Yu's cocktail algorithm (Yu 2011, "D-optimal designs via a cocktail
 * algorithm", Statistics and Computing 21, 475-481 [memory]).
 */
final class SupportNewton {
    /** Newton steps per support before the solver gives up (it falls back on the multiplicative algorithm). */
    static final int MAX_STEPS = 200;
    /** Armijo's sufficient-increase fraction (Nocedal and Wright 2006, §3.1: 1e-4 is the usual choice [memory]). */
    private static final double ARMIJO = 1e-4;
    /** Relative regularisation of Q (see the class note). */
    private static final double RIDGE = 1e-10;

    private final double[] flat;
    private final int p;
    private final int pp;
    private final int n;
    private int[] support;
    private double[] w;
    private int size;
    private final double[] f;
    private final double[] inv;
    private double[] a;
    private double[] ds;
    private double[] kkt;
    private double[] x;
    private double[] trial;
    /** d_j of every candidate at the last check. */
    private final double[] d;
    /** Newton steps made. */
    int steps;

    SupportNewton(double[] flat, int p) {
        this.flat = flat;
        this.p = p;
        this.pp = p * p;
        this.n = flat.length / pp;
        this.f = new double[pp];
        this.inv = new double[pp];
        this.d = new double[n];
        resize(8);
    }

    /**
     * The D-optimal design from the shares {@code start} (the support is taken as the candidates whose
     * share is at least {@code supportFraction} of the largest), to max_j d_j ≤ p (1 + tolerance); null
     * when Newton stalls or the support keeps growing (the caller falls back).
     *
     * @param before updates made before (reported in the solution's iteration count)
     */
    DesignSolver.Solution solve(double[] start, double supportFraction, double tolerance, int before) {
        if (!startFrom(start, supportFraction)) {
            return null;
        }
        // on the support, d_i = p to far below the tolerance: the check on every candidate decides
        for (int round = 0; round <= n; round++) {
            if (!newton(p * tolerance)) {
                return null;
            }
            DesignSolver.combine(flat, p, support, w, size, f);
            if (!DesignSolver.invert3(f, inv)) {
                return null;
            }
            int worst = 0;
            for (int j = 0; j < n; j++) {
                d[j] = DesignSolver.traceOfProduct(inv, flat, j * pp, p);
                if (d[j] > d[worst]) {
                    worst = j;
                }
            }
            if (d[worst] <= p * (1 + tolerance)) {
                return solution(before);
            }
            add(worst, d[worst]);
        }
        return null;
    }

    private DesignSolver.Solution solution(int before) {
        double[] shares = new double[n];
        for (int i = 0; i < size; i++) {
            shares[support[i]] = w[i];
        }
        double[][] information = new double[p][p];
        for (int r = 0; r < p; r++) {
            System.arraycopy(f, r * p, information[r], 0, p);
        }
        double max = 0;
        for (double v : d) {
            max = Math.max(max, v);
        }
        return new DesignSolver.Solution(shares, information, d.clone(), max, before + steps, true);
    }

    /** The support of the shares ≥ fraction x the largest, widened until F is regular; false if it never is. */
    private boolean startFrom(double[] start, double fraction) {
        double largest = 0;
        int positive = 0;
        for (double s : start) {
            largest = Math.max(largest, s);
            positive += s > 0 ? 1 : 0;
        }
        for (double cut = fraction * largest; ; cut *= 0.1) {
            size = 0;
            double sum = 0;
            for (int j = 0; j < n; j++) {
                if (start[j] > 0 && start[j] >= cut) {
                    if (size == support.length) {
                        resize(2 * size);
                    }
                    support[size] = j;
                    w[size++] = start[j];
                    sum += start[j];
                }
            }
            for (int i = 0; i < size; i++) {
                w[i] /= sum;
            }
            DesignSolver.combine(flat, p, support, w, size, f);
            if (DesignSolver.det3(f) > 0) {
                return true;
            }
            if (size == positive) {
                return false;
            }
        }
    }

    /**
     * Newton on the current support until every d_i is within {@code slack} / 100 of p (a step or two
     * past the slack, at quadratic convergence); when rounding stops it earlier, true if they are within
     * {@code slack} / 2, false otherwise (and if F turns singular).
     */
    private boolean newton(double slack) {
        double residual = Double.POSITIVE_INFINITY;
        for (int it = 0; it < MAX_STEPS; it++) {
            DesignSolver.combine(flat, p, support, w, size, f);
            double det = DesignSolver.det3(f);
            if (!(det > 0) || !DesignSolver.invert3(f, inv)) {
                return false;
            }
            residual = derivatives();
            if (residual <= slack / 100) {
                return true;
            }
            if (!solveKkt()) {
                break;
            }
            // x[0..size) is Δ; the ascent Σ d_i Δ_i = Σ (d_i − p) Δ_i = Δᵀ Q Δ ≥ 0 (Σ Δ_i = 0)
            double ascent = 0;
            double reach = Double.POSITIVE_INFINITY;
            int blocking = -1;
            for (int i = 0; i < size; i++) {
                ascent += (ds[i] - p) * x[i];
                if (x[i] < 0 && -w[i] / x[i] < reach) {
                    reach = -w[i] / x[i];
                    blocking = i;
                }
            }
            if (!(ascent > 0)) {
                break;
            }
            double t = Math.min(1, reach);
            double logDet = Math.log(det);
            // the rise asked for, less the rounding of log det (near the optimum the rise is below it)
            double rounding = 1e-14 * Math.max(1, Math.abs(logDet));
            while (!(Math.log(Math.max(0, trialDet(t))) >= logDet + ARMIJO * t * ascent - rounding)) {
                t /= 2;
                if (t < 1e-12) {
                    return residual <= slack / 2;
                }
            }
            for (int i = 0; i < size; i++) {
                w[i] += t * x[i];
            }
            if (t == reach) {
                w[blocking] = 0;
            }
            compact();
            steps++;
        }
        return residual <= slack / 2;
    }

    /** A_i = F⁻¹ M_i, d_i = tr A_i and the KKT matrix of the Newton step; returns max_i |d_i − p|. */
    private double derivatives() {
        double residual = 0;
        for (int i = 0; i < size; i++) {
            int off = support[i] * pp;
            double trace = 0;
            for (int r = 0; r < p; r++) {
                for (int c = 0; c < p; c++) {
                    double s = 0;
                    for (int k = 0; k < p; k++) {
                        s += inv[r * p + k] * flat[off + k * p + c];
                    }
                    a[i * pp + r * p + c] = s;
                }
                trace += a[i * pp + r * p + r];
            }
            ds[i] = trace;
            residual = Math.max(residual, Math.abs(trace - p));
        }
        int m = size + 1;
        double largest = 0;
        for (int i = 0; i < size; i++) {
            for (int k = i; k < size; k++) {
                double q = 0;
                for (int r = 0; r < p; r++) {
                    for (int c = 0; c < p; c++) {
                        q += a[i * pp + r * p + c] * a[k * pp + c * p + r];
                    }
                }
                kkt[i * m + k] = q;
                kkt[k * m + i] = q;
            }
            largest = Math.max(largest, kkt[i * m + i]);
            kkt[i * m + size] = 1;
            kkt[size * m + i] = 1;
            x[i] = ds[i];
        }
        kkt[size * m + size] = 0;
        x[size] = 0;
        for (int i = 0; i < size; i++) {
            kkt[i * m + i] += RIDGE * largest;
        }
        return residual;
    }

    /** Solves the KKT system in place (Gaussian elimination with partial pivoting): x ← K⁻¹ x. */
    private boolean solveKkt() {
        int m = size + 1;
        for (int col = 0; col < m; col++) {
            int pivot = col;
            for (int r = col + 1; r < m; r++) {
                if (Math.abs(kkt[r * m + col]) > Math.abs(kkt[pivot * m + col])) {
                    pivot = r;
                }
            }
            if (!(Math.abs(kkt[pivot * m + col]) > 0)) {
                return false;
            }
            if (pivot != col) {
                for (int c = 0; c < m; c++) {
                    double tmp = kkt[col * m + c];
                    kkt[col * m + c] = kkt[pivot * m + c];
                    kkt[pivot * m + c] = tmp;
                }
                double tmp = x[col];
                x[col] = x[pivot];
                x[pivot] = tmp;
            }
            for (int r = col + 1; r < m; r++) {
                double factor = kkt[r * m + col] / kkt[col * m + col];
                if (factor != 0) {
                    for (int c = col; c < m; c++) {
                        kkt[r * m + c] -= factor * kkt[col * m + c];
                    }
                    x[r] -= factor * x[col];
                }
            }
        }
        for (int r = m - 1; r >= 0; r--) {
            double s = x[r];
            for (int c = r + 1; c < m; c++) {
                s -= kkt[r * m + c] * x[c];
            }
            x[r] = s / kkt[r * m + r];
        }
        return true;
    }

    /** det F at the shares w + t Δ. */
    private double trialDet(double t) {
        for (int i = 0; i < size; i++) {
            trial[i] = Math.max(0, w[i] + t * x[i]);
        }
        DesignSolver.combine(flat, p, support, trial, size, f);
        return DesignSolver.det3(f);
    }

    /** Drops the support points whose share reached 0 and renormalises. */
    private void compact() {
        int kept = 0;
        double sum = 0;
        for (int i = 0; i < size; i++) {
            if (w[i] > 0) {
                support[kept] = support[i];
                w[kept++] = w[i];
                sum += w[i];
            }
        }
        size = kept;
        for (int i = 0; i < size; i++) {
            w[i] /= sum;
        }
    }

    /** The vertex step onto candidate {@code k} of variance {@code dk} > p. */
    private void add(int k, double dk) {
        double alpha = Math.min(0.5, (dk - p) / (p * (dk - 1)));
        for (int i = 0; i < size; i++) {
            w[i] *= 1 - alpha;
        }
        if (size == support.length) {
            resize(2 * size);
        }
        support[size] = k;
        w[size++] = alpha;
    }

    private void resize(int capacity) {
        int[] s = new int[capacity];
        double[] nw = new double[capacity];
        if (support != null) {
            System.arraycopy(support, 0, s, 0, size);
            System.arraycopy(w, 0, nw, 0, size);
        }
        support = s;
        w = nw;
        a = new double[capacity * pp];
        ds = new double[capacity];
        kkt = new double[(capacity + 1) * (capacity + 1)];
        x = new double[capacity + 1];
        trial = new double[capacity];
    }
}
