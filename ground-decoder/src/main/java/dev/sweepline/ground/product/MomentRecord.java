package dev.sweepline.ground.product;

import dev.sweepline.ground.bound.CramerRaoBound;
import dev.sweepline.ground.fit.PlasmaFit;

/**
 * The moments of one spectrum with their fit and Cramér–Rao 1σ. Getters in product units (cm⁻³, km/s,
 * K, degrees) return NaN when the value is not available; the CSV writes NaN as an empty cell.
 *
 * @param taiSeconds time of the sweep's first step, TAI seconds since 1958-01-01 (CUC, ICD §3.2)
 * @param isoTai     the same as an ISO-8601 TAI label
 * @param apid       0x100 survey or 0x101 focus
 * @param mode       "survey" or "focus"
 * @param sweep      sweep number (ICD §4)
 * @param fit        the fit
 * @param bound      the Cramér–Rao bound of the fitted model at the fitted values for this window set
 *                   and noise; null when the fit failed
 * @param instrument name of the instrument the spectrum came from (its description's {@code name})
 */
public record MomentRecord(double taiSeconds, String isoTai, int apid, String mode, int sweep, PlasmaFit fit,
        CramerRaoBound bound, String instrument) {
    private static final double PER_CC = 1e-6;
    private static final double KM = 1e-3;

    /** True when the fit has moments. */
    public boolean ok() {
        return fit.ok();
    }

    /** n_p, cm⁻³. */
    public double densityPerCc() {
        return fit.protons().densityPerM3() * PER_CC;
    }

    /** |U_p|, km/s. */
    public double speedKmPerS() {
        return fit.protons().speedMPerS() * KM;
    }

    /** T_p, K. */
    public double temperatureK() {
        return fit.protons().temperatureK();
    }

    /** θx, degrees. */
    public double thetaXDeg() {
        return Math.toDegrees(fit.angles().thetaXRad());
    }

    /** θy, degrees. */
    public double thetaYDeg() {
        return Math.toDegrees(fit.angles().thetaYRad());
    }

    /**
     * ΔU, km/s: the bulk speed's change over an interleaved sweep (telemetry ICD §4 flags bit 5; docs/physics.md,
     * "Speed drift within an interleaved sweep"), NaN when the spectrum was not fitted with the drift term.
     */
    public double speedChangeKmPerS() {
        return fit.speedChangeMPerS() * KM;
    }

    /** 1σ of ΔU, km/s, from the fit covariance with the angles' 1σ propagated (as U's); NaN as ΔU is. */
    public double sigmaSpeedChangeKmPerS() {
        return fit.sigmaSpeedChangeMPerS() * KM;
    }

    /** Bound of n_p, cm⁻³, with the angle's part beyond full acceptance (NaN when singular or failed). */
    public double crlbDensityPerCc() {
        return bound == null ? Double.NaN
                : bound.sigmaDensity(fit.protons().densityPerM3(), fit.sigmaLogArea()) * PER_CC;
    }

    /** Bound of |U_p|, km/s: the bound of U along the normal over cos θ, with the angles' 1σ propagated. */
    public double crlbSpeedKmPerS() {
        if (bound == null) {
            return Double.NaN;
        }
        return bound.sigmaBulkSpeed(fit.angles(), fit.normalParameters()[1]) * KM;
    }

    /** Bound of T_p, K: 2 T σ_w / w (physics.md). */
    public double crlbTemperatureK() {
        return bound == null ? Double.NaN
                : bound.sigmaTemperature(0, fit.protons().thermalSpeedMPerS(), fit.protons().temperatureK());
    }

    /** Bound of n_α, cm⁻³, when the joint model was fitted. */
    public double crlbAlphaDensityPerCc() {
        return bound == null || bound.sigma().length < 6 ? Double.NaN : bound.sigma()[3] * PER_CC;
    }
}
