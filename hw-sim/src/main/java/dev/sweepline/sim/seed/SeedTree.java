package dev.sweepline.sim.seed;

import java.util.SplittableRandom;

/**
 * Every random stream of the simulator, derived from one seed by a name and an index, in one place.
 * A run's tree is rooted at its run seed; a campaign's at the campaign seed, whose {@link #member}
 * children are the members' run seeds; a budget's at the budget seed, whose {@link #point} children are
 * the points' run seeds; the link's damage at the fault plan's own seed ({@code serve --fault-seed}),
 * so that the same damage can be laid over other runs.
 *
 * <table>
 * <caption>The streams (γ = {@link #GOLDEN_GAMMA}, mix64 = {@link #mix64}; SR = {@link SplittableRandom})</caption>
 * <tr><th>name</th><th>index</th><th>seed or stream</th><th>used by</th></tr>
 * <tr><td>instrument</td><td>-</td><td>seed·γ + 0x632BE59BD9B4E019</td><td>the simulated instrument's noise</td></tr>
 * <tr><td>boot-challenge</td><td>-</td><td>SR(instrument ^ 0x6368616C).nextLong() &amp; 0xFFFFFFFF</td>
 *     <td>the flight software's recovery challenge on the bench (commands.md §1.4)</td></tr>
 * <tr><td>fluctuation</td><td>series i</td><td>key mix64(mix64(seed) + i·γ)</td><td>the scenario timeline's
 *     series i (0 density, 1 speed, 2 temperature, 3 and 4 flow angles)</td></tr>
 * <tr><td>member</td><td>member k</td><td>child SR(seed).split().nextLong() ^ γ·(k + 1)</td>
 *     <td>campaign ensemble member k, the same for every set</td></tr>
 * <tr><td>ensemble-draws</td><td>-</td><td>SR(seed)</td>
 *     <td>a member's drawn start and event shift, in file order</td></tr>
 * <tr><td>point</td><td>point i</td><td>child seed·1 000 003 + i</td><td>budget point i</td></tr>
 * <tr><td>link-faults</td><td>direction d, kind f</td><td>the f-th split of the d-th split of SR(seed)</td>
 *     <td>one kind of damage ({@link LinkFault}) in one direction ({@link LinkDirection})</td></tr>
 * </table>
 *
 * <p>The formulas are those the streams had before they were gathered here, kept so that every
 * recorded run keeps its bytes (SeedTreeTest holds them). All are SplitMix64, the generator of
 * {@link SplittableRandom} (Steele, Lea and Flood 2014 [memory]): the counter-based keys are its
 * output function over a Weyl sequence of step γ, which is what {@code SplittableRandom.nextLong}
 * computes. Two are weaker than a split would be and are kept for the bytes alone: the instrument
 * seed and the point seeds are linear in their root (budget seed 0 gives points 0, 1, 2, ..., which are
 * also the run seeds of plain bench runs); so the instrument noise of run seed s + 1 is that of s shifted by
 * one draw, and runs of consecutive seeds share most of their noise (statistics over runs take seeds further
 * apart than a run's draws). A new stream takes a new name here, split from its root,
 * never a value another stream already draws.
 *
 * <p>Immutable; thread-safe. Each {@link SplittableRandom} returned is new and belongs to the caller.
 */
public final class SeedTree {
    /** The Weyl step of SplitMix64 and of {@link SplittableRandom}: 2^64 / golden ratio, odd. */
    public static final long GOLDEN_GAMMA = 0x9E3779B97F4A7C15L;
    /** Added to the scaled run seed for the instrument's stream (an odd constant of ours). */
    private static final long INSTRUMENT_OFFSET = 0x632BE59BD9B4E019L;
    /** Mixed into the instrument's seed for the boot challenge: ASCII "chal". */
    private static final long CHALLENGE_TAG = 0x6368616CL;
    /** Multiplier of the budget seed per point (a prime, so points of nearby seeds do not collide). */
    private static final long POINT_MULTIPLIER = 1_000_003L;

    /** The two directions of a link, in the order their streams are split from the fault seed. */
    public enum LinkDirection {
        /** Flight software to electronics: what the instrument server reads. */
        INBOUND,
        /** Electronics to flight software: what the instrument server writes. */
        OUTBOUND
    }

    /** The kinds of link damage, in the order their streams are split from a direction's stream. */
    public enum LinkFault {
        /** A flipped bit. */
        BIT_FLIP,
        /** A lost octet. */
        DROP,
        /** An octet that arrives twice. */
        DUPLICATE,
        /** The stream holding still after an octet. */
        STALL
    }

    private final long seed;

    private SeedTree(long seed) {
        this.seed = seed;
    }

    /** The tree rooted at {@code seed} (a run seed, a campaign or budget seed, or a fault seed). */
    public static SeedTree of(long seed) {
        return new SeedTree(seed);
    }

    /** The root seed; for a run, the seed its scenario timeline is asked with. */
    public long seed() {
        return seed;
    }

    /** Seed of the simulated instrument's noise (preamplifier, HV monitor). */
    public long instrument() {
        return seed * GOLDEN_GAMMA + INSTRUMENT_OFFSET;
    }

    /** The flight software's authentication-recovery challenge on the bench, 32 bits (commands.md §1.4). */
    public long bootChallenge() {
        return new SplittableRandom(instrument() ^ CHALLENGE_TAG).nextLong() & 0xFFFF_FFFFL;
    }

    /** Key of the scenario timeline's fluctuation series {@code series} (a counter-based stream). */
    public long fluctuation(int series) {
        return mix64(mix64(seed) + series * GOLDEN_GAMMA);
    }

    /** The tree of campaign ensemble member {@code member} (0-based); its seed is the member's run seed. */
    public SeedTree member(int member) {
        return new SeedTree(new SplittableRandom(seed).split().nextLong() ^ (GOLDEN_GAMMA * (member + 1)));
    }

    /** The draws of a member's starting plasma and event shift, taken in the campaign file's order. */
    public SplittableRandom ensembleDraws() {
        return new SplittableRandom(seed);
    }

    /** The tree of budget point {@code point} (0-based, in plan order); its seed is the point's run seed. */
    public SeedTree point(int point) {
        return new SeedTree(seed * POINT_MULTIPLIER + point);
    }

    /** The stream of one kind of damage in one direction of the link. */
    public SplittableRandom linkFaults(LinkDirection direction, LinkFault fault) {
        SplittableRandom root = new SplittableRandom(seed);
        SplittableRandom way = root.split();
        for (int d = 0; d < direction.ordinal(); d++) {
            way = root.split();
        }
        SplittableRandom kind = way.split();
        for (int f = 0; f < fault.ordinal(); f++) {
            kind = way.split();
        }
        return kind;
    }

    /**
     * The SplitMix64 output function (Steele, Lea and Flood 2014 [memory]; the finaliser of
     * {@link SplittableRandom}): a bijection that turns a counter into 64 well-mixed bits.
     */
    public static long mix64(long z) {
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }
}
