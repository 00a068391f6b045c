package dev.sweepline.ground.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.bound.CramerRaoBound;
import dev.sweepline.ground.bound.FisherMatrix;
import java.util.Random;
import org.junit.jupiter.api.Test;

/** The density's and speed's errors and bounds carry the angle's uncertainty beyond full acceptance. */
class BeyondReachErrorsTest {
    /** Recorded seed. */
    static final long SEED = 9120L;

    @Test
    void shouldGiveMinusTheCommonChordAsTheOverlapSlope() {
        // two equal discs r = 1 at distance 1: common chord 2√(r² − (dist/2)²) = √3 [closed form, chord of
        // two circles], so the slope is −√3
        assertEquals(-Math.sqrt(3), DiscOverlap.twoDiscAreaSlope(1, 1, 1), 1e-15);
        // the demo cup's discs at shifts across the lens range: central differences of twoDiscArea
        // [closed form of the overlap; step 1e-7 m, error O(h²) ~ 1e-12 of the slope]
        double r = DemoCup.CUP.apertureRadiusM();
        double rc = 12.5e-3;
        for (double s = rc - r + 1e-4; s < rc + r - 1e-4; s += 1e-3) {
            double h = 1e-7;
            double numeric = (DiscOverlap.twoDiscArea(r, rc, s + h) - DiscOverlap.twoDiscArea(r, rc, s - h)) / (2 * h);
            assertEquals(numeric, DiscOverlap.twoDiscAreaSlope(r, rc, s), 1e-6 * Math.abs(numeric), "s = " + s);
        }
        // one disc inside the other, or apart: the area does not change with the distance
        assertEquals(0.0, DiscOverlap.twoDiscAreaSlope(r, rc, 0.5 * (rc - r)));
        assertEquals(0.0, DiscOverlap.twoDiscAreaSlope(r, rc, rc + r + 1e-3));
    }

    @Test
    void shouldPropagateTheAnglesIntoTheLogOfTheAcceptance() {
        // σ_lnA = |∂ln A/∂θ| σθ per axis in quadrature: against central differences of ln transmission
        // [closed form of the disc overlap, physics.md "Density and speed beyond the split's reach"]
        CupGeometry cup = DemoCup.CUP;
        double[][] cases = {{28, 0, 0.1, 0.05}, {-5, 30, 0.02, 0.12}, {22, -18, 0.03, 0.04}};
        for (double[] c : cases) {
            double ax = Math.toRadians(c[0]);
            double ay = Math.toRadians(c[1]);
            FlowAngles a = new FlowAngles(ax, ay, c[2], c[3], 0, 0);
            double h = 1e-6;
            double gx = (lnT(cup, ax + h, ay) - lnT(cup, ax - h, ay)) / (2 * h);
            double gy = (lnT(cup, ax, ay + h) - lnT(cup, ax, ay - h)) / (2 * h);
            double expected = Math.hypot(gx * c[2], gy * c[3]);
            assertEquals(expected, cup.sigmaLogTransmission(a), 1e-6 * expected, c[0] + "," + c[1]);
        }
        // inside full acceptance (20.25° on the demo cup, ICD §8) the acceptance does not depend on the angle
        assertEquals(0.0, cup.sigmaLogTransmission(new FlowAngles(Math.toRadians(10), 0, 0.1, 0.1, 0, 0)));
        assertEquals(0.0, cup.sigmaLogTransmission(FlowAngles.NONE));
    }

    private static double lnT(CupGeometry cup, double ax, double ay) {
        return Math.log(cup.transmission(Math.tan(ax), Math.tan(ay)));
    }

    /**
     * 25–35° on both axes, clean and noisy: n and U and their bounds finite, and the truth within 2σ of the
     * fit with the σ of its moments and with its bound (the Fisher bound of the fitted model at the fitted
     * values with the angle's part, physics.md). Stated rate: every case (the interval estimate's error in
     * ln n is at most 0.65 of σ_lnA across 25–35°, and U's at most 1.3 of its σ [computed from the demo
     * geometry, physics.md]).
     */
    @Test
    void shouldCoverTheTrueDensityAndSpeedWithinTwoSigmaFrom25To35Degrees() {
        SpectrumFitter fitter = new SpectrumFitter();
        Random rng = new Random(SEED);
        int cases = 0;
        for (double deg = 25.5; deg <= 35; deg += 0.5) {
            for (Random noise : new Random[] {null, rng}) {
                for (double[] a : new double[][] {{deg, 0}, {0, -deg}}) {
                    SpectrumInput in = BeyondSplitReachTest.oblique(a[0], a[1], noise);
                    PlasmaFit f = fitter.fit(in);
                    String what = a[0] + "," + a[1] + (noise == null ? " clean" : " noisy");
                    assertTrue(f.ok() && f.flags().contains(FitFlag.BEYOND_SPLIT_REACH), what + " " + f.flagText());
                    BeyondSplitReachTest.assertFinite(f, what);
                    SpeciesMoments p = f.protons();
                    CramerRaoBound b = FisherMatrix.bound(new PlasmaModel(in.lowVolts(), in.highVolts(), f.areaM2(),
                            f.alphasFitted()), f.normalParameters(), in.sigmaAmps(), f.alphaPrior());
                    double bn = b.sigmaDensity(p.densityPerM3(), f.sigmaLogArea());
                    double bu = b.sigmaBulkSpeed(f.angles(), f.normalParameters()[1]);
                    assertTrue(Double.isFinite(bn) && Double.isFinite(bu) && bn > 0 && bu > 0, what);
                    // ReferenceCase: n and U of the physics.md reference case
                    assertEquals(ReferenceCase.DENSITY, p.densityPerM3(), 2 * p.sigmaDensityPerM3(), what + " n");
                    assertEquals(ReferenceCase.DENSITY, p.densityPerM3(), 2 * bn, what + " n bound");
                    assertEquals(ReferenceCase.SPEED, p.speedMPerS(), 2 * p.sigmaSpeedMPerS(), what + " U");
                    assertEquals(ReferenceCase.SPEED, p.speedMPerS(), 2 * bu, what + " U bound");
                    cases++;
                }
            }
        }
        assertEquals(80, cases);
    }

    @Test
    void shouldKeepTheDensityErrorFiniteOverRandomInputs() {
        // property: random angles up to 55° on both axes (past the 52.4° cut-off), seeded; an accepted fit's
        // density error and its angle part are finite
        SpectrumFitter fitter = new SpectrumFitter();
        Random rng = new Random(SEED + 1);
        for (int t = 0; t < 200; t++) {
            double ax = 110 * (rng.nextDouble() - 0.5);
            double ay = 110 * (rng.nextDouble() - 0.5);
            PlasmaFit f = fitter.fit(BeyondSplitReachTest.oblique(ax, ay, rng));
            if (f.ok()) {
                String what = "trial " + t + " at " + ax + "," + ay + " " + f.flagText();
                BeyondSplitReachTest.assertFinite(f, what);
                assertTrue(Double.isFinite(f.sigmaLogArea()) && f.sigmaLogArea() >= 0, what);
            }
        }
    }
}
