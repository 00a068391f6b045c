package dev.sweepline.sim.bench;

import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.sim.scenario.ScenarioLoader;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Prints the ground's median and p95 relative errors of n, U, T (GroundCheck, as `bench evaluate`) for a
 * scenario flown on seeds 1..K with a given focus table, overall and by mode (a development tool, run by
 * hand with {@code java -cp} on the test classes; docs/focus-design.md). Arguments: scenario, seconds,
 * seeds, focusBudgetMicros, surveyIntegrationPeriods, robustnessMarginWindows, focusStyle, then optionally
 * integrationPeriods and resurveyEveryFocusSweeps (0: the table's), focusFloorPeriods (support dwell) and the
 * seed stride d (default 1: seeds 1..K; seeds 1, 1 + d, 1 + 2d, ... otherwise). Consecutive seeds share their
 * instrument noise ({@code SeedTree.instrument}, docs/focus-design.md): a stride of 10⁷ gives independent noise.
 */
public final class GroundErrorDiagnostic {
    private GroundErrorDiagnostic() {
    }

    public static void main(String[] args) {
        String scenario = args[0];
        double seconds = Double.parseDouble(args[1]);
        int seeds = Integer.parseInt(args[2]);
        int budget = Integer.parseInt(args[3]);
        int survey = Integer.parseInt(args[4]);
        int margin = Integer.parseInt(args[5]);
        int style = Integer.parseInt(args[6]);
        int periods = args.length > 7 ? Integer.parseInt(args[7]) : 0;
        int resurvey = args.length > 8 ? Integer.parseInt(args[8]) : 0;
        int floor = args.length > 9 ? Integer.parseInt(args[9]) : 0;
        long stride = args.length > 10 ? Long.parseLong(args[10]) : 1;
        List<GroundCheck.ComparedFit> all = new ArrayList<>();
        int spectra = 0;
        double bits = 0;
        double deff = 0;
        for (int k = 0; k < seeds; k++) {
            long seed = 1 + k * stride;
            BenchConfig config = BenchConfig.defaults(ScenarioLoader.resolve(scenario), seed, seconds).withFlight(f -> {
                if (resurvey > 0) {
                    f.parameters.resurveyEveryFocusSweeps = resurvey;
                }
                if (periods > 0) {
                    f.parameters.integrationPeriods = periods;
                }
                f.parameters.focusStyle = style;
                f.parameters.surveyIntegrationPeriods = survey;
                f.parameters.focusFloorPeriods = floor;
                if ((style & SweepParameters.FOCUS_STYLE_SUPPORT_DWELL) != 0) {
                    f.parameters.focusBudgetMicros = budget;
                }
                if ((style & SweepParameters.FOCUS_STYLE_DESIGN) != 0) {
                    f.parameters.focusBudgetMicros = budget;
                    f.parameters.surveyIntegrationPeriods = survey;
                    f.parameters.robustnessMarginWindows = margin;
                }
            });
            GroundCheck ground = new GroundCheck(config.flight(), GroundInstruments.of(config.instrument().spec()));
            ClosedLoopBench.Result r = ClosedLoopBench.run(config, ClosedLoopBench.Progress.NONE,
                    ClosedLoopBench.Hooks.NONE.withFrames(ground.frames()));
            List<GroundCheck.ComparedFit> c = ground.compared(r.recorder().sweeps(), r.recorder()::truthAt);
            all.addAll(c);
            spectra += r.recorder().sweeps().size();
            bits += r.summary().telemetry().frameBitsPerSecond() / seeds;
            deff += r.summary().informationEfficiency() / seeds;
        }
        GroundCheck.GroundFigures g = GroundCheck.figures(spectra, all);
        for (dev.sweepline.fsw.sweep.SweepMode mode : dev.sweepline.fsw.sweep.SweepMode.values()) {
            List<GroundCheck.ComparedFit> of = all.stream().filter(c -> c.mode() == mode).toList();
            if (!of.isEmpty()) {
                GroundCheck.GroundFigures m = GroundCheck.figures(of.size(), of);
                System.out.printf(Locale.ROOT, "  %s fits %d p95 n/U/T %.2e %.2e %.2e flagged %.1f %%%n", mode, of.size(),
                        m.p95Relative()[0], m.p95Relative()[1], m.p95Relative()[2], 100.0 * m.nonStationary() / of.size());
            }
        }
        System.out.printf(Locale.ROOT,
                "%s resurvey %d style %d periods %d budget %d survey %d margin %d, %d seeds (stride %d) x %.0f s: fits %d,"
                        + " median n/U/T %.2e %.2e %.2e, p95 %.2e %.2e %.2e, flagged %.1f %%, bit/s %.0f, D-eff %.3f%n",
                scenario, resurvey, style, periods, budget, survey, margin, seeds, stride, seconds, g.compared(),
                g.medianRelative()[0], g.medianRelative()[1], g.medianRelative()[2], g.p95Relative()[0], g.p95Relative()[1],
                g.p95Relative()[2], 100.0 * g.nonStationary() / Math.max(1, g.compared()), bits, deff);
    }
}
