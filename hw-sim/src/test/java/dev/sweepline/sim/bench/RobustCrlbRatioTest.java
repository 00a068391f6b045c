package dev.sweepline.sim.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The robust CRLB ratio beside the rms one, and the non-stationarity flag, on hand-made z-scores and
 * reduced chi-squares; each expected value is worked out beside it.
 */
class RobustCrlbRatioTest {
    @Test
    void shouldKeepTheRobustRatioWhereOneDiscontinuityDominatesTheRms() {
        // four sweeps, the same z on n, U, T; the last straddles a discontinuity
        List<double[]> z = List.of(new double[] {1, 1, 1}, new double[] {-2, -2, -2}, new double[] {3, 3, 3},
                new double[] {3000, 3000, 3000});
        List<double[]> rel = List.of(new double[] {0.01, 0.01, 0.01}, new double[] {0.02, 0.02, 0.02},
                new double[] {0.03, 0.03, 0.03}, new double[] {0.5, 0.5, 0.5});
        MomentErrors e = MomentErrors.of(rel, z);
        for (int k = 0; k < 3; k++) {
            // rms: sqrt((1 + 4 + 9 + 9e6) / 4) = sqrt(2250003.5) = 1500.00117
            assertEquals(Math.sqrt(2250003.5), e.crlbRatio()[k], 1e-9);
            // robust: |z| sorted {1, 2, 3, 3000}[floor(0.5 * 4) = 2] = 3, times 1.4826 = 4.4478
            assertEquals(4.4478, e.robustCrlbRatio()[k], 1e-12);
            assertEquals(0.03, e.medianRelative()[k], 0.0); // sorted {0.01, 0.02, 0.03, 0.5}[2]
        }
        MomentErrors without = MomentErrors.of(rel.subList(0, 3), z.subList(0, 3));
        assertEquals(Math.sqrt(14.0 / 3), without.crlbRatio()[0], 1e-12); // sqrt((1 + 4 + 9) / 3) = 2.160
        assertEquals(2 * 1.4826, without.robustCrlbRatio()[0], 1e-12); // sorted {1, 2, 3}[floor(1.5) = 1] = 2
    }

    @Test
    void shouldFlagAReducedChiSquareAboveTheOneInAThousandQuantile() {
        // chi-square 0.999 quantiles from standard tables [memory]: nu = 1: 10.828, nu = 10: 29.588
        assertEquals(10.828, NonStationarity.threshold(1), 5e-4);
        assertEquals(29.588 / 10, NonStationarity.threshold(10), 5e-5);
        assertTrue(NonStationarity.flagged(3.0, 10)); // 3.0 > 2.9588
        assertFalse(NonStationarity.flagged(2.9, 10)); // 2.9 < 2.9588
        assertFalse(NonStationarity.flagged(Double.NaN, 10)); // failed fit: not judged
        assertFalse(NonStationarity.flagged(100, 0)); // no degrees of freedom: not judged
    }

    @Test
    void shouldKeepEachThresholdAsComputedAfresh() {
        // NonStationarity keeps each dof's threshold: the same bits as the quantile computed afresh, twice
        // (computed, then kept), inside the kept range and beyond it
        for (int pass = 0; pass < 2; pass++) {
            for (int dof : new int[] {1, 2, 7, 40, 133, NonStationarity.CACHED_DOF, NonStationarity.CACHED_DOF + 1}) {
                assertEquals(Double.doubleToRawLongBits(NonStationarity.quantile(dof)),
                        Double.doubleToRawLongBits(NonStationarity.threshold(dof)), "dof " + dof);
            }
        }
    }
}
