package dev.sweepline.ground.fit;

/**
 * Weighted Levenberg–Marquardt minimisation of χ² for a {@link PlasmaModel}, allocation-free after its
 * workspaces have grown to the largest spectrum seen: one instance per thread, reused fit after fit.
 *
 * <p>Method: Marquardt's damped Gauss–Newton step (Marquardt 1963, SIAM J. Appl. Math. 11, 431) in the
 * trust-region form and with the diagonal scaling of Moré (1978, "The Levenberg–Marquardt algorithm:
 * implementation and theory", Lecture Notes in Mathematics 630, 105–116), the method of MINPACK's lmder:
 * with the whitened residuals r and Jacobian J of the model in the optimiser's parameters, each step solves
 * <pre>
 *   (JᵀJ + λ D²) δ = Jᵀr,   D_a = max over the iterations so far of ‖column a of J‖
 * </pre>
 * by Cholesky, λ = 0 (Gauss–Newton) when that step lies inside the region ‖Dδ‖ ≤ 1.1 Δ, otherwise the λ that
 * puts it on the region's edge (Moré §5, MINPACK's lmpar). A step that lowers χ² is taken. Δ is cut to the first step, and
 * then updated as MINPACK's lmder does (Moré §4, and Hipparchus' LevenbergMarquardtOptimizer, its port): when
 * the actual drop of χ² is under a quarter of the predicted one, Δ becomes γ·min(Δ, 10‖Dδ‖) and λ becomes
 * λ/γ, γ = ½ or, on a rise of χ², the minimum of the quadratic through χ² and its slope along the step,
 * ½ψ/(ψ + ½ρ_act), ψ = −gᵀδ/χ² and ρ_act = 1 − χ²_trial/χ², held to [0.1, ½]; when over three quarters or
 * at a Gauss–Newton step, Δ becomes 2‖Dδ‖ and λ is halved. The path matters, not only the minimum: a free
 * joint fit on a narrow band has two minima (the alphas faster and slower than the protons) and the
 * start lies between them. The fit has
 * converged when the Gauss–Newton decrement gᵀ(JᵀJ)⁻¹g, g = Jᵀr — the squared distance of the point from
 * the minimum of the local quadratic model in units of the parameters' 1σ — falls below
 * {@link #STEP_SIGMAS}², or when the distance it bounds is below {@link #RELATIVE_DISTANCE} of every
 * parameter. Within {@link #POLISH_DECREMENT} of the minimum the undamped steps are taken, kept unless they
 * raise χ² above its lowest value so far by more than its rounding (χ² can no longer tell them apart); a refused one, or one that does not
 * shrink the decrement (where the residuals' curvature stalls Gauss–Newton), hands back to the region. A
 * refused step whose predicted drop is below the rounding of χ² ends the fit: the minimum to rounding.
 *
 * <p>As {@code LeastSquaresRun} always did, the parameters inside are (ln n, U, ln w) per species, the speed
 * clamped to [{@link LeastSquaresRun#MIN_SPEED}, {@link LeastSquaresRun#MAX_SPEED}] and the logarithms to
 * [−50, 80] after every step; a joint fit may carry {@link AlphaPrior} rows, appended to the window rows as
 * whitened pseudo-observations (target 0, weight 1). The covariance is (JᵀJ)⁻¹ at the minimum, from the
 * same analytic Jacobian ({@link WindowCurrent}), by Cholesky of the diagonally equilibrated matrix, mapped
 * back to physical parameters; none when a pivot falls below {@link #SINGULAR_PIVOT} of its diagonal.
 */
