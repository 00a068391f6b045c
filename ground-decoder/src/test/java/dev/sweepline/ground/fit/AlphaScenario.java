package dev.sweepline.ground.fit;

import java.util.Random;

/**
 * A spectrum made with the fit package's own model on a window set, with the noise model of ICD §8 as
 * {@link NearSunCase} applies it (lowest sufficient gain range, 4 ms, normal incidence).
 *
 * @param densityPerM3 n_p, m⁻³
 * @param speedMPerS   U (protons and alphas), m/s
 * @param protonK      T_p, K
 * @param alphaRatio   n_α/n_p
 * @param alphaK       T_α, K
 * @param low          low edges, V
 * @param high         high edges, V
 * @param driftMPerS   U_α − U_p along the normal, m/s
 */
record AlphaScenario(double densityPerM3, double speedMPerS, double protonK, double alphaRatio, double alphaK,
        double[] low, double[] high, double driftMPerS) {

    /** Near 0.05 AU (physics.md "Solar wind", {@link NearSunCase}): 3600 cm⁻³, 300 km/s, 6e5 K, T_α = 4 T_p. */
    static AlphaScenario nearSun(double alphaRatio) {
        return new AlphaScenario(3600e6, 300e3, 6e5, alphaRatio, 2.4e6, NearSunCase.low(), NearSunCase.high(), 0);
    }

    /** Slow wind at 1 AU (physics.md, Schwenn 1990 [memory]): 10 cm⁻³, 375 km/s, 4e4 K; T_α = 4 T_p [memory]. */
    static AlphaScenario oneAu(double alphaRatio) {
        return new AlphaScenario(10e6, 375e3, 4e4, alphaRatio, 1.6e5, NearSunCase.low(), NearSunCase.high(), 0);
    }

    /**
     * The same scenario on the focus-mode band of the default table (physics.md demo instrument): windows
     * from 0.4 × the proton peak E/q to 2.6 × it, i.e. past the alpha peak at 1.986 × (physics.md "Alpha
     * particles") by about 4 alpha thermal widths in these cases; fewer windows keep the trials fast.
     */
    AlphaScenario focus() {
        return band(0.4, 2.6);
    }

    /** The windows of this scenario's table between {@code low} and {@code high} times the proton peak E/q. */
    AlphaScenario band(double lowTimesPeak, double highTimesPeak) {
        double peak = Species.PROTON.voltsAtSpeed(speedMPerS);
        int c = 0;
        for (int j = 0; j < low.length; j++) {
            c += low[j] >= lowTimesPeak * peak && high[j] <= highTimesPeak * peak ? 1 : 0;
        }
        double[] lo = new double[c];
        double[] hi = new double[c];
        int k = 0;
        for (int j = 0; j < low.length; j++) {
            if (low[j] >= lowTimesPeak * peak && high[j] <= highTimesPeak * peak) {
                lo[k] = low[j];
                hi[k++] = high[j];
            }
        }
        return on(lo, hi);
    }

    /** The same protons with other alphas: n_α/n_p, T_α (K) and drift (m/s). */
    AlphaScenario withAlphas(double ratio, double kelvin, double drift) {
        return new AlphaScenario(densityPerM3, speedMPerS, protonK, ratio, kelvin, low, high, drift);
    }

    /** A scenario on other windows. */
    AlphaScenario on(double[] lo, double[] hi) {
        return new AlphaScenario(densityPerM3, speedMPerS, protonK, alphaRatio, alphaK, lo, hi, driftMPerS);
    }

    /** Physical parameters of the joint model. */
    double[] truth() {
        return new double[] {densityPerM3, speedMPerS, Species.PROTON.thermalSpeed(protonK),
            alphaRatio * densityPerM3, speedMPerS + driftMPerS, Species.ALPHA.thermalSpeed(alphaK)};
    }

    /** Noise-free window currents, A. */
    double[] currents() {
        double[] i = new double[low.length];
        new PlasmaModel(low, high, DemoCup.CUP.effectiveAreaM2(), true).evaluate(truth(), i, null);
        return i;
    }

    /** One noisy spectrum (summed current only). */
    SpectrumInput noisy(double[] clean, double[] sigma, Random rng) {
        double[] n = new double[clean.length];
        for (int j = 0; j < n.length; j++) {
            n[j] = clean[j] + sigma[j] * rng.nextGaussian();
        }
        return new SpectrumInput(low, high, n, sigma, null, null, 0, 0);
    }
}
