package dev.sweepline.ground.spectrum;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.decode.GoldenSpectraV2;
import dev.sweepline.ground.decode.Hex;
import dev.sweepline.ground.frame.Crc16Ibm3740;
import dev.sweepline.ground.instrument.InstrumentSet;
import java.nio.ByteBuffer;
import org.junit.jupiter.api.Test;

class WindowCatalogueTest {
    /** A two-window image built from commands.md §4.1 (marker, length, n, windows at 136, CRC last). */
    private static byte[] image() {
        return image(1);
    }

    /**
     * As {@link #image()} in format {@code version}: version 2 has 16 octets of styles after the windows,
     * version 3 also the engineering flush, seconds, after them (§4.1).
     */
    private static byte[] image(int version) {
        int n = 2;
        int length = 136 + 4 * n + 2 + (version >= 2 ? 16 : 0) + (version >= 3 ? 4 : 0);
        ByteBuffer b = ByteBuffer.allocate(length);
        b.putShort(0, (short) 0x5354).put(2, (byte) version).putShort(4, (short) length).putShort(6, (short) n);
        if (version >= 2) {
            b.putInt(144, 1).putInt(148, 400_000); // focusStyle design, budget 0.4 s (values the catalogue ignores)
        }
        if (version >= 3) {
            b.putInt(160, 60); // engineeringFlushSeconds at 136 + 4 n + 16 (§4.1)
        }
        b.putShort(136, (short) 1000).putShort(138, (short) 1100).putShort(140, (short) 1100).putShort(142, (short) 1200);
        byte[] a = b.array();
        b.putShort(length - 2, (short) Crc16Ibm3740.compute(a, 0, length - 2));
        return a;
    }

    @Test
    void shouldLearnTheWindowsOfAVersionTwoImageAndRefuseAnUnknownVersion() {
        WindowCatalogue c = new WindowCatalogue();
        int id = c.add(image(2));
        assertTrue(c.knows(id));
        assertEquals(0.100150 * 1100 - 0.8, c.lowVolts(id, 1), 1e-12); // ICD §8, the same windows as version 1
        assertEquals(0, c.engineeringFlushSeconds(id)); // §4.1: a version-2 image keeps the build's flush
        assertEquals(-1, c.add(image(4))); // commands.md §4.1: versions 1, 2 and 3 only
    }

    @Test
    void shouldLearnTheEngineeringFlushOfAVersionThreeImage() {
        WindowCatalogue c = new WindowCatalogue();
        int id = c.add(image(3));
        assertTrue(c.knows(id));
        assertEquals(0.100150 * 1100 - 0.8, c.lowVolts(id, 1), 1e-12); // ICD §8, the same windows as version 1
        assertEquals(60, c.engineeringFlushSeconds(id)); // the value written at 136 + 4 n + 16 above
        assertEquals(0, c.engineeringFlushSeconds(c.add(image(1)))); // §4.1: version 1 keeps the build's flush
        assertEquals(-1, c.engineeringFlushSeconds(0x1234)); // a table the catalogue was never given
    }

    @Test
    void shouldLearnTheWindowsOfAnImageUnderItsCrc() {
        WindowCatalogue c = new WindowCatalogue();
        byte[] image = image();
        int id = c.add(image);
        // commands.md §4.1: the table id is the CRC-16/IBM-3740 stored in the last two octets
        assertEquals(((image[image.length - 2] & 0xFF) << 8) | (image[image.length - 1] & 0xFF), id);
        assertTrue(c.knows(id));
        // ICD §8: 0.100150 V x code - 0.8 V
        assertEquals(0.100150 * 1000 - 0.8, c.lowVolts(id, 0), 1e-12);
        assertEquals(0.100150 * 1200 - 0.8, c.highVolts(id, 1), 1e-12);
        assertTrue(Double.isNaN(c.lowVolts(id, 2)));
    }

    @Test
    void shouldRefuseACorruptImageAndKeepTheBuiltInTable() {
        WindowCatalogue c = new WindowCatalogue();
        byte[] image = image();
        image[137] ^= 1; // one bit of a window code: the CRC no longer matches
        assertEquals(-1, c.add(image));
        assertFalse(c.knows(0x1234));
        // the built-in table (id 0) is always there: window 0 starts at 50 V (ICD §4) calibrated (ICD §8)
        assertEquals(0.100150 * 500 - 0.8, c.lowVolts(0, 0), 1e-9);
    }

    @Test
    void shouldGiveASpectrumOfAnUplinkedTableItsEdgesOnTheSpectrumsOwnInstrument() {
        WindowCatalogue c = new WindowCatalogue();
        int id = c.add(image());
        // GoldenSpectraV2.FINE_RAW (fine-cup, windows 100..109) restamped with the image's table id (ICD §4 offset 8
        // of layout 2) and first window 0: its two windows get edges, the other eight none
        byte[] p = Hex.bytes(GoldenSpectraV2.FINE_RAW);
        int u = 12;
        p[u + 8] = (byte) (id >>> 8);
        p[u + 9] = (byte) id;
        p[u + 10] = 0;
        p[u + 11] = 0;
        SpectrumResult r = new SpectrumPacketDecoder(QuadrantDecompressor.UNAVAILABLE, c).decode(p, 0, p.length);
        assertTrue(r.isOk(), r.detail());
        // the image holds codes; fine-cup.yaml calibrates them: (1 − 0.001) × 0.125 V × code + 0.5 V
        assertEquals(0.999 * 0.125 * 1000 + 0.5, r.spectrum().lowVolts()[0], 1e-9);
        assertEquals(0.999 * 0.125 * 1200 + 0.5, r.spectrum().highVolts()[1], 1e-9);
        assertTrue(Double.isNaN(r.spectrum().lowVolts()[2]));
        // the same codes on the demo cup (ICD §8): 0.100150 V × code − 0.8 V
        assertEquals(0.100150 * 1000 - 0.8, c.lowVolts(InstrumentSet.builtIns().byId(1), id, 0), 1e-9);
        // a table id nobody registered: no edges
        assertFalse(c.knows(id ^ 1));
        assertTrue(Double.isNaN(c.lowVolts(InstrumentSet.builtIns().byId(2), id ^ 1, 0)));
    }
}
