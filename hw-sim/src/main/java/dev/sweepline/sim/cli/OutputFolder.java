package dev.sweepline.sim.cli;

import dev.sweepline.fsw.host.CliException;
import dev.sweepline.fsw.host.CommandLines;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/** The {@code --out} folder of a command, made before any work is done: a place that cannot be one is one line. */
final class OutputFolder {
    private OutputFolder() {
    }

    /**
     * Creates {@code out} (and its parents) and checks it can be written.
     *
     * @throws CliException (an I/O error) naming {@code --out}, the path and why
     */
    static Path create(Path out) {
        if (Files.exists(out) && !Files.isDirectory(out)) {
            throw CliException.io("--out " + out + ": exists and is not a folder");
        }
        try {
            Files.createDirectories(out);
        } catch (IOException e) {
            throw CliException.io("--out " + out + ": cannot create the folder (" + CommandLines.located(e) + ")");
        }
        if (!Files.isWritable(out)) {
            throw CliException.io("--out " + out + ": the folder is not writable");
        }
        return out;
    }
}
