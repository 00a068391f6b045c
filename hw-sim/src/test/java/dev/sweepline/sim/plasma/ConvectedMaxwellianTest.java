package dev.sweepline.sim.plasma;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.sim.physics.PhysicalConstants;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.hipparchus.analysis.integration.IterativeLegendreGaussIntegrator;
import org.hipparchus.special.Erf;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

class ConvectedMaxwellianTest {
    private static final double E = PhysicalConstants.ELEMENTARY_CHARGE_COULOMB;
    private static final double MP = PhysicalConstants.PROTON_MASS_KG;
    private static final double MA = PhysicalConstants.ALPHA_MASS_KG;
    /** physics.md worked cases: A = 1 cm^2. */
    private static final double AREA_M2 = 1e-4;
    /** physics.md worked cases: U = 400 km/s. */
    private static final double U = 400e3;
    private static final double W_P = IonPopulation.thermalSpeed(1e5, MP);
    private static final double W_A = IonPopulation.thermalSpeed(4e5, MA);

    /** Window given in thermal widths from the drift, plus the grid point; thresholds kept at 0 or above. */
    static Stream<Arguments> grid() {
        double[] densities = {5e6, 3e9};
        double[] speeds = {250e3, 400e3, 700e3};
        double[] widths = {20e3, 40.631e3, 100e3};
        double[][] windowsInW = {{-3, -2}, {-1, 0.5}, {-0.1, 0.05}, {0.5, 3}, {2, 3}, {8, 9}, {15, 15.3}, {20, 21},
            {-4.5, -4}, {-12, -1.5}, {-9, -8.5}, {-20, -19}};
        List<Arguments> cases = new ArrayList<>();
        for (double n : densities) {
            for (double u : speeds) {
                for (double w : widths) {
                    for (double[] x : windowsInW) {
                        double v1 = Math.max(0, u + x[0] * w);
                        double v2 = Math.max(0, u + x[1] * w);
                        if (v2 > v1 && v1 > 0.2 * u) {
                            cases.add(Arguments.of(n, u, w, v1, v2));
                        }
                    }
                }
            }
        }
        return cases.stream();
    }

    /** Reference: q n A v f(v) integrated by Hipparchus Gauss-Legendre over sub-intervals of w/4. */
    private static double quadrature(double q, double n, double area, double u, double w, double v1, double v2) {
        IterativeLegendreGaussIntegrator integrator = new IterativeLegendreGaussIntegrator(8, 1e-12, 1e-320, 2, 64);
        int pieces = (int) Math.ceil((v2 - v1) / (w / 4));
        double sum = 0;
        for (int i = 0; i < pieces; i++) {
            double a = v1 + (v2 - v1) * i / pieces;
            double b = v1 + (v2 - v1) * (i + 1) / pieces;
            sum += integrator.integrate(1_000_000,
                    v -> v * Math.exp(-(v - u) * (v - u) / (w * w)) / (Math.sqrt(Math.PI) * w), a, b);
        }
        return q * n * area * sum;
    }

    @ParameterizedTest(name = "n {0} /m3, U {1} m/s, w {2} m/s, window {3}..{4} m/s")
    @MethodSource("grid")
    void shouldEqualTheQuadratureOfTheFlux(double n, double u, double w, double v1, double v2) {
        // physics.md: cross-check the closed form against quadrature by a reference integrator (Hipparchus);
        // 1e-9 relative is the plasma design note's PLA-1; the integrator converges to 1e-12 relative, 1000x tighter
        double closed = ConvectedMaxwellian.windowCurrent(E, n, AREA_M2, u, w, v1, v2);
        double reference = quadrature(E, n, AREA_M2, u, w, v1, v2);
        assertTrue(closed > 0, "current must stay positive, even far in the tail");
        assertEquals(reference, closed, 1e-9 * reference, () -> "n " + n + " U " + u + " w " + w + " v " + v1 + ".." + v2);
    }

