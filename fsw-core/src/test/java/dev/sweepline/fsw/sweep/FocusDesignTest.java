package dev.sweepline.fsw.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.fsw.table.WindowTable;
import org.junit.jupiter.api.Test;

/**
 * The design style's band and dwell (sweep design note R21, docs/focus-design.md): the half-width is the
 * normalised design table's for the measured FWHM plus the robustness margin, within the band limits,
 * and the dwell fills the sweep-time budget after each step's settle, never below the table's dwell nor
 * above its limit.
 */
class FocusDesignTest {
    private final WindowTable table = DemoCup.table();
    private final int[] low = new int[table.count()];
    private final int[] high = new int[table.count()];

    FocusDesignTest() {
        for (int w = 0; w < table.count(); w++) {
            low[w] = table.dacLow(w);
            high[w] = table.dacHigh(w);
        }
    }

    private static SweepParameters design(int budgetMicros, int margin) {
        SweepParameters p = DemoCup.parameters();
        p.focusStyle = SweepParameters.FOCUS_STYLE_DESIGN;
        p.focusBudgetMicros = budgetMicros;
        p.robustnessMarginWindows = margin;
        return p;
    }

    @Test
    void shouldTakeTheHalfWidthOfTheDesignTable() {
        SweepParameters p = design(0, 0);
        FocusDesign d = new FocusDesign(DemoCup.INSTRUMENT);
        d.configure(p);
        // docs/focus-design.md: h* = f - 1 windows from f = 5 on; FWHM 8 -> 7, FWHM 20 -> 19
        assertEquals(7, d.halfWidth(8 << 8, p));
        assertEquals(19, d.halfWidth(20 << 8, p));
        // a narrow peak keeps the smallest half-width of the table (4 > edge windows 2, SweepParameters.validate)
        assertEquals(p.minHalfWidthWindows, d.halfWidth(2 << 8, p));
        // beyond the 32-window table: the last ratio 248/256, 40 x 248 / 256 = 38.75 -> 39 (in a band of up to 128)
        p.maxBandWindows = 128;
        d.configure(p);
        assertEquals(39, d.halfWidth(40 << 8, p));
        // nearest integer width: 7.6 windows reads the entry of 8
        assertEquals(7, d.halfWidth((int) Math.round(7.6 * 256), p));
    }

    @Test
    void shouldAddTheMarginWithinTheBandLimits() {
        SweepParameters p = design(0, 3);
        FocusDesign d = new FocusDesign(DemoCup.INSTRUMENT);
        d.configure(p);
        assertEquals(7 + 3, d.halfWidth(8 << 8, p)); // table 7 plus margin 3
        // maxBandWindows 64 (SweepParameters.tunableDefaults): at most (64 - 1) / 2 = 31 either side
        assertEquals(31, d.halfWidth(32 << 8, p));
        assertEquals(31, d.halfWidth(100 << 8, p));
    }

    @Test
    void shouldFillTheBudgetAfterTheSettleOfEachStep() {
        FocusDesign d = new FocusDesign(DemoCup.INSTRUMENT);
        SweepParameters none = design(0, 0);
        assertEquals(none.integrationPeriods, d.focusPeriods(none, low, high, 50, 90, 0)); // no budget: the table's dwell
        SweepParameters p = design(600_000, 0);
        int first = 50;
        int last = 90;
        int steps = last - first + 1;
        // the widest adjacent rail change of a log-spaced table is at the top of the band
        long settle = p.fixedSettleMicros + (((long) Math.max(Math.abs(low[last] - low[last - 1]),
                Math.abs(high[last] - high[last - 1])) * p.settleMicrosPerCodeQ8) >> 8);
        long firstSettle = 5_000; // the first step's return to the band from where the rails stand
        long expected = (600_000 - firstSettle - (steps - 1) * settle) / (steps * (long) DemoCup.MODULATION_PERIOD_MICROS);
        int periods = d.focusPeriods(p, low, high, first, last, firstSettle);
        assertEquals(expected, periods); // closed form of FocusDesign.focusPeriods, derived here
        // the sweep fits its budget: first settle + (steps - 1) settles + steps dwells <= budget
        assertTrue(firstSettle + (steps - 1) * settle + steps * (long) periods * DemoCup.MODULATION_PERIOD_MICROS <= 600_000);
        assertTrue(periods > p.integrationPeriods, "dwell " + periods);
    }

    @Test
    void shouldNeverDwellLessThanTheTableNorMoreThanTheLimit() {
        FocusDesign d = new FocusDesign(DemoCup.INSTRUMENT);
        SweepParameters tight = design(1_000, 0); // 1 ms for 41 windows: less than one settle each
        assertEquals(tight.integrationPeriods, d.focusPeriods(tight, low, high, 50, 90, 0));
        SweepParameters wide = design(SweepParameters.MAX_FOCUS_BUDGET_MICROS, 0); // 10 s for 3 windows
        assertEquals(SweepParameters.MAX_INTEGRATION_PERIODS, d.focusPeriods(wide, low, high, 60, 62, 0));
    }

    @Test
    void shouldRefuseStylesOutsideTheirRanges() {
        SweepParameters p = design(600_000, 0);
        assertEquals(0, p.validate(DemoCup.INSTRUMENT.rangeRatioShift()));
        int[][] bad = {{2, 0, 0, 0}, {1, -1, 0, 0}, {1, SweepParameters.MAX_FOCUS_BUDGET_MICROS + 1, 0, 0},
            {1, 0, -1, 0}, {1, 0, SweepParameters.MAX_ROBUSTNESS_MARGIN_WINDOWS + 1, 0}, {1, 0, 0, -1},
            {1, 0, 0, p.integrationPeriods + 1}};
        for (int[] b : bad) {
            SweepParameters q = p.copy();
            q.focusStyle = b[0];
            q.focusBudgetMicros = b[1];
            q.robustnessMarginWindows = b[2];
            q.surveyIntegrationPeriods = b[3];
            // commands.md §4.2: 18 BAD_STYLE
            assertEquals(18, q.validate(DemoCup.INSTRUMENT.rangeRatioShift()), java.util.Arrays.toString(b));
        }
    }
}
