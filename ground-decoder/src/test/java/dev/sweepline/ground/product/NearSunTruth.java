package dev.sweepline.ground.product;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The fitted moments of a good {@link SyntheticTelemetry} spectrum against its truth, for any instrument. */
final class NearSunTruth {
    private NearSunTruth() {
    }

    /**
     * Truth of SyntheticTelemetry (physics.md near-Sun row); the noise bound is < 0.1 %, the ADC's
     * quantisation and range steps (ICD §4) are not in the noise model: 1 % on n, 0.3 % on U, 2 % on T,
     * 0.1° on θx, 0.3 points on He/H (common practice).
     */
    static void assertNearTruth(MomentRecord r) {
        assertTrue(r.ok() && r.fit().alphasFitted(), r.fit().flagText());
        assertEquals(3600, r.densityPerCc(), 36);
        assertEquals(300, r.speedKmPerS(), 0.9);
        assertEquals(6e5, r.temperatureK(), 1.2e4);
        assertEquals(3, r.thetaXDeg(), 0.1);
        assertEquals(0, r.thetaYDeg(), 0.1);
        assertEquals(3.0, 100 * r.fit().alphas().densityPerM3() / r.fit().protons().densityPerM3(), 0.3);
    }
}
