package dev.sweepline.fsw.link;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import java.util.Arrays;
import java.util.HexFormat;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class CobsDeframerTest {
    private static final HexFormat HEX = HexFormat.of();

    /** The COBS vectors of standards.md (Cheshire and Baker 1999; read and verified), fed one octet at a time. */
    @ParameterizedTest
    @CsvSource({
        "00, 0101",
        "0000, 010101",
        "11220033, 0311220233",
        "11223344, 0511223344",
        "11000000, 0211010101",
    })
    void shouldDecodeThePublishedVectorsWhenStreamed(String raw, String encoded) {
        CobsDeframer d = new CobsDeframer(300);
        byte[] enc = HEX.parseHex(encoded);
        for (byte b : enc) {
            assertEquals(CobsDeframer.MORE, d.accept(b));
        }
        d.accept((byte) 0);
        byte[] expected = HEX.parseHex(raw);
        assertEquals(expected.length, d.lastDecodedLength());
        assertArrayEquals(expected, Arrays.copyOf(d.payload(), expected.length));
    }

    @Test
    void shouldDecodeTheLongVectorsWhenStreamed() {
        // standards.md: 01..FF -> FF 01..FE 02 FF; 00..FF -> 01 FF 01..FE 02 FF
        byte[] b00toFF = new byte[256];
        for (int i = 0; i < 256; i++) {
            b00toFF[i] = (byte) i;
        }
        byte[] enc = new byte[Cobs.maxEncodedLength(256)];
        int n = Cobs.encode(b00toFF, 0, 256, enc, 0);
        CobsDeframer d = new CobsDeframer(300);
        for (int i = 0; i < n; i++) {
            d.accept(enc[i]);
        }
        d.accept((byte) 0);
        assertEquals(256, d.lastDecodedLength());
        assertArrayEquals(b00toFF, Arrays.copyOf(d.payload(), 256));
    }

    @Test
    void shouldAcceptBothFormsOfATrailingFullBlock() {
        // a real frame whose payload + CRC is 254 non-zero octets: COBS gives FF + 254 octets (short
        // form); the long form adds a final 01 code octet (standards.md: decoders accept both)
        byte[] frame = fullBlockFrame();
        byte[] shortForm = new byte[256];
        shortForm[0] = (byte) 0xFF;
        System.arraycopy(frame, 0, shortForm, 1, 254);
        byte[] longForm = Arrays.copyOf(shortForm, 256);
        longForm[255] = 1;
        for (byte[] form : new byte[][] {Arrays.copyOf(shortForm, 255), longForm}) {
            CobsDeframer d = new CobsDeframer(252);
            int result = CobsDeframer.MORE;
            for (byte b : form) {
                result = d.accept(b);
            }
            result = d.accept((byte) 0);
            assertEquals(CobsDeframer.FRAME, result);
            assertEquals(252, d.payloadLength());
            assertArrayEquals(Arrays.copyOf(frame, 252), Arrays.copyOf(d.payload(), 252));
        }
    }

    /** 252 payload octets with no 0x00 whose CRC-16 octets are non-zero too. */
    private static byte[] fullBlockFrame() {
        byte[] f = new byte[254];
        for (int i = 0; i < 252; i++) {
            f[i] = (byte) (1 + i % 255);
        }
        for (int v = 1; ; v++) {
            f[0] = (byte) v;
            int crc = dev.sweepline.fsw.octets.Crc16.of(f, 0, 252);
            if ((crc >>> 8) != 0 && (crc & 0xFF) != 0) {
                f[252] = (byte) (crc >>> 8);
                f[253] = (byte) crc;
                return f;
            }
        }
    }

    @Test
    void shouldDeframeRandomFramesInAnyChunking() {
        SplittableRandom random = new SplittableRandom(77L); // recorded seed
        FrameEncoder enc = new FrameEncoder();
        byte[] stream = new byte[200 * FrameEncoder.MAX_WIRE_FRAME];
        byte[][] sent = new byte[200][];
        int len = 0;
        for (int f = 0; f < sent.length; f++) {
            sent[f] = new byte[random.nextInt(1, FrameEncoder.MAX_PAYLOAD + 1)];
            for (int i = 0; i < sent[f].length; i++) {
                sent[f][i] = random.nextInt(3) == 0 ? 0 : (byte) random.nextInt(256);
            }
            len += enc.encode(sent[f], 0, sent[f].length, stream, len);
        }
        for (int chunking = 1; chunking <= 64; chunking *= 2) {
            CobsDeframer d = new CobsDeframer();
            int got = 0;
            for (int at = 0; at < len; at += chunking) { // chunk boundaries only matter to the caller's loop
                for (int i = at; i < Math.min(len, at + chunking); i++) {
                    int r = d.accept(stream[i]);
                    if (r != CobsDeframer.MORE) {
                        assertEquals(CobsDeframer.FRAME, r);
                        assertArrayEquals(sent[got], Arrays.copyOf(d.payload(), d.payloadLength()));
                        got++;
                    }
                }
            }
            assertEquals(sent.length, got);
        }
    }

    @Test
    void shouldReportEachKindOfBadChunkAndResynchronise() {
        FrameEncoder enc = new FrameEncoder();
        byte[] good = new byte[32];
        int n = enc.encode(HEX.parseHex("0112"), 0, 2, good, 0);
        CobsDeframer d = new CobsDeframer();
        // empty chunk: a lone delimiter (hardware ICD §5: ignored)
        assertEquals(CobsDeframer.EMPTY, d.accept((byte) 0));
        // a block running into the delimiter: code 05 with two octets
        d.accept((byte) 5);
        d.accept((byte) 1);
        assertEquals(CobsDeframer.BAD_COBS, d.accept((byte) 0));
        // too short for a type and a CRC
        d.accept((byte) 2);
        d.accept((byte) 7);
        assertEquals(CobsDeframer.BAD_LENGTH, d.accept((byte) 0));
        // over-long: 100 non-zero octets decode past 64 + 2
        d.accept((byte) 0xFF);
        for (int i = 0; i < 100; i++) {
            d.accept((byte) 9);
        }
        assertEquals(CobsDeframer.BAD_COBS, d.accept((byte) 0)); // the FF block is also cut short
        d.accept((byte) 101);
        for (int i = 0; i < 100; i++) {
            d.accept((byte) 9);
        }
        assertEquals(CobsDeframer.BAD_LENGTH, d.accept((byte) 0));
        // one flipped bit: CRC-16 detects every single-bit error (CCITT polynomial; common practice)
        byte[] flipped = good.clone();
        flipped[2] ^= 0x10;
        int r = CobsDeframer.MORE;
        for (int i = 0; i < n; i++) {
            r = d.accept(flipped[i]);
        }
        assertEquals(CobsDeframer.BAD_CRC, r);
        // and the next good frame is taken as usual
        for (int i = 0; i < n; i++) {
            r = d.accept(good[i]);
        }
        assertEquals(CobsDeframer.FRAME, r);
        assertEquals(2, d.payloadLength());
        assertNotEquals(0, d.payload()[1]);
    }
}
