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
 */
class GoldenRunTest {
    /** The decision hash: the same before and after the instrument description (see the class comment). */
    static final String DECISION_HASH = "f44054cc20c6555f";
    /** SHA-256 of the telemetry frames with spectrum packets of layout 2 (before: f57c8506...71b33, layout 1). */
    static final String TELEMETRY_SHA256 = "e06d2dcc27a20426bee350b580a86d2a0f98a21eaa1889ab4918c629009ccc18";
    /** SHA-256 of the ground-decoded spectra: the same before and after. */
    static final String SPECTRA_SHA256 = "9c58b6d40c4d6bfb7470c41d3ead1dbaf691061c63b4b372a7f3cc98a0b64db8";

    /**
     * The fine cup (instruments/fine-cup.yaml) on the same run: quiet-perihelion, seed 1, 60 s, its own
     * default table and sweep parameters. Obtained in a separate JVM with the command line,
     * {@code sweepline-bench.jar run --instrument fine-cup --scenario quiet-perihelion --seed 1 --minutes 1
     * --no-ground}: the decision hash it prints and {@code sha256sum telemetry.tm}; this test repeats the run
     * in the test JVM (the same figures from the demo cup's run by the same command confirm the two paths agree).
     */
    static final String FINE_CUP_DECISION_HASH = "d312858eb5ee4458";
    /** SHA-256 of the fine cup's telemetry frames (see {@link #FINE_CUP_DECISION_HASH}). */
    static final String FINE_CUP_TELEMETRY_SHA256 = "a6a0d8d1c6ded7b727aa51d91fd1eee170186cbdf62fee10059c40061d8c27a4";

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
