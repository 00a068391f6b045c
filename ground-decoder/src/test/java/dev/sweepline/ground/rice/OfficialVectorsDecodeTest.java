package dev.sweepline.ground.rice;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;

/**
 * Decodes every .rz of the official CCSDS 121.0-B test set (README of ../shared/vectors/ccsds-121)
 * and compares with its .dat: bit-exact, no tolerance, since the coding is lossless.
 */
class OfficialVectorsDecodeTest {

    @TestFactory
    Stream<DynamicTest> shouldDecodeEveryOfficialStreamToItsRawFile() {
        List<Ccsds121TestSet.Vector> vectors = Ccsds121TestSet.vectors();
        // README layout: 32 AllOptions n, 4 of them in two forms, + 3 LowEntropy sets x 12 forms
        assertEquals(36 + 36, vectors.size(), "files found in the test set");
        return vectors.stream().map(v -> DynamicTest.dynamicTest(v.name(), () -> {
            int[] expected = v.samples();
            byte[] stream = v.compressedBytes();
            RiceDecoder decoder = new RiceDecoder(new RiceSettings(v.bitsPerSample(), v.blockSize(),
                    v.intervalBlocks(), true, v.restricted()));
            int[] decoded = new int[expected.length];
            DecodeResult result = decoder.decode(stream, 0, stream.length, expected.length, decoded);
            assertTrue(result.ok(), result.describe());
            assertArrayEquals(expected, decoded);
            // the whole stream is used: what is left after the last CDS is fill, fewer than 8 bits
            assertTrue(stream.length * 8L - result.bitPosition() < 8,
                    "unused bits after the last CDS: " + (stream.length * 8L - result.bitPosition()));
        }));
    }
}
