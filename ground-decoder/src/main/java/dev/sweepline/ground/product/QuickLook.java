package dev.sweepline.ground.product;

import dev.sweepline.ground.decode.DecodeStats;
import dev.sweepline.ground.decode.TelemetryDecoder;
import dev.sweepline.ground.fit.FitFlag;
import dev.sweepline.ground.plot.MomentsPlot;
import dev.sweepline.ground.plot.SpectrogramPlot;
import dev.sweepline.ground.plot.SpectrumFitPlot;
import dev.sweepline.ground.plot.TimeSeries;
import dev.sweepline.ground.report.QuickLookReport;
import dev.sweepline.ground.instrument.BuiltInInstruments;
import dev.sweepline.ground.instrument.GroundInstrument;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;

/** Plots and the HTML quick-look of a run, from the decoder's counts and the fits. */
final class QuickLook {
    /** Plot sizes, pixels: readable on a laptop screen, a few tens of kB each. */
    static final int WIDTH = 1000;
    static final int HEIGHT = 520;
    static final int PANEL_HEIGHT = 260;

    record Plots(byte[] spectrogram, byte[] moments, byte[] spectrumFit) {
    }

    private QuickLook() {
    }

    /**
     * Smallest current drawn, A: a tenth of one count of {@code instrument}'s most sensitive range
     * (ICD §4), below anything its ADC resolves.
     */
    static double floorAmps(GroundInstrument instrument) {
        return instrument.lsbAmps(0) / 10;
    }

    static Plots plots(FitCollector fits, ReportAdditions additions) {
        // before any spectrum there is nothing to draw: the demo cup's axes frame the empty plots
        GroundInstrument si = fits.spectrogramInstrument() == null ? BuiltInInstruments.demoCup()
                : fits.spectrogramInstrument();
        byte[] spectrogram = SpectrogramPlot.render(fits.spectrogram(), si.windows().windows(), si.windows()::lowVolts,
                floorAmps(si), WIDTH, HEIGHT);
        List<MomentRecord> r = fits.records();
        int n = r.size();
        double t0 = n == 0 ? 0 : r.get(0).taiSeconds();
        double[] t = new double[n];
        double[][] v = new double[5][n];
        double[][] s = new double[5][n];
        for (int i = 0; i < n; i++) {
            MomentRecord m = r.get(i);
            t[i] = m.taiSeconds() - t0;
            v[0][i] = m.densityPerCc();
            s[0][i] = m.fit().protons().sigmaDensityPerM3() * 1e-6;
            v[1][i] = m.speedKmPerS();
            s[1][i] = m.fit().protons().sigmaSpeedMPerS() * 1e-3;
            v[2][i] = m.temperatureK();
            s[2][i] = m.fit().protons().sigmaTemperatureK();
            v[3][i] = m.thetaXDeg();
            s[3][i] = Math.toDegrees(m.fit().angles().sigmaThetaXRad());
            v[4][i] = m.fit().alphas().densityPerM3() / m.fit().protons().densityPerM3() * 100;
            s[4][i] = m.fit().alphas().sigmaDensityPerM3() / m.fit().protons().densityPerM3() * 100;
        }
        String[] names = {"proton density n (cm^-3)", "proton speed U (km/s)", "proton temperature T (K)",
            "flow angle theta_x (deg)", "alpha abundance n_a/n_p (%)"};
        List<TimeSeries> series = new ArrayList<>();
        double[][] truth = additions.truthAtTai() == null ? null : new double[names.length][n];
        for (int i = 0; truth != null && i < n; i++) {
            double[] at = additions.truthAtTai().apply(r.get(i).taiSeconds());
            for (int k = 0; k < names.length; k++) {
                truth[k][i] = k < at.length ? at[k] : Double.NaN;
            }
        }
        for (int k = 0; k < names.length; k++) {
            series.add(new TimeSeries(names[k], t, v[k], s[k], truth == null ? null : truth[k]));
        }
        byte[] moments = MomentsPlot.render(series, WIDTH, PANEL_HEIGHT);
        byte[] fit = fits.exampleInput() == null
                ? SpectrumFitPlot.render(new dev.sweepline.ground.fit.SpectrumInput(new double[0], new double[0],
                        new double[0], new double[0], null, null, 0, 0),
                        dev.sweepline.ground.fit.PlasmaFit.failed(java.util.EnumSet.of(FitFlag.NO_SIGNAL), 0,
                                dev.sweepline.ground.fit.FlowAngles.NONE), "no spectrum fitted", floorAmps(si), WIDTH,
                        HEIGHT * 3 / 2)
                : SpectrumFitPlot.render(fits.exampleInput(), fits.exampleFit(), fits.exampleTitle(),
                        floorAmps(fits.exampleInstrument()), WIDTH, HEIGHT * 3 / 2);
        return new Plots(spectrogram, moments, fit);
    }

