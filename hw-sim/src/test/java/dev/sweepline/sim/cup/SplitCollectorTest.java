package dev.sweepline.sim.cup;

import dev.sweepline.sim.instrument.TestInstruments;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.SplittableRandom;
import org.hipparchus.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;

class SplitCollectorTest {
    private static final CupGeometry DEMO = TestInstruments.DEMO_CUP.cup();
    private static final double R = DEMO.apertureRadiusM();
    private static final double RC = DEMO.collectorRadiusM();
    private static final double D = DEMO.apertureToCollectorM();
    /** Recorded seed of the random shifts. */
    private static final long SEED = 0x5EEDC0FFEEL;

    /**
     * Independent reference: area of image ∩ collector ∩ {x>0, y>0} as the integral of vertical chord
     * lengths, split at every kink and with x = mid + half sin t so that the sqrt edges become smooth,
     * by Hipparchus Gauss-Legendre.
     */
    private static double referenceQ1Area(double a, double b, double r1, double r2) {
        double xlo = Math.max(0, Math.max(a - r1, -r2));
        double xhi = Math.min(a + r1, r2);
        if (!(xhi > xlo)) {
            return 0;
        }
        double[] kinks = new double[12];
        int n = 0;
        kinks[n++] = xlo;
        kinks[n++] = xhi;
        kinks[n++] = 0;
        kinks[n++] = a - r1;
        kinks[n++] = a + r1;
        if (Math.abs(b) < r1) {
            kinks[n++] = a - Math.sqrt(r1 * r1 - b * b);
            kinks[n++] = a + Math.sqrt(r1 * r1 - b * b);
        }
        double dd = Math.hypot(a, b);
        if (dd > Math.abs(r1 - r2) && dd < r1 + r2) {
            double l = (dd * dd + r2 * r2 - r1 * r1) / (2 * dd);
            double h = Math.sqrt(r2 * r2 - l * l);
            kinks[n++] = (l * a - h * b) / dd;
            kinks[n++] = (l * a + h * b) / dd;
        }
        double[] sorted = Arrays.copyOf(kinks, n);
        Arrays.sort(sorted);
        IterativeLegendreGaussIntegrator integrator = new IterativeLegendreGaussIntegrator(8, 1e-13, 1e-30, 2, 64);
        double area = 0;
        for (int i = 0; i + 1 < n; i++) {
            double lo = Math.max(xlo, sorted[i]);
            double hi = Math.min(xhi, sorted[i + 1]);
            if (hi - lo <= 1e-15 * r2) {
                continue;
            }
            double mid = 0.5 * (lo + hi);
            double half = 0.5 * (hi - lo);
            area += integrator.integrate(1_000_000, t -> {
                double x = mid + half * Math.sin(t);
                double h1 = Math.sqrt(Math.max(0, r1 * r1 - (x - a) * (x - a)));
                double h2 = Math.sqrt(Math.max(0, r2 * r2 - x * x));
                double top = Math.min(b + h1, h2);
                double bottom = Math.max(Math.max(b - h1, -h2), 0);
                return Math.max(0, top - bottom) * half * Math.cos(t);
            }, -Math.PI / 2, Math.PI / 2);
        }
        return area;
    }

    private static double[] reference(double sx, double sy, double r1, double r2) {
        double image = Math.PI * r1 * r1;
        return new double[] {referenceQ1Area(sx, sy, r1, r2) / image, referenceQ1Area(-sx, sy, r1, r2) / image,
            referenceQ1Area(-sx, -sy, r1, r2) / image, referenceQ1Area(sx, -sy, r1, r2) / image};
    }

    @Test
    void shouldMatchAnIndependentQuadratureForAnyShift() {
        // cup design note CUP-1: exact to 1e-9 of the image area; the reference converges to 1e-13
        SplitCollector collector = SplitCollector.of(DEMO);
        double[] out = new double[4];
        double[][] fixed = {{0, 0}, {1e-3, 0}, {0, -2e-3}, {3e-3, 2e-3}, {-5e-3, 4e-3}, {7e-3, -1e-3},
            {R, R}, {RC, 0}, {-12e-3, -9e-3}, {18e-3, 2e-3}, {RC - R, 0}, {1e-9, -1e-9}};
        SplittableRandom rng = new SplittableRandom(SEED);
        double[][] shifts = Arrays.copyOf(fixed, fixed.length + 60);
        for (int i = fixed.length; i < shifts.length; i++) {
            shifts[i] = new double[] {rng.nextDouble(-1.6 * RC, 1.6 * RC), rng.nextDouble(-1.6 * RC, 1.6 * RC)};
        }
        for (double[] s : shifts) {
            collector.fractions(s[0], s[1], out);
            double[] expected = reference(s[0], s[1], R, RC);
            for (int q = 0; q < 4; q++) {
                assertEquals(expected[q], out[q], 1e-9, "Q" + (q + 1) + " at shift " + s[0] + ", " + s[1]);
            }
        }
    }

