package dev.sweepline.sim.interop;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.rice.DecodeResult;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import java.util.stream.Stream;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Cross-check with the reference coder of standards.md (Debian libaec-tools 1.0.6, {@code aec}):
 * the flight encoder's streams decoded by {@code aec -d}, and aec's streams decoded by the ground
 * decoder, must give back the samples exactly (lossless, so no tolerance). Streams are compared by
 * decoding, not byte for byte (standards.md). Skipped where aec is not on PATH.
 */
class AecCrossCheckTest {
    /** Base seed of the test signals, recorded; each case adds its parameters to it. */
    private static final long SEED = 20261201L;

    @TempDir
    Path temp;

    static Stream<Arguments> cases() {
        List<Arguments> cases = new ArrayList<>();
        // sample widths n = 8, 12, 16 (the spectra's 16 bits and two narrower) and every block size of
        // CCSDS 121.0-B, J = 8, 16, 32, 64 (standards.md); r = 5 (short intervals, a partial last
        // one) and r = 128 (intervals longer than a 64-block segment, so ROS meets segment ends)
        for (int n : new int[] {8, 12, 16}) {
            for (int j : new int[] {8, 16, 32, 64}) {
                for (int r : new int[] {5, 128}) {
                    for (TestSignals.Kind signal : TestSignals.Kind.values()) {
                        cases.add(Arguments.of(n, j, r, signal));
                    }
                }
            }
        }
        return cases.stream();
    }

    private static int[] signal(int n, int j, int r, TestSignals.Kind signal) {
        Random random = new Random(SEED + 1000L * n + 10L * j + r + signal.ordinal());
        // whole blocks (aec pads a partial block with repeats); 2.6 intervals for r = 5, 1.6 for r = 128
        int blocks = r == 5 ? 13 : 205;
        int count = blocks * j;
        return TestSignals.of(signal, random, count, n, j);
    }

    @ParameterizedTest(name = "n={0} J={1} r={2} {3}")
    @MethodSource("cases")
    void shouldDecodeTheFlightStreamWithAec(int n, int j, int r, TestSignals.Kind kind) throws Exception {
        AecTool aec = AecTool.onPathOrSkip(temp);
        int[] samples = signal(n, j, r, kind);
        byte[] ours = RiceChain.encode(samples, n, j, r, false, true, false);
        int[] back = aec.decode(ours, n, j, r, false, true, false);
        // aec -d writes whole reference intervals (it pads the last one), so compare the data part
        assertTrue(back.length >= samples.length, "aec gave " + back.length + " of " + samples.length);
        assertArrayEquals(samples, Arrays.copyOf(back, samples.length));
    }

    @ParameterizedTest(name = "n={0} J={1} r={2} {3}")
    @MethodSource("cases")
    void shouldDecodeTheAecStreamWithTheGroundDecoder(int n, int j, int r, TestSignals.Kind kind) throws Exception {
        AecTool aec = AecTool.onPathOrSkip(temp);
        int[] samples = signal(n, j, r, kind);
        byte[] theirs = aec.encode(samples, n, j, r, false, true, false);
        int[] back = new int[samples.length];
        DecodeResult result = RiceChain.decode(theirs, samples.length, back, n, j, r, false, true, false);
        assertTrue(result.ok(), result.describe());
        assertArrayEquals(samples, back);
    }
}
