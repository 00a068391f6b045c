package dev.sweepline.ground.spectrum;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class DefaultWindowTableTest {
    @Test
    void shouldSpan50To6000Volts() {
        // ICD §4: 128 contiguous log-spaced windows, 50-6000 V; exact at the ends (codes 500 and 60000)
        assertEquals(50.0, DefaultWindowTable.lowVolts(0), 0.0);
        assertEquals(6000.0, DefaultWindowTable.highVolts(127), 0.0);
        // python3 round(50*120**(127/128)/0.1)/10 = 5779.7
        assertEquals(5779.7, DefaultWindowTable.lowVolts(127), 1e-9);
        assertEquals(Double.NaN, DefaultWindowTable.lowVolts(128));
    }

    @Test
    void shouldBeContiguousAndWithinHalfACodeOfTheFormula() {
        for (int w = 0; w < 128; w++) {
            // high(w) = low(w+1) (ICD §4)
            assertEquals(DefaultWindowTable.lowVolts(w + 1 == 128 ? 127 : w + 1),
                    w + 1 == 128 ? DefaultWindowTable.lowVolts(127) : DefaultWindowTable.highVolts(w), 0.0);
            // DAC rounding: at most half a 0.1 V code from 50 V x 120^(w/128) (ICD §4)
            assertTrue(Math.abs(DefaultWindowTable.lowVolts(w) - DefaultWindowTable.nominalEdgeVolts(w)) <= 0.05 + 1e-9);
        }
        // python3 50*120**(40/128) = 223.21025505699285 (the bare formula)
        assertEquals(223.21025505699285, DefaultWindowTable.nominalEdgeVolts(40), 1e-9);
    }
}