    @Test
    void shouldGiveTheSameFractionsFromItsCacheAsAFreshCollector() {
        // the two-shift cache must be invisible: interleaved shifts (two populations of one plasma, a
        // third evicting one of them, repeats) give bit for bit what a new collector computes
        SplitCollector cached = SplitCollector.of(DEMO);
        SplittableRandom random = new SplittableRandom(SEED);
        double[][] shifts = new double[3][];
        for (int k = 0; k < 3; k++) {
            shifts[k] = new double[] {random.nextDouble(-1, 1) * R, random.nextDouble(-1, 1) * R};
        }
        int[] order = {0, 1, 0, 1, 1, 2, 0, 2, 1, 1, 0, 0, 2};
        double[] got = new double[4];
        double[] fresh = new double[4];
        for (int i = 0; i < order.length; i++) {
            double[] s = shifts[order[i]];
            cached.fractions(s[0], s[1], got);
            SplitCollector.of(DEMO).fractions(s[0], s[1], fresh);
            assertTrue(Arrays.equals(fresh, got), "call " + i + ": " + Arrays.toString(got) + " vs " + Arrays.toString(fresh));
        }
    }

    @Test
    void shouldGiveTheGeneralPathsFractionsForAnImageWellInside() {
        // an image well inside the collector takes its breaks' sines and cosines from the axes' equations
        // and its arcs' quadrants from their ends: the same fractions as the general path (every sine,
        // cosine and midpoint evaluated; the collector's trigonometryOnly mode) up to rounding, 1e-14 of
        // the image area (a few ulps of each of up to five arc terms of order pi r^2). Random shifts well
        // inside, and shifts that put a split line within 1e-17..1e-3 of a tangent to the image (tiny arcs,
        // midpoints next to a line), for the demo cup and two other radius ratios
        double[][] radii = {{R, RC}, {1.0, 1.000002}, {1.0, 7.0}};
        SplittableRandom rng = new SplittableRandom(SEED + 2);
        double[] got = new double[4];
        double[] general = new double[4];
        for (double[] rr : radii) {
            SplitCollector fast = new SplitCollector(rr[0], rr[1]);
            SplitCollector reference = new SplitCollector(rr[0], rr[1], SplitCollector.Path.TRIGONOMETRY);
            double room = (rr[1] - rr[0]) * (1 - 1e-5);
            for (int i = 0; i < 30_000; i++) {
                double sx;
                double sy;
                if (i % 2 == 0) {
                    double radius = room * Math.sqrt(rng.nextDouble());
                    double angle = rng.nextDouble(2 * Math.PI);
                    sx = radius * Math.cos(angle);
                    sy = radius * Math.sin(angle);
                } else {
                    double near = rr[0] * (1 - Math.pow(10, -rng.nextDouble(3, 17)));
                    sx = Math.min(near, room) * (rng.nextBoolean() ? 1 : -1);
                    sy = rng.nextDouble(-1, 1) * Math.min(room, rr[0]) * 0.5;
                    if (rng.nextBoolean()) {
                        double t = sx;
                        sx = sy;
                        sy = t;
                    }
                }
                fast.fractions(sx, sy, got);
                reference.fractions(sx, sy, general);
                for (int q = 0; q < 4; q++) {
                    if (!(Math.abs(got[q] - general[q]) <= 1e-14)) {
                        assertEquals(general[q], got[q], 1e-14, "Q" + (q + 1) + " at shift " + sx + ", " + sy
                                + " (radii " + rr[0] + ", " + rr[1] + ")");
                    }
                }
            }
        }
    }