    @Test
    void shouldReproduceTheWorkedCases() {
        // physics.md "Worked cases" [computed]; tolerance half a unit of the 6th significant digit given
        assertEquals(7.35409e-12, protonWindow(800, 870), 0.5e-17); // P1
        assertEquals(4.22789e-12, protonWindow(700, 760), 0.5e-17); // P2
        assertEquals(6.92137e-12, protonWindow(900, 1000), 0.5e-17); // P3
        double v1 = ConvectedMaxwellian.speedForVoltage(1600, MA, 2 * E);
        double v2 = ConvectedMaxwellian.speedForVoltage(1720, MA, 2 * E);
        assertEquals(5.07873e-13, ConvectedMaxwellian.windowCurrent(2 * E, 0.2e6, AREA_M2, U, W_A, v1, v2), 0.5e-18); // A1
    }

    @Test
    void shouldReproduceObliqueFlowWithUnlimitedAcceptance() {
        // physics.md "Oblique flow": P1 with U cos(theta): 7.19954e-12 A at 10 deg, 5.23119e-12 A at 20 deg
        // [computed]; half a unit of the 6th significant digit
        double v1 = ConvectedMaxwellian.speedForVoltage(800, MP, E);
        double v2 = ConvectedMaxwellian.speedForVoltage(870, MP, E);
        assertEquals(7.19954e-12, ConvectedMaxwellian.windowCurrent(E, 5e6, AREA_M2,
                U * Math.cos(Math.toRadians(10)), W_P, v1, v2), 0.5e-17);
        assertEquals(5.23119e-12, ConvectedMaxwellian.windowCurrent(E, 5e6, AREA_M2,
                U * Math.cos(Math.toRadians(20)), W_P, v1, v2), 0.5e-17);
    }

    @Test
    void shouldAdmitTheWholeFluxWhenTheWindowIsOpen() {
        // physics.md: full admission gives n q U A when U >> w: 3.20435e-11 A (protons), 2.56348e-12 A (alphas)
        // [computed]; U/w ~ 10, so the exact open-window integral differs from nqUA by ~exp(-96), far below
        // half a unit of the 6th digit, which is the tolerance
        double protons = ConvectedMaxwellian.windowCurrent(E, 5e6, AREA_M2, U, W_P, 0, Double.POSITIVE_INFINITY);
        double alphas = ConvectedMaxwellian.windowCurrent(2 * E, 0.2e6, AREA_M2, U, W_A, 0, Double.POSITIVE_INFINITY);
        assertEquals(3.20435e-11, protons, 0.5e-16);
        assertEquals(2.56348e-12, alphas, 0.5e-17);
        assertEquals(5e6 * E * U * AREA_M2, protons, 1e-14 * protons); // the formula n q U A itself
    }

    @Test
    void shouldPlaceTheProtonAndAlphaPeaks() {
        // physics.md: proton peak E/q at 400 km/s = 835.175 V [computed]; half a unit of the last digit
        assertEquals(835.175, ConvectedMaxwellian.voltageForSpeed(U, MP, E), 0.0005);
        // physics.md "Alpha particles": V_alpha/V_p = 1.986300 and, in proton-equivalent speed, the alpha peak
        // at 1.409362 U [computed]; half a unit of the 6th decimal
        double alphaPeakVolts = ConvectedMaxwellian.voltageForSpeed(U, MA, 2 * E);
        assertEquals(1.986300, alphaPeakVolts / ConvectedMaxwellian.voltageForSpeed(U, MP, E), 5e-7);
        assertEquals(1.409362, ConvectedMaxwellian.speedForVoltage(alphaPeakVolts, MP, E) / U, 5e-7);
        // proton speed at 1 kV = 437.7 km/s (CODATA 2018 [computed]); half a unit of the last digit
        assertEquals(437.7e3, ConvectedMaxwellian.speedForVoltage(1000, MP, E), 50);
        // the inverse pair must round-trip (rounding only)
        assertEquals(1234.5, ConvectedMaxwellian.voltageForSpeed(
                ConvectedMaxwellian.speedForVoltage(1234.5, MP, E), MP, E), 1e-10);
    }

