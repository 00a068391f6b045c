package dev.sweepline.fsw.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.fsw.table.TableStatus;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The alpha-clear design band (sweep design note R24, docs/focus-design.md "Alpha-clear"): alphas expected at
 * least 2.5 proton high half-widths above the refined peak add no reach above it, closer ones keep the design
 * band's reach beyond them, the margin is added either way, the previous band's peak must leave them clear
 * too, and every style without the flag bands as before.
 */
class AlphaClearBandTest {
    private static SweepParameters style(int focusStyle, int margin) {
        SweepParameters p = Fixtures.designStyle();
        p.focusStyle = focusStyle;
        p.robustnessMarginWindows = margin;
        return p;
    }

    private static final int ALPHA_CLEAR_DESIGN = SweepParameters.FOCUS_STYLE_ALPHA_CLEAR | SweepParameters.FOCUS_STYLE_DESIGN;

    @Test
    void shouldLeaveOutAlphasWellAboveTheProtons() {
        SweepParameters p = style(ALPHA_CLEAR_DESIGN, 0);
        // high half-width 4 windows: the protons' reach is 4 x 1.75 = 7 (FocusDesign.HIGH_REACH_PER_HWHM_Q8);
        // alphas 12 windows above are 3.0 half-widths out, beyond R24's 2.5: the reach stays 7, where the
        // design style reaches 12 + 1.0 x 4 = 16 (FocusDesign.ALPHA_REACH_PER_HWHM_Q8)
        assertEquals(7, FocusDesign.reachAbove(4 << 8, 12, p));
        assertEquals(16, FocusDesign.reachAbove(4 << 8, 12, style(SweepParameters.FOCUS_STYLE_DESIGN, 0)));
        // the default table's alphas at the alpha ratio 1.9863 (physics.md) lie 18 windows of 3.8 % above
        // the protons; 18 / 4 = 4.5 half-widths: clear
        assertEquals(7, FocusDesign.reachAbove(4 << 8, 18, p));
    }

    @Test
    void shouldKeepAlphasCloserThanTheThreshold() {
        SweepParameters p = style(ALPHA_CLEAR_DESIGN, 0);
        // alphas 9 windows above a high half-width of 4: 2.25 half-widths, on the protons' flank: the band
        // reaches 9 + 4 = 13 as the design style's
        assertEquals(13, FocusDesign.reachAbove(4 << 8, 9, p));
        assertEquals(13, FocusDesign.reachAbove(4 << 8, 9, style(SweepParameters.FOCUS_STYLE_DESIGN, 0)));
        // a wide perihelion peak (high half-width 10.4 windows) with its alphas 18 windows above: 1.73
        // half-widths, kept: 18 + 10 = 28 beats the protons' 18
        assertEquals(28, FocusDesign.reachAbove((int) Math.round(10.4 * 256), 18, p));
    }

    @Test
    void shouldCountTheThresholdItselfAsClear() {
        // R24: "at least 2.5 half-widths": 4 x 2.5 = 10 windows is clear, 9 is not
        assertTrue(FocusDesign.alphasClear(4 << 8, 10));
        assertFalse(FocusDesign.alphasClear(4 << 8, 9));
        SweepParameters p = style(ALPHA_CLEAR_DESIGN, 0);
        assertEquals(7, FocusDesign.reachAbove(4 << 8, 10, p));
        assertEquals(9 + 4, FocusDesign.reachAbove(4 << 8, 9, p));
        // at the Q8 resolution of the half-width: 6.4 windows (1638/256 = 6.398) x 2.5 = 15.996 <= 16 is
        // clear; 1639/256 = 6.402, x 2.5 = 16.006 > 16 is not
        assertTrue(FocusDesign.alphasClear(1638, 16));
        assertFalse(FocusDesign.alphasClear(1639, 16));
        // the constant is 2.5 in Q8 (FocusDesign.ALPHA_CLEAR_PER_HWHM_Q8, R24)
        assertEquals(640, FocusDesign.ALPHA_CLEAR_PER_HWHM_Q8);
    }

