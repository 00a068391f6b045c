package dev.sweepline.ground.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.bound.CramerRaoBound;
import dev.sweepline.ground.bound.FisherMatrix;
import dev.sweepline.ground.spectrum.SpectrumValues;
import java.util.Locale;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The fit of an interleaved spectrum with the speed's change over the sweep ΔU (docs/physics.md, "Speed drift
 * within an interleaved sweep"; {@link PlasmaModel#withDrift}): window j at U + ΔU (τ_j − ½), τ_j its step over
 * c − 1 in the interleaved order of ICD §4. The case is {@link NearSunCase}'s protons (no alphas) on a focus band
 * of 32 windows around their peak, with the noise of ICD §8.
 */
class SpeedDriftFitTest {
    private static final int BAND = 32;
    /** A change of 1 km/s over the sweep: fast-wind's median 0.9 km/s (docs/focus-design.md). */
    private static final double DRIFT = 1e3;

    private static final double[] LOW = new double[BAND];
    private static final double[] HIGH = new double[BAND];
    private static final double[] TAU = new double[BAND];

    static {
        double[] lo = NearSunCase.low();
        double[] hi = NearSunCase.high();
        double peakVolts = Species.PROTON.voltsAtSpeed(NearSunCase.U);
        int peak = 0;
        while (peak < lo.length - 1 && hi[peak] < peakVolts) {
            peak++;
        }
        int first = peak - BAND / 2;
        for (int j = 0; j < BAND; j++) {
            LOW[j] = lo[first + j];
            HIGH[j] = hi[first + j];
            TAU[j] = SpectrumValues.stepOf(j, BAND, false, true) / (double) (BAND - 1);
        }
    }

    private static double[] protons(double drift) {
        double[] p = NearSunCase.truth();
        return new double[] {p[0], p[1], p[2], drift};
    }

    private static PlasmaModel driftModel() {
        return new PlasmaModel(LOW, HIGH, DemoCup.CUP.effectiveAreaM2(), false, TAU);
    }

    @Test
    void shouldBeTheModelWithoutDriftWhenTheSpeedHoldsStill() {
        // ΔU = 0: every window at U, the currents and the (n, U, w) derivatives those of the model without
        // drift bit for bit (the same WindowCurrent operations, PlasmaModelEdgeTest); ∂I/∂ΔU = (τ − ½) ∂I/∂U
        for (boolean alphas : new boolean[] {false, true}) {
            PlasmaModel plain = new PlasmaModel(LOW, HIGH, DemoCup.CUP.effectiveAreaM2(), alphas);
            PlasmaModel drift = new PlasmaModel(LOW, HIGH, DemoCup.CUP.effectiveAreaM2(), alphas, TAU);
            int np = plain.parameters();
            assertEquals(np + 1, drift.parameters());
            assertEquals(np, drift.driftIndex());
            double[] p = java.util.Arrays.copyOf(NearSunCase.truth(), np + 1);
            p[np] = 0;
            double[] i0 = new double[BAND];
            double[] i1 = new double[BAND];
            double[][] j0 = new double[BAND][np];
            double[][] j1 = new double[BAND][np + 1];
            plain.evaluate(p, i0, j0);
            drift.evaluate(p, i1, j1);
            for (int j = 0; j < BAND; j++) {
                assertEquals(i0[j], i1[j], 0.0, "window " + j);
                double dSpeed = 0;
                for (int a = 0; a < np; a++) {
                    assertEquals(j0[j][a], j1[j][a], 0.0, "window " + j + " derivative " + a);
                    dSpeed += a % 3 == 1 ? j0[j][a] : 0;
                }
                assertEquals((TAU[j] - 0.5) * dSpeed, j1[j][np], 0.0, "window " + j + " drift derivative");
            }
        }
    }

    @Test
    void shouldGiveTheDriftDerivativeOfACentralDifference() {
        // the analytic ∂I/∂ΔU against (I(ΔU + h) − I(ΔU − h)) / 2h, h = 1 m/s: truncation ~ h² I''' / 6, far
        // below 1e-6 of the derivative at w ~ 70 km/s (common practice for an analytic Jacobian check)
        PlasmaModel m = driftModel();
        double[] jac0 = new double[BAND];
        double[][] jac = new double[BAND][4];
        m.evaluate(protons(DRIFT), jac0, jac);
        double[] up = new double[BAND];
        double[] down = new double[BAND];
        m.evaluate(protons(DRIFT + 1), up, null);
        m.evaluate(protons(DRIFT - 1), down, null);
        double scale = 0;
        for (int j = 0; j < BAND; j++) {
            scale = Math.max(scale, Math.abs(jac[j][3]));
        }
        for (int j = 0; j < BAND; j++) {
            assertEquals((up[j] - down[j]) / 2, jac[j][3], 1e-6 * scale, "window " + j);
        }
    }

