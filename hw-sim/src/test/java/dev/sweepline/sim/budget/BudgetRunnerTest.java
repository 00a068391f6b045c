package dev.sweepline.sim.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sweepline.sim.scenario.Scenario;
import dev.sweepline.sim.scenario.ScenarioLoader;
import dev.sweepline.fsw.host.yaml.FileFormatException;
import java.io.IOException;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class BudgetRunnerTest {
    private static final String PLAN = """
            format: sweepline-plan/1
            name: test-plan
            scenario: quiet-perihelion
            sampleMinutes: 0.25
            sampleEveryHours: 100
            phases:
              - name: cruise
                startHours: 0
                endHours: 10
                distanceAu: [0.3, 0.2]
                mode: survey
                allocationBitsPerS: %s
              - name: encounter
                startHours: 10
                endHours: 16
                distanceAu: 0.06
                mode: adaptive
                allocationBitsPerS: %s
            """;

    @TempDir
    Path dir;

    @Test
    void shouldShowAMarginPerPhaseForTheDemoPlan() throws IOException {
        BudgetResult r = BudgetRunner.run(PlanReader.load(Path.of("src/main/resources/plans/cinder-orbit.yaml")), 1, 2);
        assertTrue(r.fits(), String.join("\n", r.violations()));
        assertEquals(3, r.phases().size());
        for (BudgetResult.PhaseBudget p : r.phases()) {
            assertTrue(p.margin() > 0 && p.margin() < 1, p.name() + " margin " + p.margin());
        }
        BudgetOutput.write(dir, r);
        JsonNode json = new ObjectMapper().readTree(dir.resolve("budget.json").toFile());
        assertEquals("FITS", json.get("verdict").asText());
        assertEquals(3, json.get("phases").size());
    }

    @Test
    void shouldFlagTheFirstHourOverATooSmallAllocationWithItsPhase() {
        BudgetResult r = BudgetRunner.run(PlanReader.parse(PLAN.formatted(20000, 1000), "tight.yaml"), 1, 2);
        assertFalse(r.fits());
        assertEquals(1, r.violations().size(), String.join("\n", r.violations()));
        String v = r.violations().get(0);
        // the encounter starts at hour 10; a survey-free near-Sun sweep makes several kbit/s there
        assertTrue(v.startsWith("phase 'encounter', hour 10:"), v);
        assertTrue(r.phases().get(1).margin() < 0);
        assertTrue(r.phases().get(0).margin() > 0);
    }

    @Test
    void shouldScaleThePlasmaWithDistance() {
        Scenario base = ScenarioLoader.builtIn("quiet-perihelion");
        Scenario half = DistanceScaling.at(base, base.distanceAu() / 2, 10);
        // physics.md: n as r^-2 (x4 at half the distance), T as r^-0.92 (x 2^0.92 = 1.8921)
        assertEquals(4 * base.start().protonDensityPerCc(), half.start().protonDensityPerCc(), 1e-9 * 4 * 3600);
        assertEquals(Math.pow(2, 0.92), half.start().protonTemperatureK() / base.start().protonTemperatureK(), 1e-12);
        assertEquals(base.start().protonSpeedKmPerS(), half.start().protonSpeedKmPerS());
    }

    @Test
    void shouldNameLineAndFieldOfABrokenPlan() {
        String broken = PLAN.formatted(20000, 1000).replace("startHours: 10", "startHours: 11");
        FileFormatException e = assertThrows(FileFormatException.class, () -> PlanReader.parse(broken, "gap.yaml"));
        assertEquals("gap.yaml", e.file());
        assertEquals(14, e.line(), e.getMessage()); // the second phase's startHours line
        assertEquals("phases[1].startHours", e.field());
    }
}
