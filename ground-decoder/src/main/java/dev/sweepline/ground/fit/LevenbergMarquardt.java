package dev.sweepline.ground.fit;

import java.util.Arrays;

/**
 * Weighted Levenberg–Marquardt minimisation of χ² for a {@link PlasmaModel}, allocation-free after its
 * workspaces have grown to the largest spectrum seen: one instance per thread, reused fit after fit.
 *
 * <p>Method: MINPACK's lmder (Moré 1978, "The Levenberg–Marquardt algorithm: implementation and theory",
 * Lecture Notes in Mathematics 630, 105–116; Moré, Garbow and Hillstrom 1980, "User guide for MINPACK-1",
 * Argonne National Laboratory report ANL-80-74 [memory]), step for step as Hipparchus'
 * LevenbergMarquardtOptimizer ports it, which the fit used before and whose results it keeps: with the
 * whitened residuals r and Jacobian J of the model in the optimiser's parameters,
 * <ul>
 *   <li>each iteration factors J P = Q R by Householder reflections with column pivoting (MINPACK's qrfac) and
 *       forms Qᵀr;</li>
 *   <li>the step δ minimises ‖r − Jδ‖² + λ‖Dδ‖² (MINPACK's qrsolv, Givens rotations on R), D_a the largest
 *       ‖column a of J‖ so far, λ = 0 (Gauss–Newton) when that step lies within 1.1 Δ, otherwise the λ that puts
 *       ‖Dδ‖ within a tenth of Δ (MINPACK's lmpar, Moré §5: Newton's iteration on ‖Dδ(λ)‖ − Δ in a bracket,
 *       at most 11 trials);</li>
 *   <li>Δ starts at 100 ‖Dx₀‖, is cut to the first step, and is updated from ρ, the actual over the predicted
 *       relative drop of χ² (Moré §4): ρ ≤ ¼ → Δ = γ min(Δ, 10‖Dδ‖), λ = λ/γ (γ = ½, or on a rise of χ² the
 *       minimum of the quadratic along the step, held to [0.1, ½]); ρ ≥ ¾ or λ = 0 → Δ = 2‖Dδ‖, λ = λ/2; a
 *       step is taken when ρ ≥ 1e-4, otherwise the next λ is tried on the same factorisation;</li>
 *   <li>the fit has converged when the largest cosine between r and a column of J is at most
 *       {@link #ORTHO_TOLERANCE}, when both the actual and the predicted relative drop of χ² are at most
 *       {@link #COST_TOLERANCE} (and ρ ≤ 2), or when Δ ≤ {@link #PARAMETER_TOLERANCE} ‖Dx‖ (MINPACK's ftol,
 *       xtol and gtol tests with Hipparchus' defaults); it fails when those drops, Δ or the cosine fall to
 *       2ε (tolerances that can no longer be met), or after {@link LeastSquaresRun#MAX_ITERATIONS} iterations or
 *       {@link LeastSquaresRun#MAX_EVALUATIONS} evaluations.</li>
 * </ul>
 * The same arithmetic in the same order as that port (weights √(1/σ²), sums in row order) gives the same
 * point to the last bit on the fit tests, so the path — which decides between the two minima of a free joint
 * fit on a narrow band, the alphas faster and slower than the protons, from a start between them — is the
 * same too.
 *
 * <p>As {@code LeastSquaresRun} always did, the parameters inside are (ln n, U, ln w) per species, the speed
 * clamped to [{@link LeastSquaresRun#MIN_SPEED}, {@link LeastSquaresRun#MAX_SPEED}] and the logarithms to
 * [−50, 80] at every evaluation; a joint fit may carry {@link AlphaPrior} rows, appended to the window rows as
 * whitened pseudo-observations (target 0, weight 1). A drift model's last parameter, ΔU, is taken as it is
 * (not a logarithm) and clamped to ±{@link PlasmaModel#MAX_SPEED_CHANGE}. The covariance is (JᵀJ)⁻¹ at the minimum, from the
 * same analytic Jacobian ({@link WindowCurrent}), by Cholesky of the diagonally equilibrated matrix, mapped
 * back to physical parameters; none when the QR of the raw JᵀJ has a diagonal element at most
 * {@link #COVARIANCE_THRESHOLD} (the singularity test of Hipparchus' getCovariances as the fit called it) or
 * a Cholesky pivot falls below {@link #SINGULAR_PIVOT} of its diagonal.
 */
