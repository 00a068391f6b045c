package dev.sweepline.ground.fit;

/**
 * The demo cup's geometry for the ground (ICD §8) and the split-collector relations of physics.md:
 * a beam at angle θ shifts the aperture image by s = d tan θ; with u = s/R the two-half difference
 * ratio is D(u) = 1 − (2/π)[acos u − u√(1−u²)], so tan θ_x = (R/d)·D⁻¹(D_x).
 */
public final class CupGeometry {
    /** Effective area at normal incidence, m²: 1.000 cm² (ICD §8). */
    public static final double EFFECTIVE_AREA_M2 = 1.0e-4;
    /** Transmission of the four grids, 0.90⁴ (ICD §8). */
    public static final double GRID_TRANSMISSION = 0.6561;
    /** Aperture radius R = √(A / (π × 0.6561)), m: 6.966 mm (ICD §8). */
    public static final double APERTURE_RADIUS_M = Math.sqrt(EFFECTIVE_AREA_M2 / (Math.PI * GRID_TRANSMISSION));
    /** Aperture-to-collector distance d, m: 15.0 mm (ICD §8). */
    public static final double APERTURE_TO_COLLECTOR_M = 15.0e-3;
    /** Collector radius, m: 12.5 mm (ICD §8). */
    public static final double COLLECTOR_RADIUS_M = 12.5e-3;
    /** tan θ up to which the image lies wholly on the collector: (12.5 − 6.966)/15 (ICD §8, θ = 20.25°). */
    public static final double FULL_ACCEPTANCE_TAN = (COLLECTOR_RADIUS_M - APERTURE_RADIUS_M) / APERTURE_TO_COLLECTOR_M;

    private CupGeometry() {
    }

    /** Image shift in aperture radii, u = d tan θ / R. */
    public static double shiftRadii(double tanTheta) {
        return APERTURE_TO_COLLECTOR_M * tanTheta / APERTURE_RADIUS_M;
    }

    /** tan θ of an image shift of u aperture radii. */
    public static double tanOfShift(double u) {
        return u * APERTURE_RADIUS_M / APERTURE_TO_COLLECTOR_M;
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
     * the collector; 1 up to {@link #FULL_ACCEPTANCE_TAN}.
     */
    public static double transmission(double tanX, double tanY) {
        double s = APERTURE_TO_COLLECTOR_M * Math.hypot(tanX, tanY);
        return DiscOverlap.twoDiscArea(APERTURE_RADIUS_M, COLLECTOR_RADIUS_M, s)
                / (Math.PI * APERTURE_RADIUS_M * APERTURE_RADIUS_M);
    }

    /** cos θ of the flow from its two angle tangents: 1/√(1 + tan²θx + tan²θy) (ICD §8 angle convention). */
    public static double cosOfFlow(double tanX, double tanY) {
        return 1 / Math.sqrt(1 + tanX * tanX + tanY * tanY);
    }

    /**
     * Share of each quadrant Q1..Q4 of the current of a beam at (tan θx, tan θy): exact disc-quadrant
     * overlap of the shifted image, times {@link #transmission} (beyond 20.25° the clipped part is taken
     * evenly from the quadrants: an approximation).
     */
    public static void quadrantShares(double tanX, double tanY, double[] out) {
        DiscOverlap.quadrantFractions(shiftRadii(tanX), shiftRadii(tanY), out);
        double t = transmission(tanX, tanY);
        for (int q = 0; q < 4; q++) {
            out[q] *= t;
        }
    }
}
