package dev.sweepline.ground.special;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * erf and erfc in BigDecimal at 60 significant digits, for the tests: below x = 2 the Maclaurin series
 * of Abramowitz &amp; Stegun 7.1.5, erf x = (2/√π) Σ (−1)ⁿ x^(2n+1) / (n! (2n+1)) (its terms peak near
 * e^(x²) = 55, so about two digits are lost to cancellation); from x = 2 the continued fraction of A&amp;S
 * 7.1.14, erfc x = e^(−x²)/√π · 1/(x + (1/2)/(x + 1/(x + (3/2)/(x + 2/(x + ...))))), evaluated from a
 * depth that doubles until two depths agree to 1e-45. π by the Gauss–Legendre iteration, e^(x²) by its
 * all-positive Taylor series.
 */
final class ReferenceErf {
    private static final MathContext MC = new MathContext(60, RoundingMode.HALF_EVEN);
    private static final BigDecimal TWO = BigDecimal.valueOf(2);
    private static final BigDecimal SQRT_PI = pi().sqrt(MC);
    private static final BigDecimal AGREE = new BigDecimal("1e-45");

    private ReferenceErf() {
    }

    /** erfc(x), x ≥ 0. */
    static BigDecimal erfc(double x) {
        if (x < 0) {
            throw new IllegalArgumentException("reference erfc is for x >= 0, got " + x);
        }
        return x < 2 ? BigDecimal.ONE.subtract(series(new BigDecimal(x)), MC) : continuedFraction(new BigDecimal(x));
    }

    /** erf(x), x ≥ 0. */
    static BigDecimal erf(double x) {
        return x < 2 ? series(new BigDecimal(x)) : BigDecimal.ONE.subtract(erfc(x), MC);
    }

    private static BigDecimal series(BigDecimal x) {
        BigDecimal x2 = x.multiply(x);
        BigDecimal power = x; // (-1)^n x^(2n+1) / n!
        BigDecimal sum = BigDecimal.ZERO;
        for (int n = 0; n < 10_000; n++) {
            BigDecimal term = power.divide(BigDecimal.valueOf(2L * n + 1), MC);
            sum = sum.add(term, MC);
            if (term.abs().compareTo(new BigDecimal("1e-70")) < 0) {
                break;
            }
            power = power.multiply(x2, MC).divide(BigDecimal.valueOf(-(n + 1L)), MC);
        }
        return sum.multiply(TWO, MC).divide(SQRT_PI, MC);
    }

    private static BigDecimal continuedFraction(BigDecimal x) {
        BigDecimal previous = tail(x, 50);
        for (int depth = 100; ; depth *= 2) {
            BigDecimal next = tail(x, depth);
            if (next.subtract(previous).abs().compareTo(next.multiply(AGREE)) <= 0) {
                return next;
            }
            previous = next;
        }
    }

    /** e^(−x²)/√π divided by the fraction cut at {@code depth} partial numerators k/2. */
    private static BigDecimal tail(BigDecimal x, int depth) {
        BigDecimal t = x;
        for (int k = depth; k >= 1; k--) {
            t = x.add(BigDecimal.valueOf(k).divide(TWO.multiply(t), MC), MC);
        }
        return BigDecimal.ONE.divide(expOf(x.multiply(x)).multiply(SQRT_PI, MC).multiply(t, MC), MC);
    }

    /** e^z, z ≥ 0, by the Taylor series (all terms positive). */
    private static BigDecimal expOf(BigDecimal z) {
        BigDecimal term = BigDecimal.ONE;
        BigDecimal sum = BigDecimal.ONE;
        for (int k = 1; k < 100_000; k++) {
            term = term.multiply(z, MC).divide(BigDecimal.valueOf(k), MC);
            sum = sum.add(term, MC);
            if (k > z.doubleValue() && term.compareTo(sum.multiply(new BigDecimal("1e-65"))) < 0) {
                break;
            }
        }
        return sum;
    }

    /** π by the Gauss–Legendre (arithmetic-geometric mean) iteration; each step doubles the digits. */
    private static BigDecimal pi() {
        BigDecimal a = BigDecimal.ONE;
        BigDecimal b = BigDecimal.ONE.divide(TWO.sqrt(MC), MC);
        BigDecimal t = new BigDecimal("0.25");
        BigDecimal p = BigDecimal.ONE;
        for (int i = 0; i < 8; i++) {
            BigDecimal next = a.add(b).divide(TWO, MC);
            b = a.multiply(b, MC).sqrt(MC);
            t = t.subtract(p.multiply(a.subtract(next).pow(2), MC), MC);
            a = next;
            p = p.multiply(TWO);
        }
        return a.add(b).pow(2).divide(t.multiply(BigDecimal.valueOf(4)), MC);
    }
}