final class LevenbergMarquardt {
    /** Largest number of parameters: the joint model with the speed drift ({@link PlasmaModel#withDrift}). */
    static final int MAX_PARAMETERS = PlasmaModel.JOINT_PARAMETERS + 1;
    /** Relative drop of χ² (actual and predicted) that ends the fit: MINPACK's ftol, Hipparchus' default 1e-10. */
    static final double COST_TOLERANCE = 1e-10;
    /** Region radius relative to ‖Dx‖ that ends the fit: MINPACK's xtol, Hipparchus' default 1e-10. */
    static final double PARAMETER_TOLERANCE = 1e-10;
    /** Cosine between r and every column of J that ends the fit: MINPACK's gtol, Hipparchus' default 1e-10. */
    static final double ORTHO_TOLERANCE = 1e-10;
    /** First region radius in units of ‖Dx₀‖: MINPACK's factor, Hipparchus' default 100. */
    static final double INITIAL_STEP_BOUND = 100;
    /** Squared column norm under which QR counts a column as zero (Hipparchus' default, the smallest normal double). */
    private static final double RANKING_THRESHOLD = Double.MIN_NORMAL;
    /** A tolerance that can no longer be met: twice the double epsilon 2⁻⁵³ (MINPACK's epsmch tests). */
    private static final double TWO_EPS = Math.ulp(1.0);
    /** ρ at or above which a step is taken (MINPACK lmder). */
    private static final double ACCEPT_RATIO = 1e-4;
    /** A damped step within this fraction of the radius is on its edge (MINPACK lmpar). */
    private static final double RADIUS_TOLERANCE = 0.1;
    /** Newton iterations for λ after the first trial (MINPACK lmpar: 10). */
    private static final int RADIUS_ITERATIONS = 10;
    /** A Cholesky pivot below this fraction of its diagonal counts as singular (common practice: some hundred ε). */
    static final double SINGULAR_PIVOT = 1e-14;
    /** |R_ii| of the QR of JᵀJ at or below which it counts as singular: the threshold the fit gave Hipparchus' getCovariances. */
    static final double COVARIANCE_THRESHOLD = 1e-14;
    private static final double LOG_LOW = -50;
    private static final double LOG_HIGH = 80;

    // per-row workspaces; Jacobians column-major, element (row i, column a) at [a * rows + i]
    private double[] residual = new double[0];
    private double[] trialResidual = new double[0];
    private double[] jacobian = new double[0];
    private double[] trialJacobian = new double[0];
    /** The QR factors of −J: R above the diagonal, the Householder vectors (later qrsolv's S) below. */
    private double[] qr = new double[0];
    private double[] qtr = new double[0];
    private double[] current = new double[0];
    private double[][] physicalJacobian = new double[0][];
    private double[] weight = new double[0];
    private final double[] priorResidual = new double[AlphaPrior.ROWS];
    private final double[][] priorGradient = new double[AlphaPrior.ROWS][MAX_PARAMETERS];
    // per-parameter workspaces
    private final double[] x = new double[MAX_PARAMETERS];
    private final double[] oldX = new double[MAX_PARAMETERS];
    private final double[] trial = new double[MAX_PARAMETERS];
    private final double[] phys = new double[MAX_PARAMETERS];
    private final double[] diag = new double[MAX_PARAMETERS];
    private final int[] permutation = new int[MAX_PARAMETERS];
    /** Per parameter of the current fit, {@link #isLog}: kept so that the per-row loops need not compute it. */
    private final boolean[] logarithm = new boolean[MAX_PARAMETERS];
    private final double[] diagR = new double[MAX_PARAMETERS];
    private final double[] columnNorm = new double[MAX_PARAMETERS];
    /** Per column, its squared norm over the rows the next QR step works on ({@link #factorise}). */
    private final double[] pendingNorm = new double[MAX_PARAMETERS];
    private final double[] beta = new double[MAX_PARAMETERS];
    private final double[] direction = new double[MAX_PARAMETERS];
    private final double[] work1 = new double[MAX_PARAMETERS];
    private final double[] work2 = new double[MAX_PARAMETERS];
    private final double[] work3 = new double[MAX_PARAMETERS];
    private final double[] normal = new double[MAX_PARAMETERS * MAX_PARAMETERS];
    private final double[] factor = new double[MAX_PARAMETERS * MAX_PARAMETERS];
    private final double[] inverse = new double[MAX_PARAMETERS * MAX_PARAMETERS];
    private final double[] column = new double[MAX_PARAMETERS];

    /** Rows of the current fit: the stride of the column-major Jacobians. */
    private int rows;
    /** Columns the current QR factorisation found independent. */
    private int rank;
    /** χ² of the last evaluation. */
    private double evaluatedChiSquare;

    // the outcome of the last fit
    private final double[] parameters = new double[MAX_PARAMETERS];
    private final double[] covariance = new double[MAX_PARAMETERS * MAX_PARAMETERS];
    private boolean hasCovariance;
    private double chiSquare;
    private int iterations;
    private int parameterCount;
    /** Index of the current model's ΔU ({@link PlasmaModel#driftIndex}), −1 without drift. */
    private int driftIndex = -1;

    /** Physical parameters of the last successful fit, first {@link #parameterCount()} entries. */
    double[] parameters() {
        return parameters;
    }

    /** Parameters of the last fit's model. */
    int parameterCount() {
        return parameterCount;
    }

