package dev.sweepline.sim.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.io.ByteArrayOutputStream;
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
 * An orbit plan's budget over time, two panels in one PNG. Top: the telemetry rate hour by hour against
 * the phase's allocation, with the phase boundaries as vertical lines labelled with the phase and its
 * margin. Bottom: the onboard store's level against its capacity, with the downlink passes as shaded
 * bands (or a note when the plan has no store).
 */
public final class BudgetChart {
    /** Colour of the allocation and capacity lines. */
    static final Color LIMIT = new Color(200, 30, 30);
    /** Colour of the downlink passes. */
    static final Color PASS = new Color(120, 200, 120, 140);

    private BudgetChart() {
    }

    /** One hour: its start (h), the rate and allocation (bit/s), the store level (Mbit, NaN without a store). */
    public record Hour(double hours, double bitsPerSecond, double allocationBitsPerSecond, double storeMegabits) {
    }

    /** A phase: its name, start (h) and margin (fraction of the allocation; negative: over). */
    public record Phase(String name, double startHours, double margin) {
    }

    /** A downlink pass: start and length, hours. */
    public record Pass(double startHours, double hours) {
    }

    /** PNG of both panels; {@code capacityMegabits} NaN when the plan has no store. */
    public static byte[] render(List<Hour> hours, List<Phase> phases, List<Pass> passes, double capacityMegabits)
            throws IOException {
        double end = hours.isEmpty() ? 1 : hours.get(hours.size() - 1).hours() + 1;
        XYChart rate = panel("Telemetry rate against the allocation", "bit/s");
        XYChart store = panel("Onboard store", "Mbit");
        if (hours.isEmpty()) {
            Charts.empty(rate, "no hours in the plan");
            Charts.empty(store, "no hours in the plan");
        } else {
            double top = 0;
            for (Hour h : hours) {
                top = Math.max(top, Math.max(h.bitsPerSecond(), h.allocationBitsPerSecond()));
            }
            steps(rate, "rate", hours, true, new Color(40, 90, 200), null);
            steps(rate, "allocation", hours, false, LIMIT, dashed());
            boundaries(rate, phases, top * 1.1);
            rate.getStyler().setYAxisMin(0.0).setYAxisMax(top * 1.15);
            if (Double.isNaN(capacityMegabits)) {
                Charts.empty(store, "the plan has no onboard store: every hour must fit its allocation");
            } else {
                double high = capacityMegabits;
                for (Hour h : hours) {
                    high = Math.max(high, h.storeMegabits());
                }
                shade(store, passes, high * 1.05);
                XYSeries level = store.addSeries("store level", hours.stream().mapToDouble(h -> h.hours() + 1).toArray(),
                        hours.stream().mapToDouble(Hour::storeMegabits).toArray());
                level.setMarker(SeriesMarkers.NONE);
                level.setLineColor(new Color(40, 90, 200));
                XYSeries cap = store.addSeries("capacity", new double[] {0, end},
                        new double[] {capacityMegabits, capacityMegabits});
                cap.setMarker(SeriesMarkers.NONE);
                cap.setLineColor(LIMIT);
                cap.setLineStyle(dashed());
                boundaries(store, phases, high * 1.05);
                store.getStyler().setYAxisMin(0.0).setYAxisMax(high * 1.1);
            }
        }
        for (XYChart c : List.of(rate, store)) {
            c.getStyler().setXAxisMin(0.0).setXAxisMax(end);
        }
        try (ByteArrayOutputStream out = new ByteArrayOutputStream()) {
            BitmapEncoder.saveBitmap(List.of(rate, store), 2, 1, out, BitmapEncoder.BitmapFormat.PNG);
            return out.toByteArray();
        }
    }

    private static XYChart panel(String title, String yLabel) {
        XYChart c = new XYChartBuilder().width(1000).height(360).title(title).xAxisTitle("hours from plan start")
                .yAxisTitle(yLabel).build();
        c.getStyler().setChartBackgroundColor(Color.WHITE);
        return c;
    }

    /** A quantity held through each hour: a step line from the hour's start to its end. */
    private static void steps(XYChart c, String name, List<Hour> hours, boolean rate, Color colour, BasicStroke stroke) {
        List<Double> x = new ArrayList<>();
        List<Double> y = new ArrayList<>();
        for (Hour h : hours) {
            double v = rate ? h.bitsPerSecond() : h.allocationBitsPerSecond();
            x.add(h.hours());
            y.add(v);
            x.add(h.hours() + 1);
            y.add(v);
        }
        XYSeries s = c.addSeries(name, x, y);
        s.setMarker(SeriesMarkers.NONE);
        s.setLineColor(colour);
        if (stroke != null) {
            s.setLineStyle(stroke);
        }
    }

    /** Phase boundaries as grey vertical lines, each labelled with its phase and margin. */
    private static void boundaries(XYChart c, List<Phase> phases, double top) {
        int i = 0;
        for (Phase p : phases) {
            XYSeries s = c.addSeries("phase boundary" + (i == 0 ? "" : " " + i), new double[] {p.startHours(),
                p.startHours()}, new double[] {0, top});
            s.setMarker(SeriesMarkers.NONE);
            s.setLineColor(new Color(130, 130, 130));
            s.setShowInLegend(i == 0);
            String margin = Double.isFinite(p.margin()) ? String.format(java.util.Locale.ROOT, "%+.1f %%",
                    100 * p.margin()) : "";
            c.addAnnotation(new AnnotationText(p.name() + " " + margin, p.startHours(), top * (0.97 - 0.06 * (i % 2)),
                    false));
            i++;
        }
    }

    /** Downlink passes as filled bands up to {@code top}. */
    private static void shade(XYChart c, List<Pass> passes, double top) {
        int i = 0;
        for (Pass p : passes) {
            XYSeries s = c.addSeries("downlink pass" + (i == 0 ? "" : " " + i), new double[] {p.startHours(),
                p.startHours(), p.startHours() + p.hours(), p.startHours() + p.hours()}, new double[] {0, top, top, 0});
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Area);
            s.setMarker(SeriesMarkers.NONE);
            s.setFillColor(PASS);
            s.setLineColor(PASS);
            s.setShowInLegend(i == 0);
            i++;
        }
    }

    private static BasicStroke dashed() {
        return new BasicStroke(2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {8f, 4f}, 0f);
    }
}
