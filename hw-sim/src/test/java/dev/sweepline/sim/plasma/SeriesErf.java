package dev.sweepline.sim.plasma;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * A high-precision reference for erf and erfc, written for the tests: the everywhere-convergent series
 * of Abramowitz &amp; Stegun 7.1.6, erf(x) = (2/√π) e^(−x²) Σ 2ⁿ x^(2n+1) / (1·3···(2n+1)), whose terms are
 * all positive, in {@link BigDecimal} with enough digits that erfc = 1 − erf keeps 30 significant
 * digits (the cancellation costs x²/ln 10 digits). e^z by halving to below 1, Taylor and squaring; π by
 * Machin's formula, π = 16 atan(1/5) − 4 atan(1/239). Slow (milliseconds per point far in the tail).
 */
final class SeriesErf {
    private SeriesErf() {
    }

    /** erfc(x) rounded to a double, x ≥ 0. */
    static double erfc(double x) {
        return erfcExact(x).doubleValue();
    }

    /** erf(x) rounded to a double, x ≥ 0. */
    static double erf(double x) {
        return erfExact(x).doubleValue();
    }

    /** erfc(x) to about 30 significant digits, x ≥ 0. */
    static BigDecimal erfcExact(double x) {
        return BigDecimal.ONE.subtract(erfExact(x), context(x));
    }

    /** erf(x) to at least 40 significant digits, x ≥ 0. */
    static BigDecimal erfExact(double x) {
        if (x < 0) {
            throw new IllegalArgumentException("reference erfc is for x >= 0, got " + x);
        }
        MathContext mc = context(x);
        BigDecimal bx = new BigDecimal(x);
        BigDecimal twoX2 = bx.multiply(bx).multiply(BigDecimal.valueOf(2));
        BigDecimal term = bx;
        BigDecimal sum = BigDecimal.ZERO;
        BigDecimal tiny = BigDecimal.ONE.movePointLeft(mc.getPrecision() + 5);
        for (int n = 0; ; n++) {
            sum = sum.add(term, mc);
            term = term.multiply(twoX2, mc).divide(BigDecimal.valueOf(2L * n + 3), mc);
            if (n > twoX2.doubleValue() && term.compareTo(sum.multiply(tiny)) <= 0) {
                break;
            }
        }
        BigDecimal expMinusX2 = BigDecimal.ONE.divide(exp(bx.multiply(bx), mc), mc);
        return sum.multiply(expMinusX2, mc).multiply(BigDecimal.valueOf(2)).divide(pi(mc).sqrt(mc), mc);
    }

    private static MathContext context(double x) {
        return new MathContext(40 + (int) Math.ceil(x * x / Math.log(10)), RoundingMode.HALF_EVEN);
    }

    /** e^z for z ≥ 0. */
    static BigDecimal exp(BigDecimal z, MathContext mc) {
        MathContext wide = new MathContext(mc.getPrecision() + 20, RoundingMode.HALF_EVEN);
        int halvings = 0;
        BigDecimal r = z;
        while (r.compareTo(BigDecimal.ONE) > 0) {
            r = r.divide(BigDecimal.valueOf(2), wide);
            halvings++;
        }
        BigDecimal term = BigDecimal.ONE;
        BigDecimal sum = BigDecimal.ONE;
        BigDecimal tiny = BigDecimal.ONE.movePointLeft(wide.getPrecision() + 2);
        for (int k = 1; term.compareTo(tiny) > 0; k++) {
            term = term.multiply(r, wide).divide(BigDecimal.valueOf(k), wide);
            sum = sum.add(term, wide);
        }
        for (int i = 0; i < halvings; i++) {
            sum = sum.multiply(sum, wide);
        }
        return sum.round(mc);
    }

    /** π by Machin's formula. */
    static BigDecimal pi(MathContext mc) {
        MathContext wide = new MathContext(mc.getPrecision() + 10, RoundingMode.HALF_EVEN);
        return atanOfInverse(5, wide).multiply(BigDecimal.valueOf(16))
                .subtract(atanOfInverse(239, wide).multiply(BigDecimal.valueOf(4))).round(mc);
    }

    /** atan(1/m) = Σ (−1)^k / ((2k+1) m^(2k+1)). */
    private static BigDecimal atanOfInverse(int m, MathContext mc) {
        BigDecimal m2 = BigDecimal.valueOf((long) m * m);
        BigDecimal power = BigDecimal.ONE.divide(BigDecimal.valueOf(m), mc);
        BigDecimal sum = BigDecimal.ZERO;
        BigDecimal tiny = BigDecimal.ONE.movePointLeft(mc.getPrecision() + 2);
        for (int k = 0; power.compareTo(tiny) > 0; k++) {
            BigDecimal term = power.divide(BigDecimal.valueOf(2L * k + 1), mc);
            sum = (k % 2 == 0) ? sum.add(term, mc) : sum.subtract(term, mc);
            power = power.divide(m2, mc);
        }
        return sum;
    }
}
