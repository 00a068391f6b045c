package dev.sweepline.ground.rice;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class SecondExtensionTest {

    @Test
    void shouldInvertThePairCodeForEveryPairUpToALargeSum() {
        // gamma = (a+b)(a+b+1)/2 + b (standards.md, second extension) is a bijection; invert it exactly
        for (long a = 0; a < 300; a++) {
            for (long b = 0; b < 300; b++) {
                long gamma = (a + b) * (a + b + 1) / 2 + b;
                long sum = SecondExtension.pairSum(gamma);
                assertEquals(a + b, sum);
                assertEquals(b, gamma - SecondExtension.triangle(sum));
            }
        }
        // near 2^62, where the double square root is no longer exact
        long s = 3_037_000_000L;
        assertEquals(s, SecondExtension.pairSum(SecondExtension.triangle(s)));
        assertEquals(s - 1, SecondExtension.pairSum(SecondExtension.triangle(s) - 1));
    }

    @Test
    void shouldUndoTheMapperAtBothEndsOfTheRange() {
        long max = 255; // n = 8: x_max = 2^8 - 1 (CCSDS 121.0-B unsigned samples)
        for (long prev = 0; prev <= max; prev++) {
            for (long x = 0; x <= max; x++) {
                long delta = x - prev;
                long theta = Math.min(prev, max - prev);
                // the mapper of standards.md, written out here independently of any encoder
                long mappedValue = delta >= 0 && delta <= theta ? 2 * delta
                        : delta < 0 && -delta <= theta ? -2 * delta - 1 : theta + Math.abs(delta);
                assertEquals(x, UnitDelayReconstructor.sample(mappedValue, prev, max));
            }
        }
        assertEquals(UnitDelayReconstructor.INVALID, UnitDelayReconstructor.sample(256, 7, max));
    }
}
