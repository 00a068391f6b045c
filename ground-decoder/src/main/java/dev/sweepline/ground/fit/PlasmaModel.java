package dev.sweepline.ground.fit;

/**
 * The summed-spectrum model: protons, optionally plus alphas, as convected Maxwellians along the cup
 * normal, each window the sum of {@link WindowCurrent} of the species present, times the effective area
 * (ICD §8). Physical parameters, in order: n_p (m⁻³), U_p (normal speed, m/s), w_p (m/s), then for the
 * joint model n_α, U_α, w_α. Thresholds v = √(2qV/m) are taken at the calibrated window edges.
 *
 * <p>A drift model (an interleaved spectrum, ICD §4 flags bit 5: {@link #PlasmaModel(double[], double[], double,
 * boolean, double[])}) has one parameter more, last: ΔU, the normal speed's change over the sweep (m/s). Window j,
 * read at the fraction τ_j ∈ [0, 1] of the sweep, sees the normal speed U + ΔU (τ_j − ½), the alphas U_α + ΔU
 * (τ_j − ½), so U and U_α are the mid-sweep speeds, and ∂I_j/∂ΔU = (τ_j − ½) ∂I_j/∂U summed over the species
 * (docs/physics.md, "Speed drift within an interleaved sweep").
 */
public final class PlasmaModel {
    /** Parameters of the proton-only model. */
    public static final int PROTON_PARAMETERS = 3;
    /** Parameters of the joint proton + alpha model. */
    public static final int JOINT_PARAMETERS = 6;
    /** Bound of |ΔU| while iterating, m/s: a guard, far above any change of the wind within a sweep. */
    static final double MAX_SPEED_CHANGE = 1e5;

    private final int windows;
    private final boolean withAlphas;
    /** The effective area, m²: a {@link ModelCache} moves its model to the next spectrum's area. */
    private double areaM2;
    private final double[] pV1;
    private final double[] pV2;
    private final double[] aV1;
    private final double[] aV2;
    private final double[] scratch = new double[4];
    private final double[] lowVolts;
    private final double[] highVolts;
    /** Index of window j's low and high edge in the edge arrays: adjacent windows share an edge. */
    private final int[] lowEdge;
    private final int[] highEdge;
    private final double[] protonEdge;
    private final double[] alphaEdge;
    // per edge, for one species at a time: x = (v − U)/w, exp(−x²), erfc|x|, erf x
    private final double[] edgeX;
    private final double[] edgeExp;
    private final double[] edgeErfc;
    private final double[] edgeErf;
    /** τ_j − ½ per window of a drift model; null otherwise. */
    private final double[] fromMiddle;
    private final double[] stepFraction;

    /**
     * @param lowVolts   low window edges, V
     * @param highVolts  high window edges, V
     * @param areaM2     effective area (times acceptance), m²
     * @param withAlphas joint model (6 parameters) or protons only (3)
     */
    public PlasmaModel(double[] lowVolts, double[] highVolts, double areaM2, boolean withAlphas) {
        this(lowVolts, highVolts, areaM2, withAlphas, null);
    }

    /**
     * A model whose windows were read at the sweep fractions {@code stepFraction} (τ_j ∈ [0, 1], {@link
     * SpectrumInput#stepFraction}): with ΔU as the last parameter; null gives the model without it.
     */
    public PlasmaModel(double[] lowVolts, double[] highVolts, double areaM2, boolean withAlphas,
            double[] stepFraction) {
        this.windows = lowVolts.length;
        this.stepFraction = stepFraction == null ? null : stepFraction.clone();
        if (stepFraction != null) {
            fromMiddle = new double[windows];
            for (int j = 0; j < windows; j++) {
                fromMiddle[j] = stepFraction[j] - 0.5;
            }
        } else {
            fromMiddle = null;
        }
        this.lowVolts = lowVolts.clone();
        this.highVolts = highVolts.clone();
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
        lowEdge = new int[windows];
        highEdge = new int[windows];
        int edges = 0;
        for (int j = 0; j < windows; j++) {
            lowEdge[j] = j > 0 && lowVolts[j] == highVolts[j - 1] ? highEdge[j - 1] : edges++;
            highEdge[j] = edges++;
        }
        protonEdge = new double[edges];
        alphaEdge = new double[edges];
        for (int j = 0; j < windows; j++) {
            protonEdge[lowEdge[j]] = pV1[j];
            protonEdge[highEdge[j]] = pV2[j];
            alphaEdge[lowEdge[j]] = aV1[j];
            alphaEdge[highEdge[j]] = aV2[j];
        }
        edgeX = new double[edges];
        edgeExp = new double[edges];
        edgeErfc = new double[edges];
        edgeErf = new double[edges];
    }

    /** True when this model's windows are {@code low}–{@code high} (model kind and area aside). */
    boolean sameWindows(double[] low, double[] high) {
        return java.util.Arrays.equals(low, lowVolts) && java.util.Arrays.equals(high, highVolts);
    }

    /** True when this model's windows are {@code low}–{@code high} read at {@code stepFraction} (null: no drift). */
    boolean sameWindows(double[] low, double[] high, double[] stepFraction) {
        return sameWindows(low, high) && java.util.Arrays.equals(stepFraction, this.stepFraction);
    }

    /**
     * Moves the model to effective area {@code area}, m²: the thresholds and edges depend on the windows
     * alone, the area only scales the currents, so the model is then, bit for bit, the one built on that area.
     */
    void setArea(double area) {
        areaM2 = area;
    }

