package dev.sweepline.ground.product;

import java.util.List;
import java.util.function.DoubleFunction;

/**
 * What a caller that knows more than the telemetry adds to report.html: a reference ("truth") for the
 * moment plots, e.g. the simulated plasma of a bench run, and figures of its own, appended after the
 * ground's plots. The ground decodes nothing differently because of them.
 *
 * @param truthAtTai the reference at a TAI time (s), in the order and units of the moment panels: proton
 *                   density (cm^-3), speed (km/s), temperature (K), flow angle theta_x (deg), alpha
 *                   abundance n_a/n_p (%); NaN where it has none. Null: no reference drawn.
 * @param figures    figures appended to the report, in order
 */
public record ReportAdditions(DoubleFunction<double[]> truthAtTai, List<Figure> figures) {
    /** Nothing added: the report of the telemetry alone. */
    public static final ReportAdditions NONE = new ReportAdditions(null, List.of());

    /** Copies the list. */
    public ReportAdditions {
        figures = List.copyOf(figures);
    }

    /**
     * One figure.
     *
     * @param heading section heading above it
     * @param alt     the image's alternative text
     * @param png     the image, PNG
     * @param caption what it shows, under it
     */
    public record Figure(String heading, String alt, byte[] png, String caption) {
    }
}
