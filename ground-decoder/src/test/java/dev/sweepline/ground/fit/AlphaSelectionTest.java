package dev.sweepline.ground.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;

class AlphaSelectionTest {
    /** Trials per false-alarm estimate: a 1 % rate is then known to ±0.31 % (binomial 1σ). */
    static final int TRIALS = 1000;
    /** Trials per detection-rate estimate. */
    static final int DETECTION_TRIALS = 100;
    /** Recorded seed. */
    static final long SEED = 1938L;

    /** Binomial upper tolerance on a 1 % rate over {@link #TRIALS}: α + 3√(α(1−α)/N) = 1.94 % (common practice: 3σ). */
    static final double FALSE_ALARM_LIMIT = AlphaSelection.FALSE_ALARM_RATE
            + 3 * Math.sqrt(AlphaSelection.FALSE_ALARM_RATE * (1 - AlphaSelection.FALSE_ALARM_RATE) / TRIALS);

    static double alphaRate(AlphaScenario s, int trials, long seed) {
        double[] clean = s.currents();
        double[] sigma = NearSunCase.sigma(clean);
        Random rng = new Random(seed);
        SpectrumFitter fitter = new SpectrumFitter();
        int found = 0;
        for (int t = 0; t < trials; t++) {
            PlasmaFit f = fitter.fit(s.noisy(clean, sigma, rng));
            assertTrue(f.ok(), f.flagText());
            found += f.alphasFitted() ? 1 : 0;
        }
        return found / (double) trials;
    }

    @Test
    void shouldUseTheChiSquaredQuantileOfThreeDegreesAtOnePercent() {
        // χ²(3) at 0.99: 11.345 (Abramowitz & Stegun Table 26.8 [memory]; Hipparchus computes it)
        assertEquals(11.345, new AlphaSelection(3).threshold(), 1e-3);
    }

    @Test
    void shouldFindAlphasInAtMostOnePercentOfAlphaFreeSpectraNearTheSun() {
        double rate = alphaRate(AlphaScenario.nearSun(0).focus(), TRIALS, SEED);
        System.out.printf("false alarms near the Sun: %.2f %%%n", 100 * rate);
        assertTrue(rate <= FALSE_ALARM_LIMIT, "false-alarm rate " + rate);
    }

    @Test
    void shouldFindAlphasInAtMostOnePercentOfAlphaFreeSpectraAtOneAu() {
        double rate = alphaRate(AlphaScenario.oneAu(0).focus(), TRIALS, SEED + 1);
        System.out.printf("false alarms at 1 AU: %.2f %%%n", 100 * rate);
        assertTrue(rate <= FALSE_ALARM_LIMIT, "false-alarm rate " + rate);
    }

    @Test
    void shouldDetectAlphasAtFourPercentNearTheSun() {
        // He/H 1, 2, 4 % (physics.md: 2–4.5 % slow wind, Aellig et al. 2001 [read]); rates reported, only the
        // robust one asserted
        double[] ratios = {0.01, 0.02, 0.04};
        double nearSun4 = 0;
        for (double r : ratios) {
            double near = alphaRate(AlphaScenario.nearSun(r).focus(), DETECTION_TRIALS, SEED + 2);
            double au = alphaRate(AlphaScenario.oneAu(r).focus(), DETECTION_TRIALS, SEED + 3);
            System.out.printf("detection at He/H %.0f %%: near the Sun %.1f %%, at 1 AU %.1f %%%n", 100 * r,
                    100 * near, 100 * au);
            nearSun4 = near;
        }
        assertTrue(nearSun4 >= 0.9, "detection at 4 % near the Sun " + nearSun4);
    }
}
