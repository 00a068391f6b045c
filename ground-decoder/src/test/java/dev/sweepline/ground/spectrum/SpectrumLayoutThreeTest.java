package dev.sweepline.ground.spectrum;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.decode.GoldenSpectraV2;
import dev.sweepline.ground.decode.Hex;
import dev.sweepline.ground.fit.NoiseModel;
import dev.sweepline.ground.fit.SpectrumInput;
import java.util.Arrays;
import org.junit.jupiter.api.Test;

/**
 * Layout-3 spectrum packets (telemetry ICD §4): layout 2 with, after the integration periods at offset
 * 16, the support window count b and b × (offset from f, periods). Made here from the golden layout-2
 * packet {@link GoldenSpectraV2#DEMO_V2} by the ICD's rule (first octet 0x83, the entries inserted, the
 * packet length field adjusted), so every other field is the golden one's.
 */
class SpectrumLayoutThreeTest {
    /** User data starts after the primary header (6) and the CUC time (6), ICD §3. */
    private static final int USER_DATA = 12;

    private final SpectrumPacketDecoder decoder = new SpectrumPacketDecoder(new Ccsds121QuadrantDecoder());

    /** {@link GoldenSpectraV2#DEMO_V2} as layout 3 with support windows {@code entries} = offset, periods, ... */
    static byte[] layoutThree(int count, int... entries) {
        byte[] two = Hex.bytes(GoldenSpectraV2.DEMO_V2);
        int insert = USER_DATA + 18;
        byte[] support = new byte[1 + entries.length / 2 * 3];
        support[0] = (byte) count;
        for (int k = 0; k < entries.length / 2; k++) {
            support[1 + 3 * k] = (byte) entries[2 * k];
            support[2 + 3 * k] = (byte) (entries[2 * k + 1] >> 8);
            support[3 + 3 * k] = (byte) entries[2 * k + 1];
        }
        byte[] p = new byte[two.length + support.length];
        System.arraycopy(two, 0, p, 0, insert);
        System.arraycopy(support, 0, p, insert, support.length);
        System.arraycopy(two, insert, p, insert + support.length, two.length - insert);
        p[USER_DATA] = (byte) 0x83;
        int length = p.length - 7; // CCSDS 133.0-B-2 §4.1.3.5: the packet data length is octets − 1 after the 6 of the header
        p[4] = (byte) (length >> 8);
        p[5] = (byte) length;
        return p;
    }

    private SpectrumResult decode(byte[] p) {
        return decoder.decode(p, 0, p.length);
    }

    @Test
    void shouldDecodeEachWindowsDwellAndTheRestAsLayoutTwo() {
        SpectrumResult two = decode(Hex.bytes(GoldenSpectraV2.DEMO_V2));
        SpectrumResult r = decode(layoutThree(2, 1, 40, 2, 300));
        assertTrue(r.isOk(), r.detail());
        DecodedSpectrum s = r.spectrum();
        assertEquals(3, s.layoutVersion());
        assertEquals(8, s.integrationPeriods()); // GoldenSpectraV2.DEMO_V2: 8 periods, here the floor
        assertArrayEquals(new int[] {8, 40, 300, 8}, s.windowPeriods()); // windows 60..63
        assertEquals(300, s.integrationPeriods(2));
        DecodedSpectrum t = two.spectrum();
        assertArrayEquals(new int[] {8, 8, 8, 8}, t.windowPeriods()); // layout 2: one dwell
        assertArrayEquals(t.gainRange(), s.gainRange());
        assertArrayEquals(t.saturated(), s.saturated());
        assertArrayEquals(t.totalAmps(), s.totalAmps());
        assertArrayEquals(t.lowVolts(), s.lowVolts());
        assertEquals(t.firstWindow(), s.firstWindow());
        assertEquals(t.sweep(), s.sweep());
        assertTrue(s.steppedDown());
    }

    @Test
    void shouldWeightEachWindowByItsOwnDwell() {
        DecodedSpectrum s = decode(layoutThree(2, 1, 40, 2, 300)).spectrum();
        SpectrumInput in = SpectrumInput.of(s);
        NoiseModel noise = new NoiseModel(s.instrument());
        assertEquals(3, in.windows()); // window 63 is saturated (GoldenSpectraV2.DEMO_V2) and left out
        int[] periods = {8, 40, 300};
        for (int i = 0; i < 3; i++) {
            double var = 0;
            for (int q = 0; q < DecodedSpectrum.QUADRANTS; q++) {
                double v = noise.quadrantVariance(s.currentAmps()[q][i], s.gainRange()[i], periods[i]);
                assertEquals(Math.sqrt(v), in.quadrantSigmaAmps()[q][i], 1e-12 * Math.sqrt(v));
                var += v;
            }
            assertEquals(Math.sqrt(var), in.sigmaAmps()[i], 1e-12 * Math.sqrt(var));
        }
        // a longer dwell is a smaller noise: the noise model's bandwidth is 1/(2 T) (ICD §8)
        double eight = noise.quadrantVariance(s.currentAmps()[0][1], s.gainRange()[1], 8);
        assertTrue(in.quadrantSigmaAmps()[0][1] < Math.sqrt(eight));
    }

    @Test
    void shouldRefuseDamagedSupportWindowsAndDecodeTheNextSpectrum() {
        byte[][] bad = {
            layoutThree(0), // b = 0
            layoutThree(7, 0, 9, 1, 9, 2, 9, 3, 9, 4, 9, 5, 9, 6, 9), // b = 7 > 6 (ICD §4: paired support, 2 x 3)
            layoutThree(1, 4, 9), // offset 4 beyond c = 4
            layoutThree(2, 2, 9, 1, 9), // not ascending
            layoutThree(2, 1, 9, 1, 9), // a repeat
            layoutThree(1, 1, 0), // 0 periods
        };
        for (byte[] p : bad) {
            SpectrumResult r = decode(p);
            assertFalse(r.isOk());
            assertEquals(SpectrumError.BAD_SUPPORT_WINDOWS, r.error(), r.detail());
            assertFalse(r.detail().isEmpty());
            // the next spectrum decodes as usual
            assertTrue(decode(layoutThree(1, 3, 9)).isOk());
        }
        // b = 4, more than the three support points of unpaired support, is a valid layout 3 (ICD §4: b 1..6)
        SpectrumResult fourSupports = decode(layoutThree(4, 0, 9, 1, 9, 2, 9, 3, 9));
        assertTrue(fourSupports.isOk(), fourSupports.detail());
        assertArrayEquals(new int[] {9, 9, 9, 9}, fourSupports.spectrum().windowPeriods()); // every window a support window of 9 periods
        // the floor dwell at offset 16 of 0 periods
        byte[] zeroFloor = layoutThree(1, 1, 9);
        zeroFloor[USER_DATA + 16] = 0;
        zeroFloor[USER_DATA + 17] = 0;
        assertEquals(SpectrumError.BAD_SUPPORT_WINDOWS, decode(zeroFloor).error());
        // cut inside the support entries
        byte[] cut = Arrays.copyOf(layoutThree(3, 0, 9, 1, 9, 2, 9), USER_DATA + 22);
        assertEquals(SpectrumError.LENGTH_BEYOND_DATA, decode(cut).error());
        // an unknown layout version is still that
        byte[] four = layoutThree(1, 1, 9);
        four[USER_DATA] = (byte) 0x84;
        assertEquals(SpectrumError.UNKNOWN_LAYOUT, decode(four).error());
    }
}
