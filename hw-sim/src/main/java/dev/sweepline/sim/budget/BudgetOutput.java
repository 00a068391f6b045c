package dev.sweepline.sim.budget;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
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

/** Writes a budget check: {@code budget.json}, {@code hours.csv}, {@code volume.png} and {@code report.html}. */
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
        report(r, png).write(dir.resolve("report.html"));
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

    private static HtmlReport report(BudgetResult r, byte[] png) {
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
