package dev.sweepline.sim.cup;

import dev.sweepline.sim.plasma.InverseTrigonometry;

/**
 * Exact geometry of a shifted aperture image (disc of radius R) on a circular collector (radius Rc,
 * centred at the origin) split along the x and y axes into quadrants Q1 (x&gt;0, y&gt;0), Q2 (x&lt;0, y&gt;0),
 * Q3 (x&lt;0, y&lt;0) and Q4 (x&gt;0, y&lt;0).
 *
 * <p>Method: the area of the convex region image ∩ collector ∩ quadrant is (1/2)∮(x dy - y dx) over
 * its boundary (Green's theorem). Its straight pieces lie on the split lines, which pass through the
 * origin, so they contribute nothing; only the circular arcs count, and an arc of a circle of
 * centre (cx, cy) and radius r from angle a to b contributes
 * (r/2)[cx (sin b - sin a) - cy (cos b - cos a) + r (b - a)]. Each circle is cut at its crossings
 * with the other circle and with both axes; each piece lies in one quadrant and wholly inside or
 * outside the other disc, which its midpoint decides. Closed form, exact to rounding.
 *
 * <p>An image well inside the collector (the usual case: the flow a few degrees off the normal) is cut by
 * the axes alone, where the sines and cosines of the break angles are known without evaluating them: on
 * the y axis cos = -cx/r and sin = ±sqrt(1 - cos²), on the x axis sin = -cy/r and cos = ±sqrt(1 - sin²);
 * and an arc's quadrant is that of the midpoint formed from its two ends. Only the angles themselves (one
 * acos, one asin) are evaluated there; the fractions agree with the general path's within 1e-15. The breaks'
 * acos and asin are {@link InverseTrigonometry}'s (StrictMath's to the bit, without the native call).
 *
 * <p>An image shifted by less than half its radius has the origin well inside it: its four axis crossings
 * lie on the four half-axes (the upper y crossing on +y, as cy + r sin(phi) ≥ r (√3/2 - 1/2) > 0, and so
 * on), and going round the circle goes round the origin, so the arc that starts on the +x, +y, -x, -y
 * half-axis lies in Q1, Q2, Q3, Q4. Its midpoint is then at least 0.3 r from both split lines, where the
 * midpoint test above (to within about 1e-15 r) says the same; so the arc's quadrant is taken from its
 * start without forming the midpoint, and the fractions are the same doubles.
 *
 * <p>Threading: not thread-safe; it caches the fractions of the last two shifts, because a plasma's
 * populations share one flow direction or, with drifting alphas, two, and the same plasma is read
 * through many windows (the yardstick's 128 per sampled plasma). Allocation-free after construction.
 */
public final class SplitCollector {
    private static final double TWO_PI = 2 * Math.PI;
    /** Relative slack of the inside test so that coincident circles count their common arc once. */
    private static final double INSIDE_SLACK = 1e-9;
    /**
     * Relative band around the inside test's limit (on squared distances) within which the test falls
     * back to {@link Math#hypot}: the squared distance is within a few ulps (about 1e-15) of its true
     * value and hypot within one ulp, so outside this band both give the same answer.
     */
    private static final double SQUARED_GUARD = 1e-12;
    /**
     * Relative margin of "the image lies inside the collector": far beyond the inside tests' slack and the
     * rounding of the arc midpoints, so that within it every test would say so.
     */
    private static final double WELL_INSIDE = 1e-6;
    /** Fraction of the squared well-inside limit below which no hypot is evaluated (about 0.999²: far beyond rounding). */
    private static final double CLEARLY_INSIDE_SQUARED = 0.998;
    /**
     * Distance from a split line, relative to the radius, beyond which the midpoint formed from an arc's
     * ends decides its quadrant: that point is within about 1e-12 r of the true one (1e-15 over a half-angle
     * cosine of at least {@link #MIN_HALF_ANGLE_COSINE}), so nearer a line the midpoint's own angle decides.
     */
    private static final double MIDPOINT_MARGIN = 1e-9;
    /** Smallest |cos h| (h the arc's half angle) for which the midpoint is formed from the arc's ends. */
    private static final double MIN_HALF_ANGLE_COSINE = 1e-3;

