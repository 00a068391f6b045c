package dev.sweepline.sim.cli;

import dev.sweepline.sim.instrument.InstrumentModel;
import dev.sweepline.ground.product.GroundProcessing;
import dev.sweepline.ground.product.GroundProducts;
import dev.sweepline.sim.bench.BenchConfig;
import dev.sweepline.sim.bench.GroundCheck;
import dev.sweepline.sim.bench.GroundInstruments;
import dev.sweepline.sim.bench.TruthSections;
import dev.sweepline.ground.report.QuickLookReport;
import dev.sweepline.ground.decode.DecoderConfig;
import dev.sweepline.ground.spectrum.WindowCatalogue;
import dev.sweepline.fsw.host.script.CommandScript;
import dev.sweepline.fsw.host.script.ScriptException;
import dev.sweepline.sim.command.ScriptRunner;
import dev.sweepline.fsw.host.script.GroundCommandCounter;
import dev.sweepline.fsw.host.script.UplinkLog;
import dev.sweepline.fsw.command.CommandReason;
import dev.sweepline.fsw.nvm.FileNonVolatileStore;
import dev.sweepline.fsw.host.CliException;
import dev.sweepline.fsw.host.CommandLines;
import dev.sweepline.fsw.host.ExitStatus;
import dev.sweepline.fsw.host.Ranges;
import java.util.List;
import dev.sweepline.sim.bench.ClosedLoopBench;
import dev.sweepline.sim.bench.DecisionsCsv;
import dev.sweepline.sim.bench.RunReportWriter;
import dev.sweepline.sim.bench.RunFigures;
import dev.sweepline.sim.report.DecisionChart;
import dev.sweepline.sim.scenario.Scenario;
import dev.sweepline.sim.scenario.ScenarioException;
import dev.sweepline.sim.scenario.ScenarioLoader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code run}: one closed-loop run of the flight software against the simulated instrument. */
@Command(name = "run", mixinStandardHelpOptions = true,
        description = "Run the flight software closed loop against the simulated instrument on a scenario.")
final class RunCommand implements Callable<Integer> {
    @Option(names = "--scenario", paramLabel = "NAME|FILE",
            description = "Built-in scenario name or a scenario file (default: ${DEFAULT-VALUE}).")
    String scenario = ScenarioLoader.defaultName();

    @Option(names = "--minutes", paramLabel = "M", converter = Ranges.Positive.class,
            description = "Simulated minutes to run (default: the scenario's own duration).")
    Double minutes;

    @CommandLine.Mixin
    InstrumentOption instrument = new InstrumentOption();

    @Option(names = "--seed", paramLabel = "S", description = "Seed of all randomness (default: ${DEFAULT-VALUE}).")
    long seed = 1;

    @Option(names = "--out", paramLabel = "DIR", description = "Output folder (default: ${DEFAULT-VALUE}).")
    Path out = Path.of("sweepline-out", "run");

    @Option(names = "--commands", paramLabel = "SCRIPT",
            description = "Time-tagged telecommands (and fault injections) to send during the run (commands.md §7).")
    Path commands;

    @Option(names = "--nvm", paramLabel = "FILE",
            description = "File standing for the flight software's non-volatile memory (tables survive restarts).")
    Path nvm;

    @Option(names = "--uplink-replay", paramLabel = "UPLINK_TC",
            description = "Send the telecommand packets of an earlier run's uplink.tc again, unchanged, at their "
                + "time tags (instead of --commands): an authenticated flight software must refuse them as REPLAY.")
    Path uplinkReplay;

    @Option(names = "--no-auth", description = "Switch command authentication off (quick runs; the default is on).")
    boolean noAuth;

    @Option(names = "--no-ground", description = "Skip the ground's decoding and fitting of the run (long runs).")
    boolean noGround;

    @Option(names = "--baud", paramLabel = "BAUD", converter = Ranges.PositiveInt.class,
            description = "Serial line rate the link load is checked against (default: ${DEFAULT-VALUE}).")
    int baud = 115_200;

    @Option(names = "--allocation", paramLabel = "BITS_PER_S", converter = Ranges.Positive.class,
            description = "Downlink allocation to check the telemetry against, bit/s (default: none).")
    Double allocation;

