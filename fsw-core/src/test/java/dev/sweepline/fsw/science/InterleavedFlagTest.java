package dev.sweepline.fsw.science;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.sweep.Spectrum;
import dev.sweepline.fsw.sweep.SpectrumFill;
import dev.sweepline.fsw.sweep.SweepMode;
import java.util.Arrays;
import org.junit.jupiter.api.Test;

/**
 * The spectrum packet's flags octet (telemetry ICD §4, offset 5): bit 7 stepped downward, bit 6 table changed,
 * bit 5 interleaved order, the others 0. The interleaved flag changes that octet alone; a sweep without it
 * keeps the octets it had before the flag existed.
 */
class InterleavedFlagTest {
    private static Spectrum focus(boolean ascending, boolean interleaved) {
        Spectrum s = new Spectrum(DemoCup.INSTRUMENT);
        SpectrumFill.begin(s, 9, SweepMode.FOCUS, 30, 16, ascending, 0);
        SpectrumFill.interleaved(s, interleaved);
        for (int i = 0; i < 16; i++) {
            SpectrumFill.store(s, i, 0, 0, 400 + i, 401 + i, 402 + i, 403 + i);
        }
        SpectrumFill.end(s, 1);
        return s;
    }

    @Test
    void shouldSetBitFiveForAnInterleavedSweepAndChangeNothingElse() {
        SpectrumPacker packer = new SpectrumPacker(true, DemoCup.INSTRUMENT);
        for (boolean ascending : new boolean[] {true, false}) {
            for (int tableFlag : new int[] {0, SpectrumLayout.FLAG_TABLE_CHANGED}) {
                byte[] plain = new byte[packer.maxUserDataLength()];
                byte[] inter = new byte[packer.maxUserDataLength()];
                int n = packer.write(focus(ascending, false), 4, 0x2222, tableFlag, plain, 0);
                int m = packer.write(focus(ascending, true), 4, 0x2222, tableFlag, inter, 0);
                int expected = (ascending ? 0 : 0x80) | tableFlag; // ICD §4: bit 7 stepped downward, bit 6 table changed
                assertEquals(expected, plain[SpectrumLayout.FLAGS_OFFSET] & 0xFF);
                assertEquals(expected | 0x20, inter[SpectrumLayout.FLAGS_OFFSET] & 0xFF); // ICD §4: bit 5 interleaved
                assertEquals(n, m);
                inter[SpectrumLayout.FLAGS_OFFSET] = plain[SpectrumLayout.FLAGS_OFFSET];
                assertArrayEquals(Arrays.copyOf(plain, n), Arrays.copyOf(inter, m));
            }
        }
    }

    @Test
    void shouldNotTakeTheInterleavedFlagFromTheCallersFlags() {
        // the flag is the spectrum's, as the stepped-downward one: a caller's bit 5 is not written
        SpectrumPacker packer = new SpectrumPacker(true, DemoCup.INSTRUMENT);
        byte[] out = new byte[packer.maxUserDataLength()];
        packer.write(focus(true, false), 4, 0, SpectrumLayout.FLAG_INTERLEAVED, out, 0);
        assertEquals(0, out[SpectrumLayout.FLAGS_OFFSET] & 0xFF);
    }
}
