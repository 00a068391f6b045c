package dev.sweepline.sim.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sweepline.fsw.host.FswMain;
import dev.sweepline.ground.decode.DecodeListener;
import dev.sweepline.ground.decode.DecoderConfig;
import dev.sweepline.ground.decode.HousekeepingReport;
import dev.sweepline.ground.decode.TelemetryDecoder;
import dev.sweepline.ground.spectrum.Ccsds121QuadrantDecoder;
import dev.sweepline.sim.bench.BenchConfig;
import dev.sweepline.sim.bench.ClosedLoopBench;
import dev.sweepline.sim.scenario.ScenarioLoader;
import java.io.ByteArrayOutputStream;
import java.net.ServerSocket;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

/**
 * Both command lines end to end over TCP on loopback: {@code bench serve --as-fast-as-possible} and
 * {@code fsw run --clock link} with HV armed and fired, whose TM file must equal the in-process run's
 * telemetry for the same seed (architecture.md, determinism), but for the closing housekeeping packet,
 * which reports the HV off that ends every run (hardware ICD §4.2, §7).
 */
class ServeOverTcpTest {
    @Test
    @Timeout(value = 60, unit = TimeUnit.SECONDS)
    void shouldServeTheNextClientAfterOneLeaves(@TempDir Path dir) throws Exception {
        int port;
        try (ServerSocket probe = new ServerSocket(0)) {
            port = probe.getLocalPort();
        }
        String address = "tcp:127.0.0.1:" + port;
        int[] serveExit = {-1};
        Thread serve = new Thread(() -> serveExit[0] = BenchMain.commandLine().execute("serve", "--port", address,
                "--scenario", "quiet-perihelion", "--seed", "5", "--as-fast-as-possible", "--clients", "2"), "serve");
        serve.start();
        List<byte[]> runs = new ArrayList<>();
        for (int client = 0; client < 2; client++) {
            Path tm = dir.resolve("run-" + client + ".tm");
            int fswExit = 1;
            for (int attempt = 0; attempt < 50 && fswExit != 0; attempt++) { // until the server listens
                Thread.sleep(100);
                fswExit = FswMain.commandLine().execute("run", "--link", address, "--tm", tm.toString(), "--minutes",
                        "0.05", "--clock", "link");
            }
            assertEquals(0, fswExit, "client " + client);
            runs.add(Files.readAllBytes(tm));
        }
        serve.join(10_000);
        assertFalse(serve.isAlive());
        assertEquals(0, serveExit[0]);
        // each client gets the instrument fresh from the scenario and seed: the second run is the first again
        assertTrue(runs.get(0).length > 0);
        assertArrayEquals(runs.get(0), runs.get(1));
    }

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
                "--scenario", "quiet-perihelion", "--seed", "5", "--as-fast-as-possible", "--clients", "1"), "serve");
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
        assertEquals(0, serveExit[0]); // --clients 1: the server ends when its one client hangs up

        ByteArrayOutputStream reference = new ByteArrayOutputStream();
        ClosedLoopBench.run(BenchConfig.defaults(ScenarioLoader.resolve("quiet-perihelion"), 5, 12),
                ClosedLoopBench.Progress.NONE, reference::write);
        byte[] got = Files.readAllBytes(tm);
        assertTrue(got.length > 0);
        assertEquals(reference.size(), got.length);
        // the same telemetry packet for packet, but for the closing housekeeping: every run ends with the HV
        // commanded off (hardware ICD §4.2), the bench's run does not
        Decoded want = Decoded.of(reference.toByteArray());
        Decoded have = Decoded.of(got);
        assertEquals(want.packets.size(), have.packets.size());
        int closing = have.lastHousekeeping;
        assertEquals(want.lastHousekeeping, closing);
        for (int i = 0; i < have.packets.size(); i++) {
            if (i != closing) {
                assertArrayEquals(want.packets.get(i), have.packets.get(i), "packet " + i);
            }
        }
        byte[] a = want.packets.get(closing);
        byte[] b = have.packets.get(closing);
        int userData = b.length - HousekeepingReport.USER_DATA_OCTETS;
        List<Integer> differ = new ArrayList<>();
        for (int i = 0; i < b.length; i++) {
            if (a[i] != b[i]) {
                differ.add(i - userData);
            }
        }
        assertEquals(List.of(1, 33), differ); // telemetry ICD §5: HV enabled (1), HV interlock state (33)
        assertTrue(want.closing.hvEnabled() && want.closing.hvState() == 2);
        assertFalse(have.closing.hvEnabled());
        assertEquals(0, have.closing.hvState()); // OFF
    }

    /** Every packet of a TM stream as the independent ground decoder reads it, and the last housekeeping. */
    private static final class Decoded {
        final List<byte[]> packets = new ArrayList<>();
        int lastHousekeeping = -1;
        HousekeepingReport closing;

        static Decoded of(byte[] tm) {
            Decoded d = new Decoded();
            TelemetryDecoder decoder = new TelemetryDecoder(DecoderConfig.icdDefaults(), new Ccsds121QuadrantDecoder(),
                    new DecodeListener() {
                        @Override
                        public void onPacket(int vcid, byte[] buf, int off, int octets) {
                            d.packets.add(Arrays.copyOfRange(buf, off, off + octets));
                        }

                        @Override
                        public void onHousekeeping(HousekeepingReport report) {
                            d.lastHousekeeping = d.packets.size() - 1;
                            d.closing = report;
                        }
                    });
            decoder.accept(tm, 0, tm.length);
            decoder.finish();
            return d;
        }
    }

    @Test
    void shouldCarryTheHighVoltageCautionInTheServeHelp() {
        String help = BenchMain.commandLine().getSubcommands().get("serve").getUsageMessage().replaceAll("\\s+", " ");
        assertTrue(help.contains("HIGH VOLTAGE") && help.contains("interlock") && help.contains("safety rules"));
    }
}
