package dev.sweepline.sim.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The bench's commands on the second built-in instrument (instruments/fine-cup.yaml). */
class FineCupCommandLineTest {
    private static final String CAMPAIGN = "src/main/resources/campaigns/fine-cup-tuning.yaml";
    private static final String PLAN = "src/main/resources/plans/cinder-orbit.yaml";

    @Test
    void shouldTuneTheFineCupCampaign(@TempDir Path dir) throws Exception {
        // campaigns/fine-cup-tuning.yaml: instrument fine-cup, 2 x 2 sets x 2 runs of 30 s
        assertEquals(0, BenchMain.commandLine().execute("tune", CAMPAIGN, "--threads", "2", "--out", dir.toString()));
        assertTrue(Files.exists(dir.resolve("summary.json")) && Files.exists(dir.resolve("recommended.table")));
    }

    @Test
    void shouldRefuseAnInstrumentThatDisagreesWithTheCampaign(@TempDir Path dir) {
        // campaigns/FORMAT.md, instrument: --instrument must name the campaign's instrument, else an input error
        assertEquals(dev.sweepline.fsw.host.ExitStatus.INPUT, BenchMain.commandLine().execute("tune", CAMPAIGN, "--instrument", "demo-cup", "--out",
                dir.toString()));
        assertTrue(Files.notExists(dir.resolve("runs.csv")));
    }

    @Test
    void shouldBudgetTheDemoPlanOnTheFineCup(@TempDir Path dir) throws Exception {
        // plans/FORMAT.md: without an instrument: key, --instrument chooses; exit 0 when the plan fits (README)
        assertEquals(0, BenchMain.commandLine().execute("budget", PLAN, "--instrument", "fine-cup", "--threads", "2",
                "--out", dir.toString()));
        String budget = Files.readString(dir.resolve("budget.json"));
        assertTrue(budget.contains("\"instrument\" : \"fine-cup\"") && budget.contains("\"verdict\" : \"FITS\""), budget);
    }

    @Test
    void shouldRefuseABrokenDescriptionAsAnInputError(@TempDir Path dir) throws Exception {
        Path bad = dir.resolve("bad-cup.yaml");
        Files.writeString(bad, "format: sweepline-instrument/0\n");
        // instruments/FORMAT.md: a broken file fails with its file, line and field; ExitStatus: an input error
        assertEquals(dev.sweepline.fsw.host.ExitStatus.INPUT, BenchMain.commandLine().execute("run", "--instrument", bad.toString(), "--out",
                dir.resolve("run").toString()));
        assertTrue(Files.notExists(dir.resolve("run")));
    }
}