    private final double imageRadiusM;
    private final double collectorRadiusM;
    private final double imageAreaM2;
    /**
     * Squared shift below which the image is well inside ({@code hypot + R < Rc (1 - WELL_INSIDE)}) without
     * evaluating hypot: {@link #CLEARLY_INSIDE_SQUARED} times the square of that limit L, so hypot stays below
     * 0.9991 L whatever the ulps of the squared shift and of hypot, and the sum with R below the limit by
     * 0.0009 L, which its rounding cannot bridge while L exceeds 1e-9 Rc; -1 (never) otherwise.
     */
    private final double clearlyInsideSquaredM2;
    private final double[] breaks = new double[7];
    /** sin and cos of breaks[0..n-1] and (at n) of breaks[0] + 2 pi, each evaluated at most once per circle. */
    private final double[] sinBreak = new double[7];
    private final double[] cosBreak = new double[7];
    private int trigKnown;
    /** The fractions being summed (then slot {@code next} of the cache). */
    private final double[] cached = new double[4];
    /** The cache: two shifts and their fractions (Q1..Q4 of slot k at 4k). */
    private final double[] slotSx = {Double.NaN, Double.NaN};
    private final double[] slotSy = {Double.NaN, Double.NaN};
    private final double[] slotFractions = new double[8];
    /** The slot the next new shift replaces (the one not used last). */
    private int next;
    /** The shortcuts taken (all but for {@code SplitCollectorTest}'s references). */
    private final Path path;
    /** For each break, the quadrant of the arc that starts there, when the image lies around the origin. */
    private final int[] startQuadrant = new int[7];
    /** The arcs being added take their quadrants from {@link #startQuadrant}. */
    private boolean aroundOrigin;

    /** How much of the shortcuts for an image well inside the collector is taken. */
    enum Path {
        /** Every shortcut: known trigonometry, quadrants from the arcs' starts around the origin. */
        FAST,
        /** Known trigonometry, every quadrant from the midpoint formed from the arc's ends. */
        MIDPOINTS,
        /** The general way: every sine and cosine evaluated, every midpoint from its angle. */
        TRIGONOMETRY
    }

    /**
     * A collector of radius {@code collectorRadiusM} under an aperture image of radius {@code imageRadiusM}.
     *
     * @param imageRadiusM     aperture image radius (the aperture radius), metres
     * @param collectorRadiusM collector radius, metres
     */
    public SplitCollector(double imageRadiusM, double collectorRadiusM) {
        this(imageRadiusM, collectorRadiusM, Path.FAST);
    }

    /** As {@link #SplitCollector(double, double)}, taking the shortcuts of {@code path} only. */
    SplitCollector(double imageRadiusM, double collectorRadiusM, Path path) {
        this.path = path;
        if (!(imageRadiusM > 0) || !(collectorRadiusM > 0)) {
            throw new IllegalArgumentException("radii must be positive");
        }
        this.imageRadiusM = imageRadiusM;
        this.collectorRadiusM = collectorRadiusM;
        this.imageAreaM2 = Math.PI * imageRadiusM * imageRadiusM;
        double insideLimit = collectorRadiusM * (1 - WELL_INSIDE) - imageRadiusM;
        this.clearlyInsideSquaredM2 = insideLimit > 1e-9 * collectorRadiusM
                ? CLEARLY_INSIDE_SQUARED * insideLimit * insideLimit : -1;
    }

    /** A split collector for the aperture and collector of {@code geometry}. */
    public static SplitCollector of(CupGeometry geometry) {
        return new SplitCollector(geometry.apertureRadiusM(), geometry.collectorRadiusM());
    }

    /**
     * Fractions of the image area that fall on each quadrant within the collector disc; their sum is
     * {@link #acceptance(double, double)}.
     *
     * @param sxM   image shift x, metres (d tan theta_x)
     * @param syM   image shift y, metres (d tan theta_y)
     * @param out4  receives Q1..Q4
     */
    public void fractions(double sxM, double syM, double[] out4) {
        for (int k = 0; k < 2; k++) {
            if (sxM == slotSx[k] && syM == slotSy[k]) {
                System.arraycopy(slotFractions, 4 * k, out4, 0, 4);
                next = 1 - k;
                return;
            }
        }
        cached[0] = 0;
        cached[1] = 0;
        cached[2] = 0;
        cached[3] = 0;
        // an image well inside the collector: every arc of the image lies inside the collector disc and
        // none of the collector's inside the image, which the inside tests would find arc by arc; the
        // centres' distance (hypot ignores the signs) is needed only when it is not
        boolean imageInside;
        double centres = Double.NaN;
        if (clearlyInside(sxM, syM)) {
            imageInside = true;
        } else {
            centres = Math.hypot(sxM, syM);
            imageInside = wellInside(centres);
        }
        addArcs(sxM, syM, imageRadiusM, 0, 0, collectorRadiusM, centres, true, imageInside);
        if (!imageInside) {
            addArcs(0, 0, collectorRadiusM, sxM, syM, imageRadiusM, centres, false, false);
        }
        for (int q = 0; q < 4; q++) {
            cached[q] = Math.max(0, cached[q] / imageAreaM2);
        }
        System.arraycopy(cached, 0, slotFractions, 4 * next, 4);
        slotSx[next] = sxM;
        slotSy[next] = syM;
        next = 1 - next;
        System.arraycopy(cached, 0, out4, 0, 4);
    }

