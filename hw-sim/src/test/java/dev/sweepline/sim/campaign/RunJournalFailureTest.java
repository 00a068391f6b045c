package dev.sweepline.sim.campaign;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.sim.bench.RunPool;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The journal (RunJournal) when its file fails under it, through its package-private {@link RunJournal.FileCalls}:
 * a write cut short by an error (EIO, ENOSPC: write(2) may write part of a buffer before failing) and a file
 * system that takes no locks (ENOLCK, fcntl(2)).
 */
class RunJournalFailureTest {
    @TempDir
    Path dir;

    private final CampaignSpec spec = CampaignReader.parse(CampaignDeterminismTest.CAMPAIGN, "small.yaml", null);

    /** Writes the {@code failing}-th line (1-based) half, then fails once, as a transient write error does. */
    private static RunJournal.FileCalls failingWrite(int failing) {
        AtomicInteger writes = new AtomicInteger();
        return new RunJournal.FileCalls() {
            @Override
            public void write(FileChannel channel, ByteBuffer line) throws IOException {
                if (writes.incrementAndGet() == failing) {
                    line.limit(line.limit() / 2);
                    RunJournal.FileCalls.super.write(channel, line);
                    throw new IOException("Input/output error");
                }
                RunJournal.FileCalls.super.write(channel, line);
            }
        };
    }

    /** The rows of shard 1/4 (jobs 0, 4, 8 of the 12; Shard), run once into {@code out}. */
    private List<RunRow> rows(Path out) throws IOException {
        Files.createDirectories(out);
        try (RunJournal journal = RunJournal.open(out, spec, new Shard(1, 4))) {
            return CampaignRunner.run(spec, 1, new Shard(1, 4), journal, RunPool.Progress.NONE);
        }
    }

    @Test
    void shouldCutAFailedLineBackAndRefuseTheAppendsAfterIt() throws IOException {
        List<RunRow> rows = rows(dir.resolve("whole"));
        byte[] first = Files.readAllLines(dir.resolve("whole").resolve(RunJournal.FILE)).get(0)
                .concat("\n").getBytes(StandardCharsets.UTF_8);
        Path out = dir.resolve("failed");
        Files.createDirectories(out);
        try (RunJournal journal = RunJournal.open(out, spec, new Shard(1, 4), failingWrite(2))) {
            journal.append(rows.get(0));
            IOException failed = assertThrows(IOException.class, () -> journal.append(rows.get(1)));
            // another worker finishing its run after the failure: refused with the same failure, nothing written
            IOException later = assertThrows(IOException.class, () -> journal.append(rows.get(2)));
            assertEquals(failed.getMessage(), later.getMessage());
        }
        // the journal is its first line alone: no half line, no line after one
        assertArrayEquals(first, Files.readAllBytes(out.resolve(RunJournal.FILE)));
        try (RunJournal again = RunJournal.open(out, spec, new Shard(1, 4))) {
            assertEquals(List.of(rows.get(0)), again.finished());
            assertEquals(0, again.droppedOctets());
        }
    }

    @Test
    void shouldResumeEveryJournalledRunAfterAFailedAppendOnTwoThreads() throws IOException {
        Path whole = dir.resolve("whole");
        Files.createDirectories(whole);
        List<RunRow> expected;
        try (RunJournal journal = RunJournal.open(whole, spec, Shard.ALL)) {
            expected = CampaignRunner.run(spec, 2, Shard.ALL, journal, RunPool.Progress.NONE);
        }
        Path out = dir.resolve("failed");
        Files.createDirectories(out);
        try (RunJournal journal = RunJournal.open(out, spec, Shard.ALL, failingWrite(5))) {
            IllegalStateException e = assertThrows(IllegalStateException.class,
                    () -> CampaignRunner.run(spec, 2, Shard.ALL, journal, RunPool.Progress.NONE));
            UncheckedIOException io = assertInstanceOf(UncheckedIOException.class, e.getCause());
            assertTrue(io.getMessage().startsWith(out.resolve(RunJournal.FILE)
                    + ": cannot append a finished run: Input/output error"), io.getMessage());
        }
        // whole lines only (4 before the failure; the worker that was still running appended nothing), resumed
        try (RunJournal journal = RunJournal.open(out, spec, Shard.ALL)) {
            assertEquals(4, journal.finished().size());
            assertEquals(0, journal.droppedOctets());
            assertEquals(expected, CampaignRunner.run(spec, 2, Shard.ALL, journal, RunPool.Progress.NONE));
        }
    }

    @Test
    void shouldSayHowManyTrailingLinesItDropped() throws IOException {
        rows(dir.resolve("whole"));
        List<String> done = Files.readAllLines(dir.resolve("whole").resolve(RunJournal.FILE));
        Path out = dir.resolve("tail");
        Files.createDirectories(out);
        // two lines the disk never wrote (zeros, a changed digit) and one cut short, after one good line
        String tail = "\0".repeat(40) + "\n" + done.get(1).replaceFirst(",(\\d)", ",9$1") + "\n"
                + done.get(2).substring(0, 30);
        Files.writeString(out.resolve(RunJournal.FILE), done.get(0) + "\n" + tail);
        try (RunJournal journal = RunJournal.open(out, spec, new Shard(1, 4))) {
            assertEquals(1, journal.finished().size());
            assertEquals(3, journal.droppedLines());
            assertEquals(tail.getBytes(StandardCharsets.UTF_8).length, journal.droppedOctets());
        }
    }

    @Test
    void shouldNameAFileSystemWithoutLocks() throws IOException {
        Path out = dir.resolve("nolocks");
        Files.createDirectories(out);
        RunJournal.FileCalls noLocks = new RunJournal.FileCalls() {
            @Override
            public FileLock tryLock(FileChannel channel) throws IOException {
                throw new IOException("No locks available"); // strerror(ENOLCK), glibc
            }
        };
        IOException e = assertThrows(IOException.class, () -> RunJournal.open(out, spec, Shard.ALL, noLocks));
        assertInstanceOf(RunJournal.LocksUnsupportedException.class, e);
        assertTrue(e.getMessage().startsWith(out.resolve(RunJournal.FILE) + ": cannot lock the journal (No locks "
                + "available): the folder's file system does not support locks"), e.getMessage());
        assertTrue(e.getMessage().contains("local folder"), e.getMessage());
        // the channel was closed: the journal opens on a file system that locks
        try (RunJournal journal = RunJournal.open(out, spec, Shard.ALL)) {
            assertEquals(0, journal.finished().size());
        }
    }
}
