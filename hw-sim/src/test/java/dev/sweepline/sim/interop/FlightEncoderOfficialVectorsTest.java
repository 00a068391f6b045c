package dev.sweepline.sim.interop;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.rice.DecodeResult;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.TestFactory;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every raw file of the official CCSDS 121.0-B test set (README of ../shared/vectors/ccsds-121), coded
 * by the flight encoder with the parameters of each of its .rz forms, must decode back to the raw
 * file bit-exactly with the independent ground decoder and with the reference coder aec.
 */
class FlightEncoderOfficialVectorsTest {
    /**
     * Without the official set the whole class is skipped by an assumption, so the runner counts and
     * names the skip (an aborted test factory alone would report nothing).
     */
    @BeforeAll
    static void requireTheOfficialTestSet() {
        Ccsds121TestSet.folderOrSkip();
    }


    @TempDir
    Path temp;

    @TestFactory
    Stream<DynamicTest> shouldDecodeTheFlightEncodingOfEveryRawFileWithTheGroundDecoder() {
        return Ccsds121TestSet.vectors().stream().map(v -> DynamicTest.dynamicTest(v.name(), () -> {
            int[] raw = v.samples();
            byte[] ours = RiceChain.encode(raw, v.bitsPerSample(), v.blockSize(), v.intervalBlocks(), v.restricted(),
                    true, false);
            int[] back = new int[raw.length];
            DecodeResult result = RiceChain.decode(ours, raw.length, back, v.bitsPerSample(), v.blockSize(),
                    v.intervalBlocks(), v.restricted(), true, false);
            assertTrue(result.ok(), result.describe());
            assertArrayEquals(raw, back); // lossless: exact
            // our per-block choice is the shortest option, so the stream is no longer than the
            // official one (README: an encoder may choose differently, so bytes are not compared)
            assertTrue(ours.length <= v.compressedBytes().length,
                    "flight " + ours.length + " bytes vs official " + v.compressedBytes().length);
        }));
    }

    @TestFactory
    Stream<DynamicTest> shouldDecodeTheFlightEncodingOfEveryRawFileWithAec() {
        AecTool aec = AecTool.onPathOrSkip(temp);
        return Ccsds121TestSet.vectors().stream().map(v -> DynamicTest.dynamicTest(v.name(), () -> {
            int[] raw = v.samples();
            byte[] ours = RiceChain.encode(raw, v.bitsPerSample(), v.blockSize(), v.intervalBlocks(), v.restricted(),
                    true, false);
            int[] back = aec.decode(ours, v.bitsPerSample(), v.blockSize(), v.intervalBlocks(), v.restricted(),
                    true, false);
            // aec writes whole reference intervals; the raw files are whole intervals already
            assertArrayEquals(raw, Arrays.copyOf(back, raw.length));
        }));
    }
}
