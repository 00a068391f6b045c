package dev.sweepline.ground.decode;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
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

    @Test
    void shouldThrowWhenASpectrumFailsInGoodFrames() {
        FrameDecodeBenchmark bench = new FrameDecodeBenchmark();
        bench.build();
        // the compression octet of the first spectrum (raw, 0x00) set to 0x01 with the frame's FECF made good
        // again: every frame checks, and the spectrum asks for the CCSDS 121 decoder the benchmark leaves out
        // (first frame: ASM 4, frame header 6, packet header 6, CUC 6, fixed fields 14, 32 + 16 tag octets; ICD §4)
        int at = 4 + 6 + 6 + 6 + 14 + 32 + 16;
        assertEquals(0, bench.stream[at]);
        bench.stream[at] = 0x01;
        byte[] frame = Arrays.copyOfRange(bench.stream, 4, 4 + 1024);
        System.arraycopy(FrameStreamBuilder.withFecf(frame), 0, bench.stream, 4, 1024);
        IllegalStateException e = assertThrows(IllegalStateException.class, () -> bench.decodeStream(HOLE));
        assertTrue(e.getMessage().contains("0 bad") && e.getMessage().endsWith("1 spectrum errors"), e.getMessage());
    }
}
