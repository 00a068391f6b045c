package dev.sweepline.fsw.compress;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Arrays;
import java.util.HexFormat;
import org.junit.jupiter.api.Test;

/**
 * The small n = 16, J = 16 vectors of standards.md (CCSDS 121.0-B section, "verified against a
 * reference coder"). Our encoder picks the same options as that coder for them, so the bytes must
 * match exactly: there is no tolerance in a bit stream.
 */
class RiceEncoderSmallVectorsTest {

    private static byte[] encode(int[] samples, int intervalBlocks) {
        RiceEncoder encoder = new RiceEncoder(RiceParameters.of(16, 16, intervalBlocks, true, false, false), 1024);
        byte[] out = new byte[(int) encoder.maxEncodedBytes(samples.length)];
        int written = encoder.encode(samples, 0, samples.length, out, 0);
        return Arrays.copyOf(out, Math.max(written, 0));
    }

    @Test
    void shouldCodeSixteenEqualSamplesAsOneZeroBlockWithTheReference() {
        int[] samples = new int[16];
        Arrays.fill(samples, 0x1234);
        // standards.md small vector 1: ID 00000, reference 0x1234, FS(0) for a run of one block
        assertArrayEquals(HexFormat.of().parseHex("0091a4"), encode(samples, 1));
    }

    @Test
    void shouldCodeAUnitRampWithTheFundamentalSequence() {
        int[] samples = new int[16];
        for (int i = 0; i < 16; i++) {
            samples[i] = 1000 + i;
        }
        // standards.md small vector 2: ID 0001 (FS; it ties with k = 1 at 3 bits a sample and the
        // reference coder took the smaller k, as ours does), reference 1000, 15 x FS(2) = 001
        assertArrayEquals(HexFormat.of().parseHex("103e82492492492480"), encode(samples, 1));
    }

    @Test
    void shouldCodeAWholeConstantIntervalAsRemainderOfSegment() {
        int[] samples = new int[128];
        Arrays.fill(samples, 500);
        // standards.md small vector 3: 8 zero blocks end the interval -> ROS, FS(4) = 00001
        assertArrayEquals(HexFormat.of().parseHex("000fa040"), encode(samples, 8));
    }

    @Test
    void shouldGiveTheSameBytesOnEveryCall() {
        int[] samples = new int[300];
        for (int i = 0; i < samples.length; i++) {
            samples[i] = (i * 7919) & 0xFFFF;
        }
        // determinism requirement of architecture.md: same inputs, same bytes
        assertArrayEquals(encode(samples, 4), encode(samples, 4));
    }

    @Test
    void shouldReportAnOutputRegionThatIsTooSmall() {
        RiceEncoder encoder = new RiceEncoder(RiceParameters.of(16, 16, 1, true, false, false), 64);
        int[] samples = new int[16];
        Arrays.fill(samples, 0x1234);
        // vector 1 needs 3 bytes (standards.md); 2 cannot hold it
        assertEquals(RiceEncoder.STATUS_OUTPUT_TOO_SMALL, encoder.encode(samples, 0, 16, new byte[2], 0));
        assertEquals(3, encoder.encode(samples, 0, 16, new byte[3], 0));
    }

    @Test
    void shouldReportBadArgumentsAsStatus() {
        RiceEncoder encoder = new RiceEncoder(RiceParameters.of(12, 16, 1, true, false, false), 32);
        byte[] out = new byte[256];
        // limits of the API contract (RiceEncoder Javadoc)
        assertEquals(RiceEncoder.STATUS_TOO_MANY_SAMPLES, encoder.encode(new int[33], 0, 33, out, 0));
        assertEquals(RiceEncoder.STATUS_BAD_RANGE, encoder.encode(new int[8], 4, 8, out, 0));
        assertEquals(RiceEncoder.STATUS_BAD_RANGE, encoder.encode(new int[8], 0, 8, out, 257));
        // 4096 = 2^12 is above x_max = 2^12 - 1 for n = 12 (CCSDS 121.0-B, unsigned samples)
        assertEquals(RiceEncoder.STATUS_SAMPLE_OUT_OF_RANGE, encoder.encode(new int[] {4096}, 0, 1, out, 0));
        assertEquals(0, encoder.encode(new int[0], 0, 0, out, 0));
    }
}
