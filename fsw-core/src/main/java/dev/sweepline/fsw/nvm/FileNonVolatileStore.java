package dev.sweepline.fsw.nvm;

import dev.sweepline.fsw.command.NonVolatileStore;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;

/**
 * Non-volatile memory on a PC: one file per record. The table image is the named file itself; the
 * authentication record is the file with {@code .auth} appended. A write goes to
 * {@code <record>.tmp} beside it, which is forced to the device, moved over the old record
 * atomically, and then the directory is forced too, so that after a power loss the record is either
 * the old one or the new one, never empty (POSIX rename(2) and fsync(2): the rename is durable only
 * once the directory is synced). Temporary files left by a crash are removed at construction.
 * A host-side adapter: file I/O allocates, and runs only on a commit, an accepted command and at
 * start-up, never on the step path.
 */
public final class FileNonVolatileStore implements NonVolatileStore {
    /** Suffix of the authentication record's file. */
    public static final String AUTH_SUFFIX = ".auth";
    /** Suffix of a record's temporary file while it is written. */
    public static final String TEMP_SUFFIX = ".tmp";

    /** How a written file and its directory reach the device (a seam for tests). */
    interface Durability {
        /** Forces the data of an open file. */
        void forceFile(FileChannel channel) throws IOException;

        /** Forces a directory's entries (a rename into it). */
        void forceDirectory(Path directory) throws IOException;
    }

    /** fsync of the file, then of the directory (a no-op where a directory cannot be opened, e.g. Windows). */
    static final Durability FSYNC = new Durability() {
        @Override
        public void forceFile(FileChannel channel) throws IOException {
            channel.force(true);
        }

        @Override
        public void forceDirectory(Path directory) throws IOException {
            try (FileChannel dir = FileChannel.open(directory, StandardOpenOption.READ)) {
                dir.force(true);
            } catch (IOException | UnsupportedOperationException e) {
                if (System.getProperty("os.name", "").startsWith("Windows")) {
                    return; // NTFS: directories cannot be opened; the move is journalled
                }
                throw e;
            }
        }
    };

    private final Path file;
    private final Durability durability;
    private final int staleRemoved;

    /** A store kept in {@code file} (created on the first write); removes stale temporary files. */
    public FileNonVolatileStore(Path file) {
        this(file, FSYNC);
    }

    FileNonVolatileStore(Path file, Durability durability) {
        this.file = file.toAbsolutePath();
        this.durability = durability;
        this.staleRemoved = removeStaleTemporaries();
    }

    /** The table image file. */
    public Path file() {
        return file;
    }

    /** The file of {@code record}. */
    public Path fileOf(int record) {
        return record == RECORD_AUTH ? file.resolveSibling(file.getFileName() + AUTH_SUFFIX) : file;
    }

    /** Temporary files of a crashed write that the construction removed. */
    public int staleTemporariesRemoved() {
        return staleRemoved;
    }

    @Override
    public int read(int record, byte[] into) {
        Path f = fileOf(record);
        if (!Files.exists(f)) {
            return ABSENT;
        }
        try {
            byte[] content = Files.readAllBytes(f);
            if (content.length == 0) {
                return EMPTY;
            }
            if (content.length > into.length) {
                return TOO_LARGE;
            }
            System.arraycopy(content, 0, into, 0, content.length);
            return content.length;
        } catch (IOException e) {
            return IO_ERROR;
        }
    }

    @Override
    public int write(int record, byte[] from, int length) {
        Path target = fileOf(record);
        Path tmp = target.resolveSibling(target.getFileName() + TEMP_SUFFIX);
        try {
            try (FileChannel out = FileChannel.open(tmp, StandardOpenOption.CREATE, StandardOpenOption.WRITE,
                    StandardOpenOption.TRUNCATE_EXISTING)) {
                ByteBuffer data = ByteBuffer.wrap(from, 0, length);
                while (data.hasRemaining()) {
                    out.write(data);
                }
                durability.forceFile(out);
            }
            Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            durability.forceDirectory(target.getParent());
            return OK;
        } catch (IOException | UnsupportedOperationException e) {
            try {
                Files.deleteIfExists(tmp);
            } catch (IOException ignored) {
                // the next start-up removes it
            }
            return IO_ERROR;
        }
    }

    private int removeStaleTemporaries() {
        Path dir = file.getParent();
        if (dir == null || !Files.isDirectory(dir)) {
            return 0;
        }
        int removed = 0;
        String prefix = file.getFileName().toString();
        try (DirectoryStream<Path> entries = Files.newDirectoryStream(dir, p -> {
            String name = p.getFileName().toString();
            return name.startsWith(prefix) && name.endsWith(TEMP_SUFFIX);
        })) {
            for (Path p : entries) {
                Files.deleteIfExists(p);
                removed++;
            }
        } catch (IOException e) {
            return removed; // a stale file that cannot be removed is overwritten by the next write
        }
        return removed;
    }
}
