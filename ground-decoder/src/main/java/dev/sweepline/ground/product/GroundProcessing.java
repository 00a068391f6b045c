package dev.sweepline.ground.product;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.sweepline.ground.decode.DecodeListener;
import dev.sweepline.ground.decode.DecoderConfig;
import dev.sweepline.ground.decode.TelemetryDecoder;
import dev.sweepline.ground.spectrum.Ccsds121QuadrantDecoder;
import dev.sweepline.ground.spectrum.WindowCatalogue;
import dev.sweepline.ground.spectrum.DecodedSpectrum;
import java.io.IOException;
import java.io.InputStream;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
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
        Files.createDirectories(outDir);
        FitCollector fits = new FitCollector();
        TelemetryDecoder decoder;
        long octets = 0;
        try (Writer w = Files.newBufferedWriter(outDir.resolve(SPECTRA), StandardCharsets.UTF_8);
                SpectraCsvWriter csv = new SpectraCsvWriter(w)) {
            decoder = new TelemetryDecoder(config, new Ccsds121QuadrantDecoder(), windows, new Both(csv, fits));
            byte[] chunk = new byte[CHUNK_OCTETS];
            try (InputStream in = Files.newInputStream(telemetryFile)) {
                for (int n = in.read(chunk); n >= 0; n = in.read(chunk)) {
                    decoder.accept(chunk, 0, n);
                    octets += n;
                }
            }
            decoder.finish();
        }
        FitSummary summary = FitSummary.of(fits.records(), fits.fitSeconds());
        BitRates rates = BitRates.of(decoder.stats(), decoder.frameOctets(), allocationBitsPerS.orElse(Double.NaN));
        ObjectMapper m = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
        ObjectNode s = SummaryJson.build(m, telemetryFile.toString(), octets, decoder);
        s.set("fits", MomentsJson.fits(m, summary));
        m.writeValue(outDir.resolve(SUMMARY).toFile(), s);
        try (Writer w = Files.newBufferedWriter(outDir.resolve(MOMENTS_CSV), StandardCharsets.UTF_8)) {
            MomentsCsv.write(w, fits.records());
        }
        m.writeValue(outDir.resolve(MOMENTS_JSON).toFile(), MomentsJson.build(m, summary, fits.records()));
        QuickLook.Plots plots = QuickLook.plots(fits);
        Files.write(outDir.resolve(SPECTROGRAM_PNG), plots.spectrogram());
        Files.write(outDir.resolve(MOMENTS_PNG), plots.moments());
        Files.write(outDir.resolve(SPECTRUM_FIT_PNG), plots.spectrumFit());
        Files.write(outDir.resolve(REPORT),
                QuickLook.report(telemetryFile.toString(), octets, decoder, summary, rates, fits, plots));
        return new GroundProducts(fits.records(), decoder.stats(), summary, rates, outDir);
    }

    /** Sends spectra to both the CSV writer and the fits. */
    private record Both(DecodeListener csv, DecodeListener fits) implements DecodeListener {
        @Override
        public void onSpectrum(DecodedSpectrum s) {
            csv.onSpectrum(s);
            fits.onSpectrum(s);
        }
    }
}
