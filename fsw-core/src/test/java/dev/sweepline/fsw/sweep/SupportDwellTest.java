package dev.sweepline.fsw.sweep;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.link.StepCommand;
import dev.sweepline.fsw.table.SettleTime;
import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.fsw.table.TableStatus;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

/**
 * The support dwell (sweep design note R23): every focus window dwells the floor, three support windows
 * (low flank, peak, high flank of the band's reference peak) share the rest of the sweep's integration
 * equally; every step commands its own dwell, and each spectrum reports it.
 */
class SupportDwellTest {
    private static final int FLOOR = 2;

    private static SweepParameters support(int style, int budgetMicros) {
        SweepParameters p = DemoCup.parameters();
        p.focusStyle = style;
        p.focusFloorPeriods = FLOOR;
        p.focusBudgetMicros = budgetMicros;
        return p;
    }

    /** The steps of every completed sweep: window → dwell commanded, with the spectrum's own record. */
    private static final class Sweeps implements SweepListener {
        final List<Map<Integer, Integer>> dwell = new ArrayList<>();
        final List<int[]> spectra = new ArrayList<>(); // mode, first, count, floor, support entries/periods...
        final List<long[]> sweepTimes = new ArrayList<>();
        final List<List<StepCommand>> steps = new ArrayList<>();
        private Map<Integer, Integer> current = new HashMap<>();
        private List<StepCommand> currentSteps = new ArrayList<>();

        @Override
        public void onStep(StepCommand s, long nowMicros) {
            current.put(s.window, s.integrationPeriods);
            StepCommand copy = new StepCommand();
            copy.copyFrom(s);
            currentSteps.add(copy);
        }

        @Override
        public void onSweepComplete(Spectrum s, long nowMicros) {
            dwell.add(current);
            steps.add(currentSteps);
            current = new HashMap<>();
            currentSteps = new ArrayList<>();
            int[] r = new int[4 + 2 * s.supportCount()];
            r[0] = s.mode().ordinal();
            r[1] = s.firstWindow();
            r[2] = s.count();
            r[3] = s.integrationPeriods();
            for (int k = 0; k < s.supportCount(); k++) {
                r[4 + 2 * k] = s.supportEntry(k);
                r[5 + 2 * k] = s.supportPeriods(k);
                assertEquals(s.supportPeriods(k), s.integrationPeriodsOf(s.supportEntry(k)));
            }
            spectra.add(r);
            sweepTimes.add(new long[] {s.startMicros(), s.endMicros()});
        }
    }

    @ParameterizedTest(name = "focusStyle {0}")
    @ValueSource(ints = {4, 5, 6, 7})
    void shouldDwellTheFloorEverywhereAndShareTheRestAmongThreeSupportWindows(int style) {
        Sweeps l = new Sweeps();
        ClosedLoop loop = new ClosedLoop(new SweepScheduler(DemoCup.INSTRUMENT, Fixtures.TABLE, support(style, 0), l),
                Fixtures.nearSun(31));
        loop.runSweeps(30);
        int dwell = DemoCup.parameters().integrationPeriods;
        int focus = 0;
        for (int i = 0; i < l.spectra.size(); i++) {
            int[] r = l.spectra.get(i);
            Map<Integer, Integer> d = l.dwell.get(i);
            if (r[0] == SweepMode.SURVEY.ordinal()) {
                assertEquals(4, r.length); // a survey has no support windows
                assertEquals(dwell, r[3]);
                d.values().forEach(v -> assertEquals(dwell, v));
                continue;
            }
            focus++;
            int supports = (r.length - 4) / 2;
            assertEquals(3, supports, "a wide steady peak has three distinct support windows");
            assertEquals(FLOOR, r[3]);
            // closed form: the floor plus a third of (table dwell - floor) x band windows (budget 0)
            int share = FLOOR + (dwell - FLOOR) * r[2] / 3;
            int prev = -1;
            long total = 0;
            for (int k = 0; k < supports; k++) {
                int entry = r[4 + 2 * k];
                assertTrue(entry > prev && entry < r[2], "support entries ascend inside the band");
                prev = entry;
                assertEquals(share, r[5 + 2 * k]);
                assertEquals(share, d.get(r[1] + entry)); // the step command carried it (hardware ICD §3.1)
            }
            for (Map.Entry<Integer, Integer> e : d.entrySet()) {
                total += e.getValue();
                boolean isSupport = false;
                for (int k = 0; k < supports; k++) {
                    isSupport |= e.getKey() == r[1] + r[4 + 2 * k];
                }
                if (!isSupport) {
                    assertEquals(FLOOR, e.getValue(), "window " + e.getKey());
                }
            }
            assertEquals(r[2], d.size());
            // the sweep integrates what the equal-dwell band would, to the rounding of the shares
            assertTrue(Math.abs(total - (long) dwell * r[2]) < supports, "total " + total);
        }
        assertTrue(focus >= 20, "focus sweeps " + focus);
        assertEquals(SweepMode.FOCUS, loop.scheduler.mode());
    }

