package dev.sweepline.fsw.host;

import dev.sweepline.fsw.host.instrument.InstrumentSpec;
import dev.sweepline.fsw.host.instrument.Instruments;
import dev.sweepline.fsw.host.yaml.FileFormatException;
import java.io.PrintStream;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;

/**
 * {@code instruments}: the built-in instrument descriptions ({@code instruments/index.txt}), one line each:
 * name, telemetry id, ADC width, windows, and the description's first sentence; the default is marked.
 */
@Command(name = "instruments", mixinStandardHelpOptions = true,
        description = "List the built-in instrument descriptions (for --instrument; instruments/FORMAT.md).")
final class FswInstrumentsCommand implements Callable<Integer> {
    /** Console output. */
    PrintStream out = System.out;
    /** Console errors. */
    PrintStream err = System.err;

    @Override
    public Integer call() {
        try {
            for (String name : Instruments.builtInNames()) {
                InstrumentSpec s = Instruments.builtIn(name);
                out.printf("%-12s id %-5d %2d-bit ADC %3d windows%s  %s%n", name, s.id(), s.adc().bits(),
                        s.windows().count(), name.equals(Instruments.defaultName()) ? " (default)" : "",
                        s.description());
            }
            return ExitStatus.OK;
        } catch (FileFormatException e) {
            err.println(e.getMessage());
            return ExitStatus.INPUT;
        }
    }
}
