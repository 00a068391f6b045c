package dev.sweepline.sim.telemetry;

import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.AuxCounters;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

/**
 * Compression study, speed half: each coder of {@link CompressionStudy#CODECS} codes every spectrum of the
 * simulated corpus ({@link SpectrumCorpus}: closed-loop runs of quiet-perihelion, fast-wind, shock-sheath),
 * one call per spectrum as the packet layer needs. The {@code inputOctets} aux counter is raw input octets
 * (2 per 16-bit sample) per microsecond, i.e. MB/s. Bits per sample are not a JMH score: {@link #setUp}
 * prints them (and, for the Rice coder, the whole {@link CompressionStudy} table, with the Rice size over
 * the entropy bound per scenario). Each invocation checks its coded size against a fresh coder's.
 *
 * <p>Targets (ours: the acceptance targets of the onboard coder; no standard sets them): Rice encode at
 * least 5x the speed of deflate level 1, no larger than deflate level 9,
 * within 8 % of the entropy bound.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class CompressionStudyBenchmark {
    /** The coder under test. */
    @Param({"rice", "deflate-1", "deflate-6", "deflate-9", "zstd-1", "zstd-3", "zstd-19"})
    public String codec;

    private static SpectrumCorpus corpus;
    private SpectrumCodec coder;
    private long rawOctets;
    private long expectedOctets;

    /** Input octets coded, counted per invocation: JMH reports them per microsecond (MB/s). */
    @State(Scope.Thread)
    @AuxCounters(AuxCounters.Type.OPERATIONS)
    public static class Octets {
        /** Raw input octets coded this iteration. */
        public long inputOctets;

        /** Starts each iteration from zero. */
        @Setup(Level.Iteration)
        public void reset() {
            inputOctets = 0;
        }
    }

    /** Simulates the corpus once per JVM, sets up the coder and prints its bits per sample. */
    @Setup(Level.Trial)
    public void setUp() {
        if (corpus == null) {
            corpus = SpectrumCorpus.simulate();
            System.out.print(CompressionStudy.table(corpus));
        }
        coder = SpectrumCodec.named(codec);
        rawOctets = 2 * corpus.samples();
        SpectrumCodec reference = SpectrumCodec.named(codec);
        expectedOctets = 0;
        for (int k = 0; k < corpus.size(); k++) {
            expectedOctets += reference.compress(corpus.quadrants(k), corpus.raw(k));
        }
        System.out.printf("%n%s: %.3f bits/sample on %d spectra%n", codec,
                CompressionStudy.bitsPerSample(corpus, codec, null), corpus.size());
    }

    /** Codes every spectrum of the corpus; returns the coded octets so the work stays observable. */
    @Benchmark
    public long codeCorpus(Octets octets) {
        long coded = 0;
        for (int k = 0; k < corpus.size(); k++) {
            coded += coder.compress(corpus.quadrants(k), corpus.raw(k));
        }
        octets.inputOctets += rawOctets;
        return check(coded, expectedOctets, rawOctets);
    }

    /**
     * {@code coded}, or an exception unless it is what a fresh coder of the same kind gave for the corpus
     * (a coder's output depends on its input alone) and smaller than the raw octets.
     */
    static long check(long coded, long expectedOctets, long rawOctets) {
        if (coded != expectedOctets || coded <= 0 || coded >= rawOctets) {
            throw new IllegalStateException("coded " + coded + " octets, expected " + expectedOctets + " of "
                    + rawOctets + " raw");
        }
        return coded;
    }
}
