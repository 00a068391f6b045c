package dev.sweepline.sim.bench;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import dev.sweepline.fsw.exec.FlightConfig;
import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.sim.link.LinkBudget;
import java.io.IOException;
import java.io.PrintStream;
import java.io.Writer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Writes what a run leaves for its user: {@code summary.json}, the sweep-by-sweep decision log with
 * the truth beside it ({@code decisions.csv}), and the summary table on the console.
 */
public final class RunReportWriter {
    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private RunReportWriter() {
    }

    /** The summary as an ordered map (JSON numbers; NaN becomes null, as JSON has no NaN). */
    public static Map<String, Object> summaryMap(RunSummary s) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("instrument", s.instrument());
        m.put("scenario", s.scenario());
        m.put("seed", s.seed());
        m.put("simulatedSeconds", s.simulatedSeconds());
        m.put("wallSeconds", round(s.wallSeconds(), 3));
        m.put("realTimeFactor", finite(round(s.realTimeFactor(), 1)));
        m.put("steps", s.steps());
        m.put("sweeps", modeMap(s.sweepsByMode()));
        Map<String, Object> perSecond = new LinkedHashMap<>();
        s.spectraPerSecond().forEach((mode, v) -> perSecond.put(mode.name().toLowerCase(Locale.ROOT), round(v, 4)));
        m.put("spectraPerSecond", perSecond);
        m.put("lockFraction", finite(s.lockFraction()));
        m.put("alphaLocks", s.alphaLocks());
        m.put("reacquireSweepsMax", s.reacquireSweepsMax());
        m.put("reacquireSecondsMax", finite(s.reacquireSecondsMax()));
        m.put("jumps", jumpList(s.reacquisitions()));
        m.put("tracking", trackingMap(s.tracking()));
        m.put("strictReacquireSweepsMax", s.strictReacquireSweepsMax());
        m.put("strictReacquireSecondsMax", finite(s.strictReacquireSecondsMax()));
        m.put("strictCentreWindows", Reacquisition.STRICT_CENTRE_WINDOWS);
        m.put("strictJumps", jumpList(s.strictReacquisitions()));
        m.put("integratingFraction", round(s.integratingFraction(), 4));
        m.put("informationEfficiency", finite(round(s.informationEfficiency(), 4)));
        m.put("saturatedSamples", s.saturatedSamples());
        m.put("unsettledSamples", s.unsettledSamples());
        m.put("modeChanges", s.modeChanges());
        TelemetryFigures t = s.telemetry();
        Map<String, Object> bps = new LinkedHashMap<>();
        bps.put("total", round(t.frameBitsPerSecond(), 1));
        Map<String, Object> byApid = new LinkedHashMap<>();
        t.packetBitsPerSecond().forEach((k, v) -> byApid.put(k, round(v, 1)));
        bps.put("byApid", byApid);
        Map<String, Object> byMode = new LinkedHashMap<>();
        t.spectrumBitsPerSecond().forEach((k, v) -> byMode.put(k.name().toLowerCase(Locale.ROOT), round(v, 1)));
        bps.put("spectraByMode", byMode);
        m.put("bitsPerSecond", bps);
        m.put("virtualChannels", vcMap(t));
        m.put("allocationBitsPerSecond", finite(t.allocationBitsPerSecond()));
        m.put("allocationMargin", finite(round(t.margin(), 4)));
        m.put("frames", t.frames());
        m.put("decisionHash", s.decisionHash());
        return m;
    }

    /** Per virtual channel: frame and packet bit rates and the fill; with the flush interval. */
    public static Map<String, Object> vcMap(TelemetryFigures t) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("flushIntervalSeconds", t.flushIntervalSeconds());
        t.virtualChannels().forEach((name, v) -> {
            Map<String, Object> vc = new LinkedHashMap<>();
            vc.put("frameBitsPerSecond", round(v.frameBitsPerSecond(), 1));
            vc.put("packetBitsPerSecond", round(v.packetBitsPerSecond(), 1));
            vc.put("fill", finite(round(v.fill(), 4)));
            m.put(name, vc);
        });
        return m;
    }

    /** One virtual channel's cost as a sentence: "822 bit/s of frames carry 57 bit/s of packets (7 % full)". */
    public static String vcLine(TelemetryFigures.VcFill v) {
        return String.format(Locale.ROOT, "%.0f bit/s of frames carry %.0f bit/s of packets (%.0f %% full)",
                v.frameBitsPerSecond(), v.packetBitsPerSecond(), 100 * v.fill());
    }

    private static List<Map<String, Object>> jumpList(List<Reacquisition> reacquisitions) {
        List<Map<String, Object>> jumps = new ArrayList<>();
        for (Reacquisition r : reacquisitions) {
            Map<String, Object> j = new LinkedHashMap<>();
            j.put("label", r.label());
            j.put("frontSeconds", r.frontMicros() / 1e6);
            j.put("reacquired", r.reacquired());
            j.put("sweeps", r.sweeps());
            j.put("seconds", finite(r.seconds()));
            jumps.add(j);
        }
        return jumps;
    }

    /** Tracking error in windows: band centre (focus sweeps) and found peak (all sweeps), median/p95/max. */
    private static Map<String, Object> trackingMap(TrackingError t) {
        Map<String, Object> centre = new LinkedHashMap<>();
        centre.put("sweeps", t.centreSweeps());
        centre.put("median", finite(round(t.centreMedian(), 3)));
        centre.put("p95", finite(round(t.centreP95(), 3)));
        centre.put("max", finite(round(t.centreMax(), 3)));
        Map<String, Object> peak = new LinkedHashMap<>();
        peak.put("sweeps", t.peakSweeps());
        peak.put("median", finite(round(t.peakMedian(), 3)));
        peak.put("p95", finite(round(t.peakP95(), 3)));
        peak.put("max", finite(round(t.peakMax(), 3)));
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("bandCentreWindows", centre);
        m.put("foundPeakWindows", peak);
        return m;
    }

    /** File name of the decision log in the run folder. */
    public static final String DECISIONS_CSV = "decisions.csv";

    /** Writes {@code summary.json} and {@code decisions.csv} (from the kept records) into {@code dir}, creating it. */
    public static void write(Path dir, ClosedLoopBench.Result result) throws IOException {
        write(dir, result, Map.of());
    }

    /** As {@link #write(Path, ClosedLoopBench.Result)}, with {@code extra} fields appended to the summary. */
    public static void write(Path dir, ClosedLoopBench.Result result, Map<String, Object> extra) throws IOException {
        if (!result.recorder().keepsSweeps()) {
            throw new IllegalStateException("the run's sweeps were not kept: its decisions.csv is written as it goes");
        }
        writeSummary(dir, result, extra);
        try (Writer w = Files.newBufferedWriter(dir.resolve(DECISIONS_CSV))) {
            DecisionsCsv.writeAll(w, result.recorder().sweeps(), result.recorder()::truthAt);
        }
    }

    /**
     * Writes {@code summary.json} alone into {@code dir}, creating it: for a run whose {@code decisions.csv}
     * was written as it went ({@link DecisionsCsv} as its sweep log).
     */
    public static void writeSummary(Path dir, ClosedLoopBench.Result result, Map<String, Object> extra)
            throws IOException {
        Files.createDirectories(dir);
        Map<String, Object> summary = summaryMap(result.summary());
        summary.putAll(extra);
        JSON.writeValue(dir.resolve("summary.json").toFile(), summary);
    }

    /** The ground comparison as summary fields: momentErrors (median, p95) and crlbRatio, per moment. */
    public static Map<String, Object> groundMap(GroundCheck.GroundFigures g) {
        Map<String, Object> errors = new LinkedHashMap<>();
        Map<String, Object> ratio = new LinkedHashMap<>();
        for (int k = 0; k < 3; k++) {
            Map<String, Object> e = new LinkedHashMap<>();
            e.put("median", finite(round(g.medianRelative()[k], 6)));
            e.put("p95", finite(round(g.p95Relative()[k], 6)));
            errors.put(GroundCheck.GroundFigures.MOMENTS[k], e);
            ratio.put(GroundCheck.GroundFigures.MOMENTS[k], finite(round(g.crlbRatio()[k], 3)));
        }
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("groundSpectra", g.spectra());
        m.put("groundFits", g.fitted());
        m.put("groundTruthAt", "mid-sweep");
        m.put("momentErrors", errors);
        m.put("crlbRatio", ratio);
        m.put("crlbRatioRobust", perMoment(g.robustCrlbRatio(), 3));
        m.put("nonStationaryFits", g.nonStationary());
        m.put("nonStationaryQuantile", NonStationarity.QUANTILE);
        MomentErrors st = g.stationary();
        Map<String, Object> without = new LinkedHashMap<>();
        without.put("compared", st.compared());
        without.put("momentErrorMedian", perMoment(st.medianRelative(), 6));
        without.put("momentErrorP95", perMoment(st.p95Relative(), 6));
        without.put("crlbRatio", perMoment(st.crlbRatio(), 3));
        without.put("crlbRatioRobust", perMoment(st.robustCrlbRatio(), 3));
        m.put("withoutNonStationary", without);
        return m;
    }

    private static Map<String, Object> perMoment(double[] v, int digits) {
        Map<String, Object> m = new LinkedHashMap<>();
        for (int k = 0; k < 3; k++) {
            m.put(GroundCheck.GroundFigures.MOMENTS[k], finite(round(v[k], digits)));
        }
        return m;
    }

    /** The serial link load of the run's table and parameters at {@code baud} (hardware ICD §6). */
    public static Map<String, Object> linkMap(BenchConfig config, int baud) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("baud", baud);
        boolean warning = false;
        FlightConfig flight = config.flight();
        for (LinkBudget b : new LinkBudget[] {
            LinkBudget.survey(flight.instrument, flight.table, flight.parameters, baud),
            LinkBudget.focus(flight.instrument, flight.table, flight.parameters, baud)}) {
            Map<String, Object> mode = new LinkedHashMap<>();
            mode.put("stepsPerSecond", round(b.stepsPerSecond(), 2));
            mode.put("octetsPerSecond", round(b.octetsPerSecond(), 1));
            mode.put("load", round(b.loadFraction(), 4));
            m.put(b.mode(), mode);
            warning |= b.warning();
        }
        m.put("warning", warning);
        return m;
    }

    /** Prints the ground comparison rows of the summary table. */
    public static void printGround(GroundCheck.GroundFigures g, PrintStream out) {
        row(out, "ground fits", g.fitted() + " of " + g.spectra() + " spectra");
        for (int k = 0; k < 3; k++) {
            row(out, "error " + GroundCheck.GroundFigures.MOMENTS[k], String.format(Locale.ROOT,
                    "median %.4f %%, p95 %.4f %%, %.2f x the Cramer-Rao bound", 100 * g.medianRelative()[k],
                    100 * g.p95Relative()[k], g.crlbRatio()[k]));
        }
        MomentErrors st = g.stationary();
        for (int k = 0; k < 3; k++) {
            row(out, "CRLB ratio " + GroundCheck.GroundFigures.MOMENTS[k], String.format(Locale.ROOT,
                    "rms %.2f, robust %.2f; without non-stationary: rms %.2f, robust %.2f",
                    g.crlbRatio()[k], g.robustCrlbRatio()[k], st.crlbRatio()[k], st.robustCrlbRatio()[k]));
        }
        row(out, "non-stationary", String.format(Locale.ROOT, "%d of %d fits (reduced chi-square above the %.3f "
                + "quantile); truth taken at mid-sweep", g.nonStationary(), g.compared(), NonStationarity.QUANTILE));
    }

    /** Prints the summary as a two-column table. */
    public static void printTable(RunSummary s, PrintStream out) {
        String line = "-".repeat(52);
        out.println(line);
        row(out, "instrument", s.instrument());
        row(out, "scenario", s.scenario() + " (seed " + s.seed() + ")");
        row(out, "simulated", String.format(Locale.ROOT, "%.1f s in %.2f s wall (x%.0f real time)",
                s.simulatedSeconds(), s.wallSeconds(), s.realTimeFactor()));
        row(out, "steps", Long.toString(s.steps()));
        for (SweepMode m : SweepMode.values()) {
            row(out, "sweeps " + m.name().toLowerCase(Locale.ROOT), String.format(Locale.ROOT, "%d (%.3f /s)",
                    s.sweepsByMode().get(m), s.spectraPerSecond().get(m)));
        }
        row(out, "lock fraction", Double.isNaN(s.lockFraction()) ? "no focus sweeps"
                : String.format(Locale.ROOT, "%.4f", s.lockFraction()));
        row(out, "alpha locks", Integer.toString(s.alphaLocks()));
        row(out, "reacquire (max)", s.reacquisitions().isEmpty() ? "no jumps in scenario"
                : String.format(Locale.ROOT, "%d sweeps, %.3f s", s.reacquireSweepsMax(), s.reacquireSecondsMax()));
        TrackingError te = s.tracking();
        row(out, "centre error", String.format(Locale.ROOT, "median %.2f, p95 %.2f, max %.2f windows",
                te.centreMedian(), te.centreP95(), te.centreMax()));
        row(out, "peak error", String.format(Locale.ROOT, "median %.2f, p95 %.2f, max %.2f windows",
                te.peakMedian(), te.peakP95(), te.peakMax()));
        if (!s.strictReacquisitions().isEmpty()) {
            row(out, "centred again (max)", String.format(Locale.ROOT, "%d sweeps, %.3f s (within %.0f windows)",
                    s.strictReacquireSweepsMax(), s.strictReacquireSecondsMax(), Reacquisition.STRICT_CENTRE_WINDOWS));
        }
        row(out, "integrating", String.format(Locale.ROOT, "%.1f %% of the time", 100 * s.integratingFraction()));
        row(out, "saturated samples", Long.toString(s.saturatedSamples()));
        row(out, "D-efficiency", String.format(Locale.ROOT, "%.3f of the D-optimal design", s.informationEfficiency()));
        TelemetryFigures t = s.telemetry();
        row(out, "telemetry", String.format(Locale.ROOT, "%.0f bit/s in %d frames", t.frameBitsPerSecond(), t.frames()));
        t.virtualChannels().forEach((name, v) -> row(out, "  VC " + name, vcLine(v)
                + (name.equals("engineering") ? String.format(Locale.ROOT, "; %.0f s flush", t.flushIntervalSeconds())
                        : "")));
        if (!Double.isNaN(t.allocationBitsPerSecond())) {
            row(out, "allocation", String.format(Locale.ROOT, "%.0f bit/s, margin %+.1f %%%s",
                    t.allocationBitsPerSecond(), 100 * t.margin(), t.margin() < 0 ? "  OVER BUDGET" : ""));
        }
        row(out, "decision hash", s.decisionHash());
        out.println(line);
    }

    private static void row(PrintStream out, String key, String value) {
        out.printf(Locale.ROOT, "%-20s %s%n", key, value);
    }

    private static Map<String, Integer> modeMap(Map<SweepMode, Integer> byMode) {
        Map<String, Integer> m = new LinkedHashMap<>();
        byMode.forEach((mode, v) -> m.put(mode.name().toLowerCase(Locale.ROOT), v));
        return m;
    }

    private static Object finite(double v) {
        return Double.isFinite(v) ? v : null;
    }

    private static double round(double v, int digits) {
        if (!Double.isFinite(v)) {
            return v;
        }
        double scale = Math.pow(10, digits);
        return Math.round(v * scale) / scale;
    }
}
