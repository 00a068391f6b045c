package dev.sweepline.sim.cli;

import dev.sweepline.fsw.host.instrument.InstrumentSpec;
import dev.sweepline.fsw.host.instrument.Instruments;
import dev.sweepline.fsw.host.yaml.FileFormatException;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;

/**
 * {@code instruments}: the built-in instrument descriptions (instruments/index.txt), one line each:
 * name, telemetry id, windows, voltage range, ADC width, gain ranges; the default is marked.
 */
@Command(name = "instruments", mixinStandardHelpOptions = true,
        description = "List the built-in instrument descriptions (for --instrument; instruments/FORMAT.md).")
final class InstrumentsCommand implements Callable<Integer> {
    @Override
    public Integer call() {
        try {
            for (String name : Instruments.builtInNames()) {
                System.out.println(line(Instruments.builtIn(name)));
            }
            return 0;
        } catch (FileFormatException e) {
            throw dev.sweepline.fsw.host.CliException.input(InstrumentOption.error(e));
        }
    }

    /** One description's line. */
    static String line(InstrumentSpec s) {
        InstrumentSpec.Preamp p = s.preamp();
        String ranges = p.ranges() == 1 ? "1 gain range" : p.ranges() + " gain ranges " + p.rangeRatio() + "x apart";
        return String.format(Locale.ROOT, "%-10s id %-3d %3d windows %5.0f-%5.0f V  %2d-bit ADC  %s, %.0f pA full scale%s",
                s.name(), s.id(), s.windows().count(), s.windows().lowVolts(), s.windows().highVolts(), s.adc().bits(),
                ranges, p.fullScaleRange0PicoAmps(), s.name().equals(Instruments.defaultName()) ? "  (default)" : "");
    }
}
