package dev.sweepline.sim.telemetry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

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
}
