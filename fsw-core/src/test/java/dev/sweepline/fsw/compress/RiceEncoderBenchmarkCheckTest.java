package dev.sweepline.fsw.compress;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The encoder benchmark throws on an encoder status instead of timing a failure. */
class RiceEncoderBenchmarkCheckTest {
    @Test
    void shouldPassTheSpectrumAndThrowWhenOneSampleIsOutOfRange() {
        RiceEncoderBenchmark bench = new RiceEncoderBenchmark();
        bench.setUp();
        assertTrue(bench.encodeSpectrum() > 0);
        bench.spectrum[17] = 1 << 16; // one sample beyond n = 16 bits: the encoder refuses it with a status
        assertThrows(IllegalStateException.class, bench::encodeSpectrum);
    }
}
