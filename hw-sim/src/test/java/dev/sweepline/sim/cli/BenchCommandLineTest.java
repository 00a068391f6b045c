package dev.sweepline.sim.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class BenchCommandLineTest {
    @TempDir
    Path dir;

    @Test
    void shouldRunTheDefaultScenarioAndWriteItsProducts() throws IOException {
        int status = BenchMain.commandLine().execute("run", "--minutes", "0.5", "--seed", "4", "--allocation", "9000",
                "--out", dir.toString());
        assertEquals(0, status);
        JsonNode summary = new ObjectMapper().readTree(dir.resolve("summary.json").toFile());
        assertEquals("quiet-perihelion", summary.get("scenario").asText());
        assertEquals(4, summary.get("seed").asLong());
        assertEquals(9000.0, summary.get("allocationBitsPerSecond").asDouble());
        // margin = (allocation - use) / allocation, as TelemetryFigures.margin defines it
        double use = summary.get("bitsPerSecond").get("total").asDouble();
        assertEquals((9000 - use) / 9000, summary.get("allocationMargin").asDouble(), 1e-3);
        // frames of the telemetry ICD: 4 ASM octets + 1024-octet frames
        long octets = Files.size(dir.resolve("telemetry.tm"));
        assertEquals(0, octets % 1028);
        assertEquals(summary.get("frames").asLong(), octets / 1028);
        assertTrue(Files.exists(dir.resolve("decisions.csv")));
    }

    @Test
    void shouldRefuseABadScenarioFileNamingFileLineAndField() throws IOException {
        Path bad = dir.resolve("bad.yaml");
        Files.writeString(bad, Files.readString(Path.of("src/test/resources/scenarios-bad/negative-density.yaml")));
        int status = BenchMain.commandLine().execute("run", "--scenario", bad.toString(), "--out", dir.toString());
        assertEquals(dev.sweepline.fsw.host.ExitStatus.INPUT, status); // an input error, not a crash
        assertTrue(Files.notExists(dir.resolve("summary.json")));
    }

    @Test
    void shouldRefuseFewerThanOneThreadForCampaignsAndBudgets() {
        // ExitStatus: 2 for a usage error; the run pool needs at least one thread
        Path plan = Path.of("src/main/resources/plans/cinder-orbit.yaml");
        assertEquals(2, BenchMain.commandLine().execute("budget", plan.toString(), "--threads", "0", "--out",
                dir.resolve("budget").toString()));
        assertTrue(Files.notExists(dir.resolve("budget")));
        Path campaign = Path.of("src/main/resources/campaigns/perihelion-tuning.yaml");
        assertEquals(2, BenchMain.commandLine().execute("tune", campaign.toString(), "--threads", "0", "--out",
                dir.resolve("tune").toString()));
        assertTrue(Files.notExists(dir.resolve("tune")));
    }
}
