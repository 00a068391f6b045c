package dev.sweepline.sim.plasma;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * {@link ExpMinusOne} against the reference it must equal to the bit: {@link StrictMath#expm1}, whose
 * results the Java SE specification fixes as those of fdlibm (StrictMath class documentation); NaNs
 * compare as NaN (Double.doubleToLongBits), every other value bit for bit.
 */
class ExpMinusOneTest {
    /** Recorded seed of the random arguments. */
    private static final long SEED = 0xE1E1E1L;

    @Test
    void shouldEqualStrictMathToTheBitOnSpecialValues() {
        double ln2 = Math.log(2);
        // zeros, NaN, infinities, subnormals, the limits of double; the routine's own thresholds: 2^-54,
        // ln 2 / 2, 3 ln 2 / 2, 56 ln 2, the overflow threshold 709.78; k = ±1 around x = ±0.25; k = 20 and 57
        double[] special = {0.0, -0.0, Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY,
            Double.MIN_VALUE, -Double.MIN_VALUE, Double.MIN_NORMAL, Double.MAX_VALUE, -Double.MAX_VALUE,
            0x1p-54, -0x1p-54, 0x1p-55, 0.5 * ln2, -0.5 * ln2, Math.nextUp(0.5 * ln2), 1.5 * ln2, -1.5 * ln2,
            Math.nextDown(1.5 * ln2), 0.25, -0.25, 56 * ln2, -56 * ln2, Math.nextDown(-56 * ln2),
            709.782712893383973096, 709.782712893384, 709.79, -745.2, 20 * ln2, 57 * ln2, 1, -1, 10, -10};
        for (double x : special) {
            assertEquals(Double.doubleToLongBits(StrictMath.expm1(x)), Double.doubleToLongBits(ExpMinusOne.of(x)),
                    "x = " + x);
        }
    }

    @Test
    void shouldEqualStrictMathToTheBitOnAMillionArguments() {
        SplittableRandom random = new SplittableRandom(SEED);
        for (int i = 0; i < 1_000_000; i++) {
            double x = switch (i % 5) {
                case 0 -> random.nextDouble(-2, 2); // the primary range and k = ±1, ±2
                case 1 -> random.nextDouble(-50, 50); // 2 ≤ |k| ≤ 72: both scalings
                case 2 -> random.nextDouble(-800, 800); // to overflow and to −1
                case 3 -> Double.longBitsToDouble(random.nextLong()); // every exponent, NaNs included
                default -> Math.scalb(random.nextDouble(-1, 1), -random.nextInt(70)); // small |x|, to below 2^-54
            };
            double expected = StrictMath.expm1(x);
            double got = ExpMinusOne.of(x);
            if (Double.doubleToLongBits(expected) != Double.doubleToLongBits(got)) {
                assertEquals(expected, got, 0, "x = " + x + " (argument " + i + ")");
                assertEquals(Double.doubleToLongBits(expected), Double.doubleToLongBits(got), "x = " + x);
            }
        }
    }
}
