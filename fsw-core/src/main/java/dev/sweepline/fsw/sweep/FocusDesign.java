package dev.sweepline.fsw.sweep;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.table.SettleTime;
import dev.sweepline.fsw.table.SweepParameters;

/**
 * The design style of focus (sweep design note R21; docs/focus-design.md): the band that maximises the
 * information on the protons' (n, U, w) per second for a peak of the measured shape, and the dwell that
 * fills the sweep-time budget.
 *
 * <p>The band reaches {@link #LOW_REACH_PER_HWHM_Q8} times the peak's measured low half-width at half
 * maximum below the refined peak and above it the farther of {@link #HIGH_REACH_PER_HWHM_Q8} times the
 * high one and {@link #ALPHA_REACH_PER_HWHM_Q8} times it beyond the alphas' expected peak, plus the
 * robustness margin, within the band limits. Both factors were chosen off board against the bench's
 * D-optimal yardstick (hw-sim {@code design.DOptimalDesign}) over the built-in scenarios'
 * plasmas (docs/focus-design.md, reproduced by hw-sim's FocusDesignTableTest): the information lies
 * further out on the low-voltage side (a hot, slow wind's long low tail on a table of equal voltage
 * ratios) and less far on the high side (where the alphas' current adds shot noise). A band choice is a
 * few multiplications and a search of the table for the alphas' window.
 *
 * <p>Support dwell (sweep design note R23): the D-optimal design inside the band is, to within a few per
 * cent, three points of equal share (low flank, peak, high flank); their distances from the refined peak
 * in half-widths at half maximum depend on the half-width, and are looked up in two tables indexed by
 * the half-width in whole windows, interpolated from a few anchors when the scheduler is built.
 */
public final class FocusDesign {
    /** Reach below the peak in low half-widths at half maximum, Q8: 2.0 (docs/focus-design.md). */
    public static final int LOW_REACH_PER_HWHM_Q8 = 512;
    /** Reach above the peak in high half-widths at half maximum, Q8: 1.75 (docs/focus-design.md). */
    public static final int HIGH_REACH_PER_HWHM_Q8 = 448;

    /** Support points of a support-dwell sweep: low flank, peak, high flank. */
    public static final int SUPPORT_WINDOWS = 3;
    /** Most support windows of a sweep: each support point paired with a neighbour ({@link #pairedSupport}). */
    public static final int MAX_SUPPORT_WINDOWS = 2 * SUPPORT_WINDOWS;
    /** Largest half-width at half maximum, windows, the support factor tables are indexed by (wider peaks use the last entry). */
    public static final int SUPPORT_TABLE_HALF_WIDTHS = 64;
    /**
     * Anchors of the low flank's factor: low half-widths at half maximum, windows, and the distance of the
     * D-optimal low support point below the refined peak in low half-widths, Q8 (1.25, 1.30, 1.38, 1.46,
     * 1.50, 1.74: the best factor of each built-in scenario's plasmas inside the design band with a floor
     * of 1/8 of the integration, hw-sim SupportDwellReachTest; docs/focus-design.md, "Support dwell").
     */
    private static final int[] LOW_ANCHOR_WINDOWS = {0, 4, 6, 8, 10, 14};
    private static final int[] LOW_ANCHOR_FACTOR_Q8 = {320, 333, 353, 374, 384, 445};
    /**
     * Anchors of the high flank's factor, as the low ones: 1.24, 1.24, 1.25, 1.30, 1.36, 1.10 high
     * half-widths above the peak (the wide perihelion peaks' high flank is pulled in by the alphas' noise).
     */
    private static final int[] HIGH_ANCHOR_WINDOWS = {0, 4, 6, 7, 9, 12};
    private static final int[] HIGH_ANCHOR_FACTOR_Q8 = {317, 317, 320, 333, 348, 282};

    private final int modulationPeriodMicros;
    /** Low flank's factor by low half-width in whole windows (0..{@link #SUPPORT_TABLE_HALF_WIDTHS}), Q8. */
    private final int[] lowSupportQ8 = new int[SUPPORT_TABLE_HALF_WIDTHS + 1];
    /** High flank's factor by high half-width in whole windows, Q8. */
    private final int[] highSupportQ8 = new int[SUPPORT_TABLE_HALF_WIDTHS + 1];

    /** The design of {@code instrument}'s focus sweeps; the support factor tables are filled here. */
    public FocusDesign(InstrumentDescription instrument) {
        this.modulationPeriodMicros = instrument.modulationPeriodMicros();
        interpolate(LOW_ANCHOR_WINDOWS, LOW_ANCHOR_FACTOR_Q8, lowSupportQ8);
        interpolate(HIGH_ANCHOR_WINDOWS, HIGH_ANCHOR_FACTOR_Q8, highSupportQ8);
    }

