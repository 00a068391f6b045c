package dev.sweepline.sim.seed;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.sim.seed.SeedTree.LinkDirection;
import dev.sweepline.sim.seed.SeedTree.LinkFault;
import java.util.HashSet;
import java.util.Set;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The seed tree (seed design note SD1-SD3). The expected values are the derivations the streams had
 * before the tree existed, written out here as they were written in the bench, the campaign, the
 * budget, the scenario timeline and the link's fault injection; equal values mean equal runs.
 */
class SeedTreeTest {
    /** Seeds of the demo runs and tests (1, 3, 5, 7, 11, 77), the extremes and a negative one. */
    private static final long[] SEEDS = {0, 1, 3, 5, 7, 11, 77, 20261201, -5, Long.MIN_VALUE, Long.MAX_VALUE};
    private static final long GAMMA = 0x9E3779B97F4A7C15L;

    @Test
    void shouldKeepTheInstrumentAndBootChallengeSeedsOfTheBench() {
        for (long seed : SEEDS) {
            // as ClosedLoopBench.instrumentSeed and the bench's boot challenge were written
            long instrument = seed * 0x9E3779B97F4A7C15L + 0x632BE59BD9B4E019L;
            long challenge = new SplittableRandom(instrument ^ 0x6368616CL).nextLong() & 0xFFFF_FFFFL;
            assertEquals(instrument, SeedTree.of(seed).instrument(), "seed " + seed);
            assertEquals(challenge, SeedTree.of(seed).bootChallenge(), "seed " + seed);
        }
        // recorded from sweepline-bench.jar before the tree (the flight software's authenticator, 0.5 s runs)
        assertEquals(0x4bd44f48L, SeedTree.of(1).bootChallenge());
        assertEquals(0x503ebe6fL, SeedTree.of(2).bootChallenge());
        assertEquals(0xa2ee9d0eL, SeedTree.of(77).bootChallenge());
        assertEquals(0xc4354a6bL, SeedTree.of(-5).bootChallenge());
    }

    @Test
    void shouldKeepTheFluctuationKeysOfTheScenarioTimeline() {
        for (long seed : SEEDS) {
            for (int series = 0; series < 5; series++) {
                // as OrnsteinUhlenbeckSeries derived its key from (seed, stream)
                long key = mix64(mix64(seed) + series * GAMMA);
                assertEquals(key, SeedTree.of(seed).fluctuation(series), seed + "/" + series);
            }
        }
    }

    @Test
    void shouldKeepTheCampaignMemberSeedsAndDraws() {
        for (long seed : SEEDS) {
            for (int run = 0; run < 20; run++) {
                // as CampaignSpec.runSeed and member were written
                long runSeed = new SplittableRandom(seed).split().nextLong() ^ (0x9E3779B97F4A7C15L * (run + 1));
                SeedTree member = SeedTree.of(seed).member(run);
                assertEquals(runSeed, member.seed(), seed + "/" + run);
                SplittableRandom expected = new SplittableRandom(runSeed);
                SplittableRandom actual = member.ensembleDraws();
                for (int k = 0; k < 8; k++) {
                    assertEquals(expected.nextLong(), actual.nextLong());
                }
            }
        }
    }

    @Test
    void shouldKeepTheBudgetPointSeeds() {
        for (long seed : SEEDS) {
            for (int point = 0; point < 40; point++) {
                // as BudgetRunner derived each point's seed
                assertEquals(seed * 1_000_003L + point, SeedTree.of(seed).point(point).seed());
            }
        }
    }

    @Test
    void shouldKeepTheLinkFaultStreams() {
        for (long seed : SEEDS) {
            // as FaultyTransport split the directions and FaultInjector split the kinds
            SplittableRandom root = new SplittableRandom(seed);
            SplittableRandom[] ways = {root.split(), root.split()};
            for (LinkDirection d : LinkDirection.values()) {
                SplittableRandom way = ways[d.ordinal()];
                SplittableRandom[] kinds = {way.split(), way.split(), way.split(), way.split()};
                for (LinkFault f : LinkFault.values()) {
                    SplittableRandom actual = SeedTree.of(seed).linkFaults(d, f);
                    for (int k = 0; k < 8; k++) {
                        assertEquals(kinds[f.ordinal()].nextDouble(), actual.nextDouble(), seed + " " + d + " " + f);
                    }
                }
            }
        }
    }

    @Test
    void shouldGiveEveryStreamOfOneSeedItsOwnValues() {
        for (long seed : SEEDS) {
            SeedTree t = SeedTree.of(seed);
            Set<Long> streams = new HashSet<>();
            streams.add(t.instrument());
            for (int i = 0; i < 5; i++) {
                streams.add(t.fluctuation(i));
            }
            for (LinkDirection d : LinkDirection.values()) {
                for (LinkFault f : LinkFault.values()) {
                    streams.add(t.linkFaults(d, f).nextLong());
                }
            }
            // 1 + 5 + 8 streams of one run, none sharing a value with another
            assertEquals(14, streams.size(), "seed " + seed);
            Set<Long> members = new HashSet<>();
            Set<Long> points = new HashSet<>();
            for (int i = 0; i < 20; i++) {
                members.add(t.member(i).seed());
                points.add(t.point(i).seed());
            }
            assertEquals(20, members.size(), "members of seed " + seed);
            assertEquals(20, points.size(), "points of seed " + seed);
        }
        assertNotEquals(SeedTree.of(1).instrument(), SeedTree.of(2).instrument());
        assertNotEquals(SeedTree.of(1).fluctuation(0), SeedTree.of(2).fluctuation(0));
        assertNotEquals(SeedTree.of(1).member(0).seed(), SeedTree.of(2).member(0).seed());
    }

    @Test
    void shouldBeSplittableRandomsGenerator() {
        // java.util.SplittableRandom: nextLong() = mix64(seed += GOLDEN_GAMMA) (its source and
        // Steele, Lea and Flood 2014): the counter-based keys are its k-th output
        for (long seed : SEEDS) {
            SplittableRandom r = new SplittableRandom(seed);
            for (int k = 1; k <= 16; k++) {
                assertEquals(r.nextLong(), SeedTree.mix64(seed + k * SeedTree.GOLDEN_GAMMA));
            }
        }
        assertTrue((SeedTree.GOLDEN_GAMMA & 1) == 1, "a Weyl step must be odd to visit every counter");
    }

    @Test
    void shouldDrawTheInstrumentNoiseOfConsecutiveSeedsFromOneStreamShiftedByOne() {
        // instrument(s + 1) = instrument(s) + GOLDEN_GAMMA, and SplittableRandom steps its seed by the same
        // GOLDEN_GAMMA before each output (its source; shouldBeSplittableRandomsGenerator): run seed s + 1 draws
        // run seed s's numbers from the second on, so runs of consecutive seeds share most of their noise
        // (docs/focus-design.md, "The interleaved order and the χ² check")
        for (long seed : SEEDS) {
            SplittableRandom s = new SplittableRandom(SeedTree.of(seed).instrument());
            SplittableRandom next = new SplittableRandom(SeedTree.of(seed + 1).instrument());
            s.nextLong();
            for (int k = 0; k < 16; k++) {
                assertEquals(s.nextLong(), next.nextLong(), "seed " + seed + ", draw " + k);
            }
        }
    }

    /** The SplitMix64 finaliser as OrnsteinUhlenbeckSeries had it (an independent copy). */
    private static long mix64(long z) {
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }
}
