package dev.sweepline.fsw.nvm;

import dev.sweepline.fsw.command.NonVolatileStore;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Arrays;

/**
 * Non-volatile memory on a PC: the table image in one file. A write goes to a temporary file beside
 * it and is then moved over the old one, so a crash mid-write leaves the old image (the CRC check at
 * restore catches anything else). A host-side adapter: file I/O allocates, and runs only on a table
 * commit and at start-up, never on the step path.
 */
public final class FileNonVolatileStore implements NonVolatileStore {
    /** {@link #read} / {@link #write} result: the file could not be read or written. */
    public static final int IO_ERROR = -1;
    /** {@link #read} result: the file is larger than the buffer (cannot be an image). */
    public static final int TOO_LARGE = -2;

    private final Path file;

    /** A store kept in {@code file} (created on the first write). */
    public FileNonVolatileStore(Path file) {
        this.file = file;
    }

    /** The file. */
    public Path file() {
        return file;
    }

    @Override
    public int read(byte[] into) {
        if (!Files.exists(file)) {
            return 0;
        }
        try {
            byte[] content = Files.readAllBytes(file);
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
    public int write(byte[] from, int length) {
        Path dir = file.toAbsolutePath().getParent();
        try {
            Path tmp = Files.createTempFile(dir, file.getFileName().toString(), ".tmp");
            Files.write(tmp, Arrays.copyOf(from, length));
            Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            return OK;
        } catch (IOException | UnsupportedOperationException e) {
            return IO_ERROR;
        }
    }
}
