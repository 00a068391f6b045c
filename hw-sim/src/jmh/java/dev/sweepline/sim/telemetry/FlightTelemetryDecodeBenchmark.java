package dev.sweepline.sim.telemetry;

import dev.sweepline.ground.decode.DecodeListener;
import dev.sweepline.ground.decode.DecodeStats;
import dev.sweepline.ground.decode.DecoderConfig;
import dev.sweepline.ground.decode.TelemetryDecoder;
import dev.sweepline.ground.spectrum.Ccsds121QuadrantDecoder;
import dev.sweepline.ground.spectrum.SpectrumView;
import dev.sweepline.sim.bench.BenchConfig;
import dev.sweepline.sim.bench.RunSummary;
import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.sim.bench.ClosedLoopBench;
import dev.sweepline.sim.scenario.ScenarioLoader;
import java.io.ByteArrayOutputStream;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.AuxCounters;
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
 * The ground decoder on the flight software's own telemetry: ten minutes of quiet-perihelion frames
 * with CCSDS 121 coded spectra (telemetry ICD §4, compression 0x01), decoded down to spectra in
 * amperes (frame sync, FECF, reassembly, Rice decoding) in the decoder's reused SpectrumView, without the fit. The {@code octets} counter
 * gives MB/s of frames (octets per microsecond). Each decode is checked: a bad frame, a spectrum error
 * or a spectrum fewer than the run sent throws, which fails the run.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
public class FlightTelemetryDecodeBenchmark {
    /** Read size of the ground's decode command (64 KiB). */
    private static final int CHUNK = 64 * 1024;
    byte[] stream;
    /** Survey and focus spectra the flight software sent: one per closed sweep of the run. */
    long expectedSurvey;
    long expectedFocus;

    /** Octets of frames decoded, reported per microsecond = MB/s. */
    @State(Scope.Thread)
    @AuxCounters(AuxCounters.Type.OPERATIONS)
    public static class Octets {
        /** Frame octets decoded. */
        public long octets;
    }

    /** Runs the closed loop once and keeps its frames and what it says it sent. */
    @Setup(Level.Trial)
    public void record() {
        ByteArrayOutputStream frames = new ByteArrayOutputStream();
        RunSummary run = ClosedLoopBench.run(BenchConfig.defaults(ScenarioLoader.builtIn("quiet-perihelion"), 20261201,
                600), ClosedLoopBench.Progress.NONE, frames::write).summary();
        stream = frames.toByteArray();
        expectedSurvey = run.sweepsByMode().getOrDefault(SweepMode.SURVEY, 0);
        expectedFocus = run.sweepsByMode().getOrDefault(SweepMode.FOCUS, 0);
    }

    /** Decodes the whole stream once and checks it ({@link #check}). */
    @Benchmark
    public long decode(Octets counter, Blackhole hole) {
        TelemetryDecoder d = decode(stream, hole);
        check(d.stats(), expectedSurvey, expectedFocus);
        counter.octets += stream.length;
        return d.stats().spectraSurvey() + d.stats().spectraFocus();
    }

    /** The ground's decode of {@code stream}, read in 64 KiB chunks as the decode command reads a file. */
    static TelemetryDecoder decode(byte[] stream, Blackhole hole) {
        TelemetryDecoder d = new TelemetryDecoder(DecoderConfig.icdDefaults(), new Ccsds121QuadrantDecoder(),
                new DecodeListener() {
                    @Override
                    public void onSpectrumView(SpectrumView s) {
                        hole.consume(s.totalAmps(s.windowCount() - 1)); // the reused spectrum: nothing allocated
                    }
                });
        for (int at = 0; at < stream.length; at += CHUNK) {
            d.accept(stream, at, Math.min(CHUNK, stream.length - at));
        }
        d.finish();
        return d;
    }

    /**
     * Throws unless the decode is clean: no bad frame, no spectrum error, and one spectrum per sweep the
     * flight software closed (each closed sweep is sent as one spectrum packet).
     */
    static void check(DecodeStats stats, long expectedSurvey, long expectedFocus) {
        long bad = stats.framesBad().values().stream().mapToLong(Long::longValue).sum();
        long errors = stats.spectrumErrors().values().stream().mapToLong(Long::longValue).sum();
        if (bad != 0 || errors != 0 || stats.spectraSurvey() != expectedSurvey || stats.spectraFocus() != expectedFocus
                || expectedFocus == 0) {
            throw new IllegalStateException(bad + " bad frames, " + errors + " spectrum errors, " + stats.spectraSurvey()
                    + " of " + expectedSurvey + " survey and " + stats.spectraFocus() + " of " + expectedFocus
                    + " focus spectra");
        }
    }
}
