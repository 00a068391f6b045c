package dev.sweepline.sim.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sweepline.fsw.host.script.GroundCommandCounter;
import dev.sweepline.fsw.host.script.ScriptException;
import dev.sweepline.fsw.host.script.UplinkLog;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Replay after a restart, end to end through {@code bench run} (commands.md §1.3, §7.2, §7.3): a run
 * writes its exact uplink to uplink.tc; a second run on the same NVM file that sends those octets again
 * gets every one refused as REPLAY; a third run with a fresh script, numbered by the ground counter
 * kept beside the NVM file, is accepted. The ground's summary.json shows the reasons.
 */
class UplinkReplayTest {
    @TempDir
    Path dir;

    private JsonNode reports(Path out) throws IOException {
        return new ObjectMapper().readTree(out.resolve("ground/summary.json").toFile()).get("commandReports");
    }

    private int run(String... args) {
        return BenchMain.commandLine().execute(args);
    }

    @Test
    void shouldRefuseARecordedUplinkAfterARestartAndAcceptAFreshlyCountedOne() throws IOException, ScriptException {
        Path script = dir.resolve("safe.txt");
        Files.writeString(script, "1.0 NO_OP\n2.0 TABLE_LOGSPACED 64 100 3000 4\n");
        Path nvm = dir.resolve("nvm.bin");
        assertEquals(0, run("run", "--minutes", "0.1", "--commands", script.toString(), "--nvm", nvm.toString(),
                "--out", dir.resolve("r1").toString()));
        List<UplinkLog.Recorded> uplink = UplinkLog.read(dir.resolve("r1").resolve(UplinkLog.FILE));
        assertEquals(6, uplink.size()); // NO_OP, 3 loads of 394 octets (192 + 192 + 10), verify, commit
        assertEquals(6, reports(dir.resolve("r1")).get("acceptance OK").asLong());
        assertEquals(7, GroundCommandCounter.beside(nvm).peek(), "the ground counter was kept");

        assertEquals(0, run("run", "--minutes", "0.1", "--uplink-replay",
                dir.resolve("r1").resolve(UplinkLog.FILE).toString(), "--nvm", nvm.toString(),
                "--out", dir.resolve("r2").toString()));
        JsonNode replayed = reports(dir.resolve("r2"));
        assertEquals(6, replayed.get("acceptance REPLAY").asLong());
        assertEquals(1, replayed.size(), "nothing else: " + replayed);

        assertEquals(0, run("run", "--minutes", "0.1", "--commands", script.toString(), "--nvm", nvm.toString(),
                "--out", dir.resolve("r3").toString()));
        assertEquals(6, reports(dir.resolve("r3")).get("acceptance OK").asLong());
    }

    @Test
    void shouldLockOnATornAntiReplayRecordAndRecoverWithThisBootsChallenge() throws IOException {
        Path nvm = dir.resolve("nvm.bin");
        Path table = dir.resolve("table.txt");
        Files.writeString(table, "1.0 TABLE_LOGSPACED 64 100 3000 4\n");
        assertEquals(0, run("run", "--minutes", "0.05", "--commands", table.toString(), "--nvm", nvm.toString(),
                "--out", dir.resolve("r1").toString()));
        Files.write(dir.resolve("nvm.bin.auth"), new byte[0]); // a write torn by a power loss
        Path noOp = dir.resolve("noop.txt");
        Files.writeString(noOp, "1.0 NO_OP\n");
        assertEquals(0, run("run", "--minutes", "0.05", "--commands", noOp.toString(), "--nvm", nvm.toString(),
                "--out", dir.resolve("r2").toString()));
        assertEquals(1, reports(dir.resolve("r2")).get("acceptance AUTH_LOCKED").asLong());
        JsonNode events = new ObjectMapper().readTree(dir.resolve("r2/ground/summary.json").toFile()).get("eventsByKind");
        assertTrue(events.toString().contains("AUTH_LOCKED"), events.toString());
        Path recover = dir.resolve("recover.txt");
        Files.writeString(recover, "1.0 AUTH_RECOVER\n1.5 NO_OP\n");
        assertEquals(0, run("run", "--minutes", "0.05", "--commands", recover.toString(), "--nvm", nvm.toString(),
                "--out", dir.resolve("r3").toString()));
        assertEquals(2, reports(dir.resolve("r3")).get("acceptance OK").asLong());
    }

    @Test
    void shouldReportAnUnsafeTableRefusedInTheGroundsSummary() throws IOException {
        Path script = dir.resolve("unsafe.txt");
        Files.writeString(script, "3.0 TABLE_LOGSPACED 64 100 6400 4\n");
        Path out = dir.resolve("r");
        assertEquals(0, run("run", "--minutes", "0.1", "--commands", script.toString(), "--nvm",
                dir.resolve("nvm.bin").toString(), "--out", out.toString()));
        JsonNode r = reports(out);
        assertEquals(1, r.get("execution TABLE_INVALID ABOVE_VOLTAGE_LIMIT").asLong(), r.toString());
        assertEquals(1, r.get("acceptance TABLE_NOT_VERIFIED").asLong(), r.toString());
        assertTrue(Files.notExists(dir.resolve("nvm.bin")), "nothing committed, so no table image stored");
    }
}
