package dev.sweepline.ground.fit;

/**
 * The proton and joint models of the last few window sets fitted, reused when a spectrum has the windows of
 * one of them (a focus band or a survey table repeats sweep after sweep, and survey and focus spectra
 * alternate) and moved to its area (the acceptance changes with the flow angle from spectrum to spectrum; it
 * only scales the currents), so that a fit seldom builds a model. A model it returns stays valid until its
 * next call. Not thread-safe: one per thread ({@link SpectrumFitter}'s workspaces) or per single-threaded
 * user (the bound of each fit, {@code FitCollector}).
 */
public final class ModelCache {
    /** Window sets kept per model kind: the survey table and a few focus bands (common practice: a small LRU). */
    static final int SIZE = 4;

    /** Most recently used first. */
    private final PlasmaModel[] protons = new PlasmaModel[SIZE];
    private final PlasmaModel[] joint = new PlasmaModel[SIZE];
    /** The drift models (interleaved spectra), kept apart so that they never push out the others. */
    private final PlasmaModel[] driftProtons = new PlasmaModel[SIZE];
    private final PlasmaModel[] driftJoint = new PlasmaModel[SIZE];

    /** The model of windows {@code low}–{@code high} on area {@code areaM2}, with alphas or without. */
    public PlasmaModel model(double[] low, double[] high, double areaM2, boolean withAlphas) {
        return kept(withAlphas ? joint : protons, low, high, areaM2, withAlphas, null);
    }

    /**
     * The model of windows {@code low}–{@code high} read at the sweep fractions {@code stepFraction}, with ΔU
     * ({@link PlasmaModel#PlasmaModel(double[], double[], double, boolean, double[])}); {@code stepFraction}
     * null gives {@link #model(double[], double[], double, boolean)}.
     */
    public PlasmaModel model(double[] low, double[] high, double areaM2, boolean withAlphas, double[] stepFraction) {
        if (stepFraction == null) {
            return model(low, high, areaM2, withAlphas);
        }
        return kept(withAlphas ? driftJoint : driftProtons, low, high, areaM2, withAlphas, stepFraction);
    }

    /** The model of {@code kept} for these windows (moved to the area), or a new one; made most recently used. */
    private static PlasmaModel kept(PlasmaModel[] kept, double[] low, double[] high, double areaM2, boolean withAlphas,
            double[] stepFraction) {
        int found = SIZE - 1;
        PlasmaModel m = null;
        for (int i = 0; i < SIZE && kept[i] != null; i++) {
            if (kept[i].sameWindows(low, high, stepFraction)) {
                found = i;
                m = kept[i];
                m.setArea(areaM2);
                break;
            }
        }
        if (m == null) {
            m = new PlasmaModel(low, high, areaM2, withAlphas, stepFraction);
        }
        System.arraycopy(kept, 0, kept, 1, found);
        kept[0] = m;
        return m;
    }
}
