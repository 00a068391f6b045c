package dev.sweepline.ground.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.junit.jupiter.api.Test;

class CupGeometryTest {
    /** Quadrant shares of a disc of unit radius centred at (ux, uy) by Monte Carlo, independent of DiscOverlap. */
    static double[] monteCarlo(double ux, double uy, int samples, long seed) {
        Random r = new Random(seed);
        double[] q = new double[4];
        int in = 0;
        while (in < samples) {
            double x = 2 * r.nextDouble() - 1;
            double y = 2 * r.nextDouble() - 1;
            if (x * x + y * y > 1) {
                continue;
            }
            in++;
            double px = x + ux;
            double py = y + uy;
            q[px > 0 ? (py > 0 ? 0 : 3) : (py > 0 ? 1 : 2)]++;
        }
        for (int k = 0; k < 4; k++) {
            q[k] /= samples;
        }
        return q;
    }

    @Test
    void shouldSplitTheDiscLikeMonteCarlo() {
        double[][] shifts = {{0, 0}, {0.3, 0.1}, {-0.7, 0.4}, {0.95, -0.95}, {1.5, 0.2}};
        double[] f = new double[4];
        for (double[] s : shifts) {
            DiscOverlap.quadrantFractions(s[0], s[1], f);
            double[] mc = monteCarlo(s[0], s[1], 400_000, 42L);
            for (int k = 0; k < 4; k++) {
                // binomial 1σ of 4e5 samples ≤ 0.0008: 5σ tolerance
                assertEquals(mc[k], f[k], 0.004, "shift " + s[0] + "," + s[1] + " Q" + (k + 1));
            }
            assertEquals(1.0, f[0] + f[1] + f[2] + f[3], 1e-12);
        }
    }

    @Test
    void shouldGiveTheHalfDifferenceOfPhysicsMd() {
        double[] f = new double[4];
        for (double u = -0.95; u < 1; u += 0.05) {
            DiscOverlap.quadrantFractions(u, 0.37, f);
            double dx = (f[0] + f[3]) - (f[1] + f[2]);
            // physics.md: D = 1 − (2/π)[acos u − u√(1−u²)], independent of the shift in y
            double a = Math.abs(u);
            double d = Math.copySign(1 - 2 / Math.PI * (Math.acos(a) - a * Math.sqrt(1 - a * a)), u);
            assertEquals(d, dx, 1e-12);
            assertEquals(u, CupGeometry.inverseHalfDifference(d), 1e-12);
        }
        // small shifts: D ≈ 4u/π (physics.md); the series of acos u − u√(1−u²) = π/2 − 2u + u³/3 + O(u⁵)
        // gives D = 4u/π − 2u³/(3π) + O(u⁵); the u⁵ term is ~3e-12 at u = 0.01, hence 1e-11
        assertEquals(4 * 0.01 / Math.PI - 2e-6 / (3 * Math.PI), CupGeometry.halfDifference(0.01), 1e-11);
    }

    @Test
    void shouldKeepFullAcceptanceTo20Point25Degrees() {
        // ICD §8 (demo-cup.yaml geometry): R = √(1 cm² / (π × 0.6561)) = 6.9653 mm, to its last digit: 0.05 µm.
        // The image lies wholly on the collector up to θ = 20.25° (ICD §8; 20.253° with the formula's R)
        assertEquals(6.9653e-3, DemoCup.CUP.apertureRadiusM(), 5e-8);
        assertEquals(20.25, Math.toDegrees(Math.atan(DemoCup.CUP.fullAcceptanceTan())), 0.005);
        assertEquals(1.0, DemoCup.CUP.transmission(Math.tan(Math.toRadians(20.2)), 0), 1e-12);
        // past it the image leaves the collector; by symmetry of two discs the loss grows steadily
        double t25 = DemoCup.CUP.transmission(Math.tan(Math.toRadians(25)), 0);
        assertEquals(true, t25 < 1 && t25 > 0.8, "transmission at 25° " + t25);
    }
}
