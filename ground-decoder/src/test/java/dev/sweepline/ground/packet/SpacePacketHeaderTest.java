package dev.sweepline.ground.packet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.decode.Hex;
import org.junit.jupiter.api.Test;

class SpacePacketHeaderTest {
    @Test
    void shouldParseTheStandardsExample() {
        byte[] h = Hex.bytes("09 23 C0 05 00 09");
        // standards.md CCSDS 133.0-B-2: "TM, sec hdr, APID 0x123, unsegmented, count 5, 10 data octets" [verified]
        assertEquals(0, SpacePacketHeader.version(h, 0));
        assertEquals(0, SpacePacketHeader.type(h, 0));
        assertTrue(SpacePacketHeader.secondaryHeaderFlag(h, 0));
        assertEquals(0x123, SpacePacketHeader.apid(h, 0));
        assertEquals(SpacePacketHeader.UNSEGMENTED, SpacePacketHeader.sequenceFlags(h, 0));
        assertEquals(5, SpacePacketHeader.sequenceCount(h, 0));
        assertEquals(9, SpacePacketHeader.dataLengthField(h, 0));
        // 6 header + 10 data octets
        assertEquals(16, SpacePacketHeader.totalOctets(h, 0));
        assertTrue(SpacePacketHeader.isTelemetryVersion1(h, 0));
    }

    @Test
    void shouldReadTheIdleHeaderOfTheGoldenFrame() {
        byte[] h = Hex.bytes("07 FF C0 00 00 4B");
        // GoldenFrames.HOUSEKEEPING_WITH_IDLE_TAIL: idle APID 0x7FF (CCSDS 133.0-B-2, ICD §3.3), 82 octets
        assertEquals(SpacePacketHeader.IDLE_APID, SpacePacketHeader.apid(h, 0));
        assertEquals(82, SpacePacketHeader.totalOctets(h, 0));
    }
}
