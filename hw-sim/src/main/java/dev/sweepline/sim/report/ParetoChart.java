package dev.sweepline.sim.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import org.knowm.xchart.AnnotationText;
import org.knowm.xchart.BitmapEncoder;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * A campaign's accuracy against cost (telemetry rate or cadence): every parameter set a point labelled
 * with its set number (sets that fall on the same point share one label), the Pareto front's sets as
 * green squares (the front is taken over all objectives, so in this projection it need not be a
 * monotone curve: no line joins it), the recommended set as an orange diamond labelled "recommended",
 * and, when given, the downlink allocation as a vertical line. An empty campaign says so instead of
 * drawing a point.
 */
public final class ParetoChart {
    /** Colour of the recommended set's marker. */
    static final Color RECOMMENDED = new Color(230, 120, 0);
    /** Colour of the allocation line. */
    static final Color ALLOCATION = new Color(200, 30, 30);

    private ParetoChart() {
    }

    /**
     * One set.
     *
     * @param set         set number
     * @param x           its cost (bit/s or spectra/s)
     * @param y           its accuracy, %
     * @param front       on the Pareto front
     * @param recommended the recommended set
     */
    public record Point(int set, double x, double y, boolean front, boolean recommended) {
    }

    /** PNG of the chart; {@code allocation} NaN for no line. */
    public static byte[] render(String title, String xLabel, String yLabel, List<Point> points, double allocation)
            throws IOException {
        XYChart c = new XYChartBuilder().width(900).height(480).title(title).xAxisTitle(xLabel).yAxisTitle(yLabel)
                .build();
        c.getStyler().setChartBackgroundColor(Color.WHITE);
        c.getStyler().setMarkerSize(8);
        List<Point> shown = points.stream().filter(p -> Double.isFinite(p.x()) && Double.isFinite(p.y())).toList();
        if (shown.isEmpty()) {
            Charts.empty(c, "no set with finite results");
            return BitmapEncoder.getBitmapBytes(c, BitmapEncoder.BitmapFormat.PNG);
        }
        scatter(c, "all sets", shown, SeriesMarkers.CIRCLE, new Color(90, 110, 180));
        scatter(c, "Pareto front", shown.stream().filter(Point::front).toList(), SeriesMarkers.SQUARE,
                new Color(30, 150, 60));
        scatter(c, "recommended", shown.stream().filter(Point::recommended).toList(), SeriesMarkers.DIAMOND, RECOMMENDED);
        double yMin = shown.stream().mapToDouble(Point::y).min().orElse(0);
        double yMax = shown.stream().mapToDouble(Point::y).max().orElse(1);
        double xMin = shown.stream().mapToDouble(Point::x).min().orElse(0);
        double xMax = shown.stream().mapToDouble(Point::x).max().orElse(1);
        if (Double.isFinite(allocation)) {
            XYSeries a = c.addSeries("allocation", new double[] {allocation, allocation},
                    new double[] {yMin, yMax + 1e-12});
            a.setMarker(SeriesMarkers.NONE);
            a.setLineColor(ALLOCATION);
            a.setLineStyle(new BasicStroke(2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
                    new float[] {8f, 4f}, 0f));
            xMin = Math.min(xMin, allocation);
            xMax = Math.max(xMax, allocation);
        }
        double dy = (yMax - yMin) * 0.04 + 1e-12;
        java.util.Map<String, String> labels = new java.util.LinkedHashMap<>();
        java.util.Map<String, Point> at = new java.util.LinkedHashMap<>();
        for (Point p : shown) {
            String key = p.x() + "," + p.y();
            labels.merge(key, Integer.toString(p.set()) + (p.recommended() ? " recommended" : ""),
                    (a, b) -> a + ", " + b);
            at.putIfAbsent(key, p);
        }
        labels.forEach((key, text) -> c.addAnnotation(new AnnotationText(text, at.get(key).x(), at.get(key).y() + dy,
                false)));
        double padX = (xMax - xMin) * 0.05 + 1e-9;
        c.getStyler().setXAxisMin(xMin - padX).setXAxisMax(xMax + padX);
        c.getStyler().setYAxisMin(yMin - 2 * dy).setYAxisMax(yMax + 3 * dy);
        return BitmapEncoder.getBitmapBytes(c, BitmapEncoder.BitmapFormat.PNG);
    }

    private static void scatter(XYChart c, String name, List<Point> points, org.knowm.xchart.style.markers.Marker m,
            Color colour) {
        if (points.isEmpty()) {
            return;
        }
        Charts.scatter(c, name, points.stream().mapToDouble(Point::x).toArray(),
                points.stream().mapToDouble(Point::y).toArray(), m, colour);
    }
}