    @Test
    void shouldRecoverAKnownSpeedChangeAtAReducedChiSquareOfOne() {
        double[] truth = protons(DRIFT);
        PlasmaModel m = driftModel();
        double[] clean = new double[BAND];
        m.evaluate(truth, clean, null);
        double[] sigma = NearSunCase.sigma(clean);
        CramerRaoBound bound = FisherMatrix.bound(m, truth, sigma);
        CramerRaoBound still = FisherMatrix.bound(new PlasmaModel(LOW, HIGH, DemoCup.CUP.effectiveAreaM2(), false),
                NearSunCase.truth(), sigma);
        SpectrumFitter fitter = new SpectrumFitter(DemoCup.CUP);
        SplittableRandom random = new SplittableRandom(20261202L);
        int trials = 200;
        double[] sumZ = new double[4];
        double[] sumZ2 = new double[4];
        double chi = 0;
        double chiStill = 0;
        for (int t = 0; t < trials; t++) {
            double[] amps = new double[BAND];
            for (int j = 0; j < BAND; j++) {
                amps[j] = clean[j] + sigma[j] * random.nextGaussian();
            }
            SpectrumInput plain = new SpectrumInput(LOW, HIGH, amps, sigma, null, null, 0, 0);
            PlasmaFit f = fitter.fit(plain.withStepFraction(TAU));
            assertTrue(f.ok() && f.driftFitted() && !f.alphasFitted(), f.flagText());
            double[] p = f.normalParameters();
            for (int a = 0; a < 4; a++) {
                double z = (p[a] - truth[a]) / bound.sigma()[a];
                sumZ[a] += z;
                sumZ2[a] += z * z;
            }
            chi += f.reducedChiSquare();
            PlasmaFit without = fitter.fit(plain);
            assertFalse(without.driftFitted());
            chiStill += without.reducedChiSquare();
        }
        double nu = BAND - 4;
        String report = String.format(Locale.ROOT, "mean z n/U/w/dU %.2f %.2f %.2f %.2f, rms %.2f %.2f %.2f %.2f, "
                + "mean reduced chi-square %.3f (without the drift %.2f); bound of U %.1f m/s (held still %.1f), of dU %.1f",
                sumZ[0] / trials, sumZ[1] / trials, sumZ[2] / trials, sumZ[3] / trials, Math.sqrt(sumZ2[0] / trials),
                Math.sqrt(sumZ2[1] / trials), Math.sqrt(sumZ2[2] / trials), Math.sqrt(sumZ2[3] / trials), chi / trials,
                chiStill / trials, bound.sigma()[1], still.sigma()[1], bound.sigma()[3]);
        System.out.println(report);
        for (int a = 0; a < 4; a++) {
            // unbiased at the bound: the mean z within 4 standard errors 1/√200 of 0 and its rms within 4
            // standard errors √(1/(2·200)) = 0.05 of 1 (a Gaussian's sample mean and rms, closed form)
            assertEquals(0, sumZ[a] / trials, 4 / Math.sqrt(trials), report);
            assertEquals(1, Math.sqrt(sumZ2[a] / trials), 4 * Math.sqrt(0.5 / trials), report);
        }
        // χ²(ν)/ν has mean 1 and variance 2/ν (closed form): 4 standard errors of the mean of 200
        assertEquals(1, chi / trials, 4 * Math.sqrt(2 / nu / trials), report);
        // without ΔU the zigzag stays in the residuals (docs/focus-design.md, "The interleaved order and the χ² check")
        assertTrue(chiStill / trials > 1 + 8 * Math.sqrt(2 / nu / trials), report);
    }

    @Test
    void shouldStepTheWindowsAsTheIcdSays() {
        // ICD §4: offsets from the starting end, the even ones outward (0, 2, 4, ...) and then the odd ones back
        for (int c = 1; c <= 64; c++) {
            int[] order = new int[c];
            int k = 0;
            for (int o = 0; o < c; o += 2) {
                order[o] = k++;
            }
            for (int o = c % 2 == 0 ? c - 1 : c - 2; o > 0; o -= 2) {
                order[o] = k++;
            }
            for (int i = 0; i < c; i++) {
                assertEquals(order[i], SpectrumValues.stepOf(i, c, false, true), "up, c " + c + " window " + i);
                assertEquals(order[c - 1 - i], SpectrumValues.stepOf(i, c, true, true), "down, c " + c + " window " + i);
                assertEquals(i, SpectrumValues.stepOf(i, c, false, false));
                assertEquals(c - 1 - i, SpectrumValues.stepOf(i, c, true, false));
            }
        }
    }
}
