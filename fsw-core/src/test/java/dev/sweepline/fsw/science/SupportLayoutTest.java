package dev.sweepline.fsw.science;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.octets.BigEndian;
import dev.sweepline.fsw.sweep.Spectrum;
import dev.sweepline.fsw.sweep.SpectrumFill;
import dev.sweepline.fsw.sweep.SweepMode;
import java.util.Arrays;
import org.junit.jupiter.api.Test;

/**
 * Spectrum layout 3 (telemetry ICD §4): a sweep with support windows writes 0x83 and, after the periods
 * at offset 16, the count b and b × (offset from f, periods); the rest is layout 2's, shifted by
 * 1 + 3 b octets. A sweep without support windows stays layout 2.
 */
class SupportLayoutTest {
    private static Spectrum focus(boolean support) {
        Spectrum s = new Spectrum(DemoCup.INSTRUMENT);
        SpectrumFill.begin(s, 7, SweepMode.FOCUS, 40, 20, true, 0);
        for (int i = 0; i < 20; i++) {
            SpectrumFill.store(s, i, i < 10 ? 0 : 1, 0, 300 + i, 301 + i, 302 + i, 303 + i);
        }
        if (support) {
            SpectrumFill.support(s, 0, 3, 52);
            SpectrumFill.support(s, 1, 9, 52);
            SpectrumFill.support(s, 2, 17, 52);
        }
        SpectrumFill.end(s, 1);
        return s;
    }

    @Test
    void shouldInsertTheSupportWindowsAfterTheDwellAndKeepTheRestOfLayoutTwo() {
        SpectrumPacker packer = new SpectrumPacker(true, DemoCup.INSTRUMENT);
        byte[] two = new byte[packer.maxUserDataLength()];
        byte[] three = new byte[packer.maxUserDataLength()];
        int n2 = packer.write(focus(false), 2, 0x1234, 0, two, 0);
        int n3 = packer.write(focus(true), 2, 0x1234, 0, three, 0);
        assertEquals(0x82, two[0] & 0xFF); // telemetry ICD §4: layout 2 without support windows
        assertEquals(0x83, three[0] & 0xFF); // §4: layout 3
        assertEquals(n2 + 1 + 3 * 3, n3); // §4: b (1) + b × 3 octets
        // octets 1..17 (instrument, mode, flags, sweep, table id, f, c, peak, periods) as layout 2
        assertArrayEquals(Arrays.copyOfRange(two, 1, 18), Arrays.copyOfRange(three, 1, 18));
        assertEquals(2, BigEndian.get16(three, 16)); // §4: the floor dwell at offset 16
        assertEquals(3, three[18]); // b
        assertEquals(3, three[19]); // offset from f of the first support window
        assertEquals(52, BigEndian.get16(three, 20)); // its periods
        assertEquals(9, three[22]);
        assertEquals(17, three[25]);
        assertEquals(52, BigEndian.get16(three, 26));
        // the variable part follows unchanged
        assertArrayEquals(Arrays.copyOfRange(two, 18, n2), Arrays.copyOfRange(three, 28, n3));
    }
}
