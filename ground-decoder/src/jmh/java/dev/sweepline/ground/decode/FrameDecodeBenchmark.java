package dev.sweepline.ground.decode;

import dev.sweepline.ground.spectrum.SpectrumView;
import dev.sweepline.ground.spectrum.QuadrantDecompressor;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.infra.Blackhole;

/**
 * Whole-chain decode throughput: a stream of 1024-octet frames (ICD §1 default) carrying survey spectra
 * of 128 windows with raw compression (1107-octet packets, so most packets span two frames), fed in
 * 64 KiB chunks as the CLI reads a file; each spectrum is fully decoded (currents, edges). The score is
 * octets of frames per microsecond, i.e. MB/s (one operation per stream octet). Each invocation checks
 * its result ({@link #check}): every frame good, every spectrum decoded without error, none lost; a
 * wrong result throws, which fails the run.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
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
    /** Spectrum packets whose last octet lies in the stream: the spectra a correct decode yields. */
    long expectedSpectra;

    /** Builds the stream once, from a recorded seed. */
    @Setup(Level.Trial)
    public void build() {
        Random rnd = new Random(20261201L);
        FrameStreamBuilder b = new FrameStreamBuilder(1024);
        int seq = 0;
        int packetOctets = 0;
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
            byte[] packet = TestPackets.spectrum(0x100, seq & 0x3FFF, 0x7FE81780L + seq, 0, seq, 0, gains, new boolean[c], adc);
            packetOctets = packet.length;
            b.add(0, packet);
            seq++;
        }
        byte[] all = b.stream();
        stream = java.util.Arrays.copyOf(all, STREAM_OCTETS);
        // packets of one length fill the frames' data fields back to back (1024 - 6 header - 2 FECF = 1016
        // octets each, ICD §1): those wholly inside the kept frames must decode
        expectedSpectra = (long) FRAMES * (1024 - 8) / packetOctets;
    }

    /** Decodes the whole stream; returns the spectra decoded. */
    @Benchmark
    @OperationsPerInvocation(STREAM_OCTETS)
    public long decodeStream(Blackhole bh) {
        DecodeStats stats = decode(stream, bh);
        check(stats, expectedSpectra);
        return stats.spectraSurvey();
    }

    /** The whole chain over {@code stream} in 64 KiB chunks; every spectrum goes to {@code bh}. */
    static DecodeStats decode(byte[] stream, Blackhole bh) {
        DecodeListener sink = new DecodeListener() {
            @Override
            public void onSpectrumView(SpectrumView s) {
                bh.consume(s.totalAmps(s.windowCount() - 1)); // the reused spectrum: nothing allocated
            }
        };
        TelemetryDecoder d = new TelemetryDecoder(DecoderConfig.icdDefaults(), QuadrantDecompressor.UNAVAILABLE, sink);
        for (int p = 0; p < stream.length; p += CHUNK) {
            d.accept(stream, p, Math.min(CHUNK, stream.length - p));
        }
        d.finish();
        return d.stats();
    }

    /** Throws unless every frame was good and every expected spectrum decoded without error. */
    static void check(DecodeStats stats, long expectedSpectra) {
        long bad = stats.framesBad().values().stream().mapToLong(Long::longValue).sum();
        long errors = stats.spectrumErrors().values().stream().mapToLong(Long::longValue).sum();
        if (stats.framesGood() != FRAMES || bad != 0 || errors != 0 || stats.spectraSurvey() != expectedSpectra) {
            throw new IllegalStateException("decoded " + stats.framesGood() + " of " + FRAMES + " frames good, " + bad
                    + " bad, " + stats.spectraSurvey() + " of " + expectedSpectra + " spectra, " + errors
                    + " spectrum errors");
        }
    }
}
