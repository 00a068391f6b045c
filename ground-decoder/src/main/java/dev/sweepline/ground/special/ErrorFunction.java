package dev.sweepline.ground.special;

/**
 * erf, erfc and erf(b) − erf(a) for the ground's fit, from W. J. Cody, "Rational Chebyshev
 * approximations for the error function", Math. Comp. 23 (1969) 631–637: three rational functions,
 * each the ratio of polynomials whose coefficients are those of Cody's double-precision routine.
 * <pre>
 *   interval            approximation                                 P, Q degree
 *   |x| ≤ 0.46875       erf  x = x · P(x²)/Q(x²)                        4, 4
 *   0.46875 &lt; |x| ≤ 4   erfc|x| = e^(−x²) · P(|x|)/Q(|x|)                 8, 8
 *   4 &lt; |x|            erfc|x| = e^(−x²)/|x| · (1/√π + z P(z)/Q(z)), z = x⁻²   5, 5
 * </pre>
 * For x &lt; 0, erfc x = 2 − erfc|x|. e^(−x²) is computed as e^(−s²)·e^(−(|x|−s)(|x|+s)) with s = |x|
 * truncated to a multiple of 1/16 (s² is then exact), which keeps the relative error in the far tail
 * at a few units of the last place. Relative error below 1e-15 wherever erfc is a normal double
 * ({@code ErrorFunctionTest}, against a continued-fraction and series reference in BigDecimal).
 * Allocation-free and stateless.
 */
public final class ErrorFunction {
    /** erf(0.47693627620446987) = 1/2: beyond it, in one tail, a difference of erfc loses less. */
    public static final double HALF_POINT = 0.47693627620446987;
    /** erfc of a larger argument is below half of {@link Double#MIN_VALUE}: it rounds to 0. */
    public static final double UNDERFLOW = 27.3;
    private static final double SMALL = 0.46875;
    private static final double MIDDLE = 4.0;
    private static final double INV_SQRT_PI = 5.6418958354775628695e-1;

    /** Numerator of interval 1, constant term last (Cody's a[0..4] in the order the loop uses them). */
    private static final double[] P1 = {1.85777706184603153e-1, 3.16112374387056560e00, 1.13864154151050156e02,
        3.77485237685302021e02, 3.20937758913846947e03};
    private static final double[] Q1 = {1.0, 2.36012909523441209e01, 2.44024637934444173e02,
        1.28261652607737228e03, 2.84423683343917062e03};
    private static final double[] P2 = {2.15311535474403846e-8, 5.64188496988670089e-1, 8.88314979438837594e00,
        6.61191906371416295e01, 2.98635138197400131e02, 8.81952221241769090e02, 1.71204761263407058e03,
        2.05107837782607147e03, 1.23033935479799725e03};
    private static final double[] Q2 = {1.0, 1.57449261107098347e01, 1.17693950891312499e02,
        5.37181101862009858e02, 1.62138957456669019e03, 3.29079923573345963e03, 4.36261909014324716e03,
        3.43936767414372164e03, 1.23033935480374942e03};
    private static final double[] P3 = {1.63153871373020978e-2, 3.05326634961232344e-1, 3.60344899949804439e-1,
        1.25781726111229246e-1, 1.60837851487422766e-2, 6.58749161529837803e-4};
    private static final double[] Q3 = {1.0, 2.56852019228982242e00, 1.87295284992346725e00,
        5.27905102951428412e-1, 6.05183413124413191e-2, 2.33520497626869185e-3};

    private ErrorFunction() {
    }

    /** erf(x). */
    public static double erf(double x) {
        double a = Math.abs(x);
        if (a <= SMALL) {
            return x * p1(x * x) / q1(x * x);
        }
        double oneMinus = 1.0 - erfcOfPositive(a);
        return x < 0 ? -oneMinus : oneMinus;
    }

    /** erfc(x) = 1 − erf(x). */
    public static double erfc(double x) {
        double a = Math.abs(x);
        if (a <= SMALL) {
            return 1.0 - x * p1(x * x) / q1(x * x);
        }
        double e = erfcOfPositive(a);
        return x < 0 ? 2.0 - e : e;
    }

