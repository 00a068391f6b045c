package dev.sweepline.sim.plasma;

/**
 * asin and acos by the method of fdlibm's e_asin.c and e_acos.c (Sun Microsystems 1993, freely
 * distributable [memory]), written in Java so that the compiler inlines them: on Java 17
 * {@link Math#asin} and {@link Math#acos} are {@link StrictMath}'s, native calls into the same fdlibm
 * routines, and the split collector calls each once per population per step. StrictMath's specification
 * requires fdlibm's results, and this follows the routines operation for operation, so it gives the same
 * double to the bit ({@code InverseTrigonometryTest} compares the two on millions of arguments and on the
 * special values).
 *
 * <p>Method (the routines' own): on |x| &lt; 0.5, asin x = x + x·R(x²) with R a rational Remez fit of
 * (asin x − x)/x³ (error below 2^-58.75); on [0.5, 1], asin x = π/2 − 2 asin(√((1 − x)/2)), with π/2 and
 * √z split into high and low parts so that no bit is lost; acos x = π/2 − asin x near 0 and
 * 2 asin(√((1 ∓ x)/2)) (or π minus it) beyond 0.5. Stateless, allocation-free, thread-safe.
 */
public final class InverseTrigonometry {
    private static final double PI = 3.14159265358979311600e+00;
    private static final double PIO2_HI = 1.57079632679489655800e+00;
    private static final double PIO2_LO = 6.12323399573676603587e-17;
    private static final double PIO4_HI = 7.85398163397448278999e-01;
    private static final double PS0 = 1.66666666666666657415e-01;
    private static final double PS1 = -3.25565818622400915405e-01;
    private static final double PS2 = 2.01212532134862925881e-01;
    private static final double PS3 = -4.00555345006794114027e-02;
    private static final double PS4 = 7.91534994289814532176e-04;
    private static final double PS5 = 3.47933107596021167570e-05;
    private static final double QS1 = -2.40339491173441421878e+00;
    private static final double QS2 = 2.02094576023350569471e+00;
    private static final double QS3 = -6.88283971605453293030e-01;
    private static final double QS4 = 7.70381505559019352791e-02;

    private InverseTrigonometry() {
    }

    /** asin(x), equal to {@link StrictMath#asin(double)} to the bit. */
    public static double asin(double x) {
        long bits = Double.doubleToRawLongBits(x);
        int hx = (int) (bits >>> 32);
        int ix = hx & 0x7fffffff;
        if (ix >= 0x3ff00000) { // |x| >= 1
            if (((ix - 0x3ff00000) | (int) bits) == 0) {
                return x * PIO2_HI + x * PIO2_LO; // asin(±1) = ±π/2
            }
            return (x - x) / (x - x); // |x| > 1 or NaN: NaN
        }
        if (ix < 0x3fe00000) { // |x| < 0.5
            if (ix < 0x3e500000) { // |x| < 2^-26
                return x;
            }
            return x + x * ratio(x * x);
        }
        // 0.5 <= |x| < 1
        double w = 1.0 - Math.abs(x);
        double t = w * 0.5;
        double r = ratio(t);
        double s = Math.sqrt(t);
        if (ix >= 0x3FEF3333) { // |x| > 0.975
            t = PIO2_HI - (2.0 * (s + s * r) - PIO2_LO);
        } else {
            double f = highWord(s);
            double c = (t - f * f) / (s + f);
            double p = 2.0 * s * r - (PIO2_LO - 2.0 * c);
            double q = PIO4_HI - 2.0 * f;
            t = PIO4_HI - (p - q);
        }
        return hx > 0 ? t : -t;
    }

    /** acos(x), equal to {@link StrictMath#acos(double)} to the bit. */
    public static double acos(double x) {
        long bits = Double.doubleToRawLongBits(x);
        int hx = (int) (bits >>> 32);
        int ix = hx & 0x7fffffff;
        if (ix >= 0x3ff00000) { // |x| >= 1
            if (((ix - 0x3ff00000) | (int) bits) == 0) {
                return hx > 0 ? 0.0 : PI + 2.0 * PIO2_LO; // acos(1) = 0, acos(-1) = π
            }
            return (x - x) / (x - x); // |x| > 1 or NaN: NaN
        }
        if (ix < 0x3fe00000) { // |x| < 0.5
            if (ix <= 0x3c600000) { // |x| <= 2^-57
                return PIO2_HI + PIO2_LO;
            }
            double z = x * x;
            double r = ratio(z);
            return PIO2_HI - (x - (PIO2_LO - x * r));
        }
        if (hx < 0) { // -1 < x <= -0.5
            double z = (1.0 + x) * 0.5;
            double r = ratio(z);
            double s = Math.sqrt(z);
            double w = r * s - PIO2_LO;
            return PI - 2.0 * (s + w);
        }
        // 0.5 <= x < 1
        double z = (1.0 - x) * 0.5;
        double s = Math.sqrt(z);
        double df = highWord(s);
        double c = (z - df * df) / (s + df);
        double r = ratio(z);
        double w = r * s + c;
        return 2.0 * (df + w);
    }

    /** R(z) = P(z)/Q(z), the routines' rational fit (p/q of e_asin.c and e_acos.c, evaluated in their order). */
    private static double ratio(double z) {
        double p = z * (PS0 + z * (PS1 + z * (PS2 + z * (PS3 + z * (PS4 + z * PS5)))));
        double q = 1.0 + z * (QS1 + z * (QS2 + z * (QS3 + z * QS4)));
        return p / q;
    }

    /** {@code v} with its low 32 bits cleared (fdlibm's SET_LOW_WORD(v, 0)). */
    private static double highWord(double v) {
        return Double.longBitsToDouble(Double.doubleToRawLongBits(v) & 0xffffffff00000000L);
    }
}
