package dev.sweepline.ground.plot;

import java.awt.Color;
import java.util.ArrayList;
import java.util.List;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/** Moments over time with 1σ error bars, one panel per quantity, stacked in one PNG. */
public final class MomentsPlot {
    private MomentsPlot() {
    }

    /** PNG with one panel per series. */
    public static byte[] render(List<TimeSeries> series, int width, int panelHeight) {
        List<XYChart> charts = new ArrayList<>();
        for (TimeSeries s : series) {
            XYChart c = new XYChartBuilder().width(width).height(panelHeight).title(s.name())
                    .xAxisTitle("time since start (s)").yAxisTitle(s.name()).build();
            c.getStyler().setLegendVisible(false);
            c.getStyler().setChartBackgroundColor(Color.WHITE);
            c.getStyler().setMarkerSize(4);
            c.getStyler().setErrorBarsColorSeriesColor(true);
            List<Double> x = new ArrayList<>();
            List<Double> y = new ArrayList<>();
            List<Double> e = new ArrayList<>();
            for (int i = 0; i < s.values().length; i++) {
                if (Png.finite(s.seconds()[i], s.values()[i])) {
                    x.add(s.seconds()[i]);
                    y.add(s.values()[i]);
                    e.add(Double.isFinite(s.sigma()[i]) ? s.sigma()[i] : 0.0);
                }
            }
            if (x.isEmpty()) {
                x.add(0.0);
                y.add(0.0);
                e.add(0.0);
                c.setTitle(s.name() + " (no fit)");
            }
            XYSeries d = c.addSeries("fit", x, y, e);
            d.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            d.setMarker(SeriesMarkers.CIRCLE);
            if (Double.isFinite(s.truth())) {
                XYSeries t = c.addSeries("truth", new double[] {x.get(0), x.get(x.size() - 1)},
                        new double[] {s.truth(), s.truth()});
                t.setMarker(SeriesMarkers.NONE);
                t.setLineColor(Color.GRAY);
            }
            charts.add(c);
        }
        return Png.stacked(charts);
    }
}
