package dev.sweepline.ground.plot;

import dev.sweepline.ground.fit.PlasmaFit;
import dev.sweepline.ground.fit.PlasmaModel;
import dev.sweepline.ground.fit.Species;
import dev.sweepline.ground.fit.SpectrumInput;
import java.awt.Color;
import java.util.ArrayList;
import java.util.List;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * One spectrum with its fit: measured window currents with 1σ bars against the window centre E/q
 * (log axes), the fitted total, protons and alphas; below, the normalised residuals (data − model)/σ.
 */
public final class SpectrumFitPlot {
    private SpectrumFitPlot() {
    }

    /**
     * PNG of the spectrum, its fit and residuals; {@code title} names the spectrum, currents below
     * {@code floorAmps} are drawn at it on the log axis.
     */
    public static byte[] render(SpectrumInput in, PlasmaFit fit, String title, double floorAmps, int width,
            int height) {
        int m = in.windows();
        PlasmaModel model = new PlasmaModel(in.lowVolts(), in.highVolts(), fit.areaM2(), fit.alphasFitted());
        double[] total = new double[m];
        double[] p = fit.normalParameters();
        boolean fitted = p.length == model.parameters();
        if (fitted) {
            model.evaluate(p, total, null);
        }
        List<Double> x = new ArrayList<>();
        List<Double> y = new ArrayList<>();
        List<Double> e = new ArrayList<>();
        List<Double> xm = new ArrayList<>();
        List<Double> ym = new ArrayList<>();
        List<Double> yp = new ArrayList<>();
        List<Double> ya = new ArrayList<>();
        List<Double> res = new ArrayList<>();
        for (int j = 0; j < m; j++) {
            double v = Math.sqrt(in.lowVolts()[j] * in.highVolts()[j]);
            if (!Png.finite(v, in.totalAmps()[j]) || v <= 0) {
                continue;
            }
            x.add(v);
            y.add(Math.max(in.totalAmps()[j], floorAmps));
            e.add(Math.min(in.sigmaAmps()[j], 0.9 * Math.max(in.totalAmps()[j], floorAmps)));
            if (fitted) {
                xm.add(v);
                ym.add(Math.max(total[j], floorAmps));
                yp.add(Math.max(model.speciesCurrent(Species.PROTON, j, p[0], p[1], p[2]), floorAmps));
                if (fit.alphasFitted()) {
                    ya.add(Math.max(model.speciesCurrent(Species.ALPHA, j, p[3], p[4], p[5]), floorAmps));
                }
                res.add((in.totalAmps()[j] - total[j]) / in.sigmaAmps()[j]);
            }
        }
        if (x.isEmpty()) {
            x.add(1.0);
            y.add(floorAmps);
            e.add(0.0);
        }
        XYChart c = new XYChartBuilder().width(width).height(height / 2).title(title)
                .xAxisTitle("E/q (V)").yAxisTitle("window current (A)").build();
        c.getStyler().setXAxisLogarithmic(true).setYAxisLogarithmic(true);
        c.getStyler().setChartBackgroundColor(Color.WHITE);
        c.getStyler().setMarkerSize(5);
        XYSeries d = c.addSeries("measured", x, y, e);
        d.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
        d.setMarkerColor(Color.BLACK);
        if (fitted) {
            line(c, "fit total", xm, ym, new Color(200, 40, 40));
            line(c, "protons", xm, yp, new Color(40, 90, 200));
            if (!ya.isEmpty()) {
                line(c, "alphas", xm, ya, new Color(30, 150, 60));
            }
        }
        XYChart r = new XYChartBuilder().width(width).height(height / 2).title("residuals (data - fit) / sigma")
                .xAxisTitle("E/q (V)").yAxisTitle("normalised residual").build();
        r.getStyler().setXAxisLogarithmic(true);
        r.getStyler().setLegendVisible(false);
        r.getStyler().setChartBackgroundColor(Color.WHITE);
        r.getStyler().setMarkerSize(5);
        XYSeries rs = r.addSeries("residual", fitted ? xm : x, fitted ? res : zeros(x.size()));
        rs.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
        return Png.stacked(List.of(c, r));
    }

    private static List<Double> zeros(int n) {
        List<Double> z = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            z.add(0.0);
        }
        return z;
    }

    private static void line(XYChart c, String name, List<Double> x, List<Double> y, Color colour) {
        XYSeries s = c.addSeries(name, x, y);
        s.setMarker(SeriesMarkers.NONE);
        s.setLineColor(colour);
    }
}
