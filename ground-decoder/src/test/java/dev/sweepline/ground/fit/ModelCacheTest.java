package dev.sweepline.ground.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertSame;

import java.util.Arrays;
import org.junit.jupiter.api.Test;

/**
 * {@link ModelCache} keeps the models of the last window sets and moves a kept model to the next spectrum's
 * area: the moved model's currents and derivatives are those of a model built on that area, bit for bit (the
 * area only scales the currents, {@link PlasmaModel#evaluate}), for protons and the joint model, after other
 * window sets came in between.
 */
class ModelCacheTest {
    @Test
    void shouldGiveAMovedModelTheBitsOfAModelBuiltOnItsArea() {
        double[] lo = NearSunCase.low();
        double[] hi = NearSunCase.high();
        double area = DemoCup.CUP.effectiveAreaM2();
        for (boolean alphas : new boolean[] {false, true}) {
            ModelCache cache = new ModelCache();
            PlasmaModel first = cache.model(lo, hi, area, alphas);
            // other bands in between, fewer than the cache keeps: the survey table and focus bands alternate
            for (int shift = 1; shift < ModelCache.SIZE; shift++) {
                cache.model(Arrays.copyOfRange(lo, shift, shift + 16), Arrays.copyOfRange(hi, shift, shift + 16),
                        area, alphas);
            }
            double movedArea = area * 0.83; // an acceptance A(θ)/A(0) below 1: a flow off the normal
            PlasmaModel moved = cache.model(lo, hi, movedArea, alphas);
            assertSame(first, moved, "the kept model of the same windows");
            assertBitForBit(new PlasmaModel(lo, hi, movedArea, alphas), moved);
        }
    }

    @Test
    void shouldBuildANewModelWhenTheWindowsWereDropped() {
        double[] lo = NearSunCase.low();
        double[] hi = NearSunCase.high();
        double area = DemoCup.CUP.effectiveAreaM2();
        ModelCache cache = new ModelCache();
        PlasmaModel first = cache.model(lo, hi, area, false);
        for (int shift = 1; shift <= ModelCache.SIZE; shift++) {
            cache.model(Arrays.copyOfRange(lo, shift, shift + 16), Arrays.copyOfRange(hi, shift, shift + 16), area,
                    false);
        }
        PlasmaModel again = cache.model(lo, hi, area, false);
        assertNotSame(first, again, "the least recently used window set is dropped");
        assertBitForBit(new PlasmaModel(lo, hi, area, false), again);
    }

    /** Currents and Jacobian of {@code actual} equal {@code expected}'s to the bit, at near-Sun plasmas. */
    private static void assertBitForBit(PlasmaModel expected, PlasmaModel actual) {
        // near-Sun plasma (NearSunCase) and a fast hot one, as PlasmaModelEdgeTest
        double[][] plasmas = {NearSunCase.truth(), {1e7, 800e3, 90e3, 5e5, 850e3, 80e3}};
        int m = expected.windows();
        for (double[] p : plasmas) {
            double[] ce = new double[m];
            double[] ca = new double[m];
            double[][] je = new double[m][expected.parameters()];
            double[][] ja = new double[m][actual.parameters()];
            expected.evaluate(p, ce, je);
            actual.evaluate(p, ca, ja);
            for (int j = 0; j < m; j++) {
                String where = "window " + j + " at " + Arrays.toString(p);
                // bit for bit: the same operations on the same doubles
                assertEquals(ce[j], ca[j], 0.0, where);
                assertEquals(expected.speciesCurrent(Species.PROTON, j, p[0], p[1], p[2]),
                        actual.speciesCurrent(Species.PROTON, j, p[0], p[1], p[2]), 0.0, where);
                for (int a = 0; a < expected.parameters(); a++) {
                    assertEquals(je[j][a], ja[j][a], 0.0, where + " derivative " + a);
                }
            }
        }
    }
}
