package dev.sweepline.ground.spectrum;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.frame.Crc16Ibm3740;
import java.nio.ByteBuffer;
import org.junit.jupiter.api.Test;

class WindowCatalogueTest {
    /** A two-window image built from commands.md §4.1 (marker, length, n, windows at 136, CRC last). */
    private static byte[] image() {
        int n = 2;
        int length = 136 + 4 * n + 2;
        ByteBuffer b = ByteBuffer.allocate(length);
        b.putShort(0, (short) 0x5354).put(2, (byte) 1).putShort(4, (short) length).putShort(6, (short) n);
        b.putShort(136, (short) 1000).putShort(138, (short) 1100).putShort(140, (short) 1100).putShort(142, (short) 1200);
        byte[] a = b.array();
        b.putShort(length - 2, (short) Crc16Ibm3740.compute(a, 0, length - 2));
        return a;
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
}