    @Test
    void shouldPlaceTheSupportWindowsAtThePeakAndItsFlanks() {
        Sweeps l = new Sweeps();
        List<int[]> bands = new ArrayList<>();
        List<int[]> rangesAfter = new ArrayList<>();
        int[] lastRange = new int[128];
        java.util.Arrays.fill(lastRange, DemoCup.INSTRUMENT.gainRanges() - 1); // never read: the top range
        SweepScheduler[] s = new SweepScheduler[1];
        SweepListener both = new SweepListener() {
            @Override
            public void onStep(StepCommand c, long nowMicros) {
                l.onStep(c, nowMicros);
            }

            @Override
            public void onSweepComplete(Spectrum sp, long nowMicros) {
                l.onSweepComplete(sp, nowMicros);
                for (int i = 0; i < sp.count(); i++) {
                    if ((sp.status(i) & Spectrum.STATUS_MISSING) == 0) {
                        lastRange[sp.window(i)] = sp.gainRange(i);
                    }
                }
                rangesAfter.add(lastRange.clone());
            }

            @Override
            public void onBandChosen(int first, int last, int peakQ8, long nowMicros) {
                Spectrum from = s[0].lastSpectrum();
                bands.add(new int[] {first, last, peakQ8, from.lowHalfWindowsQ8(), from.fwhmWindowsQ8() - from.lowHalfWindowsQ8()});
            }
        };
        ClosedLoop loop = new ClosedLoop(new SweepScheduler(DemoCup.INSTRUMENT, Fixtures.TABLE, support(5, 0), both),
                Fixtures.nearSun(31));
        s[0] = loop.scheduler;
        loop.runSweeps(20);
        FocusDesign design = new FocusDesign(DemoCup.INSTRUMENT);
        int checked = 0;
        int stepped = 0;
        int b = 0;
        for (int i = 0; i < l.spectra.size(); i++) {
            int[] r = l.spectra.get(i);
            if (r[0] != SweepMode.FOCUS.ordinal()) {
                continue;
            }
            int[] band = bands.get(b++);
            int[] ranges = rangesAfter.get(i - 1); // the ranges each window was last read in

            assertEquals(band[0], r[1]);
            // the peak window is the band's reference peak rounded (closed form); the flanks lie the
            // table's factors of the half-widths below and above it (FocusDesign.supportWindows)
            assertEquals((band[2] + 128) >> 8, r[1] + r[6]);
            long low = band[2] - ((long) band[3] * design.lowSupportFactorQ8(band[3]) >> 8);
            long high = band[2] + ((long) band[4] * design.highSupportFactorQ8(band[4]) >> 8);
            int lowFlank = (int) Math.max(band[0], (low + 128) >> 8);
            int highFlank = (int) Math.min(band[1], (high + 128) >> 8);
            // a flank moves out to the first window within 3 that was read in a more sensitive range
            int peakWindow = (band[2] + 128) >> 8;
            int lowMoved = outward(lowFlank, -1, band[0], band[1], peakWindow, ranges);
            int highMoved = outward(highFlank, 1, band[0], band[1], peakWindow, ranges);
            stepped += (lowMoved != lowFlank ? 1 : 0) + (highMoved != highFlank ? 1 : 0);
            lowFlank = lowMoved;
            highFlank = highMoved;
            assertEquals(lowFlank, r[1] + r[4]);
            assertEquals(highFlank, r[1] + r[8]);
            checked++;
        }
        assertTrue(checked >= 10, "focus sweeps " + checked);
        System.out.println("support flanks moved past a range switch: " + stepped + " of " + 2 * checked);
    }

    /** The flank rule of FocusDesign.supportWindows, written out here for the closed loop's check. */
    private static int outward(int w, int step, int first, int last, int peak, int[] ranges) {
        for (int k = 1; w != peak && k <= 3 && w + step * k >= first && w + step * k <= last; k++) {
            if (ranges[w + step * k] < ranges[w]) {
                return w + step * k;
            }
        }
        return w;
    }

