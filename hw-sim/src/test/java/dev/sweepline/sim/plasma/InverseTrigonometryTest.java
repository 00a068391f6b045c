package dev.sweepline.sim.plasma;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * {@link InverseTrigonometry} against the reference it must equal to the bit: {@link StrictMath#asin} and
 * {@link StrictMath#acos}, whose results the Java SE specification fixes as those of fdlibm (StrictMath
 * class documentation); NaNs compare as NaN (Double.doubleToLongBits), every other value bit for bit.
 */
class InverseTrigonometryTest {
    /** Recorded seed of the random arguments. */
    private static final long SEED = 0xA5C05L;

    @Test
    void shouldEqualStrictMathToTheBitOnSpecialValues() {
        // zeros, NaN, infinities, subnormals, ±1 and just inside and outside; the routines' thresholds:
        // 2^-57, 2^-26, 0.5, 0.975 (high word 0x3FEF3333)
        double[] special = {0.0, -0.0, Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY,
            Double.MIN_VALUE, -Double.MIN_VALUE, Double.MIN_NORMAL, Double.MAX_VALUE, 1.0, -1.0,
            Math.nextDown(1.0), Math.nextUp(-1.0), Math.nextUp(1.0), Math.nextDown(-1.0), 0x1p-57, -0x1p-57,
            Math.nextUp(0x1p-57), 0x1p-26, Math.nextDown(0x1p-26), -0x1p-26, 0.5, -0.5, Math.nextDown(0.5),
            Math.nextUp(-0.5), 0.975, -0.975, Double.longBitsToDouble(0x3FEF333300000000L),
            Math.nextDown(Double.longBitsToDouble(0x3FEF333300000000L)), 0.1, -0.7, 2.0, -3.0};
        for (double x : special) {
            assertEquals(Double.doubleToLongBits(StrictMath.asin(x)),
                    Double.doubleToLongBits(InverseTrigonometry.asin(x)), "asin at x = " + x);
            assertEquals(Double.doubleToLongBits(StrictMath.acos(x)),
                    Double.doubleToLongBits(InverseTrigonometry.acos(x)), "acos at x = " + x);
        }
    }

    @Test
    void shouldEqualStrictMathToTheBitOnMillionsOfArguments() {
        SplittableRandom random = new SplittableRandom(SEED);
        for (int i = 0; i < 2_000_000; i++) {
            double x = switch (i % 4) {
                case 0 -> random.nextDouble(-1, 1); // the whole domain
                case 1 -> Math.copySign(1 - Math.scalb(random.nextDouble(), -random.nextInt(54)), random.nextDouble(-1, 1));
                case 2 -> Math.scalb(random.nextDouble(-1, 1), -random.nextInt(70)); // small |x|, to below 2^-57
                default -> Double.longBitsToDouble(random.nextLong()); // every exponent, NaNs included
            };
            check(x, i);
        }
    }

    private static void check(double x, int i) {
        long asin = Double.doubleToLongBits(StrictMath.asin(x));
        if (asin != Double.doubleToLongBits(InverseTrigonometry.asin(x))) {
            assertEquals(asin, Double.doubleToLongBits(InverseTrigonometry.asin(x)), "asin at x = " + x + " (argument " + i + ")");
        }
        long acos = Double.doubleToLongBits(StrictMath.acos(x));
        if (acos != Double.doubleToLongBits(InverseTrigonometry.acos(x))) {
            assertEquals(acos, Double.doubleToLongBits(InverseTrigonometry.acos(x)), "acos at x = " + x + " (argument " + i + ")");
        }
    }
}
