package dev.sweepline.ground.fit;

/**
 * Exact areas of a unit disc cut by axis-parallel lines and by a second disc, used for the split
 * collector (physics.md, "Oblique flow and a split collector"). Derived here from
 * ∫√(1−x²)dx = (x√(1−x²) + asin x)/2.
 */
public final class DiscOverlap {
    private DiscOverlap() {
    }

    private static double chordIntegral(double x) {
        return 0.5 * (x * Math.sqrt(Math.max(0.0, 1 - x * x)) + Math.asin(x));
    }

    /** Area of the unit disc at the origin with x > a and y > b. */
    public static double cornerArea(double a, double b) {
        if (a >= 1 || b >= 1) {
            return 0.0;
        }
        double lo = Math.max(a, -1.0);
        if (b <= -1) {
            return 2 * (chordIntegral(1) - chordIntegral(lo));
        }
        double c = Math.sqrt(1 - b * b);
        double area = 0.0;
        // |x| < c: from the line y = b up to the upper arc
        double inner = Math.max(lo, -c);
        if (inner < c) {
            area += chordIntegral(c) - chordIntegral(inner) - b * (c - inner);
        }
        if (b < 0) {
            // |x| ≥ c: the whole chord lies above y = b
            double right = Math.max(lo, c);
            if (right < 1) {
                area += 2 * (chordIntegral(1) - chordIntegral(right));
            }
            if (lo < -c) {
                area += 2 * (chordIntegral(-c) - chordIntegral(lo));
            }
        }
        return area;
    }

    /**
     * Fractions of a unit disc centred at (ux, uy) in the four quadrants Q1 x>0 y>0, Q2 x<0 y>0,
     * Q3 x<0 y<0, Q4 x>0 y<0 (ICD §8), written to {@code out[0..3]}; they sum to 1.
     */
    public static void quadrantFractions(double ux, double uy, double[] out) {
        out[0] = cornerArea(-ux, -uy) / Math.PI;
        out[1] = cornerArea(ux, -uy) / Math.PI;
        out[2] = cornerArea(ux, uy) / Math.PI;
        out[3] = cornerArea(-ux, uy) / Math.PI;
    }

    /** Overlap area of two discs of radii r1, r2 whose centres are {@code dist} apart. */
    public static double twoDiscArea(double r1, double r2, double dist) {
        if (dist >= r1 + r2) {
            return 0.0;
        }
        double rmin = Math.min(r1, r2);
        if (dist <= Math.abs(r1 - r2)) {
            return Math.PI * rmin * rmin;
        }
        double a1 = Math.acos((dist * dist + r1 * r1 - r2 * r2) / (2 * dist * r1));
        double a2 = Math.acos((dist * dist + r2 * r2 - r1 * r1) / (2 * dist * r2));
        double k = 0.5 * Math.sqrt((-dist + r1 + r2) * (dist + r1 - r2) * (dist - r1 + r2) * (dist + r1 + r2));
        return r1 * r1 * a1 + r2 * r2 * a2 - k;
    }

    /**
     * d/d(dist) of {@link #twoDiscArea}: minus the length of the common chord, −2√(r1² − a²) with
     * a = (dist² + r1² − r2²)/(2 dist) the distance from the first centre to the chord, while the discs cross
     * (|r1 − r2| < dist < r1 + r2); 0 where one disc holds the other or they do not meet. Moving one centre
     * by δ along the line of centres sweeps the lens boundary by the chord times δ to first order (the two
     * arcs move, the chord's ends slide along them), so the area changes by −L·δ.
     */
    public static double twoDiscAreaSlope(double r1, double r2, double dist) {
        if (dist >= r1 + r2 || dist <= Math.abs(r1 - r2)) {
            return 0.0;
        }
        double a = (dist * dist + r1 * r1 - r2 * r2) / (2 * dist);
        return -2 * Math.sqrt(Math.max(0.0, r1 * r1 - a * a));
    }
}
