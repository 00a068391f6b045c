package dev.sweepline.sim.plasma;

/**
 * e^x − 1 by the method of fdlibm's expm1 (Sun Microsystems 1993, K. C. Ng, s_expm1.c, freely
 * distributable [memory]), written in Java so that the compiler inlines it: on Java 17
 * {@link Math#expm1} is {@link StrictMath#expm1}, a native call into the same fdlibm routine, and the
 * window currents call it once per population per window. StrictMath's specification requires
 * fdlibm's results, and this follows the routine operation for operation, so it gives the same
 * double to the bit ({@code ExpMinusOneTest} compares the two on a million arguments over the whole
 * range and on the special values); the simulated currents, and so the runs, do not change.
 *
 * <p>Method (the routine's own): x = k ln 2 + r with |r| ≤ ln 2 / 2 (ln 2 in two parts, the
 * reduction's rounding carried in c); on the primary range a rational form in r whose correction is
 * R1(r²) = 1 + Q1 r² + ... + Q5 r¹⁰ (a Remez fit) gives expm1(r); then expm1(x) = 2^k (expm1(r) + 1) − 1,
 * assembled per range of k so that no bit is lost. Stateless, allocation-free, thread-safe.
 */
public final class ExpMinusOne {
    private static final double O_THRESHOLD = 7.09782712893383973096e+02;
    private static final double LN2_HI = 6.93147180369123816490e-01;
    private static final double LN2_LO = 1.90821492927058770002e-10;
    private static final double INV_LN2 = 1.44269504088896338700e+00;
    private static final double Q1 = -3.33333333333331316428e-02;
    private static final double Q2 = 1.58730158725481460165e-03;
    private static final double Q3 = -7.93650757867487942473e-05;
    private static final double Q4 = 4.00821782732936239552e-06;
    private static final double Q5 = -2.01099218183624371326e-07;
    private static final double HUGE = 1.0e+300;
    private static final double TINY = 1.0e-300;

    private ExpMinusOne() {
    }

    /** e^x − 1, equal to {@link StrictMath#expm1(double)} to the bit. */
    public static double of(double x) {
        long bits = Double.doubleToRawLongBits(x);
        int hx = (int) (bits >>> 32);
        boolean negative = hx < 0;
        hx &= 0x7fffffff;
        // huge and non-finite arguments
        if (hx >= 0x4043687A) { // |x| ≥ 56 ln 2
            if (hx >= 0x40862E42) { // |x| ≥ 709.78...
                if (hx >= 0x7ff00000) {
                    if (Double.isNaN(x)) {
                        return x + x;
                    }
                    return negative ? -1.0 : x; // expm1(±inf) = {−1, inf}
                }
                if (x > O_THRESHOLD) {
                    return HUGE * HUGE; // overflow
                }
            }
            if (negative && x + TINY < 0.0) {
                return TINY - 1.0; // x < −56 ln 2: −1 (inexact)
            }
        }
        double hi;
        double lo;
        double c;
        int k;
        // argument reduction
        if (hx > 0x3fd62e42) { // |x| > ln 2 / 2
            if (hx < 0x3FF0A2B2) { // and |x| < 3 ln 2 / 2
                if (!negative) {
                    hi = x - LN2_HI;
                    lo = LN2_LO;
                    k = 1;
                } else {
                    hi = x + LN2_HI;
                    lo = -LN2_LO;
                    k = -1;
                }
            } else {
                k = (int) (INV_LN2 * x + (negative ? -0.5 : 0.5));
                double t = k;
                hi = x - t * LN2_HI; // t LN2_HI is exact here
                lo = t * LN2_LO;
            }
            x = hi - lo;
            c = (hi - x) - lo;
        } else if (hx < 0x3c900000) { // |x| < 2^−54: x
            double t = HUGE + x;
            return x - (t - (HUGE + x));
        } else {
            k = 0;
            c = 0;
        }
        // x is now in the primary range
        double hfx = 0.5 * x;
        double hxs = x * hfx;
        double r1 = 1.0 + hxs * (Q1 + hxs * (Q2 + hxs * (Q3 + hxs * (Q4 + hxs * Q5))));
        double t = 3.0 - r1 * hfx;
        double e = hxs * ((r1 - t) / (6.0 - x * t));
        if (k == 0) {
            return x - (x * e - hxs); // c is 0
        }
        e = x * (e - c) - c;
        e -= hxs;
        if (k == -1) {
            return 0.5 * (x - e) - 0.5;
        }
        if (k == 1) {
            if (x < -0.25) {
                return -2.0 * (e - (x + 0.5));
            }
            return 1.0 + 2.0 * (x - e);
        }
        if (k <= -2 || k > 56) { // exp(x) − 1 suffices
            double y = 1.0 - (e - x);
            y = addToExponent(y, k);
            return y - 1.0;
        }
        double y;
        if (k < 20) {
            double oneMinus = withHighWord(1.0, 0x3ff00000 - (0x200000 >> k)); // 1 − 2^−k
            y = oneMinus - (e - x);
            y = addToExponent(y, k);
        } else {
            double twoToMinusK = withHighWord(1.0, (0x3ff - k) << 20); // 2^−k
            y = x - (e + twoToMinusK);
            y += 1.0;
            y = addToExponent(y, k);
        }
        return y;
    }

    /** {@code v} with its high 32 bits replaced by {@code high} (the low ones kept). */
    private static double withHighWord(double v, int high) {
        long bits = Double.doubleToRawLongBits(v);
        return Double.longBitsToDouble(((long) high << 32) | (bits & 0xffffffffL));
    }

    /** {@code v} with k added to its exponent field (the routine's high-word addition). */
    private static double addToExponent(double v, int k) {
        long bits = Double.doubleToRawLongBits(v);
        int high = (int) (bits >>> 32) + (k << 20);
        return Double.longBitsToDouble(((long) high << 32) | (bits & 0xffffffffL));
    }
}
