package dev.sweepline.sim.bench;

import dev.sweepline.fsw.exec.FlightConfig;
import dev.sweepline.sim.instrument.TestInstruments;
import dev.sweepline.ground.instrument.InstrumentSet;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.sim.scenario.ScenarioLoader;
import org.junit.jupiter.api.Test;

/**
 * The whole chain against the best the measurement allows: flight software, telemetry, the
 * independent ground decoder and fitter, on a plasma held still (calm-perihelion), must recover the
 * proton moments with a scatter at the Cramér-Rao bound.
 */
class GroundCheckTest {
    @Test
    void shouldRecoverMomentsAtTheCramerRaoBoundOnCalmPlasma() {
        GroundCheck ground = new GroundCheck(FlightConfig.of(TestInstruments.DEMO_CUP.flight()), InstrumentSet.builtIns());
        ClosedLoopBench.Result r = ClosedLoopBench.run(BenchConfig.defaults(ScenarioLoader.builtIn("calm-perihelion"),
                3, 60), ClosedLoopBench.Progress.NONE, ClosedLoopBench.Hooks.NONE.withFrames(ground.frames()));
        GroundCheck.GroundFigures g = ground.compare(r.recorder().sweeps(), r.recorder()::truthAt);
        assertEquals(g.spectra(), g.fitted()); // every spectrum fits
        assertTrue(g.compared() > 80, "compared " + g.compared());
        for (int k = 0; k < 3; k++) {
            // physics.md: an efficient fitter's scatter is 0.85-1.2 x the bound over >= 500 trials; with
            // ~95 spectra here the rms of a unit normal scatters by about 1/sqrt(2 x 95) = 7 %, so allow 0.8-1.3
            double ratio = g.crlbRatio()[k];
            assertTrue(ratio > 0.8 && ratio < 1.3, GroundCheck.GroundFigures.MOMENTS[k] + ": " + ratio + " x the bound");
        }
    }
}
