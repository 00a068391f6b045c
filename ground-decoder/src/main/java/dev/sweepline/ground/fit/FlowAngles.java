package dev.sweepline.ground.fit;

/**
 * Flow angles from the quadrant difference ratios (ICD §8 convention: tan θx = v_x/v_z, tan θy = v_y/v_z).
 *
 * @param thetaXRad      θx, rad
 * @param thetaYRad      θy, rad
 * @param sigmaThetaXRad 1σ of θx, rad
 * @param sigmaThetaYRad 1σ of θy, rad
 * @param ratioX         D_x = [(Q1+Q4) − (Q2+Q3)]/ΣQ over the spectrum
 * @param ratioY         D_y = [(Q1+Q2) − (Q3+Q4)]/ΣQ
 */
public record FlowAngles(double thetaXRad, double thetaYRad, double sigmaThetaXRad, double sigmaThetaYRad,
        double ratioX, double ratioY) {
    /** Not measured: angles taken as 0 by the moments, reported as NaN. */
    public static final FlowAngles NONE = new FlowAngles(Double.NaN, Double.NaN, Double.NaN, Double.NaN,
            Double.NaN, Double.NaN);

    /** True when measured. */
    public boolean measured() {
        return Double.isFinite(thetaXRad) && Double.isFinite(thetaYRad);
    }

    /** tan θx, 0 when not measured. */
    public double tanX() {
        return measured() ? Math.tan(thetaXRad) : 0.0;
    }

    /** tan θy, 0 when not measured. */
    public double tanY() {
        return measured() ? Math.tan(thetaYRad) : 0.0;
    }

    /**
     * 1σ of the bulk speed U = U_n / cos θ from the 1σ of the normal speed U_n and of the two angles
     * (physics.md, "Bulk speed from the normal speed and the angles"). With S = 1/cos θ = √(1 + tx² + ty²),
     * tx = tan θx, ty = tan θy (ICD §8 convention):
     * <pre>
     *   U = U_n S,   ∂U/∂U_n = S,   ∂U/∂θx = U_n (tx / S)(1 + tx²),   ∂U/∂θy = U_n (ty / S)(1 + ty²)
     *   σ_U² = S² σ_Un² + [U_n tx (1 + tx²)/S]² σθx² + [U_n ty (1 + ty²)/S]² σθy²
     * </pre>
     * U_n comes from the summed current and the angles from the quadrant differences, whose noises are
     * uncorrelated for equal quadrant variances, so no cross term. Without measured angles only the first
     * term (θ taken as 0).
     *
     * @param normalSpeedMPerS      U_n, m/s
     * @param sigmaNormalSpeedMPerS 1σ of U_n, m/s
     */
    public double sigmaBulkSpeed(double normalSpeedMPerS, double sigmaNormalSpeedMPerS) {
        double tx = tanX();
        double ty = tanY();
        double s = Math.sqrt(1 + tx * tx + ty * ty);
        double var = s * s * sigmaNormalSpeedMPerS * sigmaNormalSpeedMPerS;
        if (measured()) {
            double gx = normalSpeedMPerS * tx / s * (1 + tx * tx);
            double gy = normalSpeedMPerS * ty / s * (1 + ty * ty);
            var += gx * gx * sigmaThetaXRad * sigmaThetaXRad + gy * gy * sigmaThetaYRad * sigmaThetaYRad;
        }
        return Math.sqrt(var);
    }
}
