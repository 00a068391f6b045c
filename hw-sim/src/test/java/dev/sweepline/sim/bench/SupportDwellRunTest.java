package dev.sweepline.sim.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.sim.scenario.ScenarioLoader;
import java.util.Locale;
import org.junit.jupiter.api.Test;

/**
 * The support dwell table (FocusTables.SUPPORT_DWELL, sweep design note R23) in closed loop
 * (docs/focus-design.md, "Support dwell"): on the same plasma as the interleaved design table it collects
 * more of the attainable information (the bench's D-efficiency), keeps the lock and never locks on the
 * alphas; the strong shock's reacquisition is DesignStyleRunTest's, for both support tables.
 */
class SupportDwellRunTest {
    @Test
    void shouldCollectMoreOfTheInformationThanTheEqualDwellBand() {
        for (String scenario : new String[] {"quiet-perihelion", "fast-wind"}) {
            RunSummary before = ClosedLoopBench.run(FocusTables.INTERLEAVED_DESIGN.on(
                    BenchConfig.defaults(ScenarioLoader.builtIn(scenario), 1, 60)), ClosedLoopBench.Progress.NONE).summary();
            RunSummary after = ClosedLoopBench.run(FocusTables.SUPPORT_DWELL.on(
                    BenchConfig.defaults(ScenarioLoader.builtIn(scenario), 1, 60)), ClosedLoopBench.Progress.NONE).summary();
            String report = String.format(Locale.ROOT, "%s D-eff %.3f -> %.3f, lock %.4f, alpha locks %d", scenario,
                    before.informationEfficiency(), after.informationEfficiency(), after.lockFraction(), after.alphaLocks());
            System.out.println(report);
            // docs/focus-design.md measured 90 s: quiet-perihelion 0.70 -> 0.79, fast-wind 0.68 -> 0.93
            assertTrue(after.informationEfficiency() >= before.informationEfficiency() + 0.05, report);
            assertTrue(after.lockFraction() >= 0.99, report);
            assertEquals(0, after.alphaLocks(), report);
        }
    }

    @Test
    void shouldCutTheGroundsErrorsOfTheUnpairedSupportDwellWhileKeepingItsInformation() {
        for (String scenario : new String[] {"quiet-perihelion", "fast-wind"}) {
            double[] unpaired = groundP95(FocusTables.SUPPORT_DWELL, scenario);
            double[] paired = groundP95(FocusTables.PAIRED_SUPPORT, scenario);
            String report = String.format(Locale.ROOT, "%s ground p95 n/U/T %.2e %.2e %.2e -> %.2e %.2e %.2e, D-eff %.3f -> %.3f",
                    scenario, unpaired[0], unpaired[1], unpaired[2], paired[0], paired[1], paired[2], unpaired[3], paired[3]);
            System.out.println(report);
            // docs/focus-design.md, "Paired support", 3 seeds x 120 s with the ground's fit before its drift term:
            // p95 n 0.25 of the unpaired table's on both, U 0.33 and 0.47, T 0.66 and 0.22 (quiet-perihelion,
            // fast-wind). The drift fit of interleaved spectra ("A drift-aware fit of interleaved spectra") takes
            // most of the unpaired table's fast-wind error (p95 n 7.2e-3 -> 2.3e-3, T 1.5e-2 -> 4.8e-3 on seed 1),
            // so the pairing's cut is smaller there; seed 1, 60 s here, measured with the drift fit: n 0.47 and
            // 0.70, U 0.46 and 0.52, T 0.51 and 0.71
            assertTrue(paired[0] <= 0.75 * unpaired[0], report);
            assertTrue(paired[1] <= 0.7 * unpaired[1], report);
            assertTrue(paired[2] <= 0.75 * unpaired[2], report);
            // with a D-efficiency above the equal-dwell tables' (0.69 and 0.67, the test above; measured 0.81, 0.83)
            assertTrue(paired[3] >= 0.78, report);
        }
    }

    /** The ground's p95 relative errors of n, U, T and the bench's D-efficiency, seed 1, 60 s. */
    private static double[] groundP95(FocusTables table, String scenario) {
        BenchConfig config = table.on(BenchConfig.defaults(ScenarioLoader.builtIn(scenario), 1, 60));
        GroundCheck ground = new GroundCheck(config.flight(), GroundInstruments.of(config.instrument().spec()));
        ClosedLoopBench.Result r = ClosedLoopBench.run(config, ClosedLoopBench.Progress.NONE,
                ClosedLoopBench.Hooks.NONE.withFrames(ground.frames()));
        GroundCheck.GroundFigures g = GroundCheck.figures(r.recorder().sweeps().size(),
                ground.compared(r.recorder().sweeps(), r.recorder()::truthAt));
        double[] p = g.p95Relative();
        return new double[] {p[0], p[1], p[2], r.summary().informationEfficiency()};
    }
}
