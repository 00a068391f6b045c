package dev.sweepline.ground.instrument;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class InstrumentCurrentTest {
    @Test
    void shouldReadZeroAtThePedestalAndFullScaleAtTheTop() {
        GroundInstrument demo = BuiltInInstruments.demoCup();
        // ICD §4: pedestal 256 counts at zero current; (65535 - 256) LSB = FS; 1e-12 relative round-off
        assertEquals(0.0, demo.amps(256, 1), 0.0);
        assertEquals(1.28e-9, demo.amps(65535, 1), 1.28e-21);
        // python3: 1 * 40e-12 / 65279 = 6.127544845968841e-16 A per count on range 0
        assertEquals(6.127544845968841e-16, demo.lsbAmps(0), 6.1e-28);
        assertEquals(-256 * 6.127544845968841e-16, demo.amps(0, 0), 1e-27); // below the pedestal: negative
    }

    @Test
    void shouldUseTheFineCupsOwnAdcAndRanges() {
        GroundInstrument fine = InstrumentSet.builtIns().byName("fine-cup");
        // fine-cup.yaml: pedestal 1024 of a 20-bit ADC, range 1 full scale 80 pA × 256 = 20.48 nA
        assertEquals(0.0, fine.amps(1024, 0), 0.0);
        assertEquals(20.48e-9, fine.amps(1048575, 1), 20.48e-21);
        // python3 (2**19 - 1024) * 80e-12 / (2**20 - 1 - 1024) = 3.9960937462710645e-11 A
        assertEquals(3.9960937462710645e-11, fine.amps(1 << 19, 0), 4e-23);
    }
}
