package dev.sweepline.sim.campaign;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.sim.bench.RunPool;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A killed shard resumes from its journal (RunJournal) to the same files as an uninterrupted run,
 * octet for octet; a torn last line is dropped, a damaged journal refused.
 */
class CampaignResumeTest {
    @TempDir
    Path dir;

    private final CampaignSpec spec = CampaignReader.parse(CampaignDeterminismTest.CAMPAIGN, "small.yaml", null);

    /** Every run of {@code shard} through a journal in {@code out}, then the files tune writes. */
    private List<RunRow> tune(Path out, Shard shard, int threads, RunPool.Progress progress) throws IOException {
        Files.createDirectories(out);
        List<RunRow> rows;
        try (RunJournal journal = RunJournal.open(out, spec, shard)) {
            rows = CampaignRunner.run(spec, threads, shard, journal, progress);
        }
        CampaignOutput.writeRuns(out, rows);
        if (shard.whole()) {
            CampaignOutput.writeResults(out, spec, rows);
        }
        return rows;
    }

    private static List<String> lines(Path journal) throws IOException {
        return Files.readAllLines(journal.resolve(RunJournal.FILE));
    }

    @Test
    void shouldResumeAKilledRunToTheSameFiles() throws IOException {
        Path whole = dir.resolve("whole");
        tune(whole, Shard.ALL, 2, RunPool.Progress.NONE);
        // the state a kill after 5 of the 12 runs leaves: 5 forced lines and the 6th half written, no results
        List<String> done = lines(whole);
        assertEquals(12, done.size()); // 4 sets x 3 members (CampaignDeterminismTest.CAMPAIGN)
        Path killed = dir.resolve("killed");
        Files.createDirectories(killed);
        String sixth = done.get(5);
        Files.writeString(killed.resolve(RunJournal.FILE), String.join("\n", done.subList(0, 5)) + "\n"
                + sixth.substring(0, sixth.length() / 2), StandardCharsets.UTF_8);
        AtomicInteger last = new AtomicInteger();
        try (RunJournal journal = RunJournal.open(killed, spec, Shard.ALL)) {
            assertEquals(5, journal.finished().size());
            assertEquals(sixth.length() / 2, journal.droppedOctets()); // the torn line, without a newline
        }
        tune(killed, Shard.ALL, 1, (d, t) -> last.set(d * 1000 + t));
        assertEquals(12 * 1000 + 12, last.get()); // progress counts the 5 resumed runs as done
        assertEquals(12, lines(killed).size()); // the 7 missing runs appended, none twice
        for (String f : written(whole)) {
            assertArrayEquals(Files.readAllBytes(whole.resolve(f)), Files.readAllBytes(killed.resolve(f)), f);
        }
    }

    @Test
    void shouldRunNothingAgainWhenTheJournalIsComplete() throws IOException {
        Path out = dir.resolve("done");
        List<RunRow> first = tune(out, new Shard(2, 3), 2, RunPool.Progress.NONE);
        byte[] runs = Files.readAllBytes(out.resolve(CampaignOutput.RUNS));
        byte[] journal = Files.readAllBytes(out.resolve(RunJournal.FILE));
        assertEquals(4, first.size()); // jobs 1, 4, 7, 10 of 12 (Shard: job number modulo 3 is 1)
        List<RunRow> again = tune(out, new Shard(2, 3), 2, RunPool.Progress.NONE);
        assertEquals(first, again);
        assertArrayEquals(runs, Files.readAllBytes(out.resolve(CampaignOutput.RUNS)));
        assertArrayEquals(journal, Files.readAllBytes(out.resolve(RunJournal.FILE))); // nothing appended
    }

