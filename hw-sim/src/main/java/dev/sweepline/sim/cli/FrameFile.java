package dev.sweepline.sim.cli;

import dev.sweepline.fsw.telemetry.FrameSink;
import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;

/** Writes the telemetry frames (ASM first, as the ground station receives them) to a file. */
final class FrameFile implements FrameSink, AutoCloseable {
    private final Path path;
    private final OutputStream out;

    FrameFile(Path path) throws IOException {
        this.path = path;
        this.out = new BufferedOutputStream(Files.newOutputStream(path), 1 << 16);
    }

    @Override
    public void accept(byte[] frame, int offset, int length) {
        try {
            out.write(frame, offset, length);
        } catch (IOException e) {
            throw new UncheckedIOException("writing " + path, e);
        }
    }

    @Override
    public void close() throws IOException {
        out.close();
    }
}
