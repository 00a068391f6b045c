/**
 * Ground products of a run, and the API other modules call:
 * {@link dev.sweepline.ground.product.GroundProcessing#process(java.nio.file.Path, java.nio.file.Path,
 * java.util.OptionalDouble)} returns {@link dev.sweepline.ground.product.GroundProducts} (the
 * {@link dev.sweepline.ground.product.MomentRecord}s, decode stats, fit counts, bit rates) and writes
 * spectra.csv, summary.json (with a {@code fits} section), moments.csv, moments.json, three PNGs and
 * report.html. {@link dev.sweepline.ground.product.GroundSession} is the same processing fed as octets
 * arrive, writing the products of what has come so far (each file replaced whole); a caller that knows
 * the truth (the bench) hands {@link dev.sweepline.ground.product.ReportAdditions}: a reference line for
 * the moment plots and figures of its own.
 *
 * <h2>Design note</h2>
 * <p>{@link dev.sweepline.ground.product.FitCollector} listens to the decoder and fits each spectrum as it
 * arrives (one thread), with the fitter of the spectrum's instrument and the bound of
 * {@code dev.sweepline.ground.bound}; so memory grows with the records, not with the spectra. spectra.csv,
 * moments.csv and moments.json name each row's instrument; summary.json counts the spectra by instrument.
 * The spectrogram is drawn on the default-table E/q windows of the instrument with the most spectra (the
 * report says so and how many spectra of other instruments it leaves out); plot floors are a tenth of one
 * count of the instrument's most sensitive range. Values not available are NaN in the records and become an
 * empty CSV cell
 * or JSON null: no product carries NaN or Infinity. {@link dev.sweepline.ground.product.SpectraCsvWriter} reads
 * the decoder's reused spectrum view and prints each number as its {@code Double.toString} text from one reused
 * buffer (no boxing per cell); the fits take the owned copy they keep. Bits per second are packet octets × 8 over the time
 * span of the decoded packets, per APID, and frames × (L + 4 ASM) × 8 for the downlink.
 *
 * <p>Requirements and how each is verified ({@code GroundProcessingTest}, {@code QuickLookReportTest}):
 * <ol>
 *   <li>P1 synthetic near-Sun telemetry fits near its truth with alphas and angles.</li>
 *   <li>P2 degenerate spectra are flagged and counted; the CSV and JSON have no NaN or Infinity.</li>
 *   <li>P3 decode on the command line writes every product; --allocation appears in the report.</li>
 *   <li>P4 the report is well-formed XHTML, self-contained, its images decode, Chromium renders it.</li>
 *   <li>P5 layout-2 telemetry of the fine cup is processed with its own description: moments near the truth,
 *       its 256 windows in spectra.csv, its spectrogram ({@code FineCupProcessingTest}).</li>
 *   <li>P6 empty maps read "none", the allocation sentence follows the bit rates, moments.json carries the
 *       sigma and alpha fields of moments.csv ({@code ReportContentTest}); plot labels fall on 1-2-5 values
 *       and an empty series draws no point ({@code PlotLabelsTest}).</li>
 *   <li>P8 a spectrum flagged interleaved (telemetry ICD §4 flags bit 5) and fitted with the speed drift has
 *       moments.csv's {@code du_kms} (ΔU, the bulk speed's change over the sweep; docs/physics.md, "Speed drift
 *       within an interleaved sweep") and {@code sigma_du_kms} (its 1σ from the fit covariance, the Cramér–Rao
 *       bound's at the truth) and moments.json's {@code duKmPerS} and {@code sigmaDuKmPerS}; a monotonic one has
 *       them empty and null; the quick-look's Fits table counts the drift fits with their median |ΔU|
 *       ({@code SpeedChangeColumnsTest}).</li>
 *   <li>P7 spectra.csv from the view is the file commons-csv's {@code printRecord} of the boxed values gives:
 *       survey and focus, currents either side of zero, unknown edges ({@code SpectraCsvWriterTest}).</li>
 * </ol>
 */
package dev.sweepline.ground.product;
