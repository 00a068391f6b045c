package dev.sweepline.sim.cli;

import static dev.sweepline.sim.cli.BenchCommandLineErrorTest.assertOneLine;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.host.ExitStatus;
import dev.sweepline.sim.campaign.CampaignIdentity;
import dev.sweepline.sim.campaign.RunJournal;
import dev.sweepline.sim.cli.BenchCommandLineErrorTest.Run;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code tune --shard auto} from a job array's environment (given to the command, never the test's own),
 * the folder identity that resumes only its own shard, and {@code merge}'s shard check, on the command line.
 */
class TuneShardCommandLineTest {
    /** 2 sets x 2 members of 6 s: 4 short runs. */
    static final String CAMPAIGN = """
            format: sweepline-campaign/1
            name: tiny
            seed: 5
            runsPerSet: 2
            durationS: 6
            scenario: quiet-perihelion
            grid:
              integrationPeriods: [4, 8]
            """;

    @TempDir
    Path dir;

    private Path campaign() throws IOException {
        return Files.writeString(dir.resolve("tiny.yaml"), CAMPAIGN);
    }

    /** The bench's command line with {@code tune} reading {@code env} as its environment. */
    private static Run tune(Map<String, String> env, String... args) {
        return BenchCommandLineErrorTest.run(
                cl -> ((TuneCommand) cl.getSubcommands().get("tune").getCommand()).environment = env, args);
    }

    @Test
    void shouldTakeTheShardFromSlurmAndKubernetesAndMergeThem() throws IOException {
        Path c = campaign();
        // sbatch --array=0-1: task 0 is shard 1/2
        Run slurm = tune(Map.of("SLURM_ARRAY_TASK_ID", "0", "SLURM_ARRAY_TASK_MIN", "0", "SLURM_ARRAY_TASK_MAX", "1"),
                "tune", c.toString(), "--shard", "auto", "--threads", "1", "--out", dir.resolve("s1").toString());
        assertEquals(0, slurm.status(), slurm.err() + slurm.out());
        assertTrue(slurm.out().contains("shard 1/2"), slurm.out());
        // an Indexed Job with completions 2: index 1 is shard 2/2
        Run k8s = tune(Map.of("JOB_COMPLETION_INDEX", "1"), "tune", c.toString(), "--shard", "auto", "--shards", "2",
                "--threads", "1", "--out", dir.resolve("s2").toString());
        assertEquals(0, k8s.status(), k8s.err() + k8s.out());
        assertEquals(new dev.sweepline.sim.campaign.Shard(2, 2), CampaignIdentity.read(dir.resolve("s2")).shard());
        assertEquals(2, Files.readAllLines(dir.resolve("s2").resolve(RunJournal.FILE)).size());
        Run merged = BenchCommandLineErrorTest.run("merge", c.toString(), dir.resolve("s2").toString(),
                dir.resolve("s1").toString(), "--out", dir.resolve("m").toString());
        assertEquals(0, merged.status(), merged.err() + merged.out());
        Run whole = BenchCommandLineErrorTest.run("tune", c.toString(), "--threads", "2", "--out", dir.resolve("w").toString());
        assertEquals(0, whole.status(), whole.err() + whole.out());
        for (String f : List.of("runs.csv", "sets.csv", "summary.json")) {
            assertArrayEquals(Files.readAllBytes(dir.resolve("w").resolve(f)), Files.readAllBytes(dir.resolve("m").resolve(f)), f);
        }
        // one shard left out: merge names it
        Run missing = BenchCommandLineErrorTest.run("merge", c.toString(), dir.resolve("s1").toString(), "--out",
                dir.resolve("m2").toString());
        assertOneLine(missing, ExitStatus.INPUT, "sweepline-bench merge: merge error: shard 2 of 2 is missing");
        // the same shard twice
        Run twice = BenchCommandLineErrorTest.run("merge", c.toString(), dir.resolve("s1").toString(),
                dir.resolve("s1").toString(), "--out", dir.resolve("m3").toString());
        assertOneLine(twice, ExitStatus.INPUT, "merge error: shard 1/2 given twice");
        // the shards of an edited campaign file are another campaign's
        Path edited = Files.writeString(dir.resolve("edited.yaml"), CAMPAIGN.replace("seed: 5", "seed: 6"));
        Run other = BenchCommandLineErrorTest.run("merge", edited.toString(), dir.resolve("s1").toString(),
                dir.resolve("s2").toString(), "--out", dir.resolve("m4").toString());
        assertOneLine(other, ExitStatus.INPUT, "merge error: " + dir.resolve("s1") + ": a shard of another campaign file");
        // --out naming a shard's own folder: its runs.csv would be replaced by the merged one
        byte[] shardRuns = Files.readAllBytes(dir.resolve("s1").resolve("runs.csv"));
        Run intoShard = BenchCommandLineErrorTest.run("merge", c.toString(), dir.resolve("s1").toString(),
                dir.resolve("s2").toString(), "--out", dir.resolve("s1").toString());
        assertOneLine(intoShard, ExitStatus.IO, "--out " + dir.resolve("s1") + ": a shard folder of tune");
        assertArrayEquals(shardRuns, Files.readAllBytes(dir.resolve("s1").resolve("runs.csv")));
    }

