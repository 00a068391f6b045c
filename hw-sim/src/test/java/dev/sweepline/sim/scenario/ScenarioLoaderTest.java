package dev.sweepline.sim.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** resolve() finds built-ins by name and files by path; unknown names list the built-ins (scenario note SC-6). */
class ScenarioLoaderTest {
    @Test
    void shouldResolveABuiltInByName() {
        assertEquals("shock-sheath", ScenarioLoader.resolve("shock-sheath").name());
        assertEquals(ScenarioLoader.defaultName(), ScenarioLoader.resolve(ScenarioLoader.defaultName()).name());
    }

    @Test
    void shouldResolveAFileByPath(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("my-case.yaml");
        Files.writeString(file, TestScenarios.text(300, ""));
        Scenario s = ScenarioLoader.resolve(file.toString());
        assertEquals("test-scenario", s.name()); // the name inside the file (TestScenarios)
        assertEquals(300, s.durationSeconds(), 0.0);
    }

    @Test
    void shouldReportAFileFoundByPathUnderItsPath(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("broken.yaml");
        Files.writeString(file, TestScenarios.text(300, "").replace("densityPerCc: 1000", "densityPerCc: -3"));
        ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioLoader.resolve(file.toString()));
        // TestScenarios.text: densityPerCc is on line 7.
        assertEquals(file + ":7: protons.densityPerCc: must be positive, got -3", e.getMessage());
    }

    @Test
    void shouldListTheBuiltInsForAnUnknownName() {
        ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioLoader.resolve("no-such-scenario"));
        for (String name : ScenarioLoader.builtInNames()) {
            assertTrue(e.getMessage().contains(name), () -> e.getMessage() + " lacks " + name);
        }
        ScenarioException e2 = assertThrows(ScenarioException.class, () -> ScenarioLoader.builtIn("shock"));
        assertTrue(e2.getMessage().contains("built-ins: quiet-perihelion, fast-wind"), e2.getMessage());
    }

    @Test
    void shouldSplitTheTemperatureIntoParallelAndPerpendicular() {
        // Scalar temperature T = (T_par + 2 T_perp) / 3 (trace of the tensor / 3, textbook).
        PlasmaConditions c = ScenarioLoader.builtIn("fast-wind").start();
        double tPar = c.protonParallelTemperatureK();
        double tPerp = c.protonPerpendicularTemperatureK();
        assertEquals(c.protonTemperatureK(), (tPar + 2 * tPerp) / 3, 1e-9 * c.protonTemperatureK());
        assertEquals(c.temperatureAnisotropy(), tPerp / tPar, 1e-12);
    }

    @Test
    void shouldPointTheFieldDriftAlongTheFieldAngles() {
        // Geometry of the angle convention (scenarios/FORMAT.md: tan thetaX = vx / vz): a unit vector whose
        // x/z and y/z ratios are the tangents of the field angles.
        PlasmaConditions c = ScenarioLoader.builtIn("helium-rich").start();
        double[] u = AlphaDriftDirection.FIELD.unitVector(c);
        assertEquals(1.0, Math.sqrt(u[0] * u[0] + u[1] * u[1] + u[2] * u[2]), 1e-12);
        assertEquals(Math.tan(Math.toRadians(c.fieldThetaXDeg())), u[0] / u[2], 1e-12);
        assertEquals(Math.tan(Math.toRadians(c.fieldThetaYDeg())), u[1] / u[2], 1e-12);
        assertEquals(AlphaDriftDirection.RADIAL, ScenarioLoader.builtIn("helium-rich").alphaDriftDirection());
    }
}
