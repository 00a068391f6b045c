package dev.sweepline.ground.instrument;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class DefaultWindowTableLookupTest {
    @Test
    void shouldFindTheWindowHoldingAVoltage() {
        for (GroundInstrument i : InstrumentSet.builtIns().all()) {
            DefaultWindowTable t = i.windows();
            for (int w = 0; w < t.windows(); w++) {
                double centre = Math.sqrt(t.lowVolts(w) * t.highVolts(w));
                assertEquals(w, t.windowOf(centre), i.name() + " window " + w);
                assertEquals(w, t.windowOf(t.lowVolts(w))); // edges belong up
            }
        }
        // ICD §4/§8: the demo table spans about 49.3 V .. 6008 V calibrated; outside it there is no window
        DefaultWindowTable demo = BuiltInInstruments.demoCup().windows();
        assertEquals(-1, demo.windowOf(10));
        assertEquals(-1, demo.windowOf(7000));
        assertEquals(-1, demo.windowOf(demo.highVolts(127))); // the top edge belongs to no window
        assertEquals(-1, demo.windowOf(Double.NaN));
    }
}
