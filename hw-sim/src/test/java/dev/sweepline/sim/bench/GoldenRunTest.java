package dev.sweepline.sim.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.sweepline.ground.decode.DecodeListener;
import dev.sweepline.ground.decode.DecoderConfig;
import dev.sweepline.ground.decode.TelemetryDecoder;
import dev.sweepline.ground.spectrum.Ccsds121QuadrantDecoder;
import dev.sweepline.ground.spectrum.DecodedSpectrum;
import dev.sweepline.sim.scenario.ScenarioLoader;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.Arrays;
import java.util.HexFormat;
import org.junit.jupiter.api.Test;

/** Probe (temporary): records one deterministic run's decision hash, telemetry and ground-decoded spectra. */
class GoldenRunTest {
    @Test
    void record() throws IOException, NoSuchAlgorithmException {
        BenchConfig config = BenchConfig.defaults(ScenarioLoader.builtIn("quiet-perihelion"), 1, 60);
        ByteArrayOutputStream frames = new ByteArrayOutputStream();
        ClosedLoopBench.Result r = ClosedLoopBench.run(config, ClosedLoopBench.Progress.NONE,
                (f, off, len) -> frames.write(f, off, len));
        byte[] tm = frames.toByteArray();
        StringBuilder spectra = new StringBuilder();
        TelemetryDecoder decoder = new TelemetryDecoder(DecoderConfig.icdDefaults(), new Ccsds121QuadrantDecoder(),
                new DecodeListener() {
                    @Override
                    public void onSpectrum(DecodedSpectrum s) {
                        spectra.append(s.apid()).append(' ').append(s.sequenceCount()).append(' ').append(s.mode())
                                .append(' ').append(s.steppedDown()).append(' ').append(s.tableChanged()).append(' ')
                                .append(s.sweep()).append(' ').append(s.tableId()).append(' ').append(s.firstWindow())
                                .append(' ').append(s.windowCount()).append(' ').append(s.peakQ8()).append(' ')
                                .append(s.integrationPeriods()).append(' ').append(s.compression())
                                .append(' ').append(s.time().coarseSeconds()).append(' ').append(s.time().fine())
                                .append(' ').append(Arrays.toString(s.gainRange()))
                                .append(' ').append(Arrays.toString(s.saturated()))
                                .append(' ').append(Arrays.deepToString(s.adcCounts())).append('\n');
                    }
                });
        decoder.accept(tm, 0, tm.length);
        decoder.finish();
        Path dir = Path.of(System.getProperty("golden.dir", "target/golden-run"));
        Files.createDirectories(dir);
        Files.write(dir.resolve("frames.bin"), tm);
        byte[] sp = spectra.toString().getBytes(StandardCharsets.UTF_8);
        Files.write(dir.resolve("spectra.txt"), sp);
        String line = "hash " + r.summary().decisionHash() + " tm " + sha(tm) + " spectra " + sha(sp) + "\n";
        Files.writeString(dir.resolve("summary.txt"), line);
        assertEquals(line, line);
    }

    private static String sha(byte[] b) throws NoSuchAlgorithmException {
        return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(b));
    }
}
