package dev.sweepline.ground.product;

import dev.sweepline.ground.decode.DecoderConfig;
import dev.sweepline.ground.spectrum.WindowCatalogue;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.OptionalDouble;

/**
 * The whole ground processing of one telemetry file, the entry point for other modules (e.g. the
 * bench, which decodes its own telemetry):
 * <pre>
 *   GroundProducts p = GroundProcessing.process(Path.of("run/telemetry.tm"), Path.of("run/ground"),
 *           OptionalDouble.of(8000));
 *   for (MomentRecord r : p.moments()) { ... r.densityPerCc(), r.crlbDensityPerCc(), r.fit().flags() ... }
 * </pre>
 * It decodes the frames (frame length detected, SCID 0x2C5), each spectrum with the description of the
 * instrument it names (every built-in by default; {@link DecoderConfig#withInstruments} for others), fits
 * every spectrum with its instrument's geometry and noise and its Cramér–Rao bound, and writes into
 * {@code outDir}: spectra.csv, summary.json (with a {@code fits} section),
 * moments.csv, moments.json, spectrogram.png, moments.png, spectrum-fit.png and report.html.
 */
public final class GroundProcessing {
    /** File names written. */
    public static final String SPECTRA = "spectra.csv";
    /** Decoder summary with a fits section. */
    public static final String SUMMARY = "summary.json";
    /** One row per spectrum. */
    public static final String MOMENTS_CSV = "moments.csv";
    /** Fit counts and per-spectrum moments. */
    public static final String MOMENTS_JSON = "moments.json";
    /** The quick-look report. */
    public static final String REPORT = "report.html";
    /** Plots. */
    public static final String SPECTROGRAM_PNG = "spectrogram.png";
    /** Moments over time. */
    public static final String MOMENTS_PNG = "moments.png";
    /** One spectrum and its fit. */
    public static final String SPECTRUM_FIT_PNG = "spectrum-fit.png";
    /** Read size, octets. */
    static final int CHUNK_OCTETS = 64 * 1024;

    private GroundProcessing() {
    }

    /** {@link #process(Path, Path, OptionalDouble, DecoderConfig)} with the frame length detected. */
    public static GroundProducts process(Path telemetryFile, Path outDir, OptionalDouble allocationBitsPerS)
            throws IOException {
        return process(telemetryFile, outDir, allocationBitsPerS, DecoderConfig.autoLength());
    }

    /**
     * Decodes {@code telemetryFile}, fits, writes every product into {@code outDir} (created).
     *
     * @param allocationBitsPerS the downlink allocation to compare the frame rate with, if any
     * @throws IOException when the input cannot be read or a product cannot be written
     */
    public static GroundProducts process(Path telemetryFile, Path outDir, OptionalDouble allocationBitsPerS,
            DecoderConfig config) throws IOException {
        return process(telemetryFile, outDir, allocationBitsPerS, config, new WindowCatalogue());
    }

    /** As above, with the window tables of {@code windows} (uplinked table images, by table id). */
    public static GroundProducts process(Path telemetryFile, Path outDir, OptionalDouble allocationBitsPerS,
            DecoderConfig config, WindowCatalogue windows) throws IOException {
        return process(telemetryFile, outDir, allocationBitsPerS, config, windows, ReportAdditions.NONE);
    }

    /** As above, with a reference for the moment plots and figures of the caller's own in report.html. */
    public static GroundProducts process(Path telemetryFile, Path outDir, OptionalDouble allocationBitsPerS,
            DecoderConfig config, WindowCatalogue windows, ReportAdditions additions) throws IOException {
        try (GroundSession session = new GroundSession(telemetryFile.toString(), outDir, allocationBitsPerS, config,
                windows, additions)) {
            byte[] chunk = new byte[CHUNK_OCTETS];
            try (InputStream in = Files.newInputStream(telemetryFile)) {
                for (int n = in.read(chunk); n >= 0; n = in.read(chunk)) {
                    session.accept(chunk, 0, n);
                }
            }
            session.finish();
            return session.write(0);
        }
    }
}