    private static String num(double v, String fmt) {
        return Double.isFinite(v) ? String.format(fmt, v) : "n/a";
    }

    private static List<String> row(String... c) {
        return Arrays.asList(c);
    }

    /** A map as "none" when empty, else "key n, key n". */
    static String counts(Map<?, ?> m) {
        if (m.isEmpty()) {
            return "none";
        }
        StringBuilder b = new StringBuilder();
        m.forEach((k, v) -> b.append(b.length() == 0 ? "" : ", ").append(k).append(' ').append(v));
        return b.toString();
    }

    static byte[] report(String input, long octets, TelemetryDecoder d, FitSummary fits, BitRates rates,
            FitCollector collector, Plots plots, ReportAdditions additions, int refreshSeconds) {
        DecodeStats s = d.stats();
        QuickLookReport q = new QuickLookReport("Ground quick-look: " + input).refreshEvery(refreshSeconds);
        if (refreshSeconds > 0) {
            q.paragraph("Live: following the stream; this page reloads every " + refreshSeconds + " s ("
                    + (s.spectraSurvey() + s.spectraFocus()) + " spectra so far).", "ok");
        }
        long bad = s.framesBad().values().stream().mapToLong(Long::longValue).sum();
        q.heading("Run summary").table(row("item", "value"), List.of(
                row("input", input + " (" + octets + " octets)"),
                row("frame length", d.frameOctets() + (d.frameLengthDetected() ? " octets (detected)" : " octets")),
                row("time span", s.firstTime() == null ? "n/a"
                        : s.firstTime().isoTai() + " .. " + s.lastTime().isoTai() + " TAI ("
                        + num(rates.spanSeconds(), "%.1f") + " s)"),
                row("spectra", s.spectraSurvey() + " survey, " + s.spectraFocus() + " focus"),
                row("spectra by instrument",
                        counts(s.spectraByInstrument())),
                row("housekeeping / events", s.housekeeping() + " / " + s.events())));
        List<List<String>> frames = new ArrayList<>();
        frames.add(row("good frames", Long.toString(s.framesGood()) + " (" + s.framesIdle() + " idle)"));
        frames.add(row("bad frames", Long.toString(bad) + " (" + counts(s.framesBad()) + ")"));
        frames.add(row("frames dropped by VC count", counts(s.framesDropped())));
        frames.add(row("VC count restarts", Long.toString(s.vcRestarts())));
        frames.add(row("VC frame gaps", s.frameGapCount() + " gaps, " + s.vcFramesMissing() + " frames missing"));
        frames.add(row("master-channel frames missing", Long.toString(s.mcFramesMissing())));
        frames.add(row("packet sequence gaps", s.sequenceGapCount() + " gaps, " + s.packetsMissing() + " packets missing"));
        frames.add(row("spectrum packets rejected", counts(s.spectrumErrors())));
        q.heading("Frames and gaps").table(row("item", "value"), frames);
        List<List<String>> bits = new ArrayList<>();
        for (Map.Entry<String, Double> e : rates.byApid().entrySet()) {
            bits.add(row("APID " + e.getKey(), num(e.getValue(), "%.1f")));
        }
        bits.add(row("all packets", num(rates.packets(), "%.1f")));
        bits.add(row("frames incl. ASM (downlink)", num(rates.frames(), "%.1f")));
        q.heading("Bits per second").table(row("stream", "bit/s"), bits);
        if (Double.isFinite(rates.allocation())) {
            boolean ok = rates.withinAllocation();
            q.paragraph(String.format("Allocation %.1f bit/s: frames use %s bit/s (%s %% of it) - %s.",
                    rates.allocation(), num(rates.frames(), "%.1f"), num(100 * rates.frames() / rates.allocation(), "%.1f"),
                    ok ? "within the allocation" : "OVER the allocation"), ok ? "ok" : "over");
        } else {
            q.paragraph("No allocation given (--allocation BITS_PER_S).", null);
        }
        List<List<String>> ops = new ArrayList<>();
        s.eventsByKind().forEach((kind, n) -> ops.add(row("event " + kind, Long.toString(n))));
        s.commandReports().forEach((kind, n) -> ops.add(row("command report " + kind, Long.toString(n))));
        if (ops.isEmpty()) {
            ops.add(row("events and command reports", "none"));
        }
        q.heading("Events and commands").table(row("item", "count"), ops);
        List<List<String>> fr = new ArrayList<>();
        fr.add(row("spectra", Integer.toString(fits.spectra())));
        fr.add(row("fitted", fits.fitted() + " (" + num(100 * fits.fitFraction(), "%.1f") + " %)"));
        fr.add(row("joint proton + alpha fits", Integer.toString(fits.alphasFitted())));
        fr.add(row("speed-drift fits (interleaved spectra)", driftFits(collector.records())));
        for (FitFlag f : FitFlag.values()) {
            fr.add(row("flag " + f.name(), Integer.toString(fits.byFlag().get(f))));
        }
        fr.add(row("fit time", num(fits.fitSeconds(), "%.3f") + " s (" + num(fits.spectraPerSecond(), "%.0f")
                + " spectra/s, one thread)"));
        q.heading("Fits").table(row("item", "value"), fr);
        q.paragraph("Each spectrum's moments are fitted to the whole sweep, whose packet time is that of its first "
                + "step; the plasma moves during a sweep, so a truth to score them against is taken at mid-sweep "
                + "(the bench does so: groundTruthAt mid-sweep in its summary.json).", null);
        q.table(row("median of fitted", "n (cm^-3)", "U (km/s)", "T (K)", "theta_x (deg)", "theta_y (deg)", "n_a/n_p (%)"),
                List.of(medians(collector.records())));
        q.heading("Plots");
        GroundInstrument si = collector.spectrogramInstrument();
        int others = collector.spectraNotInSpectrogram();
        q.image("spectrogram", plots.spectrogram(), "Spectrogram: time x E/q window, colour = log10 summed current"
                + (si == null ? "." : ", on the windows of " + si.label()
                        + (others == 0 ? "." : "; " + others + " spectra of other instruments not shown.")));
        q.image("moments", plots.moments(), "Proton moments, flow angle and alpha abundance with 1-sigma fit errors"
                + (additions.truthAtTai() == null ? "." : "; the grey line is the truth (the simulated plasma)."));
        q.image("spectrum fit", plots.spectrumFit(), "One spectrum with its fit (protons, alphas) and residuals"
                + (collector.exampleFit() == null ? "." : "; " + SpectrumFitPlot.fitNote(collector.exampleFit())
                        + ". Currents below the plot floor are drawn at it; the x-axis title counts those windows."));
        for (ReportAdditions.Figure f : additions.figures()) {
            q.heading(f.heading());
            q.image(f.alt(), f.png(), f.caption());
        }
        return q.toBytes();
    }

