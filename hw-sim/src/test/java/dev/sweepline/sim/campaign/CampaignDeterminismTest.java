package dev.sweepline.sim.campaign;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.sim.bench.BenchConfig;
import dev.sweepline.sim.bench.RunPool;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Campaign design note C1: results do not depend on the thread count; sharded-then-merged equals unsharded. */
class CampaignDeterminismTest {
    static final String CAMPAIGN = """
            format: sweepline-campaign/1
            name: small
            seed: 77
            runsPerSet: 3
            durationS: 12
            scenario: shock-sheath
            allocationBitsPerS: 9000
            draws:
              protonDensity: {logUniform: [300, 900]}
              protonSpeed: {uniform: [330, 420]}
              flowThetaX: {normal: [0, 2]}
            grid:
              integrationPeriods: [4, 8]
              resurveyEvery: [4, 16]
            """;

    @TempDir
    Path dir;

    @Test
    void shouldGiveIdenticalFilesOnOneAndTwoThreads() throws IOException {
        CampaignSpec spec = CampaignReader.parse(CAMPAIGN, "small.yaml", null);
        Path one = dir.resolve("one");
        Path two = dir.resolve("two");
        write(one, spec, CampaignRunner.run(spec, 1, Shard.ALL, RunPool.Progress.NONE));
        write(two, spec, CampaignRunner.run(spec, 2, Shard.ALL, RunPool.Progress.NONE));
        for (String f : new String[] {"runs.csv", "sets.csv", "summary.json"}) {
            assertArrayEquals(Files.readAllBytes(one.resolve(f)), Files.readAllBytes(two.resolve(f)), f);
        }
    }

    @Test
    void shouldMergeShardsIntoTheUnshardedResult() throws IOException {
        CampaignSpec spec = CampaignReader.parse(CAMPAIGN, "small.yaml", null);
        Path whole = dir.resolve("whole");
        write(whole, spec, CampaignRunner.run(spec, 2, Shard.ALL, RunPool.Progress.NONE));
        Path s1 = dir.resolve("s1");
        Path s2 = dir.resolve("s2");
        Path s3 = dir.resolve("s3");
        CampaignOutput.writeRuns(s1, CampaignRunner.run(spec, 1, new Shard(1, 3), RunPool.Progress.NONE));
        CampaignOutput.writeRuns(s2, CampaignRunner.run(spec, 2, new Shard(2, 3), RunPool.Progress.NONE));
        CampaignOutput.writeRuns(s3, CampaignRunner.run(spec, 1, new Shard(3, 3), RunPool.Progress.NONE));
        Path merged = dir.resolve("merged");
        write(merged, spec, CampaignOutput.readRuns(spec, List.of(s3, s1, s2)));
        for (String f : new String[] {"runs.csv", "sets.csv", "summary.json"}) {
            assertArrayEquals(Files.readAllBytes(whole.resolve(f)), Files.readAllBytes(merged.resolve(f)), f);
        }
    }

    @Test
    void shouldRefuseAMergeWithAShardMissing() throws IOException {
        CampaignSpec spec = CampaignReader.parse(CAMPAIGN, "small.yaml", null);
        Path s1 = dir.resolve("s1");
        CampaignOutput.writeRuns(s1, CampaignRunner.run(spec, 2, new Shard(1, 2), RunPool.Progress.NONE));
        IOException e = assertThrows(IOException.class, () -> CampaignOutput.readRuns(spec, List.of(s1)));
        assertEquals(true, e.getMessage().contains("a shard is missing"), e.getMessage());
    }

    @Test
    void shouldRefuseAShardOfAnOlderBenchByItsHeader() throws IOException {
        // the runs.csv header before the unflagged-error columns (campaigns/FORMAT.md): 25 columns
        CampaignSpec spec = CampaignReader.parse(CAMPAIGN, "small.yaml", null);
        Path old = dir.resolve("old");
        Files.createDirectories(old);
        String header = String.join(",", java.util.Arrays.copyOf(RunRow.HEADER.split(","), 25));
        Files.writeString(old.resolve("runs.csv"), header + "\n");
        IOException e = assertThrows(IOException.class, () -> CampaignOutput.readRuns(spec, List.of(old)));
        assertTrue(e.getMessage().contains("header differs: 25 columns, expected 31"), e.getMessage());
        assertTrue(e.getMessage().contains(old.resolve("runs.csv").toString()), e.getMessage());
    }

