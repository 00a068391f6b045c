package dev.sweepline.ground.bound;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.ground.fit.FlowAngles;
import org.junit.jupiter.api.Test;

class BulkSpeedBoundTest {
    /** U(U_n, θx, θy) = U_n √(1 + tan²θx + tan²θy): the bulk speed from the normal speed (ICD §8 angles). */
    static double bulk(double un, double tx, double ty) {
        return un * Math.sqrt(1 + Math.tan(tx) * Math.tan(tx) + Math.tan(ty) * Math.tan(ty));
    }

    /** The bound propagated with central differences of {@link #bulk}: independent of the closed form. */
    static double numeric(double un, double sun, double tx, double ty, double stx, double sty) {
        double h = 1e-6;
        double du = (bulk(un * (1 + h), tx, ty) - bulk(un * (1 - h), tx, ty)) / (2 * h * un);
        double dx = (bulk(un, tx + h, ty) - bulk(un, tx - h, ty)) / (2 * h);
        double dy = (bulk(un, tx, ty + h) - bulk(un, tx, ty - h)) / (2 * h);
        return Math.sqrt(du * du * sun * sun + dx * dx * stx * stx + dy * dy * sty * sty);
    }

    @Test
    void shouldIncludeTheAnglesUncertaintyInTheBulkSpeedBound() {
        // calm perihelion (hw-sim calm-perihelion.yaml): U_n = 300 km/s · cos 3°; σ_Un 6 m/s; σθ 1e-3 rad is
        // far above the fit's (2e-5 rad) so that the angle term shows; and a 25°, −10° flow
        double[][] cases = {{299.589e3, 6, Math.toRadians(3), 0, 1e-3, 1e-3}, {270e3, 40, Math.toRadians(25),
            Math.toRadians(-10), 0.02, 0.01}, {400e3, 29, 0, 0, 1e-3, 1e-3}};
        for (double[] c : cases) {
            FlowAngles a = new FlowAngles(c[2], c[3], c[4], c[5], Double.NaN, Double.NaN);
            CramerRaoBound b = new CramerRaoBound(new double[] {1, c[1], 1}, false, 1);
            // closed form (FlowAngles.sigmaBulkSpeed, physics.md) against central differences: 1e-6 relative
            // for the step's truncation error
            double expected = numeric(c[0], c[1], c[2], c[3], c[4], c[5]);
            assertEquals(expected, b.sigmaBulkSpeed(a, c[0]), 1e-6 * expected);
        }
        // the angle term is what the old bound (σ_Un / cos θ) missed: at 3° with σθ 1e-3 rad it is
        // U_n tan θ sec θ σθ ≈ 15.7 m/s beside 6 m/s (closed form above)
        FlowAngles a = new FlowAngles(Math.toRadians(3), 0, 1e-3, 1e-3, Double.NaN, Double.NaN);
        CramerRaoBound b = new CramerRaoBound(new double[] {1, 6, 1}, false, 1);
        double withoutAngles = 6 / Math.cos(Math.toRadians(3));
        double angleTerm = 299.589e3 * Math.tan(Math.toRadians(3)) / Math.cos(Math.toRadians(3)) * 1e-3;
        assertEquals(Math.hypot(withoutAngles, angleTerm), b.sigmaBulkSpeed(a, 299.589e3), 1e-9 * angleTerm);
        assertTrue(b.sigmaBulkSpeed(a, 299.589e3) > 2.5 * withoutAngles);
    }

    @Test
    void shouldFallBackToTheNormalSpeedBoundWithoutMeasuredAngles() {
        // angles not measured: θ taken as 0, so σ_U = σ_Un (FlowAngles.NONE)
        CramerRaoBound b = new CramerRaoBound(new double[] {1, 7.5, 1}, false, 1);
        assertEquals(7.5, b.sigmaBulkSpeed(FlowAngles.NONE, 400e3), 1e-12);
    }
}
