package dev.sweepline.ground.special;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.management.ManagementFactory;
import java.math.BigDecimal;
import java.math.MathContext;
import org.junit.jupiter.api.Test;

class ErrorFunctionTest {
    /**
     * Relative error allowed: Cody's approximations themselves are good to about 1e-18 (Math. Comp. 23,
     * 1969); the rest is the rounding of about twenty double operations and of two exp calls, a few
     * units of 2^-53 = 1.1e-16.
     */
    private static final double RELATIVE = 1e-15;

    @Test
    void shouldMatchAbramowitzAndStegunTable71() {
        // A&S Table 7.1, 10 decimals, so half a unit of the 10th: x = 0.5, 1, 2 as in physics.md
        // "Constants" [read]; x = 0.1, 1.5 [memory]
        double[][] rows = {{0.1, 0.1124629160}, {0.5, 0.5204998778}, {1.0, 0.8427007929}, {1.5, 0.9661051465},
            {2.0, 0.9953222650}};
        for (double[] row : rows) {
            assertEquals(row[1], ErrorFunction.erf(row[0]), 5e-11, "erf " + row[0]);
            assertEquals(row[1], ReferenceErf.erf(row[0]).doubleValue(), 5e-11, "reference erf " + row[0]);
            assertEquals(1 - row[1], ErrorFunction.erfc(row[0]), 5e-11, "erfc " + row[0]);
        }
    }

    @Test
    void shouldAgreeWithTheReferenceOverTheFitsWholeRange() {
        // x = (v - U)/w: from -40 (v = 0 under a cold, fast wind) to 26.5, past which erfc is subnormal
        double worst = 0;
        for (double x = 0; x <= 26.5; x = x < 5 ? x + 0.0371 : x + 0.173) {
            worst = Math.max(worst, errorAt(x));
        }
        for (double x : new double[] {1e-300, 1e-20, 0.46875, Math.nextDown(0.46875), 4.0, Math.nextUp(4.0), 26.54}) {
            worst = Math.max(worst, errorAt(x));
        }
        assertTrue(worst <= RELATIVE, "worst relative error " + worst);
        System.out.printf("ground erf/erfc: worst relative error %.3g%n", worst);
    }

    private static double errorAt(double x) {
        BigDecimal erfc = ReferenceErf.erfc(x);
        double erf = ReferenceErf.erf(x).doubleValue();
        double negative = BigDecimal.valueOf(2).subtract(erfc, MathContext.DECIMAL128).doubleValue();
        return max(relative(ErrorFunction.erf(x), erf), relative(ErrorFunction.erf(-x), -erf),
                relative(ErrorFunction.erfc(x), erfc.doubleValue()), relative(ErrorFunction.erfc(-x), negative));
    }

    @Test
    void shouldGiveFarTailWindowsTheirRelativePrecision() {
        // erf(b) - erf(a) = erfc(a) - erfc(b) exactly; a double difference of two values each good to
        // RELATIVE is good to RELATIVE (A + B)/(A - B), the subtraction's condition number (below 6 here)
        double[][] windows = {{0.5, 0.7}, {1.9, 2.6}, {4.5, 5}, {9, 9.4}, {16, 16.25}, {22, 23}, {26, 26.5}};
        for (double[] w : windows) {
            BigDecimal a = ReferenceErf.erfc(w[0]);
            BigDecimal b = ReferenceErf.erfc(w[1]);
            double exact = a.subtract(b, MathContext.DECIMAL128).doubleValue();
            double condition = a.add(b).doubleValue() / exact;
            assertTrue(condition < 6, "condition of " + w[0] + ".." + w[1]);
            assertEquals(1, ErrorFunction.difference(w[0], w[1]) / exact, RELATIVE * condition, "upper " + w[0]);
            assertEquals(1, ErrorFunction.difference(-w[1], -w[0]) / exact, RELATIVE * condition, "lower " + w[0]);
            assertEquals(-1, ErrorFunction.difference(w[1], w[0]) / exact, RELATIVE * condition, "swapped " + w[0]);
        }
    }

    @Test
    void shouldUnderflowToZeroAndKeepNaN() {
        // erfc(27.3) is below half of Double.MIN_VALUE (the reference says so), so it rounds to 0
        assertTrue(ReferenceErf.erfc(ErrorFunction.UNDERFLOW).compareTo(new BigDecimal(Double.MIN_VALUE).divide(BigDecimal.valueOf(2))) < 0);
        assertEquals(0.0, ErrorFunction.erfc(ErrorFunction.UNDERFLOW));
        assertEquals(2.0, ErrorFunction.erfc(-ErrorFunction.UNDERFLOW));
        assertEquals(1.0, ErrorFunction.erf(Double.POSITIVE_INFINITY));
        assertTrue(Double.isNaN(ErrorFunction.erfc(Double.NaN)));
        assertTrue(Double.isNaN(ErrorFunction.difference(Double.NaN, 1)));
        // erf(HALF_POINT) = 1/2 to the double nearest (inverse erf of 1/2 = 0.4769362762044698733... [memory]; the reference confirms)
        assertEquals(0.5, ReferenceErf.erf(ErrorFunction.HALF_POINT).doubleValue(), 1e-16);
    }

    @Test
    void shouldNotAllocate() {
        // the JVM's per-thread allocation counter; one 16-byte object per call would be 3.2 MB here
        com.sun.management.ThreadMXBean mx = (com.sun.management.ThreadMXBean) ManagementFactory.getThreadMXBean();
        long thread = Thread.currentThread().getId();
        double sum = 0;
        long start = mx.getThreadAllocatedBytes(thread);
        for (int i = 0; i < 200_000; i++) {
            double x = -35 + i * 3e-4;
            sum += ErrorFunction.difference(x, x + 0.25);
        }
        long bytes = mx.getThreadAllocatedBytes(thread) - start;
        assertTrue(sum > 0);
        assertTrue(bytes < 10_000, bytes + " B");
    }

    private static double relative(double value, double reference) {
        return reference == 0 ? Math.abs(value) : Math.abs(value / reference - 1);
    }

    private static double max(double... values) {
        double m = 0;
        for (double v : values) {
            m = Math.max(m, v);
        }
        return m;
    }
}
