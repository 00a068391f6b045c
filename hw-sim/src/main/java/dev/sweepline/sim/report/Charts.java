package dev.sweepline.sim.report;

import java.io.IOException;
import java.util.List;
import org.knowm.xchart.BitmapEncoder;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/** PNG charts for the bench's reports (XChart, headless). */
public final class Charts {
    static {
        System.setProperty("java.awt.headless", "true");
    }

    private Charts() {
    }

    /** A named series of points. */
    public record Series(String name, double[] x, double[] y, boolean line) {
    }

    /**
     * Marks {@code chart} as having no data: an invisible series spans the unit square (XChart draws no
     * axes without one) and {@code note} in the middle says why, so no point is drawn at (0, 0).
     */
    static void empty(XYChart chart, String note) {
        XYSeries none = chart.addSeries("none", new double[] {0, 1}, new double[] {0, 1});
        none.setMarker(SeriesMarkers.NONE);
        none.setLineColor(new java.awt.Color(0, 0, 0, 0));
        none.setShowInLegend(false);
        chart.getStyler().setLegendVisible(false);
        chart.addAnnotation(new org.knowm.xchart.AnnotationText(note, 0.5, 0.5, false));
    }

    /** Adds a scatter series of {@code marker}s in {@code colour}. */
    static XYSeries scatter(XYChart chart, String name, double[] x, double[] y,
            org.knowm.xchart.style.markers.Marker marker, java.awt.Color colour) {
        XYSeries s = chart.addSeries(name, x, y);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
        s.setMarker(marker);
        s.setMarkerColor(colour);
        return s;
    }

    /** An XY chart of {@code series} as PNG bytes. */
    public static byte[] xy(String title, String xLabel, String yLabel, List<Series> series) throws IOException {
        XYChart chart = new XYChartBuilder().width(900).height(480).title(title).xAxisTitle(xLabel)
                .yAxisTitle(yLabel).build();
        chart.getStyler().setLegendVisible(series.size() > 1);
        for (Series s : series) {
            XYSeries xy = chart.addSeries(s.name(), s.x(), s.y());
            if (s.line()) {
                xy.setMarker(SeriesMarkers.NONE);
            } else {
                xy.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            }
        }
        return BitmapEncoder.getBitmapBytes(chart, BitmapEncoder.BitmapFormat.PNG);
    }
}
