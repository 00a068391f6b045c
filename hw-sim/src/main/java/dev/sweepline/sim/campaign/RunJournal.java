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
    private final List<RunRow> finished;
    private final long droppedOctets;

    private RunJournal(Path file, FileChannel channel, List<RunRow> finished, long droppedOctets) {
        this.file = file;
        this.channel = channel;
        this.finished = finished;
        this.droppedOctets = droppedOctets;
    }

    /**
     * Opens (or starts) the journal of {@code shard} of {@code spec} in {@code dir}, dropping a torn tail.
     *
     * @throws IOException naming the file and line: damaged, a run of another shard, a run twice; or naming the
     *                     file when another process (or this one) holds it open
     */
    public static RunJournal open(Path dir, CampaignSpec spec, Shard shard) throws IOException {
        Path file = dir.resolve(FILE);
        FileChannel channel = FileChannel.open(file, StandardOpenOption.CREATE, StandardOpenOption.READ,
                StandardOpenOption.WRITE);
        try {
            lock(file, channel);
            RunJournal journal = read(file, channel, spec, shard);
            channel = null; // the journal's now
            return journal;
        } finally {
            if (channel != null) {
                channel.close();
            }
        }
    }

    /** Takes the journal's exclusive lock, held until the channel closes. */
    private static void lock(Path file, FileChannel channel) throws IOException {
        FileLock lock;
        try {
            lock = channel.tryLock();
        } catch (OverlappingFileLockException e) {
            lock = null; // held by this very process
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
    private static RunJournal read(Path file, FileChannel channel, CampaignSpec spec, Shard shard) throws IOException {
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
        int lineNumber = 0;
        int start = 0;
        for (int end = indexOf(octets, start); end >= 0; start = end + 1, end = indexOf(octets, start)) {
            lineNumber++;
            String line = new String(octets, start, end - start, StandardCharsets.UTF_8);
            RunRow row = checked(line);
            if (row == null) {
                badLine = badLine == 0 ? lineNumber : badLine;
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
        return new RunJournal(file, channel, rows, octets.length - good);
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

    /** Appends {@code row} and forces it to the disk before returning. */
    public synchronized void append(RunRow row) throws IOException {
        String text = row.toCsv();
        ByteBuffer line = ByteBuffer.wrap((crc(text) + " " + text + "\n").getBytes(StandardCharsets.UTF_8));
        while (line.hasRemaining()) {
            channel.write(line);
        }
        channel.force(false);
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
