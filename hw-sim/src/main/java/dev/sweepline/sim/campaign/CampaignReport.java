package dev.sweepline.sim.campaign;

import dev.sweepline.sim.report.Charts;
import dev.sweepline.sim.report.HtmlReport;
import dev.sweepline.fsw.host.yaml.FileFormatException;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The campaign's one-file report and its plots: the Pareto front of accuracy against telemetry rate
 * and against cadence ({@code pareto.png}), the table of sets and the recommendation.
 */
final class CampaignReport {
    private CampaignReport() {
    }

    static void write(Path dir, CampaignSpec spec, List<SetResult> sets, List<SetResult> front, SetResult best,
            String recommendationNote) throws IOException {
        byte[] rate = chart(sets, front, true);
        byte[] cadence = chart(sets, front, false);
        Files.write(dir.resolve("pareto.png"), rate);
        Files.write(dir.resolve("pareto-cadence.png"), cadence);
        HtmlReport h = new HtmlReport("Tuning campaign: " + spec.name());
        h.paragraph(spec.description(), false);
        h.paragraph(String.format(Locale.ROOT, "%d parameter sets x %d ensemble members of %.0f s on scenario '%s'"
                + " (seed %d)%s.", spec.setCount(), spec.runsPerSet(), spec.durationSeconds(), spec.base().name(),
                spec.seed(), Double.isNaN(spec.allocationBitsPerSecond()) ? ""
                        : String.format(Locale.ROOT, ", allocation %.0f bit/s", spec.allocationBitsPerSecond())), false);
        h.paragraph(best == null ? "No set met the recommendation rules (no alpha lock, every jump reacquired, "
                + "worst lock fraction >= 0.99, worst run within the allocation)."
                : String.format(Locale.ROOT, "Recommended: set %d (%s): median errors n %.3f %%, U %.4f %%, T %.3f %%; "
                + "%.2f spectra/s; %.0f bit/s; D-efficiency %.3f. Uplink it as recommended.table.", best.set(),
                describe(spec, best), 100 * best.momentError()[0], 100 * best.momentError()[1],
                100 * best.momentError()[2], best.spectraPerSecond(), best.bitsPerSecondMean(),
                best.informationEfficiency()), true);
        h.paragraph("Within the noise: " + recommendationNote + ".", false);
        h.heading("Pareto front");
        h.image(rate, "accuracy against telemetry rate, Pareto front marked");
        h.image(cadence, "accuracy against cadence, Pareto front marked");
        h.heading("Parameter sets");
        List<List<String>> rows = new ArrayList<>();
        for (SetResult s : sets) {
            rows.add(List.of(Integer.toString(s.set()), describe(spec, s), pct(s.momentError()[0]),
                    pct(s.momentError()[1]), pct(s.momentError()[2]), num(s.crlbRatio()[0]), num(s.lockFractionMean()),
                    Integer.toString(s.alphaLocks()), num(s.spectraPerSecond()),
                    String.format(Locale.ROOT, "%.0f", s.bitsPerSecondMean()), num(s.informationEfficiency()),
                    front.contains(s) ? "yes" : ""));
        }
        h.table(List.of("set", "parameters", "err n %", "err U %", "err T %", "n / CRLB", "lock", "alpha locks",
                "spectra/s", "bit/s", "D-eff.", "front"), rows);
        h.write(dir.resolve("report.html"));
    }

    private static byte[] chart(List<SetResult> sets, List<SetResult> front, boolean rate) throws IOException {
        List<Charts.Series> series = new ArrayList<>();
        series.add(points("all sets", sets, rate));
        series.add(points("Pareto front", front, rate));
        return Charts.xy(rate ? "Accuracy against telemetry rate" : "Accuracy against cadence",
                rate ? "telemetry, bit/s" : "cadence, spectra per second",
                "mean median error of n, U, T (%)", series);
    }

    private static Charts.Series points(String name, List<SetResult> sets, boolean rate) {
        List<SetResult> shown = new ArrayList<>();
        for (SetResult s : sets) {
            if (Double.isFinite(s.accuracy())) {
                shown.add(s);
            }
        }
        double[] x = new double[shown.size()];
        double[] y = new double[shown.size()];
        for (int i = 0; i < shown.size(); i++) {
            x[i] = rate ? shown.get(i).bitsPerSecondMean() : shown.get(i).spectraPerSecond();
            y[i] = 100 * shown.get(i).accuracy();
        }
        if (x.length == 0) { // XChart needs a point; an empty campaign shows none at the origin
            return new Charts.Series(name, new double[] {0}, new double[] {0}, false);
        }
        return new Charts.Series(name, x, y, false);
    }

    private static String describe(CampaignSpec spec, SetResult s) {
        StringBuilder b = new StringBuilder();
        for (int a = 0; a < spec.grid().size(); a++) {
            b.append(a == 0 ? "" : ", ").append(spec.grid().get(a).parameter().key()).append(' ')
                    .append(FileFormatException.number(s.values()[a]));
        }
        return b.toString();
    }

    private static String pct(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.4f", 100 * v) : "";
    }

    private static String num(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.3f", v) : "";
    }
}
