package dev.sweepline.ground.cli;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * Command-line entry point of the ground decoder jar: {@code decode FILE --out DIR},
 * {@code inspect FILE}, {@code instruments} and {@code help}. Exit status ({@link ExitCodes}, listed in
 * every command's help): 0 when the input was read (bad frames included), 2 for bad usage, 4 for an
 * unreadable input, 5 when the products cannot be written; every error is one line on stderr.
 */
@Command(name = "sweepline-ground", mixinStandardHelpOptions = true, versionProvider = GroundMain.Version.class,
        description = "Decodes TM frames of the telemetry ICD into spectra and reports.",
        subcommands = {DecodeCommand.class, InspectCommand.class, InstrumentsCommand.class,
            CommandLine.HelpCommand.class})
public final class GroundMain implements Runnable {
    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    /** Runs the command line and exits with its status. */
    public static void main(String[] args) {
        System.exit(run(args));
    }

    /** Runs the command line and returns its exit status (for tests). */
    public static int run(String... args) {
        return commandLine().execute(args);
    }

    /** The command line with its one-line error handlers and exit-status lists (for tests that capture its output). */
    public static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new GroundMain());
        cl.setParameterExceptionHandler((e, args) -> {
            e.getCommandLine().getErr().println(e.getCommandLine().getCommandSpec().qualifiedName() + ": "
                    + e.getMessage() + " (see --help)");
            e.getCommandLine().getErr().flush();
            return ExitCodes.USAGE;
        });
        cl.setExecutionExceptionHandler((e, failed, parsed) -> {
            String where = failed.getCommandSpec().qualifiedName() + ": ";
            int status = e instanceof GroundFailure g ? g.status() : ExitCodes.FAILED;
            failed.getErr().println(where + (e instanceof GroundFailure ? e.getMessage() : "unexpected error: " + e));
            failed.getErr().flush();
            return status;
        });
        listStatuses(cl);
        return cl;
    }

    private static void listStatuses(CommandLine cl) {
        cl.getCommandSpec().usageMessage().exitCodeListHeading("Exit status:%n").exitCodeList(ExitCodes.helpList());
        cl.getSubcommands().values().forEach(GroundMain::listStatuses);
    }

    /** The version line: the Maven build's project version (version.properties, filtered by the build). */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() throws java.io.IOException {
            java.util.Properties p = new java.util.Properties();
            try (java.io.InputStream in = GroundMain.class.getResourceAsStream("version.properties")) {
                if (in != null) {
                    p.load(in);
                }
            }
            return new String[] {"sweepline-ground " + p.getProperty("version", "unknown")};
        }
    }

    /** Without a subcommand: print usage. */
    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }
}
