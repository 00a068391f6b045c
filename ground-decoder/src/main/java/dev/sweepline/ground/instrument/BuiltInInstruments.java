package dev.sweepline.ground.instrument;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * The built-in descriptions: the files of the flight software's {@code instruments} folder, which the
 * build copies into this module's class path at {@code /instruments} (data shared, no code
 * dependency), listed one name a line in {@code index.txt}. {@code demo-cup} is the default instrument
 * and the one layout-1 spectra were made with (telemetry ICD §4). Read once; thread-safe.
 */
public final class BuiltInInstruments {
    /** Class-path folder of the descriptions. */
    public static final String FOLDER = "instruments/";
    /** The default instrument, and the instrument of layout-1 spectra (telemetry ICD §4). */
    public static final String DEMO_CUP = "demo-cup";

    private BuiltInInstruments() {
    }

    /** Built-in names, in index order. */
    public static List<String> names() {
        return Holder.NAMES;
    }

    /** True when {@code name} is built in. */
    public static boolean isBuiltIn(String name) {
        return Holder.NAMES.contains(name);
    }

    /** Every built-in description, in index order. */
    public static InstrumentSet all() {
        return Holder.ALL;
    }

    /** The built-in {@code name}. */
    public static GroundInstrument get(String name) {
        GroundInstrument i = Holder.ALL.byName(name);
        if (i == null) {
            throw new IllegalArgumentException("no built-in instrument " + name + " (built in: "
                    + String.join(", ", Holder.NAMES) + ")");
        }
        return i;
    }

    /** The demo cup, the default instrument. */
    public static GroundInstrument demoCup() {
        return get(DEMO_CUP);
    }

    /** Reads a built-in description from the class path. */
    static GroundInstrument load(String name) {
        String file = FOLDER + name + ".yaml";
        InputStream in = BuiltInInstruments.class.getResourceAsStream("/" + file);
        if (in == null) {
            throw new InstrumentFileException(file, 0, "", "listed in " + FOLDER + "index.txt but not on the class "
                    + "path");
        }
        try (InputStreamReader r = new InputStreamReader(in, StandardCharsets.UTF_8)) {
            GroundInstrument i = InstrumentReader.read(file, file, r);
            if (!i.name().equals(name)) {
                throw new InstrumentFileException(file, 0, "name", "must be the file's name " + name + ", got "
                        + i.name());
            }
            return i;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static List<String> readIndex() {
        InputStream in = BuiltInInstruments.class.getResourceAsStream("/" + FOLDER + "index.txt");
        if (in == null) {
            throw new IllegalStateException("/" + FOLDER + "index.txt is not on the class path: the build copies "
                    + "fsw-core/src/main/resources/instruments there");
        }
        List<String> names = new ArrayList<>();
        try (BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8))) {
            for (String line = r.readLine(); line != null; line = r.readLine()) {
                if (!line.isBlank() && !line.strip().startsWith("#")) {
                    names.add(line.strip());
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return Collections.unmodifiableList(names);
    }

    /** Loaded on first use. */
    private static final class Holder {
        static final List<String> NAMES = readIndex();
        static final InstrumentSet ALL = load();

        private static InstrumentSet load() {
            List<GroundInstrument> list = new ArrayList<>();
            for (String n : NAMES) {
                list.add(BuiltInInstruments.load(n));
            }
            return InstrumentSet.of(list);
        }
    }
}
