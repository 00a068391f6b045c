package dev.sweepline.ground.frame;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.decode.GoldenFrames;
import dev.sweepline.ground.decode.Hex;
import org.junit.jupiter.api.Test;

class TmFrameHeaderTest {
    @Test
    void shouldParseTheStandardsHeaderExample() {
        byte[] h = Hex.bytes("2A 56 11 22 18 00");
        // all values: standards.md CCSDS 132.0-B-3 example "SCID 0x2A5, VC 3, MC 0x11, VC 0x22, FHP 0" [verified]
        assertEquals(0, TmFrameHeader.version(h, 0));
        assertEquals(0x2A5, TmFrameHeader.scid(h, 0));
        assertEquals(3, TmFrameHeader.vcid(h, 0));
        assertFalse(TmFrameHeader.ocfFlag(h, 0));
        assertEquals(0x11, TmFrameHeader.mcCount(h, 0));
        assertEquals(0x22, TmFrameHeader.vcCount(h, 0));
        assertEquals(0, TmFrameHeader.firstHeaderPointer(h, 0));
        // data field status 0x1800: S=0 Y=0 O=0 SLI=11 (CCSDS 132.0-B-3 §4.1.2.7, ICD §2)
        assertEquals(3, TmFrameHeader.segmentLengthId(h, 0));
        assertTrue(TmFrameHeader.dataFieldStatusValid(h, 0));
    }

    @Test
    void shouldParseTheGoldenSpectrumSecondFrameHeader() {
        byte[] h = Hex.bytes(GoldenFrames.SPECTRUM_PART_2);
        // values spelled out in GoldenFrames.SPECTRUM_PART_2 (ICD §1 SCID 0x2C5, §2 layout)
        assertEquals(0x2C5, TmFrameHeader.scid(h, 0));
        assertEquals(0, TmFrameHeader.vcid(h, 0));
        assertEquals(7, TmFrameHeader.mcCount(h, 0));
        assertEquals(0x11, TmFrameHeader.vcCount(h, 0));
        assertEquals(49, TmFrameHeader.firstHeaderPointer(h, 0));
    }

    @Test
    void shouldReadTheSpecialFirstHeaderPointers() {
        // 0x7FE idle only, 0x7FF no packet start: CCSDS 132.0-B-3 §4.1.2.7.6, ICD §2
        assertEquals(0x7FE, TmFrameHeader.firstHeaderPointer(Hex.bytes(GoldenFrames.IDLE_FRAME), 0));
        assertEquals(7, TmFrameHeader.vcid(Hex.bytes(GoldenFrames.IDLE_FRAME), 0));
        assertEquals(0x7FF, TmFrameHeader.firstHeaderPointer(Hex.bytes(GoldenFrames.THREE_HOUSEKEEPING_SPLIT_IDLE_2), 0));
    }
}
