package dev.sweepline.sim.telemetry;

import com.github.luben.zstd.ZstdCompressCtx;
import dev.sweepline.fsw.compress.RiceEncoder;
import dev.sweepline.fsw.compress.RiceParameters;
import java.util.zip.Deflater;

/**
 * One coder of the compression study, applied to one spectrum at a time as a packet must be (each
 * spectrum packet is decodable alone, telemetry ICD §4). Implementations keep their state and buffers
 * across calls, as a flight or ground implementation would.
 */
public interface SpectrumCodec {
    /** Octets the coded spectrum takes; {@code quadrants} and {@code raw} are the same samples. */
    int compress(int[][] quadrants, byte[] raw);

    /** The coder named {@code rice}, {@code deflate-L} or {@code zstd-L} (L the level). */
    static SpectrumCodec named(String name) {
        if (name.equals("rice")) {
            return new Rice();
        }
        int dash = name.indexOf('-');
        int level = Integer.parseInt(name.substring(dash + 1));
        switch (name.substring(0, dash)) {
            case "deflate":
                return new Deflate(level);
            case "zstd":
                return new Zstd(level);
            default:
                throw new IllegalArgumentException("unknown codec " + name);
        }
    }

    /**
     * fsw-core's CCSDS 121 coder with the ICD parameters (n = 16, J = 8, r = 32 blocks, preprocessor on,
     * basic option set), one stream per quadrant, each zero-filled to an octet (telemetry ICD §4).
     */
    final class Rice implements SpectrumCodec {
        private final RiceEncoder encoder = new RiceEncoder(RiceParameters.of(16, 8, 32, true, false, false), 256);
        private final byte[] out = new byte[(int) encoder.maxEncodedBytes(256)];

        @Override
        public int compress(int[][] quadrants, byte[] raw) {
            int total = 0;
            for (int[] stream : quadrants) {
                int n = encoder.encode(stream, 0, stream.length, out, 0);
                if (n < 0) {
                    throw new IllegalStateException("encoder status " + n);
                }
                total += n;
            }
            return total;
        }
    }

    /** java.util.zip raw deflate (RFC 1951, no zlib header or checksum: the fairest size), one call per spectrum. */
    final class Deflate implements SpectrumCodec {
        private final Deflater deflater;
        private final byte[] out = new byte[4096];

        Deflate(int level) {
            deflater = new Deflater(level, true);
        }

        @Override
        public int compress(int[][] quadrants, byte[] raw) {
            deflater.reset();
            deflater.setInput(raw);
            deflater.finish();
            int n = deflater.deflate(out);
            if (!deflater.finished()) {
                throw new IllegalStateException("deflate output buffer too small");
            }
            return n;
        }
    }

    /** zstd-jni, one frame per spectrum (frame header without checksum, content size on: the library default). */
    final class Zstd implements SpectrumCodec {
        private final ZstdCompressCtx ctx = new ZstdCompressCtx();
        private final byte[] out = new byte[4096];

        Zstd(int level) {
            ctx.setLevel(level);
        }

        @Override
        public int compress(int[][] quadrants, byte[] raw) {
            return ctx.compressByteArray(out, 0, out.length, raw, 0, raw.length);
        }
    }
}
