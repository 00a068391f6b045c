package dev.sweepline.sim.cli;

import static dev.sweepline.sim.cli.BenchCommandLineErrorTest.assertOneLine;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.host.CliException;
import dev.sweepline.fsw.host.ExitStatus;
import dev.sweepline.sim.campaign.CampaignIdentity;
import dev.sweepline.sim.campaign.RunJournal;
import dev.sweepline.sim.cli.BenchCommandLineErrorTest.Run;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code tune} resuming a folder a power loss or a kill left behind (campaigns/FORMAT.md, "Shards, merge and
 * resuming"): the resume note's count of dropped lines, a {@code shard.properties} that is not whole beside a
 * whole journal, and a file system without locks, on the command line.
 */
class TuneResumeFolderTest {
    @TempDir
    Path dir;

    private Path campaign;
    private Path whole;

    /** The tiny campaign (TuneShardCommandLineTest: 4 runs), run once without interruption. */
    @BeforeEach
    void runWhole() throws IOException {
        campaign = Files.writeString(dir.resolve("tiny.yaml"), TuneShardCommandLineTest.CAMPAIGN);
        whole = dir.resolve("w");
        Run r = tune(whole);
        assertEquals(0, r.status(), r.err() + r.out());
    }

    private Run tune(Path out) {
        return BenchCommandLineErrorTest.run("tune", campaign.toString(), "--out", out.toString(), "--threads", "1");
    }

    private void assertSameFiles(Path out) throws IOException {
        for (String f : List.of("runs.csv", "sets.csv", "summary.json")) {
            assertArrayEquals(Files.readAllBytes(whole.resolve(f)), Files.readAllBytes(out.resolve(f)), f);
        }
    }

    private Path folder(String name, String journal) throws IOException {
        Path out = Files.createDirectories(dir.resolve(name));
        Files.copy(whole.resolve(CampaignIdentity.FILE), out.resolve(CampaignIdentity.FILE));
        Files.writeString(out.resolve(RunJournal.FILE), journal, StandardCharsets.UTF_8);
        return out;
    }

    @Test
    void shouldCountTheDroppedLinesInTheResumeNote() throws IOException {
        List<String> done = Files.readAllLines(whole.resolve(RunJournal.FILE));
        // one good line, then two the disk never wrote (zeros) and one cut short: 3 lines dropped
        String tail = "\0".repeat(40) + "\n" + "\0".repeat(40) + "\n" + done.get(1).substring(0, 30);
        Path out = folder("tail", done.get(0) + "\n" + tail);
        Run r = tune(out);
        assertEquals(0, r.status(), r.err() + r.out());
        assertTrue(r.out().contains("resuming: 1 of 4 runs already in " + out.resolve(RunJournal.FILE)
                + " (dropped its last 3 lines, " + tail.length() + " octets: cut short or failing their check)"), r.out());
        assertSameFiles(out);
    }

    @Test
    void shouldSayWhatToDoWithAnEmptyShardPropertiesBesideAWholeJournal() throws IOException {
        Path out = folder("empty", Files.readString(whole.resolve(RunJournal.FILE)));
        Files.write(out.resolve(CampaignIdentity.FILE), new byte[0]); // its write lost with the power, the journal forced
        long octets = Files.size(out.resolve(RunJournal.FILE));
        assertOneLine(tune(out), ExitStatus.IO, out.resolve(CampaignIdentity.FILE) + ": empty (0 octets",
                "the journal " + out.resolve(RunJournal.FILE) + " holds " + octets + " octets of finished runs",
                "if the folder holds shard 1/1 of tiny", "delete shard.properties and run the same command again");
        // cut short in the middle of a line: said so
        Files.writeString(out.resolve(CampaignIdentity.FILE), "# a campaign output folder of swee");
        assertOneLine(tune(out), ExitStatus.IO, out.resolve(CampaignIdentity.FILE) + ": cut short (34 octets",
                "delete shard.properties");
        // done as it says: every run resumed, the files of the uninterrupted run
        Files.delete(out.resolve(CampaignIdentity.FILE));
        Run r = tune(out);
        assertEquals(0, r.status(), r.err() + r.out());
        assertTrue(r.out().contains("resuming: 4 of 4 runs already in"), r.out());
        assertSameFiles(out);
    }

    @Test
    void shouldEndWithTheIoStatusOnAFileSystemWithoutLocks() {
        Path journal = whole.resolve(RunJournal.FILE);
        CliException e = TuneCommand.journalError(whole, new RunJournal.LocksUnsupportedException(journal,
                new IOException("No locks available"))); // strerror(ENOLCK), glibc
        assertEquals(ExitStatus.IO, e.status());
        assertTrue(e.getMessage().startsWith("--out " + whole + ": " + journal + ": cannot lock the journal"),
                e.getMessage());
        assertTrue(e.getMessage().contains("does not support locks"), e.getMessage());
        // a damaged journal stays an input refused (FORMAT.md: exit 4)
        assertEquals(ExitStatus.INPUT, TuneCommand.journalError(whole, new IOException(journal + ":2: damaged line"))
                .status());
    }
}