    @Override
    public Integer call() throws Exception {
        Scenario sc = scenario(scenario);
        instrument.resolve();
        InstrumentModel model = instrument.model();
        double seconds = minutes != null ? minutes * 60.0 : sc.durationSeconds();
        BenchConfig config = BenchConfig.defaults(sc, seed, seconds, model)
                .withAllocation(allocation != null ? allocation : Double.NaN);
        if (commands != null && uplinkReplay != null) {
            throw new CliException(ExitStatus.USAGE, "--commands and --uplink-replay exclude each other: give one");
        }
        ScriptRunner script = null;
        CommandScript parsed = null;
        if (commands != null || nvm != null || uplinkReplay != null) {
            Path source = uplinkReplay != null ? uplinkReplay : commands;
            String option = uplinkReplay != null ? "--uplink-replay " : "--commands ";
            try {
                parsed = uplinkReplay != null ? CommandScript.ofUplink(UplinkLog.read(uplinkReplay))
                        : commands == null ? CommandScript.parse(List.of(), model.flight())
                        : CommandScript.read(commands, model.flight());
                // the bench's sender keeps its authentication counter beside the NVM file (commands.md §7.3)
                GroundCommandCounter counter = nvm == null ? GroundCommandCounter.inMemory()
                        : GroundCommandCounter.beside(nvm);
                script = new ScriptRunner(parsed, !noAuth, nvm == null ? null : new FileNonVolatileStore(nvm), counter);
            } catch (ScriptException e) {
                throw CliException.input(option + source + ":" + e.getMessage());
            } catch (java.io.IOException e) {
                throw CliException.input(option + source + ": " + CommandLines.reason(e));
            }
            parsed.warnings().forEach(w -> System.out.println("warning: " + source + ": " + w));
        }
        OutputFolder.create(out);
        // the ground knows the built-in table, the one restored from the NVM file and those the script uplinks
        WindowCatalogue windows = new WindowCatalogue();
        if (nvm != null && Files.isRegularFile(nvm)) {
            windows.add(Files.readAllBytes(nvm));
        }
        if (commands != null) {
            parsed.images().forEach(windows::add);
        }
        ClosedLoopBench.Result result;
        // decisions.csv is written as the run goes; the records stay in memory only for the ground check
        try (ConsoleProgress progress = new ConsoleProgress("run " + sc.name());
                FrameFile frames = new FrameFile(out.resolve("telemetry.tm"));
                UplinkLog uplink = UplinkLog.create(out.resolve(UplinkLog.FILE));
                DecisionsCsv decisionLog = DecisionsCsv.create(out.resolve(RunReportWriter.DECISIONS_CSV))) {
            result = ClosedLoopBench.run(config, progress, ClosedLoopBench.Hooks.NONE.withFrames(frames)
                    .withCycle(script == null ? ClosedLoopBench.CycleHook.NONE : script.recordingTo(uplink))
                    .withSweepLog(decisionLog, !noGround));
        }
        if (script != null) {
            printCommandOutcome(script);
        }
        RunReportWriter.printTable(result.summary(), System.out);
        Map<String, Object> extra = new LinkedHashMap<>();
        extra.put("linkLoad", RunReportWriter.linkMap(config, baud));
        List<String> warnings = RunWarnings.of(config, baud, result.summary().telemetry());
        byte[] decisions = RunFigures.decisionChart(config, result, commandMarkers(script));
        Files.write(out.resolve(RunFigures.DECISIONS_PNG), decisions);
        if (noGround) {
            RunReportWriter.writeSummary(out, result, extra);
            System.out.println("wrote " + out.resolve("summary.json") + ", decisions.csv, decisions.png and telemetry.tm"
                    + " (no ground products)");
            return RunWarnings.print(warnings, System.out);
        }
        // the ground's view: decode and fit what the flight software sent, compare with the truth
        Path groundDir = out.resolve("ground");
        GroundProducts ground = GroundProcessing.process(out.resolve("telemetry.tm"), groundDir,
                allocation != null ? OptionalDouble.of(allocation) : OptionalDouble.empty(),
                DecoderConfig.autoLength().withInstruments(GroundInstruments.of(model.spec())), windows,
                RunFigures.additions(result, config.flight().coarseTimeAtTickZero, decisions));
        GroundCheck.GroundFigures figures = GroundCheck.compare(ground.moments(), result.recorder().sweeps(),
                result.recorder()::truthAt, config.flight().coarseTimeAtTickZero);
        // the ground's quick-look with the bench's comparison against the truth after it
        Files.write(out.resolve("report.html"), QuickLookReport.withSections(
                Files.readAllBytes(groundDir.resolve(GroundProcessing.REPORT)), TruthSections.of(figures)));
        extra.putAll(RunReportWriter.groundMap(figures));
        RunReportWriter.printGround(figures, System.out);
        RunReportWriter.writeSummary(out, result, extra);
        System.out.println("wrote " + out.resolve("summary.json") + ", decisions.csv, decisions.png, telemetry.tm, "
                + "report.html"
                + " and the ground products in " + groundDir);
        return RunWarnings.print(warnings, System.out);
    }

    /** The scenario {@code --scenario} names (a built-in or a file). */
    static Scenario scenario(String nameOrFile) {
        try {
            return ScenarioLoader.resolve(nameOrFile);
        } catch (ScenarioException e) {
            throw CliException.input("--scenario " + e.getMessage());
        }
    }

    /** The telecommands sent, as event markers of the sweep-decision chart ("TC line N", refusals named). */
    private static List<DecisionChart.Marker> commandMarkers(ScriptRunner script) {
        List<DecisionChart.Marker> markers = new java.util.ArrayList<>();
        if (script != null) {
            for (dev.sweepline.fsw.host.script.ScriptPlayer.Sent x : script.sent()) {
                markers.add(new DecisionChart.Marker(x.atMicros() / 1e6, "TC line " + x.line()
                        + (x.reason() == 0 ? "" : " " + CommandReason.name(x.reason())), true));
            }
        }
        return markers;
    }

    /** Commands sent and refused, with the count of each refusal reason. */
    private static void printCommandOutcome(ScriptRunner script) {
        Map<String, Long> refusals = new java.util.TreeMap<>();
        script.sent().stream().filter(x -> x.reason() != 0)
                .forEach(x -> refusals.merge(CommandReason.name(x.reason()), 1L, Long::sum));
        long refused = refusals.values().stream().mapToLong(Long::longValue).sum();
        System.out.println("commands: " + script.sent().size() + " sent, " + refused + " refused"
                + (refusals.isEmpty() ? "" : " " + refusals));
    }
}
