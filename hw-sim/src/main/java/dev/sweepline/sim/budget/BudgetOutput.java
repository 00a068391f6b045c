package dev.sweepline.sim.budget;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import dev.sweepline.sim.report.BudgetChart;
import dev.sweepline.sim.report.Charts;
import dev.sweepline.sim.report.HtmlReport;
import java.io.IOException;
import java.io.Writer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Writes a budget check: {@code budget.json}, {@code hours.csv}, {@code volume.png} (cumulative volume),
 * {@code budget.png} ({@link BudgetChart}: rate against allocation with the phase boundaries and margins,
 * the store level with the downlink passes) and {@code report.html}, which also says how full each
 * virtual channel's frames are per phase.
 */
public final class BudgetOutput {
    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private BudgetOutput() {
    }

    /** Writes everything into {@code dir}. */
    public static void write(Path dir, BudgetResult r) throws IOException {
        Files.createDirectories(dir);
        JSON.writeValue(dir.resolve("budget.json").toFile(), summary(r));
        try (Writer w = Files.newBufferedWriter(dir.resolve("hours.csv"))) {
            w.write("hour,phase,distanceAu,bitsPerSecond,allocationBitsPerSecond,storeMegabits\n");
            for (BudgetResult.Hour h : r.hours()) {
                w.write(String.format(Locale.ROOT, "%d,%s,%.4f,%.1f,%.1f,%s%n", h.hour(), h.phase(), h.distanceAu(),
                        h.bitsPerSecond(), h.allocationBitsPerSecond(),
                        Double.isNaN(h.storeMegabits()) ? "" : String.format(Locale.ROOT, "%.3f", h.storeMegabits())));
            }
        }
        byte[] png = volumeChart(r);
        Files.write(dir.resolve("volume.png"), png);
        byte[] budget = budgetChart(r);
        Files.write(dir.resolve("budget.png"), budget);
        report(r, png, budget).write(dir.resolve("report.html"));
    }