final class LevenbergMarquardt {
    /** Largest number of parameters: the joint model. */
    static final int MAX_PARAMETERS = PlasmaModel.JOINT_PARAMETERS;
    /**
     * Converged when every parameter is within this relative distance of the minimum: a hundredth of the
     * 1e-9 the fit's results are held to, since a slowly contracting Gauss–Newton sequence (large residual
     * curvature) still moves by some multiple of its last step.
     */
    static final double RELATIVE_DISTANCE = 1e-11;
    /** Converged when the point is within this many 1σ of the minimum (common practice: far below the noise). */
    static final double STEP_SIGMAS = 1e-9;
    /** A Cholesky pivot below this fraction of its diagonal counts as singular (Hipparchus' covariance threshold 1e-14). */
    static final double SINGULAR_PIVOT = 1e-14;
    /** First trust-region radius in units of ‖Dx₀‖ (MINPACK's step bound factor 100, Moré 1978 §6 [memory]). */
    private static final double INITIAL_RADIUS = 100;
    /** Radius, relative to ‖Dx‖, below which no step can change the point: the minimum to rounding. */
    private static final double MIN_RADIUS = 1e-15;
    /** Newton iterations for λ of a radius after the first: MINPACK's lmpar limit (Moré's iteration needs about two, Moré 1978 §5). */
    private static final int RADIUS_ITERATIONS = 10;
    /** A damped step within this fraction of the radius is on its edge; a Gauss–Newton step inside (1 + it) Δ is taken (MINPACK's lmpar 0.1). */
    private static final double RADIUS_TOLERANCE = 0.1;
    /**
     * Gauss–Newton decrement below which the undamped step is taken (the point within 1e-3 σ of the minimum,
     * where the quadratic model is exact to far below that): χ² then changes by less than it can be
     * resolved, so a step is kept unless it raises χ² beyond its rounding.
     */
    static final double POLISH_DECREMENT = 1e-6;
    /** Relative rounding of χ², a sum of some hundred squares (common practice: a few hundred ε). */
    private static final double ROUNDING = 1e-13;
    /**
     * Relative precision of a model current near its peak, where I/σ is large (ErrorFunction's erf and erfc
     * within 1e-15, SPF-1): a window of current I and 1σ σ carries a rounding of its whitened residual of
     * about this times I/σ, and χ² of 2|r| times that.
     */
    private static final double MODEL_PRECISION = 1e-15;
    /** Rise of χ² beyond which MINPACK's region update takes the actual drop as −1 (its norm tenfold). */
    private static final double MINPACK_RISE = 100;
    private static final double LOG_LOW = -50;
    private static final double LOG_HIGH = 80;

    private double[] rows0 = new double[0];
    private double[] rows1 = new double[0];
    private double[][] jac0 = new double[0][];
    private double[][] jac1 = new double[0][];
    private double[] current = new double[0];
    private double[][] physicalJacobian = new double[0][];
    private double[] inverseSigma = new double[0];
    private final double[] priorResidual = new double[AlphaPrior.ROWS];
    private final double[][] priorGradient = new double[AlphaPrior.ROWS][MAX_PARAMETERS];
    private final double[] x = new double[MAX_PARAMETERS];
    private final double[] trial = new double[MAX_PARAMETERS];
    private final double[] phys = new double[MAX_PARAMETERS];
    private final double[] gradient = new double[MAX_PARAMETERS];
    private final double[] scale = new double[MAX_PARAMETERS];
    private final double[] step = new double[MAX_PARAMETERS];
    private final double[] normal = new double[MAX_PARAMETERS * MAX_PARAMETERS];
    private final double[] factor = new double[MAX_PARAMETERS * MAX_PARAMETERS];
    private final double[] inverse = new double[MAX_PARAMETERS * MAX_PARAMETERS];
    private final double[] column = new double[MAX_PARAMETERS];

    /** The rounding of χ² of the last evaluation (see {@link #MODEL_PRECISION}). */
    private double trialRounding;
    private double[] residual;
    private double[][] jacobian;
    private double[] trialResidual;
    private double[][] trialJacobian;

    // the outcome of the last fit
    private final double[] parameters = new double[MAX_PARAMETERS];
    private final double[] covariance = new double[MAX_PARAMETERS * MAX_PARAMETERS];
    private boolean hasCovariance;
    private double chiSquare;
    private int iterations;
    private int parameterCount;

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

    /** Iterations (steps tried) of the last fit. */
    int iterations() {
        return iterations;
    }

