package dev.sweepline.sim.campaign;

import org.hipparchus.distribution.continuous.TDistribution;

/**
 * A 95 % confidence interval of the mean paired difference d_i = x_i - y_i of one objective, over the
 * ensemble members both sets ran (the same member i: the same plasma draw and seed, so the member's
 * own difficulty cancels). Student's t interval: mean(d) +- t(0.975, m - 1) sd(d) / sqrt(m), m the
 * members with both values finite (common practice for paired samples).
 *
 * @param mean    mean difference (NaN when no member has both values)
 * @param low     lower end (-infinity when fewer than two members: the difference cannot be judged)
 * @param high    upper end (+infinity when fewer than two members)
 * @param members members behind the interval
 */
public record PairedInterval(double mean, double low, double high, int members) {
    /** Confidence level of the interval. */
    public static final double LEVEL = 0.95;

    /** The interval of {@code x - y}, member by member (arrays indexed by member). */
    public static PairedInterval of(double[] x, double[] y) {
        double[] d = new double[Math.min(x.length, y.length)];
        int m = 0;
        for (int i = 0; i < d.length; i++) {
            if (Double.isFinite(x[i]) && Double.isFinite(y[i])) {
                d[m++] = x[i] - y[i];
            }
        }
        if (m == 0) {
            return new PairedInterval(Double.NaN, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY, 0);
        }
        double sum = 0;
        for (int i = 0; i < m; i++) {
            sum += d[i];
        }
        double mean = sum / m;
        if (m < 2) {
            return new PairedInterval(mean, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY, m);
        }
        double ss = 0;
        for (int i = 0; i < m; i++) {
            ss += (d[i] - mean) * (d[i] - mean);
        }
        double half = new TDistribution(m - 1).inverseCumulativeProbability(0.5 + LEVEL / 2)
                * Math.sqrt(ss / (m - 1) / m);
        return new PairedInterval(mean, mean - half, mean + half, m);
    }

    /** True when the interval lies wholly above zero: x is distinguishably larger than y. */
    public boolean above() {
        return low > 0;
    }

    /** True when the interval lies wholly below zero: x is distinguishably smaller than y. */
    public boolean below() {
        return high < 0;
    }
}
