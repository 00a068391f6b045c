package dev.sweepline.sim.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.sim.cup.FaradayCup;
import dev.sweepline.sim.hv.HvCalibration;
import dev.sweepline.sim.hv.WindowVolts;
import dev.sweepline.sim.instrument.TestInstruments;
import dev.sweepline.sim.plasma.IonPopulation;
import dev.sweepline.sim.plasma.IonSpecies;
import dev.sweepline.sim.plasma.PlasmaState;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The D-optimal design solver against the general equivalence theorem (Kiefer and Wolfowitz 1960,
 * "The equivalence of two extremum problems", Canadian Journal of Mathematics 12, 363-366 [memory]):
 * a design s is D-optimal exactly when max_x d(x, s) = p, d(x, s) = tr(F(s)⁻¹ M(x)); for every
 * other design max_x d(x, s) > p, because Σ_x s_x d(x, s) = p always.
 */
class DesignSolverTest {
    private static final int P = ProtonInformation.PARAMETERS;

    @Test
    void shouldFindTheTextbookDesignOfQuadraticRegression() {
        // y = a + b x + c x^2 on 201 points of [-1, 1]: the D-optimal design puts 1/3 on each of
        // -1, 0 and 1 (Atkinson, Donev and Tobias 2007, Optimum Experimental Designs, with SAS, §11.2
        // [memory]; closed form: det of the 3-point design is maximal and d(x) = 3 - 4.5 x^2 + 4.5 x^4 ≤ 3)
        int n = 201;
        double[][][] m = new double[n][][];
        for (int j = 0; j < n; j++) {
            double x = -1 + 2.0 * j / (n - 1);
            m[j] = outer(new double[] {1, x, x * x});
        }
        DesignSolver.Solution s = DesignSolver.solve(m, 1e-9);
        assertTrue(s.converged());
        assertEquals(1.0 / 3, s.shares()[0], 1e-6); // x = -1; 1e-6: shares of a 1e-9 converged design
        assertEquals(1.0 / 3, s.shares()[100], 1e-6); // x = 0
        assertEquals(1.0 / 3, s.shares()[200], 1e-6); // x = 1
        for (int j = 0; j < n; j++) {
            double x = -1 + 2.0 * j / (n - 1);
            // the closed form of d(x) at the optimum above, to the design's convergence
            assertEquals(3 - 4.5 * x * x + 4.5 * x * x * x * x, s.variances()[j], 1e-6, "x = " + x);
        }
    }

    @Test
    void shouldMeetTheEquivalenceTheoremOnTheCupsWindows() {
        DesignSolver.Solution s = cupDesign(1e-6);
        assertNotNull(s);
        assertTrue(s.converged(), "iterations " + s.iterations());
        // Kiefer-Wolfowitz: max over every candidate window of d = p at the optimum (to the tolerance)
        assertTrue(s.maxVariance() <= P * (1 + 1e-6), "max d " + s.maxVariance());
        assertTrue(s.maxVariance() >= P * (1 - 1e-9), "max d " + s.maxVariance());
        double weighted = 0;
        for (int j = 0; j < s.shares().length; j++) {
            weighted += s.shares()[j] * s.variances()[j];
            // ... and d = p on the support: a support window below p would lose weight at the next update
            if (s.shares()[j] > 1e-4) {
                assertEquals(P, s.variances()[j], 1e-3, "support window " + j);
            }
        }
        assertEquals(P, weighted, 1e-9); // Σ s_j d_j = tr(F⁻¹ F) = p for any design (identity)
    }

    @Test
    void shouldFindMaxVarianceAbovePElsewhereWithTheTheoremsEfficiencyBound() {
        double[][][] m = cupInformation();
        DesignSolver.Solution opt = DesignSolver.solve(m, 1e-6);
        double optDet = ProtonInformation.det(opt.information());
        SplittableRandom random = new SplittableRandom(1960);
        int checked = 0;
        for (int trial = 0; trial < 500; trial++) {
            double[] share = randomDesign(random, m.length);
            double[][] f = new double[3][3];
            DesignSolver.combine(m, share, f);
            if (!(ProtonInformation.det(f) > 0)) {
                continue; // a design on fewer than three informative windows: no finite variance to check
            }
            checked++;
            double[] d = DesignSolver.variances(m, share);
            double max = 0;
            double weighted = 0;
            for (int j = 0; j < d.length; j++) {
                max = Math.max(max, d[j]);
                weighted += share[j] * d[j];
            }
            double efficiency = Math.cbrt(ProtonInformation.det(f) / optDet);
            // Σ s_j d_j = p (identity); 1e-4: rounding of the adjugate inverse of a badly conditioned random design
            assertEquals(P, weighted, 1e-4 * P, "trial " + trial);
            // not optimal, so max d > p (Kiefer-Wolfowitz); and log det F* - log det F ≤ max d - p
            // (concavity of log det, the theorem's corollary): efficiency ≥ exp(-(max d - p)/p)
            assertTrue(max > P * (1 + 1e-3), "trial " + trial + ": max d " + max);
            assertTrue(efficiency < 1 && efficiency >= Math.exp(-(max - P) / P) * (1 - 1e-6) / (1 + 1e-6),
                    "trial " + trial + ": efficiency " + efficiency + ", max d " + max);
        }
        assertTrue(checked > 400, "non-singular designs " + checked);
    }

