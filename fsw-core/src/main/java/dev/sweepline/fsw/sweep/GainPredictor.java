package dev.sweepline.fsw.sweep;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.fsw.table.WindowTable;

/**
 * Chooses the preamplifier gain range of each window from what that window and its two neighbours
 * read last time (sweep design note, R9). The predicted current is the largest single-quadrant
 * current of the three (the peak drifts between sweeps); the range goes up when the prediction is
 * above the up fraction of full scale, down when it is below the down fraction, and otherwise
 * stays where this window was last read (hysteresis). A window saturated last time gets the least
 * sensitive range. A window never read (the first survey of a run or of a new table) follows its
 * neighbour read just before it in the same sweep: that reading times {@link #UNREAD_HEADROOM_SHIFT}'s
 * factor 8 (the growth of a cold beam's flank from one window to the next, below) is the prediction,
 * from the top range down, so that a weak or cold plasma's first survey is read in a range that shows
 * it (the top range alone reads a weak plasma as noise); a window with no neighbour read yet gets the
 * top range. One range per step: the electronics never switch mid-integration.
 *
 * <p>The factor 8: on the flank of a drifting Maxwellian, one window of a log table of ratio q moves the
 * speed by (q^(1/2) - 1) U; for the demo cup (q = 1.0384) at U/w = 16.5 (2e4 K at 300 km/s, a cold
 * beam) that is 0.31 w, and the current grows by exp(9 - 7.24) = 5.8 between 3 w and 2.69 w below the
 * peak (physics.md, convected Maxwellian; closed form): 8 covers it, and a faster rise only saturates
 * the one window, after which the saturated reading lifts its neighbour to the top range.
 */
final class GainPredictor {
    /** Highest (least sensitive) range. */
    private final int topRange;
    /** Full scale of one quadrant above the pedestal in range 0, range-0 units = ADC counts: top code − pedestal. */
    private final long fullScaleRange0Units;
    private final int rangeRatioShift;

    /** A never-read window's prediction: its read neighbour's reading shifted left by this (x 8). */
    static final int UNREAD_HEADROOM_SHIFT = 3;

    private static final int UNKNOWN = 0;
    private static final int MEASURED = 1;
    private static final int SATURATED = 2;

    private final int[] state = new int[WindowTable.CAPACITY];
    private final long[] maxQuadrantUnits = new long[WindowTable.CAPACITY];
    private final int[] lastRange = new int[WindowTable.CAPACITY];
    private final long[] upUnits;
    private final long[] downUnits;
    private int count;

    /** A predictor for {@code instrument}'s gain ranges, ADC and pedestal. */
    GainPredictor(InstrumentDescription instrument) {
        topRange = instrument.gainRanges() - 1;
        fullScaleRange0Units = instrument.adcTopCode() - instrument.pedestalCounts();
        rangeRatioShift = instrument.rangeRatioShift();
        upUnits = new long[instrument.gainRanges()];
        downUnits = new long[instrument.gainRanges()];
    }

    /** Highest (least sensitive) range. */
    int topRange() {
        return topRange;
    }

    /** Forgets every window (a new table): all windows become unknown. */
    void reset(int windowCount) {
        count = windowCount;
        for (int w = 0; w < WindowTable.CAPACITY; w++) {
            state[w] = UNKNOWN;
            maxQuadrantUnits[w] = 0;
            lastRange[w] = topRange;
        }
    }

    /** Recomputes the switch thresholds from the parameters, range-0 units per quadrant. */
    void configure(SweepParameters p) {
        for (int r = 0; r < upUnits.length; r++) {
            long fullScale = fullScaleRange0Units << (rangeRatioShift * r);
            upUnits[r] = (fullScale * p.gainUpFractionQ16) >> 16;
            downUnits[r] = (fullScale * p.gainDownFractionQ16) >> 16;
        }
    }

    /** Records what window {@code w} read: its largest quadrant, range-0 units, and the range used. */
    void record(int w, long maxQuadrant, boolean saturated, int range) {
        state[w] = saturated ? SATURATED : MEASURED;
        maxQuadrantUnits[w] = Math.max(0, maxQuadrant);
        lastRange[w] = range;
    }

    /** The range each window was last read in (the top range for a window never read), by window; read-only. */
    int[] lastRanges() {
        return lastRange;
    }

    /** The range to read window {@code w} in. */
    int choose(int w) {
        if (state[w] == UNKNOWN) {
            return chooseUnread(w);
        }
        if (state[w] != MEASURED) {
            return topRange;
        }
        long predicted = maxQuadrantUnits[w];
        // a saturated neighbour still counts with its (lower-bound) reading, which pushes the range up
        if (w > 0 && state[w - 1] != UNKNOWN) {
            predicted = Math.max(predicted, maxQuadrantUnits[w - 1]);
        }
        if (w + 1 < count && state[w + 1] != UNKNOWN) {
            predicted = Math.max(predicted, maxQuadrantUnits[w + 1]);
        }
        int r = lastRange[w];
        if (predicted > upUnits[r]) {
            while (r < topRange && predicted > upUnits[r]) {
                r++;
            }
        } else {
            r = down(r, predicted);
        }
        return r;
    }

    /** A never-read window: from the top range down, on its read neighbours' readings times 8. */
    private int chooseUnread(int w) {
        boolean left = w > 0 && state[w - 1] != UNKNOWN;
        boolean right = w + 1 < count && state[w + 1] != UNKNOWN;
        if (!left && !right) {
            return topRange;
        }
        if ((left && state[w - 1] == SATURATED) || (right && state[w + 1] == SATURATED)) {
            return topRange;
        }
        long predicted = Math.max(left ? maxQuadrantUnits[w - 1] : 0, right ? maxQuadrantUnits[w + 1] : 0);
        return down(topRange, predicted << UNREAD_HEADROOM_SHIFT);
    }

    private int down(int range, long predicted) {
        int r = range;
        while (r > 0 && predicted < downUnits[r]) {
            r--;
        }
        return r;
    }

    /** The range window {@code w} was last read in (top range when never read). */
    int lastRange(int w) {
        return lastRange[w];
    }
}
