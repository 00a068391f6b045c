package dev.sweepline.ground.product;

import dev.sweepline.ground.fit.FitFlag;
import java.util.Collections;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * Counts over the fits of a run.
 *
 * @param spectra       spectra fitted or attempted
 * @param fitted        spectra with moments (no failure flag)
 * @param alphasFitted  spectra with the joint proton + alpha fit
 * @param byFlag        spectra carrying each flag
 * @param fitSeconds    wall-clock seconds spent fitting (fits and bounds)
 */
public record FitSummary(int spectra, int fitted, int alphasFitted, Map<FitFlag, Integer> byFlag, double fitSeconds) {
    /** Counts of {@code records}. */
    public static FitSummary of(List<MomentRecord> records, double fitSeconds) {
        EnumMap<FitFlag, Integer> by = new EnumMap<>(FitFlag.class);
        for (FitFlag f : FitFlag.values()) {
            by.put(f, 0);
        }
        int ok = 0;
        int alphas = 0;
        for (MomentRecord r : records) {
            ok += r.ok() ? 1 : 0;
            alphas += r.fit().alphasFitted() ? 1 : 0;
            for (FitFlag f : r.fit().flags()) {
                by.merge(f, 1, Integer::sum);
            }
        }
        return new FitSummary(records.size(), ok, alphas, Collections.unmodifiableMap(by), fitSeconds);
    }

    /** Fraction of spectra with moments, 0..1 (0 for no spectra). */
    public double fitFraction() {
        return spectra == 0 ? 0.0 : fitted / (double) spectra;
    }

    /** Spectra fitted per wall-clock second on this run (one thread). */
    public double spectraPerSecond() {
        return fitSeconds > 0 ? spectra / fitSeconds : 0.0;
    }
}
