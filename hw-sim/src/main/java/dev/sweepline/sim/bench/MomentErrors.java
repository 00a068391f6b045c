package dev.sweepline.sim.bench;

import java.util.Arrays;
import java.util.List;

/**
 * The ground's moment errors over a set of fitted sweeps, per moment n, U, T.
 *
 * <p>The CRLB ratio is the rms of the z-scores z = (fit - truth) / Cramér-Rao bound: 1 is as good as
 * the measurement allows, but one sweep straddling a discontinuity (z of thousands) dominates it. The
 * robust ratio beside it is {@link #MAD_SCALE} x median |z|, the normal-consistent scale of |z| (for
 * z from a unit normal it is 1, as the rms is; common practice, Rousseeuw and Croux 1993 [memory]).
 * Quantiles are the order statistic sorted[floor(q n)].
 *
 * @param medianRelative  median relative error |fit - truth| / truth of n, U, T
 * @param p95Relative     95th-percentile relative error
 * @param crlbRatio       rms of the z-scores
 * @param robustCrlbRatio {@link #MAD_SCALE} x median |z|
 * @param compared        sweeps behind the figures
 */
public record MomentErrors(double[] medianRelative, double[] p95Relative, double[] crlbRatio,
        double[] robustCrlbRatio, int compared) {
    /** 1 / Phi^-1(3/4) = 1.482602...: median |z| of a unit normal is 0.67449 (the formula; common practice). */
    public static final double MAD_SCALE = 1.4826;

    /** The errors of {@code rel} (|fit - truth| / truth) and {@code z} ((fit - truth) / bound), one row per sweep. */
    public static MomentErrors of(List<double[]> rel, List<double[]> z) {
        double[] median = new double[3];
        double[] p95 = new double[3];
        double[] ratio = new double[3];
        double[] robust = new double[3];
        for (int k = 0; k < 3; k++) {
            double[] r = new double[rel.size()];
            double[] absZ = new double[z.size()];
            double sum = 0;
            int finite = 0;
            for (int i = 0; i < rel.size(); i++) {
                r[i] = rel.get(i)[k];
                double zz = z.get(i)[k];
                if (Double.isFinite(zz)) {
                    sum += zz * zz;
                    absZ[finite++] = Math.abs(zz);
                }
            }
            Arrays.sort(r);
            double[] a = Arrays.copyOf(absZ, finite);
            Arrays.sort(a);
            median[k] = TrackingError.quantile(r, 0.5);
            p95[k] = TrackingError.quantile(r, 0.95);
            ratio[k] = finite == 0 ? Double.NaN : Math.sqrt(sum / finite);
            robust[k] = finite == 0 ? Double.NaN : MAD_SCALE * TrackingError.quantile(a, 0.5);
        }
        return new MomentErrors(median, p95, ratio, robust, rel.size());
    }
}
