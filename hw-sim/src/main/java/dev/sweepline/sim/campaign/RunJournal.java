package dev.sweepline.sim.campaign;

import java.io.Closeable;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.zip.CRC32;

/**
 * The runs of a shard as they finish, one line each, appended and forced to the disk before the next
 * ({@value #FILE}; campaigns/FORMAT.md, "Shards, merge and resuming"), so a killed {@code tune} loses at
 * most the runs in flight and a restarted one skips the finished ones.
 *
 * <p>A line is the CRC-32 (ISO-HDLC, {@link CRC32}) of the row's text as 8 hex digits, a space and the
 * row as in {@code runs.csv} ({@link RunRow#toCsv()}). On opening, a last line without its newline (the
 * write a kill cut short) is dropped and so are trailing lines that fail their check (a tail the disk
 * had not written); a failing line followed by good ones, or a row the shard does not own or has twice,
 * is a damaged journal and refused. Lines are in the order the runs finished, which depends on the
 * threads; {@code runs.csv} is written from them in job order once every run is in.
 *
 * <p>An append that fails (a full disk, a write error) truncates the journal back to the start of its line and
 * refuses every later one with the same failure, so the journal stays a run of whole lines however many workers
 * were still finishing runs: a re-run resumes every run forced before the failure.
 *
 * <p>One writer: the journal is held under an exclusive lock ({@link FileChannel#tryLock}) from its opening
 * to its closing, so a second {@code tune} on the same folder (an operator's slip, a job array's index used
 * twice, a process left running after its parent was killed) is refused at the start instead of writing the
 * same runs twice between the first one's lines.
 *
 * <p>Threading: {@link #append} may be called from many workers; it is synchronized.
 */
public final class RunJournal implements Closeable {
    /** The journal in a shard's output folder. */
    public static final String FILE = "runs.journal";
    private static final int CRC_DIGITS = 8;

    private final Path file;
    private final FileChannel channel;
    private final FileCalls calls;
    private final List<RunRow> finished;
    private final long droppedOctets;
    private final int droppedLines;
    /** Octets of whole lines in the file: where the next line starts. */
    private long end;
    /** The failure of an earlier append, after which none is made; null while every append went through. */
    private IOException failure;

    private RunJournal(Path file, FileChannel channel, FileCalls calls, List<RunRow> finished, long droppedOctets,
            int droppedLines) throws IOException {
        this.file = file;
        this.channel = channel;
        this.calls = calls;
        this.finished = finished;
        this.droppedOctets = droppedOctets;
        this.droppedLines = droppedLines;
        this.end = channel.position();
    }

    /**
     * The journal's calls on its file that a real disk can fail: the lock and the write of a line. Tests put
     * failing ones (a filesystem without locks, a write cut short).
     */
    interface FileCalls {
        /** The calls of {@link FileChannel} themselves. */
        FileCalls REAL = new FileCalls() { };

        /** {@link FileChannel#tryLock()}. */
        default FileLock tryLock(FileChannel channel) throws IOException {
            return channel.tryLock();
        }

        /** Writes all of {@code line} at the channel's position. */
        default void write(FileChannel channel, ByteBuffer line) throws IOException {
            while (line.hasRemaining()) {
                channel.write(line);
            }
        }
    }

    /**
     * The journal's file system takes no locks ({@link FileChannel#tryLock} failed with an error, such as
     * ENOLCK, "No locks available", fcntl(2), on some network file systems): an output that cannot be written
     * as a journal needs, not a damaged input.
     */
    public static final class LocksUnsupportedException extends IOException {
        private static final long serialVersionUID = 1L;

        public LocksUnsupportedException(Path file, IOException cause) {
            super(file + ": cannot lock the journal (" + cause.getMessage() + "): the folder's file system does not "
                    + "support locks (a network file system?); write --out to a local folder", cause);
        }
    }

    /**
     * Opens (or starts) the journal of {@code shard} of {@code spec} in {@code dir}, dropping a torn tail.
     *
     * @throws IOException naming the file and line: damaged, a run of another shard, a run twice; or naming the
     *                     file when another process (or this one) holds it open
     */
    public static RunJournal open(Path dir, CampaignSpec spec, Shard shard) throws IOException {
        return open(dir, spec, shard, FileCalls.REAL);
    }

    /** As {@link #open(Path, CampaignSpec, Shard)}, through {@code calls}. */
    static RunJournal open(Path dir, CampaignSpec spec, Shard shard, FileCalls calls) throws IOException {
        Path file = dir.resolve(FILE);
        FileChannel channel = FileChannel.open(file, StandardOpenOption.CREATE, StandardOpenOption.READ,
                StandardOpenOption.WRITE);
        try {
            lock(file, channel, calls);
            RunJournal journal = read(file, channel, calls, spec, shard);
            channel = null; // the journal's now
            return journal;
        } finally {
            if (channel != null) {
                channel.close();
            }
        }
    }

    /**
     * Takes the journal's exclusive lock, held until the channel closes.
     *
     * @throws LocksUnsupportedException when the file system refuses the lock with an error
     */
    private static void lock(Path file, FileChannel channel, FileCalls calls) throws IOException {
        FileLock lock;
        try {
            lock = calls.tryLock(channel);
        } catch (OverlappingFileLockException e) {
            lock = null; // held by this very process
        } catch (IOException e) {
            throw new LocksUnsupportedException(file, e);
        }
        if (lock == null) {
            throw new IOException(file + ": another tune is writing this journal (a second process on the same "
                    + "--out); let it finish or use another folder");
        }
    }