    /** The image well inside the collector, its centre {@code centres} from the collector's (the definition). */
    boolean wellInside(double centres) {
        return centres + imageRadiusM < collectorRadiusM * (1 - WELL_INSIDE);
    }

    /** The shift below {@link #clearlyInsideSquaredM2}: {@link #wellInside} without evaluating hypot. */
    boolean clearlyInside(double sxM, double syM) {
        return sxM * sxM + syM * syM < clearlyInsideSquaredM2;
    }

    /**
     * Fraction of the image on the collector: overlap area of the two discs over the image area
     * (closed form). With the collector at least as large as the image this is the transmission
     * ratio A(theta)/A(0) of physics.md.
     */
    public double acceptance(double sxM, double syM) {
        return circleOverlapAreaM2(imageRadiusM, collectorRadiusM, Math.hypot(sxM, syM)) / imageAreaM2;
    }

    /** Area common to two discs of radii r1, r2 whose centres lie {@code distance} apart (closed form), square metres. */
    public static double circleOverlapAreaM2(double r1, double r2, double distance) {
        if (distance >= r1 + r2) {
            return 0;
        }
        if (distance <= Math.abs(r1 - r2)) {
            double r = Math.min(r1, r2);
            return Math.PI * r * r;
        }
        double d2 = distance * distance;
        double a1 = Math.acos(clamp((d2 + r1 * r1 - r2 * r2) / (2 * distance * r1)));
        double a2 = Math.acos(clamp((d2 + r2 * r2 - r1 * r1) / (2 * distance * r2)));
        double kite = Math.sqrt(Math.max(0, (-distance + r1 + r2) * (distance + r1 - r2) * (distance - r1 + r2)
                * (distance + r1 + r2)));
        return r1 * r1 * a1 + r2 * r2 * a2 - 0.5 * kite;
    }

    /**
     * Two-half difference ratio of an image shifted by u = s/R across a straight split, the whole
     * image on the collector: D = 1 - (2/pi)[acos u - u sqrt(1 - u^2)], odd in u, +-1 beyond |u| = 1
     * (physics.md "Oblique flow and a split collector").
     */
    public static double differenceRatio(double u) {
        double a = Math.min(1, Math.abs(u));
        double d = 1 - (2 / Math.PI) * (Math.acos(a) - a * Math.sqrt(1 - a * a));
        return Math.copySign(d, u);
    }

    /**
     * Flow angle along one axis from its difference ratio: inverts {@link #differenceRatio(double)}
     * for u and returns atan(u R / d), radians. |D| of 1 or more gives the angle of u = 1.
     *
     * @param d         difference ratio, e.g. D_x = [(Q1+Q4)-(Q2+Q3)]/sum
     * @param radiusM   aperture radius R, metres
     * @param distanceM aperture-to-collector distance d, metres
     */
    public static double angleFromDifferenceRatio(double d, double radiusM, double distanceM) {
        double target = Math.min(1, Math.abs(d));
        double lo = 0;
        double hi = 1;
        double u = Math.min(1, Math.PI * target / 4);
        // safeguarded Newton: D'(u) = (4/pi) sqrt(1-u^2) vanishes at u = 1, so bisect when a step leaves the bracket
        for (int i = 0; i < 100; i++) {
            double f = differenceRatio(u) - target;
            if (f == 0) {
                break;
            }
            if (f > 0) {
                hi = u;
            } else {
                lo = u;
            }
            double slope = (4 / Math.PI) * Math.sqrt(1 - u * u);
            double next = slope > 0 ? u - f / slope : Double.NaN;
            if (!(next > lo && next < hi)) {
                next = 0.5 * (lo + hi);
            }
            if (Math.abs(next - u) <= 1e-16) {
                u = next;
                break;
            }
            u = next;
        }
        return Math.copySign(Math.atan(u * radiusM / distanceM), d);
    }