    @Test
    void shouldAddTheMarginEitherWay() {
        SweepParameters p = style(ALPHA_CLEAR_DESIGN, 2);
        assertEquals(7 + 2, FocusDesign.reachAbove(4 << 8, 12, p)); // clear: the protons' 7 plus margin 2
        assertEquals(13 + 2, FocusDesign.reachAbove(4 << 8, 9, p)); // kept: 9 + 4 plus margin 2
        // the band limits of FocusDesignTest still hold: at most (64 - 1) / 2 = 31 above, at least min 4
        assertEquals(31, FocusDesign.reachAbove(40 << 8, 100, p));
        assertEquals(p.minHalfWidthWindows, FocusDesign.reachAbove(0, 100, style(ALPHA_CLEAR_DESIGN, 0)));
    }

    @Test
    void shouldLeaveEveryStyleWithoutTheFlagUnchanged() {
        // R21's closed form for every design style without the flag (1, 3, 5, 7, 13, 15): the alphas' reach
        // whether or not they are clear; the band style (0, 2, ...) does not call reachAbove
        for (int s : new int[] {1, 3, 5, 7, 13, 15}) {
            SweepParameters p = style(s, 1);
            p.focusFloorPeriods = p.supportDwell() ? 1 : 0;
            assertEquals(TableStatus.OK, p.validate(DemoCup.INSTRUMENT.rangeRatioShift()));
            assertFalse(p.alphaClear());
            assertEquals(16 + 1, FocusDesign.reachAbove(4 << 8, 12, p), "style " + s);
            assertEquals(13 + 1, FocusDesign.reachAbove(4 << 8, 9, p), "style " + s);
        }
    }

    @Test
    void shouldAcceptTheFlagOnlyWithTheDesignBand() {
        // commands.md §4.1: + 16 only on a design style (17, 19, 21, 23, 29, 31), else 18 BAD_STYLE
        for (int s : new int[] {17, 19, 21, 23, 29, 31}) {
            SweepParameters p = style(s, 1);
            p.focusFloorPeriods = p.supportDwell() ? 1 : 0;
            assertEquals(TableStatus.OK, p.validate(DemoCup.INSTRUMENT.rangeRatioShift()), "style " + s);
            assertTrue(p.alphaClear());
        }
        for (int s : new int[] {16, 18, 20, 22, 24, 25, 27, 28, 30, 32, -16}) {
            SweepParameters p = style(s, 1);
            p.focusFloorPeriods = p.supportDwell() ? 1 : 0;
            assertEquals(TableStatus.BAD_STYLE, p.validate(DemoCup.INSTRUMENT.rangeRatioShift()), "style " + s);
        }
    }

    @Test
    void shouldWantTheAlphasClearOfThePreviousBandsPeakToo() {
        // R24: a band leaves the alphas out only when they are clear by its spectrum's high half-width and by
        // that of the spectrum the previous band was chosen from (FocusBand.choose): an explicit 4-argument
        // reach with the previous half-width wide (13 windows: 18 / 13 = 1.4 half-widths) keeps them
        SweepParameters p = style(ALPHA_CLEAR_DESIGN, 0);
        assertEquals(18 + 4, FocusDesign.reachAbove(4 << 8, 13 << 8, 18, p));
        assertEquals(7, FocusDesign.reachAbove(4 << 8, 4 << 8, 18, p));
        // in closed loop: a wide near-Sun peak (alphas kept), then the wind cools to 1e5 K at the same speed
        // (a high half-width of about 6 windows, the alphas 18 above: clear); the first band chosen from a
        // cool spectrum still holds the alphas, the later ones stop short of them
        List<int[]> bands = new ArrayList<>();
        ClosedLoop loop = recording(style(ALPHA_CLEAR_DESIGN, 1), Fixtures.nearSun(43), bands);
        loop.runSweeps(12);
        loop.instrument.protonThermalKmPerS = SyntheticInstrument.thermalKmPerS(1e5, SyntheticInstrument.PROTON_MASS);
        loop.runSweeps(12);
        int firstNarrow = -1;
        for (int k = 1; k < bands.size(); k++) {
            if (bands.get(k)[3] < 8 << 8 && bands.get(k - 1)[3] >= 10 << 8) {
                firstNarrow = k;
            }
        }
        assertTrue(firstNarrow > 0, "no band chosen from a cool spectrum after a wide one");
        int[] b = bands.get(firstNarrow);
        int centre = (b[2] + 128) >> 8;
        assertTrue(b[1] - centre >= 18, "first cool band " + b[0] + ".." + b[1] + " around " + centre);
        for (int k = firstNarrow + 1; k < bands.size(); k++) {
            int[] c = bands.get(k);
            int at = (c[2] + 128) >> 8;
            assertTrue(c[1] - at < 18 - 1, "cool band " + k + ": " + c[0] + ".." + c[1] + " around " + at);
        }
        assertTrue(bands.size() - firstNarrow >= 5, "cool bands " + (bands.size() - firstNarrow));
    }