    @Test
    void shouldShareTheBudgetLeftAfterTheSettles() {
        int budget = 600_000;
        Sweeps l = new Sweeps();
        ClosedLoop loop = new ClosedLoop(new SweepScheduler(DemoCup.INSTRUMENT, Fixtures.TABLE, support(4, budget), l),
                Fixtures.nearSun(31));
        loop.runSweeps(20);
        SweepParameters p = support(4, budget);
        int focus = 0;
        for (int i = 0; i < l.spectra.size(); i++) {
            int[] r = l.spectra.get(i);
            if (r[0] != SweepMode.FOCUS.ordinal()) {
                continue;
            }
            focus++;
            // the settles the budget was reduced by: the widest adjacent rail change of the band for every
            // step but the first (FocusDesign), which settles from where the rails stood
            List<StepCommand> steps = l.steps.get(i);
            int first = r[1];
            int last = r[1] + r[2] - 1;
            long settle = Math.max(SettleTime.micros(p, Fixtures.TABLE.dacLow(first), Fixtures.TABLE.dacHigh(first),
                    Fixtures.TABLE.dacLow(first + 1), Fixtures.TABLE.dacHigh(first + 1)),
                    SettleTime.micros(p, Fixtures.TABLE.dacLow(last - 1), Fixtures.TABLE.dacHigh(last - 1),
                            Fixtures.TABLE.dacLow(last), Fixtures.TABLE.dacHigh(last)));
            long integrating = budget - steps.get(0).settleMicros - (r[2] - 1L) * settle;
            long periods = integrating / DemoCup.INSTRUMENT.modulationPeriodMicros();
            int share = (int) (FLOOR + (periods - (long) FLOOR * r[2]) / 3);
            assertEquals(share, r[5]);
            // the sweep then takes about the budget: monotonic order, so each settle is at most the estimate
            long took = 0;
            for (StepCommand c : steps) {
                took += c.durationMicros(DemoCup.INSTRUMENT.modulationPeriodMicros());
            }
            assertTrue(took <= budget, "sweep of " + took + " us");
            assertTrue(took > budget - 3 * DemoCup.INSTRUMENT.modulationPeriodMicros() - r[2] * settle, "sweep of " + took);
        }
        assertTrue(focus >= 10, "focus sweeps " + focus);
    }

    @Test
    void shouldInterpolateTheFactorTablesBetweenTheirAnchors() {
        FocusDesign d = new FocusDesign(DemoCup.INSTRUMENT);
        // anchors (FocusDesign, docs/focus-design.md "Support dwell"): 1.74 low half-widths at 14 windows,
        // 1.30 at 4; 1.10 high half-widths at 12, 1.36 at 9
        assertEquals(445, d.lowSupportFactorQ8(14 << 8));
        assertEquals(333, d.lowSupportFactorQ8(4 << 8));
        assertEquals(282, d.highSupportFactorQ8(12 << 8));
        assertEquals(348, d.highSupportFactorQ8(9 << 8));
        // between anchors linear: low at 12 windows is halfway between 1.50 (10) and 1.74 (14)
        assertEquals((384 + 445) / 2, d.lowSupportFactorQ8(12 << 8));
        // rounded to whole windows, and beyond the last anchor its value
        assertEquals(d.lowSupportFactorQ8(12 << 8), d.lowSupportFactorQ8((12 << 8) + 127));
        assertEquals(445, d.lowSupportFactorQ8(200 << 8));
        assertEquals(d.highSupportFactorQ8(0), d.highSupportFactorQ8(-5));
    }

    @Test
    void shouldClampTheSupportToTheBandAndDropRepeats() {
        FocusDesign d = new FocusDesign(DemoCup.INSTRUMENT);
        int[] out = new int[FocusDesign.SUPPORT_WINDOWS];
        int[] ranges = new int[128];
        // peak at 50.0, half-widths 10 (low: 1.50 -> 15 windows) and 9 (high: 1.36 -> 12.2): 35, 50, 62
        assertEquals(3, d.supportWindows(50 << 8, 10 << 8, 9 << 8, 30, 80, ranges, out));
        assertArrayEquals(new int[] {35, 50, 62}, out);
        // a band that cuts both flanks: the flanks fall on its edges
        assertEquals(3, d.supportWindows(50 << 8, 10 << 8, 9 << 8, 40, 55, ranges, out));
        assertArrayEquals(new int[] {40, 50, 55}, out);
        // a peak narrower than a window: one support window
        assertEquals(1, d.supportWindows(50 << 8, 32, 32, 40, 55, ranges, out));
        assertEquals(50, out[0]);
    }

