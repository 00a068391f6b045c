package dev.sweepline.fsw.host.instrument;

import dev.sweepline.fsw.host.yaml.BuiltIns;
import dev.sweepline.fsw.host.yaml.FileFormatException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

/**
 * Finds instrument descriptions: the built-ins shipped under {@code instruments/} and listed by
 * {@code instruments/index.txt}, and files by path (FORMAT.md: a built-in name wins over a file of the
 * same name in the working directory; write {@code ./name} for the file).
 */
public final class Instruments {
    /** The built-in descriptions. */
    static final BuiltIns BUILT_INS = new BuiltIns("instruments/", "instrument");
    /** The instrument of a run that names none (FORMAT.md: the demo cup). */
    static final String DEFAULT_NAME = "demo-cup";

    /** Built-ins read once (the records are immutable, so shared). */
    private static final Map<String, InstrumentSpec> READ = new ConcurrentHashMap<>();

    private Instruments() {
    }

    /** The names of the built-in descriptions, in index order. */
    public static List<String> builtInNames() {
        return BUILT_INS.names();
    }

    /** The name of the default description, a built-in. */
    public static String defaultName() {
        return DEFAULT_NAME;
    }

    /** The default description (the demo cup). */
    public static InstrumentSpec defaultSpec() {
        return builtIn(DEFAULT_NAME);
    }

    /**
     * The built-in {@code name}.
     *
     * @throws FileFormatException when there is none of that name (the message lists the built-ins), or
     *                             its file's name does not match
     */
    public static InstrumentSpec builtIn(String name) {
        if (!builtInNames().contains(name)) {
            throw BUILT_INS.unknown(name);
        }
        InstrumentSpec known = READ.get(name);
        if (known != null) {
            return known;
        }
        String resource = BUILT_INS.resourceOf(name);
        InstrumentSpec spec = InstrumentFileReader.read(BUILT_INS.resource(resource), resource);
        if (!spec.name().equals(name)) {
            throw new FileFormatException(resource, 0, "name", "a built-in's name must match its file, got '"
                    + spec.name() + "'");
        }
        READ.put(name, spec);
        return spec;
    }

    /** The description in {@code file}. */
    public static InstrumentSpec load(Path file) {
        return InstrumentFileReader.read(BuiltIns.file(file), file.toString());
    }

    /**
     * A built-in by name, or else the file at the path {@code nameOrFile}.
     *
     * @throws FileFormatException when it is neither, or is not a valid description (file, line, field)
     */
    public static InstrumentSpec resolve(String nameOrFile) {
        if (builtInNames().contains(nameOrFile)) {
            return builtIn(nameOrFile);
        }
        Path path = Path.of(nameOrFile);
        if (Files.isRegularFile(path)) {
            return load(path);
        }
        throw BUILT_INS.unknown(nameOrFile);
    }
}
