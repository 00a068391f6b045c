package dev.sweepline.ground.spectrum;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class QuadrantCurrentTest {
    @Test
    void shouldGiveTheIcdFullScales() {
        // ICD §4: FS = 40 pA x 32^range: 40 pA, 1.28 nA, 40.96 nA; 1e-12 relative for double rounding
        assertEquals(40e-12, QuadrantCurrent.fullScaleAmps(0), 40e-24);
        assertEquals(1.28e-9, QuadrantCurrent.fullScaleAmps(1), 1.28e-21);
        assertEquals(40.96e-9, QuadrantCurrent.fullScaleAmps(2), 40.96e-21);
    }

    @Test
    void shouldReadZeroAtThePedestalAndFullScaleAtTheTop() {
        // ICD §4: pedestal 256 counts at zero current; (65535 - 256) LSB = FS
        assertEquals(0.0, QuadrantCurrent.amps(256, 1), 0.0);
        assertEquals(1.28e-9, QuadrantCurrent.amps(65535, 1), 1.28e-21);
        // python3: 1 * 40e-12 / 65279 = 6.127544845968841e-16 A per count on range 0
        assertEquals(6.127544845968841e-16, QuadrantCurrent.lsbAmps(0), 6.1e-28);
    }
}
