package dev.sweepline.sim.cli;

import dev.sweepline.fsw.host.CliException;
import dev.sweepline.fsw.host.instrument.InstrumentSpec;
import dev.sweepline.fsw.host.instrument.Instruments;
import dev.sweepline.fsw.host.yaml.FileFormatException;
import dev.sweepline.sim.instrument.InstrumentModel;
import picocli.CommandLine.Option;

/**
 * {@code --instrument NAME|FILE}, shared by the bench's commands: a built-in description or a
 * description file (instruments/FORMAT.md). Absent: null, so that a campaign or plan file's own
 * {@code instrument:} key (or else the default, the demo cup) decides.
 */
final class InstrumentOption {
    @Option(names = "--instrument", paramLabel = "NAME|FILE",
            description = "The instrument flown: a built-in description (see `instruments`) or a description "
                + "file (instruments/FORMAT.md; default: the file's instrument: key, else "
                + "demo-cup).")
    String instrument;

    private InstrumentSpec resolved;

    /**
     * Reads the description the option names, once.
     *
     * @throws CliException (an input error) with the one line a broken or unknown description gives
     *                      (file, line and field)
     */
    void resolve() {
        try {
            resolved = instrument == null ? null : Instruments.resolve(instrument);
        } catch (FileFormatException e) {
            throw CliException.input(error(e));
        }
    }

    /** The instrument the option names, or null when it is not given (after {@link #resolve()}). */
    InstrumentSpec given() {
        return resolved;
    }

    /** The instrument the option names, else the default (after {@link #resolve()}). */
    InstrumentModel model() {
        return InstrumentModel.of(resolved != null ? resolved : Instruments.defaultSpec());
    }

    /** The one line a broken or unknown description gives (file, line, field), for stderr. */
    static String error(FileFormatException e) {
        return "instrument error: " + e.getMessage();
    }
}
