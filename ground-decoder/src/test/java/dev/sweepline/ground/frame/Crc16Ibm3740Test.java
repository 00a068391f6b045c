package dev.sweepline.ground.frame;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.sweepline.ground.decode.GoldenFrames;
import dev.sweepline.ground.decode.Hex;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;

class Crc16Ibm3740Test {
    @Test
    void shouldGiveTheCatalogueCheckValue() {
        byte[] check = "123456789".getBytes(StandardCharsets.US_ASCII);
        // check 0x29B1: Cook, Catalogue of parametrised CRC algorithms, CRC-16/IBM-3740; standards.md [verified]
        assertEquals(0x29B1, Crc16Ibm3740.compute(check, 0, check.length));
    }

    @Test
    void shouldGiveTheStandardsFecfExample() {
        byte[] frame = Hex.bytes("2a56112218000923c005000900010203040506070809");
        // FECF 0x0A32: standards.md CRC section, CCSDS 132.0-B-3 §4.1.6 [verified]
        assertEquals(0x0A32, Crc16Ibm3740.compute(frame, 0, frame.length));
    }

    @Test
    void shouldLeaveResidueZeroOverFrameAndFecf() {
        byte[] frame = Hex.bytes("2a56112218000923c005000900010203040506070809" + "0a32");
        // residue 0: catalogue entry (non-reflected, xorout 0); standards.md
        assertEquals(0, Crc16Ibm3740.compute(frame, 0, frame.length));
    }

    @Test
    void shouldAgreeWithPythonOnEveryGoldenFrame() {
        for (String hex : GoldenFrames.STREAM) {
            byte[] f = Hex.bytes(hex);
            int fecf = ((f[f.length - 2] & 0xFF) << 8) | (f[f.length - 1] & 0xFF);
            // expected: the FECF python3 binascii.crc_hqx(frame, 0xFFFF) wrote (GoldenFrames doc)
            assertEquals(fecf, Crc16Ibm3740.compute(f, 0, f.length - 2), hex.substring(0, 12));
        }
    }

    @Test
    void shouldGiveTheSameCrcWhenContinuedInPieces() {
        byte[] d = "123456789".getBytes(StandardCharsets.US_ASCII);
        int c = Crc16Ibm3740.update(Crc16Ibm3740.INIT, d, 0, 4);
        c = Crc16Ibm3740.update(c, d[4]);
        c = Crc16Ibm3740.update(c, d, 5, 4);
        // same catalogue check 0x29B1 (Cook catalogue), computed in three pieces
        assertEquals(0x29B1, c);
    }

    @Test
    void shouldAgreeWithTheBitwiseDefinitionAtEveryLengthAndOffset() {
        // the catalogue's definition bit by bit (poly 0x1021, MSB first, init 0xFFFF): the eight-octet path
        // and the octet tail must give it for every length 0..80 and start 0..8, random octets (seed recorded)
        java.util.Random rnd = new java.util.Random(20261202L);
        byte[] data = new byte[96];
        rnd.nextBytes(data);
        for (int off = 0; off <= 8; off++) {
            for (int len = 0; len <= 80; len++) {
                int r = 0xFFFF;
                for (int i = off; i < off + len; i++) {
                    r ^= (data[i] & 0xFF) << 8;
                    for (int b = 0; b < 8; b++) {
                        r = (r & 0x8000) != 0 ? ((r << 1) ^ 0x1021) & 0xFFFF : (r << 1) & 0xFFFF;
                    }
                }
                assertEquals(r, Crc16Ibm3740.compute(data, off, len), "offset " + off + " length " + len);
            }
        }
    }
}
