package dev.sweepline.sim.bench;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.host.instrument.Instruments;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.sim.scenario.ScenarioLoader;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ClosedLoopBenchTest {
    /** The demo cup's flight description (instruments/demo-cup.yaml), the instrument this part models. */
    private static final InstrumentDescription DEMO = Instruments.defaultSpec().flight();
    @TempDir
    Path dir;

    @Test
    void shouldWriteTheSummaryFieldsOfDesignNoteB2() throws IOException {
        ClosedLoopBench.Result result = ClosedLoopBench.run(
                BenchConfig.defaults(ScenarioLoader.builtIn("shock-sheath"), 3, 60), ClosedLoopBench.Progress.NONE);
        RunReportWriter.write(dir, result);
        JsonNode json = new ObjectMapper().readTree(dir.resolve("summary.json").toFile());
        for (String field : new String[] {"lockFraction", "alphaLocks", "reacquireSweepsMax", "reacquireSecondsMax",
            "spectraPerSecond", "integratingFraction", "steps", "decisionHash"}) {
            assertTrue(json.has(field), field);
        }
        assertTrue(json.get("spectraPerSecond").has("survey"));
        assertTrue(json.get("spectraPerSecond").has("focus"));
        assertEquals(result.summary().steps(), json.get("steps").asLong());
        assertEquals(Files.readAllLines(dir.resolve("decisions.csv")).size() - 1, result.recorder().sweeps().size());
    }

    @Test
    void shouldAccountTimeConsistently() {
        RunSummary s = ClosedLoopBench.run(BenchConfig.defaults(ScenarioLoader.builtIn("quiet-perihelion"), 1, 30),
                ClosedLoopBench.Progress.NONE).summary();
        // integration time per step is 8 modulation periods of 1 ms (SweepParameters default dwell):
        // the integrating fraction is steps x 8 ms over the run, to within the last step in flight
        double expected = s.steps() * 8.0 * DEMO.modulationPeriodMicros() / 1e6 / 30.0;
        assertEquals(expected, s.integratingFraction(), 0.01);
        assertTrue(s.integratingFraction() < 1.0);
        int sweeps = s.sweepsByMode().get(SweepMode.SURVEY) + s.sweepsByMode().get(SweepMode.FOCUS);
        assertTrue(sweeps > 10, "sweeps " + sweeps);
    }

    @Test
    void shouldPlaceTheTruePeaksOnTheWindowAxis() {
        ClosedLoopBench.Result r = ClosedLoopBench.run(BenchConfig.defaults(ScenarioLoader.builtIn("helium-rich"), 1, 10),
                ClosedLoopBench.Progress.NONE);
        SweepRecord first = r.recorder().sweeps().get(0);
        // physics.md: at one speed the alpha E/q is 1.986300 x the proton E/q; helium-rich.yaml has the
        // alphas 10 km/s faster than the 450 km/s protons, so the ratio is 1.9863 (460/450)^2; on the
        // default table (ΔV/V = 120^(1/128)) that is ln(ratio)/ln(120^(1/128)) windows higher. Both
        // winds are cool (U/w 11 and 16), so their current peaks sit within a window of the bulk
        // E/q: allow 1.5 windows.
        double ratio = 1.986300 * Math.pow(460.0 / 450.0, 2);
        double expected = Math.log(ratio) / (Math.log(120.0) / 128);
        assertEquals(expected, first.trueAlphaWindow() - first.trueProtonWindow(), 1.5);
    }
}
