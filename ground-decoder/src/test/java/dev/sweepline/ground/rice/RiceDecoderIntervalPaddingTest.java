package dev.sweepline.ground.rice;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.HexFormat;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Reading streams whose reference sample intervals are each zero-filled to an octet
 * ({@link RiceSettings#padIntervalsToOctet()}), on streams written out bit by bit.
 *
 * <p>Sources of the check values. The coded data sets follow standards.md (CCSDS 121.0-B section): a
 * zero-block CDS is the all-zero ID plus '0' (3-bit ID for n at most 8, 4-bit for 8 &lt; n &lt;= 16),
 * the reference sample in n bits, then FS(m - 1) for a run of m blocks (m = 1..4), a run closed at
 * an interval end. The padding - zero bits from the end of an interval's last CDS to the next octet -
 * is libaec's "pad RSI" flag, AEC_PAD_RSI ({@code aec -p}) [read: libaec decode.c {@code m_next_cds},
 * which drops the bits to the octet boundary when an interval is complete]. CCSDS 121.0-B-3 defines,
 * as far as we remember, no such option - only the zero fill at the end of the coded stream - and
 * libaec.h says the flag "violates the standard" and serves to decode some CCSDS sample data [memory
 * for the standard; read for libaec.h]. The aec cross-check is hw-sim's
 * {@code AecPaddedIntervalsCrossCheckTest}. Lossless: samples are compared exactly.
 */
class RiceDecoderIntervalPaddingTest {

    private static RiceSettings settings(int n, int blockSize, int intervalBlocks, boolean pad) {
        return new RiceSettings(n, blockSize, intervalBlocks, true, false, pad);
    }

    private static DecodeResult decode(String hex, RiceSettings settings, int[] out) {
        byte[] stream = HexFormat.of().parseHex(hex);
        return new RiceDecoder(settings).decode(stream, 0, stream.length, out.length, out);
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

    @ParameterizedTest(name = "{0}")
    @CsvSource({
        // n = 8, J = 8, r = 1: 8 x 5 then 8 x 9, each interval 000 0 <ref> 1 (13 bits);
        // padded: 00000000 01011 000 | 00000000 10011 000; plain: the second CDS at bit 13
        "'two one-block intervals, padded', 8, 8, 1, true, 00580098, 5, 8, 9, 8",
        "'two one-block intervals, plain', 8, 8, 1, false, 005804c0, 5, 8, 9, 8",
        // standards.md small vector 1 (16 x 0x1234, n = 16, J = 16, r = 1 -> 0091a4) twice: padded,
        // each interval is that stream; plain, the 22-bit CDS twice back to back
        "'vector 1 twice, padded', 16, 16, 1, true, 0091a40091a4, 4660, 32, , ",
        "'vector 1 twice, plain', 16, 16, 1, false, 0091a4024690, 4660, 32, , ",
        // n = 8, J = 8, r = 2: 32 x 5, each interval a 2-block run 000 0 00000101 01 (14 bits) + 2 fill
        "'zero runs to the interval ends, padded', 8, 8, 2, true, 00540054, 5, 32, , ",
        "'zero runs to the interval ends, plain', 8, 8, 2, false, 00540150, 5, 32, , ",
        // 19 x 5: the last interval is 3 samples of one block (13 bits), then only the stream fill
        "'partial last interval, padded', 8, 8, 2, true, 00540058, 5, 19, , ",
        "'partial last interval, plain', 8, 8, 2, false, 00540160, 5, 19, , ",
    })
    void shouldDecodeTheHandWrittenStreams(String what, int n, int j, int r, boolean pad, String hex,
                                           int value, int count, Integer secondValue, Integer secondCount) {
        int[] expected = secondValue == null ? runs(value, count) : runs(value, count, secondValue, secondCount);
        int[] out = new int[expected.length];
        DecodeResult result = decode(hex, settings(n, j, r, pad), out);
        assertTrue(result.ok(), result.describe());
        assertArrayEquals(expected, out);
    }

    @Test
    void shouldStopAtTheEndOfTheLastCodedDataSetNotItsFill() {
        // vector 1 twice, padded: interval 2 starts at octet 3 (bit 24) and its CDS is 22 bits long, so
        // decoding ends at bit 46; the 2 fill bits after it are the stream's and are not read
        int[] out = new int[32];
        DecodeResult result = decode("0091a40091a4", settings(16, 16, 1, true), out);
        assertTrue(result.ok(), result.describe());
        assertEquals(24 + 22, result.bitPosition());
    }

    @Test
    void shouldReportAOneInTheIntervalFill() {
        // the fill of interval 1 is bits 22 and 23 (vector 1's CDS is 22 bits); 0xa5 sets bit 23. The
        // padding is zero bits (libaec pad RSI; CCSDS 121.0-B fill is zero), so this is a fault
        int[] out = new int[32];
        DecodeResult result = decode("0091a50091a4", settings(16, 16, 1, true), out);
        assertEquals(DecodeStatus.INTERVAL_FILL_NOT_ZERO, result.status(), result.describe());
        assertEquals(22, result.bitPosition(), "the fill starts right after the first CDS");
        assertEquals(16, result.samplesDecoded(), "the first interval was decoded");
    }

    @Test
    void shouldReportAStreamThatEndsAfterTheFill() {
        // one padded interval of the two asked for: the second one's ID is missing at bit 24
        int[] out = new int[32];
        DecodeResult result = decode("0091a4", settings(16, 16, 1, true), out);
        assertEquals(DecodeStatus.TRUNCATED, result.status(), result.describe());
        assertEquals(24, result.bitPosition());
    }

    @Test
    void shouldRefuseAPaddedStreamReadAsPlain() {
        // 00580098 read without padding: after interval 1 (bits 0-12) the next CDS is taken from bit
        // 13: ID 000 (the fill), '0' (bit 16) = zero block, reference bits 17-24 = 00000001, then
        // FS(2) from bit 25 = a run of 3 blocks where the interval has 1 left (by construction above).
        // A stream and its settings must agree; that is why the ICD names the option.
        int[] out = new int[16];
        DecodeResult result = decode("00580098", settings(8, 8, 1, false), out);
        assertEquals(DecodeStatus.ZERO_RUN_BEYOND_SEGMENT, result.status(), result.describe());
        assertEquals(25, result.bitPosition());
    }
}