    @Test
    void shouldUseAnErfThatMatchesTheTable() {
        // Abramowitz & Stegun Table 7.1 (physics.md "Constants" [read]): 10 decimals, so half a unit of the 10th
        assertEquals(0.5204998778, Erf.erf(0.5), 5e-11);
        assertEquals(0.8427007929, Erf.erf(1.0), 5e-11);
        assertEquals(0.9953222650, Erf.erf(2.0), 5e-11);
    }

    @Test
    void shouldStayPositiveFarInTheUpperTail() {
        // a window 25..26 thermal widths above the drift carries ~exp(-625) of the flux: a naive erf
        // difference gives exactly 0 there. Leading-order tail asymptote (A&S 7.1.23):
        // I ~ qnA (U + w x1) e1 / (2 sqrt(pi) x1) for x1 >> 1, relative error ~ 1/(2 x1^2) = 8e-4, so 2e-3
        double w = 40e3;
        double v1 = U + 25 * w;
        double current = ConvectedMaxwellian.windowCurrent(E, 5e6, AREA_M2, U, w, v1, U + 26 * w);
        double asymptote = E * 5e6 * AREA_M2 * v1 * Math.exp(-625) / (2 * Math.sqrt(Math.PI) * 25);
        assertTrue(current > 0);
        assertEquals(asymptote, current, 2e-3 * asymptote);
    }

    @Test
    void shouldHaveDerivativesMatchingCentralDifferences() {
        // central differences, step 1e-5 of the parameter: truncation ~h^2 = 1e-10, rounding ~1e-16/1e-5 = 1e-11
        // relative to I, so 1e-7 of the current scale leaves a wide margin
        double[][] windows = {{800, 870}, {700, 760}, {900, 1000}, {300, 2000}, {1200, 1300}};
        double n = 5e6;
        for (double[] volts : windows) {
            double v1 = ConvectedMaxwellian.speedForVoltage(volts[0], MP, E);
            double v2 = ConvectedMaxwellian.speedForVoltage(volts[1], MP, E);
            double scale = ConvectedMaxwellian.windowCurrent(E, n, AREA_M2, U, W_P, 0, Double.POSITIVE_INFINITY);
            double hn = 1e-5 * n;
            double hu = 1e-5 * U;
            double hw = 1e-5 * W_P;
            double dn = (ConvectedMaxwellian.windowCurrent(E, n + hn, AREA_M2, U, W_P, v1, v2)
                    - ConvectedMaxwellian.windowCurrent(E, n - hn, AREA_M2, U, W_P, v1, v2)) / (2 * hn);
            double du = (ConvectedMaxwellian.windowCurrent(E, n, AREA_M2, U + hu, W_P, v1, v2)
                    - ConvectedMaxwellian.windowCurrent(E, n, AREA_M2, U - hu, W_P, v1, v2)) / (2 * hu);
            double dw = (ConvectedMaxwellian.windowCurrent(E, n, AREA_M2, U, W_P + hw, v1, v2)
                    - ConvectedMaxwellian.windowCurrent(E, n, AREA_M2, U, W_P - hw, v1, v2)) / (2 * hw);
            assertEquals(dn, ConvectedMaxwellian.dCurrentDn(E, n, AREA_M2, U, W_P, v1, v2), 1e-7 * scale / n);
            assertEquals(du, ConvectedMaxwellian.dCurrentDu(E, n, AREA_M2, U, W_P, v1, v2), 1e-7 * scale / U);
            assertEquals(dw, ConvectedMaxwellian.dCurrentDw(E, n, AREA_M2, U, W_P, v1, v2), 1e-7 * scale / W_P);
        }
    }

    private static double protonWindow(double lowVolts, double highVolts) {
        double v1 = ConvectedMaxwellian.speedForVoltage(lowVolts, MP, E);
        double v2 = ConvectedMaxwellian.speedForVoltage(highVolts, MP, E);
        return ConvectedMaxwellian.windowCurrent(E, 5e6, AREA_M2, U, W_P, v1, v2);
    }
}
