package dev.sweepline.ground.fit;

import dev.sweepline.ground.instrument.Geometry;
import dev.sweepline.ground.instrument.GroundInstrument;

/**
 * One cup's geometry as the fit uses it (from its description, telemetry ICD §8) and the
 * split-collector relations of physics.md: a beam at angle θ shifts the aperture image by s = d tan θ;
 * with u = s/R the two-half difference ratio is D(u) = 1 − (2/π)[acos u − u√(1−u²)], so
 * tan θ_x = (R/d)·D⁻¹(D). The relations that hold for every cup are static. Immutable.
 */
public final class CupGeometry {
    private final double effectiveAreaM2;
    private final double apertureRadiusM;
    private final double apertureToCollectorM;
    private final double collectorRadiusM;

    /** The geometry of a description. */
    public CupGeometry(Geometry g) {
        this.effectiveAreaM2 = g.effectiveAreaM2();
        this.apertureRadiusM = g.apertureRadiusM();
        this.apertureToCollectorM = g.apertureToCollectorM();
        this.collectorRadiusM = g.collectorRadiusM();
    }

    /** The geometry of {@code instrument}. */
    public static CupGeometry of(GroundInstrument instrument) {
        return new CupGeometry(instrument.geometry());
    }

    /** Effective area at normal incidence, m². */
    public double effectiveAreaM2() {
        return effectiveAreaM2;
    }

    /** Aperture radius R, m. */
    public double apertureRadiusM() {
        return apertureRadiusM;
    }

    /** tan θ up to which the image lies wholly on the collector: (collector − R)/d (ICD §8). */
    public double fullAcceptanceTan() {
        return (collectorRadiusM - apertureRadiusM) / apertureToCollectorM;
    }

    /** Image shift in aperture radii, u = d tan θ / R. */
    public double shiftRadii(double tanTheta) {
        return apertureToCollectorM * tanTheta / apertureRadiusM;
    }

    /** tan θ of an image shift of u aperture radii. */
    public double tanOfShift(double u) {
        return u * apertureRadiusM / apertureToCollectorM;
    }

    /** Two-half difference ratio D(u), odd in u, ±1 beyond |u| = 1 (physics.md). */
    public static double halfDifference(double u) {
        double a = Math.min(Math.abs(u), 1.0);
        double d = 1 - (2 / Math.PI) * (Math.acos(a) - a * Math.sqrt(1 - a * a));
        return Math.copySign(d, u);
    }

    /** dD/du = (4/π)√(1−u²) (derivative of {@link #halfDifference}). */
    public static double halfDifferenceSlope(double u) {
        double a = Math.min(Math.abs(u), 1.0);
        return 4 / Math.PI * Math.sqrt(1 - a * a);
    }

