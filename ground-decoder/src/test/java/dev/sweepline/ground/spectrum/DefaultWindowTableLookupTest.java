package dev.sweepline.ground.spectrum;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class DefaultWindowTableLookupTest {
    @Test
    void shouldFindTheWindowHoldingAVoltage() {
        for (int w = 0; w < DefaultWindowTable.WINDOWS; w++) {
            double centre = Math.sqrt(DefaultWindowTable.lowVolts(w) * DefaultWindowTable.highVolts(w));
            assertEquals(w, DefaultWindowTable.windowOf(centre), "window " + w);
            assertEquals(w, DefaultWindowTable.windowOf(DefaultWindowTable.lowVolts(w))); // edges belong up
        }
        // ICD §4/§8: the table spans about 49.3 V .. 6008 V calibrated; outside it there is no window
        assertEquals(-1, DefaultWindowTable.windowOf(10));
        assertEquals(-1, DefaultWindowTable.windowOf(7000));
        assertEquals(-1, DefaultWindowTable.windowOf(Double.NaN));
    }
}
