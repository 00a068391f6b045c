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
