package dev.sweepline.sim.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.exec.FlightConfig;
import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.ground.instrument.InstrumentSet;
import dev.sweepline.sim.instrument.TestInstruments;
import dev.sweepline.sim.scenario.Scenario;
import dev.sweepline.sim.scenario.ScenarioLoader;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The first survey of a run is usable: on a weak and on a cold plasma the flight software finds the
 * proton peak in it and the ground fits it (sweep design note R9: never-read windows are ranged from
 * their neighbour, not all read in the least sensitive range).
 */
class StartUpTest {
    private static Scenario plasma(String name, double densityPerCc, double temperatureK) {
        return ScenarioLoader.parse("""
                format: sweepline-scenario/1
                name: %s
                description: start-up test plasma
                distanceAu: 0.73
                durationS: 5
                protons:
                  densityPerCc: %s
                  speedKmPerS: 400
                  temperatureK: %s
                alphas:
                  abundance: 0
                  driftKmPerS: 0
                  temperatureRatio: 1
                flow:
                  thetaXDeg: 3
                  thetaYDeg: 0
                field:
                  thetaXDeg: 4
                  thetaYDeg: 0
                """.formatted(name, densityPerCc, temperatureK), name + ".yaml");
    }

    @ParameterizedTest
    @CsvSource({
        // physics.md worked case P1 (1 AU slow wind: n 5, U 400 km/s, T 1e5 K) at a fifth of its density:
        // the first survey read all in the top range was NO_SIGNAL on the ground and had no peak on board
        "weak, 1, 1.0e5",
        // P1 with the protons at 2e4 K (U/w = 22): a cold beam, whose first survey had no peak on board
        "cold, 5, 2.0e4"})
    void shouldFindAndFitTheFirstSurvey(String name, double densityPerCc, double temperatureK) {
        GroundCheck ground = new GroundCheck(FlightConfig.of(TestInstruments.DEMO_CUP.flight()), InstrumentSet.builtIns());
        ClosedLoopBench.Result r = ClosedLoopBench.run(BenchConfig.defaults(plasma(name, densityPerCc, temperatureK), 7,
                3), ClosedLoopBench.Progress.NONE, ClosedLoopBench.Hooks.NONE.withFrames(ground.frames()));
        SweepRecord first = r.recorder().sweeps().get(0);
        assertEquals(SweepMode.SURVEY, first.mode());
        // the found peak within a window of the true one (the band is centred within 2: Reacquisition)
        assertEquals(first.trueProtonWindow(), first.peakWindow(), 1.0);
        assertEquals(SweepMode.FOCUS, r.recorder().sweeps().get(1).mode()); // locked after one survey
        List<GroundCheck.ComparedFit> fits = ground.compared(r.recorder().sweeps(), r.recorder()::truthAt);
        GroundCheck.ComparedFit survey = fits.get(0);
        assertNotNull(survey);
        assertEquals(SweepMode.SURVEY, survey.mode()); // the first spectrum has moments (no NO_SIGNAL)
        // and they are right: the first survey's density within 5 of its bounds (z, Cramér-Rao)
        assertTrue(Math.abs(survey.z()[0]) < 5, "z of n " + survey.z()[0]);
    }

    @org.junit.jupiter.api.Test
    void shouldLeaveThePeakEmptyWhenTheSweepFindsNone() throws java.io.IOException {
        // P1 at 1e-4 of its density: ~0.3 fA per quadrant at the peak, below range 0's Johnson noise
        // sqrt(4kTB/R_f) = 1.0 fA (closed form; instruments/demo-cup.yaml: R_f = 4 V / 40 pA, 300 K,
        // B = 1/(2 x 8 ms)): no sweep finds a peak, and the products say so instead of a peak at window 0
        ClosedLoopBench.Result r = ClosedLoopBench.run(BenchConfig.defaults(plasma("empty", 5e-4, 1.0e5), 7, 3),
                ClosedLoopBench.Progress.NONE);
        assertTrue(r.recorder().sweeps().stream().allMatch(s -> Double.isNaN(s.peakWindow())));
        assertEquals(0, r.summary().tracking().peakSweeps()); // no peak error from a peak never found
        java.nio.file.Path dir = java.nio.file.Files.createTempDirectory("start-up");
        RunReportWriter.write(dir, r);
        String row = java.nio.file.Files.readAllLines(dir.resolve("decisions.csv")).get(1);
        assertEquals("", row.split(",", -1)[6], row); // peakWindow, the 7th column
    }
}
