package dev.sweepline.sim.plasma;

/**
 * Closed-form Faraday-cup window current of a convected (drifting) Maxwellian along the cup normal,
 * and its derivatives (physics.md "Window current of a convected Maxwellian").
 *
 * <p>With f(v) = n/(sqrt(pi) w) exp(-(v-U)^2/w^2), x_i = (v_i - U)/w and e_i = exp(-x_i^2), the
 * current of ions whose normal speed lies in [v1, v2] is
 * {@code I = q n A [ (U/2)(erf x2 - erf x1) + (w/(2 sqrt(pi)))(e1 - e2) ]}.
 *
 * <p>Numerics: the erf difference uses {@link ErrorFunction#difference(double, double)}, which switches
 * to erfc differences when both arguments lie in the same tail, and e1 - e2 is formed as
 * {@code e_max * expm1(...)}; so a window far in the upper tail keeps full relative precision. In the
 * far lower tail (v well below U) the two terms have opposite signs and the result loses about
 * log10(U / v2) digits; the current there is clamped at zero, which it can only reach through
 * rounding. Stateless; every method is thread-safe; nothing is allocated.
 */
public final class ConvectedMaxwellian {
    private static final double SQRT_PI = Math.sqrt(Math.PI);

    private ConvectedMaxwellian() {
    }

    /**
     * Current of ions with normal speed between {@code v1} and {@code v2}.
     *
     * @param q        ion charge, coulomb
     * @param nPerM3   density, per cubic metre
     * @param areaM2   effective collecting area, square metres
     * @param uNormal  bulk speed along the normal, metres per second
     * @param w        thermal speed along the normal, metres per second (positive)
     * @param v1       lower normal-speed threshold, metres per second (0 admits everything below)
     * @param v2       upper normal-speed threshold, metres per second ({@code +Infinity} allowed)
     * @return current, amperes (negative if v2 &lt; v1)
     */
    public static double windowCurrent(double q, double nPerM3, double areaM2, double uNormal, double w,
                                       double v1, double v2) {
        double x1 = (v1 - uNormal) / w;
        double x2 = (v2 - uNormal) / w;
        double erfDiff = ErrorFunction.difference(x1, x2);
        double expDiff = expDifference(x1, x2, (v2 - v1) / w, (v1 + v2 - 2 * uNormal) / w);
        return current(q, nPerM3, areaM2, uNormal, w, v1, v2, erfDiff, expDiff);
    }

    /**
     * {@link #windowCurrent(double, double, double, double, double, double, double)}, its error-function
     * difference and e1 - e2 kept in {@code evaluation} for the window's sensitivities.
     */
    public static double windowCurrent(double q, double nPerM3, double areaM2, double uNormal, double w,
                                       double v1, double v2, MaxwellianWindow evaluation) {
        double x1 = (v1 - uNormal) / w;
        double x2 = (v2 - uNormal) / w;
        double erfDiff = ErrorFunction.difference(x1, x2);
        double expDiff = expDifference(x1, x2, (v2 - v1) / w, (v1 + v2 - 2 * uNormal) / w);
        evaluation.set(uNormal, w, v1, v2, erfDiff, expDiff);
        return current(q, nPerM3, areaM2, uNormal, w, v1, v2, erfDiff, expDiff);
    }

    /** The window current from its error-function difference and its e1 - e2 (see the class comment). */
    static double current(double q, double nPerM3, double areaM2, double uNormal, double w, double v1, double v2,
                          double erfDiff, double expDiff) {
        double current = q * nPerM3 * areaM2 * (0.5 * uNormal * erfDiff + w / (2 * SQRT_PI) * expDiff);
        if (v2 >= v1 && v1 >= 0 && current < 0) {
            // the integrand q n A v f(v) is non-negative here: a negative value is rounding in the lower tail
            return 0;
        }
        return current;
    }

    /** dI/dn = I/n, amperes per (per cubic metre). */
    public static double dCurrentDn(double q, double nPerM3, double areaM2, double uNormal, double w,
                                    double v1, double v2) {
        return windowCurrent(q, 1.0, areaM2, uNormal, w, v1, v2);
    }

    /** dI/dU = qnA[(erf x2 - erf x1)/2 + (v1 e1 - v2 e2)/(w sqrt(pi))], amperes per (metre per second). */
    public static double dCurrentDu(double q, double nPerM3, double areaM2, double uNormal, double w,
                                    double v1, double v2) {
        double x1 = (v1 - uNormal) / w;
        double x2 = (v2 - uNormal) / w;
        double e1 = Math.exp(-x1 * x1);
        double e2 = Math.exp(-x2 * x2);
        return q * nPerM3 * areaM2 * (0.5 * ErrorFunction.difference(x1, x2) + (times(v1, e1) - times(v2, e2)) / (w * SQRT_PI));
    }

    /** dI/dw = qnA[(x1 v1 e1 - x2 v2 e2)/(w sqrt(pi)) + (e1 - e2)/(2 sqrt(pi))], amperes per (metre per second). */
    public static double dCurrentDw(double q, double nPerM3, double areaM2, double uNormal, double w,
                                    double v1, double v2) {
        double x1 = (v1 - uNormal) / w;
        double x2 = (v2 - uNormal) / w;
        double e1 = Math.exp(-x1 * x1);
        double e2 = Math.exp(-x2 * x2);
        double expDiff = expDifference(x1, x2, (v2 - v1) / w, (v1 + v2 - 2 * uNormal) / w);
        return q * nPerM3 * areaM2 * ((times(x1 * v1, e1) - times(x2 * v2, e2)) / (w * SQRT_PI)
                + expDiff / (2 * SQRT_PI));
    }

