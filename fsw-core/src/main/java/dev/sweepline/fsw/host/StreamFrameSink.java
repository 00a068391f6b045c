package dev.sweepline.fsw.host;

import dev.sweepline.fsw.telemetry.FrameSink;
import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.net.Socket;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;

/**
 * Writes telemetry frames (ASM first) to a file or a TCP socket, as {@code sweepline-ground.jar
 * decode} reads them. A socket is flushed after every frame so the ground sees it at once.
 */
public final class StreamFrameSink implements FrameSink, AutoCloseable {
    private final OutputStream out;
    private final boolean flushEachFrame;
    private long frames;

    private StreamFrameSink(OutputStream out, boolean flushEachFrame) {
        this.out = out;
        this.flushEachFrame = flushEachFrame;
    }

    /**
     * Opens {@code spec}: {@code tcp:HOST:PORT} connects to a ground listener; anything else is a file path,
     * created new unless {@code overwrite}.
     *
     * @throws java.nio.file.FileAlreadyExistsException for an existing file without {@code overwrite}
     */
    public static StreamFrameSink open(String spec, boolean overwrite) throws IOException {
        if (spec.startsWith("tcp:")) {
            LinkAddress a = LinkAddress.parse(spec);
            Socket socket = new Socket(a.host(), a.port());
            socket.setTcpNoDelay(true);
            return new StreamFrameSink(new BufferedOutputStream(socket.getOutputStream(), 1 << 16), true);
        }
        return new StreamFrameSink(new BufferedOutputStream(overwrite ? Files.newOutputStream(Path.of(spec))
                : Files.newOutputStream(Path.of(spec), StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE), 1 << 16), false);
    }

    @Override
    public void accept(byte[] frame, int offset, int length) {
        try {
            out.write(frame, offset, length);
            if (flushEachFrame) {
                out.flush();
            }
            frames++;
        } catch (IOException e) {
            throw new UncheckedIOException("writing telemetry", e);
        }
    }

    /** Frames written. */
    public long frames() {
        return frames;
    }

    @Override
    public void close() throws IOException {
        out.close();
    }
}
