package dev.sweepline.ground.plot;

import java.awt.Color;
import java.util.ArrayList;
import java.util.List;
import java.util.function.IntToDoubleFunction;
import org.knowm.xchart.HeatMapChart;
import org.knowm.xchart.HeatMapChartBuilder;

/**
 * Spectrogram: time × E/q window, colour = log10 of the summed current (A), an XChart heat map. Spectra
 * are binned into at most {@value #MAX_TIME_BINS} columns (the brightest current of a bin is kept); cells
 * of windows not measured stay blank. Axis labels are thinned out to one in {@value #LABEL_EVERY}.
 */
public final class SpectrogramPlot {
    /** Columns at most: enough to see a focus/survey pattern, few enough for readable cells. */
    public static final int MAX_TIME_BINS = 80;
    /** One axis label in this many cells. */
    public static final int LABEL_EVERY = 8;

    private SpectrogramPlot() {
    }

    /**
     * PNG of the spectrogram.
     *
     * @param data       the spectra
     * @param windows    windows of the table (rows of the map)
     * @param edgeVolts  low edge of window w, volts (for the labels)
     * @param floorAmps  smallest current shown, A (smaller ones, and zero, are drawn at it)
     */
    public static byte[] render(SpectrogramData data, int windows, IntToDoubleFunction edgeVolts, double floorAmps,
            int width, int height) {
        List<SpectrogramData.Row> rows = data.rows();
        int bins = Math.max(1, Math.min(MAX_TIME_BINS, rows.size()));
        double t0 = rows.isEmpty() ? 0 : rows.get(0).secondsFromStart();
        double t1 = rows.isEmpty() ? 1 : rows.get(rows.size() - 1).secondsFromStart();
        double span = Math.max(t1 - t0, 1e-9);
        double[][] cell = new double[bins][windows];
        for (SpectrogramData.Row r : rows) {
            int b = (int) Math.min(bins - 1, Math.floor((r.secondsFromStart() - t0) / span * bins));
            for (int i = 0; i < r.totalAmps().length; i++) {
                int w = r.firstWindow() + i;
                double a = r.totalAmps()[i];
                if (w >= 0 && w < windows && Double.isFinite(a)) {
                    cell[b][w] = Math.max(cell[b][w], Math.max(a, floorAmps));
                }
            }
        }
        List<String> x = new ArrayList<>();
        for (int b = 0; b < bins; b++) {
            x.add(b % LABEL_EVERY == 0 ? String.format("%.0f", t0 + span * b / bins) : " ".repeat(b));
        }
        List<String> y = new ArrayList<>();
        for (int w = 0; w < windows; w++) {
            y.add(w % LABEL_EVERY == 0 ? String.format("%.0f", edgeVolts.applyAsDouble(w)) : " ".repeat(w));
        }
        List<Number[]> heat = new ArrayList<>();
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (int b = 0; b < bins; b++) {
            for (int w = 0; w < windows; w++) {
                if (cell[b][w] > 0) {
                    double v = Math.log10(cell[b][w]);
                    heat.add(new Number[] {b, w, v});
                    min = Math.min(min, v);
                    max = Math.max(max, v);
                }
            }
        }
        HeatMapChart chart = new HeatMapChartBuilder().width(width).height(height)
                .title("Spectrogram: log10 summed current (A)").xAxisTitle("time since start (s)")
                .yAxisTitle("E/q, window low edge (V)").build();
        chart.getStyler().setShowValue(false).setDrawBorder(false).setHeatMapValueDecimalPattern("0.0")
                .setRangeColors(new Color[] {new Color(20, 20, 80), new Color(40, 120, 200), new Color(120, 220, 120),
                    new Color(250, 240, 60), new Color(230, 60, 30)});
        chart.getStyler().setLegendVisible(true);
        chart.getStyler().setChartBackgroundColor(Color.WHITE);
        if (heat.isEmpty()) {
            heat.add(new Number[] {0, 0, Math.log10(floorAmps)});
            min = max = Math.log10(floorAmps);
        }
        chart.getStyler().setMin(min).setMax(max > min ? max : min + 1);
        chart.addSeries("log10 I", x, y, heat);
        return Png.of(chart);
    }
}