    /**
     * Adds the contributions of the arcs of circle (cx, cy, r) that lie inside the other disc
     * (ox, oy, ro) to their quadrants; {@code dist} is the distance of the two centres (not read when
     * {@code allInside}: every arc is known to lie inside, so the circles do not cross).
     */
    private void addArcs(double cx, double cy, double r, double ox, double oy, double ro, double dist,
                         boolean inclusive, boolean allInside) {
        // every arc inside: no crossing with the other circle, so the axis crossings' sines and cosines are known
        boolean known = allInside && path != Path.TRIGONOMETRY;
        // shifted by less than r / 2 (then |cx|, |cy| < r: four axis crossings, one per half-axis)
        aroundOrigin = known && path == Path.FAST && cx * cx + cy * cy < 0.25 * r * r;
        int n = 0;
        if (Math.abs(cx) < r) {
            double cos = -cx / r;
            double phi = InverseTrigonometry.acos(cos);
            if (known) {
                double sin = Math.sqrt((1 - cos) * (1 + cos));
                setTrig(n, sin, cos);
                setTrig(n + 1, -sin, cos);
            }
            // the crossings on +y and -y: the arcs from there lie in Q2 and Q4 when around the origin
            startQuadrant[n] = 1;
            breaks[n++] = phi;
            startQuadrant[n] = 3;
            breaks[n++] = TWO_PI - phi;
        }
        if (Math.abs(cy) < r) {
            double sin = -cy / r;
            double phi = InverseTrigonometry.asin(sin);
            if (known) {
                double cos = Math.sqrt((1 - sin) * (1 + sin));
                setTrig(n, sin, cos);
                setTrig(n + 1, sin, -cos);
            }
            // the crossings on +x and -x: Q1 and Q3
            startQuadrant[n] = 0;
            breaks[n++] = normalise(phi);
            startQuadrant[n] = 2;
            breaks[n++] = Math.PI - phi;
        }
        double dx = ox - cx;
        double dy = oy - cy;
        // well inside, dist + r < ro (1 - WELL_INSIDE) gives dist < |r - ro|: no crossing to look for
        if (!allInside && dist > Math.abs(r - ro) && dist < r + ro) {
            double alpha = Math.atan2(dy, dx);
            double beta = InverseTrigonometry.acos(clamp((dist * dist + r * r - ro * ro) / (2 * dist * r)));
            breaks[n++] = normalise(alpha + beta);
            breaks[n++] = normalise(alpha - beta);
        }
        sort(n);
        trigKnown = 0;
        if (n == 0) {
            breaks[0] = 0;
            if (known) {
                setTrig(0, 0, 1);
                setTrig(1, 0, 1);
                trigKnown = 0b11;
            }
            addArc(cx, cy, r, 0, 1, TWO_PI, ox, oy, ro, inclusive, allInside);
            return;
        }
        breaks[n] = breaks[0] + TWO_PI;
        if (known) {
            setTrig(n, sinBreak[0], cosBreak[0]);
            trigKnown = (1 << (n + 1)) - 1;
        }
        for (int i = 0; i < n; i++) {
            if (breaks[i + 1] > breaks[i]) {
                addArc(cx, cy, r, i, i + 1, breaks[i + 1], ox, oy, ro, inclusive, allInside);
            }
        }
    }

    /**
     * The arc of circle (cx, cy, r) from angle breaks[ia] to {@code b} (breaks[ib], or 2 pi for the whole
     * circle), when its midpoint lies inside the other disc.
     */
    private void addArc(double cx, double cy, double r, int ia, int ib, double b,
                        double ox, double oy, double ro, boolean inclusive, boolean allInside) {
        double a = breaks[ia];
        if (aroundOrigin) {
            cached[startQuadrant[ia]] += arcArea(cx, cy, r, ia, ib, a, b);
            return;
        }
        if (allInside && path != Path.TRIGONOMETRY) {
            cached[quadrantOfMidpoint(cx, cy, r, ia, ib, a, b)] += arcArea(cx, cy, r, ia, ib, a, b);
            return;
        }
        double mid = 0.5 * (a + b);
        double mx = cx + r * Math.cos(mid);
        double my = cy + r * Math.sin(mid);
        if (!allInside
                && !inside(mx - ox, my - oy, inclusive ? ro * (1 + INSIDE_SLACK) : ro * (1 - INSIDE_SLACK), inclusive)) {
            return;
        }
        cached[quadrant(mx, my)] += arcArea(cx, cy, r, ia, ib, a, b);
    }

    /** The arc's term of Green's integral (see the class comment), square metres. */
    private double arcArea(double cx, double cy, double r, int ia, int ib, double a, double b) {
        return 0.5 * r * (cx * (sinAt(ib, b) - sinAt(ia, a)) - cy * (cosAt(ib, b) - cosAt(ia, a)) + r * (b - a));
    }

