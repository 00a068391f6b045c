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
 * The sweep-decision chart of a bench run: for every sweep, against its mid-time, the focus band the
 * flight software stepped (low and high window; survey sweeps, which step the whole table, as marks
 * along the top), the proton peak it found, and the true proton and alpha peak windows; vertical lines mark mode changes (grey, labelled with the new mode) and timed events (red,
 * labelled). Windows are the table's window indices, so the chart reads the same for any instrument.
 */
public final class DecisionChart {
    /** Labels drawn at most per kind of marker, so that a run of many mode changes stays readable. */
    static final int MAX_LABELS = 12;

    private DecisionChart() {
    }

    /**
     * One sweep.
     *
     * @param seconds   mid-time, s
     * @param focus     a focus sweep (else a survey or safe sweep over the whole table)
     * @param first     lowest window stepped
     * @param last      highest window stepped
     * @param peak      the proton peak found, windows (NaN: none)
     * @param trueProton window of the true proton peak (negative: none)
     * @param trueAlpha window of the true alpha peak (negative: none)
     */
    public record Sweep(double seconds, boolean focus, int first, int last, double peak, int trueProton, int trueAlpha) {
    }

    /** A vertical marker at {@code seconds}; {@code event} false for a mode change. */
    public record Marker(double seconds, String label, boolean event) {
    }

    /** PNG of the chart ({@code windows}: the table's window count, the height of the y axis). */
    public static byte[] render(List<Sweep> sweeps, List<Marker> markers, int windows) throws IOException {
        XYChart c = new XYChartBuilder().width(1000).height(520).title("Sweep decisions against the truth")
                .xAxisTitle("time since start (s)").yAxisTitle("E/q window").build();
        c.getStyler().setChartBackgroundColor(Color.WHITE);
        c.getStyler().setMarkerSize(4);
        c.getStyler().setYAxisMin(0.0).setYAxisMax((double) windows);
        if (sweeps.isEmpty()) {
            c.getStyler().setYAxisMax(1.0);
            Charts.empty(c, "no sweep completed");
            return BitmapEncoder.getBitmapBytes(c, BitmapEncoder.BitmapFormat.PNG);
        }
        List<Double> t = new ArrayList<>();
        List<Double> lo = new ArrayList<>();
        List<Double> hi = new ArrayList<>();
        List<Double> st = new ArrayList<>();
        List<Double> sv = new ArrayList<>();
        List<Double> pt = new ArrayList<>();
        List<Double> pv = new ArrayList<>();
        List<Double> tp = new ArrayList<>();
        List<Double> vp = new ArrayList<>();
        List<Double> ta = new ArrayList<>();
        List<Double> va = new ArrayList<>();
        for (Sweep s : sweeps) {
            if (s.focus()) {
                t.add(s.seconds());
                lo.add((double) s.first());
                hi.add((double) s.last());
            } else {
                st.add(s.seconds());
                sv.add(windows - 1.0);
            }
            add(pt, pv, s.seconds(), s.peak(), Double.isFinite(s.peak()));
            add(tp, vp, s.seconds(), s.trueProton(), s.trueProton() >= 0 && s.trueProton() < windows);
            add(ta, va, s.seconds(), s.trueAlpha(), s.trueAlpha() >= 0 && s.trueAlpha() < windows);
        }
        if (!t.isEmpty()) {
            line(c, "focus band low edge", unbox(t), unbox(lo), new Color(150, 170, 220), 1f);
            line(c, "focus band high edge", unbox(t), unbox(hi), new Color(90, 110, 180), 1f);
        }
        if (!st.isEmpty()) {
            Charts.scatter(c, "survey sweep", unbox(st), unbox(sv), SeriesMarkers.TRIANGLE_DOWN, new Color(120, 120, 120));
        }
        if (!tp.isEmpty()) {
            line(c, "true proton peak", unbox(tp), unbox(vp), new Color(20, 20, 20), 2f);
        }
        if (!ta.isEmpty()) {
            line(c, "true alpha peak", unbox(ta), unbox(va), new Color(30, 150, 60), 2f);
        }
        if (!pt.isEmpty()) {
            Charts.scatter(c, "found peak", unbox(pt), unbox(pv), SeriesMarkers.CIRCLE, new Color(220, 60, 30));
        }
        markers(c, markers, windows);
        return BitmapEncoder.getBitmapBytes(c, BitmapEncoder.BitmapFormat.PNG);
    }

    /** Each marker a vertical two-point series; the first of each kind in the legend, labels on top. */
    private static void markers(XYChart c, List<Marker> markers, int windows) {
        int[] labelled = new int[2];
        int[] count = new int[2];
        for (Marker m : markers) {
            int kind = m.event() ? 1 : 0;
            String name = (m.event() ? "event" : "mode change") + (count[kind] == 0 ? "" : " " + count[kind]);
            XYSeries s = c.addSeries(name, new double[] {m.seconds(), m.seconds()}, new double[] {0, windows});
            s.setMarker(SeriesMarkers.NONE);
            s.setLineColor(m.event() ? new Color(200, 30, 30) : new Color(140, 140, 140));
            s.setLineStyle(new BasicStroke(1f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
                    m.event() ? new float[] {6f, 4f} : new float[] {2f, 3f}, 0f));
            s.setShowInLegend(count[kind] == 0);
            count[kind]++;
            if (labelled[kind] < MAX_LABELS) {
                c.addAnnotation(new AnnotationText(m.label(), m.seconds(), windows * (m.event() ? 0.9 : 0.82 - 0.04 * (labelled[kind] % 3)), false));
                labelled[kind]++;
            }
        }
    }

    private static void add(List<Double> x, List<Double> y, double t, double v, boolean keep) {
        if (keep) {
            x.add(t);
            y.add(v);
        }
    }

    private static void line(XYChart c, String name, double[] x, double[] y, Color colour, float width) {
        XYSeries s = c.addSeries(name, x, y);
        s.setMarker(SeriesMarkers.NONE);
        s.setLineColor(colour);
        s.setLineStyle(new BasicStroke(width));
    }

    private static double[] unbox(List<Double> v) {
        double[] a = new double[v.size()];
        for (int i = 0; i < a.length; i++) {
            a[i] = v.get(i);
        }
        return a;
    }
}
