package dev.sweepline.fsw.sweep;

import dev.sweepline.fsw.DemoCup;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Survey to focus, band centring and width (sweep design note R5, R6). Seeds are recorded in the calls. */
class AcquisitionTest {
    /** Gaussian FWHM per sigma, 2 sqrt(2 ln 2) (textbook). */
    private static final double FWHM_PER_SIGMA = 2.354820;

    @Test
    void shouldStartInSurveyAndReportStart() {
        RecordingListener l = new RecordingListener();
        ClosedLoop loop = Fixtures.loop(Fixtures.oneAu(11), DemoCup.parameters(), l);
        assertEquals(SweepMode.SURVEY, loop.scheduler.mode());
        loop.step();
        assertEquals(new RecordingListener.Change(SweepMode.SAFE, SweepMode.SURVEY, ModeChangeReason.START, 0), l.changes.get(0));
    }

    @Test
    void shouldAcquireLockOnceGainsAreRanged() {
        RecordingListener l = new RecordingListener();
        ClosedLoop loop = Fixtures.loop(Fixtures.oneAu(12), DemoCup.parameters(), l);
        loop.runSweeps(1);
        // cold start: the first window is read in the top range (never read, no neighbour read), every next
        // one from its neighbour just read (sweep design note R9): the 1 AU peak (~5 counts per quadrant in
        // the top range, below the 40-count significance threshold there) is read in range 0
        assertEquals(DemoCup.INSTRUMENT.gainRanges() - 1, l.steps.get(0).gainRange());
        int peak = Fixtures.argmax(Fixtures.trueCurrents(Fixtures.oneAu(12)));
        assertEquals(0, l.steps.get(peak).gainRange());
        // so the first survey finds the peak: FOCUS with LOCK_ACQUIRED
        assertEquals(128, l.sweeps.get(0)[2]);
        assertEquals(SweepMode.FOCUS, loop.scheduler.mode());
        assertEquals(ModeChangeReason.LOCK_ACQUIRED, l.lastChange().reason());
        loop.runSweeps(1);
        Spectrum focus = loop.scheduler.lastSpectrum();
        assertEquals(SweepMode.FOCUS, focus.mode());
        assertEquals(l.bands.get(0)[1] - l.bands.get(0)[0] + 1, focus.count());
    }

    @Test
    void shouldAcquireLockAfterOneSurveyWhenSignalIsStrong() {
        RecordingListener l = new RecordingListener();
        ClosedLoop loop = Fixtures.loop(Fixtures.nearSun(19), DemoCup.parameters(), l);
        loop.runSweeps(1);
        // near the Sun (~10 nA/cm^2, physics.md) the top range reads the peak well above the noise
        assertEquals(SweepMode.FOCUS, loop.scheduler.mode());
    }

    @Test
    void shouldCentreBandOnRefinedProtonPeak() {
        SyntheticInstrument plasma = Fixtures.oneAu(13);
        RecordingListener l = new RecordingListener();
        ClosedLoop loop = Fixtures.loop(plasma, DemoCup.parameters(), l);
        loop.runSweeps(3);
        // reference: a floating-point 3-point parabola through the noise-free window currents (physics.md
        // window current); noise is 2 counts on ~1300 per quadrant and Q8 rounding is 1/256 window: 0.05 window
        double reference = Fixtures.parabolaPeak(Fixtures.trueCurrents(plasma));
        assertEquals(reference, loop.scheduler.lastSpectrum().peakWindowQ8() / 256.0, 0.05);
        int centre = (int) Math.round(reference);
        // the band is symmetric about the rounded peak (not clipped: the peak is mid-table)
        assertEquals(centre - loop.scheduler.bandFirst(), loop.scheduler.bandLast() - centre);
    }

