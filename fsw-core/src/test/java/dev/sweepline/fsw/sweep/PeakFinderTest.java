package dev.sweepline.fsw.sweep;

import dev.sweepline.fsw.DemoCup;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Integer peak search, Q8 refinement and FWHM on synthetic integer spectra: sampled Gaussians
 * (the U &gt;&gt; w limit of physics.md's window current is Gaussian in speed, near-Gaussian in log E).
 */
class PeakFinderTest {
    /** Gaussian FWHM per sigma, 2 sqrt(2 ln 2) (textbook). */
    private static final double FWHM_PER_SIGMA = 2.354820;

    @ParameterizedTest
    @ValueSource(doubles = {40.0, 40.1, 40.25, 40.5, 40.77})
    void shouldRefinePeakToSubWindow(double centre) {
        Spectrum s = gaussian(centre, 3.8, 100_000, 0);
        finder().analyse(s);
        assertTrue(s.peakValid());
        // a 3-point parabola on a Gaussian of sigma 3.8 samples is biased by < 0.02 sample (its error
        // term is third order in 1/sigma); Q8 rounding 1/256: tolerance 0.03 window
        assertEquals(centre, s.peakWindowQ8() / 256.0, 0.03);
    }

    @Test
    void shouldReportWindowIndexOfTheTableNotOfTheSpectrum() {
        Spectrum s = new Spectrum(DemoCup.INSTRUMENT);
        s.begin(1, SweepMode.FOCUS, 60, 29, true, 0);
        for (int i = 0; i < 29; i++) {
            s.setEntry(i, (int) Math.round(100_000 * AlphaDiscriminationTest.gauss(i, 14.25, 3.8)), 0, 0);
        }
        finder().analyse(s);
        assertEquals(74.25, s.peakWindowQ8() / 256.0, 0.03); // entry 14.25 of a band starting at window 60
    }

    @ParameterizedTest
    @ValueSource(doubles = {2.0, 3.8, 8.0, 11.0})
    void shouldMeasureFwhm(double sigma) {
        Spectrum s = gaussian(60.3, sigma, 200_000, 0);
        finder().analyse(s);
        // linear interpolation of the half-maximum crossing overestimates by under 0.1 window for sigma >= 2
        assertEquals(FWHM_PER_SIGMA * sigma, s.fwhmWindowsQ8() / 256.0, 0.1);
    }

    @Test
    void shouldMirrorFwhmWhenOneSideIsCut() {
        Spectrum s = new Spectrum(DemoCup.INSTRUMENT);
        s.begin(1, SweepMode.FOCUS, 0, 12, true, 0);
        for (int i = 0; i < 12; i++) {
            s.setEntry(i, (int) Math.round(100_000 * AlphaDiscriminationTest.gauss(i, 2.0, 3.8)), 0, 0);
        }
        finder().analyse(s);
        // left half-maximum lies below entry 0: the right half is mirrored; same 0.1 window as above
        assertEquals(FWHM_PER_SIGMA * 3.8, s.fwhmWindowsQ8() / 256.0, 0.1);
    }

    @Test
    void shouldRefuseNoiseOnlySpectrum() {
        // threshold in range 0: 5 sigma * 2 * 4 counts = 40 units; a 30-unit maximum is not a peak
        Spectrum s = gaussian(60, 3.8, 30, 0);
        finder().analyse(s);
        assertFalse(s.peakValid());
        assertEquals(60, s.argmaxIndex());
    }

    @Test
    void shouldScaleNoiseThresholdWithRange() {
        // 5000 units is significant in range 0 (threshold 40) but not in range 2 (40 << 10 = 40960)
        Spectrum s0 = gaussian(60, 3.8, 5000, 0);
        Spectrum s2 = gaussian(60, 3.8, 5000, 2);
        finder().analyse(s0);
        finder().analyse(s2);
        assertTrue(s0.peakValid());
        assertFalse(s2.peakValid());
    }

    @Test
    void shouldCentreTwoWindowPlateau() {
        Spectrum s = new Spectrum(DemoCup.INSTRUMENT);
        s.begin(1, SweepMode.SURVEY, 0, 5, true, 0);
        int[] y = {100, 5000, 5000, 100, 100};
        for (int i = 0; i < 5; i++) {
            s.setEntry(i, y[i], 0, 0);
        }
        finder().analyse(s);
        // integer argmax takes the first of equal maxima (entry 1); the parabola through 100, 5000, 5000
        // has its vertex half a window up, the clamp limit, which is exactly the plateau's centre
        assertEquals(1, s.peakIndex());
        assertEquals(384, s.peakWindowQ8());
    }

    static Spectrum gaussian(double centre, double sigma, double height, int range) {
        Spectrum s = new Spectrum(DemoCup.INSTRUMENT);
        s.begin(1, SweepMode.SURVEY, 0, 128, true, 0);
        for (int i = 0; i < 128; i++) {
            s.setEntry(i, (int) Math.round(height * AlphaDiscriminationTest.gauss(i, centre, sigma)), range, 0);
        }
        return s;
    }

    static PeakFinder finder() {
        int[] centre = new int[128];
        for (int w = 0; w < 128; w++) {
            centre[w] = (Fixtures.TABLE.dacLow(w) + Fixtures.TABLE.dacHigh(w)) / 2;
        }
        return new PeakFinder(centre, DemoCup.parameters(), DemoCup.INSTRUMENT.rangeRatioShift());
    }
}
