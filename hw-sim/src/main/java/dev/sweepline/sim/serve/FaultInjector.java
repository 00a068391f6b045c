package dev.sweepline.sim.serve;

import dev.sweepline.sim.seed.SeedTree;
import dev.sweepline.sim.seed.SeedTree.LinkFault;
import java.util.SplittableRandom;

/**
 * Damages one direction of a byte stream octet by octet, as {@link FaultPlan} says, and keeps its
 * {@link FaultLedger}. Each fault kind draws geometric gaps to its next occurrence from its own
 * stream of the fault seed's tree ({@link SeedTree#linkFaults}), so the same seed damages the same
 * octets whatever the chunking.
 *
 * <p>Threading: one thread.
 */
final class FaultInjector {
    /** {@link #apply} result bit: the octet is to be sent once more. */
    static final int DUPLICATE = 1 << 8;
    /** {@link #apply} result bit: the octet is dropped (the value bits mean nothing). */
    static final int DROP = 1 << 9;
    /** {@link #apply} result bit: the stream stalls after this octet. */
    static final int STALL = 1 << 10;

    private final FaultLedger ledger = new FaultLedger();
    private final Gaps flips;
    private final Gaps drops;
    private final Gaps dups;
    private final Gaps stalls;
    private boolean frameTouched;
    private boolean previousDelimiterDestroyed;

    FaultInjector(FaultPlan plan, SeedTree seeds, SeedTree.LinkDirection direction) {
        this.flips = new Gaps(plan.bitErrorRate(), seeds.linkFaults(direction, LinkFault.BIT_FLIP));
        this.drops = new Gaps(plan.dropPerOctet(), seeds.linkFaults(direction, LinkFault.DROP));
        this.dups = new Gaps(plan.dupPerOctet(), seeds.linkFaults(direction, LinkFault.DUPLICATE));
        this.stalls = new Gaps(plan.stallPerOctet(), seeds.linkFaults(direction, LinkFault.STALL));
    }

    /** Decides the fate of one clean octet: the octet to send (low 8 bits) and the {@code DROP/DUPLICATE/STALL} bits. */
    int apply(byte clean) {
        ledger.octets++;
        boolean delimiter = clean == 0;
        int result;
        boolean touched;
        if (drops.next()) {
            ledger.drops++;
            result = DROP;
            touched = true;
            if (delimiter) {
                ledger.zerosDestroyed++;
            }
        } else {
            int mask = 0;
            for (int bit = 0; bit < 8; bit++) {
                if (flips.next()) {
                    mask |= 1 << bit;
                }
            }
            int value = (clean ^ mask) & 0xFF;
            ledger.bitFlips += Integer.bitCount(mask);
            touched = mask != 0;
            if (delimiter && value != 0) {
                ledger.zerosDestroyed++;
            } else if (!delimiter && value == 0) {
                ledger.zerosCreated++;
            }
            result = value;
            if (dups.next()) {
                ledger.duplicates++;
                result |= DUPLICATE;
                if (value == 0) {
                    ledger.zerosCreated++; // an extra 0x00: an empty chunk, or a split
                }
                touched |= !delimiter || value != 0;
            }
        }
        if (stalls.next()) {
            ledger.stalls++;
            result |= STALL;
        }
        account(delimiter, touched, (result & DROP) != 0 || (delimiter && (result & 0xFF) != 0));
        return result;
    }

    private void account(boolean delimiter, boolean touched, boolean delimiterDestroyed) {
        if (!delimiter) {
            frameTouched |= touched;
            return;
        }
        ledger.frames++;
        if (!frameTouched && !delimiterDestroyed && !previousDelimiterDestroyed) {
            ledger.intactFrames++;
        } else {
            ledger.damagedFrames++;
        }
        previousDelimiterDestroyed = delimiterDestroyed;
        frameTouched = false;
    }

    FaultLedger ledger() {
        return ledger;
    }

    /** Bernoulli trials at rate p, drawn as geometric gaps (one random draw per event, not per trial). */
    private static final class Gaps {
        private final double logOneMinusP;
        private final SplittableRandom random;
        private long untilNext;

        Gaps(double p, SplittableRandom random) {
            this.logOneMinusP = p > 0 ? Math.log1p(-p) : 0;
            this.random = random;
            this.untilNext = draw();
        }

        private long draw() {
            if (logOneMinusP == 0) {
                return Long.MAX_VALUE;
            }
            // trials before the next event ~ Geometric(p): floor(ln U / ln(1 - p)), U in (0, 1]
            double u = 1.0 - random.nextDouble();
            double gap = Math.floor(Math.log(u) / logOneMinusP);
            return gap >= (double) Long.MAX_VALUE ? Long.MAX_VALUE - 1 : (long) gap;
        }

        /** Runs one trial; true when it is an event. */
        boolean next() {
            if (untilNext == Long.MAX_VALUE) {
                return false;
            }
            if (untilNext > 0) {
                untilNext--;
                return false;
            }
            untilNext = draw();
            return true;
        }
    }
}