    @Test
    void shouldSizeBandFromMeasuredWidth() {
        SyntheticInstrument plasma = Fixtures.oneAu(14);
        ClosedLoop loop = Fixtures.loop(plasma, DemoCup.parameters(), new RecordingListener());
        loop.runSweeps(2);
        // physics.md: E = m v^2 / 2, so sigma(ln E) = 2 sigma_v / U with sigma_v = w / sqrt 2; the
        // window step is ln(120)/128; the v^2 flux factor and the log mapping skew the shape a little: 5 %
        double sigmaLnE = 2 * (plasma.protonThermalKmPerS / Math.sqrt(2)) / plasma.speedKmPerS;
        double expectedFwhm = FWHM_PER_SIGMA * sigmaLnE / (Math.log(120) / 128);
        double fwhm = loop.scheduler.lastSpectrum().fwhmWindowsQ8() / 256.0;
        assertEquals(expectedFwhm, fwhm, 0.05 * expectedFwhm);
        // band half-width = round(1.5 * FWHM) (default halfWidthPerFwhmQ8 384), rounding: exact
        int half = (int) Math.round(fwhm * 1.5);
        assertEquals(2 * half + 1, loop.scheduler.bandLast() - loop.scheduler.bandFirst() + 1);
    }

    @Test
    void shouldCapBandAtMaxWindowsNearTheSun() {
        ClosedLoop loop = Fixtures.loop(Fixtures.nearSun(15), DemoCup.parameters(), new RecordingListener());
        loop.runSweeps(1);
        // U/w = 3: FWHM ~27 windows, 1.5 FWHM ~40 > (64 - 1) / 2 = 31 (default maxBandWindows 64)
        assertEquals(63, loop.scheduler.bandLast() - loop.scheduler.bandFirst() + 1);
    }

    @Test
    void shouldUseMinimumHalfWidthForNarrowPeaks() {
        SyntheticInstrument cold = Fixtures.oneAu(16);
        cold.protonThermalKmPerS = 10; // T ~ 6e3 K: FWHM ~2.2 windows, 1.5 FWHM ~3 < minimum 4
        cold.alphaPerProton = 0;
        ClosedLoop loop = Fixtures.loop(cold, DemoCup.parameters(), new RecordingListener());
        loop.runSweeps(2);
        assertEquals(9, loop.scheduler.bandLast() - loop.scheduler.bandFirst() + 1); // 2 * 4 + 1
    }

    @Test
    void shouldClipBandAtTableEnd() {
        SyntheticInstrument slow = Fixtures.oneAu(17);
        slow.speedKmPerS = 110; // peak E/q ~63 V: window ~6
        slow.protonThermalKmPerS = 11; // w/U 0.1 as at 1 AU: FWHM ~9 windows, half-width ~14 > 6
        ClosedLoop loop = Fixtures.loop(slow, DemoCup.parameters(), new RecordingListener());
        loop.runSweeps(2);
        assertEquals(SweepMode.FOCUS, loop.scheduler.mode());
        Spectrum s = loop.scheduler.lastSpectrum();
        int centre = (s.peakWindowQ8() + 128) >> 8;
        int half = loop.scheduler.bandLast() - centre;
        // clipped, not shifted: the band keeps its centre and loses windows below 0
        assertEquals(0, loop.scheduler.bandFirst());
        assertTrue(centre - half < 0, "band should reach below window 0 before clipping");
        // a clipped edge is not an edge: the lock holds for the following focus sweeps
        loop.runSweeps(5);
        assertEquals(SweepMode.FOCUS, loop.scheduler.mode());
    }

    @Test
    void shouldStaySurveyWithoutSignificantPeak() {
        SyntheticInstrument empty = Fixtures.oneAu(18);
        empty.protonDensityPerCm3 = 0; // noise only: 2 counts rms per quadrant, threshold 5 * 2 * 4 counts
        RecordingListener l = new RecordingListener();
        ClosedLoop loop = Fixtures.loop(empty, DemoCup.parameters(), l);
        loop.runSweeps(4);
        assertEquals(SweepMode.SURVEY, loop.scheduler.mode());
        assertEquals(4, loop.scheduler.sweepCount());
        assertEquals(1, l.changes.size()); // only START
        assertTrue(!loop.scheduler.lastSpectrum().peakValid());
    }
}