    /** Number of parameters. */
    public int parameters() {
        return (withAlphas ? JOINT_PARAMETERS : PROTON_PARAMETERS) + (fromMiddle != null ? 1 : 0);
    }

    /** True for a drift model: ΔU is its last parameter. */
    public boolean withDrift() {
        return fromMiddle != null;
    }

    /** Index of ΔU among the parameters, −1 without drift. */
    public int driftIndex() {
        return fromMiddle != null ? parameters() - 1 : -1;
    }

    /** τ_j − ½ of window j (0 without drift): its normal speed is U + ΔU (τ_j − ½). */
    public double fromMiddle(int j) {
        return fromMiddle != null ? fromMiddle[j] : 0;
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
     * physical parameters into {@code jacobian[j][a]}. The same values as {@link WindowCurrent#evaluate} per
     * window, bit for bit, with the error function and exponential taken once per edge.
     */
    public void evaluate(double[] p, double[] current, double[][] jacobian) {
        if (fromMiddle != null) {
            drifting(p, current, jacobian);
            return;
        }
        species(Species.PROTON.chargeC() * areaM2, p[0], p[1], p[2], protonEdge, pV1, pV2, 0, current, jacobian);
        if (withAlphas) {
            species(Species.ALPHA.chargeC() * areaM2, p[3], p[4], p[5], alphaEdge, aV1, aV2, 3, current, jacobian);
        }
    }

    /** One species' share: written into {@code current} for the protons (offset 0), added for the alphas. */
    private void species(double chargeAreaC, double n, double u, double w, double[] edge, double[] v1, double[] v2,
            int offset, double[] current, double[][] jacobian) {
        // the edge arrays as locals: the quick compiler (C1, which the bench's campaigns run) reloads fields per iteration
        final double[] edgeX = this.edgeX;
        final double[] edgeExp = this.edgeExp;
        final double[] edgeErfc = this.edgeErfc;
        final double[] edgeErf = this.edgeErf;
        final int[] lowEdge = this.lowEdge;
        final int[] highEdge = this.highEdge;
        for (int k = 0; k < edge.length; k++) {
            double x = (edge[k] - u) / w;
            edgeX[k] = x;
            edgeExp[k] = Math.exp(-x * x);
            double erfc = WindowCurrent.erfcOfEdge(x);
            edgeErfc[k] = erfc;
            edgeErf[k] = WindowCurrent.erfOfEdge(x, erfc);
        }
        for (int j = 0; j < windows; j++) {
            int a = lowEdge[j];
            int b = highEdge[j];
            double xa = edgeX[a];
            double xb = edgeX[b];
            double derf = WindowCurrent.difference(xa, edgeErfc[a], edgeErf[a], xb, edgeErfc[b], edgeErf[b]);
            double value = WindowCurrent.combineInto(chargeAreaC, n, u, w, v1[j], v2[j], xa, xb, edgeExp[a], edgeExp[b],
                    derf, jacobian == null ? null : jacobian[j], offset);
            current[j] = offset == 0 ? value : current[j] + value;
        }
    }

    /**
     * The drift model: every window at its own speeds U + ΔU (τ_j − ½) and U_α + ΔU (τ_j − ½), so adjacent
     * windows share no edge value; ∂I_j/∂ΔU = (τ_j − ½) Σ ∂I_j/∂U of the species.
     */
    private void drifting(double[] p, double[] current, double[][] jacobian) {
        int d = driftIndex();
        double du = p[d];
        double qp = Species.PROTON.chargeC() * areaM2;
        double qa = Species.ALPHA.chargeC() * areaM2;
        for (int j = 0; j < windows; j++) {
            double shift = du * fromMiddle[j];
            WindowCurrent.evaluate(qp, p[0], p[1] + shift, p[2], pV1[j], pV2[j], scratch);
            current[j] = scratch[WindowCurrent.VALUE];
            double dSpeed = scratch[WindowCurrent.D_SPEED];
            if (jacobian != null) {
                jacobian[j][0] = scratch[WindowCurrent.D_DENSITY];
                jacobian[j][1] = scratch[WindowCurrent.D_SPEED];
                jacobian[j][2] = scratch[WindowCurrent.D_THERMAL];
            }
            if (withAlphas) {
                WindowCurrent.evaluate(qa, p[3], p[4] + shift, p[5], aV1[j], aV2[j], scratch);
                current[j] += scratch[WindowCurrent.VALUE];
                dSpeed += scratch[WindowCurrent.D_SPEED];
                if (jacobian != null) {
                    jacobian[j][3] = scratch[WindowCurrent.D_DENSITY];
                    jacobian[j][4] = scratch[WindowCurrent.D_SPEED];
                    jacobian[j][5] = scratch[WindowCurrent.D_THERMAL];
                }
            }
            if (jacobian != null) {
                jacobian[j][d] = fromMiddle[j] * dSpeed;
            }
        }
    }

    /**
     * Current of one species alone in window j for parameters (n, U, w) and the speed change ΔU over the
     * sweep (window j at U + ΔU (τ_j − ½); ΔU is ignored without drift), A.
     */
    public double speciesCurrent(Species s, int j, double n, double u, double w, double du) {
        return speciesCurrent(s, j, n, fromMiddle != null ? u + du * fromMiddle[j] : u, w);
    }

    /** Current of one species alone in window j for parameters (n, U, w), A. */
    public double speciesCurrent(Species s, int j, double n, double u, double w) {
        boolean proton = s == Species.PROTON;
        return WindowCurrent.current(s.chargeC() * areaM2, n, u, w, proton ? pV1[j] : aV1[j], proton ? pV2[j] : aV2[j]);
    }
}
