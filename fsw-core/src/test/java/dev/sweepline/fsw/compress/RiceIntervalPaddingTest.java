package dev.sweepline.fsw.compress;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.sweep.AllocationMeter;
import java.util.Arrays;
import java.util.HexFormat;
import org.junit.jupiter.api.Test;

/**
 * Padding of each reference sample interval to an octet ({@link RiceParameters#padIntervalsToOctet()}),
 * on small streams whose bits can be written out by hand.
 *
 * <p>Sources of the check values. The coded data sets come from standards.md (CCSDS 121.0-B section):
 * a zero-block CDS is the all-zero ID plus a '0' (3-bit ID for n at most 8, 4-bit for 8 &lt; n &lt;= 16),
 * the reference sample in n bits, then FS(m - 1) for a run of m blocks (m = 1..4); a run is closed
 * at an interval end. The padding rule - after the last CDS of each interval, zero bits to the next
 * octet - is libaec's "pad RSI" flag, AEC_PAD_RSI ({@code aec -p}) [read: libaec encode.c
 * {@code m_flush_block}, decode.c {@code m_next_cds}]. CCSDS 121.0-B-3 itself has, as far as we
 * remember, no such option - its only fill is the zero fill at the end of the coded stream - and
 * libaec.h says the flag "violates the standard" and is there to decode some CCSDS sample data
 * [memory for the standard; read for libaec.h]. The aec cross-check of the same option is hw-sim's
 * {@code AecPaddedIntervalsCrossCheckTest}. Bit streams have no tolerance: bytes are compared exactly.
 */
class RiceIntervalPaddingTest {

    private static byte[] encode(int n, int blockSize, int intervalBlocks, boolean pad, int[] samples) {
        RiceEncoder encoder = new RiceEncoder(RiceParameters.of(n, blockSize, intervalBlocks, true, false, pad), 1024);
        byte[] out = new byte[(int) encoder.maxEncodedBytes(samples.length)];
        int written = encoder.encode(samples, 0, samples.length, out, 0);
        assertTrue(written >= 0, "status " + written);
        return Arrays.copyOf(out, written);
    }

    private static int[] runs(int... valueAndCount) {
        int total = 0;
        for (int i = 1; i < valueAndCount.length; i += 2) {
            total += valueAndCount[i];
        }
        int[] samples = new int[total];
        int at = 0;
        for (int i = 0; i < valueAndCount.length; i += 2) {
            Arrays.fill(samples, at, at + valueAndCount[i + 1], valueAndCount[i]);
            at += valueAndCount[i + 1];
        }
        return samples;
    }

    private static byte[] hex(String text) {
        return HexFormat.of().parseHex(text);
    }

    @Test
    void shouldFillTheFirstIntervalToAnOctetWhenItEndsMidOctet() {
        // n = 8, J = 8, r = 1: eight 5s, then eight 9s; each interval one zero-block CDS of 13 bits
        // 000 0 00000101 1 | 000 0 00001001 1 (standards.md zero-block, by construction)
        int[] samples = runs(5, 8, 9, 8);
        // off: the second CDS starts at bit 13 -> 00000000 01011000 00000100 11 + stream fill 000000
        assertArrayEquals(hex("005804c0"), encode(8, 8, 1, false, samples));
        // on: three fill bits 000 after bit 12, the second interval starts at octet 2 (libaec pad RSI)
        // -> 00000000 01011 000 | 00000000 10011 000
        assertArrayEquals(hex("00580098"), encode(8, 8, 1, true, samples));
    }

    @Test
    void shouldRepeatTheOneIntervalStreamWhenEveryIntervalIsPadded() {
        // standards.md small vector 1 [verified there against a reference coder]: 16 x 0x1234, n = 16,
        // J = 16, r = 1 -> 0091a4 (22 bits + 2 fill). 32 such samples are two intervals of that CDS.
        int[] samples = runs(0x1234, 32);
        // on: each interval filled to its octet, so the stream is vector 1 twice
        assertArrayEquals(hex("0091a40091a4"), encode(16, 16, 1, true, samples));
        // off: 0000 0 0001001000110100 1, twice, back to back (44 bits + 4 fill), by construction
        assertArrayEquals(hex("0091a4024690"), encode(16, 16, 1, false, samples));
    }

    @Test
    void shouldFillAfterAZeroRunClosedAtTheIntervalEnd() {
        // n = 8, J = 8, r = 2, 32 x 5: each interval a run of 2 zero blocks closed at its end,
        // 000 0 00000101 01 (FS(1) for m = 2, standards.md) = 14 bits; on: 2 fill bits after it
        int[] samples = runs(5, 32);
        assertArrayEquals(hex("00540054"), encode(8, 8, 2, true, samples));
        assertArrayEquals(hex("00540150"), encode(8, 8, 2, false, samples));
    }

