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
 * few multiplications and a search of the table for the alphas' window; nothing to precompute.
 */
public final class FocusDesign {
    /** Reach below the peak in low half-widths at half maximum, Q8: 2.0 (docs/focus-design.md). */
    public static final int LOW_REACH_PER_HWHM_Q8 = 512;
    /** Reach above the peak in high half-widths at half maximum, Q8: 1.75 (docs/focus-design.md). */
    public static final int HIGH_REACH_PER_HWHM_Q8 = 448;

    private final int modulationPeriodMicros;

    FocusDesign(InstrumentDescription instrument) {
        this.modulationPeriodMicros = instrument.modulationPeriodMicros();
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
        long h = Math.max(0, highHalfQ8);
        long protons = (h * HIGH_REACH_PER_HWHM_Q8 + (1 << 15)) >> 16;
        long alphas = alphaOffset + ((h * ALPHA_REACH_PER_HWHM_Q8 + (1 << 15)) >> 16);
        long reach = Math.max(protons, alphas) + p.robustnessMarginWindows;
        return (int) Math.max(p.minHalfWidthWindows, Math.min((p.maxBandWindows - 1) / 2, reach));
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
        long settle = 0;
        if (steps > 1) {
            settle = Math.max(SettleTime.micros(p, dacLow[first], dacHigh[first], dacLow[first + 1], dacHigh[first + 1]),
                    SettleTime.micros(p, dacLow[last - 1], dacHigh[last - 1], dacLow[last], dacHigh[last]));
        }
        long integrating = p.focusBudgetMicros - firstSettleMicros - (steps - 1) * settle;
        long periods = integrating / ((long) steps * modulationPeriodMicros);
        return (int) Math.max(p.integrationPeriods, Math.min(SweepParameters.MAX_INTEGRATION_PERIODS, periods));
    }

    /** The dwell of a survey sweep: the table's, or the quick survey's. */
    static int surveyPeriods(SweepParameters p) {
        return p.surveyIntegrationPeriods == 0 ? p.integrationPeriods : p.surveyIntegrationPeriods;
    }
}
