package dev.sweepline.fsw.sweep;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.table.SettleTime;
import dev.sweepline.fsw.table.SweepParameters;

/**
 * The design style of focus (sweep design note R21; docs/focus-design.md): the band half-width that
 * maximises the information on the protons' (n, U, w) per second for a peak of the measured width, and
 * the dwell that fills the sweep-time budget.
 *
 * <p>The normalised design table {@link #HALF_WIDTH_PER_FWHM_Q8} was computed off board
 * (docs/focus-design.md, reproduced by hw-sim's FocusDesignTableTest): for a Gaussian peak of FWHM f
 * windows, read in windows of one unit, with shot noise and a noise floor of 1 % of the peak window's
 * variance, the contiguous band |j - peak| ≤ h of equal dwell that maximises det F / (2h + 1)^3
 * (information per second, D-criterion), averaged over the peak's position within its window. At table
 * load the scheduler turns it into whole windows for every integer FWHM, with the robustness margin
 * and the band limits applied ({@link #configure}); a band choice is then one array read.
 */
public final class FocusDesign {
    /** Widest FWHM of the normalised table, windows; wider peaks use its last entry. */
    static final int TABLE_FWHM_WINDOWS = 32;
    /**
     * Design half-width over FWHM, Q8, for FWHM = 0..32 windows (entry 0 unused, as 1): h* / f with
     * h* the best whole half-width (docs/focus-design.md table; h* = f − 1 windows from f = 5 on).
     */
    static final int[] HALF_WIDTH_PER_FWHM_Q8 = {
        256, 256, 256, 256, 256, 205, 213, 219, 224, 228, 230, 233, 235, 236, 238, 239, 240,
        241, 242, 243, 243, 244, 244, 245, 245, 246, 246, 247, 247, 247, 247, 248, 248,
    };

    private final int[] halfWidthByFwhm = new int[TABLE_FWHM_WINDOWS + 1];
    private final int modulationPeriodMicros;
    private int widestHalf;

    /** The design table's half-width for a peak of {@code fwhmWindows} whole windows (1..32), before margin and limits. */
    public static int tableHalfWidth(int fwhmWindows) {
        int f = Math.max(1, Math.min(TABLE_FWHM_WINDOWS, fwhmWindows));
        return (f * HALF_WIDTH_PER_FWHM_Q8[f] + 128) >> 8;
    }

    FocusDesign(InstrumentDescription instrument) {
        this.modulationPeriodMicros = instrument.modulationPeriodMicros();
    }

    /** Precomputes the half-width of every integer FWHM for {@code p} (at start-up and at every parameter load). */
    void configure(SweepParameters p) {
        int cap = (p.maxBandWindows - 1) / 2;
        for (int f = 0; f <= TABLE_FWHM_WINDOWS; f++) {
            int fwhm = Math.max(1, f);
            int design = (fwhm * HALF_WIDTH_PER_FWHM_Q8[f] + 128) >> 8;
            halfWidthByFwhm[f] = Math.min(cap, Math.max(p.minHalfWidthWindows, design + p.robustnessMarginWindows));
        }
        widestHalf = cap;
    }

    /**
     * The design half-width for a peak of {@code fwhmWindowsQ8} (Q8 windows): the table's entry at the
     * nearest integer width, or beyond the table the last ratio times the width, with margin and limits.
     */
    int halfWidth(int fwhmWindowsQ8, SweepParameters p) {
        int f = (fwhmWindowsQ8 + 128) >> 8;
        if (f <= TABLE_FWHM_WINDOWS) {
            return halfWidthByFwhm[Math.max(0, f)];
        }
        long design = ((long) fwhmWindowsQ8 * HALF_WIDTH_PER_FWHM_Q8[TABLE_FWHM_WINDOWS] + (1 << 15)) >> 16;
        return (int) Math.min(widestHalf, Math.max(p.minHalfWidthWindows, design + p.robustnessMarginWindows));
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
