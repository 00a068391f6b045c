package dev.sweepline.ground.fit;

/** An ion species of the fit: charge and mass (physics.md, "Constants"). */
public enum Species {
    /** H⁺: charge e, mass m_p. */
    PROTON(PlasmaConstants.ELEMENTARY_CHARGE_C, PlasmaConstants.PROTON_MASS_KG),
    /** He⁺⁺: charge 2e, mass m_α. */
    ALPHA(2 * PlasmaConstants.ELEMENTARY_CHARGE_C, PlasmaConstants.ALPHA_MASS_KG);

    private final double chargeC;
    private final double massKg;

    Species(double chargeC, double massKg) {
        this.chargeC = chargeC;
        this.massKg = massKg;
    }

    /** Charge, coulombs. */
    public double chargeC() {
        return chargeC;
    }

    /** Mass, kilograms. */
    public double massKg() {
        return massKg;
    }

    /** Normal speed that just passes a grid at {@code volts}: v = √(2qV/m), m/s; 0 for V ≤ 0. */
    public double thresholdSpeed(double volts) {
        return volts > 0 ? Math.sqrt(2 * chargeC * volts / massKg) : 0.0;
    }

    /** Energy per charge of a particle at normal speed {@code speedMPerS}: V = m v² / (2q), volts. */
    public double voltsAtSpeed(double speedMPerS) {
        return massKg * speedMPerS * speedMPerS / (2 * chargeC);
    }

    /** Thermal speed w = √(2kT/m), m/s. */
    public double thermalSpeed(double temperatureK) {
        return Math.sqrt(2 * PlasmaConstants.BOLTZMANN_J_PER_K * temperatureK / massKg);
    }

    /** Temperature of thermal speed {@code w}: T = m w² / (2k), kelvin. */
    public double temperature(double thermalSpeedMPerS) {
        return massKg * thermalSpeedMPerS * thermalSpeedMPerS / (2 * PlasmaConstants.BOLTZMANN_J_PER_K);
    }
}
