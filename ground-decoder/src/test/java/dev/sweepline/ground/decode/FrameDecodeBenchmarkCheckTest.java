package dev.sweepline.ground.decode;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.openjdk.jmh.infra.Blackhole;

/** The decode benchmark fails loudly when its input is broken (a benchmark that cannot lie). */
class FrameDecodeBenchmarkCheckTest {
    /** JMH lets a test make a Blackhole only with this acknowledgement (Blackhole's constructor). */
    private static final Blackhole HOLE = new Blackhole(
            "Today's password is swordfish. I understand instantiating Blackholes directly is dangerous.");

    @Test
    void shouldPassOnTheGoodStreamAndThrowWhenOneOctetIsFlipped() {
        FrameDecodeBenchmark bench = new FrameDecodeBenchmark();
        bench.build();
        // 8192 frames x 1016 data octets / 1107-octet packets = 7518 whole packets (ICD §1 frame of 1024)
        assertEquals(7518, bench.expectedSpectra);
        assertEquals(bench.expectedSpectra, bench.decodeStream(HOLE));

        bench.stream[FrameDecodeBenchmark.STREAM_OCTETS / 2] ^= 0x10; // one bit in a frame's data: its FECF fails
        IllegalStateException e = assertThrows(IllegalStateException.class, () -> bench.decodeStream(HOLE));
        assertTrue(e.getMessage().contains("1 bad"), e.getMessage());
    }
}
