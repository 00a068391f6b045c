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
 * of windows not measured stay blank (white, no grid over them). The time axis is labelled at round
 * multiples of a 1-2-5 step, the E/q axis at the 1-2-5 voltages (10, 20, 50, 100 V ...) on the window
 * that holds each; the colour bar runs between half decades.
 */
public final class SpectrogramPlot {
    /** Columns at most: enough to see a focus/survey pattern, few enough for readable cells. */
    public static final int MAX_TIME_BINS = 80;
    /** About this many labels on the time axis. */
    static final int TIME_LABELS = 8;

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
        List<String> x = timeLabels(t0, span, bins);
        List<String> y = voltLabels(windows, edgeVolts);
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
                .yAxisTitle("E/q (V), on the window holding it").build();
        chart.getStyler().setShowValue(false).setDrawBorder(false).setHeatMapValueDecimalPattern("0.0")
                .setRangeColors(new Color[] {new Color(20, 20, 80), new Color(40, 120, 200), new Color(120, 220, 120),
                    new Color(250, 240, 60), new Color(230, 60, 30)});
        chart.getStyler().setLegendVisible(true);
        chart.getStyler().setChartBackgroundColor(Color.WHITE);
        chart.getStyler().setPlotBackgroundColor(Color.WHITE);
        chart.getStyler().setPlotGridLinesVisible(false);
        if (heat.isEmpty()) {
            // no spectrum: a chart that says so, not a cell drawn at (0, 0)
            org.knowm.xchart.XYChart empty = new org.knowm.xchart.XYChartBuilder().width(width).height(height)
                    .title("Spectrogram: no spectrum decoded").xAxisTitle("time since start (s)")
                    .yAxisTitle("E/q (V)").build();
            empty.getStyler().setChartBackgroundColor(Color.WHITE);
            Png.empty(empty, "no spectrum decoded");
            return Png.of(empty);
        }
        double low = Math.floor(min * 2) / 2;
        double high = Math.ceil(max * 2) / 2;
        chart.getStyler().setMin(low).setMax(high > low ? high : low + 0.5);
        chart.addSeries("log10 I", x, y, heat);
        return Png.of(chart);
    }

    /** One label per round multiple of a 1-2-5 step of seconds, on the bin holding it; blanks elsewhere. */
    static List<String> timeLabels(double t0, double span, int bins) {
        double step = niceStep(span / TIME_LABELS);
        String[] label = new String[bins];
        for (double t = Math.ceil(t0 / step) * step; t <= t0 + span; t += step) {
            int b = (int) Math.min(bins - 1, Math.floor((t - t0) / span * bins));
            if (label[b] == null) {
                label[b] = format(t);
            }
        }
        return blanksFilled(label);
    }

    /** 1-2-5 voltages, each on the window whose [low edge, next low edge) holds it; blanks elsewhere. */
    static List<String> voltLabels(int windows, IntToDoubleFunction edgeVolts) {
        String[] label = new String[windows];
        for (int w = 0; w + 1 < windows; w++) {
            double lo = edgeVolts.applyAsDouble(w);
            double hi = edgeVolts.applyAsDouble(w + 1);
            for (double decade = Math.pow(10, Math.floor(Math.log10(Math.max(lo, 1e-9)))); decade <= hi; decade *= 10) {
                for (int m : new int[] {1, 2, 5}) {
                    double v = m * decade;
                    if (v >= lo && v < hi && label[w] == null) {
                        label[w] = format(v);
                    }
                }
            }
        }
        return blanksFilled(label);
    }

    /** The smallest of 1, 2, 5 x 10^k at or above {@code rough}. */
    static double niceStep(double rough) {
        double decade = Math.pow(10, Math.floor(Math.log10(Math.max(rough, 1e-9))));
        for (int m : new int[] {1, 2, 5, 10}) {
            if (m * decade >= rough * (1 - 1e-9)) {
                return m * decade;
            }
        }
        return 10 * decade;
    }

    private static String format(double v) {
        return Math.abs(v - Math.rint(v)) < 1e-9 ? Long.toString(Math.round(v))
                : String.format(java.util.Locale.ROOT, "%.3g", v);
    }

    /** Unlabelled cells get blanks of distinct lengths: XChart's category axis needs distinct names. */
    private static List<String> blanksFilled(String[] label) {
        List<String> out = new ArrayList<>();
        for (int i = 0; i < label.length; i++) {
            out.add(label[i] != null ? label[i] : " ".repeat(i + 1));
        }
        return out;
    }
}
