package dev.sweepline.sim.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.sim.scenario.ScenarioLoader;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * The interleaved design table against the default table in closed loop with the ground on
 * (docs/focus-design.md, "Measured on the bench"): same scenario, seed and length, so the same plasma.
 * The ground's p95 relative errors of n and T at least halve and that of U drops by at least 40 %, at a
 * telemetry rate within 5 % of the default's, on quiet-perihelion and fast-wind (seed 1, 60 s; the
 * design note's 3 seeds x 120 s give n and T 0.20-0.26 of the default's, U 0.44 and 0.71); the strong
 * shock is held again within 2 sweeps, by this table, by the two support tables (sweep design note R23) and by
 * the alpha-clear table (R24, margin 3, 0.35 s), which also halves the p95 of U (on 3 and 6 independent seeds x
 * 120 s U 0.42-0.49 of the default's, bit rate -4.5 to +1.4 %: docs/focus-design.md, "The alpha-clear table
 * with the drift fit").
 */
class DesignStyleRunTest {
    private record Figures(double[] p95, double bitsPerSecond, double efficiency) {
    }

    private static Figures fly(String scenario, FocusTables table) {
        BenchConfig config = table.on(BenchConfig.defaults(ScenarioLoader.builtIn(scenario), 1, 60));
        GroundCheck ground = new GroundCheck(config.flight(), GroundInstruments.of(config.instrument().spec()));
        ClosedLoopBench.Result r = ClosedLoopBench.run(config, ClosedLoopBench.Progress.NONE,
                ClosedLoopBench.Hooks.NONE.withFrames(ground.frames()));
        GroundCheck.GroundFigures g = ground.compare(r.recorder().sweeps(), r.recorder()::truthAt);
        assertTrue(g.compared() > 80, scenario + " " + table + ": fits " + g.compared());
        return new Figures(g.p95Relative(), r.summary().telemetry().frameBitsPerSecond(),
                r.summary().informationEfficiency());
    }

    /** One line of both runs' figures (printed, and the message of every check). */
    private static String report(String scenario, Figures before, Figures after) {
        String report = String.format(Locale.ROOT,
                "%s p95 n/U/T %.2e %.2e %.2e -> %.2e %.2e %.2e, bit/s %.0f -> %.0f, D-eff %.3f -> %.3f", scenario,
                before.p95()[0], before.p95()[1], before.p95()[2], after.p95()[0], after.p95()[1], after.p95()[2],
                before.bitsPerSecond(), after.bitsPerSecond(), before.efficiency(), after.efficiency());
        System.out.println(report);
        return report;
    }

    @Test
    void shouldHalveTheGroundsErrorsAtTheSameTelemetryRate() {
        for (String scenario : new String[] {"quiet-perihelion", "fast-wind"}) {
            Figures before = fly(scenario, FocusTables.DEFAULT);
            Figures after = fly(scenario, FocusTables.INTERLEAVED_DESIGN);
            String report = report(scenario, before, after);
            assertTrue(after.p95()[0] <= 0.5 * before.p95()[0], report);
            assertTrue(after.p95()[1] <= 0.6 * before.p95()[1], report);
            assertTrue(after.p95()[2] <= 0.5 * before.p95()[2], report);
            assertTrue(Math.abs(after.bitsPerSecond() / before.bitsPerSecond() - 1) <= 0.05, report);
            // more of the integration teaches about the protons than the default's
            assertTrue(after.efficiency() > before.efficiency(), report);
        }
    }

    @Test
    void shouldHalveEveryErrorWithTheAlphaClearBandAtTheSameTelemetryRate() {
        // docs/focus-design.md "The alpha-clear table with the drift fit": the ground's p95 errors of n, U and T each at most half the
        // default table's (the halving the design style aims at), the telemetry rate within 5 % of the
        // default's (common practice: the downlink allocation's margin), seed 1, 60 s
        for (String scenario : new String[] {"quiet-perihelion", "fast-wind"}) {
            Figures before = fly(scenario, FocusTables.DEFAULT);
            Figures after = fly(scenario, FocusTables.ALPHA_CLEAR);
            String report = report(scenario, before, after);
            for (int k = 0; k < 3; k++) {
                assertTrue(after.p95()[k] <= 0.5 * before.p95()[k], report);
            }
            assertTrue(Math.abs(after.bitsPerSecond() / before.bitsPerSecond() - 1) <= 0.05, report);
        }
    }

    @ParameterizedTest
    @EnumSource(value = FocusTables.class, names = {"INTERLEAVED_DESIGN", "SUPPORT_DWELL", "PAIRED_SUPPORT", "ALPHA_CLEAR"})
    void shouldHoldTheStrongShocksNewPeakCentredWithinTwoSweeps(FocusTables table) {
        for (long seed = 1; seed <= 3; seed++) {
            BenchConfig config = table.on(
                    BenchConfig.defaults(ScenarioLoader.builtIn("perihelion-strong-shock"), seed, 45));
            RunSummary s = ClosedLoopBench.run(config, ClosedLoopBench.Progress.NONE).summary();
            assertEquals(1, s.strictReacquisitions().size());
            // the band centred within 2 windows of the new peak (Reacquisition.STRICT_CENTRE_WINDOWS) by the 2nd sweep
            int strict = s.strictReacquireSweepsMax();
            assertTrue(strict >= 1 && strict <= 2, "seed " + seed + ": strict reacquisition " + strict);
            assertEquals(0, s.alphaLocks(), "seed " + seed);
            assertTrue(s.lockFraction() >= 0.99, "seed " + seed + ": lock " + s.lockFraction());
        }
    }
}
