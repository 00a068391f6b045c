package dev.sweepline.sim.serve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import dev.sweepline.fsw.host.FswMain;
import dev.sweepline.ground.decode.DecodeListener;
import dev.sweepline.ground.decode.DecoderConfig;
import dev.sweepline.ground.decode.TelemetryDecoder;
import dev.sweepline.ground.instrument.InstrumentSet;
import dev.sweepline.ground.spectrum.Ccsds121QuadrantDecoder;
import dev.sweepline.ground.spectrum.DecodedSpectrum;
import dev.sweepline.sim.bench.BenchConfig;
import dev.sweepline.sim.cli.BenchMain;
import dev.sweepline.sim.instrument.TestInstruments;
import dev.sweepline.sim.scenario.ScenarioLoader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

/**
 * The second instrument over a real serial link: socat makes a pty pair, {@code bench serve --instrument
 * fine-cup} runs on one end and {@code fsw run --instrument fine-cup} (HV armed and fired, clocked by the
 * link) on the other; the ground, given nothing but the description file, decodes the telemetry into the
 * same spectra as the in-process bench's run of the same seed. Skips only when socat is not installed.
 */
class FineCupSerialHilTest {
    /** The description file the ground reads on its own (the fine cup's, as the flight software ships it). */
    private static final Path DESCRIPTION = Path.of("../fsw-core/src/main/resources/instruments/fine-cup.yaml");

    @Test
    @Timeout(value = 120, unit = TimeUnit.SECONDS)
    void shouldFlyTheFineCupOverAPtyPairAndDecodeItFromItsDescription() throws Exception {
        assumeTrue(HilRig.socatPath() != null, "socat is not installed: the fine-cup serial HIL test is skipped");
        Path dir = Files.createTempDirectory("sweepline-fine-pty");
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
                    "--instrument", "fine-cup", "--scenario", "quiet-perihelion", "--seed", "11",
                    "--as-fast-as-possible"), "serve");
            serve.setDaemon(true);
            serve.start();
            Thread.sleep(300); // the server opens its end first
            Path tm = dir.resolve("telemetry.tm");
            // 12 s simulated (0.2 min) clocked by the link: surveys and focus sweeps, short for a unit test (common practice)
            int fswExit = FswMain.commandLine().execute("run", "--instrument", "fine-cup", "--link", a.toString(),
                    "--tm", tm.toString(), "--minutes", "0.2", "--clock", "link", "--hv", "arm", "--hv-confirm", "FIRE");
            assertEquals(0, fswExit);

            InstrumentSet ground = InstrumentSet.resolve(List.of(DESCRIPTION.toString()));
            List<String> got = spectra(Files.readAllBytes(tm), ground);
            assertTrue(got.size() > 5, "12 s of sweeping gives spectra; got " + got.size());
            BenchConfig config = BenchConfig.defaults(ScenarioLoader.resolve("quiet-perihelion"), 11, 12,
                    TestInstruments.FINE_CUP);
            assertEquals(spectra(HilRig.inProcessTelemetry(config), ground), got); // windows, gains, samples
        } finally {
            socat.destroy();
            socat.waitFor(5, TimeUnit.SECONDS);
        }
    }

    /** Every spectrum as the ground decodes it with {@code instruments}: instrument id, width, windows, gains, samples. */
    private static List<String> spectra(byte[] tm, InstrumentSet instruments) {
        List<String> out = new ArrayList<>();
        TelemetryDecoder d = new TelemetryDecoder(DecoderConfig.icdDefaults().withInstruments(instruments),
                new Ccsds121QuadrantDecoder(), new DecodeListener() {
                    @Override
                    public void onSpectrum(DecodedSpectrum s) {
                        // instruments/fine-cup.yaml: id 2, adc.bits 20 (telemetry ICD §4, layout 2)
                        assertEquals(2, s.instrumentId());
                        assertEquals(20, s.sampleBits());
                        out.add(s.mode() + " sweep " + s.sweep() + " windows " + s.firstWindow() + "+" + s.windowCount()
                                + " gains " + Arrays.toString(s.gainRange()) + " adc " + Arrays.deepToString(s.adcCounts()));
                    }
                });
        d.accept(tm, 0, tm.length);
        d.finish();
        return out;
    }
}
