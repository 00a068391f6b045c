package dev.sweepline.fsw.octets;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.charset.StandardCharsets;
import java.util.HexFormat;
import org.junit.jupiter.api.Test;

class Crc16Test {
    @Test
    void shouldGiveTheCatalogueCheckValue() {
        byte[] check = "123456789".getBytes(StandardCharsets.US_ASCII);
        // Cook, Catalogue of parametrised CRC algorithms, CRC-16/IBM-3740: check = 0x29B1
        assertEquals(0x29B1, Crc16.of(check, 0, check.length));
    }

    @Test
    void shouldGiveTheFrameErrorControlFieldOfTheStandardsExample() {
        byte[] frame = HexFormat.of().parseHex("2a56112218000923c005000900010203040506070809");
        // standards.md, CCSDS 132.0-B-3 FECF example (verified against a reference CRC): 0x0A32
        assertEquals(0x0A32, Crc16.of(frame, 0, frame.length));
    }

    @Test
    void shouldLeaveZeroResidueOverDataAndItsCrc() {
        byte[] data = HexFormat.of().parseHex("313233343536373839" + "29b1");
        // Cook's catalogue: residue 0 for CRC-16/IBM-3740 (no xorout, no reflection)
        assertEquals(0, Crc16.of(data, 0, data.length));
    }

    @Test
    void shouldContinueAcrossChunks() {
        byte[] check = "123456789".getBytes(StandardCharsets.US_ASCII);
        int crc = Crc16.update(Crc16.INITIAL, check, 0, 4);
        crc = Crc16.update(crc, check, 4, 5);
        assertEquals(0x29B1, crc); // same catalogue check value, computed in two pieces
    }
}
