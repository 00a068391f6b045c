package dev.sweepline.sim.bench;

import java.util.concurrent.atomic.AtomicLongArray;
import org.hipparchus.distribution.continuous.ChiSquaredDistribution;

/**
 * Flags a fitted spectrum the ground finds non-stationary: the plasma changed within the sweep, so no
 * single Maxwellian fits it and its reduced chi-square lies far above its expectation of 1.
 *
 * <p>Rule: flagged when chi-square / nu exceeds the {@link #QUANTILE} quantile of chi-square(nu) / nu,
 * nu = windows used - fitted parameters. For a stationary sweep fitted by the right model this fires
 * once in a thousand sweeps (the false-alarm rate is 1 - {@link #QUANTILE}, by construction).
 */
public final class NonStationarity {
    /** Quantile of chi-square(nu) / nu above which a sweep is flagged: a one-in-a-thousand false alarm. */
    public static final double QUANTILE = 0.999;

    /** Degrees of freedom up to which {@link #threshold} keeps what it computed (a spectrum's windows). */
    static final int CACHED_DOF = 1024;
    /**
     * {@link #threshold} by degrees of freedom, as raw bits, 0 until computed (a threshold is positive, never
     * +0.0): every fit of a run has one of a few dof, and each threshold is an inverse chi-square search.
     * Racing threads store the same bits.
     */
    private static final AtomicLongArray THRESHOLD_BITS = new AtomicLongArray(CACHED_DOF + 1);

    private NonStationarity() {
    }

    /** The reduced chi-square above which a fit with {@code dof} degrees of freedom is flagged; NaN if dof < 1. */
    public static double threshold(int dof) {
        if (dof < 1) {
            return Double.NaN;
        }
        if (dof > CACHED_DOF) {
            return quantile(dof);
        }
        long bits = THRESHOLD_BITS.get(dof);
        if (bits == 0) {
            bits = Double.doubleToRawLongBits(quantile(dof));
            THRESHOLD_BITS.set(dof, bits);
        }
        return Double.longBitsToDouble(bits);
    }

    /** The {@link #QUANTILE} quantile of chi-square(dof) / dof, computed afresh. */
    static double quantile(int dof) {
        return new ChiSquaredDistribution(dof).inverseCumulativeProbability(QUANTILE) / dof;
    }

    /** True when {@code reducedChiSquare} of a fit with {@code dof} degrees of freedom is above the threshold. */
    public static boolean flagged(double reducedChiSquare, int dof) {
        double t = threshold(dof);
        return Double.isFinite(reducedChiSquare) && Double.isFinite(t) && reducedChiSquare > t;
    }
}
