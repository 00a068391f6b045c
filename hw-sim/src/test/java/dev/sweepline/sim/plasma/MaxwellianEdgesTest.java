package dev.sweepline.sim.plasma;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The window values over shared edges are the doubles of {@link ConvectedMaxwellian}'s closed form at the
 * edges' speeds (the reference: {@code windowCurrent} and {@code relativeSensitivities}), to the bit: tables
 * of abutting windows from the far lower to the far upper tail, an edge at 0 V and one at infinity, both
 * species, thermal speeds from a cold beam to a hot one.
 */
class MaxwellianEdgesTest {
    @Test
    void shouldGiveTheClosedFormsDoublesAtTheEdgesSpeeds() {
        SplittableRandom r = new SplittableRandom(23);
        double[] got = new double[3];
        double[] expected = new double[3];
        for (int table = 0; table < 200; table++) {
            IonSpecies species = table % 2 == 0 ? IonSpecies.PROTON : IonSpecies.ALPHA;
            double[] volts = edges(r);
            MaxwellianEdges edges = new MaxwellianEdges(volts, species);
            double q = species.chargeCoulomb();
            double area = r.nextDouble(1e-5, 1e-3);
            for (int plasma = 0; plasma < 20; plasma++) {
                double n = Math.pow(10, r.nextDouble(4, 11));
                double u = r.nextDouble(1e5, 1e6) * (r.nextInt(20) == 0 ? -1 : 1);
                double w = Math.abs(u) / r.nextDouble(1, 30);
                edges.set(u, w);
                for (int k = 0; k + 1 < volts.length; k++) {
                    double v1 = ConvectedMaxwellian.speedForVoltage(volts[k], species.massKg(), q);
                    double v2 = ConvectedMaxwellian.speedForVoltage(volts[k + 1], species.massKg(), q);
                    String where = "edges " + volts[k] + ".." + volts[k + 1] + " V, U " + u + ", w " + w;
                    assertBits(ConvectedMaxwellian.windowCurrent(q, n, area, u, w, v1, v2),
                            edges.windowCurrent(n, area, k, k + 1), "current, " + where);
                    ConvectedMaxwellian.relativeSensitivities(q, n, area, u, w, v1, v2, expected);
                    edges.relativeSensitivities(n, area, k, k + 1, got);
                    for (int a = 0; a < 3; a++) {
                        assertBits(expected[a], got[a], "sensitivity " + a + ", " + where);
                    }
                }
            }
        }
    }

    /** Abutting windows, geometric steps of 1-10 % from 0 V or 10-1000 V, the last edge now and then at infinity. */
    private static double[] edges(SplittableRandom r) {
        double[] volts = new double[2 + r.nextInt(200)];
        volts[0] = r.nextInt(10) == 0 ? 0 : r.nextDouble(10, 1000);
        double step = r.nextDouble(1.01, 1.1);
        for (int k = 1; k < volts.length; k++) {
            volts[k] = volts[k - 1] == 0 ? r.nextDouble(10, 100) : volts[k - 1] * step;
        }
        if (r.nextInt(10) == 0) {
            volts[volts.length - 1] = Double.POSITIVE_INFINITY;
        }
        return volts;
    }

    private static void assertBits(double expected, double actual, String what) {
        if (Double.doubleToRawLongBits(expected) != Double.doubleToRawLongBits(actual)) {
            assertEquals(expected, actual, 0.0, what);
            assertEquals(Double.doubleToRawLongBits(expected), Double.doubleToRawLongBits(actual), what + " (sign of zero)");
        }
    }
}
