package dev.sweepline.fsw.sweep;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertThrows;

/** The allocation rule can fail: one 16-byte array every 100 steps is caught. */
class AllocationMeterTest {
    private static Object sink;

    @Test
    void shouldCatchOccasionalAllocation() {
        assertThrows(org.opentest4j.AssertionFailedError.class, () -> AllocationMeter.assertAllocationFree(steps -> {
            for (int k = 0; k < steps; k++) {
                if (k % 100 == 0) {
                    sink = new int[1];
                }
            }
        }));
    }
}
