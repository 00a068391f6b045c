package dev.sweepline.ground.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.hipparchus.analysis.UnivariateFunction;
import org.hipparchus.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;

class WindowCurrentTest {
    private static final double AREA = 1e-4; // 1 cm², physics.md worked cases

    private static double current(Species s, double n, double t, double volts1, double volts2, double u) {
        return WindowCurrent.current(s.chargeC() * AREA, n, u, s.thermalSpeed(t), s.thresholdSpeed(volts1),
                s.thresholdSpeed(volts2));
    }

    /** q n A ∫ v f(v) dv over [v1, v2] by Gauss–Legendre quadrature (Hipparchus), independent of the closed form. */
    private static double quadrature(Species s, double n, double u, double w, double v1, double v2) {
        UnivariateFunction f = v -> v * n / (Math.sqrt(Math.PI) * w) * Math.exp(-(v - u) * (v - u) / (w * w));
        return s.chargeC() * AREA * new IterativeLegendreGaussIntegrator(8, 1e-13, 1e-30).integrate(100000, f, v1, v2);
    }

    @Test
    void shouldMatchTheWorkedCasesOfPhysicsMd() {
        // physics.md worked cases [computed], 6 significant digits given: tolerance 5e-6 relative
        assertEquals(7.35409e-12, current(Species.PROTON, 5e6, 1e5, 800, 870, 400e3), 7.35409e-12 * 5e-6);
        assertEquals(4.22789e-12, current(Species.PROTON, 5e6, 1e5, 700, 760, 400e3), 4.22789e-12 * 5e-6);
        assertEquals(6.92137e-12, current(Species.PROTON, 5e6, 1e5, 900, 1000, 400e3), 6.92137e-12 * 5e-6);
        assertEquals(5.07873e-13, current(Species.ALPHA, 0.2e6, 4e5, 1600, 1720, 400e3), 5.07873e-13 * 5e-6);
        // w 40.6310 and 40.7709 km/s (physics.md table)
        assertEquals(40.6310e3, Species.PROTON.thermalSpeed(1e5), 0.05);
        assertEquals(40.7709e3, Species.ALPHA.thermalSpeed(4e5), 0.05);
        // proton peak E/q at 400 km/s: 835.175 V (physics.md)
        assertEquals(835.175, Species.PROTON.voltsAtSpeed(400e3), 0.0005);
    }

    @Test
    void shouldReplaceUByUCosThetaForObliqueFlow() {
        // physics.md "Oblique flow": case P1 at 10°: 7.19954e-12 A, at 20°: 5.23119e-12 A
        assertEquals(7.19954e-12, current(Species.PROTON, 5e6, 1e5, 800, 870, 400e3 * Math.cos(Math.toRadians(10))),
                7.19954e-12 * 5e-6);
        assertEquals(5.23119e-12, current(Species.PROTON, 5e6, 1e5, 800, 870, 400e3 * Math.cos(Math.toRadians(20))),
                5.23119e-12 * 5e-6);
    }

    @Test
    void shouldAgreeWithQuadratureAndItsDerivativesWithDifferencesOfQuadrature() {
        // physics.md: cross-check the closed form against numerical quadrature with a reference integrator
        double n = 5e6;
        double u = 400e3;
        double w = Species.PROTON.thermalSpeed(1e5);
        double[][] windows = {{800, 870}, {700, 760}, {900, 1000}, {400, 430}, {1400, 1500}};
        double[] out = new double[4];
        for (double[] win : windows) {
            double v1 = Species.PROTON.thresholdSpeed(win[0]);
            double v2 = Species.PROTON.thresholdSpeed(win[1]);
            WindowCurrent.evaluate(Species.PROTON.chargeC() * AREA, n, u, w, v1, v2, out);
            double q = quadrature(Species.PROTON, n, u, w, v1, v2);
            // quadrature converged to 1e-13 relative; 1e-9 leaves room for the far windows' tails
            assertEquals(q, out[WindowCurrent.VALUE], Math.abs(q) * 1e-9 + 1e-30);
            // central differences of the quadrature, step 1e-4 relative: truncation error ~1e-8 relative
            double hu = 1e-4 * w;
            double du = (quadrature(Species.PROTON, n, u + hu, w, v1, v2) - quadrature(Species.PROTON, n, u - hu, w, v1, v2))
                    / (2 * hu);
            double dw = (quadrature(Species.PROTON, n, u, w + hu, v1, v2) - quadrature(Species.PROTON, n, u, w - hu, v1, v2))
                    / (2 * hu);
            // truncation error of the difference: (h/w)² x⁶/6 relative, ~2e-6 in the far tail (x ≈ 3.3)
            assertEquals(du, out[WindowCurrent.D_SPEED], 1e-5 * Math.abs(du) + 1e-9 * Math.abs(q) / w);
            assertEquals(dw, out[WindowCurrent.D_THERMAL], 1e-5 * Math.abs(dw) + 1e-9 * Math.abs(q) / w);
            // ∂I/∂n = I/n (physics.md)
            assertEquals(out[WindowCurrent.VALUE] / n, out[WindowCurrent.D_DENSITY], 1e-15 * out[WindowCurrent.D_DENSITY]);
        }
    }

    @Test
    void shouldPutTheAlphaPeakAt1Point9863TimesTheProtonPeak() {
        // physics.md "Alpha particles": V_α/V_p = m_α/(2 m_p) = 1.986300 at the same speed
        assertEquals(1.986300, Species.ALPHA.voltsAtSpeed(400e3) / Species.PROTON.voltsAtSpeed(400e3), 5e-7);
    }
}
