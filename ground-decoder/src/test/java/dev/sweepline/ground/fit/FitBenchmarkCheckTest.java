package dev.sweepline.ground.fit;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.junit.jupiter.api.Test;

/** The fit benchmark throws when a fit fails instead of timing failures. */
class FitBenchmarkCheckTest {
    @Test
    void shouldFitThePoolsAndThrowOnASpectrumThatCannotBeFitted() {
        FitBenchmark bench = new FitBenchmark();
        bench.build();
        for (int k = 0; k < FitBenchmark.POOL; k++) {
            assertTrue(bench.referenceProtons().ok());
            assertTrue(bench.nearSunFocusJoint().ok());
        }
        // break one input: every spectrum of the reference pool has no current at all
        double[] none = new double[ReferenceCase.currents().length];
        Arrays.fill(bench.reference, SpectrumInput.summed(ReferenceCase.low(), ReferenceCase.high(), none,
                ReferenceCase.SIGMA));
        assertThrows(IllegalStateException.class, bench::referenceProtons);
    }
}
