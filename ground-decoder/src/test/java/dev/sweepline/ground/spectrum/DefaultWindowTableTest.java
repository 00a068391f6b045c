package dev.sweepline.ground.spectrum;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class DefaultWindowTableTest {
    @Test
    void shouldHoldCodesOf50To6000Volts() {
        // ICD §4: 128 contiguous log-spaced windows, 50-6000 V; exact at the ends (codes 500 and 60000)
        assertEquals(500, DefaultWindowTable.dacCode(0));
        assertEquals(60000, DefaultWindowTable.dacCode(128));
        assertEquals(50.0, DefaultWindowTable.tableVolts(0), 0.0);
        // python3 round(50*120**(127/128)/0.1)/10 = 5779.7
        assertEquals(5779.7, DefaultWindowTable.tableVolts(127), 1e-9);
        assertEquals(Double.NaN, DefaultWindowTable.lowVolts(128));
    }

    @Test
    void shouldApplyTheHvCalibrationOfIcd8() {
        // ICD §8: volts = 0.100150 V x code - 0.8 V; python3: 0.100150*500-0.8 = 49.275,
        // 0.100150*60000-0.8 = 6008.2, 0.100150*57797-0.8 = 5787.56955; 1e-9 V is float round-off
        assertEquals(49.275, DefaultWindowTable.lowVolts(0), 1e-9);
        assertEquals(6008.2, DefaultWindowTable.highVolts(127), 1e-9);
        assertEquals(5787.56955, DefaultWindowTable.lowVolts(127), 1e-9);
    }

    @Test
    void shouldBeContiguousAndWithinHalfACodeOfTheFormula() {
        for (int w = 0; w < 127; w++) {
            // high(w) = low(w+1) (ICD §4)
            assertEquals(DefaultWindowTable.lowVolts(w + 1), DefaultWindowTable.highVolts(w), 0.0);
            // DAC rounding: at most half a 0.1 V code from 50 V x 120^(w/128) (ICD §4)
            assertTrue(Math.abs(DefaultWindowTable.tableVolts(w) - DefaultWindowTable.nominalEdgeVolts(w)) <= 0.05 + 1e-9);
        }
        // python3 50*120**(40/128) = 223.21025505699285 (the bare formula)
        assertEquals(223.21025505699285, DefaultWindowTable.nominalEdgeVolts(40), 1e-9);
    }
}
