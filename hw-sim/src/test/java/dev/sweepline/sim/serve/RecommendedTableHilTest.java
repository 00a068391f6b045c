package dev.sweepline.sim.serve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import dev.sweepline.fsw.command.CommandCode;
import dev.sweepline.fsw.command.TableImage;
import dev.sweepline.fsw.host.ExitStatus;
import dev.sweepline.fsw.host.FswMain;
import dev.sweepline.ground.decode.CommandReport;
import dev.sweepline.ground.decode.DecodeListener;
import dev.sweepline.ground.decode.DecoderConfig;
import dev.sweepline.ground.decode.TelemetryDecoder;
import dev.sweepline.ground.spectrum.Ccsds121QuadrantDecoder;
import dev.sweepline.ground.spectrum.DecodedSpectrum;
import dev.sweepline.sim.cli.BenchMain;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

/**
 * A test engineer's HIL session over a serial line (a socat pty pair): a campaign is tuned, its
 * {@code recommended.table} is uplinked to the flight software on the PC by a command script
 * ({@code sweepline-fsw.jar run --commands SCRIPT --nvm FILE}, the script naming the image relative
 * to its own folder) while {@code sweepline-bench.jar serve} plays the electronics; the ground finds
 * the table's commit report and spectra of the new table in the telemetry, and the NVM file holds the
 * image for the next boot. Skips when socat is not installed.
 */
class RecommendedTableHilTest {
    /** A small campaign: four sets, three runs of 12 s each (the one CampaignDeterminismTest tunes). */
    private static final String CAMPAIGN = """
            format: sweepline-campaign/1
            name: small
            seed: 77
            runsPerSet: 3
            durationS: 12
            scenario: shock-sheath
            allocationBitsPerS: 9000
            draws:
              protonDensity: {logUniform: [300, 900]}
              protonSpeed: {uniform: [330, 420]}
              flowThetaX: {normal: [0, 2]}
            grid:
              integrationPeriods: [4, 8]
              resurveyEvery: [4, 16]
            """;

    @Test
    @Timeout(value = 240, unit = TimeUnit.SECONDS)
    void shouldUplinkTheRecommendedTableOverAPtyAndSeeItsCommitAndSpectraOnTheGround() throws Exception {
        assumeTrue(HilRig.socatPath() != null, "socat is not installed: the recommended-table HIL test is skipped");
        Path dir = Files.createTempDirectory("sweepline-table-hil");
        Path campaign = Files.writeString(dir.resolve("small.yaml"), CAMPAIGN);
        Path tuned = dir.resolve("tune");
        assertEquals(ExitStatus.OK, BenchMain.commandLine().execute("tune", campaign.toString(), "--threads", "2",
                "--out", tuned.toString()));
        byte[] image = Files.readAllBytes(tuned.resolve("recommended.table"));
        assertTrue(TableImage.intact(image, image.length));
        int tableId = TableImage.tableId(image, image.length);
        // the script sits beside the image and names it by its bare file name (commands.md §7: relative to the script)
        Path script = Files.writeString(tuned.resolve("uplink.cmd"), "1.0 TABLE_IMAGE recommended.table\n");
        Path nvm = dir.resolve("fsw.nvm");

        Path a = dir.resolve("a");
        Path b = dir.resolve("b");
        Process socat = new ProcessBuilder(HilRig.socatPath(), "-d", "-d",
                "pty,raw,echo=0,link=" + a, "pty,raw,echo=0,link=" + b).redirectErrorStream(true)
                .redirectOutput(dir.resolve("socat.log").toFile()).start();
        try {
            long deadline = System.nanoTime() + 10_000_000_000L;
            while (!(Files.exists(a) && Files.exists(b))) {
                assertTrue(System.nanoTime() < deadline, "socat made no pty pair");
                Thread.sleep(20);
            }
            Thread serve = new Thread(() -> BenchMain.commandLine().execute("serve", "--port", b.toString(),
                    "--scenario", "shock-sheath", "--seed", "3", "--as-fast-as-possible"), "serve");
            serve.setDaemon(true);
            serve.start();
            Thread.sleep(300); // the server opens its end first
            Path tm = dir.resolve("telemetry.tm");
            // 18 s simulated (0.3 min) on the link clock: the uplink at 1 s, then sweeps of the new table
            int exit = FswMain.commandLine().execute("run", "--link", a.toString(), "--tm", tm.toString(),
                    "--minutes", "0.3", "--clock", "link", "--hv", "arm", "--hv-confirm", "FIRE",
                    "--commands", script.toString(), "--nvm", nvm.toString(), "--timeout-margin", "30");
            assertEquals(ExitStatus.OK, exit);

            List<CommandReport> reports = new ArrayList<>();
            List<Integer> tableIds = new ArrayList<>();
            TelemetryDecoder d = new TelemetryDecoder(DecoderConfig.icdDefaults(), new Ccsds121QuadrantDecoder(),
                    new DecodeListener() {
                        @Override
                        public void onSpectrum(DecodedSpectrum s) {
                            tableIds.add(s.tableId());
                        }

                        @Override
                        public void onCommandReport(CommandReport r) {
                            reports.add(r);
                        }
                    });
            byte[] frames = Files.readAllBytes(tm);
            d.accept(frames, 0, frames.length);
            d.finish();
            // commands.md §4.2: the image's loads, a verify and a commit, each reported (telemetry ICD §9)
            assertTrue(reports.stream().anyMatch(r -> r.commandCode() == CommandCode.TABLE_COMMIT && r.ok()),
                    reports.toString());
            assertTrue(reports.stream().allMatch(CommandReport::ok), reports.toString());
            // spectra of the built-in table (id 0) first, then of the committed one
            assertFalse(tableIds.isEmpty());
            assertEquals(0, tableIds.get(0));
            assertTrue(tableIds.stream().filter(id -> id == tableId).count() > 3,
                    "spectra of table " + tableId + ": " + tableIds);
            // the commit wrote the image to the NVM file (commands.md §4.3), for the next boot
            assertTrue(Files.size(nvm) >= image.length);
        } finally {
            socat.destroy();
            socat.waitFor(5, TimeUnit.SECONDS);
        }
    }
}
