package dev.sweepline.ground.fit;

import java.util.Arrays;
import java.util.Collections;
import java.util.EnumSet;

/**
 * A reusable result of fitting one spectrum, filled by {@link SpectrumFitter#fitInto}: the same values as
 * {@link PlasmaFit} (see its fields), kept in arrays and fields this holder owns, so that a fit into it
 * allocates nothing after warm-up. {@link #toPlasmaFit} makes the immutable result. One holder per thread.
 *
 * <p>Opt-in warm start ({@link #warmStart(boolean)}): the holder keeps the last good proton solution, and the
 * next fit starts from it instead of {@link InitialGuess}; spectra fitted in time order then need fewer
 * iterations. The fitter falls back to the initial guess when the warm start fails or ends poorer (see
 * {@link SpectrumFitter#fitInto}).
 */
public final class MutablePlasmaFit {
    /** Moments per species in {@link SpeciesMoments}' field order. */
    static final int MOMENTS = 8;
    private static final FitFlag[] ALL_FLAGS = FitFlag.values();

    final EnumSet<FitFlag> flags = EnumSet.noneOf(FitFlag.class);
    final double[] protons = new double[MOMENTS];
    final double[] alphas = new double[MOMENTS];
    FlowAngles angles = FlowAngles.NONE;
    double reducedChiSquare = Double.NaN;
    int windowsUsed;
    int iterations;
    final double[] normalParameters = new double[PlasmaModel.JOINT_PARAMETERS + 1];
    int parameterCount;
    double areaM2 = Double.NaN;
    /** The constrained alpha fit's prior, in use when {@link #hasPrior} (this holder's own instance). */
    final AlphaPrior alphaPrior = new AlphaPrior(0, 1, false);
    boolean hasPrior;
    double sigmaLogArea;
    /** ΔU along the flow and its 1σ, m/s (see {@link PlasmaFit#speedChangeMPerS}); NaN unless drift-fitted. */
    double speedChangeMPerS = Double.NaN;
    double sigmaSpeedChangeMPerS = Double.NaN;

    private boolean warmStart;
    /** The last good proton solution (n_p, U_p cos θ, w_p of the proton-only fit), when {@link #hasLast}. */
    final double[] lastProtons = new double[PlasmaModel.PROTON_PARAMETERS];
    boolean hasLast;
    /** Whether the last fit's proton solution came from the warm start. */
    boolean warmStarted;

    /** Turns the warm start from the previous spectrum's solution on or off (off by default); off forgets it. */
    public MutablePlasmaFit warmStart(boolean on) {
        warmStart = on;
        if (!on) {
            hasLast = false;
        }
        return this;
    }

    /** True when the warm start is on. */
    public boolean warmStart() {
        return warmStart;
    }

    /** True when the last fit's proton solution was started from the previous spectrum's. */
    public boolean warmStarted() {
        return warmStarted;
    }

    /** Clears the result before a fit of {@code windows} windows (the warm-start state stays). */
    void reset(int windows) {
        flags.clear();
        Arrays.fill(protons, Double.NaN);
        Arrays.fill(alphas, Double.NaN);
        angles = FlowAngles.NONE;
        reducedChiSquare = Double.NaN;
        windowsUsed = windows;
        iterations = 0;
        parameterCount = 0;
        areaM2 = Double.NaN;
        hasPrior = false;
        sigmaLogArea = 0.0;
        speedChangeMPerS = Double.NaN;
        sigmaSpeedChangeMPerS = Double.NaN;
        warmStarted = false;
    }

    /** Marks the fit failed, as {@link PlasmaFit#failed}: the flags set so far, these angles and area. */
    void failed(FlowAngles a, double area) {
        Arrays.fill(protons, Double.NaN);
        Arrays.fill(alphas, Double.NaN);
        angles = a;
        reducedChiSquare = Double.NaN;
        iterations = 0;
        parameterCount = 0;
        areaM2 = area;
        hasPrior = false;
        sigmaLogArea = 0.0;
        speedChangeMPerS = Double.NaN;
        sigmaSpeedChangeMPerS = Double.NaN;
    }

    /** True unless a failure flag is set. */
    public boolean ok() {
        for (FitFlag f : ALL_FLAGS) {
            if (f.failure() && flags.contains(f)) {
                return false;
            }
        }
        return true;
    }

    /** True when {@code flag} is set. */
    public boolean has(FitFlag flag) {
        return flags.contains(flag);
    }

    /** True when the joint proton + alpha model was fitted. */
    public boolean alphasFitted() {
        return PlasmaFit.alphasIn(parameterCount);
    }

    /** True when the speed's change over the sweep, ΔU, was fitted (an interleaved spectrum). */
    public boolean driftFitted() {
        return PlasmaFit.driftIn(parameterCount);
    }

    /** Proton density n_p, m⁻³ (NaN on failure). */
    public double protonDensityPerM3() {
        return protons[0];
    }

    /** Proton bulk speed |U_p|, m/s. */
    public double protonSpeedMPerS() {
        return protons[1];
    }

    /** Proton thermal speed w_p, m/s. */
    public double protonThermalSpeedMPerS() {
        return protons[2];
    }

    /** Alpha density n_α, m⁻³ (NaN unless fitted). */
    public double alphaDensityPerM3() {
        return alphas[0];
    }

    /** Optimiser iterations of the kept fit. */
    public int iterations() {
        return iterations;
    }

    /** χ² / (windows − parameters); NaN on failure. */
    public double reducedChiSquare() {
        return reducedChiSquare;
    }

    /** Parameters of the model along the normal (see {@link PlasmaFit#normalParameters}); 0 on failure. */
    public int parameterCount() {
        return parameterCount;
    }

    /** Normal parameter {@code i} (below {@link #parameterCount}). */
    public double normalParameter(int i) {
        if (i < 0 || i >= parameterCount) {
            throw new IndexOutOfBoundsException("normal parameter " + i + " of " + parameterCount);
        }
        return normalParameters[i];
    }

    /** The immutable result, equal field by field to the values held (this allocates). */
    public PlasmaFit toPlasmaFit() {
        SpeciesMoments p = parameterCount > 0 ? moments(protons) : SpeciesMoments.NONE;
        SpeciesMoments a = alphasFitted() ? moments(alphas) : SpeciesMoments.NONE;
        return new PlasmaFit(p, a, angles, reducedChiSquare, windowsUsed, iterations,
                Collections.unmodifiableSet(EnumSet.copyOf(flags)), Arrays.copyOf(normalParameters, parameterCount),
                areaM2, hasPrior ? alphaPrior.copy() : null, sigmaLogArea, speedChangeMPerS, sigmaSpeedChangeMPerS);
    }

    private static SpeciesMoments moments(double[] m) {
        return new SpeciesMoments(m[0], m[1], m[2], m[3], m[4], m[5], m[6], m[7]);
    }
}
