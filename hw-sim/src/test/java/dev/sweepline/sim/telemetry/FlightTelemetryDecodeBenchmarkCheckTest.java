package dev.sweepline.sim.telemetry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;

import org.junit.jupiter.api.Test;
import org.openjdk.jmh.infra.Blackhole;

/** The flight-telemetry decode benchmark fails when its input is broken, instead of timing a bad decode. */
class FlightTelemetryDecodeBenchmarkCheckTest {
    /** The acknowledgement JMH asks for before a Blackhole is made outside a benchmark (Blackhole's constructor). */
    private static final Blackhole HOLE = new Blackhole(
            "Today's password is swordfish. I understand instantiating Blackholes directly is dangerous.");

    @Test
    void shouldDecodeEveryRecordedSpectrumAndThrowWhenAFrameIsCut() {
        FlightTelemetryDecodeBenchmark bench = new FlightTelemetryDecodeBenchmark();
        bench.record();
        FlightTelemetryDecodeBenchmark.Octets octets = new FlightTelemetryDecodeBenchmark.Octets();
        assertEquals(bench.expectedSurvey + bench.expectedFocus, bench.decode(octets, HOLE));
        assertEquals(bench.stream.length, octets.octets);

        bench.stream[bench.stream.length / 3] ^= 0x01; // one bit of one frame: its FECF no longer checks
        assertThrows(IllegalStateException.class, () -> bench.decode(octets, HOLE));
    }

    @Test
    void shouldThrowWhenWholeFramesAreMissingThoughEveryFrameLeftIsGood() {
        FlightTelemetryDecodeBenchmark bench = new FlightTelemetryDecodeBenchmark();
        bench.record();
        // the last 20 frames of ASM + 1024 octets (ICD §1 default length) cut off at a frame boundary: no
        // bad frame and no spectrum error, only fewer spectra than the run sent
        int frame = 4 + 1024;
        assertEquals(0, bench.stream.length % frame, "the stream is whole frames");
        bench.stream = Arrays.copyOf(bench.stream, bench.stream.length - 20 * frame);
        IllegalStateException e = assertThrows(IllegalStateException.class,
                () -> bench.decode(new FlightTelemetryDecodeBenchmark.Octets(), HOLE));
        assertTrue(e.getMessage().startsWith("0 bad frames, 0 spectrum errors"), e.getMessage());
    }
}
