package dev.sweepline.sim.preamp;

import dev.sweepline.sim.instrument.TestInstruments;
import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.host.instrument.Instruments;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class PreamplifierTest {
    /** The demo cup's flight description (instruments/demo-cup.yaml), the instrument this part models. */
    private static final InstrumentDescription DEMO = Instruments.defaultSpec().flight();
    /** Recorded seed of the noise tests. */
    private static final long SEED = 0xA11CE5EEDL;
    private static final double T_INT = 1e-3;
    private final Preamplifier preamp = TestInstruments.DEMO_CUP.preamp();

    @Test
    void shouldHaveTheThreeRangesOfTheDemoInstrument() {
        // physics.md "Noise and gain ranging" / instruments/demo-cup.yaml preamp: 40 pA, 1.28 nA, 40.96 nA; R_f = 4 V / FS
        // (issue 2); exact binary-decimal arithmetic, so 1e-12 relative
        double[] fullScale = {40e-12, 1.28e-9, 40.96e-9};
        double[] ohms = {1e11, 3.125e9, 9.765625e7};
        for (int r = 0; r < DEMO.gainRanges(); r++) {
            assertEquals(fullScale[r], TestInstruments.DEMO_CUP.preamp().fullScaleAmps(r), 1e-12 * fullScale[r]);
            assertEquals(ohms[r], TestInstruments.DEMO_CUP.preamp().feedbackOhms(r), 1e-12 * ohms[r]);
            assertEquals(fullScale[r] / (65535 - 256), TestInstruments.DEMO_CUP.preamp().lsbAmps(r), 1e-12 * fullScale[r] / 65279);
        }
        assertThrows(IllegalArgumentException.class, () -> TestInstruments.DEMO_CUP.preamp().fullScaleAmps(3));
    }

    @Test
    void shouldQuantiseAboveThePedestalAndFlagFullScale() {
        // hardware ICD / instruments/demo-cup.yaml adc: pedestal 256, 16-bit unsigned; full scale lands on 65535 exactly
        assertEquals(256, TestInstruments.DEMO_CUP.preamp().countsFor(0, 0));
        assertEquals(0.0, TestInstruments.DEMO_CUP.preamp().amps(256, 2), 0.0);
        assertEquals(65535, TestInstruments.DEMO_CUP.preamp().countsFor(TestInstruments.DEMO_CUP.preamp().fullScaleAmps(1), 1));
        assertTrue(TestInstruments.DEMO_CUP.preamp().isSaturated(TestInstruments.DEMO_CUP.preamp().countsFor(TestInstruments.DEMO_CUP.preamp().fullScaleAmps(1), 1)));
        assertFalse(TestInstruments.DEMO_CUP.preamp().isSaturated(TestInstruments.DEMO_CUP.preamp().countsFor(0.99 * TestInstruments.DEMO_CUP.preamp().fullScaleAmps(1), 1)));
        assertEquals(65535, TestInstruments.DEMO_CUP.preamp().countsFor(1e-6, 0)); // clipped above
        assertEquals(0, TestInstruments.DEMO_CUP.preamp().countsFor(-1e-6, 0)); // clipped below
        assertEquals(256 + 100, TestInstruments.DEMO_CUP.preamp().countsFor(100.4 * TestInstruments.DEMO_CUP.preamp().lsbAmps(0), 0)); // rounding
        assertEquals(256 + 101, TestInstruments.DEMO_CUP.preamp().countsFor(100.6 * TestInstruments.DEMO_CUP.preamp().lsbAmps(0), 0));
        // noisy samples 5 % above full scale saturate (noise at 40 pA, 1 ms: ~130 LSB = 0.2 % of full scale)
        SplittableRandom rng = new SplittableRandom(SEED);
        for (int i = 0; i < 1000; i++) {
            assertTrue(TestInstruments.DEMO_CUP.preamp().isSaturated(preamp.sample(1.05 * TestInstruments.DEMO_CUP.preamp().fullScaleAmps(0), 0, T_INT, rng)));
        }
    }

    @Test
    void shouldMatchTheNoiseFormulaOverManySamples() {
        // noise model of physics.md: variance 2eIB + 4kTB/R_f, B = 1/(2 T_int) (common practice), plus the
        // rounding's LSB^2/12. N = 40000 samples: the sample variance has relative sd sqrt(2/(N-1)) = 0.71 %
        // (chi-square), so 5 sd = 3.5 %; the mean sd is sigma/sqrt(N), 5 sd of it allowed
        double[][] cases = {{0, 0}, {20e-12, 0}, {0.5e-9, 1}, {5e-13, 0}};
        SplittableRandom rng = new SplittableRandom(SEED);
        int n = 40_000;
        for (double[] c : cases) {
            double amps = c[0];
            int range = (int) c[1];
            double lsb = TestInstruments.DEMO_CUP.preamp().lsbAmps(range);
            double sum = 0;
            double sumSq = 0;
            for (int i = 0; i < n; i++) {
                double a = TestInstruments.DEMO_CUP.preamp().amps(preamp.sample(amps, range, T_INT, rng), range);
                sum += a;
                sumSq += a * a;
            }
            double mean = sum / n;
            double variance = (sumSq - n * mean * mean) / (n - 1);
            double b = 1 / (2 * T_INT);
            double expected = 2 * 1.602176634e-19 * amps * b + 4 * 1.380649e-23 * 300 * b / TestInstruments.DEMO_CUP.preamp().feedbackOhms(range)
                    + lsb * lsb / 12;
            assertEquals(expected, variance, 0.035 * expected, "I " + amps + " range " + range);
            assertEquals(amps, mean, 5 * Math.sqrt(expected / n), "I " + amps + " range " + range);
        }
    }

    @Test
    void shouldEquateShotAndJohnsonNoiseAtTheCrossover() {
        // physics.md: I* = 2kT/(qR_f) = 0.52 pA for R_f = 1e11 ohm [computed]; half a unit of the last digit
        assertEquals(0.52e-12, preamp.crossoverAmps(0), 0.005e-12);
        double b = Preamplifier.noiseBandwidthHz(T_INT);
        assertEquals(preamp.johnsonNoiseAmpsRms(0, b), Preamplifier.shotNoiseAmpsRms(preamp.crossoverAmps(0), b),
                1e-12 * preamp.johnsonNoiseAmpsRms(0, b));
        assertEquals(500.0, b, 0.0); // B = 1/(2 T_int) (common practice)
    }

    @Test
    void shouldRecoverTheCurrentInEachRangeFromItsTag() {
        // a sample means nothing without its range: the same 1 nA reads in range 1 (and 2) to within 5 sigma of
        // its noise, and would be off by 32x if decoded with the neighbouring range (RANGE_RATIO)
        SplittableRandom rng = new SplittableRandom(SEED + 1);
        for (int range = 1; range < 3; range++) {
            int counts = preamp.sample(1e-9, range, T_INT, rng);
            double sigma = preamp.noiseAmpsRms(1e-9, range, T_INT) + TestInstruments.DEMO_CUP.preamp().lsbAmps(range);
            assertEquals(1e-9, TestInstruments.DEMO_CUP.preamp().amps(counts, range), 5 * sigma);
            assertEquals(32.0, TestInstruments.DEMO_CUP.preamp().amps(counts, range) / TestInstruments.DEMO_CUP.preamp().amps(counts, range - 1), 1e-12);
        }
    }

    @Test
    void shouldSampleTheFourQuadrantsAsFourSingleSamples() {
        // the reading of all quadrants at once is the single sample of each, in order, from the same stream
        // (the method's contract: the same draws and the same codes), in every range, for currents from
        // the noise floor to beyond full scale
        double[] amps = {3e-13, 2e-11, 1.1e-9, 5e-8};
        int[] got = new int[4];
        for (int range = 0; range < DEMO.gainRanges(); range++) {
            SplittableRandom a = new SplittableRandom(SEED + range);
            SplittableRandom b = new SplittableRandom(SEED + range);
            for (int i = 0; i < 100; i++) {
                preamp.sample(amps, range, T_INT, a, got);
                for (int q = 0; q < 4; q++) {
                    assertEquals(preamp.sample(amps[q], range, T_INT, b), got[q], "range " + range + ", Q" + (q + 1));
                }
            }
        }
    }

    @Test
    void shouldRepeatTheSameSamplesFromTheSameSeed() {
        // determinism: the model draws only from the caller's stream
        SplittableRandom a = new SplittableRandom(SEED);
        SplittableRandom b = new SplittableRandom(SEED);
        for (int i = 0; i < 100; i++) {
            assertEquals(preamp.sample(3e-12, 0, T_INT, a), preamp.sample(3e-12, 0, T_INT, b));
        }
    }
}