    /** Physical covariance of the last fit, row-major np × np; valid only when {@link #hasCovariance()}. */
    double[] covariance() {
        return covariance;
    }

    /** True when the last fit's JᵀJ could be inverted. */
    boolean hasCovariance() {
        return hasCovariance;
    }

    /** The minimised χ² of the last fit: window rows plus prior rows. */
    double chiSquare() {
        return chiSquare;
    }

    /** Iterations (Jacobian factorisations) of the last fit. */
    int iterations() {
        return iterations;
    }

    /**
     * Fits {@code model} to {@code amps} (1σ {@code sigma}) from {@code startPhysical}, with {@code prior}
     * rows (joint model only; null for none). False when the fit fails (see the class note) or the point is
     * not finite; the outcome is then undefined.
     */
    boolean fit(PlasmaModel model, double[] amps, double[] sigma, double[] startPhysical, AlphaPrior prior) {
        int np = model.parameters();
        int m = model.windows();
        rows = m + (prior == null ? 0 : AlphaPrior.ROWS);
        ensure(m, rows);
        parameterCount = np;
        driftIndex = model.driftIndex();
        for (int a = 0; a < np; a++) {
            logarithm[a] = isLog(a);
        }
        hasCovariance = false;
        for (int j = 0; j < m; j++) {
            double s = Math.max(sigma[j], LeastSquaresRun.MIN_SIGMA_AMPS);
            weight[j] = Math.sqrt(1 / (s * s)); // √ of the weight 1/σ², as Hipparchus took it: the same bits as its rows
        }
        for (int a = 0; a < np; a++) {
            x[a] = isLog(a) ? Math.log(startPhysical[a]) : startPhysical[a];
        }
        clamp(x, np);
        evaluate(model, amps, prior, x, np, m, residual, jacobian);
        double chi2 = evaluatedChiSquare;
        if (!Double.isFinite(chi2)) {
            return false;
        }
        if (!minimise(model, amps, prior, np, m, Math.sqrt(chi2))) {
            return false;
        }
        for (int a = 0; a < np; a++) {
            parameters[a] = isLog(a) ? Math.exp(x[a]) : x[a];
            if (!Double.isFinite(parameters[a])) {
                return false;
            }
        }
        normalEquations(np);
        hasCovariance = invertNormal(np);
        if (hasCovariance) {
            for (int a = 0; a < np; a++) {
                for (int b = 0; b < np; b++) {
                    double sa = isLog(a) ? parameters[a] : 1;
                    double sb = isLog(b) ? parameters[b] : 1;
                    covariance[a * np + b] = inverse[a * np + b] * sa * sb;
                }
            }
        }
        return true;
    }

