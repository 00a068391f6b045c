package dev.sweepline.ground.fit;

import org.hipparchus.distribution.continuous.ChiSquaredDistribution;
import org.hipparchus.special.Gamma;
import org.hipparchus.util.FastMath;
import org.hipparchus.util.Precision;

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
        return drop > 0 && tailBelowLevel(extraParameters / 2, drop / 2);
    }

    /** Convergence of the series and the continued fraction: Hipparchus' default for Q(a, x). */
    private static final double GAMMA_EPSILON = 1e-14;
    /** Lentz's guard against a zero denominator (Hipparchus' ContinuedFraction). */
    private static final double LENTZ_SMALL = 1e-50;
    /**
     * Relative distance from {@link #TEST_LEVEL} within which {@link #upperGammaQ}'s Q (good to some 1e-14,
     * its series' and fraction's convergence) is not trusted to decide, and Hipparchus' value decides instead.
     */
    private static final double DECISION_MARGIN = 1e-9;

    /**
     * Q(a, x) &lt; {@link #TEST_LEVEL}, the same decision as with Hipparchus' {@code Gamma.regularizedGammaQ}:
     * from {@link #upperGammaQ}, which allocates nothing, and from Hipparchus' (whose ln Γ allocates) only
     * within {@link #DECISION_MARGIN} of the level.
     */
    static boolean tailBelowLevel(double a, double x) {
        double q = upperGammaQ(a, x);
        if (!(Math.abs(q / TEST_LEVEL - 1) > DECISION_MARGIN)) {
            q = Gamma.regularizedGammaQ(a, x);
        }
        return q < TEST_LEVEL;
    }

    /**
     * Q(a, x) by Hipparchus' algorithm (Hipparchus 4.0.2 {@code Gamma}, {@code ContinuedFraction}): 1 − P(a, x)
     * by the series Σ xⁿ/(a(a+1)…(a+n)) below x = a + 1, above it the continued fraction
     * 1/(x − a + 1 + K(n(a − n)/(2n + 1 − a + x))) by the modified Lentz method, times
     * e^(−x + a ln x − ln Γ(a)) (Numerical Recipes §6.2 [memory]); ln Γ from {@link #logGamma}. No objects.
     */
    static double upperGammaQ(double a, double x) {
        if (Double.isNaN(a) || Double.isNaN(x) || a <= 0 || x < 0) {
            return Double.NaN;
        }
        if (x == 0) {
            return 1.0;
        }
        if (x < a + 1) {
            double n = 0.0;
            double an = 1.0 / a;
            double sum = an;
            while (FastMath.abs(an / sum) > GAMMA_EPSILON && sum < Double.POSITIVE_INFINITY) {
                n += 1.0;
                an *= x / (a + n);
                sum += an;
            }
            double p = Double.isInfinite(sum) ? 1.0 : FastMath.exp(-x + a * FastMath.log(x) - logGamma(a)) * sum;
            return 1.0 - p;
        }
        double hPrev = 2.0 * 0 + 1.0 - a + x;
        if (Precision.equals(hPrev, 0.0, LENTZ_SMALL)) {
            hPrev = LENTZ_SMALL;
        }
        double dPrev = 0.0;
        double cPrev = hPrev;
        double hN = hPrev;
        for (int n = 1; n < Integer.MAX_VALUE; n++) {
            double an = 2.0 * n + 1.0 - a + x;
            double bn = n * (a - n);
            double dN = an + bn * dPrev;
            if (Precision.equals(dN, 0.0, LENTZ_SMALL)) {
                dN = LENTZ_SMALL;
            }
            double cN = an + bn / cPrev;
            if (Precision.equals(cN, 0.0, LENTZ_SMALL)) {
                cN = LENTZ_SMALL;
            }
            dN = 1 / dN;
            double deltaN = cN * dN;
            hN = hPrev * deltaN;
            if (Double.isInfinite(hN) || Double.isNaN(hN)) {
                throw new IllegalStateException("Q(" + a + ", " + x + "): the continued fraction diverged at term " + n);
            }
            if (FastMath.abs(deltaN - 1.0) < GAMMA_EPSILON) {
                break;
            }
            dPrev = dN;
            cPrev = cN;
            hPrev = hN;
        }
        return FastMath.exp(-x + a * FastMath.log(x) - logGamma(a)) * (1.0 / hN);
    }

    /**
     * ln Γ(a): for a ≤ 2.5 Hipparchus' route, ln Γ(1 + y) = −ln(1 + (1/Γ(1 + y) − 1)) with y = a or a − 1
     * ({@code Gamma.invGamma1pm1}, a polynomial), the logarithm by {@link Math#log1p} instead of its
     * allocating {@code FastMath.log1p}; above that Hipparchus' {@code Gamma.logGamma} (the tests' a = k/2 ≤ 1.5).
     */
    static double logGamma(double a) {
        if (a < 0.5) {
            return -Math.log1p(Gamma.invGamma1pm1(a)) - FastMath.log(a);
        }
        if (a <= 2.5) {
            return -Math.log1p(Gamma.invGamma1pm1(a - 0.5 - 0.5));
        }
        return Gamma.logGamma(a);
    }
}
