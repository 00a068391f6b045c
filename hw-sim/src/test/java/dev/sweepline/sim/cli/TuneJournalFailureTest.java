package dev.sweepline.sim.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import dev.sweepline.fsw.host.ExitStatus;
import dev.sweepline.sim.campaign.RunJournal;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code tune} when its journal cannot be written in the middle of a campaign (a full disk, a quota): the
 * bench in a process of its own whose file size is limited ({@code ulimit -f}, RLIMIT_FSIZE, setrlimit(2):
 * a write past it fails with EFBIG, "File too large", HotSpot ignoring SIGXFSZ [memory]), then resumed.
 */
class TuneJournalFailureTest {
    @TempDir
    Path dir;

    @Test
    void shouldEndWithTheIoStatusNamingTheJournalWhenItCannotBeAppended() throws IOException, InterruptedException {
        Path bash = Path.of("/bin/bash");
        assumeTrue(Files.isExecutable(bash), "needs bash for ulimit");
        // 3 members of 6 s; a row of the journal is about 400 octets, so 1 KiB (bash's ulimit -f counts
        // 1024-octet blocks) holds two of them and the third write fails
        Path campaign = Files.writeString(dir.resolve("tiny.yaml"), TuneShardCommandLineTest.CAMPAIGN
                .replace("runsPerSet: 2", "runsPerSet: 3").replace("integrationPeriods: [4, 8]", "integrationPeriods: [8]"));
        Path out = dir.resolve("o");
        Path java = Path.of(System.getProperty("java.home"), "bin", "java");
        ProcessBuilder pb = new ProcessBuilder(bash.toString(), "-c",
                "ulimit -f 1; exec \"$JAVA\" -XX:-UsePerfData -cp \"$CP\" " + BenchMain.class.getName()
                        + " tune \"$CAMPAIGN\" --out \"$OUT\" --threads 1 --jit tiered");
        pb.environment().put("JAVA", java.toString());
        pb.environment().put("CP", System.getProperty("java.class.path"));
        pb.environment().put("CAMPAIGN", campaign.toString());
        pb.environment().put("OUT", out.toString());
        Path err = dir.resolve("err.txt");
        Process p = pb.redirectError(err.toFile()).redirectOutput(dir.resolve("out.txt").toFile()).start();
        assertTrue(p.waitFor(120, TimeUnit.SECONDS), "tune did not end");
        String stderr = Files.readString(err, StandardCharsets.UTF_8);
        List<String> lines = stderr.lines().toList();
        assertEquals(ExitStatus.IO, p.exitValue(), stderr);
        assertEquals(1, lines.size(), stderr);
        assertTrue(lines.get(0).startsWith("sweepline-bench tune: " + out.resolve(RunJournal.FILE)
                + ": cannot append a finished run: File too large"), stderr);
        assertTrue(lines.get(0).contains("the runs journalled before it are kept"), stderr);
        assertFalse(stderr.contains("Exception"), stderr);
        // room again: the same command resumes (the torn last line dropped) and ends as an uninterrupted run
        BenchCommandLineErrorTest.Run resumed = BenchCommandLineErrorTest.run("tune", campaign.toString(), "--out",
                out.toString(), "--threads", "1");
        assertEquals(0, resumed.status(), resumed.err() + resumed.out());
        assertTrue(resumed.out().contains("resuming: 2 of 3 runs already in"), resumed.out());
        Path whole = dir.resolve("w");
        assertEquals(0, BenchCommandLineErrorTest.run("tune", campaign.toString(), "--out", whole.toString(),
                "--threads", "1").status());
        for (String f : List.of("runs.csv", "sets.csv", "summary.json")) {
            assertArrayEquals(Files.readAllBytes(whole.resolve(f)), Files.readAllBytes(out.resolve(f)), f);
        }
    }
}
