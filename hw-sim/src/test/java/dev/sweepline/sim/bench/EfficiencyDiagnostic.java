package dev.sweepline.sim.bench;

import dev.sweepline.sim.scenario.ScenarioLoader;
import java.util.Locale;

/**
 * Prints, for every built-in scenario flown on one seed with a given focus table, the run summary's
 * D-efficiency ({@code informationEfficiency}), lock fraction, alpha locks, worst strict reacquisition and
 * telemetry rate, then the mean and worst D-efficiency (a development tool, run by hand with {@code java -cp}
 * on the test classes; docs/focus-design.md). Arguments: seed, seconds, focusStyle, focusBudgetMicros,
 * surveyIntegrationPeriods, robustnessMarginWindows, resurveyEveryFocusSweeps (0: the table's),
 * focusFloorPeriods; or seed, seconds and the name of a {@link FocusTables} entry.
 */
public final class EfficiencyDiagnostic {
    private EfficiencyDiagnostic() {
    }

    public static void main(String[] args) {
        long seed = Long.parseLong(args[0]);
        double seconds = Double.parseDouble(args[1]);
        java.util.function.Consumer<dev.sweepline.fsw.exec.FlightConfig> change;
        String label;
        if (args.length == 3) {
            FocusTables table = FocusTables.valueOf(args[2]);
            change = f -> table.apply(f.parameters);
            label = table.name();
        } else {
            int style = Integer.parseInt(args[2]);
            int budget = Integer.parseInt(args[3]);
            int survey = Integer.parseInt(args[4]);
            int margin = Integer.parseInt(args[5]);
            int resurvey = Integer.parseInt(args[6]);
            int floor = Integer.parseInt(args[7]);
            change = f -> {
                f.parameters.focusStyle = style;
                f.parameters.focusBudgetMicros = budget;
                f.parameters.surveyIntegrationPeriods = survey;
                f.parameters.robustnessMarginWindows = margin;
                if (resurvey > 0) {
                    f.parameters.resurveyEveryFocusSweeps = resurvey;
                }
                f.parameters.focusFloorPeriods = floor;
            };
            label = String.format(Locale.ROOT, "style %d budget %d survey %d margin %d resurvey %d floor %d", style, budget,
                    survey, margin, resurvey, floor);
        }
        double sum = 0;
        double worst = Double.MAX_VALUE;
        int n = 0;
        System.out.println(label + ", seed " + seed + ", " + seconds + " s");
        for (String name : ScenarioLoader.builtInNames()) {
            BenchConfig config = BenchConfig.defaults(ScenarioLoader.builtIn(name), seed, seconds).withFlight(change);
            RunSummary s = ClosedLoopBench.run(config, ClosedLoopBench.Progress.NONE).summary();
            double e = s.informationEfficiency();
            sum += e;
            worst = Math.min(worst, e);
            n++;
            System.out.printf(Locale.ROOT, "  %-24s D-eff %.3f lock %.4f alphaLocks %d strict %d bit/s %.0f%n", name, e,
                    s.lockFraction(), s.alphaLocks(), s.strictReacquireSweepsMax(), s.telemetry().frameBitsPerSecond());
        }
        System.out.printf(Locale.ROOT, "  mean D-eff %.3f worst %.3f%n", sum / n, worst);
    }
}
