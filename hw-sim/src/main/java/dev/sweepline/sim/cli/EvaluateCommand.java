package dev.sweepline.sim.cli;

import dev.sweepline.fsw.host.CliException;
import dev.sweepline.fsw.host.Ranges;
import dev.sweepline.sim.bench.Evaluation;
import dev.sweepline.sim.bench.MomentErrors;
import dev.sweepline.sim.bench.NonStationarity;
import dev.sweepline.sim.bench.RunPool;
import dev.sweepline.sim.scenario.Scenario;
import dev.sweepline.sim.scenario.ScenarioException;
import dev.sweepline.sim.scenario.ScenarioLoader;
import java.io.PrintStream;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code evaluate}: the evaluation table of the ground's scoring over the built-ins and the evaluation cases. */
@Command(name = "evaluate", mixinStandardHelpOptions = true,
        description = {"Fly every built-in scenario and every evaluation case (scenarios/evaluation/) on a few seeds",
            "with the ground on, and print per case the ground's errors, biases, CRLB ratios, spurious alphas,",
            "tracking error and strict reacquisition; with --calm the calm variants and the fidelity goal."})
final class EvaluateCommand implements Callable<Integer> {
    @Option(names = "--seconds", paramLabel = "S", converter = Ranges.Positive.class, description = "Simulated seconds per run (default: ${DEFAULT-VALUE}).")
    double seconds = 120;

    @Option(names = "--seeds", paramLabel = "K", converter = Ranges.PositiveInt.class, description = "Seeds per case, 1..K (default: ${DEFAULT-VALUE}).")
    int seeds = 3;

    @Option(names = "--threads", paramLabel = "N", converter = Ranges.PositiveInt.class, description = "Worker threads (default: ${DEFAULT-VALUE}).")
    int threads = 2;

    @Option(names = "--calm", description = "Fly the calm variant of every case (no fluctuations, no events) and "
            + "check the fidelity goal.")
    boolean calm;

    @Option(names = "--scenario", paramLabel = "NAME|FILE",
            description = "Evaluate these cases instead (repeatable): a built-in, an evaluation case or a file.")
    List<String> only = new ArrayList<>();

    @CommandLine.Mixin
    InstrumentOption instrument = new InstrumentOption();

    @Override
    public Integer call() {
        instrument.resolve();
        List<Scenario> cases = new ArrayList<>();
        try {
            if (only.isEmpty()) {
                ScenarioLoader.builtInNames().forEach(n -> cases.add(ScenarioLoader.builtIn(n)));
                cases.addAll(ScenarioLoader.evaluationCases());
            } else {
                List<Scenario> evaluation = ScenarioLoader.evaluationCases();
                for (String n : only) {
                    cases.add(evaluation.stream().filter(s -> s.name().equals(n)).findFirst()
                            .orElseGet(() -> ScenarioLoader.resolve(n)));
                }
            }
        } catch (ScenarioException e) {
            throw CliException.input("--scenario " + e.getMessage());
        }
        if (calm) {
            cases.replaceAll(Scenario::calm);
        }
        long[] seedList = new long[seeds];
        for (int i = 0; i < seeds; i++) {
            seedList[i] = i + 1;
        }
        List<Evaluation.Row> rows = Evaluation.evaluate(cases, seedList, seconds, instrument.model(), threads,
                RunPool.Progress.NONE);
        print(rows, System.out);
        return 0;
    }

    /** The table: one block of lines per case. */
    static void print(List<Evaluation.Row> rows, PrintStream out) {
        out.printf(Locale.ROOT, "evaluation: %s; truth at mid-sweep; bias = median z = (fit - truth) / bound; "
                + "flagged: reduced chi-square above the %.3f quantile%n", rows.isEmpty() ? "no cases"
                : rows.get(0).runs() + " seed(s) per case", NonStationarity.QUANTILE);
        for (Evaluation.Row r : rows) {
            MomentErrors e = r.errors();
            MomentErrors st = r.stationary();
            out.printf(Locale.ROOT, "%s  (%d fits, %d flagged)%n", r.name(), e.compared(), r.flagged());
            for (int k = 0; k < 3; k++) {
                out.printf(Locale.ROOT, "  %s  median %7.4f %%  p95 %7.4f %%  bias %+7.2f  CRLB rms %8.2f robust %6.2f"
                        + "  | unflagged: p95 %7.4f %% rms %7.2f robust %6.2f%n",
                        new String[] {"n", "U", "T"}[k], 100 * e.medianRelative()[k], 100 * e.p95Relative()[k],
                        r.bias()[k], e.crlbRatio()[k], e.robustCrlbRatio()[k], 100 * st.p95Relative()[k],
                        st.crlbRatio()[k], st.robustCrlbRatio()[k]);
            }
            out.printf(Locale.ROOT, "  spurious alphas %s   centre error median %.2f p95 %.2f max %.2f windows"
                    + "   strict reacquisition %s%n",
                    r.alphaFreeFits() == 0 ? "n/a (alphas in every sweep)"
                        : String.format(Locale.ROOT, "%d of %d", r.spuriousAlphas(), r.alphaFreeFits()),
                    r.tracking().centreMedian(), r.tracking().centreP95(), r.tracking().centreMax(),
                    r.jumps() == 0 ? "n/a (no jump)" : r.strictSweepsMax() < 0 ? "never"
                        : r.strictSweepsMax() + " sweeps (worst)");
            StringBuilder chi = new StringBuilder("  reduced chi-square mean (expected 1 +- its standard error):");
            r.chiSquare().forEach((mode, c) -> chi.append(String.format(Locale.ROOT, " %s %.3f +- %.3f (%d fits)",
                    mode.name().toLowerCase(Locale.ROOT), c.mean(), c.standardError(), c.fits())));
            out.println(chi);
            if (r.name().endsWith("-calm")) {
                boolean[] pass = Evaluation.fidelity(r);
                StringBuilder goal = new StringBuilder(String.format(Locale.ROOT,
                        "  fidelity goal (p95 n 1 %%, U 0.5 %%, T 3 %%; |bias| < %.1f of the bound):", Evaluation.GOAL_BIAS));
                for (int k = 0; k < 3; k++) {
                    boolean p95 = e.p95Relative()[k] <= Evaluation.GOAL_P95[k];
                    goal.append(' ').append(new String[] {"n", "U", "T"}[k]).append(' ').append(pass[k] ? "pass"
                            : "FAIL (" + (p95 ? "" : "p95") + (p95 ? "bias" : Math.abs(r.bias()[k]) < Evaluation.GOAL_BIAS
                            ? "" : " and bias") + ")");
                }
                out.println(goal);
            }
        }
    }
}
