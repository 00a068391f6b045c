package dev.sweepline.ground.plot;

import java.util.List;

/**
 * Input of the spectrogram: one row per spectrum.
 *
 * @param rows spectra in time order
 */
public record SpectrogramData(List<Row> rows) {
    /**
     * One spectrum.
     *
     * @param secondsFromStart time since the first spectrum, s
     * @param firstWindow      first window index of the table
     * @param totalAmps        summed current per window, A (saturated windows NaN)
     */
    public record Row(double secondsFromStart, int firstWindow, double[] totalAmps) {
    }
}
