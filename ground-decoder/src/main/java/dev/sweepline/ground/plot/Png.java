package dev.sweepline.ground.plot;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.List;
import org.knowm.xchart.BitmapEncoder;
import org.knowm.xchart.internal.chartpart.Chart;

/** PNG bytes of XChart charts (BitmapEncoder). */
final class Png {
    private Png() {
    }

    static byte[] of(Chart<?, ?> chart) {
        try {
            return BitmapEncoder.getBitmapBytes(chart, BitmapEncoder.BitmapFormat.PNG);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static <T extends Chart<?, ?>> byte[] stacked(List<T> charts) {
        try (java.io.ByteArrayOutputStream out = new java.io.ByteArrayOutputStream()) {
            BitmapEncoder.saveBitmap(charts, charts.size(), 1, out, BitmapEncoder.BitmapFormat.PNG);
            return out.toByteArray();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * Marks {@code chart} as having no data: an invisible series spans the unit square (XChart draws no
     * axes without one) and a note in the middle says why it is empty, so no point is drawn at (0, 0).
     */
    static void empty(org.knowm.xchart.XYChart chart, String note) {
        org.knowm.xchart.XYSeries s = chart.addSeries("none", new double[] {0, 1}, new double[] {0, 1});
        s.setMarker(org.knowm.xchart.style.markers.SeriesMarkers.NONE);
        s.setLineColor(new java.awt.Color(0, 0, 0, 0));
        s.setShowInLegend(false);
        chart.getStyler().setLegendVisible(false);
        chart.addAnnotation(new org.knowm.xchart.AnnotationText(note, 0.5, 0.5, false));
    }

    /** Finite values only, so that XChart never sees NaN. */
    static boolean finite(double... v) {
        for (double x : v) {
            if (!Double.isFinite(x)) {
                return false;
            }
        }
        return true;
    }
}
