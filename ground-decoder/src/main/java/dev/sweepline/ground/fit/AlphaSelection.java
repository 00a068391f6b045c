package dev.sweepline.ground.fit;

import org.hipparchus.distribution.continuous.ChiSquaredDistribution;

/**
 * Whether the joint proton + alpha model explains a spectrum better than protons alone, as a
 * likelihood-ratio test with a stated false-alarm rate. With known Gaussian noise σ_j the log-likelihood
 * ratio is half the χ² drop, and under H0 (no alphas) the drop χ²_p − χ²_joint is distributed as χ²(k),
 * k the number of extra free parameters (Wilks 1938 [memory]; Kay 1998, Fundamentals of Statistical
 * Signal Processing Vol. 2, generalised likelihood-ratio test [memory]). The alphas are accepted when the
 * drop exceeds the χ²(k) quantile at 1 − α. Under H0 the true n_α = 0 lies on the boundary n_α ≥ 0, where
 * the drop is a mixture of χ²(0) and χ²(k) (a chi-bar-squared): the test is then conservative, its actual
 * false-alarm rate at or below α. Measured on {@code AlphaSelectionTest}.
 *
 * <p>For the constrained alpha component ({@link AlphaPrior}) the drop is taken between the proton χ² and
 * the joint fit's minimised χ² including the prior rows, and k is the effective number of extra free
 * parameters, 3 less what the prior pins down (tr F_prior·Cov, {@link AlphaPrior#leverage}): between 1
 * (only n_α free, the prior fixing U_α and w_α) and 3; the χ² distribution is taken at that real k
 * (Hipparchus accepts any positive degrees of freedom). Measured on {@code PartialAlphaTest}. Immutable.
 */
final class AlphaSelection {
    /** False-alarm rate α: the fraction of alpha-free spectra allowed to show alphas (common practice: 1 %). */
    static final double FALSE_ALARM_RATE = 0.01;

    private final double extraParameters;
    private final double threshold;

    /** A test for {@code extraParameters} (&gt; 0) free parameters the alpha component adds. */
    AlphaSelection(double extraParameters) {
        this.extraParameters = extraParameters;
        this.threshold = new ChiSquaredDistribution(extraParameters).inverseCumulativeProbability(1 - FALSE_ALARM_RATE);
    }

    /** Extra free parameters k. */
    double extraParameters() {
        return extraParameters;
    }

    /** The χ² drop needed: the χ²(k) quantile at 1 − α (11.345 for k = 3, Hipparchus). */
    double threshold() {
        return threshold;
    }

    /** True when the drop from {@code protonChiSquare} to {@code jointChiSquare} exceeds the threshold. */
    boolean accepts(double protonChiSquare, double jointChiSquare) {
        return protonChiSquare - jointChiSquare > threshold;
    }
}
