package dev.sweepline.sim.plasma;

import dev.sweepline.sim.physics.PhysicalConstants;

/**
 * An ion species: a name for logs, its mass and its charge.
 *
 * @param name          short label, e.g. "H+"
 * @param massKg        ion mass, kilogram
 * @param chargeCoulomb ion charge, coulomb (positive for the ions a solar-wind cup measures)
 */
public record IonSpecies(String name, double massKg, double chargeCoulomb) {
    /** Protons, H+: CODATA 2018 proton mass, charge e. */
    public static final IonSpecies PROTON = new IonSpecies("H+",
            PhysicalConstants.PROTON_MASS_KG, PhysicalConstants.ELEMENTARY_CHARGE_COULOMB);
    /** Alpha particles, He++: CODATA 2018 alpha mass, charge 2e. */
    public static final IonSpecies ALPHA = new IonSpecies("He++",
            PhysicalConstants.ALPHA_MASS_KG, 2 * PhysicalConstants.ELEMENTARY_CHARGE_COULOMB);

    /** Checks that mass and charge are positive and finite. */
    public IonSpecies {
        if (!(massKg > 0 && Double.isFinite(massKg)) || !(chargeCoulomb > 0 && Double.isFinite(chargeCoulomb))) {
            throw new IllegalArgumentException("mass and charge must be positive: " + massKg + " kg, " + chargeCoulomb + " C");
        }
    }

    /** Mass per charge, kilogram per coulomb: what an energy-per-charge window actually selects on. */
    public double massPerChargeKgPerCoulomb() {
        return massKg / chargeCoulomb;
    }
}
