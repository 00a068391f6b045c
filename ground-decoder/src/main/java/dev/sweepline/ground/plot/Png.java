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