    /**
     * MINPACK lmder's iterations from {@link #x} of norm ‖r‖ = {@code norm} (see the class note), leaving the
     * minimum in {@link #x}, its rows in {@link #residual} and {@link #jacobian} and its χ² in {@link #chiSquare};
     * false when the fit fails.
     */
    private boolean minimise(PlasmaModel model, double[] amps, AlphaPrior prior, int np, int m, double norm) {
        // the fields the loops read, as locals of the same names (the quick compiler reloads a field per iteration)
        final int rows = this.rows;
        final double[] qr = this.qr;
        final double[] qtr = this.qtr;
        final int[] permutation = this.permutation;
        final double[] direction = this.direction;
        final double[] diag = this.diag;
        final double[] work1 = this.work1;
        int solved = Math.min(rows, np);
        int evaluations = 1;
        double cost = norm;
        chiSquare = evaluatedChiSquare;
        double radius = 0;
        double xNorm = 0;
        double lambda = 0;
        boolean first = true;
        for (iterations = 0; ; ) {
            if (iterations >= LeastSquaresRun.MAX_ITERATIONS) {
                return false;
            }
            iterations++;
            if (!factorise(np)) {
                return false;
            }
            System.arraycopy(residual, 0, qtr, 0, rows);
            applyQTransposed(np);
            for (int k = 0; k < solved; k++) {
                int pk = permutation[k];
                qr[pk * rows + k] = diagR[pk];
            }
            if (first) {
                xNorm = 0;
                for (int a = 0; a < np; a++) {
                    double d = columnNorm[a] == 0 ? 1.0 : columnNorm[a];
                    double xa = d * x[a];
                    xNorm += xa * xa;
                    diag[a] = d;
                }
                xNorm = Math.sqrt(xNorm);
                radius = xNorm == 0 ? INITIAL_STEP_BOUND : INITIAL_STEP_BOUND * xNorm;
            }
            // the largest cosine between r and a column of J: zero at a stationary point
            double maxCosine = 0;
            if (cost != 0) {
                for (int j = 0; j < solved; j++) {
                    int pj = permutation[j];
                    double s = columnNorm[pj];
                    if (s != 0) {
                        double sum = 0;
                        for (int i = 0; i <= j; i++) {
                            sum += qr[pj * rows + i] * qtr[i];
                        }
                        maxCosine = Math.max(maxCosine, Math.abs(sum) / (s * cost));
                    }
                }
            }
            if (maxCosine <= ORTHO_TOLERANCE) {
                return true;
            }
            for (int a = 0; a < np; a++) {
                diag[a] = Math.max(diag[a], columnNorm[a]);
            }
            for (double ratio = 0; ratio < ACCEPT_RATIO; ) {
                for (int j = 0; j < solved; j++) {
                    oldX[permutation[j]] = x[permutation[j]];
                }
                double previousCost = cost;
                lambda = dampingForRadius(np, radius, lambda);
                double stepNorm = 0;
                for (int j = 0; j < solved; j++) {
                    int pj = permutation[j];
                    direction[pj] = -direction[pj];
                    trial[pj] = oldX[pj] + direction[pj];
                    double s = diag[pj] * direction[pj];
                    stepNorm += s * s;
                }
                stepNorm = Math.sqrt(stepNorm);
                if (first) {
                    radius = Math.min(radius, stepNorm);
                }
                if (evaluations >= LeastSquaresRun.MAX_EVALUATIONS) {
                    return false;
                }
                evaluations++;
                clamp(trial, np);
                evaluate(model, amps, prior, trial, np, m, trialResidual, trialJacobian);
                double trialChiSquare = evaluatedChiSquare;
                double trialCost = Math.sqrt(trialChiSquare);
                // actual and predicted drops of χ² relative to χ², and the directional derivative
                double actual = -1.0;
                if (0.1 * trialCost < previousCost) {
                    double r = trialCost / previousCost;
                    actual = 1.0 - r * r;
                }
                for (int j = 0; j < solved; j++) {
                    int pj = permutation[j];
                    double dj = direction[pj];
                    work1[j] = 0;
                    for (int i = 0; i <= j; i++) {
                        work1[i] += qr[pj * rows + i] * dj;
                    }
                }
                double coefficient1 = 0;
                for (int j = 0; j < solved; j++) {
                    coefficient1 += work1[j] * work1[j];
                }
                double previousSquare = previousCost * previousCost;
                coefficient1 /= previousSquare;
                double coefficient2 = lambda * stepNorm * stepNorm / previousSquare;
                double predicted = coefficient1 + 2 * coefficient2;
                double slope = -(coefficient1 + coefficient2);
                ratio = predicted == 0 ? 0 : actual / predicted;
                if (ratio <= 0.25) {
                    double shrink = actual < 0 ? 0.5 * slope / (slope + 0.5 * actual) : 0.5;
                    if (0.1 * trialCost >= previousCost || shrink < 0.1) {
                        shrink = 0.1;
                    }
                    radius = shrink * Math.min(radius, 10.0 * stepNorm);
                    lambda /= shrink;
                } else if (lambda == 0 || ratio >= 0.75) {
                    radius = 2 * stepNorm;
                    lambda *= 0.5;
                }
                if (ratio >= ACCEPT_RATIO) {
                    first = false;
                    System.arraycopy(trial, 0, x, 0, np);
                    swap();
                    cost = trialCost;
                    chiSquare = trialChiSquare;
                    xNorm = 0;
                    for (int a = 0; a < np; a++) {
                        double xa = diag[a] * x[a];
                        xNorm += xa * xa;
                    }
                    xNorm = Math.sqrt(xNorm);
                } else {
                    cost = previousCost;
                    for (int j = 0; j < solved; j++) {
                        x[permutation[j]] = oldX[permutation[j]];
                    }
                }
                if (Math.abs(actual) <= COST_TOLERANCE && predicted <= COST_TOLERANCE && ratio <= 2.0
                        || radius <= PARAMETER_TOLERANCE * xNorm) {
                    return true;
                }
                if (Math.abs(actual) <= TWO_EPS && predicted <= TWO_EPS && ratio <= 2.0
                        || radius <= TWO_EPS * xNorm || maxCosine <= TWO_EPS) {
                    // the tolerances can no longer be met in double precision: no fit, as Hipparchus
                    return false;
                }
            }
        }
    }

