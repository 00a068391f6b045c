package dev.sweepline.sim.instrument;

import dev.sweepline.fsw.host.instrument.InstrumentSpec;
import dev.sweepline.fsw.host.instrument.Instruments;
import dev.sweepline.fsw.host.yaml.FileFormatException;
import dev.sweepline.fsw.host.yaml.Section;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * The {@code instrument:} key of a campaign or plan file (their FORMAT.md): a built-in name or a
 * description file, relative to the file's folder first. The command line's {@code --instrument}
 * must agree with it (the same instrument name); without the key the command line's instrument, else
 * the default (instruments/FORMAT.md: the demo cup), is flown.
 */
public final class InstrumentKey {
    /** The key's name in campaign and plan files. */
    public static final String KEY = "instrument";

    private InstrumentKey() {
    }

    /**
     * The instrument a file's top section names, checked against the command line's.
     *
     * @param top    the file's top section
     * @param folder the file's folder (null: none), for a relative description path
     * @param option the command line's {@code --instrument}, or null
     * @throws FileFormatException naming the file, the key's line and {@code instrument} when the key names
     *                             no valid description or disagrees with {@code option}
     */
    public static InstrumentSpec choose(Section top, Path folder, InstrumentSpec option) {
        if (!top.has(KEY)) {
            return option != null ? option : Instruments.defaultSpec();
        }
        int line = top.required(KEY).line();
        String name = top.text(KEY);
        InstrumentSpec named;
        try {
            Path beside = folder == null || Instruments.builtInNames().contains(name) ? null : folder.resolve(name);
            named = beside != null && Files.isRegularFile(beside) ? Instruments.load(beside) : Instruments.resolve(name);
        } catch (FileFormatException e) {
            throw new FileFormatException(top.file(), line, KEY, e.getMessage(), e);
        }
        if (option != null && !option.name().equals(named.name())) {
            throw new FileFormatException(top.file(), line, KEY, "the file is for instrument '" + named.name()
                    + "' but --instrument gives '" + option.name() + "': they must agree");
        }
        return named;
    }
}
