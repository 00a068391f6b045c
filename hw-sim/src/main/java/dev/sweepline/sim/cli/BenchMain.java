package dev.sweepline.sim.cli;

import dev.sweepline.fsw.host.CommandLines;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** {@code sweepline-bench.jar}: the closed-loop bench and its tools. */
@Command(name = "sweepline-bench", mixinStandardHelpOptions = true, versionProvider = BenchMain.Version.class,
        description = {"Closed-loop bench for the Faraday-cup flight software: runs, scenarios, the simulated",
            "instrument server, tuning campaigns, bandwidth budgets."},
        subcommands = {RunCommand.class, ScenariosCommand.class, ServeCommand.class, TuneCommand.class,
            MergeCommand.class, BudgetCommand.class, InstrumentsCommand.class, EvaluateCommand.class, CommandLine.HelpCommand.class})
public final class BenchMain implements Runnable {
    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    /** Runs the command line and exits with its status. */
    public static void main(String[] args) {
        JitPolicy.ownProcess(args);
        System.exit(commandLine().execute(args));
    }

    /** The command line, for tests that run it in process. */
    public static CommandLine commandLine() {
        return CommandLines.configure(new CommandLine(new BenchMain()));
    }

    /** The version line: the Maven build's project version. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            return new String[] {"sweepline-bench " + CommandLines.version(BenchMain.class)};
        }
    }

    @Override
    public void run() {
        spec.commandLine().usage(System.out);
    }
}
