package dev.sweepline.ground.spectrum;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.decode.GoldenFrames;
import dev.sweepline.ground.decode.Hex;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class SpectrumPacketDecoderTest {
    private final SpectrumPacketDecoder raw = new SpectrumPacketDecoder(QuadrantDecompressor.UNAVAILABLE);

    /** The golden spectrum packet (GoldenFrames.SPECTRUM_PACKET, ICD §4). */
    private static byte[] golden() {
        return Hex.bytes(GoldenFrames.SPECTRUM_PACKET);
    }

    /** Offset of the compression octet in the golden packet: 12 + 14 + 4 tags + 2 flags. */
    private static final int COMPRESSION_AT = 32;

    private SpectrumError error(byte[] p) {
        SpectrumResult r = raw.decode(p, 0, p.length);
        return r.error();
    }

    @Test
    void shouldDecodeTheGoldenPacket() {
        SpectrumResult r = raw.decode(golden(), 0, golden().length);
        assertTrue(r.isOk(), r.detail());
        // 16 windows from 40 (GoldenFrames.SPECTRUM_PACKET)
        assertEquals(16, r.spectrum().windowCount());
    }

    @Test
    void shouldFlagAQuadrantLengthBeyondThePacket() {
        byte[] p = golden();
        int lq4 = p.length - 2 - 32; // Lq of quadrant 4
        p[lq4] = 0x00;
        p[lq4 + 1] = 0x40; // 64 octets claimed, 32 present
        assertEquals(SpectrumError.LENGTH_BEYOND_DATA, error(p));
        // and a packet cut short inside the tags
        assertEquals(SpectrumError.LENGTH_BEYOND_DATA, error(java.util.Arrays.copyOf(golden(), 30)));
    }

    @Test
    void shouldFlagEachBadField() {
        byte[] p = golden();
        p[12] = 2; // mode 2 on APID 0x100 (ICD §4: survey is 1)
        assertEquals(SpectrumError.BAD_MODE, error(p));
        p = golden();
        p[12 + 9] = 0; // window count 0 (ICD §4: 1..256)
        assertEquals(SpectrumError.BAD_WINDOW_COUNT, error(p));
        p = golden();
        p[12 + 14] = (byte) 0xC0; // gain tag 3 for window 40 (ICD §4: 0 .. ranges − 1; demo-cup.yaml: 3 ranges)
        assertEquals(SpectrumError.BAD_GAIN_RANGE, error(p));
        p = golden();
        p[COMPRESSION_AT] = 2; // ICD §4: only 0x00 and 0x01
        assertEquals(SpectrumError.UNKNOWN_COMPRESSION, error(p));
        p = java.util.Arrays.copyOf(golden(), golden().length + 1);
        assertEquals(SpectrumError.TRAILING_OCTETS, error(p));
        p = golden();
        p[COMPRESSION_AT] = 1; // CCSDS 121 without a decoder plugged in
        assertEquals(SpectrumError.DECOMPRESSOR_UNAVAILABLE, error(p));
    }

    @Test
    void shouldCallThePluggedDecompressorWithTheIcdSampleCountAndPaddedBuffer() {
        byte[] p = golden();
        p[COMPRESSION_AT] = 1;
        List<int[]> calls = new ArrayList<>();
        QuadrantDecompressor fake = (in, off, len, c, bits, out) -> {
            calls.add(new int[] {off, len, c, out.length, bits});
            for (int i = 0; i < c; i++) {
                out[i] = 1000 + i;
            }
            return c;
        };
        SpectrumResult r = new SpectrumPacketDecoder(fake).decode(p, 0, p.length);
        assertTrue(r.isOk(), r.detail());
        // four independent streams (ICD §4), each Lq = 32 here; c = 16; a buffer for the 256-window maximum;
        // layout 1: 16-bit samples (ICD §4)
        assertEquals(4, calls.size());
        assertArrayEquals(new int[] {COMPRESSION_AT + 3, 32, 16, 256, 16}, calls.get(0));
        assertArrayEquals(new int[] {COMPRESSION_AT + 1 + 3 * 34 + 2, 32, 16, 256, 16}, calls.get(3));
        assertEquals(1015, r.spectrum().adcCounts()[2][15]);
        // an error code from the decoder rejects the spectrum
        QuadrantDecompressor failing = (in, off, len, c, bits, out) -> QuadrantDecompressor.ERROR_CORRUPT;
        assertEquals(SpectrumError.DECOMPRESSION_FAILED, new SpectrumPacketDecoder(failing).decode(p, 0, p.length).error());
    }

    @Test
    void shouldRoundUpToWholeBlocks() {
        // J = 8 (ICD §4): 1 -> 8, 16 -> 16, 17 -> 24, 256 -> 256
        assertEquals(8, QuadrantDecompressor.paddedCount(1));
        assertEquals(16, QuadrantDecompressor.paddedCount(16));
        assertEquals(24, QuadrantDecompressor.paddedCount(17));
        assertEquals(256, QuadrantDecompressor.paddedCount(256));
    }
}
