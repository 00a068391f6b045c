package dev.sweepline.sim.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.sim.instrument.TestInstruments;
import dev.sweepline.sim.scenario.Scenario;
import dev.sweepline.sim.scenario.ScenarioLoader;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;

/** The evaluation table's figures, and the noise model's reduced chi-square on a steady plasma. */
class EvaluationTest {
    private static Scenario evaluationCase(String name) {
        return ScenarioLoader.evaluationCases().stream().filter(s -> s.name().equals(name)).findFirst().orElseThrow();
    }

    @Test
    void shouldFitASteadyPlasmaWithoutAlphasAtAReducedChiSquareOfOne() {
        // a plasma held still, without alphas, fitted by the right model with the right noise: chi-square(nu)
        // / nu has mean 1 and variance 2 / nu (closed form), so the mean of N fits is 1 within
        // sqrt(sum 2 / nu) / N; 4 of those standard errors, so that a right model fails once in ~16000 runs
        List<Evaluation.Row> rows = Evaluation.evaluate(List.of(evaluationCase("eval-steady-no-alphas")), new long[] {5},
                60, TestInstruments.DEMO_CUP, 1, RunPool.Progress.NONE);
        Evaluation.Row row = rows.get(0);
        Evaluation.ChiSquareMean focus = row.chiSquare().get(SweepMode.FOCUS);
        assertTrue(focus.fits() > 80, "focus fits " + focus.fits());
        assertEquals(1.0, focus.mean(), 4 * focus.standardError(), "focus mean reduced chi-square");
        // the flag's false-alarm rate is 1e-3 by construction (NonStationarity): more than 2 of ~110 fits
        // flagged has probability ~2e-5 (binomial tail, closed form)
        assertTrue(row.flagged() <= 2, "flagged " + row.flagged());
        for (int k = 0; k < 3; k++) {
            // the scatter at the Cramér-Rao bound, as GroundCheckTest (0.8-1.3 for ~95 spectra)
            double ratio = row.errors().crlbRatio()[k];
            assertTrue(ratio > 0.8 && ratio < 1.3, GroundCheck.GroundFigures.MOMENTS[k] + ": " + ratio);
        }
        assertTrue(row.alphaFreeFits() == row.errors().compared(), "every sweep is alpha-free");
    }

    @Test
    void shouldTakeTheMedianOfEachMomentsFiniteZScores() {
        // closed form: the order statistic sorted[floor(n / 2)] of each column, NaN left out
        double[] m = Evaluation.medianZ(List.of(new double[] {1, -3, 0}, new double[] {2, Double.NaN, 5},
                new double[] {-4, 1, 7}));
        assertEquals(1, m[0]); // {-4, 1, 2}
        assertEquals(1, m[1]); // {-3, 1}: sorted[1]
        assertEquals(5, m[2]); // {0, 5, 7}
    }

    @Test
    void shouldLoadEveryEvaluationCaseBesideTheBuiltIns() {
        List<Scenario> cases = ScenarioLoader.evaluationCases();
        Set<String> names = new HashSet<>();
        for (Scenario s : cases) {
            assertTrue(names.add(s.name()), "duplicate " + s.name());
            assertFalse(ScenarioLoader.builtInNames().contains(s.name()), s.name() + " shadows a built-in");
            assertTrue(s.name().startsWith("eval-"), s.name());
        }
        // the weak spots of the ground fit (the flow beyond the reach both from the start and after a turn)
        // and the steady reference (scenarios/evaluation/index.txt)
        assertEquals(Set.of("eval-fast-alpha-above", "eval-alpha-rich-ejecta", "eval-flow-28deg",
                "eval-flow-turn-28deg", "eval-strong-shock-ramp", "eval-steady-no-alphas"), names);
        assertEquals(1, evaluationCase("eval-strong-shock-ramp").jumps().size());
    }

    @Test
    void shouldHoldTheCalmVariantStill() {
        Scenario calm = ScenarioLoader.builtIn("perihelion-strong-shock").calm();
        assertEquals("perihelion-strong-shock-calm", calm.name());
        assertTrue(calm.events().isEmpty());
        assertTrue(calm.jumps().isEmpty());
        assertFalse(calm.fluctuations().any());
        assertEquals(ScenarioLoader.builtIn("perihelion-strong-shock").start(), calm.start());
    }
}