    @Test
    void shouldDropAFailingTailAndRefuseDamageBeforeGoodLines() throws IOException {
        Path whole = dir.resolve("whole");
        tune(whole, new Shard(1, 4), 1, RunPool.Progress.NONE);
        List<String> done = lines(whole);
        assertEquals(3, done.size()); // jobs 0, 4, 8
        // a last line whose check fails (a tail the disk never wrote: zeros) is dropped like a torn one
        Path tail = dir.resolve("tail");
        Files.createDirectories(tail);
        Files.writeString(tail.resolve(RunJournal.FILE), done.get(0) + "\n" + done.get(1) + "\n" + "\0".repeat(40) + "\n");
        try (RunJournal journal = RunJournal.open(tail, spec, new Shard(1, 4))) {
            assertEquals(2, journal.finished().size());
            assertEquals(41, journal.droppedOctets());
        }
        assertEquals(2, lines(tail).size()); // truncated to the good lines before appending
        // one changed digit in the middle of a line with good lines after it: damage, refused with the line
        Path damaged = dir.resolve("damaged");
        Files.createDirectories(damaged);
        String bad = done.get(1).replaceFirst(",(\\d)", ",9$1");
        Files.writeString(damaged.resolve(RunJournal.FILE), done.get(0) + "\n" + bad + "\n" + done.get(2) + "\n");
        IOException e = assertThrows(IOException.class, () -> RunJournal.open(damaged, spec, new Shard(1, 4)));
        assertTrue(e.getMessage().contains(RunJournal.FILE + ":2: damaged line"), e.getMessage());
    }

    @Test
    void shouldRefuseAJournalOfAnotherShardOrARunTwice() throws IOException {
        Path whole = dir.resolve("whole");
        tune(whole, new Shard(1, 4), 1, RunPool.Progress.NONE);
        List<String> done = lines(whole);
        IOException other = assertThrows(IOException.class, () -> RunJournal.open(whole, spec, new Shard(2, 4)));
        assertTrue(other.getMessage().contains(":1: run 0 of set 0 is not a run of shard 2/4"), other.getMessage());
        Path twice = dir.resolve("twice");
        Files.createDirectories(twice);
        Files.writeString(twice.resolve(RunJournal.FILE), done.get(0) + "\n" + done.get(1) + "\n" + done.get(0) + "\n");
        IOException e = assertThrows(IOException.class, () -> RunJournal.open(twice, spec, new Shard(1, 4)));
        assertTrue(e.getMessage().contains(":3: run 0 of set 0 appears twice"), e.getMessage());
    }

    @Test
    void shouldRefuseASecondWriterOfTheSameJournal() throws Exception {
        Path out = dir.resolve("held");
        Files.createDirectories(out);
        try (RunJournal first = RunJournal.open(out, spec, Shard.ALL)) {
            IOException same = assertThrows(IOException.class, () -> RunJournal.open(out, spec, Shard.ALL));
            assertTrue(same.getMessage().contains(RunJournal.FILE + ": another tune is writing this journal"),
                    same.getMessage());
        }
        // another process: a JVM of its own opens the journal and holds it until its standard input closes
        Process holder = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(), "-cp",
                System.getProperty("java.class.path"), JournalHolder.class.getName(), out.toString())
                .redirectErrorStream(true).start();
        try {
            String ready = new String(holder.getInputStream().readNBytes(JournalHolder.READY.length()),
                    StandardCharsets.UTF_8);
            assertEquals(JournalHolder.READY, ready);
            IOException other = assertThrows(IOException.class, () -> RunJournal.open(out, spec, Shard.ALL));
            assertTrue(other.getMessage().contains("another tune is writing this journal"), other.getMessage());
        } finally {
            holder.getOutputStream().close();
            assertEquals(0, holder.waitFor());
        }
        // the lock goes with its holder: the journal opens again, its runs intact
        try (RunJournal again = RunJournal.open(out, spec, Shard.ALL)) {
            assertEquals(0, again.droppedOctets());
        }
    }

    /** A second process for the test above: opens the journal in the folder given, says so, waits for its stdin to close. */
    public static final class JournalHolder {
        static final String READY = "holding\n";

        public static void main(String[] args) throws IOException {
            CampaignSpec spec = CampaignReader.parse(CampaignDeterminismTest.CAMPAIGN, "small.yaml", null);
            try (RunJournal journal = RunJournal.open(Path.of(args[0]), spec, Shard.ALL)) {
                System.out.print(READY);
                System.out.flush();
                while (System.in.read() >= 0) {
                    // held until the test closes the pipe
                }
            }
        }
    }

    /** The files of a finished folder, but the journal (its lines are in the order the runs finished). */
    private static List<String> written(Path out) throws IOException {
        try (Stream<Path> files = Files.list(out)) {
            List<String> names = files.map(p -> p.getFileName().toString())
                    .filter(n -> !n.equals(RunJournal.FILE)).sorted().toList();
            // runs.csv, sets.csv, summary.json, the charts, report.html, recommended.yaml/.table when recommended
            assertTrue(names.containsAll(Arrays.asList("runs.csv", "sets.csv", "summary.json", "report.html")), names.toString());
            return names;
        }
    }
}