    @Test
    void shouldMoveAFlankOutOfALessSensitiveRange() {
        FocusDesign d = new FocusDesign(DemoCup.INSTRUMENT);
        int[] out = new int[FocusDesign.SUPPORT_WINDOWS];
        int[] ranges = new int[128];
        // peak 50.0, half-widths 10 and 9: flanks at 35 and 62 (shouldClampTheSupportToTheBandAndDropRepeats)
        java.util.Arrays.fill(ranges, 36, 62, 1); // the flanks are in range 0 already: they stay
        d.supportWindows(50 << 8, 10 << 8, 9 << 8, 30, 80, ranges, out);
        assertArrayEquals(new int[] {35, 50, 62}, out);
        java.util.Arrays.fill(ranges, 35, 63, 1); // the flanks in range 1, their outer neighbours in 0: one out
        d.supportWindows(50 << 8, 10 << 8, 9 << 8, 30, 80, ranges, out);
        assertArrayEquals(new int[] {34, 50, 63}, out);
        java.util.Arrays.fill(ranges, 34, 64, 1); // range 0 two windows out: two out
        d.supportWindows(50 << 8, 10 << 8, 9 << 8, 30, 80, ranges, out);
        assertArrayEquals(new int[] {33, 50, 64}, out);
        java.util.Arrays.fill(ranges, 33, 65, 1); // three out: RANGE_STEP_WINDOWS
        d.supportWindows(50 << 8, 10 << 8, 9 << 8, 30, 80, ranges, out);
        assertEquals(3, FocusDesign.RANGE_STEP_WINDOWS);
        assertArrayEquals(new int[] {32, 50, 65}, out);
        java.util.Arrays.fill(ranges, 32, 66, 1); // four out is too far: stay
        d.supportWindows(50 << 8, 10 << 8, 9 << 8, 30, 80, ranges, out);
        assertArrayEquals(new int[] {35, 50, 62}, out);
        // the first more sensitive window counts, not the most sensitive
        java.util.Arrays.fill(ranges, 0, 128, 2);
        ranges[34] = 1;
        ranges[33] = 0;
        d.supportWindows(50 << 8, 10 << 8, 9 << 8, 30, 80, ranges, out);
        assertEquals(34, out[0]);
        // never beyond the band
        java.util.Arrays.fill(ranges, 0, 128, 0);
        java.util.Arrays.fill(ranges, 35, 63, 1);
        d.supportWindows(50 << 8, 10 << 8, 9 << 8, 35, 62, ranges, out);
        assertArrayEquals(new int[] {35, 50, 62}, out);
    }

    @Test
    void shouldRefuseAStyleOrFloorOutOfRange() {
        // commands.md §4.1: focusStyle 0..7 and 12..15 (paired support only with support dwell; 16, alpha-clear,
        // only on a design style, AlphaClearBandTest);
        // focusFloorPeriods 1..integrationPeriods with support dwell
        SweepParameters p = support(7, 0);
        assertEquals(TableStatus.OK, p.validate(DemoCup.INSTRUMENT.rangeRatioShift()));
        p.focusStyle = 15;
        assertEquals(TableStatus.OK, p.validate(DemoCup.INSTRUMENT.rangeRatioShift()));
        p.focusStyle = 12;
        assertEquals(TableStatus.OK, p.validate(DemoCup.INSTRUMENT.rangeRatioShift()));
        for (int style : new int[] {8, 11, 16}) {
            p.focusStyle = style;
            assertEquals(TableStatus.BAD_STYLE, p.validate(DemoCup.INSTRUMENT.rangeRatioShift()), "focusStyle " + style);
        }
        p.focusStyle = 7;
        p = support(4, 0);
        p.focusFloorPeriods = 0;
        assertEquals(TableStatus.BAD_STYLE, p.validate(DemoCup.INSTRUMENT.rangeRatioShift()));
        p.focusFloorPeriods = p.integrationPeriods + 1;
        assertEquals(TableStatus.BAD_STYLE, p.validate(DemoCup.INSTRUMENT.rangeRatioShift()));
        p.focusFloorPeriods = p.integrationPeriods;
        assertEquals(TableStatus.OK, p.validate(DemoCup.INSTRUMENT.rangeRatioShift()));
        p.focusStyle = 3;
        p.focusFloorPeriods = -1;
        assertEquals(TableStatus.BAD_STYLE, p.validate(DemoCup.INSTRUMENT.rangeRatioShift()));
        p.focusFloorPeriods = 0; // ignored without support dwell
        assertEquals(TableStatus.OK, p.validate(DemoCup.INSTRUMENT.rangeRatioShift()));
    }

