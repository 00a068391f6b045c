package dev.sweepline.ground.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * The two campaign spectra on which earlier own optimisers left Hipparchus' minimum: the free joint fits 28
 * and 152 of the ground check of campaign perihelion-tuning, set 0 run 4 (a narrow near-Sun focus band, the
 * proton peak ± 0.75 FWHM; recorded in {@code /fit/two-minima-spectra.txt}). The free joint fit has two minima
 * there, the alphas faster and slower than the protons, and the fitter's start (alphas at the proton speed)
 * lies on the ridge between them, so the optimiser's path decides. Hipparchus' LevenbergMarquardtOptimizer
 * takes the faster alphas on the first and the slower on the second (recorded); an own optimiser with its own
 * region update took the slower on the first (χ² 54.0 against 37.9) and one with MINPACK's update but its own
 * stopping rule the faster on the second (χ² 39.20 against 39.65: Hipparchus' choice is not always the lower
 * minimum). The fit must take Hipparchus' choice on both.
 */
class TwoMinimaRegressionTest {
    /** Agreement with Hipparchus: 1e-9 relative, as {@code LevenbergMarquardtAgreementTest}. */
    static final double RELATIVE = 1e-9;

    @Test
    void shouldTakeHipparchusMinimumOnBothCampaignSpectra() throws IOException {
        List<Map<String, double[]>> runs = load();
        assertEquals(2, runs.size(), "recorded runs");
        boolean[] faster = new boolean[runs.size()];
        for (int k = 0; k < runs.size(); k++) {
            Map<String, double[]> run = runs.get(k);
            String where = "campaign fit " + (long) run.get("run")[0];
            PlasmaModel model = new PlasmaModel(run.get("lowVolts"), run.get("highVolts"), run.get("area")[0], true);
            double[] amps = run.get("amps");
            double[] sigma = run.get("sigma");
            double[] start = run.get("start");
            LeastSquaresRun.Outcome ref = HipparchusLeastSquares.fit(model, amps, sigma, start, null);
            LeastSquaresRun.Outcome own = LeastSquaresRun.fit(new LevenbergMarquardt(), model, amps, sigma, start, null);
            assertNotNull(ref, where + ": Hipparchus");
            assertNotNull(own, where + ": own");
            double[] recorded = run.get("hip");
            for (int a = 0; a < PlasmaModel.JOINT_PARAMETERS; a++) {
                // the recorded point is Hipparchus 4.0.2's: the reference this test pins is still the one it ran
                assertEquals(recorded[a], ref.parameters()[a], RELATIVE * Math.abs(recorded[a]), where + " Hipparchus " + a);
                assertEquals(ref.parameters()[a], own.parameters()[a], RELATIVE * Math.abs(ref.parameters()[a]),
                        where + " parameter " + a);
            }
            assertEquals(ref.totalChiSquare(), own.totalChiSquare(), RELATIVE * ref.totalChiSquare(), where + " χ²");
            faster[k] = own.parameters()[4] > own.parameters()[1];
            assertEquals(ref.parameters()[4] > ref.parameters()[1], faster[k], where + " minimum");
            // the other minimum exists: from the point an earlier own optimiser stopped at (recorded), a run to
            // tolerances 1e-14 ends on the other side of the proton speed at another χ²
            double[] otherStart = run.get("other");
            LeastSquaresRun.Outcome other = HipparchusLeastSquares.fitTight(model, amps, sigma, otherStart, null);
            assertNotNull(other, where + ": the other minimum");
            assertTrue(other.parameters()[4] > other.parameters()[1] != faster[k], where + ": other minimum on the other side, "
                    + java.util.Arrays.toString(other.parameters()));
            assertTrue(Math.abs(other.totalChiSquare() - ref.totalChiSquare()) > 1e-3 * ref.totalChiSquare(),
                    where + ": χ² " + ref.totalChiSquare() + " and " + other.totalChiSquare());
            System.out.printf("%s: Hipparchus and own alphas %s, χ² %.6f; the other minimum χ² %.6f%n", where,
                    faster[k] ? "faster" : "slower", own.totalChiSquare(), other.totalChiSquare());
        }
        // both cases: the faster alphas on the first, the slower on the second (the recorded Hipparchus points)
        assertTrue(faster[0] && !faster[1], "minima " + java.util.Arrays.toString(faster));
    }

    /** The recorded runs: per run the named rows of numbers of the resource. */
    private static List<Map<String, double[]>> load() throws IOException {
        List<Map<String, double[]>> runs = new ArrayList<>();
        try (InputStream in = TwoMinimaRegressionTest.class.getResourceAsStream("/fit/two-minima-spectra.txt")) {
            assertNotNull(in, "resource /fit/two-minima-spectra.txt");
            BufferedReader reader = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            for (String line = reader.readLine(); line != null; line = reader.readLine()) {
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                String[] f = line.trim().split("\\s+");
                if (f[0].equals("run")) {
                    runs.add(new HashMap<>());
                }
                double[] v = new double[f.length - 1];
                for (int i = 1; i < f.length; i++) {
                    v[i - 1] = Double.parseDouble(f[i]);
                }
                runs.get(runs.size() - 1).put(f[0], v);
            }
        }
        return runs;
    }
}
