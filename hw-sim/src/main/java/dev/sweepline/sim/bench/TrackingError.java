package dev.sweepline.sim.bench;

import dev.sweepline.fsw.sweep.SweepMode;
import java.util.Arrays;
import java.util.List;

/**
 * How far the flight software's windows were from the true proton peak, in windows: a stricter figure
 * than the lock fraction, which only asks that a 15-63-window band contain the peak.
 *
 * <p>Centre error: |band centre - true proton window| over the focus sweeps with a band centre. Peak
 * error: |refined peak the flight software found - true proton window| over every sweep (survey and
 * focus). Sweeps whose protons are absent (true window -1) are left out of both. Quantiles are the
 * order statistic {@code sorted[floor(q n)]}, as in {@link GroundCheck}.
 *
 * @param centreSweeps focus sweeps behind the centre figures
 * @param centreMedian median centre error, windows (NaN without such sweeps)
 * @param centreP95    95th-percentile centre error, windows
 * @param centreMax    largest centre error, windows
 * @param peakSweeps   sweeps behind the peak figures
 * @param peakMedian   median peak error, windows
 * @param peakP95      95th-percentile peak error, windows
 * @param peakMax      largest peak error, windows
 */
public record TrackingError(int centreSweeps, double centreMedian, double centreP95, double centreMax,
        int peakSweeps, double peakMedian, double peakP95, double peakMax) {

    /** The tracking error of {@code records}. */
    public static TrackingError of(List<SweepRecord> records) {
        double[] centre = new double[records.size()];
        double[] peak = new double[records.size()];
        int nc = 0;
        int np = 0;
        for (SweepRecord r : records) {
            if (r.trueProtonWindow() < 0) {
                continue;
            }
            if (r.mode() == SweepMode.FOCUS && !Double.isNaN(r.bandCentre())) {
                centre[nc++] = Math.abs(r.bandCentre() - r.trueProtonWindow());
            }
            if (Double.isFinite(r.peakWindow())) {
                peak[np++] = Math.abs(r.peakWindow() - r.trueProtonWindow());
            }
        }
        double[] c = Arrays.copyOf(centre, nc);
        double[] p = Arrays.copyOf(peak, np);
        Arrays.sort(c);
        Arrays.sort(p);
        return new TrackingError(nc, quantile(c, 0.5), quantile(c, 0.95), max(c), np, quantile(p, 0.5),
                quantile(p, 0.95), max(p));
    }

    /** Order statistic {@code sorted[floor(q n)]}, NaN when empty. */
    static double quantile(double[] sorted, double q) {
        if (sorted.length == 0) {
            return Double.NaN;
        }
        return sorted[(int) Math.min(sorted.length - 1, Math.floor(q * sorted.length))];
    }

    private static double max(double[] sorted) {
        return sorted.length == 0 ? Double.NaN : sorted[sorted.length - 1];
    }
}
