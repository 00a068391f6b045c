package dev.sweepline.ground.plot;

import java.awt.Color;
import java.util.ArrayList;
import java.util.List;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Moments over time with 1σ error bars, one panel per quantity, stacked in one PNG; a reference
 * ("truth", e.g. a simulation's plasma) is drawn as a grey line where the series has one. A panel with
 * nothing to show says so instead of drawing a point.
 */
public final class MomentsPlot {
    /** Colour of the reference line. */
    static final Color TRUTH = new Color(110, 110, 110);

    private MomentsPlot() {
    }

    /** PNG with one panel per series. */
    public static byte[] render(List<TimeSeries> series, int width, int panelHeight) {
        List<XYChart> charts = new ArrayList<>();
        for (TimeSeries s : series) {
            XYChart c = new XYChartBuilder().width(width).height(panelHeight).title(s.name())
                    .xAxisTitle("time since start (s)").yAxisTitle(s.name()).build();
            c.getStyler().setChartBackgroundColor(Color.WHITE);
            c.getStyler().setMarkerSize(4);
            c.getStyler().setErrorBarsColorSeriesColor(true);
            List<Double> x = new ArrayList<>();
            List<Double> y = new ArrayList<>();
            List<Double> e = new ArrayList<>();
            List<Double> tx = new ArrayList<>();
            List<Double> ty = new ArrayList<>();
            for (int i = 0; i < s.values().length; i++) {
                if (Png.finite(s.seconds()[i], s.values()[i])) {
                    x.add(s.seconds()[i]);
                    y.add(s.values()[i]);
                    e.add(Double.isFinite(s.sigma()[i]) ? s.sigma()[i] : 0.0);
                }
                if (s.truth() != null && Png.finite(s.seconds()[i], s.truth()[i])) {
                    tx.add(s.seconds()[i]);
                    ty.add(s.truth()[i]);
                }
            }
            c.getStyler().setLegendVisible(!tx.isEmpty());
            if (x.isEmpty() && tx.isEmpty()) {
                Png.empty(c, "no fitted spectrum");
                charts.add(c);
                continue;
            }
            if (!x.isEmpty()) {
                XYSeries d = c.addSeries("fit", x, y, e);
                d.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
                d.setMarker(SeriesMarkers.CIRCLE);
            }
            if (!tx.isEmpty()) {
                XYSeries t = c.addSeries("truth", tx, ty);
                t.setMarker(SeriesMarkers.NONE);
                t.setLineColor(TRUTH);
            }
            charts.add(c);
        }
        return Png.stacked(charts);
    }
}
