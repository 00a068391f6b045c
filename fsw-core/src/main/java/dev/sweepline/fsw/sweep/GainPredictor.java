package dev.sweepline.fsw.sweep;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.fsw.table.WindowTable;

/**
 * Chooses the preamplifier gain range of each window from what that window and its two neighbours
 * read last time (sweep design note, R9). The predicted current is the largest single-quadrant
 * current of the three (the peak drifts between sweeps); the range goes up when the prediction is
 * above the up fraction of full scale, down when it is below the down fraction, and otherwise
 * stays where this window was last read (hysteresis). Windows never read, or saturated last time,
 * get the least sensitive range. One range per step: the electronics never switch mid-integration.
 */
final class GainPredictor {
    /** Highest (least sensitive) range. */
    private final int topRange;
    /** Full scale of one quadrant above the pedestal in range 0, range-0 units = ADC counts: top code − pedestal. */
    private final long fullScaleRange0Units;
    private final int rangeRatioShift;

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

    /** The range to read window {@code w} in. */
    int choose(int w) {
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
            while (r > 0 && predicted < downUnits[r]) {
                r--;
            }
        }
        return r;
    }

    /** The range window {@code w} was last read in (top range when never read). */
    int lastRange(int w) {
        return lastRange[w];
    }
}
