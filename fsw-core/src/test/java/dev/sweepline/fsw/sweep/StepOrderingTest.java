package dev.sweepline.fsw.sweep;

import dev.sweepline.fsw.DemoCup;
import dev.sweepline.fsw.table.SweepParameters;
import java.util.List;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Step ordering and settle accounting (sweep design note R12, R13). */
class StepOrderingTest {
    @Test
    void shouldAlternateSurveyDirection() {
        SyntheticInstrument empty = Fixtures.oneAu(51);
        empty.protonDensityPerCm3 = 0; // no peak: stays in survey
        RecordingListener l = new RecordingListener();
        ClosedLoop loop = Fixtures.loop(empty, DemoCup.parameters(), l);
        loop.runSweeps(4);
        // issue 2: up, then down, ...; starting from HV off the bottom is nearer
        for (int sweep = 0; sweep < 4; sweep++) {
            List<RecordingListener.Step> steps = l.steps.subList(sweep * 128, (sweep + 1) * 128);
            for (int k = 0; k < 128; k++) {
                int expected = sweep % 2 == 0 ? k : 127 - k;
                assertEquals(expected, steps.get(k).window(), "sweep " + sweep + " step " + k);
            }
        }
    }

    @Test
    void shouldStoreSpectrumAscendingWhenSteppedDown() {
        SyntheticInstrument plasma = Fixtures.nearSun(52);
        plasma.noiseCounts = 0;
        RecordingListener l = new RecordingListener();
        SweepParameters p = DemoCup.parameters();
        ClosedLoop loop = Fixtures.loop(plasma, p, l);
        loop.runSweeps(1);
        Spectrum s = loop.scheduler.lastSpectrum();
        assertTrue(s.ascending());
        // the survey locked (near-Sun signal); command another survey: HV sits at window 127, so it steps down
        loop.scheduler.requestMode(SweepMode.SURVEY, loop.nowMicros);
        loop.runSweeps(1);
        s = loop.scheduler.lastSpectrum();
        assertEquals(SweepMode.SURVEY, s.mode());
        assertEquals(false, s.ascending());
        assertEquals(127, l.steps.get(128).window());
        for (int i = 0; i < s.count(); i++) {
            assertEquals(i, s.window(i));
            double expected = plasma.currentAmps(Fixtures.TABLE.dacLow(i), Fixtures.TABLE.dacHigh(i));
            // noise-free: counts = pedestal + round(I/4 / FS_r * 65279) per quadrant; total back in amps
            double fullScale0 = 40e-12;
            double amps = s.currentUnits(i) * fullScale0 / 65279.0;
            assertEquals(expected, amps, 4 * 0.5 * (fullScale0 / 65279.0) * (1 << (5 * s.gainRange(i))) + 1e-18,
                "window " + i); // 4 quadrants x half a count of rounding in the range read
        }
    }

    @Test
    void shouldStepNeighboursWithinEverySweep() {
        RecordingListener l = new RecordingListener();
        ClosedLoop loop = Fixtures.loop(Fixtures.oneAu(53), DemoCup.parameters(), l);
        loop.runSweeps(25);
        int index = 0;
        for (long[] sweep : l.sweeps) {
            int n = (int) sweep[2];
            for (int k = 1; k < n; k++) {
                assertEquals(1, Math.abs(l.steps.get(index + k).window() - l.steps.get(index + k - 1).window()));
            }
            index += n;
        }
    }

    @Test
    void shouldStartFocusFromBandEndNearerHv() {
        RecordingListener l = new RecordingListener();
        ClosedLoop loop = Fixtures.loop(Fixtures.oneAu(54), DemoCup.parameters(), l);
        loop.runSweeps(2); // ranging survey (up), survey (down: ends at window 0) -> FOCUS
        int first = loop.scheduler.bandFirst();
        loop.step();
        assertEquals(first, l.steps.get(l.steps.size() - 1).window()); // HV at window 0: the low end is nearer
        loop.runSweeps(1);
        // the focus sweep ended at the top of the band: the next focus sweep steps down from there
        loop.step();
        assertEquals(loop.scheduler.bandLast(), l.steps.get(l.steps.size() - 1).window());
    }

    @Test
    void shouldAccountSettleForRailChange() {
        SweepParameters p = DemoCup.parameters();
        RecordingListener l = new RecordingListener();
        ClosedLoop loop = Fixtures.loop(Fixtures.oneAu(55), p, l);
        loop.runSweeps(3);
        int lowBefore = 0;
        int highBefore = 0; // HV off at start
        for (RecordingListener.Step s : l.steps) {
            int change = Math.max(Math.abs(s.dacLow() - lowBefore), Math.abs(s.dacHigh() - highBefore));
            // issue 2: settle = fixedSettleMicros + (max rail change in codes * settleMicrosPerCodeQ8 >> 8)
            assertEquals(1000 + ((change * 256) >> 8), s.settleMicros());
            assertEquals(8, s.periods());
            lowBefore = s.dacLow();
            highBefore = s.dacHigh();
        }
        // first step from HV off to window 0 (500..519 codes): 1000 + 519 us
        assertEquals(1000 + Fixtures.TABLE.dacHigh(0), l.steps.get(0).settleMicros());
    }

    @Test
    void shouldChargeLargeSlewWhenLeavingSurveyForBand() {
        RecordingListener l = new RecordingListener();
        ClosedLoop loop = Fixtures.loop(Fixtures.oneAu(56), DemoCup.parameters(), l);
        loop.runSweeps(1); // the first survey finds the 1 AU peak (AcquisitionTest): focus next
        loop.step();
        RecordingListener.Step firstFocus = l.steps.get(l.steps.size() - 1);
        // the first survey ascends: from window 127 down to the band's first window, 1 us per code of the
        // high rail's change
        assertEquals(1000 + Fixtures.TABLE.dacHigh(127) - firstFocus.dacHigh(), firstFocus.settleMicros());
    }
}