    /** D⁻¹(D) for |D| < 1 by bisection (D is monotonic); ±1 for |D| ≥ 1. */
    public static double inverseHalfDifference(double ratio) {
        if (!(Math.abs(ratio) < 1)) {
            return Math.copySign(1.0, ratio);
        }
        double lo = 0;
        double hi = 1;
        double target = Math.abs(ratio);
        for (int i = 0; i < 60; i++) {
            double mid = 0.5 * (lo + hi);
            if (halfDifference(mid) < target) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return Math.copySign(0.5 * (lo + hi), ratio);
    }

    /**
     * Acceptance A(θ)/A(0): the part of the aperture image (radius R, shifted by d·tan θ) that falls on
     * the collector; 1 up to {@link #fullAcceptanceTan()}.
     */
    public double transmission(double tanX, double tanY) {
        double s = apertureToCollectorM * Math.hypot(tanX, tanY);
        return DiscOverlap.twoDiscArea(apertureRadiusM, collectorRadiusM, s)
                / (Math.PI * apertureRadiusM * apertureRadiusM);
    }

    /**
     * 1σ of ln A(θ) from the angles' 1σ, by linear propagation (physics.md, "Density and speed beyond the
     * split's reach"): with s = d√(tx² + ty²) the image shift and A' = dA/ds = −L/(πR²) ({@link
     * DiscOverlap#twoDiscAreaSlope}, L the common chord),
     * <pre>
     *   ∂ln A/∂θx = (A'/A) · d tx (1 + tx²)/√(tx² + ty²)      (the same in y)
     *   σ_lnA²   = (∂ln A/∂θx)² σθx² + (∂ln A/∂θy)² σθy²
     * </pre>
     * 0 inside full acceptance (A' = 0), when the angles are not measured (θ taken as 0) or at normal
     * incidence; infinite when the image is off the collector (A = 0), where the caller has no density.
     */
    public double sigmaLogTransmission(FlowAngles angles) {
        if (!angles.measured()) {
            return 0.0;
        }
        double tx = angles.tanX();
        double ty = angles.tanY();
        double h = Math.hypot(tx, ty);
        if (!(h > 0)) {
            return 0.0;
        }
        double s = apertureToCollectorM * h;
        double area = DiscOverlap.twoDiscArea(apertureRadiusM, collectorRadiusM, s);
        double slope = DiscOverlap.twoDiscAreaSlope(apertureRadiusM, collectorRadiusM, s);
        if (slope == 0) {
            return 0.0;
        }
        if (!(area > 0)) {
            return Double.POSITIVE_INFINITY;
        }
        double gx = slope / area * apertureToCollectorM * tx * (1 + tx * tx) / h;
        double gy = slope / area * apertureToCollectorM * ty * (1 + ty * ty) / h;
        double sx = angles.sigmaThetaXRad();
        double sy = angles.sigmaThetaYRad();
        return Math.sqrt(gx * gx * sx * sx + gy * gy * sy * sy);
    }

    /** Aperture-to-collector distance d, m. */
    public double apertureToCollectorM() {
        return apertureToCollectorM;
    }

    /** dA/ds of the acceptance A(θ)/A(0) at image shift s (m): −L/(πR²), L the common chord; 0 inside full acceptance. */
    public double transmissionSlope(double shiftM) {
        return DiscOverlap.twoDiscAreaSlope(apertureRadiusM, collectorRadiusM, shiftM)
                / (Math.PI * apertureRadiusM * apertureRadiusM);
    }

    /**
     * The image shift s (m) at which the acceptance is {@code transmission}, for 0 < transmission < 1, by
     * bisection on [R_c − R, R_c + R] where it falls monotonically; NaN outside (0, 1).
     */
    public double shiftOfTransmission(double transmission) {
        if (!(transmission > 0 && transmission < 1)) {
            return Double.NaN;
        }
        double lo = collectorRadiusM - apertureRadiusM;
        double hi = collectorRadiusM + apertureRadiusM;
        double area = transmission * Math.PI * apertureRadiusM * apertureRadiusM;
        for (int i = 0; i < 60; i++) {
            double mid = 0.5 * (lo + hi);
            if (DiscOverlap.twoDiscArea(apertureRadiusM, collectorRadiusM, mid) > area) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    /** cos θ of the flow from its two angle tangents: 1/√(1 + tan²θx + tan²θy) (ICD §8 angle convention). */
    public static double cosOfFlow(double tanX, double tanY) {
        return 1 / Math.sqrt(1 + tanX * tanX + tanY * tanY);
    }

    /**
     * Share of each quadrant Q1..Q4 of the current of a beam at (tan θx, tan θy): exact disc-quadrant
     * overlap of the shifted image, times {@link #transmission} (beyond full acceptance the clipped part
     * is taken evenly from the quadrants: an approximation).
     */
    public void quadrantShares(double tanX, double tanY, double[] out) {
        DiscOverlap.quadrantFractions(shiftRadii(tanX), shiftRadii(tanY), out);
        double t = transmission(tanX, tanY);
        for (int q = 0; q < 4; q++) {
            out[q] *= t;
        }
    }
}
