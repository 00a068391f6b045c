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
 * The title carries the fit's reduced χ² and flags; the x-axis title says how many windows of each
 * curve lie below the plot's floor and are drawn at it (the log axis cannot show them).
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
        PlasmaModel model = new PlasmaModel(in.lowVolts(), in.highVolts(), fit.areaM2(), fit.alphasFitted(),
                fit.driftFitted() ? in.stepFraction() : null);
        double[] total = new double[m];
        double[] p = fit.normalParameters();
        boolean fitted = p.length == model.parameters();
        double du = fitted && model.withDrift() ? p[model.driftIndex()] : 0;
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
        int[] clipped = new int[4]; // measured, fit total, protons, alphas below the floor
        for (int j = 0; j < m; j++) {
            double v = Math.sqrt(in.lowVolts()[j] * in.highVolts()[j]);
            if (!Png.finite(v, in.totalAmps()[j]) || v <= 0) {
                continue;
            }
            x.add(v);
            clipped[0] += in.totalAmps()[j] < floorAmps ? 1 : 0;
            y.add(Math.max(in.totalAmps()[j], floorAmps));
            e.add(Math.min(in.sigmaAmps()[j], 0.9 * Math.max(in.totalAmps()[j], floorAmps)));
            if (fitted) {
                xm.add(v);
                ym.add(clip(total[j], floorAmps, clipped, 1));
                yp.add(clip(model.speciesCurrent(Species.PROTON, j, p[0], p[1], p[2], du), floorAmps, clipped, 2));
                if (fit.alphasFitted()) {
                    ya.add(clip(model.speciesCurrent(Species.ALPHA, j, p[3], p[4], p[5], du), floorAmps, clipped, 3));
                }
                res.add((in.totalAmps()[j] - total[j]) / in.sigmaAmps()[j]);
            }
        }
        if (x.isEmpty()) {
            return empty(title, width, height);
        }
        XYChart c = new XYChartBuilder().width(width).height(height / 2).title(title + " - " + fitNote(fit))
                .xAxisTitle("E/q (V); " + clipNote(clipped, floorAmps, fitted, fit.alphasFitted()))
                .yAxisTitle("window current (A)").build();
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

    /** Both panels saying there is no spectrum, with no point drawn. */
    private static byte[] empty(String title, int width, int height) {
        XYChart c = new XYChartBuilder().width(width).height(height / 2).title(title).xAxisTitle("E/q (V)")
                .yAxisTitle("window current (A)").build();
        XYChart r = new XYChartBuilder().width(width).height(height / 2).title("residuals (data - fit) / sigma")
                .xAxisTitle("E/q (V)").yAxisTitle("normalised residual").build();
        for (XYChart chart : List.of(c, r)) {
            chart.getStyler().setChartBackgroundColor(Color.WHITE);
            Png.empty(chart, "no spectrum fitted");
        }
        return Png.stacked(List.of(c, r));
    }

    /** The fit's reduced chi-square and flags, as the title shows them. */
    public static String fitNote(PlasmaFit fit) {
        String flags = fit.flagText();
        return (Double.isFinite(fit.reducedChiSquare())
                ? String.format(java.util.Locale.ROOT, "reduced chi-square %.2f", fit.reducedChiSquare())
                : "no reduced chi-square") + ", flags " + (flags.isEmpty() ? "none" : flags);
    }

    /** Where curves are clipped at the floor, as the x-axis title says it. */
    static String clipNote(int[] clipped, double floorAmps, boolean fitted, boolean alphas) {
        String floor = String.format(java.util.Locale.ROOT, "%.1e A", floorAmps);
        if (clipped[0] + clipped[1] + clipped[2] + clipped[3] == 0) {
            return "nothing below the " + floor + " floor";
        }
        StringBuilder b = new StringBuilder("drawn at the " + floor + " floor: measured " + clipped[0]);
        if (fitted) {
            b.append(", fit total ").append(clipped[1]).append(", protons ").append(clipped[2]);
            if (alphas) {
                b.append(", alphas ").append(clipped[3]);
            }
        }
        return b.append(" windows").toString();
    }

    private static double clip(double amps, double floorAmps, int[] clipped, int k) {
        if (amps < floorAmps) {
            clipped[k]++;
            return floorAmps;
        }
        return amps;
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
