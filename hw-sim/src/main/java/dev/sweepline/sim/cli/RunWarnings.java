package dev.sweepline.sim.cli;

import dev.sweepline.fsw.exec.FlightConfig;
import dev.sweepline.fsw.host.ExitStatus;
import dev.sweepline.sim.bench.BenchConfig;
import dev.sweepline.sim.bench.TelemetryFigures;
import dev.sweepline.sim.link.LinkBudget;
import java.io.PrintStream;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * What a finished {@code run} warns about on the console, besides writing it to summary.json: a
 * serial link loaded above {@link LinkBudget#WARN_FRACTION} of its line rate (hardware ICD §6), and
 * telemetry over the downlink allocation. Either ends the run with {@link ExitStatus#WARNINGS}.
 */
final class RunWarnings {
    private RunWarnings() {
    }

    /** The warnings of a run of {@code config} checked against {@code baud}, one line each. */
    static List<String> of(BenchConfig config, int baud, TelemetryFigures telemetry) {
        List<String> w = new ArrayList<>();
        FlightConfig f = config.flight();
        for (LinkBudget b : new LinkBudget[] {LinkBudget.survey(f.instrument, f.table, f.parameters, baud),
            LinkBudget.focus(f.instrument, f.table, f.parameters, baud)}) {
            if (b.warning()) {
                w.add(String.format(Locale.ROOT, "warning: --baud %d: the %s sweep loads the serial link to %.0f %% of "
                        + "its line rate (above %.0f %%; hardware ICD §6)", baud, b.mode(), 100 * b.loadFraction(),
                        100 * LinkBudget.WARN_FRACTION));
            }
        }
        if (!Double.isNaN(telemetry.allocationBitsPerSecond()) && telemetry.margin() < 0) {
            w.add(String.format(Locale.ROOT, "warning: --allocation %.0f: the telemetry's %.1f bit/s exceeds it "
                    + "(margin %+.1f %%)", telemetry.allocationBitsPerSecond(), telemetry.frameBitsPerSecond(),
                    100 * telemetry.margin()));
        }
        return w;
    }

    /** Prints {@code warnings} and returns the run's exit status: {@link ExitStatus#WARNINGS} when there are any. */
    static int print(List<String> warnings, PrintStream out) {
        warnings.forEach(out::println);
        return warnings.isEmpty() ? ExitStatus.OK : ExitStatus.WARNINGS;
    }
}
