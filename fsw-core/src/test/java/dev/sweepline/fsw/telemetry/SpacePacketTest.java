package dev.sweepline.fsw.telemetry;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.HexFormat;
import org.junit.jupiter.api.Test;

class SpacePacketTest {
    @Test
    void shouldWriteTheStandardsExampleHeader() {
        byte[] header = new byte[6];
        SpacePacket.writePrimaryHeader(header, 0, SpacePacket.TYPE_TM, true, 0x123, SpacePacket.UNSEGMENTED, 5, 10);
        // standards.md, CCSDS 133.0-B-2 §4.1.3 example: TM, sec hdr, APID 0x123, unsegmented, count 5,
        // 10 data octets -> 09 23 C0 05 00 09 (verified)
        assertArrayEquals(HexFormat.of().parseHex("0923c0050009"), header);
        assertEquals(0x123, SpacePacket.apid(header, 0));
        assertEquals(16, SpacePacket.totalLength(header, 0)); // 6 header + 10 data octets
    }

    @Test
    void shouldWrapTheSequenceCountAtFourteenBits() {
        byte[] header = new byte[6];
        // CCSDS 133.0-B-2 §4.1.3.4.3: the count is modulo 16384
        SpacePacket.writePrimaryHeader(header, 0, SpacePacket.TYPE_TM, true, 0x100, SpacePacket.UNSEGMENTED,
                16384 + 7, 1);
        assertEquals(0xC0, header[2] & 0xFF);
        assertEquals(7, header[3] & 0xFF);
    }

    @Test
    void shouldSetTheTelecommandTypeBit() {
        byte[] header = new byte[6];
        SpacePacket.writePrimaryHeader(header, 0, SpacePacket.TYPE_TC, true, 0x123, SpacePacket.UNSEGMENTED, 0, 1);
        assertEquals(0x19, header[0] & 0xFF); // CCSDS 133.0-B-2 §4.1.3.3.2: type bit 1 = telecommand
    }
}
