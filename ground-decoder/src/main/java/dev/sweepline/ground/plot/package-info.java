/**
 * XChart plots as PNG bytes (BitmapEncoder): {@link dev.sweepline.ground.plot.SpectrogramPlot} (time × E/q
 * heat map of log10 current), {@link dev.sweepline.ground.plot.MomentsPlot} (moments over time with 1σ
 * error bars) and {@link dev.sweepline.ground.plot.SpectrumFitPlot} (one spectrum, its fit by species and
 * the normalised residuals). Inputs are plain arrays and fit results, never NaN handed to XChart (points
 * that are not finite are left out). Verified by decoding every image of the report
 * ({@code QuickLookReportTest}) and by looking at them.
 */
package dev.sweepline.ground.plot;
