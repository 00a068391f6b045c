package dev.sweepline.sim.interop;

import dev.sweepline.fsw.link.SampleReply;
import dev.sweepline.fsw.sweep.Spectrum;
import dev.sweepline.fsw.sweep.SweepMode;

/**
 * A copy of one completed spectrum as the flight software's sweep listener saw it (the scheduler's
 * {@link Spectrum} is refilled every sweep, so it must be copied during the callback).
 *
 * @param mode        survey or focus
 * @param sweepNumber sweep number, counting from 1
 * @param firstWindow window index of entry 0
 * @param ascending   the sweep stepped upward
 * @param startMicros time of the first step
 * @param peakValid   a proton peak was found
 * @param peakQ8      refined peak, window units Q8
 * @param gainRange   gain range per entry
 * @param saturated   saturation flag per entry
 * @param adc         ADC counts [quadrant 0..3][entry]
 */
public record RecordedSpectrum(SweepMode mode, long sweepNumber, int firstWindow, boolean ascending, long startMicros,
        boolean peakValid, int peakQ8, int[] gainRange, boolean[] saturated, int[][] adc) {

    /** Copies {@code s}. */
    public static RecordedSpectrum of(Spectrum s) {
        int c = s.count();
        int[] gains = new int[c];
        boolean[] sat = new boolean[c];
        int[][] adc = new int[4][c];
        for (int i = 0; i < c; i++) {
            gains[i] = s.gainRange(i);
            sat[i] = (s.status(i) & SampleReply.STATUS_SATURATED) != 0;
            for (int q = 0; q < 4; q++) {
                adc[q][i] = s.quadrant(i, q);
            }
        }
        return new RecordedSpectrum(s.mode(), s.sweepNumber(), s.firstWindow(), s.ascending(), s.startMicros(),
                s.peakValid(), s.peakWindowQ8(), gains, sat, adc);
    }

    /** Windows in the spectrum. */
    public int count() {
        return gainRange.length;
    }
}
