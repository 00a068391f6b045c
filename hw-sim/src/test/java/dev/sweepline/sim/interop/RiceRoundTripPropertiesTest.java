package dev.sweepline.sim.interop;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.rice.DecodeResult;
import java.util.Arrays;
import java.util.Random;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/**
 * Round trip flight encoder -&gt; ground decoder over the whole parameter space of CCSDS 121.0-B
 * (n = 1..32, J = 8..64, r, restricted set for n &lt;= 4, preprocessing on and off). Lossless, so
 * equality is exact. Seeds are recorded in the annotations so a failure replays.
 */
class RiceRoundTripPropertiesTest {

    /** Data shapes that drive every code option. */
    enum Shape {
        /** Uniform over the whole range: maximal entropy, no compression wins. */
        MAX_ENTROPY,
        /** A random walk with steps of a random width: split-sample at many k. */
        RANDOM_WALK,
        /** One value throughout: zero-block runs and ROS. */
        CONSTANT,
        /** Constant stretches of random length with bursts: zero runs of many lengths. */
        ZERO_RUNS,
        /** Jumps between 0, x_max and their neighbours: the mapper's "otherwise" branch at both ends. */
        EXTREMES,
        /** Tiny steps: second extension and the fundamental sequence. */
        LOW_ENTROPY
    }

    /** One generated case; {@code seed} makes the samples. */
    record Case(int n, int blockSize, int intervalBlocks, boolean restricted, boolean preprocessed,
                Shape shape, int count, long seed) {
        int[] samples() {
            Random random = new Random(seed);
            long max = (1L << n) - 1;
            int[] s = new int[count];
            switch (shape) {
                case MAX_ENTROPY:
                    return TestSignals.uniform(random, count, n);
                case CONSTANT:
                    Arrays.fill(s, (int) (random.nextLong() & max));
                    return s;
                case ZERO_RUNS:
                    return TestSignals.zeroRuns(random, count, n, blockSize);
                case EXTREMES:
                    long[] levels = {0, 1, max - 1, max, max / 2};
                    for (int i = 0; i < count; i++) {
                        s[i] = (int) Math.max(0, levels[random.nextInt(levels.length)]);
                    }
                    return s;
                case RANDOM_WALK:
                case LOW_ENTROPY:
                    int stepBits = shape == Shape.LOW_ENTROPY ? 1 : 1 + random.nextInt(n);
                    long x = random.nextLong() & max;
                    for (int i = 0; i < count; i++) {
                        long step = (random.nextLong() & ((1L << stepBits) - 1)) - (1L << (stepBits - 1));
                        x = Math.max(0, Math.min(max, x + (shape == Shape.LOW_ENTROPY && random.nextInt(4) > 0 ? 0 : step)));
                        s[i] = (int) x;
                    }
                    return s;
                default:
                    throw new IllegalStateException("unknown shape " + shape);
            }
        }
    }

    @Provide
    Arbitrary<Case> cases() {
        Arbitrary<Integer> n = Arbitraries.integers().between(1, 32);
        Arbitrary<Integer> j = Arbitraries.of(8, 16, 32, 64);
        // r near the segment length (64) and the limit (4096) as well as small ones
        Arbitrary<Integer> r = Arbitraries.oneOf(Arbitraries.integers().between(1, 70),
                Arbitraries.of(63, 64, 65, 127, 128, 129, 4096));
        Arbitrary<Boolean> flag = Arbitraries.of(true, false);
        Arbitrary<Shape> shape = Arbitraries.of(Shape.class);
        // up to 300 blocks' worth, not always whole blocks (the encoder pads the last block)
        Arbitrary<Integer> count = Arbitraries.integers().between(1, 300 * 8);
        Arbitrary<Long> seed = Arbitraries.longs();
        return Combinators.combine(n, j, r, flag, flag, shape, count, seed)
                .as((bits, block, interval, restricted, pre, sh, c, s) ->
                        new Case(bits, block, interval, restricted && bits <= 4, pre, sh, c, s));
    }

    @Property(tries = 600, seed = "121020126")
    void shouldGiveBackEverySampleExactly(@ForAll("cases") Case c) {
        int[] samples = c.samples();
        byte[] stream = RiceChain.encode(samples, c.n(), c.blockSize(), c.intervalBlocks(), c.restricted(),
                c.preprocessed(), false);
        int[] back = new int[samples.length];
        DecodeResult result = RiceChain.decode(stream, samples.length, back, c.n(), c.blockSize(),
                c.intervalBlocks(), c.restricted(), c.preprocessed(), false);
        assertTrue(result.ok(), result.describe());
        assertArrayEquals(samples, back);
        // the stream is used to its last CDS; only the zero fill (< 8 bits) is left (CCSDS 121.0-B end of stream)
        assertTrue(stream.length * 8L - result.bitPosition() < 8);
    }

    @Property(tries = 300, seed = "4096064")
    void shouldNeverBeLongerThanNoCompressionOfEveryBlock(@ForAll("cases") Case c) {
        int[] samples = c.samples();
        byte[] stream = RiceChain.encode(samples, c.n(), c.blockSize(), c.intervalBlocks(), c.restricted(),
                c.preprocessed(), false);
        long blocks = (samples.length + c.blockSize() - 1) / c.blockSize();
        int idBits = c.restricted() ? (c.n() <= 2 ? 1 : 2) : c.n() <= 8 ? 3 : c.n() <= 16 ? 4 : 5;
        // the option with the fewest bits is chosen per block (standards.md), and no compression is
        // always available: ID + J n-bit fields per block (the reference sample is one of them)
        long bound = (blocks * (idBits + (long) c.blockSize() * c.n()) + 7) / 8;
        assertTrue(stream.length <= bound, stream.length + " > " + bound);
    }
}
