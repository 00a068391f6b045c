package dev.sweepline.fsw.host;

import picocli.CommandLine.Command;
import picocli.CommandLine;

/** {@code sweepline-fsw.jar}: the flight software on a PC, talking to real or simulated electronics. */
@Command(name = "sweepline-fsw", mixinStandardHelpOptions = true, versionProvider = FswMain.Version.class,
        description = {"The Faraday-cup flight software on a PC, on a serial or TCP link to the electronics.",
            "",
            HvText.CAUTION},
        subcommands = {FswRunCommand.class, FswInstrumentsCommand.class, CommandLine.HelpCommand.class})
public final class FswMain implements Runnable {
    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    /** Runs the command line and exits with its status. */
    public static void main(String[] args) {
        System.exit(commandLine().execute(args));
    }

    /** The command line, for tests that run it in process. */
    public static CommandLine commandLine() {
        return CommandLines.configure(new CommandLine(new FswMain()), "run");
    }

    /** The version line: the Maven build's project version. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            return new String[] {"sweepline-fsw " + CommandLines.version(FswMain.class)};
        }
    }

    @Override
    public void run() {
        spec.commandLine().usage(System.out);
    }
}
