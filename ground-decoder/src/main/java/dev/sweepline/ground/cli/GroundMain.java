package dev.sweepline.ground.cli;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * Command-line entry point of the ground decoder jar: {@code decode FILE --out DIR},
 * {@code inspect FILE} and {@code instruments}. Exit status: 0 when the input was read (bad frames
 * included), 2 for an unreadable
 * input or bad usage, 1 when the products cannot be written.
 */
@Command(name = "sweepline-ground", mixinStandardHelpOptions = true, version = "sweepline-ground 0.1.0",
        description = "Decodes TM frames of the telemetry ICD into spectra and reports.",
        subcommands = {DecodeCommand.class, InspectCommand.class, InstrumentsCommand.class})
public final class GroundMain implements Runnable {
    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    /** Runs the command line and exits with its status. */
    public static void main(String[] args) {
        System.exit(run(args));
    }

    /** Runs the command line and returns its exit status (for tests). */
    public static int run(String... args) {
        return new CommandLine(new GroundMain()).execute(args);
    }

    /** Without a subcommand: print usage. */
    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }
}
