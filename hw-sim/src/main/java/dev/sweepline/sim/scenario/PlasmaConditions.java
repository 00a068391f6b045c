package dev.sweepline.sim.scenario;

/**
 * The plasma at the probe at one instant, in the units of the trade. Angles are measured from the
 * cup normal z: {@code thetaX} is the tilt in the x-z plane ({@code tan thetaX = vx / vz}),
 * {@code thetaY} the tilt in the y-z plane.
 *
 * @param protonDensityPerCc    proton number density, cm^-3
 * @param protonSpeedKmPerS     proton bulk speed, km/s
 * @param protonTemperatureK    proton scalar temperature T = (T_par + 2 T_perp) / 3, K; see
 *                              {@link #protonParallelTemperatureK()} for the two components
 * @param temperatureAnisotropy proton T_perp / T_par, 1 for isotropic
 * @param alphaAbundance        alpha to proton density ratio He/H
 * @param alphaDriftKmPerS      alpha speed minus proton speed, km/s, along the direction given by
 *                              {@link Scenario#alphaDriftDirection()}
 * @param alphaTemperatureRatio T_alpha / T_p
 * @param flowThetaXDeg         flow tilt in the x-z plane, degrees
 * @param flowThetaYDeg         flow tilt in the y-z plane, degrees
 * @param fieldThetaXDeg        magnetic field tilt in the x-z plane, degrees
 * @param fieldThetaYDeg        magnetic field tilt in the y-z plane, degrees
 */
public record PlasmaConditions(double protonDensityPerCc, double protonSpeedKmPerS, double protonTemperatureK,
        double temperatureAnisotropy, double alphaAbundance, double alphaDriftKmPerS,
        double alphaTemperatureRatio, double flowThetaXDeg, double flowThetaYDeg, double fieldThetaXDeg,
        double fieldThetaYDeg) {

    /** Builds conditions from values indexed by {@link PlasmaParameter#ordinal()}. */
    static PlasmaConditions of(double[] v) {
        return new PlasmaConditions(v[0], v[1], v[2], v[3], v[4], v[5], v[6], v[7], v[8], v[9], v[10]);
    }

    /**
     * Proton temperature along the field, K: T_par = 3 T / (1 + 2 A) with A = T_perp / T_par
     * (definition of the scalar temperature as the trace of the temperature tensor / 3, textbook).
     */
    public double protonParallelTemperatureK() {
        return parallelTemperatureK(protonTemperatureK, temperatureAnisotropy);
    }

    /** Proton temperature across the field, K: T_perp = A T_par. */
    public double protonPerpendicularTemperatureK() {
        return perpendicularTemperatureK(protonTemperatureK, temperatureAnisotropy);
    }

    /** T_par = 3 T / (1 + 2 A) of a scalar temperature T and anisotropy A, K. */
    static double parallelTemperatureK(double temperatureK, double anisotropy) {
        return 3.0 * temperatureK / (1.0 + 2.0 * anisotropy);
    }

    /** T_perp = A T_par, K. */
    static double perpendicularTemperatureK(double temperatureK, double anisotropy) {
        return anisotropy * parallelTemperatureK(temperatureK, anisotropy);
    }

    /** The value of one parameter, in the unit of that parameter. */
    public double get(PlasmaParameter p) {
        return switch (p) {
            case PROTON_DENSITY -> protonDensityPerCc;
            case PROTON_SPEED -> protonSpeedKmPerS;
            case PROTON_TEMPERATURE -> protonTemperatureK;
            case TEMPERATURE_ANISOTROPY -> temperatureAnisotropy;
            case ALPHA_ABUNDANCE -> alphaAbundance;
            case ALPHA_DRIFT -> alphaDriftKmPerS;
            case ALPHA_TEMPERATURE_RATIO -> alphaTemperatureRatio;
            case FLOW_THETA_X -> flowThetaXDeg;
            case FLOW_THETA_Y -> flowThetaYDeg;
            case FIELD_THETA_X -> fieldThetaXDeg;
            case FIELD_THETA_Y -> fieldThetaYDeg;
        };
    }

    /** These conditions with one parameter replaced (campaign draws, distance scaling). */
    public PlasmaConditions with(PlasmaParameter p, double value) {
        double[] v = new double[PlasmaParameter.values().length];
        for (PlasmaParameter q : PlasmaParameter.values()) {
            v[q.ordinal()] = q == p ? value : get(q);
        }
        return of(v);
    }
}
