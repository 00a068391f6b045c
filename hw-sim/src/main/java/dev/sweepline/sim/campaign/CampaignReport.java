package dev.sweepline.sim.campaign;

import dev.sweepline.sim.report.HtmlReport;
import dev.sweepline.sim.report.ParetoChart;
import dev.sweepline.fsw.host.yaml.FileFormatException;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The campaign's one-file report and its plots: the Pareto front of accuracy against telemetry rate
 * (with the allocation) and against cadence ({@code pareto.png}, {@code pareto-cadence.png}), every
 * point labelled with its set and the recommended set marked; the recommendation; a warning naming
 * any grid axis that changed nothing ({@link InertAxes}); the recommended set side by side with the
 * one it is compared with; the table of sets, with the reacquisition after jumps when the scenario has
 * any.
 */
final class CampaignReport {
    private CampaignReport() {
    }

    static void write(Path dir, CampaignSpec spec, List<SetResult> sets, List<SetResult> front, SetResult best,
            String recommendationNote, List<String> inertAxes, SetResult left, SetResult right) throws IOException {
        byte[] rate = chart(spec, sets, front, best, true);
        byte[] cadence = chart(spec, sets, front, best, false);
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
        for (String axis : inertAxes) {
            h.paragraph("Warning: the grid axis " + axis + " changed nothing: every one of its values gave the same "
                    + "runs (every metric alike for each ensemble member and each combination of the other axes). "
                    + "The parameter never came into play on this scenario; change its values or the scenario, or "
                    + "drop the axis.", true);
        }
        h.heading("Pareto front");
        h.image(rate, "accuracy against telemetry rate, Pareto front marked");
        h.image(cadence, "accuracy against cadence, Pareto front marked");
        if (left != null && right != null && left != right) {
            h.heading("Side by side: set " + left.set() + " and set " + right.set());
            h.table(List.of("", sideLabel(left, best), sideLabel(right, best)), SideBySide.rows(spec, left, right));
        }
        boolean jumps = !spec.base().jumps().isEmpty();
        h.heading("Parameter sets");
        List<List<String>> rows = new ArrayList<>();
        for (SetResult s : sets) {
            List<String> row = new ArrayList<>(List.of(Integer.toString(s.set()), describe(spec, s),
                    pct(s.momentError()[0]), pct(s.momentError()[1]), pct(s.momentError()[2]), num(s.crlbRatio()[0]),
                    num(s.lockFractionMean()), Integer.toString(s.alphaLocks()), num(s.spectraPerSecond()),
                    String.format(Locale.ROOT, "%.0f", s.bitsPerSecondMean()), num(s.informationEfficiency())));
            if (jumps) {
                row.add(SideBySide.reacquire(s.reacquireSweepsMax(), s.reacquireSecondsMax()));
                row.add(SideBySide.reacquire(s.strictReacquireSweepsMax(), s.strictReacquireSecondsMax()));
            }
            row.add((front.contains(s) ? "yes" : "") + (s == best ? " (recommended)" : ""));
            rows.add(row);
        }
        List<String> header = new ArrayList<>(List.of("set", "parameters", "err n %", "err U %", "err T %",
                "n / CRLB", "lock", "alpha locks", "spectra/s", "bit/s", "D-eff."));
        if (jumps) {
            header.add("reacquired (worst)");
            header.add("centred again (worst)");
        }
        header.add("front");
        h.table(header, rows);
        h.write(dir.resolve("report.html"));
    }

    private static byte[] chart(CampaignSpec spec, List<SetResult> sets, List<SetResult> front, SetResult best,
            boolean rate) throws IOException {
        List<ParetoChart.Point> points = new ArrayList<>();
        for (SetResult s : sets) {
            points.add(new ParetoChart.Point(s.set(), rate ? s.bitsPerSecondMean() : s.spectraPerSecond(),
                    100 * s.accuracy(), front.contains(s), s == best));
        }
        return ParetoChart.render(rate ? "Accuracy against telemetry rate" : "Accuracy against cadence",
                rate ? "telemetry, bit/s" : "cadence, spectra per second", "mean median error of n, U, T (%)",
                points, rate ? spec.allocationBitsPerSecond() : Double.NaN);
    }

    /** A side-by-side column heading: the set, marked when it is the recommended one. */
    private static String sideLabel(SetResult s, SetResult best) {
        return "set " + s.set() + (s == best ? " (recommended)" : "");
    }

    static String describe(CampaignSpec spec, SetResult s) {
        StringBuilder b = new StringBuilder();
        for (int a = 0; a < spec.grid().size(); a++) {
            b.append(a == 0 ? "" : ", ").append(spec.grid().get(a).parameter().key()).append(' ')
                    .append(FileFormatException.number(s.values()[a]));
        }
        return b.toString();
    }

    static String pct(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.4f", 100 * v) : "";
    }

    static String num(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.3f", v) : "";
    }
}
