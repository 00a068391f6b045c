package dev.sweepline.sim.cli;

import dev.sweepline.sim.bench.BenchConfig;
import dev.sweepline.sim.bench.ClosedLoopBench;
import dev.sweepline.sim.bench.RunReportWriter;
import dev.sweepline.sim.scenario.Scenario;
import dev.sweepline.sim.scenario.ScenarioException;
import dev.sweepline.sim.scenario.ScenarioLoader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code run}: one closed-loop run of the flight software against the simulated instrument. */
@Command(name = "run", mixinStandardHelpOptions = true,
        description = "Run the flight software closed loop against the simulated instrument on a scenario.")
final class RunCommand implements Callable<Integer> {
    @Option(names = "--scenario", paramLabel = "NAME|FILE",
            description = "Built-in scenario name or a scenario file (default: ${DEFAULT-VALUE}).")
    String scenario = ScenarioLoader.defaultName();

    @Option(names = "--minutes", paramLabel = "M",
            description = "Simulated minutes to run (default: the scenario's own duration).")
    Double minutes;

    @Option(names = "--seed", paramLabel = "S", description = "Seed of all randomness (default: ${DEFAULT-VALUE}).")
    long seed = 1;

    @Option(names = "--out", paramLabel = "DIR", description = "Output folder (default: ${DEFAULT-VALUE}).")
    Path out = Path.of("sweepline-out", "run");

    @Option(names = "--allocation", paramLabel = "BITS_PER_S",
            description = "Downlink allocation to check the telemetry against, bit/s (default: none).")
    Double allocation;

    @Override
    public Integer call() throws Exception {
        Scenario sc;
        try {
            sc = ScenarioLoader.resolve(scenario);
        } catch (ScenarioException e) {
            System.err.println("scenario error: " + e.getMessage());
            return 2;
        }
        double seconds = minutes != null ? minutes * 60.0 : sc.durationSeconds();
        if (!(seconds > 0)) {
            System.err.println("--minutes must be positive");
            return 2;
        }
        BenchConfig config = BenchConfig.defaults(sc, seed, seconds)
                .withAllocation(allocation != null ? allocation : Double.NaN);
        Files.createDirectories(out);
        ClosedLoopBench.Result result;
        try (ConsoleProgress progress = new ConsoleProgress("run " + sc.name());
                FrameFile frames = new FrameFile(out.resolve("telemetry.tm"))) {
            result = ClosedLoopBench.run(config, progress, frames);
        }
        RunReportWriter.printTable(result.summary(), System.out);
        RunReportWriter.write(out, result);
        System.out.println("wrote " + out.resolve("summary.json") + ", " + out.resolve("decisions.csv") + " and "
                + out.resolve("telemetry.tm"));
        return 0;
    }
}
