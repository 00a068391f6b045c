package dev.sweepline.ground.fit;

/** Physical constants of the fit, CODATA 2018 (physics.md, "Constants"). */
public final class PlasmaConstants {
    /** Elementary charge, C (CODATA 2018, exact). */
    public static final double ELEMENTARY_CHARGE_C = 1.602176634e-19;
    /** Proton mass, kg (CODATA 2018). */
    public static final double PROTON_MASS_KG = 1.67262192369e-27;
    /** Alpha-particle mass, kg (CODATA 2018). */
    public static final double ALPHA_MASS_KG = 6.6446573357e-27;
    /** Boltzmann constant, J/K (CODATA 2018, exact). */
    public static final double BOLTZMANN_J_PER_K = 1.380649e-23;
    /** √π, for the window current (physics.md). */
    public static final double SQRT_PI = Math.sqrt(Math.PI);

    private PlasmaConstants() {
    }
}
