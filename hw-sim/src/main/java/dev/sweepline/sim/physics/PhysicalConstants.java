package dev.sweepline.sim.physics;

/**
 * Physical constants of physics.md "Constants", SI units. CODATA 2018 recommended values and IAU
 * resolutions; every value names its source and unit.
 */
public final class PhysicalConstants {
    /** Elementary charge e, coulomb; exact by the 2019 SI definition (CODATA 2018). */
    public static final double ELEMENTARY_CHARGE_COULOMB = 1.602176634e-19;
    /** Proton mass m_p, kilogram (CODATA 2018). */
    public static final double PROTON_MASS_KG = 1.67262192369e-27;
    /** Alpha-particle (He nucleus) mass m_alpha, kilogram (CODATA 2018). */
    public static final double ALPHA_MASS_KG = 6.6446573357e-27;
    /** Boltzmann constant k, joule per kelvin; exact by the 2019 SI definition (CODATA 2018). */
    public static final double BOLTZMANN_JOULE_PER_KELVIN = 1.380649e-23;
    /** Nominal solar radius, metre (IAU 2015 Resolution B3). */
    public static final double SOLAR_RADIUS_M = 6.957e8;
    /** Astronomical unit, metre; exact by definition (IAU 2012 Resolution B2). */
    public static final double ASTRONOMICAL_UNIT_M = 149_597_870_700.0;

    private PhysicalConstants() {
    }
}
