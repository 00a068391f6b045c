package dev.sweepline.ground.decode;

import dev.sweepline.ground.spectrum.DecodedSpectrum;
import dev.sweepline.ground.spectrum.QuadrantDecompressor;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.infra.Blackhole;

/**
 * Whole-chain decode throughput: a stream of 1024-octet frames (ICD §1 default) carrying survey spectra
 * of 128 windows with raw compression (1107-octet packets, so most packets span two frames), fed in
 * 64 KiB chunks as the CLI reads a file; each spectrum is fully decoded (currents, edges).
 * MB/s of frames = {@link #STREAM_OCTETS} / (seconds per op) / 1e6; the score is in ms/op.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class FrameDecodeBenchmark {
    /** Frames in the stream: 8192 × (4 + 1024) octets = 8,421,376 octets. */
    static final int FRAMES = 8192;
    /** Octets of the whole stream, ASMs included. */
    public static final int STREAM_OCTETS = FRAMES * 1028;
    static final int CHUNK = 64 * 1024;

    byte[] stream;

    /** Builds the stream once, from a recorded seed. */
    @Setup(Level.Trial)
    public void build() {
        Random rnd = new Random(20261201L);
        FrameStreamBuilder b = new FrameStreamBuilder(1024);
        int seq = 0;
        while (b.frames().size() < FRAMES) {
            int c = 128;
            int[][] adc = new int[4][c];
            int[] gains = new int[c];
            for (int i = 0; i < c; i++) {
                gains[i] = rnd.nextInt(3);
                for (int q = 0; q < 4; q++) {
                    adc[q][i] = 256 + rnd.nextInt(60000);
                }
            }
            b.add(0, TestPackets.spectrum(0x100, seq & 0x3FFF, 0x7FE81780L + seq, 0, seq, 0, gains, new boolean[c], adc));
            seq++;
        }
        byte[] all = b.stream();
        stream = java.util.Arrays.copyOf(all, STREAM_OCTETS);
    }

    /** Decodes the whole stream; returns the spectra decoded. */
    @Benchmark
    public long decodeStream(Blackhole bh) {
        long[] spectra = {0};
        DecodeListener sink = new DecodeListener() {
            @Override
            public void onSpectrum(DecodedSpectrum s) {
                spectra[0]++;
                bh.consume(s);
            }
        };
        TelemetryDecoder d = new TelemetryDecoder(DecoderConfig.icdDefaults(), QuadrantDecompressor.UNAVAILABLE, sink);
        for (int p = 0; p < stream.length; p += CHUNK) {
            d.accept(stream, p, Math.min(CHUNK, stream.length - p));
        }
        d.finish();
        if (d.stats().framesGood() != FRAMES) {
            throw new IllegalStateException("decoded " + d.stats().framesGood() + " of " + FRAMES + " frames");
        }
        return spectra[0];
    }
}
