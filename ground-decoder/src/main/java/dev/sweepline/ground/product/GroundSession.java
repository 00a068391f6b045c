package dev.sweepline.ground.product;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.sweepline.ground.decode.DecodeListener;
import dev.sweepline.ground.decode.DecoderConfig;
import dev.sweepline.ground.decode.TelemetryDecoder;
import dev.sweepline.ground.spectrum.Ccsds121QuadrantDecoder;
import dev.sweepline.ground.spectrum.SpectrumView;
import dev.sweepline.ground.spectrum.WindowCatalogue;
import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.OptionalDouble;

/**
 * The ground processing of one telemetry stream as it arrives: octets go in ({@link #accept}) in any
 * chunks, and {@link #write} writes every product of what has arrived so far into the output folder
 * (spectra.csv as it grows; summary.json, moments.csv, moments.json, the plots and report.html
 * rewritten whole, each through a temporary file and a move, so that a reader, a browser refreshing
 * the report, never sees half a file). {@link GroundProcessing} is one session over a whole file; the
 * {@code --follow} mode of {@code decode} writes while a stream grows. Not thread-safe: one thread
 * feeds and writes.
 */
public final class GroundSession implements AutoCloseable {
    private final Path outDir;
    private final String inputName;
    private final OptionalDouble allocationBitsPerS;
    private final ReportAdditions additions;
    private final FitCollector fits = new FitCollector();
    private final Writer spectraWriter;
    private final SpectraCsvWriter csv;
    private final TelemetryDecoder decoder;
    private long octets;

    /**
     * A session writing into {@code outDir} (created).
     *
     * @param inputName names the input in the report and summary.json
     * @throws IOException when the folder or spectra.csv cannot be made
     */
    public GroundSession(String inputName, Path outDir, OptionalDouble allocationBitsPerS, DecoderConfig config,
            WindowCatalogue windows, ReportAdditions additions) throws IOException {
        Files.createDirectories(outDir);
        this.outDir = outDir;
        this.inputName = inputName;
        this.allocationBitsPerS = allocationBitsPerS;
        this.additions = additions;
        spectraWriter = Files.newBufferedWriter(outDir.resolve(GroundProcessing.SPECTRA), StandardCharsets.UTF_8);
        csv = new SpectraCsvWriter(spectraWriter);
        decoder = new TelemetryDecoder(config, new Ccsds121QuadrantDecoder(), windows, new Both(csv, fits));
    }

    /** Decodes and fits {@code len} more octets of the stream. */
    public void accept(byte[] b, int off, int len) {
        decoder.accept(b, off, len);
        octets += len;
    }

    /** The end of the stream: what is held in the decoder is finished. */
    public void finish() {
        decoder.finish();
    }

    /** Octets accepted so far. */
    public long octets() {
        return octets;
    }

    /** Spectra decoded so far. */
    public int spectra() {
        return fits.records().size();
    }

    /**
     * Writes every product of what has arrived.
     *
     * @param refreshSeconds when positive, report.html asks the browser to reload it this often (a live
     *                       quick-look); 0 for a finished report
     */
    public GroundProducts write(int refreshSeconds) throws IOException {
        spectraWriter.flush();
        FitSummary summary = FitSummary.of(fits.records(), fits.fitSeconds());
        BitRates rates = BitRates.of(decoder.stats(), decoder.frameOctets(), allocationBitsPerS.orElse(Double.NaN));
        ObjectMapper m = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
        ObjectNode s = SummaryJson.build(m, inputName, octets, decoder);
        s.set("fits", MomentsJson.fits(m, summary));
        replace(GroundProcessing.SUMMARY, m.writeValueAsBytes(s));
        java.io.StringWriter moments = new java.io.StringWriter();
        MomentsCsv.write(moments, fits.records());
        replace(GroundProcessing.MOMENTS_CSV, moments.toString().getBytes(StandardCharsets.UTF_8));
        replace(GroundProcessing.MOMENTS_JSON, m.writeValueAsBytes(MomentsJson.build(m, summary, fits.records())));
        QuickLook.Plots plots = QuickLook.plots(fits, additions);
        replace(GroundProcessing.SPECTROGRAM_PNG, plots.spectrogram());
        replace(GroundProcessing.MOMENTS_PNG, plots.moments());
        replace(GroundProcessing.SPECTRUM_FIT_PNG, plots.spectrumFit());
        replace(GroundProcessing.REPORT, QuickLook.report(inputName, octets, decoder, summary, rates, fits, plots,
                additions, refreshSeconds));
        return new GroundProducts(fits.records(), decoder.stats(), summary, rates, outDir);
    }

    /** Writes {@code name} whole: a temporary file beside it, then a move over it. */
    private void replace(String name, byte[] content) throws IOException {
        Path tmp = outDir.resolve("." + name + ".tmp");
        Files.write(tmp, content);
        try {
            Files.move(tmp, outDir.resolve(name), StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } catch (java.nio.file.AtomicMoveNotSupportedException e) {
            Files.move(tmp, outDir.resolve(name), StandardCopyOption.REPLACE_EXISTING);
        }
    }

    @Override
    public void close() throws IOException {
        csv.close();
    }

    /**
     * Sends spectra to both the CSV writer and the fits, which both read the decoder's reused view in place.
     */
    private record Both(DecodeListener csv, DecodeListener fits) implements DecodeListener {
        @Override
        public void onSpectrumView(SpectrumView s) {
            csv.onSpectrumView(s);
            fits.onSpectrumView(s);
        }
    }
}