    /** Fills {@code table} linearly between the anchors (integer), the last anchor's value beyond it. */
    private static void interpolate(int[] at, int[] value, int[] table) {
        for (int h = 0; h < table.length; h++) {
            int k = 0;
            while (k < at.length - 1 && at[k + 1] <= h) {
                k++;
            }
            table[h] = k == at.length - 1 ? value[k]
                    : value[k] + (value[k + 1] - value[k]) * (h - at[k]) / (at[k + 1] - at[k]);
        }
    }

    /** The low flank's factor for a low half-width of {@code halfQ8} (Q8 windows), Q8. */
    public int lowSupportFactorQ8(int halfQ8) {
        return lowSupportQ8[tableIndex(halfQ8)];
    }

    /** The high flank's factor for a high half-width of {@code halfQ8} (Q8 windows), Q8. */
    public int highSupportFactorQ8(int halfQ8) {
        return highSupportQ8[tableIndex(halfQ8)];
    }

    private static int tableIndex(int halfQ8) {
        return Math.max(0, Math.min(SUPPORT_TABLE_HALF_WIDTHS, (halfQ8 + 128) >> 8));
    }

    /**
     * Windows a flank support window moves outward, at most, to leave a less sensitive gain range: the
     * read noise of a range grows with its full scale (a feedback resistor {@code 2^rangeRatioShift} times
     * smaller), so the window just past the range switch teaches more than the one just inside it
     * (hw-sim SupportDwellReachTest: 0.85 → 0.98 of the optimum on quiet-perihelion for one window). Three:
     * the gain predictor reads a window in the range its brighter neighbour needs and switches down only
     * below 2 % of full scale (R9), so on the bench the switch lies up to three windows beyond the
     * yardstick's (docs/focus-design.md: on calm-perihelion 0.63 of the optimum with a reach of 2, 0.82
     * with 3; 4 adds at most 0.03 on one scenario).
     */
    public static final int RANGE_STEP_WINDOWS = 3;

    /**
     * The support windows of a peak refined at {@code peakQ8} (Q8 windows) with low and high half-widths
     * at half maximum {@code lowHalfQ8} and {@code highHalfQ8}, in a band {@code first..last}: the low
     * flank, the peak and the high flank, each clamped to the band, ascending, without repeats. A flank
     * moves outward to the first window within {@link #RANGE_STEP_WINDOWS} that was read in a more
     * sensitive range than it ({@code rangeByWindow}, the ranges the windows were last read in), if any.
     *
     * @param out receives the windows ({@link #SUPPORT_WINDOWS} entries)
     * @return how many distinct windows (1..3)
     */
    public int supportWindows(int peakQ8, int lowHalfQ8, int highHalfQ8, int first, int last, int[] rangeByWindow,
                              int[] out) {
        long low = (long) peakQ8 - (((long) Math.max(0, lowHalfQ8) * lowSupportFactorQ8(lowHalfQ8)) >> 8);
        long high = (long) peakQ8 + (((long) Math.max(0, highHalfQ8) * highSupportFactorQ8(highHalfQ8)) >> 8);
        int peak = clamp(((long) peakQ8 + 128) >> 8, first, last);
        int lowFlank = outOfRange(clamp((low + 128) >> 8, first, last), -1, first, last, peak, rangeByWindow);
        int highFlank = outOfRange(clamp((high + 128) >> 8, first, last), 1, first, last, peak, rangeByWindow);
        int n = addSupport(lowFlank, out, 0);
        n = addSupport(peak, out, n);
        return addSupport(highFlank, out, n);
    }

    /**
     * Flank window {@code w} (not the peak), or the first window within {@link #RANGE_STEP_WINDOWS} of it
     * outward ({@code step} −1 below the peak, +1 above) inside {@code first..last} that was read in a more
     * sensitive range than {@code w}.
     */
    private static int outOfRange(int w, int step, int first, int last, int peak, int[] rangeByWindow) {
        if (w == peak) {
            return w;
        }
        for (int k = 1; k <= RANGE_STEP_WINDOWS; k++) {
            int v = w + step * k;
            if (v < first || v > last) {
                break;
            }
            if (rangeByWindow[v] < rangeByWindow[w]) {
                return v;
            }
        }
        return w;
    }

    private static int clamp(long w, int first, int last) {
        return (int) Math.max(first, Math.min(last, w));
    }

