package dev.sweepline.ground.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;

class FlowAngleRecoveryTest {
    /** Recorded seed. */
    static final long SEED = 77L;
    /** Grid cells across the aperture diameter for the independent quadrant shares. */
    static final int GRID = 1200;

    /**
     * Quadrant shares Q1..Q4 of the aperture image (disc of radius R shifted by d·tan θ, physics.md split
     * collector, ICD §8 quadrants), by counting cell centres of a grid laid in collector coordinates with
     * cell edges on the quadrant lines, so that only the disc rim is approximated: independent of
     * DiscOverlap, error ~ GRID^-1.5 ≈ 3e-5 in a share.
     */
    static double[] gridShares(double tanX, double tanY) {
        double ux = 15.0e-3 * tanX / DemoCup.CUP.apertureRadiusM();
        double uy = 15.0e-3 * tanY / DemoCup.CUP.apertureRadiusM();
        double[] q = new double[4];
        double h = 2.0 / GRID;
        long n = 0;
        for (long i = (long) Math.floor((ux - 1) / h); i <= (long) Math.ceil((ux + 1) / h); i++) {
            double px = (i + 0.5) * h;
            for (long k = (long) Math.floor((uy - 1) / h); k <= (long) Math.ceil((uy + 1) / h); k++) {
                double py = (k + 0.5) * h;
                if ((px - ux) * (px - ux) + (py - uy) * (py - uy) <= 1) {
                    n++;
                    q[px > 0 ? (py > 0 ? 0 : 3) : (py > 0 ? 1 : 2)]++;
                }
            }
        }
        for (int k = 0; k < 4; k++) {
            q[k] /= n;
        }
        return q;
    }

    static SpectrumInput oblique(double thetaXDeg, double thetaYDeg, Random noise) {
        double tx = Math.tan(Math.toRadians(thetaXDeg));
        double ty = Math.tan(Math.toRadians(thetaYDeg));
        double cos = 1 / Math.sqrt(1 + tx * tx + ty * ty);
        double[] lo = ReferenceCase.low();
        double[] hi = ReferenceCase.high();
        double[] total = new double[lo.length];
        // physics.md: unlimited acceptance, U → U cos θ; below 20.25° the whole image is on the collector
        new PlasmaModel(lo, hi, ReferenceCase.AREA, false).evaluate(
                new double[] {ReferenceCase.DENSITY, ReferenceCase.SPEED * cos, ReferenceCase.thermalSpeed()}, total, null);
        double[] shares = gridShares(tx, ty);
        double[][] qa = new double[4][lo.length];
        double[][] qs = new double[4][lo.length];
        double[] sum = new double[lo.length];
        double[] sig = new double[lo.length];
        double quadrantSigma = ReferenceCase.SIGMA / 2; // four quadrants sum to the 10 fA of physics.md
        for (int j = 0; j < lo.length; j++) {
            for (int k = 0; k < 4; k++) {
                qa[k][j] = total[j] * shares[k] + (noise == null ? 0 : quadrantSigma * noise.nextGaussian());
                qs[k][j] = quadrantSigma;
                sum[j] += qa[k][j];
            }
            sig[j] = ReferenceCase.SIGMA;
        }
        return new SpectrumInput(lo, hi, sum, sig, qa, qs, 0, 0);
    }

    @Test
    void shouldRecoverFlowAnglesUpTo20DegreesWithoutNoise() {
        double[][] angles = {{0, 0}, {5, 0}, {0, -5}, {-12, 8}, {14, -14}, {20, 0}, {0, 20}, {-20, 0}};
        SpectrumFitter fitter = new SpectrumFitter();
        for (double[] a : angles) {
            PlasmaFit f = fitter.fit(oblique(a[0], a[1], null));
            assertTrue(f.ok(), f.flagText());
            // grid shares good to ~3e-5 in D (GRID = 1200): ~0.002° in angle; 0.005° allowed
            assertEquals(a[0], Math.toDegrees(f.angles().thetaXRad()), 0.005, "θx of " + a[0] + "," + a[1]);
            assertEquals(a[1], Math.toDegrees(f.angles().thetaYRad()), 0.005, "θy of " + a[0] + "," + a[1]);
            // the bulk speed comes back from U cos θ (physics.md oblique flow): 1e-4 relative for the angles
            assertEquals(ReferenceCase.SPEED, f.protons().speedMPerS(), 1e-4 * ReferenceCase.SPEED);
            assertEquals(ReferenceCase.DENSITY, f.protons().densityPerM3(), 1e-4 * ReferenceCase.DENSITY);
        }
    }

    @Test
    void shouldRecoverNoisyFlowAnglesWithinTheirErrors() {
        Random rng = new Random(SEED);
        SpectrumFitter fitter = new SpectrumFitter();
        double[][] angles = {{3, 0}, {-10, 6}, {18, -5}, {20, 0}};
        for (double[] a : angles) {
            for (int t = 0; t < 20; t++) {
                PlasmaFit f = fitter.fit(oblique(a[0], a[1], rng));
                assertTrue(f.ok(), f.flagText());
                double sx = Math.toDegrees(f.angles().sigmaThetaXRad());
                // 5σ: 80 draws per axis, a Gaussian exceeds 5σ once in 1.7 million
                assertEquals(a[0], Math.toDegrees(f.angles().thetaXRad()), 5 * sx);
                assertEquals(a[1], Math.toDegrees(f.angles().thetaYRad()), 5 * Math.toDegrees(f.angles().sigmaThetaYRad()));
                // the 1σ is small: 10 fA on ~30 pA of summed current (physics.md reference case)
                assertTrue(sx < 0.05, "σθx " + sx);
            }
        }
    }
}
