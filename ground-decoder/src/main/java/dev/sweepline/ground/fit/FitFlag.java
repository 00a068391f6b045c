package dev.sweepline.ground.fit;

/** What went wrong or is worth knowing about one fit. Failures leave the moments unset (NaN). */
public enum FitFlag {
    /** Fewer usable windows than the model needs plus one (no degree of freedom): failure. */
    TOO_FEW_WINDOWS(true),
    /** The summed current is below 5σ of its noise (e.g. an all-zero spectrum): failure. */
    NO_SIGNAL(true),
    /** The optimiser did not converge, or converged to non-physical values: failure. */
    NO_CONVERGENCE(true),
    /** No window of the spectrum has known edges (table id not known): failure. */
    NO_CALIBRATION(true),
    /** Windows with a saturated quadrant were left out. */
    SATURATED_DROPPED(false),
    /** The fitted proton peak E/q lies outside the measured windows. */
    PEAK_OUTSIDE_WINDOWS(false),
    /** The windows do not reach the alpha peak, or the joint fit was rejected: protons only. */
    ALPHAS_NOT_FITTED(false),
    /** Reduced χ² above {@link SpectrumFitter#POOR_FIT_REDUCED_CHI2}. */
    POOR_FIT(false),
    /** The Fisher matrix of the fit's window set is singular: no Cramér–Rao bound. */
    SINGULAR_BOUND(false),
    /** No quadrant currents, or too little current to split: flow angles unset. */
    ANGLES_NOT_FITTED(false),
    /**
     * A difference ratio reached ±1 or the image left the collector (beyond the cup's full acceptance:
     * 20.25° for the demo cup, ICD §8).
     */
    ANGLE_OUT_OF_RANGE(false),
    /**
     * A difference ratio is saturated (±1): the aperture image lies wholly on one collector half, beyond the
     * split's reach (24.89° for the demo cup: tan θ = R/d). The angle is then the middle of the interval
     * from the reach to the cut-off with its uniform 1σ ({@link FlowAngleEstimator}): finite but large; the
     * density's and the speed's 1σ and bounds carry it (physics.md, "Density and speed beyond the split's reach").
     */
    BEYOND_SPLIT_REACH(false),
    /**
     * The windows hold part of the alpha distribution but not its peak: the alphas were fitted as a
     * constrained component (speed and temperature tied to the protons' by {@link AlphaPrior}) and kept by
     * the model-selection test of {@link AlphaSelection}.
     */
    ALPHAS_CONSTRAINED(false);

    private final boolean failure;

    FitFlag(boolean failure) {
        this.failure = failure;
    }

    /** True when this flag means there are no moments. */
    public boolean failure() {
        return failure;
    }
}
