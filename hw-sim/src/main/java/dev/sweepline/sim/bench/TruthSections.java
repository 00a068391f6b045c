package dev.sweepline.sim.bench;

import dev.sweepline.ground.report.QuickLookReport;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The bench's sections of a run's {@code report.html}: the ground's moment errors against the truth,
 * added after the ground's own quick-look (which knows no truth). They say where the truth is taken
 * (the plasma at mid-sweep, {@link GroundCheck}) and give the errors with and without the sweeps the
 * ground finds non-stationary ({@link NonStationarity}).
 */
public final class TruthSections {
    private TruthSections() {
    }

    /** The sections for {@code g}. */
    public static QuickLookReport of(GroundCheck.GroundFigures g) {
        QuickLookReport q = new QuickLookReport("bench");
        q.heading("Bench: the ground against the truth");
        q.paragraph("The ground's errors are compared with the plasma at mid-sweep (groundTruthAt in summary.json): "
                + "a sweep during which the plasma moved scores against its middle (decisions.csv truthChangeN, U, T "
                + "say by how much). z = (fit - truth) / Cramer-Rao bound; the rms ratio is the rms of z, the robust "
                + "ratio 1.4826 x median |z|.", null);
        MomentErrors st = g.stationary();
        List<List<String>> rows = new ArrayList<>();
        for (int k = 0; k < 3; k++) {
            rows.add(List.of(GroundCheck.GroundFigures.MOMENTS[k], pct(g.medianRelative()[k]), pct(g.p95Relative()[k]),
                    num(g.crlbRatio()[k]), num(g.robustCrlbRatio()[k]), pct(st.medianRelative()[k]),
                    pct(st.p95Relative()[k]), num(st.crlbRatio()[k]), num(st.robustCrlbRatio()[k])));
        }
        q.table(List.of("moment", "median error", "p95 error", "CRLB ratio rms", "robust", "unflagged median",
                "unflagged p95", "unflagged rms", "unflagged robust"), rows);
        q.paragraph(String.format(Locale.ROOT, "%d of %d compared fits flagged non-stationary (reduced chi-square "
                + "above the %.3f quantile of chi-square(nu)/nu); the unflagged columns leave them out.",
                g.nonStationary(), g.compared(), NonStationarity.QUANTILE), null);
        return q;
    }

    private static String pct(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.4f %%", 100 * v) : "n/a";
    }

    private static String num(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.2f", v) : "n/a";
    }
}
