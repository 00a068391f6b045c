package dev.sweepline.ground.special;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The shortcuts of {@link ErrorFunction} against the expressions they replace, to the bit (the reference
 * is each expression written out here as the class computed it before: Math.floor(16a)/16, Math.exp(−s·s)
 * and the Horner loop): results may not move, since the fit's path depends on every bit of its model.
 */
class ErrorFunctionBitsTest {
    /** Recorded seed of the random arguments (common practice: a fixed seed, so a failure repeats). */
    private static final long SEED = 20261202L;

    @Test
    void tableShouldHoldTheExpressionItReplaces() {
        for (int k = 0; k <= (int) (ErrorFunction.UNDERFLOW * 16.0); k++) {
            double s = Math.floor(k) / 16.0;
            assertBits(Math.exp(-s * s), ErrorFunction.expMinusSquareOfSixteenths(k), "e^(-s^2), k = " + k);
        }
    }

    @Test
    void truncationShouldBeTheFloorOverTheRange() {
        // (int) of a non-negative finite double below 2^31 rounds toward zero (JLS §5.1.3), which is floor
        Random r = new Random(SEED);
        for (int i = 0; i < 200_000; i++) {
            double a = 0.46875 + r.nextDouble() * (ErrorFunction.UNDERFLOW - 0.46875);
            assertEquals(Math.floor(a * 16.0), (int) (a * 16.0), "a = " + a);
        }
        for (int k = 8; k <= 436; k++) { // either side of every multiple of 1/16
            for (double a : new double[] {Math.nextDown(k / 16.0), k / 16.0, Math.nextUp(k / 16.0)}) {
                assertEquals(Math.floor(a * 16.0), (int) (a * 16.0), "a = " + a);
            }
        }
    }

    @Test
    void unrolledPolynomialsShouldBeTheHornerLoop() {
        double[][] c = ErrorFunction.coefficients();
        Random r = new Random(SEED);
        for (int i = 0; i < 100_000; i++) {
            double t = i % 2 == 0 ? r.nextDouble() * 0.22 : r.nextDouble() * 30; // x² of interval 1; |x| or x⁻² beyond
            assertBits(horner(c[0], t), ErrorFunction.p1(t), "P1 " + t);
            assertBits(horner(c[1], t), ErrorFunction.q1(t), "Q1 " + t);
            assertBits(horner(c[2], t), ErrorFunction.p2(t), "P2 " + t);
            assertBits(horner(c[3], t), ErrorFunction.q2(t), "Q2 " + t);
            assertBits(horner(c[4], t), ErrorFunction.p3(t), "P3 " + t);
            assertBits(horner(c[5], t), ErrorFunction.q3(t), "Q3 " + t);
        }
    }

    @Test
    void erfcShouldKeepItsBits() {
        Random r = new Random(SEED);
        for (int i = 0; i < 300_000; i++) {
            double a = 0.46875 + r.nextDouble() * (ErrorFunction.UNDERFLOW + 1 - 0.46875);
            assertBits(before(a), ErrorFunction.erfc(a), "erfc " + a);
            assertBits(2.0 - before(a), ErrorFunction.erfc(-a), "erfc -" + a);
        }
        for (int k = 8; k <= 437; k++) {
            for (double a : new double[] {Math.nextDown(k / 16.0), k / 16.0, Math.nextUp(k / 16.0)}) {
                assertBits(before(a), ErrorFunction.erfc(a), "erfc " + a);
            }
        }
        for (double a : new double[] {Math.nextUp(0.46875), 4.0, Math.nextUp(4.0), Math.nextDown(ErrorFunction.UNDERFLOW)}) {
            assertBits(before(a), ErrorFunction.erfc(a), "erfc " + a);
        }
    }

    /** erfc(a), a > 0.46875, as the class computed it before the table and the unrolled polynomials. */
    private static double before(double a) {
        if (!(a < ErrorFunction.UNDERFLOW)) {
            return Double.isNaN(a) ? a : 0.0;
        }
        double[][] c = ErrorFunction.coefficients();
        double scaled;
        if (a <= 4.0) {
            scaled = horner(c[2], a) / horner(c[3], a);
        } else {
            double z = 1.0 / (a * a);
            scaled = (5.6418958354775628695e-1 - z * horner(c[4], z) / horner(c[5], z)) / a;
        }
        double s = Math.floor(a * 16.0) / 16.0;
        return Math.exp(-s * s) * Math.exp(-(a - s) * (a + s)) * scaled;
    }

    private static void assertBits(double expected, double actual, String what) {
        assertEquals(Double.doubleToRawLongBits(expected), Double.doubleToRawLongBits(actual),
                what + ": " + expected + " vs " + actual);
    }

    /** c[0] t^n + ... + c[n] by Horner's rule: the loop the class evaluated before it spelled each polynomial out. */
    private static double horner(double[] c, double t) {
        double r = c[0];
        for (int i = 1; i < c.length; i++) {
            r = r * t + c[i];
        }
        return r;
    }
}
