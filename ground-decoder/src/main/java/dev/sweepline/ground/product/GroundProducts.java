package dev.sweepline.ground.product;

import dev.sweepline.ground.decode.DecodeStats;
import java.nio.file.Path;
import java.util.List;

/**
 * What {@link GroundProcessing#process} produced.
 *
 * @param moments      one record per decoded spectrum, in stream order
 * @param stats        the decoder's counts
 * @param fits         counts over the fits
 * @param bitsPerSecond bit rates of the run
 * @param outDir       where the files are: spectra.csv, summary.json, moments.csv, moments.json,
 *                     spectrogram.png, moments.png, spectrum-fit.png, report.html
 */
public record GroundProducts(List<MomentRecord> moments, DecodeStats stats, FitSummary fits, BitRates bitsPerSecond,
        Path outDir) {
    /** The quick-look report. */
    public Path report() {
        return outDir.resolve(GroundProcessing.REPORT);
    }
}
