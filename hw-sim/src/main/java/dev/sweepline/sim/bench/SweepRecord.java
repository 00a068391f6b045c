package dev.sweepline.sim.bench;

import dev.sweepline.fsw.sweep.SweepMode;

/**
 * One completed sweep with the truth beside it: what the flight software measured and chose, and
 * where the scenario's peaks really were at the sweep's mid-time.
 *
 * @param sweep            sweep number as the flight software counts it
 * @param mode             mode of the sweep
 * @param startMicros      first step's start, simulated time
 * @param endMicros        last reply's arrival, simulated time
 * @param firstWindow      lowest window stepped
 * @param lastWindow       highest window stepped
 * @param peakWindow       the flight software's refined proton peak from this sweep (window units); NaN when it found no
 *                         significant peak (decisions.csv: an empty cell)
 * @param bandCentre       for a focus sweep, the peak the band was centred on (window units); NaN otherwise
 * @param trueProtonWindow window of the true proton peak (-1 below the table, count above)
 * @param trueAlphaWindow  window of the true alpha peak
 * @param saturatedSamples samples of this sweep flagged saturated
 */
public record SweepRecord(int sweep, SweepMode mode, long startMicros, long endMicros, int firstWindow,
        int lastWindow, double peakWindow, double bandCentre, int trueProtonWindow, int trueAlphaWindow, int saturatedSamples) {

    /** True when a focus sweep's band holds the true proton peak. */
    public boolean locked() {
        return mode == SweepMode.FOCUS && trueProtonWindow >= firstWindow && trueProtonWindow <= lastWindow;
    }

    /**
     * True when a focus sweep's band was centred nearer the true alpha peak than the true proton
     * peak: the scheduler took the alphas for the protons.
     */
    public boolean alphaLock() {
        if (mode != SweepMode.FOCUS || trueAlphaWindow < 0 || Double.isNaN(bandCentre)) {
            return false;
        }
        return Math.abs(bandCentre - trueAlphaWindow) < Math.abs(bandCentre - trueProtonWindow);
    }

    /** Mid-time of the sweep, microseconds. */
    public long midMicros() {
        return startMicros + (endMicros - startMicros) / 2;
    }
}