    @Test
    void shouldTakeTheQuadrantsOfTheArcsAroundTheOriginAsTheirMidpointsGiveThem() {
        // an image shifted by less than half its radius takes each arc's quadrant from the half-axis it
        // starts on: the same fractions, to the bit, as the midpoints formed from the arcs' ends (the
        // collector's MIDPOINTS path, itself checked against the general path above); shifts up to and
        // beyond R/2 (where the midpoints decide again) and near it, in every direction, for the demo cup
        // and two other radius ratios
        double[][] radii = {{R, RC}, {1.0, 1.000002}, {1.0, 7.0}};
        SplittableRandom rng = new SplittableRandom(SEED + 4);
        double[] got = new double[4];
        double[] reference = new double[4];
        for (double[] rr : radii) {
            SplitCollector fast = new SplitCollector(rr[0], rr[1]);
            SplitCollector midpoints = new SplitCollector(rr[0], rr[1], SplitCollector.Path.MIDPOINTS);
            double room = Math.min(rr[0], (rr[1] - rr[0]) * (1 - 1e-5));
            for (int i = 0; i < 50_000; i++) {
                double length = i % 2 == 0 ? room * Math.sqrt(rng.nextDouble()) : rr[0] * rng.nextDouble(0.499, 0.501);
                double angle = rng.nextDouble(2 * Math.PI);
                double sx = Math.min(length, room) * Math.cos(angle);
                double sy = Math.min(length, room) * Math.sin(angle);
                fast.fractions(sx, sy, got);
                midpoints.fractions(sx, sy, reference);
                for (int q = 0; q < 4; q++) {
                    assertEquals(Double.doubleToRawLongBits(reference[q]), Double.doubleToRawLongBits(got[q]),
                            "Q" + (q + 1) + " at shift " + sx + ", " + sy + " (radii " + rr[0] + ", " + rr[1] + ")");
                }
            }
        }
    }

    @Test
    void shouldFindAnImageWellInsideByItsSquaredShiftOnlyWhereHypotDoes() {
        // the squared-shift test skips hypot only where the definition (hypot + R < Rc (1 - 1e-6)) holds:
        // shifts whose length lies within 0.2 % of the test's limit, where rounding could matter most, and
        // the radius ratios of shouldGiveTheGeneralPathsFractionsForAnImageWellInside; and it takes the
        // usual image (a shift of half the room) without hypot, as the fast path of the closed loop needs
        double[][] radii = {{R, RC}, {1.0, 1.000002}, {1.0, 7.0}};
        SplittableRandom rng = new SplittableRandom(SEED + 3);
        int clearly = 0;
        for (double[] rr : radii) {
            SplitCollector collector = new SplitCollector(rr[0], rr[1]);
            double limit = rr[1] * (1 - 1e-6) - rr[0];
            assertTrue(collector.clearlyInside(0.5 * limit, 0), "half the room, radii " + rr[0] + ", " + rr[1]);
            for (int i = 0; i < 100_000; i++) {
                double length = limit * rng.nextDouble(0.998, 1.0);
                double angle = rng.nextDouble(2 * Math.PI);
                double sx = length * Math.cos(angle);
                double sy = length * Math.sin(angle);
                if (collector.clearlyInside(sx, sy)) {
                    clearly++;
                    assertTrue(collector.wellInside(Math.hypot(sx, sy)), "shift " + sx + ", " + sy);
                }
            }
        }
        assertTrue(clearly > 10_000, "shifts tested below the squared limit: " + clearly);
    }

    @Test
    void shouldSumTheQuadrantsToTheClosedFormAcceptance() {
        // disc-overlap closed form vs the quadrant arcs: two exact methods, rounding only (1e-12)
        SplitCollector collector = SplitCollector.of(DEMO);
        double[] out = new double[4];
        SplittableRandom rng = new SplittableRandom(SEED + 1);
        for (int i = 0; i < 200; i++) {
            double sx = rng.nextDouble(-1.5 * RC, 1.5 * RC);
            double sy = rng.nextDouble(-1.5 * RC, 1.5 * RC);
            collector.fractions(sx, sy, out);
            assertEquals(collector.acceptance(sx, sy), out[0] + out[1] + out[2] + out[3], 1e-12);
        }
    }

    @Test
    void shouldGiveTheLensAreaOfTwoUnitCircles() {
        // textbook geometry: two unit discs one radius apart overlap in 2 pi/3 - sqrt(3)/2 [computed]; rounding only
        assertEquals(2 * Math.PI / 3 - Math.sqrt(3) / 2, SplitCollector.circleOverlapAreaM2(1, 1, 1), 1e-14);
        assertEquals(Math.PI, SplitCollector.circleOverlapAreaM2(1, 3, 1.5), 1e-14); // contained: smaller disc
        assertEquals(0, SplitCollector.circleOverlapAreaM2(1, 1, 2.0), 0.0); // tangent from outside
    }

