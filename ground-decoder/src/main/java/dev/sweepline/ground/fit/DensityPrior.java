package dev.sweepline.ground.fit;

/**
 * The proton density carried from the last spectrum whose angle the split measured (inside its reach),
 * for a spectrum beyond the reach: the ground fits spectra in time order, and in steady wind the density
 * changes little from one sweep to the next. Its relative 1σ is the earlier fit's and a random walk for the
 * time since: σ_ln n² = σ_fit² + {@link #DRIFT_PER_SQRT_SECOND}²·Δt (physics.md, "What can say more about the
 * angle beyond the reach").
 *
 * @param densityPerM3 n_p of the earlier fit, m⁻³
 * @param sigmaLog     relative 1σ of n_p now, > 0
 */
public record DensityPrior(double densityPerM3, double sigmaLog) {
    /**
     * Relative density drift of steady wind, per √s: 10 % over an hour, 0.1/√3600 (common practice [memory]:
     * steady slow wind changes its density by some ten per cent an hour outside structures).
     */
    public static final double DRIFT_PER_SQRT_SECOND = 0.1 / 60.0;
    /** Oldest density carried, s: beyond an hour the wind is another wind (common practice [memory]). */
    public static final double MAX_AGE_SECONDS = 3600.0;

    /**
     * The prior from an earlier fit {@code ageSeconds} before, or null when that fit has no finite density
     * and 1σ, or is too old or from the future.
     */
    public static DensityPrior carried(double densityPerM3, double sigmaDensityPerM3, double ageSeconds) {
        if (!(densityPerM3 > 0) || !(sigmaDensityPerM3 > 0) || !Double.isFinite(densityPerM3)
                || !Double.isFinite(sigmaDensityPerM3) || !(ageSeconds >= 0) || !(ageSeconds <= MAX_AGE_SECONDS)) {
            return null;
        }
        double rel = sigmaDensityPerM3 / densityPerM3;
        return new DensityPrior(densityPerM3, Math.sqrt(rel * rel + DRIFT_PER_SQRT_SECOND * DRIFT_PER_SQRT_SECOND
                * ageSeconds));
    }
}
