package dev.sweepline.sim.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.exec.FlightConfig;
import dev.sweepline.sim.hv.WindowVolts;
import dev.sweepline.sim.scenario.ScenarioLoader;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The run's yardstick is the D-optimal design over the plasmas the run saw, sampled every
 * {@link ClosedLoopBench#YARDSTICK_PERIOD_SECONDS}: the sampling must be fine enough that a finer one
 * changes nothing that matters, and the efficiency must be what the run reports.
 */
class ClosedLoopYardstickTest {
    @ParameterizedTest
    @ValueSource(strings = {"quiet-perihelion", "perihelion-strong-shock"}) // the second has a shock at 30 s
    void shouldGiveTheSameEfficiencyWithAnEightTimesFinerSamplingOfTheRun(String scenario) {
        BenchConfig config = BenchConfig.defaults(ScenarioLoader.builtIn(scenario), 2, 60);
        ClosedLoopBench.Result r = ClosedLoopBench.run(config, ClosedLoopBench.Progress.NONE);
        FlightConfig flight = ClosedLoopBench.flightConfig(config);
        WindowVolts windows = new WindowVolts(flight.table, config.instrument().calibration());
        long end = config.durationMicros();
        double fine = ClosedLoopBench.informationEfficiency(config, r.recorder(), windows, r.recorder()::truthAt, end,
                ClosedLoopBench.YARDSTICK_PERIOD_SECONDS / 8);
        double used = ClosedLoopBench.informationEfficiency(config, r.recorder(), windows, r.recorder()::truthAt, end,
                ClosedLoopBench.YARDSTICK_PERIOD_SECONDS);
        // the figure the run reports is the one computed here (same recorder, same sampling)
        assertEquals(used, r.summary().informationEfficiency(), 1e-12);
        // 0.002: the resolution of the efficiency figures the bench prints (three decimals, common practice)
        assertEquals(fine, used, 0.002);
        assertTrue(used > 0 && used <= 1.05, "efficiency " + used); // an adaptive run may beat a static design a little
    }
}
