package dev.sweepline.ground.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;

class BeyondSplitReachTest {
    /** Recorded seed. */
    static final long SEED = 2535L;

    /**
     * The reference case of physics.md at (θx, θy) on the demo cup: normal speed U cos θ (physics.md oblique
     * flow), finite acceptance A(θ)/A(0) and quadrant shares from the cup's geometry (physics.md split
     * collector; {@link CupGeometry#quadrantShares}), quadrant noise 5 fA (four sum to physics.md's 10 fA).
     */
    static SpectrumInput oblique(double thetaXDeg, double thetaYDeg, Random noise) {
        double tx = Math.tan(Math.toRadians(thetaXDeg));
        double ty = Math.tan(Math.toRadians(thetaYDeg));
        double cos = CupGeometry.cosOfFlow(tx, ty);
        double[] lo = ReferenceCase.low();
        double[] hi = ReferenceCase.high();
        double[] total = new double[lo.length];
        new PlasmaModel(lo, hi, DemoCup.CUP.effectiveAreaM2(), false).evaluate(
                new double[] {ReferenceCase.DENSITY, ReferenceCase.SPEED * cos, ReferenceCase.thermalSpeed()}, total, null);
        double[] shares = new double[4];
        DemoCup.CUP.quadrantShares(tx, ty, shares);
        double[][] qa = new double[4][lo.length];
        double[][] qs = new double[4][lo.length];
        double[] sum = new double[lo.length];
        double[] sig = new double[lo.length];
        double quadrantSigma = ReferenceCase.SIGMA / 2;
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

    static void assertFinite(PlasmaFit f, String what) {
        SpeciesMoments p = f.protons();
        double[] v = {p.densityPerM3(), p.speedMPerS(), p.thermalSpeedMPerS(), p.temperatureK(), p.sigmaDensityPerM3(),
            p.sigmaSpeedMPerS(), p.sigmaThermalSpeedMPerS(), p.sigmaTemperatureK(), f.angles().thetaXRad(),
            f.angles().thetaYRad(), f.angles().sigmaThetaXRad(), f.angles().sigmaThetaYRad(), f.reducedChiSquare()};
        for (double x : v) {
            assertTrue(Double.isFinite(x), what + ": " + p + " " + f.angles());
        }
    }

    @Test
    void shouldReachTheSplitAtTanThetaOfRadiusOverDistance() {
        // demo cup (demo-cup.yaml, d = 15 mm, collector 12.5 mm): reach atan(R/d), cut-off atan((12.5 mm + R)/d)
        // with the cup's aperture radius R [computed from the geometry relation of physics.md]
        double r = DemoCup.CUP.apertureRadiusM();
        assertEquals(Math.atan(r / 15e-3), FlowAngleEstimator.reachAngle(DemoCup.CUP), 1e-12);
        assertEquals(Math.atan((12.5e-3 + r) / 15e-3), FlowAngleEstimator.cutOffAngle(DemoCup.CUP), 1e-12);
    }

    @Test
    void shouldGiveFiniteAnglesAndErrorsAndFlagTheRegimeFrom25To35Degrees() {
        SpectrumFitter fitter = new SpectrumFitter();
        Random rng = new Random(SEED);
        for (double deg = 25.5; deg <= 35; deg += 0.5) {
            for (Random noise : new Random[] {null, rng}) {
                for (double[] a : new double[][] {{deg, 0}, {0, -deg}}) {
                    PlasmaFit f = fitter.fit(oblique(a[0], a[1], noise));
                    String what = a[0] + "," + a[1] + (noise == null ? " clean" : " noisy");
                    assertTrue(f.ok(), what + " " + f.flagText());
                    assertTrue(f.flags().contains(FitFlag.BEYOND_SPLIT_REACH), what + " " + f.flagText());
                    assertFinite(f, what);
                    // the true angle lies within 2σ of the interval estimate (uniform: ±√3σ covers it all)
                    double th = Math.toDegrees(Math.hypot(f.angles().thetaXRad(), f.angles().thetaYRad()));
                    double s = Math.toDegrees(Math.max(f.angles().sigmaThetaXRad(), f.angles().sigmaThetaYRad()));
                    assertEquals(deg, th, 2 * s, what);
                }
            }
        }
    }

    @Test
    void shouldNeverReturnNaNFromAnAcceptedFitOverRandomInputs() {
        // property: random angles up to 35° on both axes, density 0.2–5× and noise 0.5–5× the reference, seeded
        SpectrumFitter fitter = new SpectrumFitter();
        Random rng = new Random(SEED + 1);
        for (int t = 0; t < 300; t++) {
            double ax = 70 * (rng.nextDouble() - 0.5);
            double ay = 70 * (rng.nextDouble() - 0.5);
            PlasmaFit f = fitter.fit(oblique(ax, ay, rng));
            if (f.ok()) {
                assertFinite(f, "trial " + t + " at " + ax + "," + ay + " " + f.flagText());
            }
        }
    }
}
