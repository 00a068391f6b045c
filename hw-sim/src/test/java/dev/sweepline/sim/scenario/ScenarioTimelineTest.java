package dev.sweepline.sim.scenario;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * A timeline is a pure function of (scenario, seed, time): the same for a seed whatever order the times
 * come in, different between seeds. Source of the contract: the bench's use of the timeline (ScenarioTimeline.at
 * "deterministic for a seed", correct for any call order). Comparisons are exact: the values are
 * computed by the same arithmetic, so any difference is a bug, not rounding.
 */
class ScenarioTimelineTest {
    private static final String FLUCTUATING = """
            fluctuations:
              correlationS: 1.5
              densityRms: 0.05
              speedRms: 0.02
              temperatureRms: 0.05
              flowAngleRmsDeg: 0.5
            events:
              - atS: 100
                rampS: 1
                jump: true
                scale:
                  protonDensity: 2
            """;

    @Test
    void shouldGiveTheSameValuesForTheSameSeed() {
        Scenario s = TestScenarios.scenario(600, FLUCTUATING);
        assertArrayEquals(sample(s.timeline(42), 0.01, 60_000), sample(s.timeline(42), 0.01, 60_000));
    }

    @Test
    void shouldGiveDifferentValuesForDifferentSeeds() {
        Scenario s = TestScenarios.scenario(600, FLUCTUATING);
        double[] a = sample(s.timeline(42), 1.0, 600);
        double[] b = sample(s.timeline(43), 1.0, 600);
        int same = 0;
        for (int i = 0; i < a.length; i++) {
            if (a[i] == b[i]) {
                same++;
            }
        }
        // Independent continuous draws coincide with probability 0; allow none.
        assertEquals(0, same);
    }

    @Test
    void shouldGiveTheSameValuesWhateverTheOrderOfTheCalls() {
        Scenario s = TestScenarios.scenario(600, FLUCTUATING);
        List<Double> times = new ArrayList<>();
        for (int i = 0; i < 3000; i++) {
            times.add(i * 0.2); // crosses many blocks of the fluctuation grid (1024 points of 23 ms)
        }
        times.add(-5.0); // before the start: the starting plasma
        times.add(5000.0); // long after the duration
        double[] inOrder = new double[times.size()];
        ScenarioTimeline sequential = s.timeline(7);
        for (int i = 0; i < times.size(); i++) {
            inOrder[i] = sequential.at(times.get(i)).protonDensityPerCc();
        }
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < times.size(); i++) {
            order.add(i);
        }
        Collections.shuffle(order, new Random(20261201L)); // recorded seed
        ScenarioTimeline shuffled = s.timeline(7);
        double[] anyOrder = new double[times.size()];
        for (int i : order) {
            anyOrder[i] = shuffled.at(times.get(i)).protonDensityPerCc();
        }
        assertArrayEquals(inOrder, anyOrder);
    }

    @Test
    void shouldKeepEveryConditionPositiveAndAnglesNearTheirMean() {
        Scenario s = TestScenarios.scenario(600, FLUCTUATING);
        ScenarioTimeline t = s.timeline(3);
        for (int i = 0; i < 60_000; i++) {
            PlasmaConditions c = t.at(i * 0.01);
            assertTrue(c.protonDensityPerCc() > 0 && c.protonSpeedKmPerS() > 0 && c.protonTemperatureK() > 0);
            // 0.5 deg rms: 8 rms = 4 deg is never reached in 60 000 correlated samples (p < 1e-14 per sample).
            assertTrue(Math.abs(c.flowThetaXDeg() - 2) < 4 && Math.abs(c.flowThetaYDeg() + 1) < 4);
        }
    }

    @Test
    void shouldLeaveTheMeanUntouchedWhenThereAreNoFluctuations() {
        // FORMAT.md: without a fluctuations section the plasma is exactly the event-driven course.
        Scenario s = TestScenarios.scenario(600, "");
        PlasmaConditions c = s.timeline(99).at(123.4);
        assertEquals(s.start(), c);
    }

    private static double[] sample(ScenarioTimeline t, double stepS, int n) {
        double[] out = new double[n * 5];
        for (int i = 0; i < n; i++) {
            PlasmaConditions c = t.at(i * stepS);
            out[5 * i] = c.protonDensityPerCc();
            out[5 * i + 1] = c.protonSpeedKmPerS();
            out[5 * i + 2] = c.protonTemperatureK();
            out[5 * i + 3] = c.flowThetaXDeg();
            out[5 * i + 4] = c.flowThetaYDeg();
        }
        return out;
    }
}
