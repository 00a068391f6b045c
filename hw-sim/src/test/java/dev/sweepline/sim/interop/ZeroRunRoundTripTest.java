package dev.sweepline.sim.interop;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.rice.DecodeResult;
import java.nio.file.Path;
import java.util.Arrays;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * All-zero block runs of every length 1..130 at every kind of place: a run closes at a non-zero
 * block, at a segment end (64 blocks), at an interval end or at the end of the data, and is coded
 * FS(m-1) for m = 1..4, FS(m) for m &gt;= 5, or ROS (standards.md, zero-block). Exhaustive rather than
 * random, because the boundary cases are few and each must work. With and without padding of each
 * reference sample interval to an octet, since a run closed at an interval end is followed by the fill.
 */
class ZeroRunRoundTripTest {
    private static final int N = 16;
    private static final int J = 8;
    /** Run starts: interval start, just after it, and so that runs straddle or end at block 64. */
    private static final int[] STARTS = {0, 1, 59, 60, 63, 64};
    /** Intervals shorter than, equal to, between and beyond segment multiples, and the largest. */
    private static final int[] INTERVALS = {1, 5, 64, 100, 128, 4096};

    @TempDir
    Path temp;

    /** A ramp of {@code start} blocks, then {@code run} constant blocks, then optionally one ramp block. */
    static int[] runSignal(int start, int run, boolean trailingData) {
        int total = start + run + (trailingData ? 1 : 0);
        int[] samples = new int[total * J];
        for (int i = 0; i < start * J; i++) {
            samples[i] = 1000 + i; // mapped value 2 everywhere: never a zero block
        }
        int level = start == 0 ? 777 : samples[start * J - 1];
        Arrays.fill(samples, start * J, (start + run) * J, level);
        for (int i = (start + run) * J; i < samples.length; i++) {
            samples[i] = 3 * i;
        }
        return samples;
    }

    @Test
    void shouldRoundTripEveryRunLengthAtEveryBoundaryWithTheGroundDecoder() {
        int cases = 0;
        for (boolean pad : new boolean[] {false, true}) {
            for (int interval : INTERVALS) {
                for (int start : STARTS) {
                    for (int run = 1; run <= 130; run++) {
                        for (boolean trailing : new boolean[] {true, false}) {
                            int[] samples = runSignal(start, run, trailing);
                            byte[] stream = RiceChain.encode(samples, N, J, interval, false, true, pad);
                            int[] back = new int[samples.length];
                            DecodeResult result = RiceChain.decode(stream, samples.length, back, N, J, interval,
                                    false, true, pad);
                            String where = "interval " + interval + " start " + start + " run " + run
                                    + " trailing " + trailing + " padded " + pad;
                            assertTrue(result.ok(), where + ": " + result.describe());
                            assertArrayEquals(samples, back, where);
                            cases++;
                        }
                    }
                }
            }
        }
        assertEquals(2 * 6 * 6 * 130 * 2, cases);
    }

    @Test
    void shouldAgreeWithAecOnRunsAroundTheBoundaries() throws Exception {
        AecTool aec = AecTool.onPathOrSkip(temp);
        // the run lengths where the code changes (4/5: FS(m-1) -> FS(m); 63/64/65: segment end; 128/129)
        for (int interval : new int[] {5, 64, 100, 128}) {
            for (int start : new int[] {0, 60}) {
                for (int run : new int[] {1, 2, 4, 5, 6, 63, 64, 65, 128, 129}) {
                    for (boolean trailing : new boolean[] {true, false}) {
                        int[] samples = runSignal(start, run, trailing);
                        String where = "interval " + interval + " start " + start + " run " + run + " trailing " + trailing;
                        byte[] ours = RiceChain.encode(samples, N, J, interval, false, true, false);
                        int[] viaAec = aec.decode(ours, N, J, interval, false, true, false);
                        assertArrayEquals(samples, Arrays.copyOf(viaAec, samples.length), "ours -> aec, " + where);
                        // the padded stream too, read by aec -d -p (the fill after a run closed at an interval end)
                        byte[] oursPadded = RiceChain.encode(samples, N, J, interval, false, true, true);
                        int[] viaAecPadded = aec.decode(oursPadded, N, J, interval, false, true, true);
                        assertArrayEquals(samples, Arrays.copyOf(viaAecPadded, samples.length),
                                "ours padded -> aec -p, " + where);
                        byte[] theirs = aec.encode(samples, N, J, interval, false, true, false);
                        int[] viaGround = new int[samples.length];
                        DecodeResult result = RiceChain.decode(theirs, samples.length, viaGround, N, J, interval,
                                false, true, false);
                        assertTrue(result.ok(), "aec -> ground, " + where + ": " + result.describe());
                        assertArrayEquals(samples, viaGround, "aec -> ground, " + where);
                    }
                }
            }
        }
    }
}
