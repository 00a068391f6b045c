package dev.sweepline.sim.design;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.sweepline.sim.instrument.TestInstruments;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class ProtonInformationTest {
    @Test
    void shouldGiveTheVarianceOfEachCurrentAtAFixedIntegrationToTheBit() {
        // the noise at one integration time is the variance of each current at it (the reference: variance
        // with the integration time), to the bit, in every range of the demo cup, for integrations below
        // and above the analog bandwidth's cap and currents from zero to beyond full scale
        ProtonInformation info = new ProtonInformation(TestInstruments.DEMO_CUP.cup(), TestInstruments.DEMO_CUP.preamp());
        SplittableRandom r = new SplittableRandom(32);
        for (double seconds : new double[] {1e-6, 1e-4, 0.008, 0.0123, 1.0}) {
            ProtonInformation.Noise noise = info.noiseAt(seconds);
            for (int i = 0; i < 10_000; i++) {
                double amps = i == 0 ? 0 : r.nextDouble(-1, 1) * Math.pow(10, r.nextInt(-16, -6));
                int range = r.nextInt(TestInstruments.DEMO_CUP.preamp().ranges());
                assertEquals(Double.doubleToRawLongBits(info.variance(amps, range, seconds)),
                        Double.doubleToRawLongBits(noise.variance(amps, range)), amps + " A, range " + range + ", " + seconds + " s");
            }
        }
    }

    @Test
    void shouldAccumulateEachElementAsItsDefinitionToTheBit() {
        // the definition (the method's contract): element (a, b) grows by weight * g[a] * g[b] / variance,
        // evaluated in that order; checked to the bit for weight 1 (each pair computed once) and other
        // weights, on matrices that start unsymmetric, over gradients of both signs and of many magnitudes
        SplittableRandom r = new SplittableRandom(31);
        for (int i = 0; i < 100_000; i++) {
            double[][] f = new double[3][3];
            double[][] expected = new double[3][3];
            for (int a = 0; a < 3; a++) {
                for (int b = 0; b < 3; b++) {
                    f[a][b] = r.nextDouble(-1, 1) * Math.pow(10, r.nextInt(-30, 5));
                    expected[a][b] = f[a][b];
                }
            }
            double[] g = new double[3];
            for (int a = 0; a < 3; a++) {
                g[a] = r.nextDouble(-1, 1) * Math.pow(10, r.nextInt(-20, -5));
            }
            double variance = r.nextDouble(1e-30, 1e-20);
            double weight = i % 2 == 0 ? 1.0 : r.nextDouble(0, 100);
            ProtonInformation.accumulate(f, g, variance, weight);
            for (int a = 0; a < 3; a++) {
                for (int b = 0; b < 3; b++) {
                    expected[a][b] += weight * g[a] * g[b] / variance;
                    assertEquals(Double.doubleToRawLongBits(expected[a][b]), Double.doubleToRawLongBits(f[a][b]),
                            "element " + a + b + ", weight " + weight);
                }
            }
        }
    }
}
