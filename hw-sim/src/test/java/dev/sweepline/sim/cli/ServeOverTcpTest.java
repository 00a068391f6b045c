package dev.sweepline.sim.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.host.FswMain;
import dev.sweepline.sim.bench.BenchConfig;
import dev.sweepline.sim.bench.ClosedLoopBench;
import dev.sweepline.sim.scenario.ScenarioLoader;
import java.io.ByteArrayOutputStream;
import java.net.ServerSocket;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

/**
 * Both command lines end to end over TCP on loopback: {@code bench serve --as-fast-as-possible} and
 * {@code fsw run --clock link} with HV armed and fired, whose TM file must equal the in-process run's
 * telemetry for the same seed (architecture.md, determinism).
 */
class ServeOverTcpTest {
    @Test
    @Timeout(value = 60, unit = TimeUnit.SECONDS)
    void shouldRunTheFlightSoftwareAgainstTheServedInstrumentOverTcp(@TempDir Path dir) throws Exception {
        int port;
        try (ServerSocket probe = new ServerSocket(0)) {
            port = probe.getLocalPort();
        }
        String address = "tcp:127.0.0.1:" + port;
        int[] serveExit = {-1};
        Thread serve = new Thread(() -> serveExit[0] = BenchMain.commandLine().execute("serve", "--port", address,
                "--scenario", "quiet-perihelion", "--seed", "5", "--as-fast-as-possible"), "serve");
        serve.start();
        Path tm = dir.resolve("telemetry.tm");
        int fswExit = 1;
        for (int attempt = 0; attempt < 50 && fswExit != 0; attempt++) { // until the server listens
            Thread.sleep(100);
            fswExit = FswMain.commandLine().execute("run", "--link", address, "--tm", tm.toString(), "--minutes", "0.2",
                    "--clock", "link", "--hv", "arm", "--hv-confirm", "FIRE");
        }
        serve.join(10_000);
        assertEquals(0, fswExit);
        assertEquals(0, serveExit[0]); // the server ends when the flight software hangs up

        ByteArrayOutputStream reference = new ByteArrayOutputStream();
        ClosedLoopBench.run(BenchConfig.defaults(ScenarioLoader.resolve("quiet-perihelion"), 5, 12),
                ClosedLoopBench.Progress.NONE, reference::write);
        byte[] got = Files.readAllBytes(tm);
        assertTrue(got.length > 0);
        assertArrayEquals(reference.toByteArray(), got);
    }

    @Test
    void shouldCarryTheHighVoltageCautionInTheServeHelp() {
        String help = BenchMain.commandLine().getSubcommands().get("serve").getUsageMessage().replaceAll("\\s+", " ");
        assertTrue(help.contains("HIGH VOLTAGE") && help.contains("interlock") && help.contains("safety rules"));
    }
}