    @Test
    void shouldEndAPartialLastIntervalInsideABlockWithTheStreamFill() {
        // n = 8, J = 8, r = 2, 19 x 5: interval 1 as above (14 bits), interval 2 is one block of 3
        // samples padded with the last sample (RiceEncoder contract) = a one-block zero run,
        // 000 0 00000101 1 (13 bits); the end of the data is the end of the stream: one fill only
        int[] samples = runs(5, 19);
        assertArrayEquals(hex("00540058"), encode(8, 8, 2, true, samples));  // 14 + 2 fill + 13 + 3 fill
        assertArrayEquals(hex("00540160"), encode(8, 8, 2, false, samples)); // 14 + 13 + 5 fill
    }

    @Test
    void shouldAddNothingWhenAnIntervalEndsOnAnOctet() {
        // n = 8, J = 8, r = 1, ramp 10..25: each interval is ID (3) + reference (8) + 7 codewords of
        // 3 bits (mapped delta 2, as theta >= 1: FS(2), or the equal-length k = 1 split) = 32 bits,
        // an octet multiple (standards.md mapper; a ramp from 0 would map its first delta to 1)
        int[] samples = new int[16];
        for (int i = 0; i < samples.length; i++) {
            samples[i] = 10 + i;
        }
        byte[] plain = encode(8, 8, 1, false, samples);
        assertEquals(8, plain.length, "2 x 32 bits");
        assertArrayEquals(plain, encode(8, 8, 1, true, samples));
    }

    @Test
    void shouldNotChangeAStreamOfOneInterval() {
        // standards.md small vector 3: 128 x 500, n = 16, J = 16, r = 8 -> 000fa040; one interval, whose
        // end is the stream's end: the interval fill and the end-of-stream fill are the same bits
        int[] samples = runs(500, 128);
        assertArrayEquals(hex("000fa040"), encode(16, 16, 8, true, samples));
        assertArrayEquals(hex("000fa040"), encode(16, 16, 8, false, samples));
    }

    @Test
    void shouldBoundThePaddedStreamWithMaxEncodedBytes() {
        // n = 12, J = 8, r = 1, samples alternating 0 and 4095: every mapped value is x_max = 4095
        // (|delta| = 4095 > theta = 0, standards.md mapper), so every block is "no compression", the
        // shortest option: ID 4 + reference 12 + 7 x 12 = 100 bits, padded to 104 = 13 octets a block
        int[] samples = new int[80];
        for (int i = 1; i < samples.length; i += 2) {
            samples[i] = 4095;
        }
        RiceEncoder encoder = new RiceEncoder(RiceParameters.of(12, 8, 1, true, false, true), 80);
        long bound = encoder.maxEncodedBytes(80);
        // 10 x 100 bits + 7 fill bits per interval, rounded down: (1000 + 70) / 8 = 133
        assertEquals(133, bound);
        byte[] out = new byte[(int) bound];
        assertEquals(10 * 13, encoder.encode(samples, 0, 80, out, 0));
        // the unpadded bound, ceil(1000 / 8) = 125, would be too small: the fill is counted
        assertTrue(10 * 13 > (1000 + 7) / 8);
        // and an output region one octet short of the padded stream is a status, not an exception
        assertEquals(RiceEncoder.STATUS_OUTPUT_TOO_SMALL, encoder.encode(samples, 0, 80, new byte[129], 0));
        // padding off: the same blocks back to back, 125 octets, within the unchanged bound
        RiceEncoder plain = new RiceEncoder(RiceParameters.of(12, 8, 1, true, false, false), 80);
        assertEquals(125, plain.maxEncodedBytes(80));
        assertEquals(125, plain.encode(samples, 0, 80, new byte[125], 0));
    }

    @Test
    void shouldAllocateNothingPerCallWithPadding() {
        // fsw-core rule (DEVELOPERS.md: allocate at start-up only), with AllocationMeter's window rule;
        // r = 1 puts a fill after every block, so the padded path runs 32 times a call
        RiceEncoder encoder = new RiceEncoder(RiceParameters.of(16, 8, 1, true, false, true), 256);
        int[] samples = new int[256];
        for (int i = 0; i < samples.length; i++) {
            samples[i] = (i * 7919) & 0xFFFF;
        }
        byte[] out = new byte[(int) encoder.maxEncodedBytes(256)];
        AllocationMeter.assertAllocationFree(calls -> {
            for (int k = 0; k < calls; k++) {
                encoder.encode(samples, 0, 256, out, 0);
            }
        });
    }
}
