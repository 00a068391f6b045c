package dev.sweepline.ground.fit;

/**
 * The prior of the constrained alpha component, for windows that hold part of the alpha distribution but
 * not its peak: two Gaussian pseudo-observations appended to the window rows of the joint model (physical
 * parameters n_p, U_p, w_p, n_α, U_α, w_α along the normal).
 * <ol>
 *   <li>Drift: U_α − U_p = {@link #driftMeanMPerS} ± {@link #driftSigmaMPerS}. In the fast wind the alphas
 *       stream ahead of the protons by up to about the local Alfvén speed, along the field; in the slow wind
 *       the drift is near 0 (Marsch et al. 1982, JGR 87, 52; Kasper et al. 2008, PRL 101, 261103
 *       [memory]). The ground knows no field strength, so the scale is taken from the wind itself:
 *       0 ± {@link #DRIFT_FRACTION} U_p (about 70 km/s in a 700 km/s wind, of the order of the Alfvén speed
 *       at 1 AU [memory]).</li>
 *   <li>Temperature ratio: T_α/T_p = m_α w_α² / (m_p w_p²) = {@link #TEMPERATURE_RATIO} ±
 *       {@link #TEMPERATURE_RATIO_SIGMA}: about 4 (mass-proportional temperatures) in the fast wind, lower
 *       in collisional slow wind (physics.md "alpha temperature" [memory]; Kasper et al. 2008 [memory]), so
 *       ± 2 covers 2 to 6 at 1σ.</li>
 *   <li>Abundance, only in the fallback ({@link #withAbundance}): ln(n_α/n_p) = ln {@link #ABUNDANCE_MEDIAN}
 *       ± {@link #ABUNDANCE_SIGMA_LOG}, the log-normal through the ejecta figures of physics.md (He/H &gt; 5 %
 *       in 37 % of events, &gt; 8.5 % in 12 %; Song et al. 2022): z(0.63) = 0.332, z(0.88) = 1.175, so
 *       σ = ln(8.5/5)/(1.175 − 0.332) = 0.629 and the median 5 % · e^(−0.332 σ) = 4.06 %. Without it the
 *       row is zero (residual and gradient) and adds nothing.</li>
 * </ol>
 * Each row adds ((value − mean)/σ)² to χ² and g gᵀ/σ² to the information, g the row's gradient; the
 * same rows give the fit ({@link LeastSquaresRun}), its effective number of free parameters and the bound.
 *
 *
 * <p>A value to every caller outside this package; inside it a fitter's per-thread workspace reuses one
 * instance ({@link #set}) so that a constrained fit allocates nothing, and copies it before it leaves.
 */
public final class AlphaPrior {
    /** Rows the prior adds (the abundance row zero when not in use). */
    public static final int ROWS = 3;
    /** Median n_α/n_p of the abundance row (see the class note: physics.md ejecta figures, Song et al. 2022). */
    public static final double ABUNDANCE_MEDIAN = 0.0406;
    /** 1σ of ln(n_α/n_p) of the abundance row (see the class note). */
    public static final double ABUNDANCE_SIGMA_LOG = 0.63;
    /** Drift 1σ in units of the proton speed (see the class note; [memory]). */
    public static final double DRIFT_FRACTION = 0.1;
    /** Mean T_α/T_p (physics.md "alpha temperature", [memory]). */
    public static final double TEMPERATURE_RATIO = 4.0;
    /** 1σ of T_α/T_p (see the class note; [memory]). */
    public static final double TEMPERATURE_RATIO_SIGMA = 2.0;
    private static final double MASS_RATIO = Species.ALPHA.massKg() / Species.PROTON.massKg();

    private double driftMeanMPerS;
    private double driftSigmaMPerS;
    private boolean abundance;

    /**
     * @param driftMeanMPerS  mean of U_α − U_p, m/s
     * @param driftSigmaMPerS 1σ of U_α − U_p, m/s
     * @param abundance       true when the abundance row is in use
     */
    public AlphaPrior(double driftMeanMPerS, double driftSigmaMPerS, boolean abundance) {
        set(driftMeanMPerS, driftSigmaMPerS, abundance);
    }

    /** Sets this (workspace) instance; only the fitter's own, never one that has been handed out. */
    void set(double driftMean, double driftSigma, boolean withAbundance) {
        this.driftMeanMPerS = driftMean;
        this.driftSigmaMPerS = driftSigma;
        this.abundance = withAbundance;
    }

    /** Sets this (workspace) instance to {@link #forProtonSpeed}'s prior. */
    void setForProtonSpeed(double protonSpeedMPerS) {
        set(0.0, DRIFT_FRACTION * protonSpeedMPerS, false);
    }

    /** Mean of U_α − U_p, m/s. */
    public double driftMeanMPerS() {
        return driftMeanMPerS;
    }

    /** 1σ of U_α − U_p, m/s. */
    public double driftSigmaMPerS() {
        return driftSigmaMPerS;
    }

    /** True when the abundance row is in use. */
    public boolean abundance() {
        return abundance;
    }