    /**
     * Householder QR with column pivoting of {@link #qr}, filled here with −J ({@link #jacobian}; MINPACK qrfac):
     * the reflections' vectors in and below the diagonal, R above it, R's diagonal in {@link #diagR}, the
     * reflections' factors in {@link #beta}, the columns' norms before it in {@link #columnNorm}, the order in
     * {@link #permutation} and the rank in {@link #rank}; false when a column norm is not finite.
     *
     * <p>Step k picks the remaining column with the largest squared norm over rows k and below. That sum is
     * accumulated, in the same row order and so with the same bits, while step k − 1 updates the column (and
     * for step 0 while −J is copied in), in {@link #pendingNorm}, rather than in a pass of its own over the
     * columns; array fields and strides are read into locals, since the quick compiler (C1, which the bench's
     * campaigns run) reloads a field on every iteration.
     */
    private boolean factorise(int np) {
        final double[] q = qr;
        final double[] j0 = jacobian;
        final int[] perm = permutation;
        final double[] pending = pendingNorm;
        final int m = rows;
        Arrays.fill(diagR, 0, np, 0.0);
        Arrays.fill(beta, 0, np, 0.0);
        for (int k = 0; k < np; k++) {
            perm[k] = k;
            double norm2 = 0;
            for (int i = k * m, end = i + m; i < end; i++) {
                double v = -j0[i];
                q[i] = v;
                norm2 += v * v;
            }
            pending[k] = norm2;
            columnNorm[k] = Math.sqrt(norm2);
        }
        rank = Math.min(m, np);
        for (int k = 0; k < np; k++) {
            // the column of the largest norm below row k next
            int next = -1;
            double ak2 = Double.NEGATIVE_INFINITY;
            for (int i = k; i < np; i++) {
                double norm2 = pending[perm[i]];
                if (Double.isInfinite(norm2) || Double.isNaN(norm2)) {
                    return false;
                }
                if (norm2 > ak2) {
                    next = i;
                    ak2 = norm2;
                }
            }
            if (ak2 <= RANKING_THRESHOLD) {
                rank = k;
                return true;
            }
            int pk = perm[next];
            perm[next] = perm[k];
            perm[k] = pk;
            int kBase = pk * m;
            double akk = q[kBase + k];
            double alpha = akk > 0 ? -Math.sqrt(ak2) : Math.sqrt(ak2);
            double betak = 1.0 / (ak2 - akk * alpha);
            beta[pk] = betak;
            diagR[pk] = alpha;
            q[kBase + k] -= alpha;
            int length = m - k;
            int kStart = kBase + k;
            for (int dk = np - 1 - k; dk > 0; dk--) {
                int pc = perm[k + dk];
                int cStart = pc * m + k;
                double gamma = 0;
                for (int j = 0; j < length; j++) {
                    gamma += q[kStart + j] * q[cStart + j];
                }
                gamma *= betak;
                // row k leaves the next step's sum; rows below it enter it as they are updated
                q[cStart] -= gamma * q[kStart];
                double norm2 = 0;
                for (int j = 1; j < length; j++) {
                    double v = q[cStart + j] - gamma * q[kStart + j];
                    q[cStart + j] = v;
                    norm2 += v * v;
                }
                pending[pc] = norm2;
            }
        }
        return true;
    }

    /** {@link #qtr} ← Qᵀ {@link #qtr}, Q of {@link #factorise}. */
    private void applyQTransposed(int np) {
        final double[] q = qr;
        final double[] t = qtr;
        final int m = rows;
        for (int k = 0; k < np; k++) {
            int pk = permutation[k];
            int base = pk * m;
            double gamma = 0;
            for (int i = k; i < m; i++) {
                gamma += q[base + i] * t[i];
            }
            gamma *= beta[pk];
            for (int i = k; i < m; i++) {
                t[i] -= gamma * q[base + i];
            }
        }
    }