    @Test
    void shouldPairEachSupportWindowWithANeighbour() {
        FocusDesign d = new FocusDesign(DemoCup.INSTRUMENT);
        int[] out = new int[FocusDesign.MAX_SUPPORT_WINDOWS];
        int[] ranges = new int[128];
        // flanks at 35 and 62 (shouldClampTheSupportToTheBandAndDropRepeats): each pairs with the window
        // outward; the peak at 50.0 (fraction below a half) with the window above it
        int n = d.supportWindows(50 << 8, 10 << 8, 9 << 8, 30, 80, ranges, out);
        assertEquals(6, d.pairedSupport(out, n, 50 << 8, 30, 80));
        assertArrayEquals(new int[] {34, 35, 50, 51, 62, 63}, out);
        // a peak refined at 49.75 rounds to 50 and pairs with 49, the side of its refined position
        n = d.supportWindows((50 << 8) - 64, 10 << 8, 9 << 8, 30, 80, ranges, out);
        d.pairedSupport(out, n, (50 << 8) - 64, 30, 80);
        assertEquals(49, out[2]);
        assertEquals(50, out[3]);
        // flanks on the band's edges pair inward
        n = d.supportWindows(50 << 8, 10 << 8, 9 << 8, 40, 55, ranges, out);
        assertEquals(6, d.pairedSupport(out, n, 50 << 8, 40, 55));
        assertArrayEquals(new int[] {40, 41, 50, 51, 54, 55}, out);
        // a band of two windows: the pairs coincide, no repeats
        n = d.supportWindows(50 << 8, 10 << 8, 9 << 8, 50, 51, ranges, out);
        assertEquals(2, d.pairedSupport(out, n, 50 << 8, 50, 51));
        assertEquals(50, out[0]);
        assertEquals(51, out[1]);
    }

    @Test
    void shouldReadEachPairInOppositeHalvesOfAnInterleavedSweep() {
        Sweeps l = new Sweeps();
        ClosedLoop loop = new ClosedLoop(new SweepScheduler(DemoCup.INSTRUMENT, Fixtures.TABLE, support(15, 0), l),
                Fixtures.nearSun(31));
        loop.runSweeps(30);
        int dwell = DemoCup.parameters().integrationPeriods;
        int focus = 0;
        for (int i = 0; i < l.spectra.size(); i++) {
            int[] r = l.spectra.get(i);
            if (r[0] != SweepMode.FOCUS.ordinal()) {
                continue;
            }
            focus++;
            int supports = (r.length - 4) / 2;
            assertEquals(6, supports, "a wide steady peak has three pairs of support windows");
            // closed form: the floor plus a sixth of (table dwell - floor) x band windows (budget 0)
            int share = FLOOR + (dwell - FLOOR) * r[2] / 6;
            List<StepCommand> steps = l.steps.get(i);
            for (int k = 0; k < supports; k += 2) {
                assertEquals(r[4 + 2 * k] + 1, r[6 + 2 * k], "a pair is two neighbouring windows");
                assertEquals(share, r[5 + 2 * k]);
                assertEquals(share, r[7 + 2 * k]);
                // interleaved order (R22): even offsets on the way out, odd ones on the way back
                int a = stepIndex(steps, r[1] + r[4 + 2 * k]);
                int b = stepIndex(steps, r[1] + r[6 + 2 * k]);
                int half = (steps.size() + 1) / 2;
                assertTrue((a < half) != (b < half), "pair read at steps " + a + " and " + b + " of " + steps.size());
            }
        }
        assertTrue(focus >= 20, "focus sweeps " + focus);
    }

    private static int stepIndex(List<StepCommand> steps, int window) {
        for (int k = 0; k < steps.size(); k++) {
            if (steps.get(k).window == window) {
                return k;
            }
        }
        throw new AssertionError("window " + window + " not stepped");
    }

    @Test
    void shouldDwellTheTablesDwellWhenTheFloorLeavesNothingToShare() {
        Sweeps l = new Sweeps();
        SweepParameters p = support(4, 0);
        p.focusFloorPeriods = p.integrationPeriods;
        ClosedLoop loop = new ClosedLoop(new SweepScheduler(DemoCup.INSTRUMENT, Fixtures.TABLE, p, l), Fixtures.nearSun(31));
        loop.runSweeps(10);
        for (int i = 0; i < l.spectra.size(); i++) {
            assertEquals(4, l.spectra.get(i).length); // no support windows: the packet stays layout 2
            l.dwell.get(i).values().forEach(v -> assertEquals(p.integrationPeriods, v));
        }
    }
}
