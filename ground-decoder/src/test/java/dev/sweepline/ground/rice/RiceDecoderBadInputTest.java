package dev.sweepline.ground.rice;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HexFormat;
import java.util.List;
import java.util.Random;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Bad input is a status with a reason and a bit position, never an exception (style.md habit 7). */
class RiceDecoderBadInputTest {

    /** Seed of the garbage test, recorded so a failure can be replayed. */
    private static final long GARBAGE_SEED = 0x5EED_121L;

    private static void assertTruncatedEverywhere(byte[] stream, RiceSettings settings, int count) {
        RiceDecoder decoder = new RiceDecoder(settings);
        int[] out = new int[count];
        for (int length = 0; length < stream.length; length++) {
            DecodeResult result = decoder.decode(stream, 0, length, count, out);
            // every byte of a minimal stream carries data bits (only the last has fill), so each
            // shorter prefix must end inside a CDS (CCSDS 121.0-B end of stream: zero-fill to a byte)
            assertEquals(DecodeStatus.TRUNCATED, result.status(), "prefix of " + length + " bytes: " + result.describe());
            assertTrue(result.bitPosition() <= length * 8L, "position inside the prefix");
            assertTrue(result.samplesDecoded() < count, "not all samples from a prefix");
        }
    }

    @TestFactory
    Stream<DynamicTest> shouldReportTruncationAtEveryByteOfEveryOfficialStream() {
        List<Ccsds121TestSet.Vector> vectors = Ccsds121TestSet.vectors();
        return vectors.stream().map(v -> DynamicTest.dynamicTest(v.name(), () -> assertTruncatedEverywhere(
                v.compressedBytes(),
                new RiceSettings(v.bitsPerSample(), v.blockSize(), v.intervalBlocks(), true, v.restricted(), false),
                v.samples().length)));
    }

    @Test
    void shouldReportTruncationAtEveryByteOfTheSmallVectors() {
        // standards.md small vectors, n = 16, J = 16
        assertTruncatedEverywhere(HexFormat.of().parseHex("0091a4"), RiceSettings.basic(16, 16, 1), 16);
        assertTruncatedEverywhere(HexFormat.of().parseHex("103e82492492492480"), RiceSettings.basic(16, 16, 1), 16);
        assertTruncatedEverywhere(HexFormat.of().parseHex("000fa040"), RiceSettings.basic(16, 16, 8), 128);
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource({
        // n = 4 basic: 3-bit ID 110 = split k = 5, not below n = 4 (no valid encoder sends it)
        "'invalid ID', 4, 1, c0, 16, INVALID_OPTION_ID, 0",
        // n = 16, r = 2: 00000 + ref + FS(2) = 3 zero blocks, but 2 blocks are left in the interval
        "'run past interval', 16, 2, 000001, 64, ZERO_RUN_BEYOND_SEGMENT, 21",
        // n = 16: zero-block ID + ref, then more than 64 zeros: no run is longer than a segment
        "'endless zero run', 16, 1, 0000000000000000000000000000, 16, FS_TOO_LONG, 21",
        // n = 8: ID 001 (FS) + ref, then 309 zeros (> 255): a mapped 8-bit value is at most 255
        "'endless FS', 8, 1, 20000000000000000000000000000000000000000000000000000000000000000000000000000000, 16, FS_TOO_LONG, 11",
        // n = 8: ID 000 + '1' (second extension) + ref 0x00, FS(2): gamma 2 = pair (1, 0); the first
        // pair of a reference block must have delta_a = 0 (standards.md)
        "'bad reference pair', 8, 1, 10 00 80, 16, VALUE_OUT_OF_RANGE, 12",
    })
    void shouldNameTheFaultAndItsBitPosition(String what, int n, int r, String hex, int count,
                                            DecodeStatus expected, long bit) {
        byte[] stream = HexFormat.of().parseHex(hex.replace(" ", ""));
        DecodeResult result = new RiceDecoder(RiceSettings.basic(n, 16, r))
                .decode(stream, 0, stream.length, count, new int[count]);
        assertEquals(expected, result.status(), result.describe());
        assertEquals(bit, result.bitPosition(), "bit position of the faulty field (by construction above)");
    }

    @Test
    void shouldReturnAStatusForRandomGarbage() {
        Random random = new Random(GARBAGE_SEED);
        int[] out = new int[4096];
        int failures = 0;
        for (int trial = 0; trial < 2000; trial++) {
            int n = 1 + random.nextInt(32);
            boolean restricted = n <= 4 && random.nextBoolean();
            // odd trials read the garbage as padded intervals; the parity keeps the seeded draws as they were
            RiceSettings settings = new RiceSettings(n, 8 << random.nextInt(4), 1 + random.nextInt(200),
                    random.nextBoolean(), restricted, (trial & 1) == 1);
            byte[] garbage = new byte[random.nextInt(300)];
            random.nextBytes(garbage);
            int count = random.nextInt(out.length);
            DecodeResult result = new RiceDecoder(settings).decode(garbage, 0, garbage.length, count, out);
            assertNotNull(result.status());
            assertTrue(result.samplesDecoded() <= count);
            assertTrue(result.bitPosition() <= garbage.length * 8L);
            failures += result.ok() ? 0 : 1;
        }
        // random bytes are mostly not a valid stream for thousands of samples; a decoder that reports
        // nothing would be suspect (common practice: a fuzz check should see its error paths)
        assertTrue(failures > 1000, "garbage rejected in " + failures + " of 2000 trials");
    }

    @Test
    void shouldRefuseArgumentsOutsideTheArrays() {
        RiceDecoder decoder = new RiceDecoder(RiceSettings.basic(16, 16, 1));
        // API contract of RiceDecoder.decode
        assertEquals(DecodeStatus.BAD_ARGUMENTS, decoder.decode(new byte[4], 2, 3, 1, new int[1]).status());
        assertEquals(DecodeStatus.BAD_ARGUMENTS, decoder.decode(new byte[4], 0, 4, 2, new int[1]).status());
        assertEquals(DecodeStatus.BAD_ARGUMENTS, decoder.decode(null, 0, 0, 0, new int[1]).status());
    }
}
