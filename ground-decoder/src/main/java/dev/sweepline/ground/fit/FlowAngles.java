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
}
