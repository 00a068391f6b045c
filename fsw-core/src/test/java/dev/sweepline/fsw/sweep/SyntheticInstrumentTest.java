package dev.sweepline.fsw.sweep;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/** Checks the test plasma against physics.md's worked cases, so the synthetic spectra are physics, not guesses. */
class SyntheticInstrumentTest {
    private static final double W_1E5_KELVIN = SyntheticInstrument.thermalKmPerS(1e5, SyntheticInstrument.PROTON_MASS);

    @Test
    void shouldMatchErfTable() {
        // Abramowitz & Stegun Table 7.1 (physics.md constants); 7.1.26 is good to 1.5e-7
        assertEquals(0.5204998778, SyntheticInstrument.erf(0.5), 1.5e-7);
        assertEquals(0.8427007929, SyntheticInstrument.erf(1.0), 1.5e-7);
        assertEquals(0.9953222650, SyntheticInstrument.erf(2.0), 1.5e-7);
    }

    @Test
    void shouldMatchThermalSpeedOfWorkedCase() {
        // physics.md worked cases: T = 1e5 K protons give w = 40.6310 km/s (6 digits given: 1e-4 km/s)
        assertEquals(40.6310, W_1E5_KELVIN, 1e-4);
    }

    @Test
    void shouldMatchWorkedProtonCases() {
        // physics.md worked cases P1..P3 [computed], 6 significant digits; the erf approximation
        // (1.5e-7 absolute on an erf difference of ~0.3) allows a few 1e-6 relative: tolerance 2e-5
        assertRelative(7.35409e-12, current(5, 400, W_1E5_KELVIN, 800, 870), 2e-5);
        assertRelative(4.22789e-12, current(5, 400, W_1E5_KELVIN, 700, 760), 2e-5);
        assertRelative(6.92137e-12, current(5, 400, W_1E5_KELVIN, 900, 1000), 2e-5);
    }

    @Test
    void shouldMatchWorkedAlphaCase() {
        // physics.md worked case A1: He++ n 0.2, T 4e5 K (w 40.7709 km/s), 1600-1720 V -> 5.07873e-13 A
        double w = SyntheticInstrument.thermalKmPerS(4e5, SyntheticInstrument.ALPHA_MASS);
        assertEquals(40.7709, w, 1e-4);
        double amps = SyntheticInstrument.windowCurrent(0.2, 400, w, SyntheticInstrument.ALPHA_MASS, 2, 1, 1600, 1720);
        assertRelative(5.07873e-13, amps, 2e-5);
    }

    @Test
    void shouldPlaceProtonPeakAtWorkedEnergy() {
        // physics.md: proton peak E/q at 400 km/s is 835.175 V (6 digits: 1e-3 V)
        SyntheticInstrument instrument = new SyntheticInstrument(1);
        assertEquals(835.175, instrument.protonPeakVolts(), 1e-3);
    }

    private static double current(double n, double u, double w, double low, double high) {
        return SyntheticInstrument.windowCurrent(n, u, w, SyntheticInstrument.PROTON_MASS, 1, 1, low, high);
    }

    private static void assertRelative(double expected, double actual, double relative) {
        assertEquals(expected, actual, Math.abs(expected) * relative);
    }
}