    @Test
    void shouldCarryTheUnflaggedErrorsThroughRunsCsv() throws IOException {
        CampaignSpec spec = CampaignReader.parse(CAMPAIGN, "small.yaml", null);
        List<RunRow> rows = CampaignRunner.run(spec, 2, Shard.ALL, RunPool.Progress.NONE);
        Path d = dir.resolve("whole-rows");
        CampaignOutput.writeRuns(d, rows);
        List<RunRow> back = CampaignOutput.readRuns(spec, List.of(d));
        assertEquals(rows, back); // Double.toString round-trips exactly (RunRow)
        for (RunRow r : back) {
            for (int k = 0; k < 3; k++) {
                // without the flagged fits the median can only be defined when some fit is left
                assertTrue(Double.isFinite(r.errorUnflagged()[k]) || r.nonStationary() > 0, r.toString());
            }
        }
    }

    @Test
    void shouldGiveEverySetTheSameEnsemble() {
        CampaignSpec spec = CampaignReader.parse(CAMPAIGN, "small.yaml", null);
        CampaignSpec again = CampaignReader.parse(CAMPAIGN, "small.yaml", null); // read independently
        // common random numbers (campaign design note): the run of member k in the first set and in the
        // last set, built from two readings of the file, fly the same plasma with the same seed; only the
        // sweep parameters differ (integrationPeriods 4 and 8, the grid's first axis)
        for (int run = 0; run < spec.runsPerSet(); run++) {
            BenchConfig first = CampaignRunner.config(spec, 0, run);
            BenchConfig last = CampaignRunner.config(again, again.setCount() - 1, run);
            assertEquals(first.scenario().start(), last.scenario().start(), "member " + run);
            assertEquals(first.scenario().jumps(), last.scenario().jumps(), "member " + run);
            assertEquals(first.seed(), last.seed(), "member " + run);
            assertEquals(4, first.flight().parameters.integrationPeriods);
            assertEquals(8, last.flight().parameters.integrationPeriods);
        }
        // and the members are drawn apart from each other
        assertNotEquals(spec.member(0).start(), spec.member(1).start());
        assertNotEquals(spec.runSeed(0), spec.runSeed(1));
        assertEquals(4, spec.setCount());
        assertEquals(8, spec.parameters(spec.setCount() - 1).integrationPeriods); // last axis fastest
        assertEquals(16, spec.parameters(spec.setCount() - 1).resurveyEveryFocusSweeps);
    }

    @Test
    void shouldDrawWhenTheShockComesPerMember() {
        String text = CAMPAIGN.replace("durationS: 12", "durationS: 30")
                .replace("grid:", "eventShiftS: {uniform: [-32, -20]}\ngrid:");
        CampaignSpec spec = CampaignReader.parse(text, "shifted.yaml", null);
        // shock-sheath's front is at 40 s (its file): shifted by -32..-20 s it falls at 8..20 s
        double a = spec.member(0).jumps().get(0).atSeconds();
        double b = spec.member(1).jumps().get(0).atSeconds();
        assertTrue(a >= 8 && a <= 20 && b >= 8 && b <= 20, a + " " + b);
        assertTrue(a != b);
        assertEquals(a, spec.member(0).jumps().get(0).atSeconds()); // seeded: the same member, the same shock
        assertEquals(1, spec.member(0).jumps().size()); // one jump: the shock front (the helium ramp is no jump)
    }

    private static void write(Path dir, CampaignSpec spec, List<RunRow> rows) throws IOException {
        CampaignOutput.writeRuns(dir, rows);
        CampaignOutput.writeResults(dir, spec, rows);
    }
}