    /**
     * {@link #quadrant(double, double)} of the arc's midpoint, angle m = (a + b)/2, formed from the ends'
     * sines and cosines: cos m = (cos a + cos b) / (2 cos h) and sin m = (sin a + sin b) / (2 cos h), h = (b - a)/2;
     * within {@link #MIDPOINT_MARGIN} r of a split line, or for an arc of nearly half a turn, from m itself.
     */
    private int quadrantOfMidpoint(double cx, double cy, double r, int ia, int ib, double a, double b) {
        double sa = sinAt(ia, a);
        double ca = cosAt(ia, a);
        double sb = sinAt(ib, b);
        double cb = cosAt(ib, b);
        // cos h = ±sqrt((1 + cos(b - a)) / 2), negative for an arc longer than half a turn
        double cosH = Math.sqrt(Math.max(0, 0.5 * (1 + ca * cb + sa * sb)));
        if (b - a > Math.PI) {
            cosH = -cosH;
        }
        if (Math.abs(cosH) > MIN_HALF_ANGLE_COSINE) {
            double scale = r / (2 * cosH);
            double mx = cx + scale * (ca + cb);
            double my = cy + scale * (sa + sb);
            double margin = MIDPOINT_MARGIN * r;
            if (Math.abs(mx) > margin && Math.abs(my) > margin) {
                return quadrant(mx, my);
            }
        }
        double mid = 0.5 * (a + b);
        return quadrant(cx + r * Math.cos(mid), cy + r * Math.sin(mid));
    }

    private void setTrig(int index, double sin, double cos) {
        sinBreak[index] = sin;
        cosBreak[index] = cos;
    }

    /** sin(angle), angle being break {@code index}: evaluated once per circle. */
    private double sinAt(int index, double angle) {
        trig(index, angle);
        return sinBreak[index];
    }

    /** cos(angle), angle being break {@code index}. */
    private double cosAt(int index, double angle) {
        trig(index, angle);
        return cosBreak[index];
    }

    private void trig(int index, double angle) {
        if ((trigKnown & (1 << index)) == 0) {
            sinBreak[index] = Math.sin(angle);
            cosBreak[index] = Math.cos(angle);
            trigKnown |= 1 << index;
        }
    }

    /**
     * hypot(ex, ey) &lt;= limit (inclusive) or &lt; limit, decided on squared distances away from the limit and
     * by hypot itself within {@link #SQUARED_GUARD} of it, so the answer is always hypot's.
     */
    private static boolean inside(double ex, double ey, double limit, boolean inclusive) {
        double d2 = ex * ex + ey * ey;
        double l2 = limit * limit;
        if (d2 < l2 * (1 - SQUARED_GUARD)) {
            return true;
        }
        if (d2 > l2 * (1 + SQUARED_GUARD)) {
            return false;
        }
        double dist = Math.hypot(ex, ey);
        return inclusive ? dist <= limit : dist < limit;
    }

    /** Quadrant index 0..3 (Q1..Q4) of a point; points on a split line go to the side of +x / +y. */
    private static int quadrant(double x, double y) {
        if (x >= 0) {
            return y >= 0 ? 0 : 3;
        }
        return y >= 0 ? 1 : 2;
    }

    /** Sorts breaks[0..n-1] ascending, carrying their sines and cosines (where known) and start quadrants along. */
    private void sort(int n) {
        for (int i = 1; i < n; i++) {
            double v = breaks[i];
            double sin = sinBreak[i];
            double cos = cosBreak[i];
            int quadrant = startQuadrant[i];
            int j = i - 1;
            while (j >= 0 && breaks[j] > v) {
                breaks[j + 1] = breaks[j];
                sinBreak[j + 1] = sinBreak[j];
                cosBreak[j + 1] = cosBreak[j];
                startQuadrant[j + 1] = startQuadrant[j];
                j--;
            }
            breaks[j + 1] = v;
            sinBreak[j + 1] = sin;
            cosBreak[j + 1] = cos;
            startQuadrant[j + 1] = quadrant;
        }
    }

    private static double normalise(double phi) {
        // within one turn of [0, 2 pi) the remainder is phi itself, exactly (no call of fmod)
        if (phi >= 0 && phi < TWO_PI) {
            return phi;
        }
        if (phi < 0 && phi > -TWO_PI) {
            return phi + TWO_PI;
        }
        double p = phi % TWO_PI;
        return p < 0 ? p + TWO_PI : p;
    }

    private static double clamp(double c) {
        return Math.max(-1, Math.min(1, c));
    }
}
