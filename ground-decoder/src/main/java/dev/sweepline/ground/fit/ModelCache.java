package dev.sweepline.ground.fit;

/**
 * The proton and joint models of the last spectrum fitted on one thread, reused while the next spectrum has
 * the same windows and area (a focus band or a survey table repeats sweep after sweep), so that a fit builds
 * no model. Not thread-safe: one per thread ({@link SpectrumFitter}'s workspaces).
 */
final class ModelCache {
    private PlasmaModel protons;
    private PlasmaModel joint;

    /** The model of windows {@code low}–{@code high} on area {@code areaM2}, with alphas or without. */
    PlasmaModel model(double[] low, double[] high, double areaM2, boolean withAlphas) {
        PlasmaModel m = withAlphas ? joint : protons;
        if (m != null && m.sameWindows(low, high, areaM2)) {
            return m;
        }
        m = new PlasmaModel(low, high, areaM2, withAlphas);
        if (withAlphas) {
            joint = m;
        } else {
            protons = m;
        }
        return m;
    }
}
