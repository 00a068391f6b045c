package dev.sweepline.sim.cli;

import dev.sweepline.sim.budget.BudgetOutput;
import dev.sweepline.sim.budget.BudgetResult;
import dev.sweepline.sim.budget.BudgetRunner;
import dev.sweepline.sim.budget.OrbitPlan;
import dev.sweepline.sim.budget.PlanReader;
import dev.sweepline.fsw.host.CliException;
import dev.sweepline.fsw.host.ExitStatus;
import dev.sweepline.fsw.host.Ranges;
import dev.sweepline.fsw.host.yaml.FileFormatException;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code budget}: does the telemetry of an orbit plan fit its allocations? */
@Command(name = "budget", mixinStandardHelpOptions = true,
        description = "Check an orbit plan's telemetry volume against the allocation of every phase.")
final class BudgetCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "PLAN.yaml", description = "The orbit plan.")
    Path plan;

    @Option(names = "--out", paramLabel = "DIR", required = true, description = "Output folder.")
    Path out;

    @Option(names = "--seed", paramLabel = "S", description = "Seed of all randomness (default: ${DEFAULT-VALUE}).")
    long seed = 1;

    @Option(names = "--threads", paramLabel = "N", converter = Ranges.PositiveInt.class, description = "Worker threads (default: every core).")
    int threads = Runtime.getRuntime().availableProcessors();

    @CommandLine.Mixin
    InstrumentOption instrument = new InstrumentOption();

    @Override
    public Integer call() throws Exception {
        instrument.resolve();
        OrbitPlan p;
        try {
            p = PlanReader.load(plan, instrument.given());
        } catch (FileFormatException e) {
            throw CliException.input("plan error: " + e.getMessage());
        }
        OutputFolder.create(out);
        BudgetResult r = BudgetRunner.run(p, seed, threads);
        BudgetOutput.write(out, r);
        for (BudgetResult.PhaseBudget b : r.phases()) {
            System.out.printf(Locale.ROOT, "%-22s %9.1f of %9.1f Mbit  margin %+6.1f %%  worst hour %d (%.2f x)%n",
                    b.name(), b.generatedMegabits(), b.allocatedMegabits(), 100 * b.margin(), b.worstHour(),
                    b.worstHourRatio());
        }
        System.out.println(r.fits() ? "verdict: the plan fits its allocations" : "verdict: the plan DOES NOT FIT");
        r.violations().forEach(v -> System.out.println("  " + v));
        System.out.println("wrote " + out.resolve("budget.json") + ", hours.csv, volume.png and report.html");
        return r.fits() ? ExitStatus.OK : ExitStatus.WARNINGS;
    }
}
