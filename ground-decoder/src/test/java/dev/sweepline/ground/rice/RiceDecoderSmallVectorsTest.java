package dev.sweepline.ground.rice;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Arrays;
import java.util.HexFormat;
import org.junit.jupiter.api.Test;

/** The small n = 16, J = 16 vectors of standards.md (CCSDS 121.0-B, verified against a reference coder). */
class RiceDecoderSmallVectorsTest {

    private static int[] decode(String hex, int intervalBlocks, int count) {
        byte[] stream = HexFormat.of().parseHex(hex);
        int[] out = new int[count];
        DecodeResult result = new RiceDecoder(RiceSettings.basic(16, 16, intervalBlocks))
                .decode(stream, 0, stream.length, count, out);
        assertEquals(DecodeStatus.OK, result.status(), result.describe());
        assertEquals(count, result.samplesDecoded());
        return out;
    }

    @Test
    void shouldDecodeOneZeroBlockWithItsReference() {
        int[] expected = new int[16];
        Arrays.fill(expected, 0x1234);
        // standards.md: 16 x 0x1234, r = 1 -> 0091a4
        assertArrayEquals(expected, decode("0091a4", 1, 16));
    }

    @Test
    void shouldDecodeTheRampCodedWithTheFundamentalSequence() {
        int[] expected = new int[16];
        for (int i = 0; i < 16; i++) {
            expected[i] = 1000 + i;
        }
        // standards.md: 1000..1015, r = 1 -> 103e82492492492480
        assertArrayEquals(expected, decode("103e82492492492480", 1, 16));
    }

    @Test
    void shouldExpandRemainderOfSegmentToTheIntervalEnd() {
        int[] expected = new int[128];
        Arrays.fill(expected, 500);
        // standards.md: 128 x 500, r = 8 -> 000fa040 (ROS covers all 8 blocks of the interval)
        assertArrayEquals(expected, decode("000fa040", 8, 128));
    }

    @Test
    void shouldDecodeOnlyTheSamplesAskedForFromAPaddedBlock() {
        // the same stream read for 5 samples: the block is decoded, 5 samples written (API contract)
        int[] out = new int[5];
        byte[] stream = HexFormat.of().parseHex("0091a4");
        DecodeResult result = new RiceDecoder(RiceSettings.basic(16, 16, 1)).decode(stream, 0, 3, 5, out);
        assertEquals(5, result.samplesDecoded());
        assertArrayEquals(new int[] {0x1234, 0x1234, 0x1234, 0x1234, 0x1234}, out);
    }
}