    /**
     * The three relative sensitivities at once, into {@code out3}: n dI/dn, U dI/dU and w dI/dw, each the
     * same double as {@code nPerM3 * dCurrentDn(...)}, {@code uNormal * dCurrentDu(...)} and
     * {@code w * dCurrentDw(...)} give (the same expressions, with the error-function difference and the
     * exponentials they share evaluated once).
     */
    public static void relativeSensitivities(double q, double nPerM3, double areaM2, double uNormal, double w,
                                             double v1, double v2, double[] out3) {
        double x1 = (v1 - uNormal) / w;
        double x2 = (v2 - uNormal) / w;
        double erfDiff = ErrorFunction.difference(x1, x2);
        double e1 = Math.exp(-x1 * x1);
        double e2 = Math.exp(-x2 * x2);
        relativeSensitivities(q, nPerM3, areaM2, uNormal, w, v1, v2, x1, x2, erfDiff, e1, e2, out3);
    }

    /**
     * {@link #relativeSensitivities(double, double, double, double, double, double, double, double[])}, with
     * the error-function difference and e1 - e2 taken from {@code known} when it holds the evaluation of
     * the window current at exactly these speeds (the same doubles), computed otherwise.
     */
    public static void relativeSensitivities(double q, double nPerM3, double areaM2, double uNormal, double w,
                                             double v1, double v2, MaxwellianWindow known, double[] out3) {
        if (!known.isAt(uNormal, w, v1, v2)) {
            relativeSensitivities(q, nPerM3, areaM2, uNormal, w, v1, v2, out3);
            return;
        }
        double x1 = (v1 - uNormal) / w;
        double x2 = (v2 - uNormal) / w;
        double e1 = Math.exp(-x1 * x1);
        double e2 = Math.exp(-x2 * x2);
        sensitivities(q, nPerM3, areaM2, uNormal, w, v1, v2, x1, x2, known.erfDifference, e1, e2,
                known.expDifference, out3);
    }

    /**
     * {@link #relativeSensitivities(double, double, double, double, double, double, double, double[])} from
     * x1, x2, the error-function difference and e1 = exp(-x1^2), e2 = exp(-x2^2).
     */
    static void relativeSensitivities(double q, double nPerM3, double areaM2, double uNormal, double w,
                                      double v1, double v2, double x1, double x2, double erfDiff, double e1,
                                      double e2, double[] out3) {
        // the same e1 - e2 as windowCurrent's, its exp(-x^2) factor taken from e1 or e2 (the same call)
        double expDiff = expDifference(x1, x2, (v2 - v1) / w, (v1 + v2 - 2 * uNormal) / w, e1, e2);
        sensitivities(q, nPerM3, areaM2, uNormal, w, v1, v2, x1, x2, erfDiff, e1, e2, expDiff, out3);
    }

    /** The three sensitivities from x1, x2, the error-function difference, e1, e2 and e1 - e2. */
    private static void sensitivities(double q, double nPerM3, double areaM2, double uNormal, double w,
                                      double v1, double v2, double x1, double x2, double erfDiff, double e1,
                                      double e2, double expDiff, double[] out3) {
        // as windowCurrent: rounding in the lower tail clamped at zero
        double perDensity = current(q, 1.0, areaM2, uNormal, w, v1, v2, erfDiff, expDiff);
        double qnA = q * nPerM3 * areaM2;
        out3[0] = nPerM3 * perDensity;
        out3[1] = uNormal * (qnA * (0.5 * erfDiff + (times(v1, e1) - times(v2, e2)) / (w * SQRT_PI)));
        out3[2] = w * (qnA * ((times(x1 * v1, e1) - times(x2 * v2, e2)) / (w * SQRT_PI) + expDiff / (2 * SQRT_PI)));
    }

    /**
     * Normal speed an ion needs to pass a grid at {@code volts}: v = sqrt(2qV/m), metres per second.
     * A grid at or below 0 V stops nothing, so the threshold is 0.
     */
    public static double speedForVoltage(double volts, double massKg, double chargeC) {
        return volts > 0 ? Math.sqrt(2 * chargeC * volts / massKg) : 0.0;
    }

    /** Grid voltage whose threshold is {@code metresPerSecond}: V = m v^2 / (2q), volts. */
    public static double voltageForSpeed(double metresPerSecond, double massKg, double chargeC) {
        return massKg * metresPerSecond * metresPerSecond / (2 * chargeC);
    }

    /** exp(-x1^2) - exp(-x2^2) without cancellation; dx = x2 - x1 and sum = x1 + x2 formed by the caller. */
    private static double expDifference(double x1, double x2, double dx, double sum) {
        if (Double.isInfinite(x1) || Double.isInfinite(x2)) {
            return Math.exp(-x1 * x1) - Math.exp(-x2 * x2);
        }
        if (Math.abs(x1) <= Math.abs(x2)) {
            return -Math.exp(-x1 * x1) * ExpMinusOne.of(-dx * sum);
        }
        return Math.exp(-x2 * x2) * ExpMinusOne.of(dx * sum);
    }

    /** {@link #expDifference(double, double, double, double)} with e1 = exp(-x1^2) and e2 = exp(-x2^2) known. */
    static double expDifference(double x1, double x2, double dx, double sum, double e1, double e2) {
        if (Double.isInfinite(x1) || Double.isInfinite(x2)) {
            return e1 - e2;
        }
        if (Math.abs(x1) <= Math.abs(x2)) {
            return -e1 * ExpMinusOne.of(-dx * sum);
        }
        return e2 * ExpMinusOne.of(dx * sum);
    }

    /** a * e, taking an underflowed or vanishing e as an exact zero even when a is infinite. */
    private static double times(double a, double e) {
        return e == 0 ? 0 : a * e;
    }
}
