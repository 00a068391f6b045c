package dev.sweepline.sim.bench;

import dev.sweepline.fsw.exec.FlightConfig;
import dev.sweepline.fsw.sweep.SweepMode;
import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.sim.cup.FaradayCup;
import dev.sweepline.sim.design.DOptimalDesign;
import dev.sweepline.sim.design.DesignSolver;
import dev.sweepline.sim.design.ProtonInformation;
import dev.sweepline.sim.hv.WindowVolts;
import dev.sweepline.sim.plasma.PlasmaState;
import dev.sweepline.sim.scenario.ScenarioLoader;
import java.util.List;
import java.util.Locale;
import java.util.function.Consumer;

/**
 * Prints where a run's information goes (a development tool, run by hand with {@code java -cp} on the test
 * classes; docs/focus-design.md): the D-efficiency split into focus and survey, the integrating fraction in
 * focus, the optimum's support at mid-run, the efficiency of equal-dwell bands around its peak
 * and of the best mixture of such bands.
 * Arguments: scenario, seed, seconds, focusStyle, focusBudgetMicros, surveyIntegrationPeriods,
 * robustnessMarginWindows, resurveyEveryFocusSweeps (0: the table's), focusFloorPeriods (support dwell);
 * -Daround=MICROS prints the sweeps near then.
 */
public final class InformationBudgetDiagnostic {
    private InformationBudgetDiagnostic() {
    }

