package dev.sweepline.ground.cli;

import dev.sweepline.ground.instrument.DefaultWindowTable;
import dev.sweepline.ground.instrument.GroundInstrument;
import dev.sweepline.ground.instrument.InstrumentSet;
import java.io.PrintWriter;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code instruments}: the built-in instrument descriptions, one line each. */
@Command(name = "instruments", mixinStandardHelpOptions = true,
        description = "Lists the built-in instrument descriptions: name, id, windows of the default table and "
                + "their nominal voltage range, the modulator's rating, ADC bits and the gain ranges' full scales.")
final class InstrumentsCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        out.printf("%-12s %5s %7s  %-17s %9s %8s  %s%n", "name", "id", "windows", "table (V)", "rating", "ADC bits",
                "ranges (full scale)");
        for (GroundInstrument i : InstrumentSet.builtIns().all()) {
            DefaultWindowTable t = i.windows();
            out.printf("%-12s %5d %7d  %-17s %7.0f V %8d  %s%n", i.name(), i.id(), t.windows(),
                    volts(t.tableVolts(0)) + "-" + volts(t.tableVolts(t.windows())), i.modulator().maxVolts(),
                    i.sampleBits(), ranges(i));
        }
        out.flush();
        return ExitCodes.OK;
    }

    private static String volts(double v) {
        return new BigDecimal(v).round(new MathContext(6)).stripTrailingZeros().toPlainString();
    }

    /** "3: 40 pA, 1.28 nA, 40.96 nA". */
    static String ranges(GroundInstrument i) {
        List<String> fs = new ArrayList<>();
        for (int r = 0; r < i.gains().ranges(); r++) {
            fs.add(amps(i.gains().fullScaleAmps(r)));
        }
        return i.gains().ranges() + ": " + String.join(", ", fs);
    }

    private static String amps(double a) {
        String[] units = {"pA", "nA", "uA", "mA"};
        double v = a * 1e12;
        int u = 0;
        while (v >= 1000 && u < units.length - 1) {
            v /= 1000;
            u++;
        }
        return new BigDecimal(v).round(new MathContext(4)).stripTrailingZeros().toPlainString() + " " + units[u];
    }
}