    /**
     * λ whose step (left in {@link #direction}, with the sign of −δ) has ‖Dδ‖ within a tenth of {@code radius},
     * or 0 when the Gauss–Newton step is within 1.1 × {@code radius}: MINPACK's lmpar (Moré 1978 §5) — Newton's
     * iteration on ‖Dδ(λ)‖ − Δ inside a bracket whose lower end comes from the Gauss–Newton step (0 when J is
     * rank-deficient) and whose upper end is ‖D⁻¹Jᵀr‖/Δ, from the previous λ held to it.
     */
    private double dampingForRadius(int np, double radius, double previous) {
        // the fields the loops read, as locals of the same names (the quick compiler reloads a field per iteration)
        final int rows = this.rows;
        final int rank = this.rank;
        final double[] qr = this.qr;
        final double[] qtr = this.qtr;
        final int[] permutation = this.permutation;
        final double[] direction = this.direction;
        final double[] diag = this.diag;
        final double[] diagR = this.diagR;
        final double[] work1 = this.work1;
        final double[] work2 = this.work2;
        final double[] work3 = this.work3;
        int solved = Math.min(rows, np);
        // the Gauss–Newton direction; a least-squares one when J is rank-deficient
        for (int j = 0; j < rank; j++) {
            direction[permutation[j]] = qtr[j];
        }
        for (int j = rank; j < np; j++) {
            direction[permutation[j]] = 0;
        }
        for (int k = rank - 1; k >= 0; k--) {
            int pk = permutation[k];
            double ypk = direction[pk] / diagR[pk];
            for (int i = 0; i < k; i++) {
                direction[permutation[i]] -= ypk * qr[pk * rows + i];
            }
            direction[pk] = ypk;
        }
        double dxNorm = 0;
        for (int j = 0; j < solved; j++) {
            int pj = permutation[j];
            double s = diag[pj] * direction[pj];
            work1[pj] = s;
            dxNorm += s * s;
        }
        dxNorm = Math.sqrt(dxNorm);
        double fp = dxNorm - radius;
        if (fp <= RADIUS_TOLERANCE * radius) {
            return 0;
        }
        double sum2;
        double low = 0;
        if (rank == solved) {
            for (int j = 0; j < solved; j++) {
                int pj = permutation[j];
                work1[pj] *= diag[pj] / dxNorm;
            }
            sum2 = 0;
            for (int j = 0; j < solved; j++) {
                int pj = permutation[j];
                double sum = 0;
                for (int i = 0; i < j; i++) {
                    sum += qr[pj * rows + i] * work1[permutation[i]];
                }
                double s = (work1[pj] - sum) / diagR[pj];
                work1[pj] = s;
                sum2 += s * s;
            }
            low = fp / (radius * sum2);
        }
        sum2 = 0;
        for (int j = 0; j < solved; j++) {
            int pj = permutation[j];
            double sum = 0;
            for (int i = 0; i <= j; i++) {
                sum += qr[pj * rows + i] * qtr[i];
            }
            sum /= diag[pj];
            sum2 += sum * sum;
        }
        double gradientNorm = Math.sqrt(sum2);
        double high = gradientNorm / radius;
        if (high == 0) {
            high = Double.MIN_NORMAL / Math.min(radius, 0.1);
        }
        double lambda = Math.min(high, Math.max(previous, low));
        if (lambda == 0) {
            lambda = gradientNorm / dxNorm;
        }
        for (int countdown = RADIUS_ITERATIONS; countdown >= 0; countdown--) {
            if (lambda == 0) {
                lambda = Math.max(Double.MIN_NORMAL, 0.001 * high);
            }
            double root = Math.sqrt(lambda);
            for (int j = 0; j < solved; j++) {
                int pj = permutation[j];
                work1[pj] = root * diag[pj];
            }
            dampedDirection(np, solved);
            dxNorm = 0;
            for (int j = 0; j < solved; j++) {
                int pj = permutation[j];
                double s = diag[pj] * direction[pj];
                work3[pj] = s;
                dxNorm += s * s;
            }
            dxNorm = Math.sqrt(dxNorm);
            double previousFp = fp;
            fp = dxNorm - radius;
            if (Math.abs(fp) <= RADIUS_TOLERANCE * radius || low == 0 && fp <= previousFp && previousFp < 0) {
                return lambda;
            }
            // Newton's correction
            for (int j = 0; j < solved; j++) {
                int pj = permutation[j];
                work1[pj] = work3[pj] * diag[pj] / dxNorm;
            }
            for (int j = 0; j < solved; j++) {
                int pj = permutation[j];
                work1[pj] /= work2[j];
                double tmp = work1[pj];
                for (int i = j + 1; i < solved; i++) {
                    work1[permutation[i]] -= qr[pj * rows + i] * tmp;
                }
            }
            sum2 = 0;
            for (int j = 0; j < solved; j++) {
                double s = work1[permutation[j]];
                sum2 += s * s;
            }
            double correction = fp / (radius * sum2);
            if (fp > 0) {
                low = Math.max(low, lambda);
            } else if (fp < 0) {
                high = Math.min(high, lambda);
            }
            lambda = Math.max(low, lambda + correction);
        }
        return lambda;
    }