    /** The bands a scheduler of {@code p} chooses over 40 sweeps of {@code plasma}: first, last, peak Q8, high half Q8. */
    private static List<int[]> bands(SweepParameters p, SyntheticInstrument plasma) {
        List<int[]> bands = new ArrayList<>();
        recording(p, plasma, bands).runSweeps(40);
        assertTrue(bands.size() >= 30, "bands " + bands.size());
        return bands;
    }

    /** A loop of a scheduler of {@code p} on {@code plasma} that adds every band it chooses to {@code bands}. */
    private static ClosedLoop recording(SweepParameters p, SyntheticInstrument plasma, List<int[]> bands) {
        SweepScheduler[] scheduler = new SweepScheduler[1];
        SweepListener l = new SweepListener() {
            @Override
            public void onBandChosen(int first, int last, int peakQ8, long nowMicros) {
                Spectrum from = scheduler[0].lastSpectrum();
                bands.add(new int[] {first, last, peakQ8, from.fwhmWindowsQ8() - from.lowHalfWindowsQ8()});
            }
        };
        ClosedLoop loop = new ClosedLoop(new SweepScheduler(DemoCup.INSTRUMENT, Fixtures.TABLE, p, l), plasma);
        scheduler[0] = loop.scheduler;
        return loop;
    }

    @Test
    void shouldStopBelowTheAlphasOfANarrowPeakInClosedLoop() {
        // 1 AU slow wind (physics.md worked case P1): a high half-width of about 4 windows, the alphas 18
        // windows above: clear. Every band stops at 1.75 high half-widths plus the margin (1), short of the
        // alphas' expected window, where every design band holds it (DesignStyleTest)
        SweepParameters p = style(ALPHA_CLEAR_DESIGN, 1);
        for (int[] b : bands(p, Fixtures.oneAu(83))) {
            int centre = (b[2] + 128) >> 8;
            int protons = (int) Math.round(b[3] * 1.75 / 256);
            assertEquals(Math.max(p.minHalfWidthWindows, protons + 1), b[1] - centre);
            assertTrue(b[1] - centre < 18 - 1, "band " + b[0] + ".." + b[1] + " around " + centre);
        }
        for (int[] b : bands(style(SweepParameters.FOCUS_STYLE_DESIGN, 1), Fixtures.oneAu(83))) {
            int centre = (b[2] + 128) >> 8;
            assertTrue(b[1] - centre >= 18, "design band " + b[0] + ".." + b[1] + " around " + centre);
        }
    }

    @Test
    void shouldFlyTheDesignBandWhenTheAlphasRideOnTheFlank() {
        // near 0.05 AU (U/w near 3): a high half-width of about 13 windows, the alphas 18 above: 1.4
        // half-widths, kept, so the alpha-clear scheduler flies exactly the design style's bands
        List<int[]> clear = bands(style(ALPHA_CLEAR_DESIGN, 1), Fixtures.nearSun(37));
        List<int[]> design = bands(style(SweepParameters.FOCUS_STYLE_DESIGN, 1), Fixtures.nearSun(37));
        assertEquals(design.size(), clear.size());
        for (int k = 0; k < design.size(); k++) {
            assertEquals(java.util.Arrays.toString(design.get(k)), java.util.Arrays.toString(clear.get(k)), "band " + k);
        }
    }
}