    /** The summary as an ordered map. */
    static Map<String, Object> summary(BudgetResult r) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("plan", r.plan().name());
        m.put("instrument", r.plan().instrument().name());
        m.put("scenario", r.plan().scenario().name());
        m.put("hours", r.plan().endHours());
        m.put("verdict", r.fits() ? "FITS" : "DOES NOT FIT");
        List<Map<String, Object>> phases = new ArrayList<>();
        for (BudgetResult.PhaseBudget p : r.phases()) {
            Map<String, Object> pm = new LinkedHashMap<>();
            pm.put("phase", p.name());
            pm.put("generatedMegabits", round(p.generatedMegabits()));
            pm.put("allocatedMegabits", round(p.allocatedMegabits()));
            pm.put("margin", round(p.margin()));
            pm.put("worstHour", p.worstHour());
            pm.put("worstHourRateOverAllocation", round(p.worstHourRatio()));
            phases.add(pm);
        }
        m.put("phases", phases);
        m.put("violations", r.violations());
        List<Map<String, Object>> samples = new ArrayList<>();
        for (BudgetResult.Sample s : r.samples()) {
            Map<String, Object> sm = new LinkedHashMap<>();
            sm.put("phase", s.phase());
            sm.put("hour", s.hours());
            sm.put("distanceAu", round(s.distanceAu()));
            sm.put("bitsPerSecond", round(s.bitsPerSecond()));
            sm.put("spectraPerSecond", round(s.spectraPerSecond()));
            Map<String, Object> vcs = new LinkedHashMap<>();
            s.virtualChannels().forEach((name, v) -> {
                Map<String, Object> vc = new LinkedHashMap<>();
                vc.put("frameBitsPerSecond", round(v.frameBitsPerSecond()));
                vc.put("packetBitsPerSecond", round(v.packetBitsPerSecond()));
                vc.put("fill", Double.isFinite(v.fill()) ? round(v.fill()) : null);
                vcs.put(name, vc);
            });
            sm.put("virtualChannels", vcs);
            sm.put("flushIntervalSeconds", s.flushIntervalSeconds());
            samples.add(sm);
        }
        m.put("samples", samples);
        return m;
    }

    private static byte[] volumeChart(BudgetResult r) throws IOException {
        int n = r.hours().size();
        double[] t = new double[n + 1];
        double[] generated = new double[n + 1];
        double[] allocated = new double[n + 1];
        for (int i = 0; i < n; i++) {
            BudgetResult.Hour h = r.hours().get(i);
            t[i + 1] = h.hour() + 1;
            generated[i + 1] = generated[i] + h.bitsPerSecond() * 3600 / 1e6;
            allocated[i + 1] = allocated[i] + h.allocationBitsPerSecond() * 3600 / 1e6;
        }
        return Charts.xy("Telemetry volume over the plan", "hours from plan start", "Mbit (cumulative)", List.of(
                new Charts.Series("generated", t, generated, true), new Charts.Series("allocated", t, allocated, true)));
    }

    private static byte[] budgetChart(BudgetResult r) throws IOException {
        List<BudgetChart.Hour> hours = new ArrayList<>();
        for (BudgetResult.Hour h : r.hours()) {
            hours.add(new BudgetChart.Hour(h.hour(), h.bitsPerSecond(), h.allocationBitsPerSecond(), h.storeMegabits()));
        }
        List<BudgetChart.Phase> phases = new ArrayList<>();
        for (int i = 0; i < r.phases().size(); i++) {
            phases.add(new BudgetChart.Phase(r.phases().get(i).name(), r.plan().phases().get(i).startHours(),
                    r.phases().get(i).margin()));
        }
        List<BudgetChart.Pass> passes = new ArrayList<>();
        r.plan().passes().forEach(p -> passes.add(new BudgetChart.Pass(p.startHours(), p.hours())));
        return BudgetChart.render(hours, phases, passes, r.plan().storageMegabits());
    }

    /** Per phase and virtual channel: frames against packets, the mean over the phase's samples. */
    private static List<List<String>> vcRows(BudgetResult r) {
        List<List<String>> rows = new ArrayList<>();
        for (BudgetResult.PhaseBudget p : r.phases()) {
            Map<String, double[]> sums = new LinkedHashMap<>();
            int n = 0;
            double flush = Double.NaN;
            for (BudgetResult.Sample s : r.samples()) {
                if (s.phase().equals(p.name())) {
                    n++;
                    flush = s.flushIntervalSeconds();
                    s.virtualChannels().forEach((name, v) -> {
                        double[] sum = sums.computeIfAbsent(name, k -> new double[2]);
                        sum[0] += v.frameBitsPerSecond();
                        sum[1] += v.packetBitsPerSecond();
                    });
                }
            }
            for (Map.Entry<String, double[]> e : sums.entrySet()) {
                double frames = e.getValue()[0] / n;
                double packets = e.getValue()[1] / n;
                rows.add(List.of(p.name(), e.getKey(), String.format(Locale.ROOT, "%.0f", frames),
                        String.format(Locale.ROOT, "%.0f", packets),
                        frames > 0 ? String.format(Locale.ROOT, "%.0f %%", 100 * packets / frames) : "",
                        String.format(Locale.ROOT, "%.0f s", flush)));
            }
        }
        return rows;
    }

    private static HtmlReport report(BudgetResult r, byte[] png, byte[] budget) {
        HtmlReport h = new HtmlReport("Bandwidth budget: " + r.plan().name());
        h.paragraph(r.plan().description(), false);
        h.paragraph("Verdict: " + (r.fits() ? "the plan fits its allocations" : "the plan DOES NOT FIT"), true);
        for (String v : r.violations()) {
            h.paragraph(v, false);
        }
        List<List<String>> rows = new ArrayList<>();
        for (BudgetResult.PhaseBudget p : r.phases()) {
            rows.add(List.of(p.name(), String.format(Locale.ROOT, "%.1f", p.generatedMegabits()),
                    String.format(Locale.ROOT, "%.1f", p.allocatedMegabits()),
                    String.format(Locale.ROOT, "%+.1f %%", 100 * p.margin()), Integer.toString(p.worstHour()),
                    String.format(Locale.ROOT, "%.2f", p.worstHourRatio())));
        }
        h.heading("Phases");
        h.table(List.of("phase", "generated Mbit", "allocated Mbit", "margin", "worst hour", "worst rate / allocation"),
                rows);
        h.heading("Rate, allocation and store over time");
        h.image(budget, "telemetry rate against the allocation per phase, and the store level with the downlink passes");
        h.paragraph("Top: the telemetry rate hour by hour (blue) against each phase's allocation (red, dashed); grey "
                + "lines mark where each phase starts, labelled with its margin. Bottom: the onboard store's level "
                + "(blue) against its capacity (red, dashed), the downlink passes shaded green.", false);
        h.heading("Frame fill per virtual channel");
        h.table(List.of("phase", "virtual channel", "frames bit/s", "packets bit/s", "full", "flush interval"),
                vcRows(r));
        h.paragraph("A frame is sent when it is full or when it has held data for the flush interval, whichever comes "
                + "first; a channel whose packets trickle in (housekeeping and events on the engineering channel) "
                + "sends mostly idle fill, and the downlink pays for the whole frame.", false);
        h.heading("Volume over time");
        h.image(png, "cumulative telemetry volume against the allocation");
        h.paragraph("Plasma: scenario '" + r.plan().scenario().name() + "' scaled to each distance (n as r^-2, "
                + "T as r^-0.92); " + r.samples().size() + " representative closed loops of "
                + r.plan().sampleMinutes() + " simulated minutes.", false);
        return h;
    }

    private static double round(double v) {
        return Math.round(v * 10_000) / 10_000.0;
    }
}
