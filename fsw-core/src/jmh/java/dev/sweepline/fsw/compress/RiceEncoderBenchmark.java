package dev.sweepline.fsw.compress;

import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Throughput of the flight Rice encoder on one realistic survey spectrum: 128 energy-per-charge
 * windows x 4 collector quadrants of 16-bit samples, a smooth peak plus noise, J = 16, r = 32.
 *
 * <p>One operation is one raw input byte ({@link OperationsPerInvocation} = 1024 bytes), so the
 * score in ops/us is MB/s (10^6 bytes per second). Run with {@code -prof gc}: the per-call path must
 * show 0 B/op (architecture.md, allocation-free after start-up). The result is consumed by returning
 * the byte count, so the work cannot be removed.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class RiceEncoderBenchmark {
    private static final int WINDOWS = 128;
    private static final int QUADRANTS = 4;
    private static final int SAMPLES = WINDOWS * QUADRANTS;
    /** Raw size: 16-bit samples. */
    private static final int RAW_BYTES = SAMPLES * 2;
    /** Fixed seed so every run codes the same spectrum. */
    private static final long SEED = 42L;

    final int[] spectrum = new int[SAMPLES];
    private RiceEncoder encoder;
    private byte[] out;

    /** Builds the spectrum and the encoder once. */
    @Setup
    public void setUp() {
        Random random = new Random(SEED);
        for (int window = 0; window < WINDOWS; window++) {
            // a convected-Maxwellian-like peak over the windows on a small floor
            double u = (window - 52.0) / 9.0;
            double level = 600.0 + 38_000.0 * Math.exp(-0.5 * u * u);
            for (int quadrant = 0; quadrant < QUADRANTS; quadrant++) {
                double gain = 1.0 + 0.03 * (quadrant - 1.5);
                long value = Math.round(level * gain + random.nextGaussian() * (30.0 + 0.01 * level));
                spectrum[window * QUADRANTS + quadrant] = (int) Math.max(0, Math.min(65_535, value));
            }
        }
        // the ICD's parameters (telemetry ICD §4: n = 16, J = 8, r = 32 blocks, preprocessor on, basic options)
        encoder = new RiceEncoder(RiceParameters.of(16, 8, 32, true, false, false), SAMPLES);
        out = new byte[(int) encoder.maxEncodedBytes(SAMPLES)];
    }

    /** Encodes the spectrum; returns the compressed size, checked ({@link #check}). */
    @Benchmark
    @OperationsPerInvocation(RAW_BYTES)
    public int encodeSpectrum() {
        return check(encoder.encode(spectrum, 0, SAMPLES, out, 0));
    }

    /**
     * {@code coded}, or an exception when it is an encoder status (negative) or no smaller than the raw
     * samples: a smooth peak over a floor must compress (the run would otherwise time a failure).
     */
    static int check(int coded) {
        if (coded <= 0 || coded >= RAW_BYTES) {
            throw new IllegalStateException("encoder returned " + coded + " for " + RAW_BYTES + " raw octets");
        }
        return coded;
    }
}
