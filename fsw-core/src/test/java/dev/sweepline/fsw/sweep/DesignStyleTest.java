package dev.sweepline.fsw.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.table.SweepParameters;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The scheduler in the design style (sweep design note R21): it locks as in the band style, chooses the
 * design's band for the measured shape of the peak, flies every focus sweep within its budget at one dwell,
 * surveys at the quick survey's dwell, and reports each sweep's dwell with its spectrum.
 */
class DesignStyleTest {
    private static final int BUDGET_MICROS = 700_000;

    private static SweepParameters designStyle() {
        SweepParameters p = DemoCup.parameters();
        p.focusStyle = SweepParameters.FOCUS_STYLE_DESIGN;
        p.focusBudgetMicros = BUDGET_MICROS;
        p.robustnessMarginWindows = 1;
        p.surveyIntegrationPeriods = 4;
        return p;
    }

    /** Centre code of window {@code w} of the fixture table, (low + high) / 2 as the scheduler's table. */
    private static int centre(int w) {
        return (Fixtures.TABLE.dacLow(w) + Fixtures.TABLE.dacHigh(w)) / 2;
    }

    @Test
    void shouldLockAndFlyTheDesignBandWithinItsBudget() {
        RecordingListener l = new RecordingListener();
        List<int[]> dwell = new ArrayList<>();
        List<int[]> bands = new ArrayList<>();
        SweepScheduler[] scheduler = new SweepScheduler[1];
        SweepListener both = new SweepListener() {
            @Override
            public void onStep(dev.sweepline.fsw.link.StepCommand s, long nowMicros) {
                l.onStep(s, nowMicros);
            }

            @Override
            public void onSweepComplete(Spectrum s, long nowMicros) {
                l.onSweepComplete(s, nowMicros);
                dwell.add(new int[] {s.mode().ordinal(), s.integrationPeriods(), s.count(), s.fwhmWindowsQ8(),
                    (int) (s.endMicros() - s.startMicros())});
            }

            @Override
            public void onBandChosen(int first, int last, int peakQ8, long nowMicros) {
                Spectrum from = scheduler[0].lastSpectrum();
                bands.add(new int[] {first, last, peakQ8, from.fwhmWindowsQ8(), from.lowHalfWindowsQ8()});
            }

            @Override
            public void onModeChange(SweepMode from, SweepMode to, int reason, long nowMicros) {
                l.onModeChange(from, to, reason, nowMicros);
            }
        };
        ClosedLoop loop = new ClosedLoop(new SweepScheduler(DemoCup.INSTRUMENT, Fixtures.TABLE, designStyle(), both),
                Fixtures.nearSun(31));
        l.scheduler = loop.scheduler;
        scheduler[0] = loop.scheduler;
        loop.runSweeps(40);
        int focus = 0;
        int stretched = 0;
        for (int[] d : dwell) {
            if (d[0] == SweepMode.SURVEY.ordinal()) {
                assertEquals(4, d[1]); // the quick survey's dwell (surveyIntegrationPeriods)
                continue;
            }
            focus++;
            assertTrue(d[1] >= DemoCup.parameters().integrationPeriods, "dwell " + d[1]); // never below the table's
            if (d[1] > DemoCup.parameters().integrationPeriods) {
                // above the table's dwell the budget holds the whole sweep (settles as commanded: the
                // synthetic instrument replies at the end of each step, ClosedLoop)
                assertTrue(d[4] <= BUDGET_MICROS, "focus sweep of " + d[4] + " us, dwell " + d[1]);
                stretched++;
            }
        }
        assertTrue(focus >= 30, "focus sweeps " + focus);
        assertTrue(stretched >= 30, "focus sweeps above the table's dwell " + stretched);
        // every band is the design's: 2.0 low half-widths at half maximum below, above 1.75 high ones or
        // 1.0 beyond the alphas' window, plus the margin either side of the peak of the spectrum it was
        // chosen from (steady wind: no edge search);
        // docs/focus-design.md, closed form with the rounding of FocusDesign.reachAbove/reachBelow
        SweepParameters p = designStyle();
        assertTrue(bands.size() >= 30, "bands " + bands.size());
        int alphasHeld = 0;
        for (int[] band : bands) {
            int highHalfQ8 = band[3] - band[4];
            // the alphas' window: the first whose centre code reaches alphaRatio x the peak's code
            // (linear between window centres, as FocusBand.codeAtQ8)
            int w = band[2] >> 8;
            long peakCode = centre(w) + Math.floorDiv((long) (centre(w + 1) - centre(w)) * (band[2] & 0xFF), 256);
            long alphaCode = Math.floorDiv(peakCode * p.alphaRatioQ16, 65_536);
            int alpha = 0;
            while (alpha < 127 && centre(alpha) < alphaCode) {
                alpha++;
            }
            int reach = Math.max((int) Math.round(highHalfQ8 * 1.75 / 256),
                    alpha - ((band[2] + 128) >> 8) + (int) Math.round(highHalfQ8 / 256.0));
            int above = Math.max(p.minHalfWidthWindows, Math.min(31, reach + 1));
            int below = Math.max(p.minHalfWidthWindows, Math.min(63 - above, (int) Math.round(band[4] * 2.0 / 256) + 1));
            int centre = (band[2] + 128) >> 8;
            assertEquals(Math.max(0, centre - below), band[0]);
            assertEquals(Math.min(127, centre + above), band[1]);
            if (band[1] >= Math.min(127, alpha)) {
                alphasHeld++;
            }
        }
        // every band holds the alphas' expected window, for the ground's joint fit
        assertEquals(bands.size(), alphasHeld);
        // every step of a sweep flies the spectrum's dwell: steps of the last full focus sweep
        int n = l.steps.size();
        int last = l.steps.get(n - 1).periods();
        assertEquals(SweepMode.FOCUS, loop.scheduler.mode());
        assertTrue(last > DemoCup.parameters().integrationPeriods, "design dwell " + last);
    }
}
