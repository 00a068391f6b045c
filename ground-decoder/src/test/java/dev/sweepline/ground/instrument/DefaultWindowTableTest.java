package dev.sweepline.ground.instrument;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class DefaultWindowTableTest {
    private final DefaultWindowTable demo = BuiltInInstruments.demoCup().windows();

    @Test
    void shouldHoldCodesOf50To6000Volts() {
        // ICD §4: 128 contiguous log-spaced windows, 50-6000 V; exact at the ends (codes 500 and 60000)
        assertEquals(500, demo.edgeCode(0));
        assertEquals(60000, demo.edgeCode(128));
        assertEquals(50.0, demo.tableVolts(0), 0.0);
        // python3 round(50*120**(127/128)/0.1)/10 = 5779.7
        assertEquals(5779.7, demo.tableVolts(127), 1e-9);
        assertEquals(Double.NaN, demo.lowVolts(128));
    }

    @Test
    void shouldApplyTheHvCalibrationOfIcd8() {
        // ICD §8: volts = 0.100150 V x code - 0.8 V; python3: 0.100150*500-0.8 = 49.275,
        // 0.100150*60000-0.8 = 6008.2, 0.100150*57797-0.8 = 5787.56955; 1e-9 V is float round-off
        assertEquals(49.275, demo.lowVolts(0), 1e-9);
        assertEquals(6008.2, demo.highVolts(127), 1e-9);
        assertEquals(5787.56955, demo.lowVolts(127), 1e-9);
    }

    @Test
    void shouldBeContiguousAndWithinHalfACodeOfTheFormula() {
        for (DefaultWindowTable t : new DefaultWindowTable[] {demo, InstrumentSet.builtIns().byName("fine-cup").windows()}) {
            double halfCode = 0.5 * t.tableVolts(0) / t.edgeCode(0); // half the nominal volts of one code
            for (int w = 0; w < t.windows() - 1; w++) {
                // high(w) = low(w+1) (ICD §4; FORMAT.md windows: contiguous)
                assertEquals(t.lowVolts(w + 1), t.highVolts(w), 0.0);
                // DAC rounding: at most half a code from low × (high/low)^(w/count) (FORMAT.md windows.spacing)
                assertTrue(Math.abs(t.tableVolts(w) - t.nominalEdgeVolts(w)) <= halfCode + 1e-9);
            }
        }
        // python3 50*120**(40/128) = 223.21025505699285 (the bare formula)
        assertEquals(223.21025505699285, demo.nominalEdgeVolts(40), 1e-9);
    }
}
