package dev.sweepline.sim.budget;

import dev.sweepline.fsw.host.instrument.InstrumentSpec;
import dev.sweepline.sim.instrument.InstrumentKey;
import dev.sweepline.sim.instrument.InstrumentModel;
import dev.sweepline.sim.scenario.ScenarioLoader;
import dev.sweepline.fsw.host.yaml.FileFormatException;
import dev.sweepline.fsw.table.SweepParameters;
import dev.sweepline.fsw.host.yaml.Section;
import dev.sweepline.fsw.host.yaml.YamlNode;
import dev.sweepline.fsw.host.yaml.YamlTreeReader;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Reads an orbit plan ({@code format: sweepline-plan/1}, described in
 * {@code hw-sim/src/main/resources/plans/FORMAT.md}); every problem names the file, the line and the field.
 */
public final class PlanReader {
    private static final String FORMAT = "sweepline-plan/1";
    /** Plan key of the start-up table's engineering flush interval, seconds. */
    private static final String FLUSH = "engineeringFlushSeconds";
    private static final List<String> TOP = List.of("format", "name", "description", "scenario", "sampleMinutes",
            "sampleEveryHours", "storageMegabits", "phases", "passes", InstrumentKey.KEY, FLUSH);
    private static final List<String> PHASE = List.of("name", "startHours", "endHours", "distanceAu", "mode",
            "allocationBitsPerS");
    private static final List<String> PASS = List.of("startHours", "hours", "bitsPerS");

    private PlanReader() {
    }

    /** Reads the plan at {@code path} for the instrument it names (or the default). */
    public static OrbitPlan load(Path path) {
        return load(path, null);
    }

    /** Reads the plan at {@code path}; {@code instrument} (the command line's, or null) must agree with its {@code instrument:}. */
    public static OrbitPlan load(Path path, InstrumentSpec instrument) {
        try {
            Path folder = path.toAbsolutePath().getParent();
            return parse(Files.readString(path), path.toString(), folder, instrument);
        } catch (NoSuchFileException e) {
            throw new FileFormatException(path.toString(), 0, "", "no such file", e);
        } catch (IOException e) {
            throw new FileFormatException(path.toString(), 0, "", "cannot read: " + e, e);
        }
    }

    /** Parses plan text for the instrument it names (or the default). */
    public static OrbitPlan parse(String text, String file) {
        return parse(text, file, null, null);
    }

    /** Parses plan text; {@code folder} resolves a relative instrument path; {@code option} must agree with it. */
    public static OrbitPlan parse(String text, String file, Path folder, InstrumentSpec option) {
        Section top = Section.of(file, YamlTreeReader.read(text, file), TOP);
        if (!FORMAT.equals(top.text("format"))) {
            throw new FileFormatException(file, top.required("format").line(), "format", "expected " + FORMAT);
        }
        InstrumentModel instrument = InstrumentModel.of(InstrumentKey.choose(top, folder, option));
        var scenario = wrap(file, top, () -> ScenarioLoader.resolve(top.text("scenario")));
        double sampleMinutes = positive(top, "sampleMinutes", 2);
        double every = positive(top, "sampleEveryHours", 12);
        double storage = top.has("storageMegabits") ? positive(top, "storageMegabits", 0) : Double.NaN;
        List<Phase> phases = phases(file, top.required("phases"));
        List<OrbitPlan.Pass> passes = top.has("passes") ? passes(file, top.required("passes")) : List.of();
        return new OrbitPlan(top.text("name"), top.text("description", ""), scenario, sampleMinutes, every, storage,
                phases, passes, instrument, top.has(FLUSH) ? flushSeconds(file, top) : 0);
    }

    /** The plan's engineering flush: a whole number of seconds, 0 (the build's) or 1..600 (commands.md §4.1). */
    private static int flushSeconds(String file, Section top) {
        double v = top.number(FLUSH);
        if (v != Math.rint(v) || v < 0 || v > SweepParameters.MAX_ENGINEERING_FLUSH_SECONDS) {
            throw new FileFormatException(file, top.required(FLUSH).line(), FLUSH, "expected whole seconds, 0 (the "
                    + "build's) or 1.." + SweepParameters.MAX_ENGINEERING_FLUSH_SECONDS + ", got "
                    + FileFormatException.number(v));
        }
        return (int) v;
    }

    private static List<Phase> phases(String file, YamlNode node) {
        if (!(node instanceof YamlNode.Sequence seq) || seq.items().isEmpty()) {
            throw new FileFormatException(file, node.line(), node.path(), "expected a non-empty list of phases");
        }
        List<Phase> phases = new ArrayList<>();
        double previousEnd = 0;
        for (YamlNode item : seq.items()) {
            Section s = Section.of(file, item, PHASE);
            double start = s.number("startHours");
            double end = s.number("endHours");
            if (start != previousEnd) {
                throw s.invalid(s.required("startHours"), "phases must follow each other without gaps: expected "
                        + FileFormatException.number(previousEnd), start);
            }
            if (!(end > start)) {
                throw s.invalid(s.required("endHours"), "must be after startHours", end);
            }
            YamlNode d = s.required("distanceAu");
            double[] distance = distances(s, d);
            Phase.Mode mode = mode(s);
            double allocation = positive(s, "allocationBitsPerS", 0);
            phases.add(new Phase(s.text("name"), start, end, distance[0], distance[1], mode, allocation));
            previousEnd = end;
        }
        return phases;
    }

    private static double[] distances(Section s, YamlNode d) {
        double[] v;
        if (d instanceof YamlNode.Sequence seq && seq.items().size() == 2) {
            v = new double[] {s.number(seq.items().get(0)), s.number(seq.items().get(1))};
        } else if (d instanceof YamlNode.Scalar) {
            double x = s.number(d);
            v = new double[] {x, x};
        } else {
            throw s.typeError(d, "a distance or a list [from, to]");
        }
        for (double x : v) {
            if (!(x > 0.01 && x <= 10)) {
                throw s.invalid(d, "distances must lie in (0.01, 10] AU", x);
            }
        }
        return v;
    }

    private static Phase.Mode mode(Section s) {
        String text = s.text("mode");
        for (Phase.Mode m : Phase.Mode.values()) {
            if (m.key().equals(text)) {
                return m;
            }
        }
        YamlNode n = s.required("mode");
        throw new FileFormatException(s.file(), n.line(), n.path(), "expected adaptive, survey or safe, got '" + text + "'");
    }

    private static List<OrbitPlan.Pass> passes(String file, YamlNode node) {
        if (!(node instanceof YamlNode.Sequence seq)) {
            throw new FileFormatException(file, node.line(), node.path(), "expected a list of passes");
        }
        List<OrbitPlan.Pass> passes = new ArrayList<>();
        for (YamlNode item : seq.items()) {
            Section s = Section.of(file, item, PASS);
            passes.add(new OrbitPlan.Pass(s.number("startHours"), positive(s, "hours", 0), positive(s, "bitsPerS", 0)));
        }
        return passes;
    }

    private static double positive(Section s, String key, double absent) {
        if (!s.has(key) && absent > 0) {
            return absent;
        }
        double v = s.number(key);
        if (!(v > 0)) {
            throw s.invalid(s.required(key), "must be positive", v);
        }
        return v;
    }

    private static <T> T wrap(String file, Section top, java.util.function.Supplier<T> f) {
        try {
            return f.get();
        } catch (FileFormatException e) {
            throw new FileFormatException(file, top.required("scenario").line(), "scenario", e.getMessage(), e);
        }
    }
}