    /**
     * The journal's runs, read under its lock through the locked channel itself (closing any other descriptor
     * of the file would release this process's lock: POSIX record locks, fcntl(2)), its torn tail dropped.
     */
    private static RunJournal read(Path file, FileChannel channel, FileCalls calls, CampaignSpec spec, Shard shard)
            throws IOException {
        long size = channel.size();
        if (size > Integer.MAX_VALUE - 8) {
            throw new IOException(file + ": " + size + " octets, more than a journal can hold");
        }
        ByteBuffer all = ByteBuffer.allocate((int) size);
        while (all.hasRemaining() && channel.read(all, all.position()) >= 0) {
            // positional reads until the buffer is full
        }
        byte[] octets = Arrays.copyOf(all.array(), all.position());
        List<RunRow> rows = new ArrayList<>();
        Set<Long> jobs = new HashSet<>();
        long good = 0;
        int badLine = 0;
        int badLines = 0;
        int lineNumber = 0;
        int start = 0;
        for (int end = indexOf(octets, start); end >= 0; start = end + 1, end = indexOf(octets, start)) {
            lineNumber++;
            String line = new String(octets, start, end - start, StandardCharsets.UTF_8);
            RunRow row = checked(line);
            if (row == null) {
                badLine = badLine == 0 ? lineNumber : badLine;
                badLines++;
                continue;
            }
            if (badLine != 0) {
                throw new IOException(file + ":" + badLine + ": damaged line (check failed) before good ones; "
                        + "delete the file to run the shard again");
            }
            long job = (long) row.set() * spec.runsPerSet() + row.run();
            if (row.set() < 0 || row.set() >= spec.setCount() || row.run() < 0 || row.run() >= spec.runsPerSet()
                    || !shard.owns(job)) {
                throw new IOException(file + ":" + lineNumber + ": run " + row.run() + " of set " + row.set()
                        + " is not a run of shard " + shard + " of this campaign");
            }
            if (!jobs.add(job)) {
                throw new IOException(file + ":" + lineNumber + ": run " + row.run() + " of set " + row.set()
                        + " appears twice");
            }
            rows.add(row);
            good = end + 1L;
        }
        channel.truncate(good);
        channel.position(good);
        channel.force(true);
        int tornLine = start < octets.length ? 1 : 0; // a last line without its newline
        return new RunJournal(file, channel, calls, rows, octets.length - good, badLines + tornLine);
    }

    /** The row of a line, or null when its check fails or it does not parse. */
    private static RunRow checked(String line) {
        if (line.length() <= CRC_DIGITS + 1 || line.charAt(CRC_DIGITS) != ' ') {
            return null;
        }
        String text = line.substring(CRC_DIGITS + 1);
        if (!line.substring(0, CRC_DIGITS).equals(crc(text))) {
            return null;
        }
        try {
            return RunRow.parse(text);
        } catch (IllegalArgumentException e) {
            return null;
        }
    }

    private static String crc(String text) {
        CRC32 crc = new CRC32();
        crc.update(text.getBytes(StandardCharsets.UTF_8));
        return String.format(Locale.ROOT, "%08x", crc.getValue());
    }

    private static int indexOf(byte[] octets, int from) {
        for (int i = from; i < octets.length; i++) {
            if (octets[i] == '\n') {
                return i;
            }
        }
        return -1;
    }

    /** The runs finished before this opening, in the order they finished. */
    public List<RunRow> finished() {
        return List.copyOf(finished);
    }

    /** Octets of a torn or failing tail dropped on opening (0 for a clean journal). */
    public long droppedOctets() {
        return droppedOctets;
    }

    /** Lines of that tail: the trailing lines that failed their check and a last line without its newline. */
    public int droppedLines() {
        return droppedLines;
    }

    /**
     * Appends {@code row} and forces it to the disk before returning.
     *
     * @throws IOException when the line cannot be written or forced: the journal is truncated back to the
     *                     start of the line (as far as the file lets it) and every later append throws the
     *                     same failure, so the journal keeps the whole lines before it and nothing after
     */
    public synchronized void append(RunRow row) throws IOException {
        if (failure != null) {
            throw new IOException(failure.getMessage(), failure);
        }
        String text = row.toCsv();
        ByteBuffer line = ByteBuffer.wrap((crc(text) + " " + text + "\n").getBytes(StandardCharsets.UTF_8));
        try {
            calls.write(channel, line);
            channel.force(false);
            end = channel.position();
        } catch (IOException e) {
            failure = e;
            cutBack(e);
            throw e;
        }
    }

    /** Truncates the journal to its whole lines after a failed append; a failure of that is kept with {@code e}. */
    private void cutBack(IOException e) {
        try {
            channel.truncate(end);
            channel.position(end);
            channel.force(false);
        } catch (IOException again) {
            // the part line stays as the journal's last (no line follows it), dropped as torn on opening
            e.addSuppressed(again);
        }
    }

    /** The journal's file. */
    public Path file() {
        return file;
    }

    @Override
    public synchronized void close() throws IOException {
        channel.close();
    }
}