    /**
     * Fits {@code model} to {@code amps} (1σ {@code sigma}) from {@code startPhysical}, with {@code prior}
     * rows (joint model only; null for none). False when the iterations run out or the point is not finite;
     * the outcome is then undefined.
     */
    boolean fit(PlasmaModel model, double[] amps, double[] sigma, double[] startPhysical, AlphaPrior prior) {
        int np = model.parameters();
        int m = model.windows();
        int rows = m + (prior == null ? 0 : AlphaPrior.ROWS);
        ensure(m, rows);
        parameterCount = np;
        hasCovariance = false;
        for (int j = 0; j < m; j++) {
            inverseSigma[j] = 1 / Math.max(sigma[j], LeastSquaresRun.MIN_SIGMA_AMPS);
        }
        for (int a = 0; a < np; a++) {
            x[a] = isLog(a) ? Math.log(startPhysical[a]) : startPhysical[a];
        }
        clamp(x, np);
        double cost = evaluate(model, amps, prior, x, np, m, residual, jacobian);
        if (!Double.isFinite(cost)) {
            return false;
        }
        double rounding = trialRounding;
        double lowest = cost;
        java.util.Arrays.fill(scale, 0.0);
        double radius = -1;
        double lambda = 0;
        double lastDecrement = Double.POSITIVE_INFINITY;
        boolean polishRefused = false;
        int evaluations = 1;
        for (iterations = 1; iterations <= LeastSquaresRun.MAX_ITERATIONS; iterations++) {
            normalEquations(jacobian, residual, rows, np);
            for (int a = 0; a < np; a++) {
                scale[a] = Math.max(scale[a], Math.sqrt(normal[a * np + a]));
                if (!(scale[a] > 0)) {
                    scale[a] = 1;
                }
            }
            if (radius < 0) {
                double scaledX = scaledNorm(x, np);
                radius = scaledX > 0 ? INITIAL_RADIUS * scaledX : INITIAL_RADIUS;
            }
            // the Gauss–Newton step and its decrement gᵀ(JᵀJ)⁻¹g: the χ² the full step would remove, the
            // squared distance to the minimum in units of the parameters' 1σ
            boolean newton = dampedStep(np, 0.0);
            double decrement = newton ? dot(gradient, step, np) : Double.POSITIVE_INFINITY;
            if (decrement <= STEP_SIGMAS * STEP_SIGMAS || decrement <= POLISH_DECREMENT && withinRelative(np, decrement)) {
                break;
            }
            boolean polishing = decrement <= POLISH_DECREMENT && !polishRefused && decrement < lastDecrement;
            // (Gauss–Newton steps that no longer shrink the decrement hand back to the region's steps)
            lastDecrement = decrement;
            lambda = polishing || newton && scaledNorm(step, np) <= (1 + RADIUS_TOLERANCE) * radius ? 0.0
                    : dampingForRadius(np, radius, lambda, newton);
            while (lambda > 0 && !dampedStep(np, lambda)) {
                // JᵀJ + λD² too near singular for Cholesky: more damping, until λ overflows (then JᵀJ or Jᵀr
                // is not finite, or the diagonal vanishes: no step and no fit)
                lambda *= 10;
                if (!Double.isFinite(lambda)) {
                    return false;
                }
            }
            double stepLength = scaledNorm(step, np);
            if (iterations == 1) {
                // MINPACK lmder: the first region is cut to the first step
                radius = Math.min(radius, stepLength);
            }
            for (int a = 0; a < np; a++) {
                trial[a] = x[a] + step[a];
            }
            clamp(trial, np);
            if (evaluations++ >= LeastSquaresRun.MAX_EVALUATIONS) {
                return false;
            }
            double trialCost = evaluate(model, amps, prior, trial, np, m, trialResidual, trialJacobian);
            double predicted = 0;
            for (int a = 0; a < np; a++) {
                predicted += step[a] * (lambda * scale[a] * scale[a] * step[a] + gradient[a]);
            }
            // MINPACK lmder's region update (Moré 1978 §4), in χ² relative to the current χ²; an actual drop
            // of −1 when χ² rises more than a hundredfold (the norm tenfold)
            double actual = trialCost < MINPACK_RISE * cost ? 1 - trialCost / cost : -1;
            double ratio = predicted > 0 ? actual / (predicted / cost) : 0;
            if (ratio <= 0.25) {
                double slope = -dot(gradient, step, np) / cost;
                double shrink = actual < 0 ? 0.5 * slope / (slope + 0.5 * actual) : 0.5;
                if (!(trialCost < MINPACK_RISE * cost) || !(shrink >= 0.1)) {
                    shrink = 0.1;
                }
                radius = shrink * Math.min(radius, 10 * stepLength);
                lambda /= shrink;
            } else if (lambda == 0 || ratio >= 0.75) {
                radius = 2 * stepLength;
                lambda *= 0.5;
            }
            if (polishing ? trialCost <= lowest + rounding : trialCost < cost) {
                System.arraycopy(trial, 0, x, 0, np);
                swap();
                cost = trialCost;
                lowest = Math.min(lowest, cost);
                rounding = trialRounding;
                polishRefused = false;
            } else if (polishing) {
                // the undamped step overshoots (the model is not yet quadratic at this distance): damp again
                polishRefused = true;
                lastDecrement = Double.POSITIVE_INFINITY;
            } else if (predicted <= rounding || !(radius > MIN_RADIUS * scaledNorm(x, np))) {
                // no step lowers χ² by more than its rounding: the point is the minimum to rounding
                break;
            }
        }
        if (iterations > LeastSquaresRun.MAX_ITERATIONS && !(lastDecrement <= POLISH_DECREMENT)) {
            // out of iterations farther than 1e-3 σ from the minimum: no fit (within it, where the residuals'
            // curvature slows the last digits, the point is kept)
            return false;
        }
        for (int a = 0; a < np; a++) {
            parameters[a] = isLog(a) ? Math.exp(x[a]) : x[a];
            if (!Double.isFinite(parameters[a])) {
                return false;
            }
        }
        chiSquare = cost;
        normalEquations(jacobian, residual, rows, np);
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
     * True when every parameter lies within {@link #RELATIVE_DISTANCE} of the minimum: |x_a − x̂_a| ≤
     * √(C_aa · decrement) (Cauchy–Schwarz in the metric JᵀJ, C its inverse), relative for U and absolute
     * for the logarithms (a relative distance of n and w). {@link #factor} holds the Cholesky factor of JᵀJ.
     */
    private boolean withinRelative(int np, double decrement) {
        for (int a = 0; a < np; a++) {
            java.util.Arrays.fill(column, 0, np, 0.0);
            column[a] = 1;
            solve(factor, np, column);
            double scaleA = isLog(a) ? 1 : Math.abs(x[a]);
            if (!(column[a] * decrement <= sq(RELATIVE_DISTANCE * scaleA))) {
                return false;
            }
        }
        return true;
    }

    /** ‖D v‖. */
    private double scaledNorm(double[] v, int np) {
        double s = 0;
        for (int a = 0; a < np; a++) {
            s += sq(scale[a] * v[a]);
        }
        return Math.sqrt(s);
    }

    /**
     * λ for which the damped step's scaled length ‖Dδ(λ)‖ is within {@link #RADIUS_TOLERANCE} of {@code radius},
     * by MINPACK's lmpar (Moré 1978 §5, as Hipparchus' LevenbergMarquardtOptimizer ports it): Newton's
     * iteration on φ(λ) = ‖Dδ‖ − Δ, λ ← max(l, λ + (φ/Δ)/‖L⁻¹D²δ/‖Dδ‖‖²), inside the bracket [l, u] that
     * starts at l = φ(0)/(Δ‖L⁻¹D²δ_GN/‖Dδ_GN‖‖²) (0 without a Gauss–Newton step) and u = ‖D⁻¹g‖/Δ, from the
     * previous fit's λ held to the bracket. Called when the Gauss–Newton step ({@code newton}: in {@link #step},
     * its factor in {@link #factor}) is longer than the region or does not exist; the step is left in
     * {@link #step}.
     */
    private double dampingForRadius(int np, double radius, double previous, boolean newton) {
        double length = newton ? scaledNorm(step, np) : Double.POSITIVE_INFINITY;
        double phi = length - radius;
        double low = 0;
        if (newton) {
            low = phi / (radius * newtonDenominator(np, length));
        }
        double gradientNorm = 0;
        for (int a = 0; a < np; a++) {
            gradientNorm += sq(gradient[a] / scale[a]);
        }
        gradientNorm = Math.sqrt(gradientNorm);
        double high = gradientNorm / radius;
        if (high == 0) {
            high = Double.MIN_NORMAL / Math.min(radius, 0.1);
        }
        double lambda = Math.min(high, Math.max(previous, low));
        if (lambda == 0) {
            lambda = newton ? gradientNorm / length : 0;
        }
        for (int k = 0; k <= RADIUS_ITERATIONS; k++) {
            if (lambda == 0) {
                lambda = Math.max(Double.MIN_NORMAL, 1e-3 * high);
            }
            if (!dampedStep(np, lambda)) {
                // JᵀJ + λD² too near singular for Cholesky: more damping
                low = lambda;
                lambda *= 10;
                continue;
            }
            length = scaledNorm(step, np);
            double previousPhi = phi;
            phi = length - radius;
            if (Math.abs(phi) <= RADIUS_TOLERANCE * radius || low == 0 && phi <= previousPhi && previousPhi < 0) {
                break;
            }
            double correction = phi / (radius * newtonDenominator(np, length));
            if (phi > 0) {
                low = Math.max(low, lambda);
            } else if (phi < 0) {
                high = Math.min(high, lambda);
            }
            lambda = Math.max(low, lambda + correction);
        }
        return lambda;
    }

    /** ‖L⁻¹D²δ/‖Dδ‖‖², L the Cholesky factor in {@link #factor} and δ the step in {@link #step} of scaled length {@code length}. */
    private double newtonDenominator(int np, double length) {
        for (int a = 0; a < np; a++) {
            column[a] = sq(scale[a]) * step[a] / length;
        }
        forwardSolve(factor, np, column);
        return dot(column, column, np);
    }

    /** Scratch rows for the prior's χ² and leverage after a fit (overwritten by the next fit). */
    double[] priorResidual() {
        return priorResidual;
    }

    /** Scratch gradients, {@link AlphaPrior#ROWS} × 6, as {@link #priorResidual}. */
    double[][] priorGradient() {
        return priorGradient;
    }

    private static boolean isLog(int a) {
        return a % 3 != 1;
    }

    private static double sq(double v) {
        return v * v;
    }

    private static double dot(double[] u, double[] v, int n) {
        double s = 0;
        for (int a = 0; a < n; a++) {
            s += u[a] * v[a];
        }
        return s;
    }

    private static void clamp(double[] p, int np) {
        for (int a = 0; a < np; a++) {
            p[a] = isLog(a) ? Math.max(LOG_LOW, Math.min(LOG_HIGH, p[a]))
                    : Math.max(LeastSquaresRun.MIN_SPEED, Math.min(LeastSquaresRun.MAX_SPEED, p[a]));
        }
    }

    private void swap() {
        double[] r = residual;
        residual = trialResidual;
        trialResidual = r;
        double[][] j = jacobian;
        jacobian = trialJacobian;
        trialJacobian = j;
    }

    /** Whitened residuals and Jacobian at {@code at} (optimiser parameters) into {@code r}, {@code jj}; χ². */
    private double evaluate(PlasmaModel model, double[] amps, AlphaPrior prior, double[] at, int np, int m,
            double[] r, double[][] jj) {
        for (int a = 0; a < np; a++) {
            phys[a] = isLog(a) ? Math.exp(at[a]) : at[a];
        }
        model.evaluate(phys, current, physicalJacobian);
        double cost = 0;
        double rounding = 0;
        for (int j = 0; j < m; j++) {
            double w = inverseSigma[j];
            double rj = (amps[j] - current[j]) * w;
            r[j] = rj;
            cost += rj * rj;
            rounding += Math.abs(rj) * Math.abs(current[j]) * w;
            double[] pj = physicalJacobian[j];
            double[] out = jj[j];
            for (int a = 0; a < np; a++) {
                out[a] = (isLog(a) ? pj[a] * phys[a] : pj[a]) * w;
            }
        }
        if (prior != null) {
            prior.rows(phys, priorResidual, priorGradient);
            for (int i = 0; i < AlphaPrior.ROWS; i++) {
                double ri = -priorResidual[i];
                r[m + i] = ri;
                cost += ri * ri;
                double[] out = jj[m + i];
                for (int a = 0; a < np; a++) {
                    out[a] = isLog(a) ? priorGradient[i][a] * phys[a] : priorGradient[i][a];
                }
            }
        }
        trialRounding = 2 * MODEL_PRECISION * rounding + ROUNDING * cost;
        return cost;
    }

    /** JᵀJ into {@link #normal} and Jᵀr into {@link #gradient}. */
    private void normalEquations(double[][] jj, double[] r, int rows, int np) {
        java.util.Arrays.fill(normal, 0, np * np, 0.0);
        java.util.Arrays.fill(gradient, 0, np, 0.0);
        for (int j = 0; j < rows; j++) {
            double[] row = jj[j];
            double rj = r[j];
            for (int a = 0; a < np; a++) {
                double ja = row[a];
                gradient[a] += ja * rj;
                int base = a * np;
                for (int b = 0; b <= a; b++) {
                    normal[base + b] += ja * row[b];
                }
            }
        }
        for (int a = 0; a < np; a++) {
            for (int b = 0; b < a; b++) {
                normal[b * np + a] = normal[a * np + b];
            }
        }
    }

    /** δ of (JᵀJ + λD²) δ = Jᵀr into {@link #step}; false when the matrix is not positive definite. */
    private boolean dampedStep(int np, double lambda) {
        for (int a = 0; a < np; a++) {
            for (int b = 0; b < np; b++) {
                factor[a * np + b] = normal[a * np + b];
            }
            factor[a * np + a] += lambda * sq(scale[a]);
        }
        if (!cholesky(factor, np)) {
            return false;
        }
        System.arraycopy(gradient, 0, step, 0, np);
        solve(factor, np, step);
        for (int a = 0; a < np; a++) {
            if (!Double.isFinite(step[a])) {
                return false;
            }
        }
        return true;
    }

    /** (JᵀJ)⁻¹ into {@link #inverse}, equilibrated by its diagonal; false when singular. */
    private boolean invertNormal(int np) {
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
            java.util.Arrays.fill(step, 0, np, 0.0);
            step[b] = 1;
            solve(factor, np, step);
            for (int a = 0; a < np; a++) {
                inverse[a * np + b] = step[a] * column[a] * column[b];
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

    /** Solves L y = b in place. */
    private static void forwardSolve(double[] l, int n, double[] b) {
        for (int i = 0; i < n; i++) {
            double s = b[i];
            for (int k = 0; k < i; k++) {
                s -= l[i * n + k] * b[k];
            }
            b[i] = s / l[i * n + i];
        }
    }

    /** Solves L Lᵀ y = b in place. */
    private static void solve(double[] l, int n, double[] b) {
        forwardSolve(l, n, b);
        for (int i = n - 1; i >= 0; i--) {
            double s = b[i];
            for (int k = i + 1; k < n; k++) {
                s -= l[k * n + i] * b[k];
            }
            b[i] = s / l[i * n + i];
        }
    }

    /** Grows the workspaces to {@code windows} model rows and {@code rows} rows in all. */
    private void ensure(int windows, int rows) {
        if (rows0.length < rows) {
            int n = Math.max(rows, 2 * rows0.length);
            rows0 = new double[n];
            rows1 = new double[n];
            jac0 = new double[n][MAX_PARAMETERS];
            jac1 = new double[n][MAX_PARAMETERS];
            residual = rows0;
            trialResidual = rows1;
            jacobian = jac0;
            trialJacobian = jac1;
        }
        if (current.length < windows) {
            int n = Math.max(windows, 2 * current.length);
            current = new double[n];
            inverseSigma = new double[n];
            physicalJacobian = new double[n][MAX_PARAMETERS];
        }
    }
}
