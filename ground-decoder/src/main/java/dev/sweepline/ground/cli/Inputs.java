package dev.sweepline.ground.cli;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;

/** The input files of the commands: checked and read with one line naming the option, the file and why. */
final class Inputs {
    private Inputs() {
    }

    /** Checks the telemetry file can be read. */
    static void readable(Path input) {
        if (Files.isDirectory(input)) {
            throw new GroundFailure(ExitCodes.INPUT, input + ": is a folder, not a telemetry file");
        }
        if (!Files.exists(input)) {
            throw new GroundFailure(ExitCodes.INPUT, input + ": no such file");
        }
        if (!Files.isReadable(input)) {
            throw new GroundFailure(ExitCodes.INPUT, input + ": cannot read it (permission denied)");
        }
    }

    /** The octets of the file {@code option} names. */
    static byte[] read(String option, Path file) {
        if (Files.isDirectory(file)) {
            throw new GroundFailure(ExitCodes.INPUT, option + " " + file + ": is a folder, not a file");
        }
        try {
            return Files.readAllBytes(file);
        } catch (IOException e) {
            throw new GroundFailure(ExitCodes.INPUT, option + " " + file + ": " + reason(e));
        }
    }

    /** What went wrong with a file, in words. */
    static String reason(IOException e) {
        if (e instanceof NoSuchFileException) {
            return "no such file or directory";
        }
        if (e instanceof AccessDeniedException) {
            return "permission denied";
        }
        if (e instanceof FileSystemException f && f.getReason() != null) {
            return f.getReason();
        }
        return e.getMessage() != null ? e.getMessage() : e.getClass().getSimpleName();
    }
}
