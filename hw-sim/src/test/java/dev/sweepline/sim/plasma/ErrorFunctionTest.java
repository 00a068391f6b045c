package dev.sweepline.sim.plasma;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.management.ManagementFactory;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class ErrorFunctionTest {
    /**
     * Relative error allowed against the reference: Cody's approximations are near-minimax to about
     * 1e-18 (Math. Comp. 23, 1969, Tables), so what is left is the rounding of a dozen double operations
     * and of exp (a few units of 2^-53 = 1.1e-16); 1e-15 leaves room for those.
     */
    private static final double RELATIVE = 1e-15;

    @Test
    void shouldMatchTheHandbookTable() {
        // Abramowitz & Stegun Table 7.1, 10 decimals, so half a unit of the 10th:
        // x = 0.5, 1, 2 as physics.md "Constants" [read]; x = 0.1, 1.5 [memory]
        double[][] table = {{0.1, 0.1124629160}, {0.5, 0.5204998778}, {1.0, 0.8427007929}, {1.5, 0.9661051465},
            {2.0, 0.9953222650}};
        for (double[] row : table) {
            assertEquals(row[1], ErrorFunction.erf(row[0]), 5e-11, "erf(" + row[0] + ")");
            assertEquals(row[1], SeriesErf.erf(row[0]), 5e-11, "reference erf(" + row[0] + ")");
            assertEquals(-row[1], ErrorFunction.erf(-row[0]), 5e-11, "erf is odd at " + row[0]);
        }
    }

    @Test
    void shouldHaveFullRelativePrecisionOverTheWholeRangeOfTheModel() {
        // the model's x = (v - U)/w runs from about -40 (v = 0, cold fast wind) to where erfc underflows
        // (26.5: below that erfc is a normal double); the reference is SeriesErf (A&S 7.1.6 in BigDecimal)
        double worstErf = 0;
        double worstErfc = 0;
        List<Double> points = new ArrayList<>();
        for (double x = 0; x <= 6; x += 0.0213) { // dense where the three intervals meet
            points.add(x);
        }
        for (double x = 6.05; x <= 26.5; x += 0.0997) {
            points.add(x);
        }
        points.addAll(List.of(1e-300, 1e-17, 1e-8, 0.46875, Math.nextUp(0.46875), 4.0, Math.nextUp(4.0), 26.5, 26.54));
        for (double x : points) {
            BigDecimal erfc = SeriesErf.erfcExact(x);
            double erf = SeriesErf.erf(x);
            double lower = BigDecimal.valueOf(2).subtract(erfc, MathContext.DECIMAL128).doubleValue();
            worstErf = Math.max(worstErf, Math.max(relative(ErrorFunction.erf(x), erf),
                    relative(ErrorFunction.erf(-x), -erf)));
            worstErfc = Math.max(worstErfc, Math.max(relative(ErrorFunction.erfc(x), erfc.doubleValue()),
                    relative(ErrorFunction.erfc(-x), lower)));
        }
        assertTrue(worstErf <= RELATIVE, "erf relative error " + worstErf);
        assertTrue(worstErfc <= RELATIVE, "erfc relative error " + worstErfc);
        System.out.printf("max relative error: erf %.3g, erfc %.3g over %d points%n", worstErf, worstErfc, points.size());
    }

    @Test
    void shouldBeZeroOnlyWhereTheComplementIsBelowTheSmallestSubnormal() {
        // erfc(27.3) = 5.1e-326 by the reference, under Double.MIN_VALUE/2 = 2.5e-324
        assertTrue(SeriesErf.erfcExact(27.3).compareTo(new BigDecimal(Double.MIN_VALUE).divide(BigDecimal.valueOf(2))) < 0);
        assertEquals(0.0, ErrorFunction.erfc(27.3));
        // the switch between erf and erfc differences: erf = 1/2 there (inverse erf of 1/2 = 0.47693627620446987... [memory])
        assertEquals(0.5, SeriesErf.erf(ErrorFunction.ERF_HALF_POINT), 1e-16);
        assertEquals(2.0, ErrorFunction.erfc(-40));
        assertEquals(1.0, ErrorFunction.erf(Double.POSITIVE_INFINITY));
        assertEquals(-1.0, ErrorFunction.erf(Double.NEGATIVE_INFINITY));
        assertTrue(Double.isNaN(ErrorFunction.erf(Double.NaN)));
        assertTrue(Double.isNaN(ErrorFunction.erfc(Double.NaN)));
        // subnormal range (26.55 .. 27.2): erfc positive, within a few units of the last place of the reference
        double x = 27.0;
        double reference = SeriesErf.erfc(x);
        assertTrue(reference > 0 && Math.abs(ErrorFunction.erfc(x) - reference) <= 4 * Double.MIN_VALUE);
    }

    @Test
    void shouldKeepTheRelativePrecisionOfAWindowFarInEitherTail() {
        // erf(x2) - erf(x1) as a difference of erfc: exact difference from the reference in BigDecimal.
        // A difference of two values each good to RELATIVE is good to RELATIVE (a + b)/(a - b): the
        // condition number of the subtraction, which the narrowest window here keeps below 10.
        double[][] windows = {{0.6, 0.9}, {2, 3}, {4.2, 4.6}, {8, 9}, {15, 15.3}, {20, 21}, {25.5, 26.4}, {3.9, 4.1}};
        for (double[] win : windows) {
            BigDecimal a = SeriesErf.erfcExact(win[0]);
            BigDecimal b = SeriesErf.erfcExact(win[1]);
            double exact = a.subtract(b, MathContext.DECIMAL128).doubleValue();
            double condition = a.add(b).doubleValue() / exact;
            assertTrue(condition < 10, "window " + win[0] + ".." + win[1]);
            double allowed = RELATIVE * condition;
            assertEquals(1, ErrorFunction.difference(win[0], win[1]) / exact, allowed, "upper " + win[0]);
            assertEquals(1, ErrorFunction.difference(-win[1], -win[0]) / exact, allowed, "lower " + win[0]);
            assertEquals(-1, ErrorFunction.difference(win[1], win[0]) / exact, allowed, "reversed " + win[0]);
        }
        // across the centre the plain erf difference is used: erf(1) - erf(-0.5), A&S Table 7.1 values
        assertEquals(0.8427007929 + 0.5204998778, ErrorFunction.difference(-0.5, 1.0), 1e-10);
    }

    @Test
    void shouldDifferFromTheLibraryErfOnlyInTheLastBits() {
        // Hipparchus Erf (regularised incomplete gamma, converged to 1e-15) was the simulator's error
        // function before; on |x| <= 6 it is accurate to a few 1e-16, so the two agree to 1e-14
        double worst = 0;
        for (double x = -6; x <= 6; x += 0.00731) {
            worst = Math.max(worst, relative(ErrorFunction.erfc(x), org.hipparchus.special.Erf.erfc(x)));
            worst = Math.max(worst, relative(ErrorFunction.difference(x, x + 0.3),
                    org.hipparchus.special.Erf.erf(x, x + 0.3)));
        }
        assertTrue(worst < 1e-14, "relative difference from Hipparchus " + worst);
        System.out.printf("max relative difference from Hipparchus Erf on [-6, 6]: %.3g%n", worst);
    }

    @Test
    void shouldAllocateNothing() {
        // HotSpot's per-thread allocation counter (com.sun.management.ThreadMXBean); a call that allocated
        // even one 16-byte object would show 1.6 MB over these 100 000 calls
        com.sun.management.ThreadMXBean threads = (com.sun.management.ThreadMXBean) ManagementFactory.getThreadMXBean();
        long id = Thread.currentThread().getId();
        double sink = 0;
        long before = threads.getThreadAllocatedBytes(id);
        for (int i = 0; i < 100_000; i++) {
            double x = -30 + i * 6e-4;
            sink += ErrorFunction.erfc(x) + ErrorFunction.difference(x, x + 0.5);
        }
        long allocated = threads.getThreadAllocatedBytes(id) - before;
        assertTrue(sink > 0);
        assertTrue(allocated < 10_000, allocated + " B allocated");
    }

    private static double relative(double value, double reference) {
        return reference == 0 ? Math.abs(value) : Math.abs(value / reference - 1);
    }
}
