package dev.sweepline.fsw.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.fsw.table.WindowTable;
import org.junit.jupiter.api.Test;

/**
 * The design style's band and dwell (sweep design note R21, docs/focus-design.md): the band reaches
 * the design's multiples of the measured low and high half-widths plus the robustness margin, within
 * the band limits,
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
    void shouldReachTheDesignsMultiplesOfEachHalfWidth() {
        SweepParameters p = design(0, 0);
        // docs/focus-design.md: 1.75 high half-widths above the peak (or 1.0 beyond the alphas' window),
        // 2.0 low ones below (Q8, rounded)
        assertEquals(7, FocusDesign.reachAbove(4 << 8, 0, p)); // 4 x 1.75 = 7
        assertEquals(18, FocusDesign.reachAbove((int) Math.round(10.4 * 256), 0, p)); // 18.2 -> 18
        // alphas expected 12 windows above: 12 + 1.0 x 10.4 = 22.4 -> 22 beats 18
        assertEquals(22, FocusDesign.reachAbove((int) Math.round(10.4 * 256), 12, p));
        assertEquals(18, FocusDesign.reachAbove((int) Math.round(10.4 * 256), 7, p)); // 7 + 10 = 17 < 18
        assertEquals(28, FocusDesign.reachBelow(14 << 8, 18, p)); // 14 x 2 = 28
        assertEquals(29, FocusDesign.reachBelow((int) Math.round(14.3 * 256), 18, p)); // 28.6 -> 29
        // a narrow peak keeps the smallest half-width (4 > edge windows 2, SweepParameters.validate)
        assertEquals(p.minHalfWidthWindows, FocusDesign.reachAbove(1 << 8, 0, p));
        assertEquals(p.minHalfWidthWindows, FocusDesign.reachBelow(0, 4, p));
    }

    @Test
    void shouldAddTheMarginWithinTheBandLimits() {
        SweepParameters p = design(0, 3);
        assertEquals(7 + 3, FocusDesign.reachAbove(4 << 8, 0, p)); // 7 plus margin 3
        assertEquals(8 + 3, FocusDesign.reachBelow(4 << 8, 10, p)); // 8 plus margin 3
        // maxBandWindows 64 (SweepParameters.tunableDefaults): at most (64 - 1) / 2 = 31 above, and the
        // whole band 64 windows: 63 - 31 = 32 below
        assertEquals(31, FocusDesign.reachAbove(40 << 8, 0, p));
        assertEquals(31, FocusDesign.reachAbove(4 << 8, 40, p));
        assertEquals(32, FocusDesign.reachBelow(40 << 8, 31, p));
        assertEquals(63 - 10, FocusDesign.reachBelow(100 << 8, 10, p));
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
        int[][] bad = {{4, 0, 0, 0}, {-1, 0, 0, 0}, {1, -1, 0, 0}, {1, SweepParameters.MAX_FOCUS_BUDGET_MICROS + 1, 0, 0},
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