    @Test
    void shouldRefuseAutoWithoutAJobArrayInOneLine() throws IOException {
        Path c = campaign();
        Path out = dir.resolve("o");
        Run none = tune(Map.of("HOME", "/root"), "tune", c.toString(), "--shard", "auto", "--out", out.toString());
        assertOneLine(none, ExitStatus.USAGE, "sweepline-bench tune: --shard auto: no job array in the environment");
        Run bad = tune(Map.of("JOB_COMPLETION_INDEX", "3"), "tune", c.toString(), "--shard", "auto", "--shards", "3",
                "--out", out.toString());
        assertOneLine(bad, ExitStatus.USAGE, "--shard auto: JOB_COMPLETION_INDEX=3 is outside 0..2 (3 shards)");
        Run malformed = tune(Map.of("SLURM_ARRAY_TASK_ID", "one", "SLURM_ARRAY_TASK_MIN", "0", "SLURM_ARRAY_TASK_MAX", "3"),
                "tune", c.toString(), "--shard", "auto", "--out", out.toString());
        assertOneLine(malformed, ExitStatus.USAGE, "SLURM_ARRAY_TASK_ID='one' is not a whole number");
        Run stray = tune(Map.of(), "tune", c.toString(), "--shard", "1/2", "--shards", "2", "--out", out.toString());
        assertOneLine(stray, ExitStatus.USAGE, "--shards 2: only with --shard auto");
        assertTrue(Files.notExists(out)); // refused before any work
    }

    @Test
    void shouldResumeOnlyTheSameShardOfTheSameCampaign() throws IOException {
        Path c = campaign();
        Path out = dir.resolve("s1");
        assertEquals(0, tune(Map.of(), "tune", c.toString(), "--shard", "1/2", "--threads", "1", "--out", out.toString())
                .status());
        Run again = tune(Map.of(), "tune", c.toString(), "--shard", "1/2", "--threads", "1", "--out", out.toString());
        assertEquals(0, again.status(), again.err());
        assertTrue(again.out().contains("resuming: 2 of 2 runs already in"), again.out());
        Run otherShard = tune(Map.of(), "tune", c.toString(), "--shard", "2/2", "--out", out.toString());
        assertOneLine(otherShard, ExitStatus.IO, "--out " + out + ": holds shard 1/2 of campaign tiny", "not shard 2/2");
    }

    @Test
    void shouldTakeAnEditedScenarioFileForAnotherCampaign() throws IOException {
        // the campaign names a scenario file beside it: a shard run before the file was edited is another campaign's
        String scenario = new String(getClass().getResourceAsStream("/scenarios/quiet-perihelion.yaml").readAllBytes(),
                java.nio.charset.StandardCharsets.UTF_8);
        Path file = Files.writeString(dir.resolve("mine.yaml"), scenario);
        Path c = Files.writeString(dir.resolve("tiny.yaml"), CAMPAIGN.replace("scenario: quiet-perihelion",
                "scenario: mine.yaml"));
        for (int shard = 1; shard <= 2; shard++) {
            Run run = tune(Map.of(), "tune", c.toString(), "--shard", shard + "/2", "--threads", "1", "--out",
                    dir.resolve("s" + shard).toString());
            assertEquals(0, run.status(), run.err() + run.out());
            if (shard == 1) {
                Files.writeString(file, scenario + "\n# edited after shard 1\n");
            }
        }
        Run merged = BenchCommandLineErrorTest.run("merge", c.toString(), dir.resolve("s1").toString(),
                dir.resolve("s2").toString(), "--out", dir.resolve("m").toString());
        assertOneLine(merged, ExitStatus.INPUT, "merge error: " + dir.resolve("s1") + ": a shard of another campaign file");
    }

