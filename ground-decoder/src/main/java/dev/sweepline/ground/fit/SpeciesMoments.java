package dev.sweepline.ground.fit;

/**
 * Fitted moments of one species with 1σ from the fit covariance; NaN where not fitted.
 *
 * @param densityPerM3           n, m⁻³
 * @param speedMPerS             bulk speed |U|, m/s
 * @param thermalSpeedMPerS      w = √(2kT/m), m/s
 * @param temperatureK           T, K
 * @param sigmaDensityPerM3      1σ of n
 * @param sigmaSpeedMPerS        1σ of U
 * @param sigmaThermalSpeedMPerS 1σ of w
 * @param sigmaTemperatureK      1σ of T (= 2 T σ_w / w)
 */
public record SpeciesMoments(double densityPerM3, double speedMPerS, double thermalSpeedMPerS, double temperatureK,
        double sigmaDensityPerM3, double sigmaSpeedMPerS, double sigmaThermalSpeedMPerS, double sigmaTemperatureK) {
    /** Nothing fitted. */
    public static final SpeciesMoments NONE = new SpeciesMoments(Double.NaN, Double.NaN, Double.NaN, Double.NaN,
            Double.NaN, Double.NaN, Double.NaN, Double.NaN);

    /** True when the density is a number. */
    public boolean fitted() {
        return Double.isFinite(densityPerM3);
    }
}