    /** erf(b) − erf(a), from erfc values when a and b lie beyond {@link #HALF_POINT} in the same tail. */
    public static double difference(double a, double b) {
        if (b < a) {
            return -difference(b, a);
        }
        if (a >= 0 && b > HALF_POINT) {
            return erfc(a) - erfc(b);
        }
        if (b <= 0 && a < -HALF_POINT) {
            return erfc(-b) - erfc(-a);
        }
        return erf(b) - erf(a);
    }

    /** erfc(a), a &gt; 0.46875 or NaN. */
    private static double erfcOfPositive(double a) {
        if (!(a < UNDERFLOW)) {
            return Double.isNaN(a) ? a : 0.0;
        }
        double scaled;
        if (a <= MIDDLE) {
            scaled = p2(a) / q2(a);
        } else {
            double z = 1.0 / (a * a);
            scaled = (INV_SQRT_PI - z * p3(z) / q3(z)) / a;
        }
        // (int) truncates toward zero: for 0 < a·16 < 2³¹ that is Math.floor, so s is floor(16a)/16 as before
        int sixteenths = (int) (a * 16.0);
        double s = sixteenths / 16.0;
        return EXP_MINUS_SQUARE[sixteenths] * Math.exp(-(a - s) * (a + s)) * scaled;
    }

    /**
     * e^(−s²) for s = k/16, k = 0 … 16·{@link #UNDERFLOW}: the factor of {@link #erfcOfPositive} whose argument
     * is one of these multiples, filled with the very expression it replaces ({@code Math.exp(-s * s)}) so that it holds the same
     * bits (HotSpot calls one exp routine from the interpreter and from compiled code; ErrorFunctionBitsTest
     * compares every entry with the expression evaluated in the test).
     */
    private static final double[] EXP_MINUS_SQUARE = expMinusSquare();

    private static double[] expMinusSquare() {
        double[] t = new double[(int) (UNDERFLOW * 16.0) + 1];
        for (int k = 0; k < t.length; k++) {
            double s = k / 16.0;
            t[k] = Math.exp(-s * s);
        }
        return t;
    }

    /** The table's entry for {@code k} sixteenths, for the test that compares it with the expression. */
    static double expMinusSquareOfSixteenths(int k) {
        return EXP_MINUS_SQUARE[k];
    }

    // Horner's rule unrolled per polynomial: the operations of the loop r = r·t + c[i], in its order (the quick
    // compiler keeps a loop's bounds checks and counter; ErrorFunctionBitsTest checks each against the loop bit for bit)

    static double p1(double t) {
        final double[] c = P1;
        return (((c[0] * t + c[1]) * t + c[2]) * t + c[3]) * t + c[4];
    }

    static double q1(double t) {
        final double[] c = Q1;
        return (((c[0] * t + c[1]) * t + c[2]) * t + c[3]) * t + c[4];
    }

    static double p2(double t) {
        final double[] c = P2;
        return (((((((c[0] * t + c[1]) * t + c[2]) * t + c[3]) * t + c[4]) * t + c[5]) * t + c[6]) * t + c[7]) * t
                + c[8];
    }

    static double q2(double t) {
        final double[] c = Q2;
        return (((((((c[0] * t + c[1]) * t + c[2]) * t + c[3]) * t + c[4]) * t + c[5]) * t + c[6]) * t + c[7]) * t
                + c[8];
    }

    static double p3(double t) {
        final double[] c = P3;
        return ((((c[0] * t + c[1]) * t + c[2]) * t + c[3]) * t + c[4]) * t + c[5];
    }

    static double q3(double t) {
        final double[] c = Q3;
        return ((((c[0] * t + c[1]) * t + c[2]) * t + c[3]) * t + c[4]) * t + c[5];
    }

    /** The coefficient arrays, for the test that compares the unrolled forms with Horner's loop. */
    static double[][] coefficients() {
        return new double[][] {P1.clone(), Q1.clone(), P2.clone(), Q2.clone(), P3.clone(), Q3.clone()};
    }
}
