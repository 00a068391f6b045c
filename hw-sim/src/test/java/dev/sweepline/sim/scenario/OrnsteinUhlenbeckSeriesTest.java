package dev.sweepline.sim.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.sweepline.sim.seed.SeedTree;
import org.junit.jupiter.api.Test;

/**
 * The grid values are a stationary Ornstein-Uhlenbeck process from the first point on, checked over an
 * ensemble of seeds (the time averages are in FluctuationStatisticsTest). Reference: stationary
 * variance 1 and correlation exp(-lag/tau) (textbook, Gardiner [memory]; the exact update of Gillespie
 * 1996 [memory] keeps them exactly on the grid). Tolerances: 4 standard errors over N = 4000 seeds
 * (recorded: 1..4000): sample variance sqrt(2/N) = 2.2 %, sample correlation (1 - rho^2)/sqrt(N).
 */
class OrnsteinUhlenbeckSeriesTest {
    private static final int SEEDS = 4000;
    private static final double TAU_S = 1.0;

    @Test
    void shouldBeStationaryFromTheFirstGridPoint() {
        int far = 3 * OrnsteinUhlenbeckSeries.BLOCK + 17; // three blocks on, across checkpoints
        double[] x0 = new double[SEEDS];
        double[] xTau = new double[SEEDS];
        double[] xFar = new double[SEEDS];
        for (int seed = 1; seed <= SEEDS; seed++) {
            OrnsteinUhlenbeckSeries s = new OrnsteinUhlenbeckSeries(SeedTree.of(seed).fluctuation(0), TAU_S);
            x0[seed - 1] = s.atGridPoint(0);
            xTau[seed - 1] = s.atGridPoint(OrnsteinUhlenbeckSeries.STEPS_PER_TAU);
            xFar[seed - 1] = s.atGridPoint(far);
        }
        double varTol = 4 * Math.sqrt(2.0 / SEEDS);
        assertEquals(1.0, meanSquare(x0), varTol, "variance at t = 0");
        assertEquals(1.0, meanSquare(xFar), varTol, "variance far on");
        double rho = Math.exp(-1);
        assertEquals(rho, correlation(x0, xTau), 4 * (1 - rho * rho) / Math.sqrt(SEEDS), "correlation at lag tau");
    }

    @Test
    void shouldInterpolateLinearlyBetweenGridPoints() {
        // Source: the class contract (linear interpolation on a grid of tau/64).
        OrnsteinUhlenbeckSeries s = new OrnsteinUhlenbeckSeries(SeedTree.of(5).fluctuation(1), TAU_S);
        double step = s.stepSeconds();
        assertEquals(TAU_S / 64, step, 0.0);
        double a = s.atGridPoint(1000);
        double b = s.atGridPoint(1001);
        assertEquals(a + 0.25 * (b - a), s.at(1000.25 * step), 1e-12);
    }

    @Test
    void shouldGiveTheSameValuesInAnyOrderOfReading() {
        // Source: the class contract (a grid value is a pure function of the key and its index, whatever
        // was read before): three blocks read point by point in time order against the same points read
        // in a shuffled order (recorded seed 13) from a fresh series, to the bit, and interpolated times
        double[] inOrder = new double[3 * OrnsteinUhlenbeckSeries.BLOCK + 2];
        OrnsteinUhlenbeckSeries sequential = new OrnsteinUhlenbeckSeries(SeedTree.of(3).fluctuation(2), TAU_S);
        for (int k = 0; k < inOrder.length; k++) {
            inOrder[k] = sequential.atGridPoint(k);
        }
        OrnsteinUhlenbeckSeries shuffled = new OrnsteinUhlenbeckSeries(SeedTree.of(3).fluctuation(2), TAU_S);
        java.util.SplittableRandom r = new java.util.SplittableRandom(13);
        for (int n = 0; n < 2000; n++) {
            int k = r.nextInt(inOrder.length - 1);
            assertEquals(inOrder[k], shuffled.atGridPoint(k), 0.0, "grid point " + k);
            double frac = r.nextDouble();
            assertEquals(inOrder[k] + frac * (inOrder[k + 1] - inOrder[k]), shuffled.at((k + frac) * shuffled.stepSeconds()),
                    1e-12, "between grid points " + k + " and " + (k + 1));
        }
    }

    @Test
    void shouldGiveDifferentStreamsForOneSeed() {
        // Streams of one seed are independent draws: equal values would mean a shared stream.
        OrnsteinUhlenbeckSeries a = new OrnsteinUhlenbeckSeries(SeedTree.of(9).fluctuation(0), TAU_S);
        OrnsteinUhlenbeckSeries b = new OrnsteinUhlenbeckSeries(SeedTree.of(9).fluctuation(1), TAU_S);
        for (int k = 0; k < 100; k++) {
            org.junit.jupiter.api.Assertions.assertNotEquals(a.atGridPoint(k), b.atGridPoint(k));
        }
    }

    private static double meanSquare(double[] x) {
        double sum = 0;
        for (double v : x) {
            sum += v * v;
        }
        return sum / x.length; // the mean is known to be 0
    }

    private static double correlation(double[] x, double[] y) {
        double sum = 0;
        for (int i = 0; i < x.length; i++) {
            sum += x[i] * y[i];
        }
        return sum / x.length / Math.sqrt(meanSquare(x) * meanSquare(y));
    }
}
