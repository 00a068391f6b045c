package dev.sweepline.fsw.link;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.HexFormat;
import java.util.SplittableRandom;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

class CobsTest {
    private static final HexFormat HEX = HexFormat.of();

    /** Vectors of standards.md (Cheshire and Baker 1999; read and verified), without the delimiter. */
    @ParameterizedTest
    @CsvSource({
        "'', 01",
        "00, 0101",
        "0000, 010101",
        "11220033, 0311220233",
        "11223344, 0511223344",
        "11000000, 0211010101",
    })
    void shouldEncodeAndDecodeThePublishedVectors(String raw, String encoded) {
        byte[] in = HEX.parseHex(raw);
        assertArrayEquals(HEX.parseHex(encoded), encode(in));
        assertArrayEquals(in, decode(HEX.parseHex(encoded)));
    }

    @Test
    void shouldCodeTheLongVectors() {
        byte[] b01toFE = range(0x01, 0xFE);
        byte[] b01toFF = range(0x01, 0xFF);
        byte[] b00toFF = range(0x00, 0xFF);
        // standards.md: 01..FE -> FF 01..FE; 01..FF -> FF 01..FE 02 FF; 00..FF -> 01 FF 01..FE 02 FF
        assertArrayEquals(concat(HEX.parseHex("ff"), b01toFE), encode(b01toFE));
        assertArrayEquals(concat(HEX.parseHex("ff"), b01toFE, HEX.parseHex("02ff")), encode(b01toFF));
        assertArrayEquals(concat(HEX.parseHex("01ff"), b01toFE, HEX.parseHex("02ff")), encode(b00toFF));
        assertArrayEquals(b01toFF, decode(encode(b01toFF)));
        assertArrayEquals(b00toFF, decode(encode(b00toFF)));
    }

    @Test
    void shouldAcceptBothFormsOfATrailingFullBlock() {
        byte[] b01toFE = range(0x01, 0xFE);
        // standards.md: decoders accept FF 01..FE with and without a final 01 code octet
        assertArrayEquals(b01toFE, decode(concat(HEX.parseHex("ff"), b01toFE)));
        assertArrayEquals(b01toFE, decode(concat(HEX.parseHex("ff"), b01toFE, HEX.parseHex("01"))));
    }

    @Test
    void shouldReportTruncationAndEmbeddedZeros() {
        byte[] out = new byte[16];
        assertEquals(Cobs.ERROR_TRUNCATED, Cobs.decode(HEX.parseHex("0511"), 0, 2, out, 0));
        assertEquals(Cobs.ERROR_ZERO_IN_DATA, Cobs.decode(HEX.parseHex("031100"), 0, 3, out, 0));
        assertEquals(Cobs.ERROR_OUTPUT_TOO_SMALL, Cobs.decode(HEX.parseHex("0511223344"), 0, 5, new byte[2], 0));
    }

    @Test
    void shouldRoundTripRandomMessagesWithinTheOverheadBound() {
        SplittableRandom random = new SplittableRandom(5150L); // recorded seed
        for (int trial = 0; trial < 2000; trial++) {
            byte[] in = new byte[random.nextInt(0, 700)];
            for (int i = 0; i < in.length; i++) {
                in[i] = random.nextInt(4) == 0 ? 0 : (byte) random.nextInt(256);
            }
            byte[] enc = encode(in);
            // Cheshire and Baker 1999: overhead at most ceil(n/254) octets (plus the leading code)
            assertTrue(enc.length <= Cobs.maxEncodedLength(in.length));
            for (byte b : enc) {
                assertTrue(b != 0);
            }
            assertArrayEquals(in, decode(enc));
        }
    }

    private static byte[] encode(byte[] in) {
        byte[] out = new byte[Cobs.maxEncodedLength(in.length)];
        return Arrays.copyOf(out, Cobs.encode(in, 0, in.length, out, 0));
    }

    private static byte[] decode(byte[] in) {
        byte[] out = new byte[in.length + 1];
        int n = Cobs.decode(in, 0, in.length, out, 0);
        assertTrue(n >= 0, "status " + n);
        return Arrays.copyOf(out, n);
    }

    private static byte[] range(int from, int to) {
        byte[] b = new byte[to - from + 1];
        for (int i = 0; i < b.length; i++) {
            b[i] = (byte) (from + i);
        }
        return b;
    }

    private static byte[] concat(byte[]... parts) {
        int n = 0;
        for (byte[] p : parts) {
            n += p.length;
        }
        byte[] all = new byte[n];
        int at = 0;
        for (byte[] p : parts) {
            System.arraycopy(p, 0, all, at, p.length);
            at += p.length;
        }
        return all;
    }
}
