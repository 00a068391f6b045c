package dev.sweepline.ground.instrument;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The descriptions a ground is configured with, keyed by instrument id (the id spectrum packets carry,
 * telemetry ICD §4). No two may share an id or a name. Immutable and thread-safe.
 */
public final class InstrumentSet {
    private final List<GroundInstrument> list;
    private final Map<Integer, GroundInstrument> byId = new HashMap<>();
    /** {@link #layoutOne()}, found once: it is asked for every layout-1 spectrum. */
    private final GroundInstrument layoutOne;

    private InstrumentSet(List<GroundInstrument> list) {
        this.list = Collections.unmodifiableList(new ArrayList<>(list));
        Map<String, GroundInstrument> names = new HashMap<>();
        for (GroundInstrument i : list) {
            GroundInstrument sameId = byId.putIfAbsent(i.id(), i);
            if (sameId != null) {
                throw new IllegalArgumentException("instruments " + sameId.name() + " (" + sameId.source() + ") and "
                        + i.name() + " (" + i.source() + ") share id " + i.id()
                        + ": telemetry could not tell them apart");
            }
            GroundInstrument sameName = names.putIfAbsent(i.name(), i);
            if (sameName != null) {
                throw new IllegalArgumentException("two instruments are named " + i.name() + ": " + sameName.source()
                        + " and " + i.source());
            }
        }
        if (list.isEmpty()) {
            throw new IllegalArgumentException("no instrument: the ground needs at least one description");
        }
        this.layoutOne = byName(BuiltInInstruments.DEMO_CUP);
    }

    /** A set of these descriptions (at least one; ids and names distinct). */
    public static InstrumentSet of(List<GroundInstrument> instruments) {
        return new InstrumentSet(instruments);
    }

    /** A set of these descriptions. */
    public static InstrumentSet of(GroundInstrument... instruments) {
        return new InstrumentSet(List.of(instruments));
    }

    /** Every built-in description (the default). */
    public static InstrumentSet builtIns() {
        return BuiltInInstruments.all();
    }

    /**
     * The descriptions {@code namesOrFiles} name: a built-in name, or else a description file (a
     * built-in name wins over a file of that name in the working directory; write {@code ./name} for
     * the file, FORMAT.md). Empty: every built-in.
     *
     * @throws InstrumentFileException  for a broken file, or an argument that is neither
     * @throws IllegalArgumentException for two descriptions with one id or one name
     */
    public static InstrumentSet resolve(List<String> namesOrFiles) {
        if (namesOrFiles.isEmpty()) {
            return builtIns();
        }
        List<GroundInstrument> list = new ArrayList<>();
        for (String arg : namesOrFiles) {
            if (BuiltInInstruments.isBuiltIn(arg)) {
                list.add(BuiltInInstruments.get(arg));
            } else if (Files.isRegularFile(Path.of(arg))) {
                list.add(InstrumentReader.readFile(Path.of(arg)));
            } else {
                throw new InstrumentFileException(arg, 0, "", "neither a built-in instrument ("
                        + String.join(", ", BuiltInInstruments.names()) + ") nor a readable description file");
            }
        }
        return new InstrumentSet(list);
    }

    /** The description of instrument {@code id}, or null when the ground has none. */
    public GroundInstrument byId(int id) {
        return byId.get(id);
    }

    /** The description named {@code name}, or null. */
    public GroundInstrument byName(String name) {
        for (GroundInstrument i : list) {
            if (i.name().equals(name)) {
                return i;
            }
        }
        return null;
    }

    /**
     * The instrument of layout-1 spectra, which carry no id: the demo cup with 16-bit samples (telemetry
     * ICD §4), or null when this set has no description of that name.
     */
    public GroundInstrument layoutOne() {
        return layoutOne;
    }

    /** The descriptions, in the order given. */
    public List<GroundInstrument> all() {
        return list;
    }

    /** "demo-cup (id 1), fine-cup (id 2)", for messages. */
    public String labels() {
        List<String> l = new ArrayList<>();
        for (GroundInstrument i : list) {
            l.add(i.label());
        }
        return String.join(", ", l);
    }
}
