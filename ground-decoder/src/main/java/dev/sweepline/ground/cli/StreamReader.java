package dev.sweepline.ground.cli;

import dev.sweepline.ground.decode.TelemetryDecoder;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;

/** Feeds a file to a decoder in chunks. */
final class StreamReader {
    /** Read size, octets: large enough to amortise the calls, small enough to stay in cache. */
    static final int CHUNK_OCTETS = 64 * 1024;

    private StreamReader() {
    }

    /** Reads the whole file into the decoder and finishes it; returns octets read. */
    static long feed(Path file, TelemetryDecoder decoder) throws IOException {
        long total = 0;
        byte[] chunk = new byte[CHUNK_OCTETS];
        try (InputStream in = Files.newInputStream(file)) {
            for (int n = in.read(chunk); n >= 0; n = in.read(chunk)) {
                decoder.accept(chunk, 0, n);
                total += n;
            }
        }
        decoder.finish();
        return total;
    }
}