    public static void main(String[] args) {
        String scenario = args.length > 0 ? args[0] : "quiet-perihelion";
        long seed = args.length > 1 ? Long.parseLong(args[1]) : 1;
        double seconds = args.length > 2 ? Double.parseDouble(args[2]) : 60;
        int style = args.length > 3 ? Integer.parseInt(args[3]) : 0;
        int budget = args.length > 4 ? Integer.parseInt(args[4]) : 600_000;
        int survey = args.length > 5 ? Integer.parseInt(args[5]) : 0;
        int margin = args.length > 6 ? Integer.parseInt(args[6]) : 0;
        int resurvey = args.length > 7 ? Integer.parseInt(args[7]) : 0;
        int floor = args.length > 8 ? Integer.parseInt(args[8]) : 0;
        Consumer<FlightConfig> change = f -> {
            f.parameters.focusStyle = style;
            f.parameters.focusFloorPeriods = floor;
            f.parameters.focusBudgetMicros = (style & (SweepParameters.FOCUS_STYLE_DESIGN
                    | SweepParameters.FOCUS_STYLE_SUPPORT_DWELL)) != 0 ? budget : 0;
            f.parameters.surveyIntegrationPeriods = survey;
            f.parameters.robustnessMarginWindows = margin;
            if (resurvey > 0) {
                f.parameters.resurveyEveryFocusSweeps = resurvey;
            }
        };
        BenchConfig config = BenchConfig.defaults(ScenarioLoader.resolve(scenario), seed, seconds).withFlight(change);
        InformationBudget budgetLog = new InformationBudget();
        ClosedLoopBench.Result r = ClosedLoopBench.run(config, ClosedLoopBench.Progress.NONE,
                ClosedLoopBench.Hooks.NONE.withObserver(budgetLog));
        FlightConfig flight = ClosedLoopBench.flightConfig(config);
        WindowVolts windows = new WindowVolts(flight.table, config.instrument().calibration());
        FaradayCup cup = new FaradayCup(config.instrument().cup());
        ProtonInformation info = new ProtonInformation(config.instrument().cup(), config.instrument().preamp());
        int period = config.instrument().flight().modulationPeriodMicros();
        DOptimalDesign design = new DOptimalDesign(cup, config.instrument().preamp(), windows);
        List<PlasmaState> plasmas = ClosedLoopBench.runPlasmas(r.recorder()::truthAt, config.durationMicros(), 1.0);
        double[] t = new double[1];
        double[][] all = budgetLog.information(null, windows, cup, info, r.recorder()::truthAt, period, t);
        double tAll = t[0];
        double[][] focus = budgetLog.information(SweepMode.FOCUS, windows, cup, info, r.recorder()::truthAt, period, t);
        double tFocus = t[0];
        DesignSolver.Solution opt = design.solve(plasmas, tAll / budgetLog.steps().size());
        System.out.printf(Locale.ROOT, "%s seed %d style %d budget %d survey %d margin %d%n", scenario, seed, style, budget,
                survey, margin);
        System.out.printf(Locale.ROOT, "bench D-eff %.3f  recomputed all %.3f  focus-only %.3f  focus share of integration %.3f%n",
                r.summary().informationEfficiency(), InformationBudget.efficiency(all, opt, tAll),
                InformationBudget.efficiency(focus, opt, tFocus), tFocus / tAll);
        System.out.printf(Locale.ROOT, "integrating (run) %.3f  in focus %.3f  lock %.4f alphaLocks %d strict reacq %d%n",
                r.summary().integratingFraction(), budgetLog.focusIntegratingFraction(period), r.summary().lockFraction(),
                r.summary().alphaLocks(), r.summary().strictReacquireSweepsMax());
        PlasmaState mid = r.recorder().truthAt(config.durationMicros() / 2);
        DesignSolver.Solution midOpt = design.solve(List.of(mid), tAll / budgetLog.steps().size());
        StringBuilder sb = new StringBuilder("optimum at mid-run: ");
        for (int j = 0; j < midOpt.shares().length; j++) {
            if (midOpt.shares()[j] > 0.005) {
                sb.append(String.format(Locale.ROOT, "%d:%.3f ", j, midOpt.shares()[j]));
            }
        }
        System.out.println(sb);
        for (SweepRecord s : r.recorder().sweeps()) {
            long around = Long.getLong("around", config.durationMicros() / 2);
            if (Math.abs(s.midMicros() - around) < 1_500_000) {
                System.out.printf(Locale.ROOT, "sweep %d %s %d..%d peak %.1f centre %.1f true %d  %.2f..%.2f s%n", s.sweep(),
                        s.mode(), s.firstWindow(), s.lastWindow(), s.peakWindow(), s.bandCentre(), s.trueProtonWindow(),
                        s.startMicros() / 1e6,
                        s.endMicros() / 1e6);
            }
        }
        // efficiency of each contiguous equal-dwell band centred on the optimum's peak at the mid plasma
        double[][][] m = design.windowInformation(List.of(mid), tAll / budgetLog.steps().size());
        int centre = 0;
        double best = -1;
        for (int j = 0; j < m.length; j++) {
            if (m[j][0][0] > best) {
                best = m[j][0][0];
                centre = j;
            }
        }
        StringBuilder bands = new StringBuilder("equal-dwell band efficiency by half-width around " + centre + ": ");
        for (int h = 2; h <= 24; h += 2) {
            bands.append(String.format(Locale.ROOT, "%d:%.3f ", h,
                    InformationBudget.efficiency(InformationBudget.equalDwell(m, centre - h, centre + h), midOpt, 1.0)));
        }
        System.out.println(bands);
        // the D-optimal mixture of contiguous equal-dwell bands holding the peak
        List<int[]> cands = new java.util.ArrayList<>();
        for (int a = Math.max(0, centre - 40); a <= centre - 3; a++) {
            for (int b = centre + 3; b <= Math.min(m.length - 1, centre + 40); b++) {
                if (b - a + 1 <= 64) {
                    cands.add(new int[] {a, b});
                }
            }
        }
        double[][][] bm = new double[cands.size()][3][3];
        double bestSingle = 0;
        int[] bestBand = null;
        for (int k = 0; k < cands.size(); k++) {
            int[] c = cands.get(k);
            bm[k] = InformationBudget.equalDwell(m, c[0], c[1]);
            double e = InformationBudget.efficiency(bm[k], midOpt, 1.0);
            if (e > bestSingle) {
                bestSingle = e;
                bestBand = c;
            }
        }
        long settle = 0;
        long dwell = 0;
        int focusSteps = 0;
        for (InformationBudget.Step st : budgetLog.steps()) {
            if (st.mode() == SweepMode.FOCUS) {
                settle += st.settleMicros();
                dwell += (long) st.periods() * period;
                focusSteps++;
            }
        }
        System.out.printf(Locale.ROOT, "focus steps %d mean settle %.0f us mean dwell %.0f us%n", focusSteps,
                settle / (double) focusSteps, dwell / (double) focusSteps);
        System.out.printf(Locale.ROOT, "best single band %d..%d eff %.3f%n", bestBand[0], bestBand[1], bestSingle);
        DesignSolver.Solution mix = DesignSolver.solve(bm, 1e-6);
        StringBuilder ms = new StringBuilder(String.format(Locale.ROOT, "band mixture eff %.3f: ",
                InformationBudget.efficiency(mix.information(), midOpt, 1.0)));
        for (int k = 0; k < cands.size(); k++) {
            if (mix.shares()[k] > 0.01) {
                ms.append(String.format(Locale.ROOT, "%d..%d:%.3f ", cands.get(k)[0], cands.get(k)[1], mix.shares()[k]));
            }
        }
        System.out.println(ms);
    }
}
