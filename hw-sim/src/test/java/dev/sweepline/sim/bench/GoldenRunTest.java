package dev.sweepline.sim.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.sweepline.ground.decode.DecodeListener;
import dev.sweepline.ground.decode.DecoderConfig;
import dev.sweepline.ground.decode.TelemetryDecoder;
import dev.sweepline.ground.spectrum.Ccsds121QuadrantDecoder;
import dev.sweepline.ground.spectrum.DecodedSpectrum;
import dev.sweepline.sim.instrument.TestInstruments;
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

/**
 * One deterministic closed-loop run pinned byte for byte: the demo cup (instruments/demo-cup.yaml) on
 * quiet-perihelion, seed 1, 60 s, default table and parameters, CCSDS 121 spectra.
 *
 * <p>How the values were obtained: the decision hash and the SHA-256 of the run's telemetry (every frame,
 * ASM first) and of the ground-decoded spectra (one text line per spectrum: header fields, time, gain
 * tags, saturation flags, every quadrant's samples) were recorded with this code before the instrument
 * description replaced the compile-time constants, and again after: the decision hash and the decoded
 * spectra are the same; the telemetry differs only where layout 2 of the spectrum packet (telemetry ICD
 * §4) says, checked by splitting both streams into packets with a python reader written from the ICD:
 * every spectrum packet equals the old one with the four octets of layout 2 (0x82, instrument id 1,
 * width 16) removed, every event packet is the same, and housekeeping differs only in its telemetry-octet
 * counter (ICD §5 offset 22), by 4 octets per spectrum generated before it. The values below are those of
 * the run after the change. Set {@code -Dgolden.dir=DIR} to have the run's frames and spectra written there.
 *
 * <p>Re-pinned when the first survey's gain ranging changed (sweep design note R9: a never-read window
 * follows its neighbour read before it, x 8, instead of the top range): the first survey's gain tags go
 * from all range 2 to ranges 0, 1 and 2 by the current (no sample saturated), so its samples, the peak it
 * finds and every decision after it differ. The values were taken in a separate JVM by the command line,
 * {@code sweepline-bench.jar run --scenario quiet-perihelion --seed 1 --minutes 1 --no-ground} (its
 * decision hash and {@code sha256sum telemetry.tm}, equal to this test's frames), the spectra's with
 * {@code -Dgolden.dir}; the fine cup's the same way with {@code --instrument fine-cup}.
 */
class GoldenRunTest {
    /** The decision hash (before the first survey's ranging: f44054cc20c6555f; see the class comment). */
    static final String DECISION_HASH = "ad2229b8d3201a8b";
    /** SHA-256 of the telemetry frames, layout 2 (before the first survey's ranging: e06d2dcc...9ccc18). */
    static final String TELEMETRY_SHA256 = "f45eda5a463511308a223e0cc6c3c57fc4408e0eca0b2103560237710235ae34";
    /** SHA-256 of the ground-decoded spectra (before the first survey's ranging: 9c58b6d4...0b64db8). */
    static final String SPECTRA_SHA256 = "ed12003cc9af330c8f4a49b6d48893569821a2e8f7ff726609f6c3161fd1c32a";

    /**
     * The fine cup (instruments/fine-cup.yaml) on the same run: quiet-perihelion, seed 1, 60 s, its own
     * default table and sweep parameters. Obtained in a separate JVM with the command line,
     * {@code sweepline-bench.jar run --instrument fine-cup --scenario quiet-perihelion --seed 1 --minutes 1
     * --no-ground}: the decision hash it prints and {@code sha256sum telemetry.tm}; this test repeats the run
     * in the test JVM (the same figures from the demo cup's run by the same command confirm the two paths agree).
     */
    static final String FINE_CUP_DECISION_HASH = "2208f39900c91de5"; // before the first survey's ranging: d312858eb5ee4458
    /** SHA-256 of the fine cup's telemetry frames (see {@link #FINE_CUP_DECISION_HASH}; before: a6a0d8d1...8c27a4). */
    static final String FINE_CUP_TELEMETRY_SHA256 = "9feaf9506c0e3df099f219b6be707d3244e601d9e723b08069f7e85fece9342d";

    @Test
    void shouldRepeatThePinnedFineCupRunByteForByte() throws NoSuchAlgorithmException {
        BenchConfig config = BenchConfig.defaults(ScenarioLoader.builtIn("quiet-perihelion"), 1, 60,
                TestInstruments.FINE_CUP);
        ByteArrayOutputStream frames = new ByteArrayOutputStream();
        ClosedLoopBench.Result r = ClosedLoopBench.run(config, ClosedLoopBench.Progress.NONE,
                (f, off, len) -> frames.write(f, off, len));
        assertEquals(FINE_CUP_DECISION_HASH, r.summary().decisionHash());
        assertEquals(FINE_CUP_TELEMETRY_SHA256, sha256(frames.toByteArray()));
    }

    @Test
    void shouldRepeatThePinnedRunByteForByte() throws IOException, NoSuchAlgorithmException {
        BenchConfig config = BenchConfig.defaults(ScenarioLoader.builtIn("quiet-perihelion"), 1, 60);
        ByteArrayOutputStream frames = new ByteArrayOutputStream();
        ClosedLoopBench.Result r = ClosedLoopBench.run(config, ClosedLoopBench.Progress.NONE,
                (f, off, len) -> frames.write(f, off, len));
        byte[] tm = frames.toByteArray();
        byte[] spectra = decodedSpectra(tm);
        String dir = System.getProperty("golden.dir");
        if (dir != null) {
            Files.createDirectories(Path.of(dir));
            Files.write(Path.of(dir, "frames.bin"), tm);
            Files.write(Path.of(dir, "spectra.txt"), spectra);
        }
        assertEquals(DECISION_HASH, r.summary().decisionHash());
        assertEquals(TELEMETRY_SHA256, sha256(tm));
        assertEquals(SPECTRA_SHA256, sha256(spectra));
    }

    /** The ground's spectra of {@code tm}, one line each, every field the decoder gives. */
    private static byte[] decodedSpectra(byte[] tm) {
        StringBuilder out = new StringBuilder();
        TelemetryDecoder decoder = new TelemetryDecoder(DecoderConfig.icdDefaults(), new Ccsds121QuadrantDecoder(),
                new DecodeListener() {
                    @Override
                    public void onSpectrum(DecodedSpectrum s) {
                        out.append(s.apid()).append(' ').append(s.sequenceCount()).append(' ').append(s.mode())
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
        return out.toString().getBytes(StandardCharsets.UTF_8);
    }

    private static String sha256(byte[] b) throws NoSuchAlgorithmException {
        return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(b));
    }
}
