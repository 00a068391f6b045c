package dev.sweepline.sim.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * Events change the plasma as FORMAT.md "events" says: linearly from the value at the start of the
 * ramp to the target, reached at atS + rampS; a ramp of 0 is a step that holds from atS on; a factor
 * multiplies the value the parameter has when its event starts, so factors compose with the base and
 * with earlier events. Expected values are worked out by hand from the test file below. Tolerance
 * 1e-9 relative: a few double roundings of values near 1e3.
 */
class EventRampTest {
    private static final double TOL = 1e-9;
    private static final Scenario S = TestScenarios.scenario(100, """
            events:
              - label: density ramp
                atS: 10
                rampS: 4
                set:
                  protonDensity: 2000
                scale:
                  protonSpeed: 1.5
                  protonTemperature: 2
              - label: step down
                atS: 20
                jump: true
                scale:
                  protonDensity: 0.5
                  protonTemperature: 1.5
              - label: slow rise
                atS: 30
                rampS: 10
                scale:
                  protonDensity: 3
                set:
                  flowThetaX: -20
            """);
    private static final ScenarioTimeline T = S.timeline(1);

    @Test
    void shouldHoldTheBaseBeforeAndReachTheTargetAtTheEndOfTheRamp() {
        assertEquals(1000, density(0), TOL * 1000);
        assertEquals(1000, density(10), TOL * 1000); // the ramp starts from the current value
        assertEquals(2000, density(14), TOL * 2000); // set: 2000 at atS + rampS = 14 s
        assertEquals(2000, density(19.999), TOL * 2000);
        assertEquals(400 * 1.5, T.at(14).protonSpeedKmPerS(), TOL * 600);
    }

    @Test
    void shouldBeLinearInsideTheRamp() {
        for (int i = 0; i <= 100; i++) {
            double t = 10 + 4 * i / 100.0;
            double expected = 1000 + (2000 - 1000) * (t - 10) / 4;
            assertEquals(expected, density(t), TOL * expected, "t = " + t);
            double expectedSpeed = 400 + (600 - 400) * (t - 10) / 4;
            assertEquals(expectedSpeed, T.at(t).protonSpeedKmPerS(), TOL * expectedSpeed, "t = " + t);
        }
    }

    @Test
    void shouldStepAtAZeroRamp() {
        assertEquals(2000, density(Math.nextDown(20.0)), TOL * 2000);
        assertEquals(1000, density(20), TOL * 1000); // x0.5 holds from atS itself
    }

    @Test
    void shouldComposeFactorsWithTheBaseAndEarlierEvents() {
        // Temperature: base 1e5, x2 (events[0]) then x1.5 (events[1]) = 3e5.
        assertEquals(3e5, T.at(50).protonTemperatureK(), TOL * 3e5);
        // Density: set 2000, x0.5 = 1000, then x3 over 30..40 s = 3000; halfway 2000.
        assertEquals(2000, density(35), TOL * 2000);
        assertEquals(3000, density(40), TOL * 3000);
        assertEquals(3000, density(1e4), TOL * 3000); // after the duration the plasma stays as it ends
        // An angle set absolutely: 2 -> -20 deg over 30..40 s.
        assertEquals(-9, T.at(35).flowThetaXDeg(), TOL * 20);
    }

    @Test
    void shouldLeaveUntouchedParametersAlone() {
        PlasmaConditions start = S.start();
        PlasmaConditions end = T.at(100);
        assertEquals(start.alphaAbundance(), end.alphaAbundance(), 0.0);
        assertEquals(start.flowThetaYDeg(), end.flowThetaYDeg(), 0.0);
        assertEquals(start.fieldThetaXDeg(), end.fieldThetaXDeg(), 0.0);
    }

    @Test
    void shouldListOnlyTheMarkedEventAsAJump() {
        assertEquals(java.util.List.of(new Scenario.Jump(20, 0, "step down")), S.jumps());
    }

    private static double density(double t) {
        return T.at(t).protonDensityPerCc();
    }
}