    private static List<String> medians(List<MomentRecord> r) {
        double[][] v = new double[6][];
        for (int k = 0; k < 6; k++) {
            v[k] = new double[r.size()];
        }
        for (int i = 0; i < r.size(); i++) {
            MomentRecord m = r.get(i);
            v[0][i] = m.densityPerCc();
            v[1][i] = m.speedKmPerS();
            v[2][i] = m.temperatureK();
            v[3][i] = m.thetaXDeg();
            v[4][i] = m.thetaYDeg();
            v[5][i] = m.fit().alphas().densityPerM3() / m.fit().protons().densityPerM3() * 100;
        }
        List<String> out = new ArrayList<>();
        out.add("all fitted spectra");
        String[] fmt = {"%.1f", "%.1f", "%.4g", "%.2f", "%.2f", "%.2f"};
        for (int k = 0; k < 6; k++) {
            out.add(num(median(v[k]), fmt[k]));
        }
        return out;
    }

    /** How many fits carry ΔU, and the median |ΔU| over them in km/s (moments.csv {@code du_kms}). */
    static String driftFits(List<MomentRecord> r) {
        double[] du = new double[r.size()];
        int n = 0;
        for (MomentRecord m : r) {
            double v = m.speedChangeKmPerS();
            if (m.ok() && Double.isFinite(v)) {
                du[n++] = Math.abs(v);
            }
        }
        return n == 0 ? "0" : n + " (median |dU| " + num(median(Arrays.copyOf(du, n)), "%.3f") + " km/s)";
    }

    static double median(double[] a) {
        double[] f = Arrays.stream(a).filter(Double::isFinite).sorted().toArray();
        return f.length == 0 ? Double.NaN : f.length % 2 == 1 ? f[f.length / 2] : 0.5 * (f[f.length / 2 - 1] + f[f.length / 2]);
    }
}
