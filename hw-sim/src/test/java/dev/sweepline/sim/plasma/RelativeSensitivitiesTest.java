package dev.sweepline.sim.plasma;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The fused sensitivities are the doubles the three derivative methods give one by one (the reference:
 * {@link ConvectedMaxwellian#dCurrentDn}, {@code dCurrentDu}, {@code dCurrentDw} times n, U, w), to the bit,
 * from the far lower tail to the far upper tail of windows and for the open window [0, infinity).
 */
class RelativeSensitivitiesTest {
    @Test
    void shouldEqualTheSeparateDerivativesToTheBit() {
        SplittableRandom r = new SplittableRandom(11);
        double q = 1.602176634e-19; // elementary charge, CODATA 2018 (exact)
        double[] out = new double[3];
        for (int i = 0; i < 200_000; i++) {
            double n = Math.pow(10, r.nextDouble(4, 11));
            double area = r.nextDouble(1e-5, 1e-3);
            double u = r.nextDouble(1e5, 1e6);
            double w = u / r.nextDouble(1, 30);
            double v1 = r.nextInt(20) == 0 ? 0 : u * r.nextDouble(0, 3);
            double v2 = r.nextInt(50) == 0 ? Double.POSITIVE_INFINITY : v1 * r.nextDouble(1, 1.2);
            ConvectedMaxwellian.relativeSensitivities(q, n, area, u, w, v1, v2, out);
            assertEquals(n * ConvectedMaxwellian.dCurrentDn(q, n, area, u, w, v1, v2), out[0], 0.0);
            assertEquals(u * ConvectedMaxwellian.dCurrentDu(q, n, area, u, w, v1, v2), out[1], 0.0);
            assertEquals(w * ConvectedMaxwellian.dCurrentDw(q, n, area, u, w, v1, v2), out[2], 0.0);
        }
    }

    @Test
    void shouldGiveTheSameDoublesFromAKeptEvaluationOfTheCurrent() {
        // the terms kept by the window current's evaluation serve the sensitivities of exactly that window
        // (the same doubles as computing them afresh, the reference above), and only that window: kept for
        // another window or another plasma (a step's evaluation of a neighbour), the sensitivities are
        // computed afresh, the same doubles again; the kept current is windowCurrent's own
        SplittableRandom r = new SplittableRandom(12);
        double q = 1.602176634e-19; // elementary charge, CODATA 2018 (exact)
        double[] expected = new double[3];
        double[] got = new double[3];
        MaxwellianWindow kept = new MaxwellianWindow();
        for (int i = 0; i < 100_000; i++) {
            double n = Math.pow(10, r.nextDouble(4, 11));
            double area = r.nextDouble(1e-5, 1e-3);
            double u = r.nextDouble(1e5, 1e6);
            double w = u / r.nextDouble(1, 30);
            double v1 = r.nextInt(20) == 0 ? 0 : u * r.nextDouble(0, 3);
            double v2 = r.nextInt(50) == 0 ? Double.POSITIVE_INFINITY : v1 * r.nextDouble(1, 1.2);
            boolean same = i % 3 != 0;
            double current = same
                    ? ConvectedMaxwellian.windowCurrent(q, n, area, u, w, v1, v2, kept)
                    : ConvectedMaxwellian.windowCurrent(q, n, area, u, Math.nextUp(w), v1, v2, kept);
            if (same) {
                assertEquals(ConvectedMaxwellian.windowCurrent(q, n, area, u, w, v1, v2), current, 0.0);
            }
            assertEquals(same, kept.isAt(u, w, v1, v2));
            ConvectedMaxwellian.relativeSensitivities(q, n, area, u, w, v1, v2, expected);
            ConvectedMaxwellian.relativeSensitivities(q, n, area, u, w, v1, v2, kept, got);
            for (int a = 0; a < 3; a++) {
                assertEquals(Double.doubleToRawLongBits(expected[a]), Double.doubleToRawLongBits(got[a]),
                        "sensitivity " + a + " at U " + u + ", w " + w + ", window " + v1 + ".." + v2 + ", kept " + same);
            }
        }
    }
}