    @Test
    void shouldRefuseAShardWhoseRunFileIsCutShortOrShortOfRuns() throws IOException {
        // a kill -9 or a power loss while tune wrote runs.csv (a buffered writer's blocks, not its lines), or a
        // shard being run again while merge reads it: the file ends inside a row, or a row short
        Path c = campaign();
        for (int shard = 1; shard <= 2; shard++) {
            Run run = tune(Map.of(), "tune", c.toString(), "--shard", shard + "/2", "--threads", "1", "--out",
                    dir.resolve("s" + shard).toString());
            assertEquals(0, run.status(), run.err() + run.out());
        }
        Path runs2 = dir.resolve("s2").resolve("runs.csv");
        byte[] whole2 = Files.readAllBytes(runs2);
        String last = new String(whole2, java.nio.charset.StandardCharsets.US_ASCII).strip();
        String lastField = last.substring(last.lastIndexOf(',') + 1);
        assertTrue(lastField.length() > 3 && Double.isFinite(Double.parseDouble(lastField)), last);
        // the newline and the last two digits lost: the row still parses, to another number
        Files.write(runs2, java.util.Arrays.copyOf(whole2, whole2.length - 3));
        Run cut = BenchCommandLineErrorTest.run("merge", c.toString(), dir.resolve("s1").toString(),
                dir.resolve("s2").toString(), "--out", dir.resolve("m").toString());
        assertOneLine(cut, ExitStatus.INPUT, "merge error: " + runs2 + ":3: the last row is cut short");
        assertTrue(Files.notExists(dir.resolve("m").resolve("runs.csv")));
        // shard 1's file a row short (its second row gone): the shard, not "a shard", is named
        Files.write(runs2, whole2);
        Path runs1 = dir.resolve("s1").resolve("runs.csv");
        List<String> lines1 = Files.readAllLines(runs1);
        Files.write(runs1, lines1.subList(0, 2));
        Run shortOfRuns = BenchCommandLineErrorTest.run("merge", c.toString(), dir.resolve("s1").toString(),
                dir.resolve("s2").toString(), "--out", dir.resolve("m").toString());
        assertOneLine(shortOfRuns, ExitStatus.INPUT, "merge error: " + runs1 + ": 1 of the 2 runs of shard 1/2");
        // a row of shard 2 in shard 1's file in place of its own
        Files.write(runs1, List.of(lines1.get(0), lines1.get(1), Files.readAllLines(runs2).get(1)));
        Run foreign = BenchCommandLineErrorTest.run("merge", c.toString(), dir.resolve("s1").toString(),
                dir.resolve("s2").toString(), "--out", dir.resolve("m").toString());
        assertOneLine(foreign, ExitStatus.INPUT, "merge error: " + runs1 + ":3: run 1 of set 0 is not a run of shard 1/2");
    }

    @Test
    void shouldTakeAShardFlownOnAnotherBuiltInInstrumentForAnotherCampaign() throws IOException {
        // the campaign names no instrument: --instrument chooses (FORMAT.md), so a shard run with
        // --instrument fine-cup flew another instrument than one run without it (the demo cup)
        Path c = campaign();
        Run demo = tune(Map.of(), "tune", c.toString(), "--shard", "1/2", "--threads", "1", "--out",
                dir.resolve("s1").toString());
        assertEquals(0, demo.status(), demo.err() + demo.out());
        Run fine = tune(Map.of(), "tune", c.toString(), "--shard", "2/2", "--threads", "1", "--instrument", "fine-cup",
                "--out", dir.resolve("s2").toString());
        assertEquals(0, fine.status(), fine.err() + fine.out());
        Run merged = BenchCommandLineErrorTest.run("merge", c.toString(), dir.resolve("s1").toString(),
                dir.resolve("s2").toString(), "--out", dir.resolve("m").toString());
        assertOneLine(merged, ExitStatus.INPUT, "merge error: " + dir.resolve("s2") + ": a shard of another campaign file");
        Run mergedFine = BenchCommandLineErrorTest.run("merge", c.toString(), dir.resolve("s1").toString(),
                dir.resolve("s2").toString(), "--instrument", "fine-cup", "--out", dir.resolve("m").toString());
        assertOneLine(mergedFine, ExitStatus.INPUT, "merge error: " + dir.resolve("s1") + ": a shard of another campaign file");
        // nor does the demo cup's folder resume on the other instrument
        Run resumed = tune(Map.of(), "tune", c.toString(), "--shard", "1/2", "--threads", "1", "--instrument", "fine-cup",
                "--out", dir.resolve("s1").toString());
        assertOneLine(resumed, ExitStatus.IO, "--out " + dir.resolve("s1") + ": holds shard 1/2 of campaign tiny");
        // naming the default is the same campaign as naming none
        Run named = tune(Map.of(), "tune", c.toString(), "--shard", "1/2", "--threads", "1", "--instrument", "demo-cup",
                "--out", dir.resolve("s1").toString());
        assertEquals(0, named.status(), named.err() + named.out());
    }
}