    /** A copy (the value of a workspace instance at this moment). */
    AlphaPrior copy() {
        return new AlphaPrior(driftMeanMPerS, driftSigmaMPerS, abundance);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof AlphaPrior a && Double.compare(a.driftMeanMPerS, driftMeanMPerS) == 0
                && Double.compare(a.driftSigmaMPerS, driftSigmaMPerS) == 0 && a.abundance == abundance;
    }

    @Override
    public int hashCode() {
        return java.util.Objects.hash(driftMeanMPerS, driftSigmaMPerS, abundance);
    }

    @Override
    public String toString() {
        return "AlphaPrior[driftMeanMPerS=" + driftMeanMPerS + ", driftSigmaMPerS=" + driftSigmaMPerS
                + ", abundance=" + abundance + "]";
    }

    /** The prior of a wind whose proton normal speed is {@code protonSpeedMPerS}: drift 0 ± 0.1 U_p. */
    public static AlphaPrior forProtonSpeed(double protonSpeedMPerS) {
        return new AlphaPrior(0.0, DRIFT_FRACTION * protonSpeedMPerS, false);
    }

    /** This prior with the abundance row added. */
    public AlphaPrior withAbundance() {
        return new AlphaPrior(driftMeanMPerS, driftSigmaMPerS, true);
    }

    /**
     * Whitened residuals r_i = (value_i − mean_i)/σ_i into {@code residual[0..1]} and their gradients in the
     * physical parameters into {@code gradient[i][0..5]}.
     */
    public void rows(double[] p, double[] residual, double[][] gradient) {
        double ratio = MASS_RATIO * p[5] * p[5] / (p[2] * p[2]);
        residual[0] = (p[4] - p[1] - driftMeanMPerS) / driftSigmaMPerS;
        residual[1] = (ratio - TEMPERATURE_RATIO) / TEMPERATURE_RATIO_SIGMA;
        for (int i = 0; i < ROWS; i++) {
            java.util.Arrays.fill(gradient[i], 0.0);
        }
        gradient[0][1] = -1 / driftSigmaMPerS;
        gradient[0][4] = 1 / driftSigmaMPerS;
        gradient[1][2] = -2 * ratio / p[2] / TEMPERATURE_RATIO_SIGMA;
        gradient[1][5] = 2 * ratio / p[5] / TEMPERATURE_RATIO_SIGMA;
        if (abundance) {
            residual[2] = (Math.log(p[3] / p[0]) - Math.log(ABUNDANCE_MEDIAN)) / ABUNDANCE_SIGMA_LOG;
            gradient[2][0] = -1 / (p[0] * ABUNDANCE_SIGMA_LOG);
            gradient[2][3] = 1 / (p[3] * ABUNDANCE_SIGMA_LOG);
        } else {
            residual[2] = 0;
        }
    }

    /** Σ r_i²: the prior's part of χ² at {@code p}. */
    public double chiSquare(double[] p) {
        return chiSquare(p, new double[ROWS], new double[ROWS][PlasmaModel.JOINT_PARAMETERS]);
    }

    /** {@link #chiSquare(double[])} with scratch rows {@code r} ({@link #ROWS}) and {@code g} ({@link #ROWS} × 6). */
    double chiSquare(double[] p, double[] r, double[][] g) {
        rows(p, r, g);
        return r[0] * r[0] + r[1] * r[1] + r[2] * r[2];
    }

    /** The prior's information Σ g gᵀ at {@code p}, 6 × 6, physical parameters. */
    public double[][] information(double[] p) {
        double[][] g = new double[ROWS][PlasmaModel.JOINT_PARAMETERS];
        rows(p, new double[ROWS], g);
        int np = PlasmaModel.JOINT_PARAMETERS;
        double[][] f = new double[np][np];
        for (double[] row : g) {
            for (int a = 0; a < np; a++) {
                for (int b = 0; b < np; b++) {
                    f[a][b] += row[a] * row[b];
                }
            }
        }
        return f;
    }

    /**
     * How many parameters the prior pins down: tr(F_prior · Cov) = Σ_i g_iᵀ Cov g_i, between 0 (data alone
     * fix the alphas) and {@link #ROWS} (the prior alone does). The model's effective number of free
     * parameters is its parameter count less this (the trace of the hat matrix of a penalised fit: Hastie &amp;
     * Tibshirani 1990, Generalized Additive Models §3.5 [memory]).
     *
     * @param cov the fit's covariance (F_data + F_prior)⁻¹, physical parameters
     */
    public double leverage(double[] p, double[][] cov) {
        return leverage(p, cov, new double[ROWS], new double[ROWS][PlasmaModel.JOINT_PARAMETERS]);
    }

    /** {@link #leverage(double[], double[][])} with scratch rows {@code r} and {@code g} as {@link #chiSquare}'s. */
    double leverage(double[] p, double[][] cov, double[] r, double[][] g) {
        rows(p, r, g);
        double sum = 0;
        int np = Math.min(cov.length, g[0].length); // a drift fit's ΔU (last) has no prior row: its column is 0
        for (double[] row : g) {
            for (int a = 0; a < np; a++) {
                for (int b = 0; b < np; b++) {
                    sum += row[a] * cov[a][b] * row[b];
                }
            }
        }
        return sum;
    }
}