    /**
     * The damped direction for the scaling √λ D in {@link #work1}: the least-squares solution of R z = Qᵀr,
     * √λ D z = 0 by Givens rotations (MINPACK qrsolv), into {@link #direction}; the rotated triangle S below
     * R's diagonal in {@link #qr} and its diagonal in {@link #work2}, {@link #work3} scratch.
     */
    private void dampedDirection(int np, int solved) {
        // the fields the loops read, as locals of the same names (the quick compiler reloads a field per iteration)
        final int rows = this.rows;
        final double[] qr = this.qr;
        final int[] permutation = this.permutation;
        final double[] direction = this.direction;
        final double[] work1 = this.work1;
        double[] sDiagonal = work2;
        double[] z = work3;
        for (int j = 0; j < solved; j++) {
            int pj = permutation[j];
            for (int i = j + 1; i < solved; i++) {
                qr[pj * rows + i] = qr[permutation[i] * rows + j];
            }
            direction[j] = diagR[pj];
            z[j] = qtr[j];
        }
        for (int j = 0; j < solved; j++) {
            int pj = permutation[j];
            double dpj = work1[pj];
            if (dpj != 0) {
                Arrays.fill(sDiagonal, j + 1, np, 0);
            }
            sDiagonal[j] = dpj;
            double qtbpj = 0;
            for (int k = j; k < solved; k++) {
                int pk = permutation[k];
                if (sDiagonal[k] != 0) {
                    double sin;
                    double cos;
                    double rkk = qr[pk * rows + k];
                    if (Math.abs(rkk) < Math.abs(sDiagonal[k])) {
                        double cotan = rkk / sDiagonal[k];
                        sin = 1.0 / Math.sqrt(1.0 + cotan * cotan);
                        cos = sin * cotan;
                    } else {
                        double tan = sDiagonal[k] / rkk;
                        cos = 1.0 / Math.sqrt(1.0 + tan * tan);
                        sin = cos * tan;
                    }
                    qr[pk * rows + k] = cos * rkk + sin * sDiagonal[k];
                    double temp = cos * z[k] + sin * qtbpj;
                    qtbpj = -sin * z[k] + cos * qtbpj;
                    z[k] = temp;
                    for (int i = k + 1; i < solved; i++) {
                        double rik = qr[pk * rows + i];
                        double temp2 = cos * rik + sin * sDiagonal[i];
                        sDiagonal[i] = -sin * rik + cos * sDiagonal[i];
                        qr[pk * rows + i] = temp2;
                    }
                }
            }
            sDiagonal[j] = qr[permutation[j] * rows + j];
            qr[permutation[j] * rows + j] = direction[j];
        }
        int singular = solved;
        for (int j = 0; j < solved; j++) {
            if (sDiagonal[j] == 0 && singular == solved) {
                singular = j;
            }
            if (singular < solved) {
                z[j] = 0;
            }
        }
        for (int j = singular - 1; j >= 0; j--) {
            int pj = permutation[j];
            double sum = 0;
            for (int i = j + 1; i < singular; i++) {
                sum += qr[pj * rows + i] * z[i];
            }
            z[j] = (z[j] - sum) / sDiagonal[j];
        }
        for (int j = 0; j < np; j++) {
            direction[permutation[j]] = z[j];
        }
    }

    /** Scratch rows for the prior's χ² and leverage after a fit (overwritten by the next fit). */
    double[] priorResidual() {
        return priorResidual;
    }

    /** Scratch gradients, {@link AlphaPrior#ROWS} × {@link #MAX_PARAMETERS} (ΔU's column 0), as {@link #priorResidual}. */
    double[][] priorGradient() {
        return priorGradient;
    }

    /** True when the optimiser works in the logarithm of parameter {@code a}: n and w; U and ΔU as they are. */
    private boolean isLog(int a) {
        return a != driftIndex && a % 3 != 1;
    }

    private void clamp(double[] p, int np) {
        for (int a = 0; a < np; a++) {
            p[a] = a == driftIndex ? Math.max(-PlasmaModel.MAX_SPEED_CHANGE, Math.min(PlasmaModel.MAX_SPEED_CHANGE, p[a]))
                    : isLog(a) ? Math.max(LOG_LOW, Math.min(LOG_HIGH, p[a]))
                    : Math.max(LeastSquaresRun.MIN_SPEED, Math.min(LeastSquaresRun.MAX_SPEED, p[a]));
        }
    }

    private void swap() {
        double[] r = residual;
        residual = trialResidual;
        trialResidual = r;
        double[] j = jacobian;
        jacobian = trialJacobian;
        trialJacobian = j;
    }

    /**
     * Whitened residuals (data − model) and Jacobian of the model at {@code at} (optimiser parameters) into
     * {@code r} and {@code jj} (column-major); χ² into {@link #evaluatedChiSquare}.
     */
    private void evaluate(PlasmaModel model, double[] amps, AlphaPrior prior, double[] at, int np, int m,
            double[] r, double[] jj) {
        final double[] phys = this.phys;
        final boolean[] logarithm = this.logarithm;
        final int rows = this.rows;
        for (int a = 0; a < np; a++) {
            phys[a] = logarithm[a] ? Math.exp(at[a]) : at[a];
        }
        final double[] current = this.current;
        final double[] weight = this.weight;
        final double[][] physicalJacobian = this.physicalJacobian;
        model.evaluate(phys, current, physicalJacobian);
        double cost = 0;
        for (int j = 0; j < m; j++) {
            double w = weight[j];
            double rj = w * (amps[j] - current[j]);
            r[j] = rj;
            cost += rj * rj;
            double[] pj = physicalJacobian[j];
            for (int a = 0, i = j; a < np; a++, i += rows) {
                jj[i] = w * (logarithm[a] ? pj[a] * phys[a] : pj[a]);
            }
        }
        if (prior != null) {
            prior.rows(phys, priorResidual, priorGradient);
            for (int i = 0; i < AlphaPrior.ROWS; i++) {
                double ri = 0 - priorResidual[i];
                r[m + i] = ri;
                cost += ri * ri;
                for (int a = 0; a < np; a++) {
                    jj[a * rows + m + i] = isLog(a) ? priorGradient[i][a] * phys[a] : priorGradient[i][a];
                }
            }
        }
        evaluatedChiSquare = cost;
    }

