package dev.sweepline.ground.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;

/** The angle beyond the split's reach from the total current's fall-off and a carried density. */
class AcceptanceAngleTest {
    /** Recorded seed. */
    static final long SEED = 4417L;

    @Test
    void shouldInvertTheAcceptanceOfTheDiscOverlap() {
        // closed form of the two-disc overlap (DiscOverlap.twoDiscArea): s(A(s)) = s across the lens range
        CupGeometry cup = DemoCup.CUP;
        double d = cup.apertureToCollectorM();
        for (double deg = 21; deg < 52; deg += 1) {
            double t = Math.tan(Math.toRadians(deg));
            double a = cup.transmission(t, 0);
            assertEquals(d * t, cup.shiftOfTransmission(a), 1e-12, deg + "°");
        }
        assertTrue(Double.isNaN(cup.shiftOfTransmission(1.0)));
        assertTrue(Double.isNaN(cup.shiftOfTransmission(0.0)));
        assertTrue(Double.isNaN(cup.shiftOfTransmission(Double.NaN)));
    }

    @Test
    void shouldAgeTheCarriedDensityAsARandomWalk() {
        // σ_ln n² = (σ/n)² + (0.1/60)²·Δt (DensityPrior: 10 % an hour, common practice [memory])
        DensityPrior p = DensityPrior.carried(5e6, 5e3, 900);
        assertEquals(5e6, p.densityPerM3());
        assertEquals(Math.sqrt(1e-6 + 0.1 * 0.1 / 3600 * 900), p.sigmaLog(), 1e-15);
        assertNull(DensityPrior.carried(5e6, 5e3, 3601));
        assertNull(DensityPrior.carried(5e6, 5e3, -1));
        assertNull(DensityPrior.carried(Double.NaN, 5e3, 1));
        assertNull(DensityPrior.carried(5e6, Double.NaN, 1));
    }

    /**
     * The physics.md reference case, first at 20° (inside the reach: its density carried), then 26–35° on
     * both axes 60 s later: the angle, n and U come back within 2σ of the truth in every clean case and in
     * at least 95 % of the noisy ones (2σ of a Gaussian: 95.4 %, common practice), with a 1σ of θ below the
     * interval's uniform 7.9°.
     */
    @Test
    void shouldRecoverTheAngleFromTheFallOffWithACarriedDensity() {
        SpectrumFitter fitter = new SpectrumFitter();
        Random rng = new Random(SEED);
        int trials = 0;
        int covered = 0;
        for (Random noise : new Random[] {null, rng}) {
            for (int rep = 0; rep < (noise == null ? 1 : 4); rep++) {
                for (double deg = 26; deg <= 35; deg += 1) {
                    for (int axis = 0; axis < 2; axis++) {
                        double[] before = axis == 0 ? new double[] {20, 0} : new double[] {0, -20};
                        double[] now = axis == 0 ? new double[] {deg, 0} : new double[] {0, -deg};
                        PlasmaFit first = fitter.fit(BeyondSplitReachTest.oblique(before[0], before[1], noise));
                        assertTrue(first.ok() && !first.flags().contains(FitFlag.BEYOND_SPLIT_REACH), first.flagText());
                        DensityPrior prior = DensityPrior.carried(first.protons().densityPerM3(),
                                first.protons().sigmaDensityPerM3(), 60);
                        PlasmaFit f = fitter.fit(BeyondSplitReachTest.oblique(now[0], now[1], noise), prior);
                        String what = now[0] + "," + now[1] + (noise == null ? " clean" : " noisy");
                        assertTrue(f.ok() && f.flags().contains(FitFlag.BEYOND_SPLIT_REACH), what + " " + f.flagText());
                        BeyondSplitReachTest.assertFinite(f, what);
                        FlowAngles a = f.angles();
                        double th = axis == 0 ? a.thetaXRad() : a.thetaYRad();
                        double sth = axis == 0 ? a.sigmaThetaXRad() : a.sigmaThetaYRad();
                        double truth = Math.toRadians(axis == 0 ? deg : -deg);
                        assertTrue(sth < Math.toRadians(7.9), what + " σθ " + Math.toDegrees(sth));
                        SpeciesMoments p = f.protons();
                        // ReferenceCase: n and U of the physics.md reference case
                        boolean in = Math.abs(th - truth) < 2 * sth
                                && Math.abs(p.densityPerM3() - ReferenceCase.DENSITY) < 2 * p.sigmaDensityPerM3()
                                && Math.abs(p.speedMPerS() - ReferenceCase.SPEED) < 2 * p.sigmaSpeedMPerS();
                        if (noise == null) {
                            assertTrue(in, what + " θ " + Math.toDegrees(th) + " ± " + Math.toDegrees(sth) + " n "
                                    + p.densityPerM3() + " ± " + p.sigmaDensityPerM3() + " U " + p.speedMPerS() + " ± "
                                    + p.sigmaSpeedMPerS());
                        } else {
                            trials++;
                            covered += in ? 1 : 0;
                        }
                    }
                }
            }
        }
        assertTrue(covered >= 0.95 * trials, covered + " of " + trials);
    }

    @Test
    void shouldKeepTheIntervalWhenTheCarriedDensityContradictsTheReach() {
        // a carried density half the truth implies A = 2·A(θ) > 1: no angle beyond the reach has it, so the
        // interval estimate (the middle of [reach, cut-off]) stands
        SpectrumFitter fitter = new SpectrumFitter();
        SpectrumInput in = BeyondSplitReachTest.oblique(30, 0, null);
        PlasmaFit plain = fitter.fit(in);
        PlasmaFit f = fitter.fit(in, new DensityPrior(0.5 * ReferenceCase.DENSITY, 0.01));
        assertEquals(plain.angles().thetaXRad(), f.angles().thetaXRad(), 0.0);
        BeyondSplitReachTest.assertFinite(f, "contradicting prior");
    }
}
