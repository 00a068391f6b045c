package dev.sweepline.sim.design;

/**
 * The multiplicative algorithm s_j ← s_j d_j(s) / p over flattened candidates (Silvey, Titterington and
 * Torsney 1978, "An algorithm for optimal designs on a finite design space", Communications in
 * Statistics A 7, 1379-1389 [memory]), from the uniform design over the informative candidates, with
 * the support-point deletion of Harman and Pronzato (2007, "Improvements on removing nonoptimal support
 * points in D-optimum design algorithms", Statistics and Probability Letters 77, 90-94 [memory]): with
 * ε = max_j d_j − p over the active candidates, no support point of a D-optimal design has d_j below
 * h = p (1 + ε/2 − √(ε (4 + ε − 4/p)) / 2). It increases det F monotonically; {@link DesignSolver} runs
 * it for a few updates to find where the support lies, and whole as the fallback.
 */
final class MultiplicativeAlgorithm {
    private final double[] flat;
    private final int p;
    private final boolean dropping;
    /** The current shares; 0 for dropped and uninformative candidates. */
    final double[] share;
    private final boolean[] active;
    /** d_j at the last design evaluated (the dropped ones' only once the rule is met). */
    final double[] d;
    /** F at the last design evaluated (p x p, row-major). */
    final double[] f;
    private final double[] inv;
    /** Updates made so far. */
    int iterations;
    /** max_j d_j over the active candidates at the last design evaluated. */
    double worstActive;

    /** From the uniform design over the candidates of {@code flat} with information ({@code p} x {@code p} each). */
    MultiplicativeAlgorithm(double[] flat, int p, boolean dropping) {
        this.flat = flat;
        this.p = p;
        this.dropping = dropping;
        int pp = p * p;
        int n = flat.length / pp;
        share = new double[n];
        active = new boolean[n];
        d = new double[n];
        f = new double[pp];
        inv = new double[pp];
        int count = 0;
        for (int j = 0; j < n; j++) {
            double trace = 0;
            for (int a = 0; a < p; a++) {
                trace += flat[j * pp + a * p + a];
            }
            active[j] = trace > 0;
            count += active[j] ? 1 : 0;
        }
        for (int j = 0; j < n; j++) {
            share[j] = active[j] ? 1.0 / count : 0;
        }
    }

    /** The outcome of {@link #run}. */
    enum Outcome {
        /** max_j d_j ≤ p (1 + tolerance) on the active candidates ({@link #d} filled for every one). */
        MET,
        /** {@code limit} updates made without meeting the rule. */
        LIMIT,
        /** F became singular. */
        SINGULAR
    }

    /** Makes updates until the stopping rule holds on the active candidates or {@code limit} updates in all are made. */
    Outcome run(double tolerance, int limit) {
        int n = share.length;
        int pp = p * p;
        while (true) {
            DesignSolver.combine(flat, p, share, f);
            if (!DesignSolver.invert3(f, inv)) {
                return Outcome.SINGULAR;
            }
            double worst = 0;
            for (int j = 0; j < n; j++) {
                if (active[j]) {
                    d[j] = DesignSolver.traceOfProduct(inv, flat, j * pp, p);
                    worst = Math.max(worst, d[j]);
                }
            }
            worstActive = worst;
            if (worst <= p * (1 + tolerance)) {
                // the dropped candidates' variances are needed only now, for the stopping rule on every candidate
                for (int j = 0; j < n; j++) {
                    if (!active[j]) {
                        d[j] = DesignSolver.traceOfProduct(inv, flat, j * pp, p);
                    }
                }
                return Outcome.MET;
            }
            if (iterations >= limit) {
                return Outcome.LIMIT;
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
            iterations++;
        }
    }
}
