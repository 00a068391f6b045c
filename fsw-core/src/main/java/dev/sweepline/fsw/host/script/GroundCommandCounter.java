package dev.sweepline.fsw.host.script;

import dev.sweepline.fsw.command.NonVolatileStore;
import dev.sweepline.fsw.nvm.FileNonVolatileStore;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;

/**
 * The ground's authentication counter for the bench's sender (commands.md §7.3): the next sequence
 * number to sign with. In memory it starts at 1 each run; with a state file (the NVM file's name
 * plus {@value #SUFFIX}) it carries on across runs, so a restarted flight software, whose last
 * accepted number survived in its NVM, accepts the next run's commands. The file holds one line,
 * {@code next-auth-sequence N}, written durably before each number is used (a ground that crashes
 * may skip numbers, never reuse one).
 */
public final class GroundCommandCounter {
    /** Suffix of the ground state file beside the NVM file. */
    public static final String SUFFIX = ".ground";
    private static final String KEY = "next-auth-sequence ";

    private final FileNonVolatileStore file;
    private long next;

    private GroundCommandCounter(FileNonVolatileStore file, long next) {
        this.file = file;
        this.next = next;
    }

    /** A counter starting at 1, kept in memory only. */
    public static GroundCommandCounter inMemory() {
        return new GroundCommandCounter(null, 1);
    }

    /**
     * The counter kept beside {@code nvm} ({@code nvm + ".ground"}), starting at 1 when there is none.
     *
     * @throws ScriptException (line 0) when the file exists but cannot be read as a counter
     */
    public static GroundCommandCounter beside(Path nvm) throws ScriptException {
        Path state = nvm.toAbsolutePath().resolveSibling(nvm.getFileName() + SUFFIX);
        FileNonVolatileStore store = new FileNonVolatileStore(state);
        byte[] buf = new byte[64];
        int n = store.read(NonVolatileStore.RECORD_TABLE, buf);
        if (n == NonVolatileStore.ABSENT) {
            return new GroundCommandCounter(store, 1);
        }
        String text = n > 0 ? new String(buf, 0, n, StandardCharsets.US_ASCII).trim() : "";
        try {
            if (!text.startsWith(KEY)) {
                throw new NumberFormatException();
            }
            long v = Long.parseLong(text.substring(KEY.length()).trim());
            if (v < 1 || v > 0xFFFF_FFFEL) {
                throw new NumberFormatException();
            }
            return new GroundCommandCounter(store, v);
        } catch (NumberFormatException e) {
            throw new ScriptException(0, "ground counter file " + state + " is not '" + KEY + "N' (1..4294967294):"
                    + " restore it, or recover the flight software with AUTH_RECOVER (commands.md §1.4)");
        }
    }

    /** The number the next command will carry. */
    public long peek() {
        return next;
    }

    /**
     * Takes the next number, persisting the one after it first.
     *
     * @throws IllegalStateException when the state file cannot be written (the number is not used)
     */
    public long take() {
        long taken = next;
        if (file != null) {
            byte[] line = (KEY + (taken + 1) + "\n").getBytes(StandardCharsets.US_ASCII);
            if (file.write(NonVolatileStore.RECORD_TABLE, line, line.length) != NonVolatileStore.OK) {
                throw new IllegalStateException("cannot write the ground counter file " + file.file());
            }
        }
        next = taken + 1;
        return taken;
    }
}
