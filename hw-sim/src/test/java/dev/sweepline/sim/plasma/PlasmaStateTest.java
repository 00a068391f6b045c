package dev.sweepline.sim.plasma;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.junit.jupiter.api.Test;

class PlasmaStateTest {
    private static final IonPopulation BI_MAXWELLIAN =
            new IonPopulation(IonSpecies.PROTON, 5e6, 0, 0, 400e3, 50e3, 30e3);

    @Test
    void shouldGiveTheThermalSpeedsOfTheWorkedCases() {
        // physics.md worked cases: w = 40.6310 km/s (H+, 1e5 K) and 40.7709 km/s (He++, 4e5 K) [computed];
        // tolerance half a unit of the last quoted digit (0.05 m/s)
        assertEquals(40.6310e3, IonPopulation.thermalSpeed(1e5, IonSpecies.PROTON.massKg()), 0.05);
        assertEquals(40.7709e3, IonPopulation.thermalSpeed(4e5, IonSpecies.ALPHA.massKg()), 0.05);
    }

    @Test
    void shouldProjectTheBiMaxwellianOntoTheNormal() {
        // physics.md anisotropy: w_n^2 = w_par^2 cos^2 psi + w_perp^2 sin^2 psi; psi = 0, 90 deg give the
        // pure components and psi = 60 deg gives sqrt(50^2/4 + 30^2 * 3/4) km/s = 36.0555 km/s [computed];
        // rounding only, so 1e-9 relative
        PlasmaState along = PlasmaState.alongNormal(List.of(BI_MAXWELLIAN));
        assertEquals(50e3, along.normalThermalSpeed(BI_MAXWELLIAN), 50e3 * 1e-12);
        PlasmaState across = new PlasmaState(List.of(BI_MAXWELLIAN), 0, 1, 0);
        assertEquals(30e3, across.normalThermalSpeed(BI_MAXWELLIAN), 30e3 * 1e-12);
        double psi = Math.toRadians(60);
        PlasmaState oblique = new PlasmaState(List.of(BI_MAXWELLIAN), 7 * Math.sin(psi), 0, 7 * Math.cos(psi));
        assertEquals(Math.sqrt(50e3 * 50e3 * 0.25 + 30e3 * 30e3 * 0.75), oblique.normalThermalSpeed(BI_MAXWELLIAN), 1e-9 * 36e3);
        assertEquals(36.0555e3, oblique.normalThermalSpeed(BI_MAXWELLIAN), 0.05);
    }

    @Test
    void shouldNormaliseTheFieldAndRejectZero() {
        // a unit vector by construction (common practice for direction inputs); exact to rounding
        PlasmaState state = new PlasmaState(List.of(BI_MAXWELLIAN), 3, 0, 4);
        assertEquals(0.6, state.bx(), 1e-15);
        assertEquals(0.8, state.bz(), 1e-15);
        assertThrows(IllegalArgumentException.class, () -> new PlasmaState(List.of(BI_MAXWELLIAN), 0, 0, 0));
    }
}