    @Test
    void shouldConvergeTighterThanTheOldStoppingRule() {
        // the old yardstick stopped at max d ≤ p (1 + 1e-3); the new one at 1e-6, and the design it
        // finds is at least as good: the old one's det can only be lower (efficiency of old ≤ 1)
        DesignSolver.Solution tight = cupDesign(1e-6);
        DesignSolver.Solution loose = cupDesign(1e-3);
        double ratio = Math.cbrt(ProtonInformation.det(loose.information()) / ProtonInformation.det(tight.information()));
        assertTrue(ratio <= 1 + 1e-9 && ratio >= Math.exp(-1e-3), "loose/tight efficiency " + ratio);
        assertTrue(tight.iterations() < DesignSolver.MAX_ITERATIONS, "iterations " + tight.iterations());
    }

    @Test
    void shouldAgreeWithTheMultiplicativeAlgorithmAloneOnTheCupsWindows() {
        // the same optimum two ways: Newton on the support after 40 multiplicative updates, and the
        // multiplicative algorithm alone to its stopping rule; both within 1e-6 of the optimum's log det
        // (equivalence theorem: log det F* − log det F ≤ max d − p), so their dets agree to 2 x 3e-6
        double[][][] m = cupInformation();
        DesignSolver.Solution fast = DesignSolver.solve(m, 1e-6);
        DesignSolver.Solution alone = DesignSolver.multiplicative(flat(m), P, 1e-6);
        assertTrue(fast.converged() && alone.converged());
        double logRatio = Math.log(ProtonInformation.det(fast.information()) / ProtonInformation.det(alone.information()));
        assertTrue(Math.abs(logRatio) <= 2 * P * 1e-6, "log det ratio " + logRatio);
        // Newton's design is no worse: the multiplicative one stops short of the optimum, from below
        assertTrue(logRatio >= -1e-12, "log det ratio " + logRatio);
        assertTrue(fast.iterations() < alone.iterations() / 10,
                "iterations " + fast.iterations() + " against " + alone.iterations());
    }

    @Test
    void shouldAddTheSupportPointsAStartMissed() {
        // quadratic regression on 201 points of [-1, 1] (the textbook design above: 1/3 at -1, 0, 1),
        // Newton started on -1, -0.9, 0.9 and 1: the optimum on that support is not the optimum, its
        // d(0) > p, and the vertex step must bring x = 0 (index 100) in
        int n = 201;
        double[][][] m = new double[n][][];
        for (int j = 0; j < n; j++) {
            double x = -1 + 2.0 * j / (n - 1);
            m[j] = outer(new double[] {1, x, x * x});
        }
        double[] start = new double[n];
        for (int j : new int[] {0, 10, 190, 200}) {
            start[j] = 0.25;
        }
        DesignSolver.Solution s = new SupportNewton(flat(m), P).solve(start, 0.5, 1e-9, 0);
        assertNotNull(s);
        assertTrue(s.converged() && s.maxVariance() <= P * (1 + 1e-9), "max d " + s.maxVariance());
        // closed form of the textbook design (Atkinson, Donev and Tobias 2007, §11.2 [memory]);
        // 1e-6: shares of a 1e-9 converged design
        assertEquals(1.0 / 3, s.shares()[0], 1e-6);
        assertEquals(1.0 / 3, s.shares()[100], 1e-6);
        assertEquals(1.0 / 3, s.shares()[200], 1e-6);
    }

    private static DesignSolver.Solution cupDesign(double tolerance) {
        return DesignSolver.solve(cupInformation(), tolerance);
    }

    /** The demo cup's windows over three physics.md reference plasmas (400, 420, 440 km/s). */
    private static double[][][] cupInformation() {
        FaradayCup cup = new FaradayCup(TestInstruments.DEMO_CUP.cup());
        WindowVolts windows = new WindowVolts(TestInstruments.DEMO_CUP.flight().defaultTable(),
                HvCalibration.nominal(TestInstruments.DEMO_CUP.flight()));
        DOptimalDesign design = new DOptimalDesign(cup, TestInstruments.DEMO_CUP.preamp(), windows);
        List<PlasmaState> plasmas = new ArrayList<>();
        for (double u : new double[] {400e3, 420e3, 440e3}) {
            double w = IonPopulation.thermalSpeed(1e5, IonSpecies.PROTON.massKg());
            plasmas.add(new PlasmaState(List.of(new IonPopulation(IonSpecies.PROTON, 5e6, 0, 0, u, w, w)), 0, 0, 1));
        }
        return design.windowInformation(plasmas, 0.008);
    }

    private static double[] randomDesign(SplittableRandom random, int n) {
        double[] share = new double[n];
        double sum = 0;
        int centre = 50 + random.nextInt(30);
        for (int k = 0; k < 3 + random.nextInt(20); k++) {
            int w = Math.max(0, Math.min(n - 1, centre + random.nextInt(-12, 13)));
            double x = -Math.log(1 - random.nextDouble());
            share[w] += x;
            sum += x;
        }
        for (int j = 0; j < n; j++) {
            share[j] /= sum;
        }
        return share;
    }

    private static double[] flat(double[][][] m) {
        double[] flat = new double[m.length * P * P];
        for (int j = 0; j < m.length; j++) {
            for (int a = 0; a < P; a++) {
                System.arraycopy(m[j][a], 0, flat, (j * P + a) * P, P);
            }
        }
        return flat;
    }

    private static double[][] outer(double[] g) {
        double[][] m = new double[3][3];
        ProtonInformation.accumulate(m, g, 1.0, 1.0);
        return m;
    }
}
