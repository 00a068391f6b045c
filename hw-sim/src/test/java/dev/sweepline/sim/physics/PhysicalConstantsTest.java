package dev.sweepline.sim.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class PhysicalConstantsTest {

    @Test
    void shouldEqualTheTableOfPhysicsMd() {
        // physics.md "Constants", each row [read]; exact decimal literals, so the doubles must be identical
        assertEquals(1.602176634e-19, PhysicalConstants.ELEMENTARY_CHARGE_COULOMB, 0.0); // CODATA 2018, exact
        assertEquals(1.67262192369e-27, PhysicalConstants.PROTON_MASS_KG, 0.0); // CODATA 2018
        assertEquals(6.6446573357e-27, PhysicalConstants.ALPHA_MASS_KG, 0.0); // CODATA 2018
        assertEquals(1.380649e-23, PhysicalConstants.BOLTZMANN_JOULE_PER_KELVIN, 0.0); // CODATA 2018, exact
        assertEquals(6.957e8, PhysicalConstants.SOLAR_RADIUS_M, 0.0); // IAU 2015 Resolution B3
        assertEquals(149_597_870_700.0, PhysicalConstants.ASTRONOMICAL_UNIT_M, 0.0); // IAU 2012 Resolution B2
    }

    @Test
    void shouldGiveTheProtonSpeedAtOneKilovolt() {
        // physics.md [computed from CODATA 2018]: v = sqrt(2 e 1000 V / m_p) = 437.7 km/s;
        // tolerance half a unit of the last quoted digit (0.05 km/s)
        double v = Math.sqrt(2 * PhysicalConstants.ELEMENTARY_CHARGE_COULOMB * 1000 / PhysicalConstants.PROTON_MASS_KG);
        assertEquals(437.7e3, v, 50.0);
    }

    @Test
    void shouldPlaceTheAlphaVoltageRatioJustBelowTwo() {
        // physics.md "Alpha particles": V_alpha/V_p = m_alpha/(2 m_p) = 1.986300 [computed]; half a unit of the 6th decimal
        assertEquals(1.986300, PhysicalConstants.ALPHA_MASS_KG / (2 * PhysicalConstants.PROTON_MASS_KG), 5e-7);
    }
}