    @Test
    void shouldGiveTheHalfSplitDifferenceRatioOfPhysicsMd() {
        // physics.md "split collector": D = 1 - (2/pi)[acos u - u sqrt(1-u^2)] with the image wholly on a large
        // collector; D_x must not depend on the y shift; both sides exact, so rounding only (1e-12)
        SplitCollector collector = new SplitCollector(R, 10 * R);
        double[] q = new double[4];
        for (double u : new double[] {0.001, 0.05, 0.2, 0.5, 0.8, 0.99, -0.3}) {
            for (double sy : new double[] {0, 0.4 * R, -1.1 * R}) {
                collector.fractions(u * R, sy, q);
                double sum = q[0] + q[1] + q[2] + q[3];
                double dx = ((q[0] + q[3]) - (q[1] + q[2])) / sum;
                double formula = 1 - (2 / Math.PI) * (Math.acos(Math.abs(u)) - Math.abs(u) * Math.sqrt(1 - u * u));
                assertEquals(Math.copySign(formula, u), dx, 1e-12, "u " + u + " sy " + sy);
                assertEquals(Math.copySign(formula, u), SplitCollector.differenceRatio(u), 1e-15);
            }
        }
    }

    @Test
    void shouldApproachFourUOverPiForSmallShifts() {
        // physics.md: D ~ 4u/pi; the next term of the series of (4/pi) integral_0^u sqrt(1-t^2) dt is
        // -(4/pi) u^3/6, so the difference must lie within that (10 % slack for rounding)
        for (double u : new double[] {1e-4, 1e-3, 1e-2}) {
            double dRatio = SplitCollector.differenceRatio(u);
            assertEquals(4 * u / Math.PI, dRatio, 1.1 * (4 / Math.PI) * u * u * u / 6 + 1e-16);
        }
    }

    @Test
    void shouldRecoverTheFlowAngleUpToTwentyDegrees() {
        // physics.md: tan theta_x = (R/d) D^-1(D_x); the demo image stays on the collector to 20.25 deg, so the
        // recovered angle is exact up to the Newton tolerance and rounding (1e-9 rad)
        SplitCollector collector = SplitCollector.of(DEMO);
        double[] q = new double[4];
        double sy = D * Math.tan(Math.toRadians(-2));
        for (int deg = -20; deg <= 20; deg++) {
            double theta = Math.toRadians(deg);
            collector.fractions(D * Math.tan(theta), sy, q);
            double sum = q[0] + q[1] + q[2] + q[3];
            assertEquals(1.0, sum, 1e-12, "whole image on the collector at " + deg + " deg");
            double dx = ((q[0] + q[3]) - (q[1] + q[2])) / sum;
            double dy = ((q[0] + q[1]) - (q[2] + q[3])) / sum;
            assertEquals(theta, SplitCollector.angleFromDifferenceRatio(dx, R, D), 1e-9, deg + " deg");
            assertEquals(Math.toRadians(-2), SplitCollector.angleFromDifferenceRatio(dy, R, D), 1e-9);
        }
    }

    @Test
    void shouldSplitSymmetricCasesSymmetrically() {
        // symmetry of the geometry (mirror in the split lines, reflection in x = y); rounding only
        SplitCollector collector = SplitCollector.of(DEMO);
        double[] q = new double[4];
        collector.fractions(0, 0, q);
        for (int i = 0; i < 4; i++) {
            assertEquals(0.25, q[i], 1e-15);
        }
        collector.fractions(3e-3, 0, q);
        assertEquals(q[0], q[3], 1e-15);
        assertEquals(q[1], q[2], 1e-15);
        assertTrue(q[0] > q[1]);
        collector.fractions(2e-3, 2e-3, q);
        assertEquals(q[1], q[3], 1e-15);
        double[] swapped = new double[4];
        collector.fractions(1e-3, 4e-3, q);
        collector.fractions(4e-3, 1e-3, swapped);
        assertEquals(q[0], swapped[0], 1e-15);
        assertEquals(q[1], swapped[3], 1e-15);
        assertEquals(q[2], swapped[2], 1e-15);
    }

    @Test
    void shouldAcceptFullyThenFallToZero() {
        // geometry of the demo cup: whole image on the collector to atan((Rc - R)/d), nothing beyond
        // atan((Rc + R)/d); the fall in between is monotonic
        SplitCollector collector = SplitCollector.of(DEMO);
        double full = DEMO.fullAcceptanceAngleRad();
        double cutoff = DEMO.cutoffAngleRad();
        assertEquals(1.0, collector.acceptance(D * Math.tan(full * 0.999), 0), 1e-15);
        assertEquals(0.0, collector.acceptance(D * Math.tan(cutoff * 1.001), 0), 0.0);
        double last = 1;
        for (int i = 1; i < 50; i++) {
            double theta = full + (cutoff - full) * i / 50;
            double a = collector.acceptance(D * Math.tan(theta), 0);
            assertTrue(a < last && a > 0, "monotonic fall at " + Math.toDegrees(theta));
            last = a;
        }
    }
}
