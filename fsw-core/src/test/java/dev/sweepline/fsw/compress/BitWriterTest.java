package dev.sweepline.fsw.compress;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HexFormat;
import org.junit.jupiter.api.Test;

class BitWriterTest {

    @Test
    void shouldPackFieldsMostSignificantBitFirstAndZeroFill() {
        byte[] out = new byte[8];
        BitWriter w = new BitWriter().wrap(out, 1, 7);
        w.writeBits(0b101, 3);
        w.writeBits(1, 1);
        w.writeBits(0xABCDE, 20);
        w.writeFundamentalSequence(2);
        // 1011 1010 1011 1100 1101 1110 001 + fill 00000 (CCSDS 121.0-B: MSB first, zero-fill)
        assertEquals(4, w.finish());
        assertArrayEquals(HexFormat.of().parseHex("00babcde20000000"), out);
    }

    @Test
    void shouldWriteLongFundamentalSequencesAndFullWords() {
        byte[] out = new byte[10];
        BitWriter w = new BitWriter().wrap(out, 0, 10);
        w.writeFundamentalSequence(40); // 40 zeros then a one: bit 40 set
        w.writeBits(0xFFFFFFFFL, 32);
        // by construction: zeros at bits 0..39, the FS one at 40, the word at 41..72, fill 73..79
        assertEquals(10, w.finish());
        assertArrayEquals(HexFormat.of().parseHex("0000000000ffffffff80"), out);
        assertEquals(80, w.bitsWritten());
    }

    @Test
    void shouldFlagOverflowInsteadOfThrowing() {
        BitWriter w = new BitWriter().wrap(new byte[2], 0, 2);
        w.writeBits(0xFFFFFF, 24);
        assertTrue(w.overflowed());
        assertEquals(BitWriter.OVERFLOW, w.finish());
    }
}
