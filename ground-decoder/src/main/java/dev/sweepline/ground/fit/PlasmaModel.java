package dev.sweepline.ground.fit;

/**
 * The summed-spectrum model: protons, optionally plus alphas, as convected Maxwellians along the cup
 * normal, each window the sum of {@link WindowCurrent} of the species present, times the effective area
 * (ICD §8). Physical parameters, in order: n_p (m⁻³), U_p (normal speed, m/s), w_p (m/s), then for the
 * joint model n_α, U_α, w_α. Thresholds v = √(2qV/m) are taken at the calibrated window edges.
 */
public final class PlasmaModel {
    /** Parameters of the proton-only model. */
    public static final int PROTON_PARAMETERS = 3;
    /** Parameters of the joint proton + alpha model. */
    public static final int JOINT_PARAMETERS = 6;

    private final int windows;
    private final boolean withAlphas;
    private final double areaM2;
    private final double[] pV1;
    private final double[] pV2;
    private final double[] aV1;
    private final double[] aV2;
    private final double[] scratch = new double[4];

    /**
     * @param lowVolts   low window edges, V
     * @param highVolts  high window edges, V
     * @param areaM2     effective area (times acceptance), m²
     * @param withAlphas joint model (6 parameters) or protons only (3)
     */
    public PlasmaModel(double[] lowVolts, double[] highVolts, double areaM2, boolean withAlphas) {
        this.windows = lowVolts.length;
        this.withAlphas = withAlphas;
        this.areaM2 = areaM2;
        pV1 = new double[windows];
        pV2 = new double[windows];
        aV1 = new double[windows];
        aV2 = new double[windows];
        for (int j = 0; j < windows; j++) {
            pV1[j] = Species.PROTON.thresholdSpeed(lowVolts[j]);
            pV2[j] = Species.PROTON.thresholdSpeed(highVolts[j]);
            aV1[j] = Species.ALPHA.thresholdSpeed(lowVolts[j]);
            aV2[j] = Species.ALPHA.thresholdSpeed(highVolts[j]);
        }
    }

    /** Number of parameters. */
    public int parameters() {
        return withAlphas ? JOINT_PARAMETERS : PROTON_PARAMETERS;
    }

    /** Number of windows. */
    public int windows() {
        return windows;
    }

    /** True for the joint model. */
    public boolean withAlphas() {
        return withAlphas;
    }

    /** Proton thresholds of window j, m/s: {low, high}. */
    public double protonThreshold(int j, boolean high) {
        return high ? pV2[j] : pV1[j];
    }

    /** Alpha thresholds of window j, m/s. */
    public double alphaThreshold(int j, boolean high) {
        return high ? aV2[j] : aV1[j];
    }

    /**
     * Window currents (A) into {@code current} and, when {@code jacobian} is not null, ∂I_j/∂θ_a in
     * physical parameters into {@code jacobian[j][a]}.
     */
    public void evaluate(double[] p, double[] current, double[][] jacobian) {
        double qpA = Species.PROTON.chargeC() * areaM2;
        double qaA = Species.ALPHA.chargeC() * areaM2;
        for (int j = 0; j < windows; j++) {
            WindowCurrent.evaluate(qpA, p[0], p[1], p[2], pV1[j], pV2[j], scratch);
            double i = scratch[WindowCurrent.VALUE];
            if (jacobian != null) {
                jacobian[j][0] = scratch[WindowCurrent.D_DENSITY];
                jacobian[j][1] = scratch[WindowCurrent.D_SPEED];
                jacobian[j][2] = scratch[WindowCurrent.D_THERMAL];
            }
            if (withAlphas) {
                WindowCurrent.evaluate(qaA, p[3], p[4], p[5], aV1[j], aV2[j], scratch);
                i += scratch[WindowCurrent.VALUE];
                if (jacobian != null) {
                    jacobian[j][3] = scratch[WindowCurrent.D_DENSITY];
                    jacobian[j][4] = scratch[WindowCurrent.D_SPEED];
                    jacobian[j][5] = scratch[WindowCurrent.D_THERMAL];
                }
            }
            current[j] = i;
        }
    }

    /** Current of one species alone in window j for parameters (n, U, w), A. */
    public double speciesCurrent(Species s, int j, double n, double u, double w) {
        boolean proton = s == Species.PROTON;
        return WindowCurrent.current(s.chargeC() * areaM2, n, u, w, proton ? pV1[j] : aV1[j], proton ? pV2[j] : aV2[j]);
    }
}
