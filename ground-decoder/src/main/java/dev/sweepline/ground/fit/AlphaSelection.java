package dev.sweepline.ground.fit;

import org.hipparchus.distribution.continuous.ChiSquaredDistribution;
import org.hipparchus.special.Gamma;

/**
 * Whether the joint proton + alpha model explains a spectrum better than protons alone, as a
 * likelihood-ratio test with a stated false-alarm rate. With known Gaussian noise σ_j the log-likelihood
 * ratio is half the χ² drop, and where all extra parameters are identified under H0 the drop
 * χ²_p − χ²_joint is distributed as χ²(k), k the number of extra free parameters (Wilks 1938 [memory]; Kay
 * 1998, Fundamentals of Statistical Signal Processing Vol. 2, generalised likelihood-ratio test [memory]).
 *
 * <p>Here they are not: with n_α = 0 the alpha speed and width do not enter the model, so the fit
 * maximises the drop over them and its tail is heavier than χ²(k) (a nuisance parameter present only
 * under the alternative: Davies 1977, Biometrika 64, 247; Davies 1987, Biometrika 74, 33 [memory]). The
 * excess tail probability is the expected number of up-crossings of the level u by the drop as a random
 * field over (U_α, w_α), which falls with u about as fast as the χ²(k) tail itself times a power of u
 * (Gross &amp; Vitells 2010, Eur. Phys. J. C 70, 525, the "look-elsewhere effect" [memory]): the actual rate
 * is the nominal χ²(k) rate times a slowly growing trials factor. The test therefore takes the χ²(k)
 * quantile at the calibrated nominal level {@link #TEST_LEVEL} = {@link #FALSE_ALARM_RATE} /
 * {@link #TRIALS_FACTOR}. The factor is bounded by Monte Carlo on alpha-free spectra: at a nominal 1 % the
 * measured rates were 0.5 % near the Sun, 1.0 % at 1 AU and 1.75 % (10 of 573 fits) on the bench's steady
 * alpha-free case, a trials factor up to 1.75; at the threshold's u ≈ 16 it grows by about 16.3/11.3 = 1.44
 * for a two-dimensional nuisance field (Gross &amp; Vitells 2010, Euler-characteristic density ∝ u^{d/2}
 * times the χ² tail, d = 2 [memory]), to about 2.5, so a factor 10 leaves a margin of about four. The measured
 * rates at the calibrated level are {@code AlphaSelectionTest} (near the Sun, 1 AU), {@code PartialAlphaTest}
 * (constrained component) and the bench's {@code eval-steady-no-alphas} case (docs/physics.md
 * "Alpha selection"); rerunning those tests regenerates the calibration. The boundary n_α ≥ 0 (a
 * chi-bar-squared mixture of χ²(0) and χ²(k)) only lowers the rate further.
 *
 * <p>For the constrained alpha component ({@link AlphaPrior}) the drop is taken between the proton χ² and
 * the joint fit's minimised χ² including the prior rows, and k is the effective number of extra free
 * parameters, 3 less what the prior pins down (tr F_prior·Cov, {@link AlphaPrior#leverage}): between 1
 * (only n_α free, the prior fixing U_α and w_α) and 3; the χ² distribution is taken at that real k
 * (Hipparchus accepts any positive degrees of freedom) and at the same calibrated level. Immutable.
 */
final class AlphaSelection {
    /** Target false-alarm rate: the fraction of alpha-free spectra allowed to show alphas (common practice: 1 %). */
    static final double FALSE_ALARM_RATE = 0.01;
    /**
     * Ratio of the actual to the nominal χ²(k) false-alarm rate allowed for: the measured trials factor (up to
     * 1.75 at a nominal 1 %, about 2.5 extrapolated to the threshold, see the class note) with a margin of four.
     */
    static final double TRIALS_FACTOR = 10.0;
    /** Nominal level at which the χ²(k) quantile is taken: {@link #FALSE_ALARM_RATE} / {@link #TRIALS_FACTOR}. */
    static final double TEST_LEVEL = FALSE_ALARM_RATE / TRIALS_FACTOR;

    private final double extraParameters;
    private final double threshold;

    /** A test for {@code extraParameters} (&gt; 0) free parameters the alpha component adds. */
    AlphaSelection(double extraParameters) {
        this.extraParameters = extraParameters;
        this.threshold = new ChiSquaredDistribution(extraParameters).inverseCumulativeProbability(1 - TEST_LEVEL);
    }

    /** Extra free parameters k. */
    double extraParameters() {
        return extraParameters;
    }

    /** The χ² drop needed: the χ²(k) quantile at 1 − {@link #TEST_LEVEL} (16.266 for k = 3, Hipparchus). */
    double threshold() {
        return threshold;
    }

    /** True when the drop from {@code protonChiSquare} to {@code jointChiSquare} exceeds the threshold. */
    boolean accepts(double protonChiSquare, double jointChiSquare) {
        return protonChiSquare - jointChiSquare > threshold;
    }

    /**
     * The same test for a k known only per fit (the constrained component's effective k), without solving
     * for the quantile: the drop exceeds the χ²(k) quantile at 1 − {@link #TEST_LEVEL} exactly when its tail
     * probability Q(k/2, drop/2) (the regularised upper incomplete gamma function, Hipparchus) is below the
     * level, the χ² distribution function being increasing.
     */
    static boolean accepts(double extraParameters, double protonChiSquare, double jointChiSquare) {
        double drop = protonChiSquare - jointChiSquare;
        return drop > 0 && Gamma.regularizedGammaQ(extraParameters / 2, drop / 2) < TEST_LEVEL;
    }
}