    private static int addSupport(int w, int[] out, int n) {
        if (n > 0 && out[n - 1] >= w) {
            return n; // ascending by construction: a repeat is the previous window
        }
        out[n] = w;
        return n + 1;
    }

    /**
     * Paired support (R23): pairs each of the {@code n} support windows in {@code out} (ascending: low
     * flank, peak, high flank) with a neighbour: a flank with the next window outward (inward at the band's
     * edge), the peak with the window on the side of its refined position {@code peakQ8}; inside
     * {@code first..last}, ascending, without repeats. In the interleaved order two neighbouring windows
     * are read in opposite halves of the sweep (one on the way out, one on the way back), so a pair's
     * dwell is spread over the sweep's time instead of one long step, as the equal-dwell band's is
     * (docs/focus-design.md, "Paired support").
     *
     * @return how many support windows {@code out} holds now (at most 2 n)
     */
    public int pairedSupport(int[] out, int n, int peakQ8, int first, int last) {
        int peak = clamp(((long) peakQ8 + 128) >> 8, first, last);
        int m = 0;
        for (int k = 0; k < n; k++) {
            int w = out[k];
            int step = w < peak ? -1 : w > peak ? 1 : (peakQ8 & 0xFF) >= 128 ? -1 : 1;
            int v = w + step;
            if (v < first || v > last) {
                v = w - step;
            }
            pairScratch[2 * k] = Math.min(w, v);
            pairScratch[2 * k + 1] = Math.max(w, v);
        }
        for (int k = 0; k < 2 * n; k++) {
            int w = pairScratch[k];
            if (w >= first && w <= last) {
                m = addSupport(w, out, m);
            }
        }
        return m;
    }

    /** Scratch of {@link #pairedSupport}: the pairs before repeats are dropped. */
    private final int[] pairScratch = new int[MAX_SUPPORT_WINDOWS];

    /**
     * The dwell of each of {@code supports} support windows of a support-dwell sweep over {@code first..last}:
     * the floor plus an equal share of what the sweep's integration leaves after every window's floor, at
     * most the dwell limit. The sweep's integration is {@code integrationPeriods} times the windows when
     * the budget is 0, else the budget after the settles (as {@link #focusPeriods}).
     */
    int supportPeriods(SweepParameters p, int[] dacLow, int[] dacHigh, int first, int last, long firstSettleMicros,
                       int supports) {
        int steps = last - first + 1;
        long total = p.focusBudgetMicros == 0 ? (long) p.integrationPeriods * steps
                : integratingMicros(p, dacLow, dacHigh, first, last, firstSettleMicros) / modulationPeriodMicros;
        long rest = Math.max(0, total - (long) p.focusFloorPeriods * steps);
        return (int) Math.min(SweepParameters.MAX_INTEGRATION_PERIODS, p.focusFloorPeriods + rest / Math.max(1, supports));
    }

    /**
     * Reach beyond the alphas' expected peak (alphaRatio times the proton peak's code) in high half-widths
     * of the protons, Q8: 1.0. Not for the protons' information (the alphas' current only adds noise
     * there) but for the ground's joint fit, which needs the alpha peak to keep the alphas from biasing
     * the protons (docs/focus-design.md: without it the ground's p95 errors were 2-3 times the band
     * style's).
     */
    public static final int ALPHA_REACH_PER_HWHM_Q8 = 256;

    /**
     * Windows the design band reaches above the refined peak for a high half-width of
     * {@code highHalfQ8} (Q8 windows) when the alphas' peak is expected {@code alphaOffset} windows above
     * it: at least {@code minHalfWidthWindows}, at most half the widest band.
     */
    static int reachAbove(int highHalfQ8, int alphaOffset, SweepParameters p) {
        return reachAbove(highHalfQ8, highHalfQ8, alphaOffset, p);
    }

    /**
     * {@link #reachAbove(int, int, SweepParameters)}, where in the alpha-clear style
     * ({@link SweepParameters#alphaClear()}) alphas {@link #alphasClear clear} of a high half-width of
     * {@code clearHalfQ8} (Q8 windows) add no reach.
     */
    static int reachAbove(int highHalfQ8, int clearHalfQ8, int alphaOffset, SweepParameters p) {
        long h = Math.max(0, highHalfQ8);
        long protons = (h * HIGH_REACH_PER_HWHM_Q8 + (1 << 15)) >> 16;
        long alphas = alphaOffset + ((h * ALPHA_REACH_PER_HWHM_Q8 + (1 << 15)) >> 16);
        long reach = (p.alphaClear() && alphasClear(clearHalfQ8, alphaOffset) ? protons : Math.max(protons, alphas))
                + p.robustnessMarginWindows;
        return (int) Math.max(p.minHalfWidthWindows, Math.min((p.maxBandWindows - 1) / 2, reach));
    }

