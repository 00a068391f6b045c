package dev.sweepline.sim.telemetry;

import dev.sweepline.ground.decode.DecodeListener;
import dev.sweepline.ground.decode.DecoderConfig;
import dev.sweepline.ground.decode.TelemetryDecoder;
import dev.sweepline.ground.spectrum.Ccsds121QuadrantDecoder;
import dev.sweepline.ground.spectrum.DecodedSpectrum;
import dev.sweepline.sim.bench.BenchConfig;
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
 * amperes (frame sync, FECF, reassembly, Rice decoding), without the fit. The {@code octets} counter
 * gives MB/s of frames (octets per microsecond).
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
    private byte[] stream;

    /** Octets of frames decoded, reported per microsecond = MB/s. */
    @State(Scope.Thread)
    @AuxCounters(AuxCounters.Type.OPERATIONS)
    public static class Octets {
        /** Frame octets decoded. */
        public long octets;
    }

    /** Runs the closed loop once and keeps its frames. */
    @Setup(Level.Trial)
    public void record() {
        ByteArrayOutputStream frames = new ByteArrayOutputStream();
        ClosedLoopBench.run(BenchConfig.defaults(ScenarioLoader.builtIn("quiet-perihelion"), 20261201, 600),
                ClosedLoopBench.Progress.NONE, frames::write);
        stream = frames.toByteArray();
    }

    /** Decodes the whole stream once. */
    @Benchmark
    public void decode(Octets counter, Blackhole hole) {
        TelemetryDecoder d = new TelemetryDecoder(DecoderConfig.icdDefaults(), new Ccsds121QuadrantDecoder(),
                new DecodeListener() {
                    @Override
                    public void onSpectrum(DecodedSpectrum s) {
                        hole.consume(s);
                    }
                });
        for (int at = 0; at < stream.length; at += CHUNK) { // as the decode command reads a file
            d.accept(stream, at, Math.min(CHUNK, stream.length - at));
        }
        d.finish();
        counter.octets += stream.length;
    }
}
