package dev.sweepline.ground.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Arrays;
import org.junit.jupiter.api.Test;

/**
 * {@link PlasmaModel} takes the error function and the exponential once per window edge, shared by adjacent
 * windows: its currents and derivatives are those of {@link WindowCurrent#evaluate} window by window, bit
 * for bit (the same floating-point operations, only not repeated), on the contiguous default table and on
 * windows with gaps, for protons and alphas from the far tails to the peak.
 */
class PlasmaModelEdgeTest {
    @Test
    void shouldGiveWindowCurrentsBitForBitOnContiguousAndGappedWindows() {
        double[] lo = NearSunCase.low();
        double[] hi = NearSunCase.high();
        // every third window left out: edges no longer shared there
        double[] gapLo = new double[lo.length / 3 * 2];
        double[] gapHi = new double[gapLo.length];
        int k = 0;
        for (int j = 0; j < lo.length && k < gapLo.length; j++) {
            if (j % 3 != 2) {
                gapLo[k] = lo[j];
                gapHi[k++] = hi[j];
            }
        }
        // near-Sun plasma (NearSunCase), a slow cool one far below the table's middle, a fast hot one
        double[][] plasmas = {NearSunCase.truth(), {5e6, 250e3, 15e3, 2e5, 260e3, 14e3}, {1e7, 800e3, 90e3, 5e5, 850e3, 80e3}};
        for (double[][] band : new double[][][] {{lo, hi}, {gapLo, gapHi}}) {
            PlasmaModel model = new PlasmaModel(band[0], band[1], DemoCup.CUP.effectiveAreaM2(), true);
            for (double[] p : plasmas) {
                double[] current = new double[band[0].length];
                double[][] jac = new double[band[0].length][PlasmaModel.JOINT_PARAMETERS];
                model.evaluate(p, current, jac);
                double[] proton = new double[4];
                double[] alpha = new double[4];
                for (int j = 0; j < current.length; j++) {
                    WindowCurrent.evaluate(Species.PROTON.chargeC() * DemoCup.CUP.effectiveAreaM2(), p[0], p[1], p[2],
                            model.protonThreshold(j, false), model.protonThreshold(j, true), proton);
                    WindowCurrent.evaluate(Species.ALPHA.chargeC() * DemoCup.CUP.effectiveAreaM2(), p[3], p[4], p[5],
                            model.alphaThreshold(j, false), model.alphaThreshold(j, true), alpha);
                    String where = "window " + j + " of " + current.length + " at " + Arrays.toString(p);
                    // bit for bit: the same operations on the same doubles
                    assertEquals(proton[0] + alpha[0], current[j], 0.0, where);
                    for (int d = 0; d < 3; d++) {
                        assertEquals(proton[d + 1], jac[j][d], 0.0, where + " proton derivative " + d);
                        assertEquals(alpha[d + 1], jac[j][d + 3], 0.0, where + " alpha derivative " + d);
                    }
                }
            }
        }
    }
}