    /** JᵀJ of {@link #jacobian} into {@link #normal}. */
    private void normalEquations(int np) {
        for (int a = 0; a < np; a++) {
            for (int b = 0; b <= a; b++) {
                double s = 0;
                int ia = a * rows;
                int ib = b * rows;
                for (int j = 0; j < rows; j++) {
                    s += jacobian[ia + j] * jacobian[ib + j];
                }
                normal[a * np + b] = s;
                normal[b * np + a] = s;
            }
        }
    }

    /**
     * True when JᵀJ in {@link #normal} is singular as the fit judged it before its own optimiser: a diagonal
     * element of the R of its Householder QR (unpivoted, of the raw matrix) at most {@link #COVARIANCE_THRESHOLD}
     * in magnitude (Hipparchus' QRDecomposition with that threshold, as its getCovariances was called).
     */
    private boolean singularByQr(int np) {
        System.arraycopy(normal, 0, factor, 0, np * np); // symmetric: its rows are its columns
        for (int minor = 0; minor < np; minor++) {
            int base = minor * np;
            double norm2 = 0;
            for (int row = minor; row < np; row++) {
                norm2 += factor[base + row] * factor[base + row];
            }
            double a = factor[base + minor] > 0 ? -Math.sqrt(norm2) : Math.sqrt(norm2);
            if (Math.abs(a) <= COVARIANCE_THRESHOLD) {
                return true;
            }
            factor[base + minor] -= a;
            for (int col = minor + 1; col < np; col++) {
                int c = col * np;
                double alpha = 0;
                for (int row = minor; row < np; row++) {
                    alpha -= factor[c + row] * factor[base + row];
                }
                alpha /= a * factor[base + minor];
                for (int row = minor; row < np; row++) {
                    factor[c + row] -= alpha * factor[base + row];
                }
            }
        }
        return false;
    }

    /**
     * (JᵀJ)⁻¹ into {@link #inverse}, by Cholesky of JᵀJ equilibrated by its diagonal; false when singular
     * ({@link #singularByQr}, or a pivot below {@link #SINGULAR_PIVOT}).
     */
    private boolean invertNormal(int np) {
        if (singularByQr(np)) {
            return false;
        }
        for (int a = 0; a < np; a++) {
            double d = normal[a * np + a];
            if (!(d > 0) || !Double.isFinite(d)) {
                return false;
            }
            column[a] = 1 / Math.sqrt(d);
        }
        for (int a = 0; a < np; a++) {
            for (int b = 0; b < np; b++) {
                factor[a * np + b] = normal[a * np + b] * column[a] * column[b];
            }
        }
        if (!cholesky(factor, np)) {
            return false;
        }
        for (int b = 0; b < np; b++) {
            Arrays.fill(work1, 0, np, 0.0);
            work1[b] = 1;
            solve(factor, np, work1);
            for (int a = 0; a < np; a++) {
                inverse[a * np + b] = work1[a] * column[a] * column[b];
            }
        }
        return true;
    }

    /** In-place Cholesky L Lᵀ of the symmetric {@code a} (lower triangle); false on a pivot below {@link #SINGULAR_PIVOT}. */
    private static boolean cholesky(double[] a, int n) {
        for (int j = 0; j < n; j++) {
            double d = a[j * n + j];
            for (int k = 0; k < j; k++) {
                d -= a[j * n + k] * a[j * n + k];
            }
            if (!(d > SINGULAR_PIVOT * a[j * n + j]) || !(d > 0)) {
                return false;
            }
            double l = Math.sqrt(d);
            a[j * n + j] = l;
            for (int i = j + 1; i < n; i++) {
                double s = a[i * n + j];
                for (int k = 0; k < j; k++) {
                    s -= a[i * n + k] * a[j * n + k];
                }
                a[i * n + j] = s / l;
            }
        }
        return true;
    }

    /** Solves L Lᵀ y = b in place. */
    private static void solve(double[] l, int n, double[] b) {
        for (int i = 0; i < n; i++) {
            double s = b[i];
            for (int k = 0; k < i; k++) {
                s -= l[i * n + k] * b[k];
            }
            b[i] = s / l[i * n + i];
        }
        for (int i = n - 1; i >= 0; i--) {
            double s = b[i];
            for (int k = i + 1; k < n; k++) {
                s -= l[k * n + i] * b[k];
            }
            b[i] = s / l[i * n + i];
        }
    }

    /** Grows the workspaces to {@code windows} model rows and {@code allRows} rows in all. */
    private void ensure(int windows, int allRows) {
        if (residual.length < allRows) {
            int n = Math.max(allRows, 2 * residual.length);
            residual = new double[n];
            trialResidual = new double[n];
            qtr = new double[n];
            jacobian = new double[n * MAX_PARAMETERS];
            trialJacobian = new double[n * MAX_PARAMETERS];
            qr = new double[n * MAX_PARAMETERS];
        }
        if (current.length < windows) {
            int n = Math.max(windows, 2 * current.length);
            current = new double[n];
            weight = new double[n];
            physicalJacobian = new double[n][MAX_PARAMETERS];
        }
    }
}
