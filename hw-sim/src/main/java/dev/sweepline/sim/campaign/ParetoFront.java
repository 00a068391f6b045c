package dev.sweepline.sim.campaign;

import java.util.ArrayList;
import java.util.List;

/**
 * The sets no other set beats on every objective at once: accuracy (the mean median relative error of
 * the ground's n, U, T against the truth; lower better),
 * telemetry rate (bits per second, lower better) and cadence (spectra per second, higher better).
 */
public final class ParetoFront {
    private ParetoFront() {
    }

    /** The non-dominated sets, in set order. */
    public static List<SetResult> of(List<SetResult> sets) {
        List<SetResult> front = new ArrayList<>();
        for (SetResult a : sets) {
            boolean dominated = false;
            for (SetResult b : sets) {
                if (b != a && dominates(b, a)) {
                    dominated = true;
                    break;
                }
            }
            if (!dominated) {
                front.add(a);
            }
        }
        return front;
    }

    /** True when {@code b} is no worse than {@code a} on every objective and better on one. */
    static boolean dominates(SetResult b, SetResult a) {
        boolean noWorse = !(b.accuracy() > a.accuracy()) && b.bitsPerSecondMean() <= a.bitsPerSecondMean()
                && b.spectraPerSecond() >= a.spectraPerSecond();
        boolean better = b.accuracy() < a.accuracy() || b.bitsPerSecondMean() < a.bitsPerSecondMean()
                || b.spectraPerSecond() > a.spectraPerSecond();
        return noWorse && better;
    }

    /**
     * True when {@code s} may be recommended: no alpha lock, every jump reacquired, the worst run's lock
     * fraction at least 0.99, and the worst run within the allocation (when one is given).
     */
    public static boolean qualifies(SetResult s, double allocationBitsPerSecond) {
        boolean fits = Double.isNaN(allocationBitsPerSecond) || s.bitsPerSecondMax() <= allocationBitsPerSecond;
        boolean sound = s.alphaLocks() == 0 && s.reacquireSweepsMax() >= 0
                && !Double.isNaN(s.lockFractionMin()) && s.lockFractionMin() >= 0.99;
        return fits && sound;
    }

    /**
     * The leader: among the sets on the front that {@link #qualifies qualify}, the best accuracy, then
     * the fewest bits. Null when no set qualifies. {@link Recommendation} then weighs the ensemble's noise.
     */
    public static SetResult recommend(List<SetResult> front, double allocationBitsPerSecond) {
        SetResult best = null;
        for (SetResult s : front) {
            if (!qualifies(s, allocationBitsPerSecond)) {
                continue;
            }
            if (best == null || s.accuracy() < best.accuracy()
                    || (s.accuracy() == best.accuracy() && s.bitsPerSecondMean() < best.bitsPerSecondMean())) {
                best = s;
            }
        }
        return best;
    }
}