    /**
     * Alpha-clear threshold (sweep design note R24): the alphas' expected peak counts as clear of the protons
     * when it lies at least this many proton high half-widths at half maximum above the refined peak, Q8:
     * 2.5. There the protons' current has fallen to 2^-6.25 = 1.3 % of their peak (a peak of Gaussian shape
     * in windows falls as 2^-(x/HWHM)^2), of the order of the alphas' own peak current at a few per cent
     * abundance, so each species' peak is its own; and the alphas' half-width in windows is about the
     * protons' (T_alpha = 4 T_p gives w_alpha = w_p, and E/q goes as v^2 for both; physics.md, alpha
     * particles), so the protons' reach of 1.75 half-widths ends at least 0.75 alpha half-widths below the
     * alpha peak: the band holds the alphas' low flank, not their peak, and the ground holds the alphas by
     * its constrained rows from the proton fit (ground-decoder fit.AlphaCoverage PART). Closer, the alpha peak rides on
     * the protons' high flank and the two must be fitted jointly, so the band holds it (docs/focus-design.md,
     * "Alpha-clear", with the bench's figures at other thresholds).
     */
    public static final int ALPHA_CLEAR_PER_HWHM_Q8 = 640;

    /**
     * True when the alphas' peak, expected {@code alphaOffset} windows above the refined peak, lies at least
     * {@link #ALPHA_CLEAR_PER_HWHM_Q8} high half-widths ({@code highHalfQ8}, Q8 windows) above it.
     */
    static boolean alphasClear(int highHalfQ8, int alphaOffset) {
        return ((long) alphaOffset << 16) >= (long) Math.max(0, highHalfQ8) * ALPHA_CLEAR_PER_HWHM_Q8;
    }

    /**
     * Windows the design band reaches below the refined peak for a low half-width of {@code lowHalfQ8}
     * (Q8 windows), when it reaches {@code above} windows above: at least {@code minHalfWidthWindows},
     * and the whole band at most {@code maxBandWindows}.
     */
    static int reachBelow(int lowHalfQ8, int above, SweepParameters p) {
        long reach = (((long) Math.max(0, lowHalfQ8) * LOW_REACH_PER_HWHM_Q8 + (1 << 15)) >> 16) + p.robustnessMarginWindows;
        return (int) Math.max(p.minHalfWidthWindows, Math.min(p.maxBandWindows - 1 - above, reach));
    }

    /**
     * The dwell of a focus sweep over windows {@code first..last}: the most whole modulation periods
     * per window that fit the budget after the settles (the first step's, {@code firstSettleMicros},
     * from where the rails stand, and for every other step the settle of the widest adjacent rail change
     * in the band), never fewer than the table's dwell nor more than its limit.
     */
    int focusPeriods(SweepParameters p, int[] dacLow, int[] dacHigh, int first, int last, long firstSettleMicros) {
        if (p.focusBudgetMicros == 0) {
            return p.integrationPeriods;
        }
        int steps = last - first + 1;
        long periods = integratingMicros(p, dacLow, dacHigh, first, last, firstSettleMicros)
                / ((long) steps * modulationPeriodMicros);
        return (int) Math.max(p.integrationPeriods, Math.min(SweepParameters.MAX_INTEGRATION_PERIODS, periods));
    }

    /**
     * The budget's time left for integrating in a focus sweep over {@code first..last}: the budget less
     * the first step's settle and, for every other step, the settle of the widest adjacent rail change.
     */
    private static long integratingMicros(SweepParameters p, int[] dacLow, int[] dacHigh, int first, int last,
                                          long firstSettleMicros) {
        int steps = last - first + 1;
        long settle = 0;
        if (steps > 1) {
            settle = Math.max(SettleTime.micros(p, dacLow[first], dacHigh[first], dacLow[first + 1], dacHigh[first + 1]),
                    SettleTime.micros(p, dacLow[last - 1], dacHigh[last - 1], dacLow[last], dacHigh[last]));
        }
        return p.focusBudgetMicros - firstSettleMicros - (steps - 1) * settle;
    }

    /** The dwell of a survey sweep: the table's, or the quick survey's. */
    static int surveyPeriods(SweepParameters p) {
        return p.surveyIntegrationPeriods == 0 ? p.integrationPeriods : p.surveyIntegrationPeriods;
    }
}
