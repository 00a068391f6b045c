package dev.sweepline.fsw.octets;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.HexFormat;
import org.junit.jupiter.api.Test;

/** Big-endian field access: most significant octet first (telemetry ICD preamble; hardware ICD §3). */
class BigEndianTest {
    @Test
    void shouldWriteEachWidthMostSignificantOctetFirst() {
        byte[] b = new byte[9];
        int p = BigEndian.put16(b, 0, 0x1234);
        p = BigEndian.put24(b, p, 0xABCDEF);
        p = BigEndian.put32(b, p, 0x89ABCDEFL);
        assertEquals(9, p);
        // the values written by hand, octet by octet (telemetry ICD: big-endian)
        assertArrayEquals(HexFormat.of().parseHex("1234abcdef89abcdef"), b);
    }

    @Test
    void shouldReadBackUnsigned() {
        byte[] b = HexFormat.of().parseHex("fffefdfcfb");
        assertEquals(0xFFFE, BigEndian.get16(b, 0));
        assertEquals(0xFFFEFD, BigEndian.get24(b, 0));
        assertEquals(0xFFFEFDFCL, BigEndian.getUnsigned32(b, 0));
        assertEquals(0xFFFEFDFC, BigEndian.get32(b, 0));
    }

    @Test
    void shouldWriteAndReadSamplesOfOneToFourOctets() {
        byte[] b = new byte[4];
        for (int octets = 1; octets <= 4; octets++) {
            int top = octets == 4 ? -1 : (1 << (8 * octets)) - 1; // 2^(8n) - 1, the widest sample of n octets
            assertEquals(octets, BigEndian.putN(b, 0, top, octets));
            assertEquals(top, BigEndian.getN(b, 0, octets));
        }
        BigEndian.putN(b, 0, 0x0F_FFFF, 3); // a 20-bit ADC's top code in 3 octets (hardware ICD §3.2)
        assertArrayEquals(HexFormat.of().parseHex("0fffff"), java.util.Arrays.copyOf(b, 3));
    }
}
