package dev.sweepline.sim.campaign;

import dev.sweepline.fsw.instrument.InstrumentDescription;
import dev.sweepline.fsw.host.instrument.InstrumentSpec;
import dev.sweepline.fsw.host.instrument.Instruments;
import dev.sweepline.sim.instrument.InstrumentKey;
import dev.sweepline.sim.instrument.InstrumentModel;
import dev.sweepline.fsw.command.ParameterTable;
import dev.sweepline.fsw.command.TableImage;
import dev.sweepline.fsw.instrument.InstrumentLimits;
import dev.sweepline.fsw.table.TableStatus;
import dev.sweepline.fsw.table.WindowTable;
import dev.sweepline.sim.scenario.PlasmaParameter;
import dev.sweepline.sim.scenario.Scenario;
import dev.sweepline.sim.scenario.ScenarioLoader;
import dev.sweepline.fsw.host.yaml.FileFormatException;
import dev.sweepline.fsw.host.yaml.Section;
import dev.sweepline.fsw.host.yaml.YamlNode;
import dev.sweepline.fsw.host.yaml.YamlTreeReader;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Reads a campaign file ({@code format: sweepline-campaign/1}); every problem names the file, the
 * line and the field. The format is described in {@code hw-sim/src/main/resources/campaigns/FORMAT.md}.
 */
public final class CampaignReader {
    private static final String FORMAT = "sweepline-campaign/1";
    private static final List<String> TOP = List.of("format", "name", "description", "seed", "runsPerSet",
            "durationS", "scenario", "allocationBitsPerS", "draws", "eventShiftS", "grid", "linked", InstrumentKey.KEY);
    private static final List<String> KINDS = List.of("fixed", "uniform", "logUniform", "normal");
    /** Largest campaign this reader accepts, runs: a guard against a typo exploding the grid. */
    static final int MAX_RUNS = 1_000_000;
    /**
     * Largest seed, exclusive: 2^53. The reader reads every number as a double (IEEE 754 binary64, a 53-bit
     * significand), which holds each whole number below it exactly; above it two seeds written differently
     * could be read as one.
     */
    static final double SEED_LIMIT = 0x1p53;
    /** Longest run, s: the scenario format's own limit of a run's duration (scenarios/FORMAT.md). */
    static final double MAX_DURATION_SECONDS = 1e6;

    private CampaignReader() {
    }

    /** Reads the campaign file at {@code path} for the instrument it names (or the default). */
    public static CampaignSpec load(Path path) {
        return load(path, null);
    }

    /**
     * Reads the campaign file at {@code path}; a relative scenario or instrument path in it is taken from
     * the file's folder; {@code instrument} (the command line's, or null) must agree with its {@code instrument:}.
     */
    public static CampaignSpec load(Path path, InstrumentSpec instrument) {
        String text;
        try {
            text = Files.readString(path);
        } catch (NoSuchFileException e) {
            throw new FileFormatException(path.toString(), 0, "", "no such file", e);
        } catch (IOException e) {
            throw new FileFormatException(path.toString(), 0, "", "cannot read: " + e, e);
        }
        Path folder = path.toAbsolutePath().getParent();
        return parse(text, path.toString(), folder, instrument);
    }

    /**
     * The files the campaign at {@code path} names and that a run reads: its scenario and instrument when
     * given as files rather than built-in names, resolved as {@link #load} resolves them. A shard's identity
     * hashes them with the campaign file, so an edited scenario file makes a different campaign.
     */
    public static List<Path> namedFiles(Path path) {
        String text;
        try {
            text = Files.readString(path);
        } catch (IOException e) {
            throw new FileFormatException(path.toString(), 0, "", "cannot read: " + e, e);
        }
        Section top = Section.of(path.toString(), YamlTreeReader.read(text, path.toString()), TOP);
        Path folder = path.toAbsolutePath().getParent();
        List<Path> files = new ArrayList<>();
        if (top.has("scenario")) {
            // a scenario file beside the campaign wins over a built-in of the same name
            String name = top.text("scenario");
            fileNamed(name, ScenarioLoader.builtInNames().contains(name), false, folder).ifPresent(files::add);
        }
        if (top.has(InstrumentKey.KEY)) {
            String name = top.text(InstrumentKey.KEY);
            // a built-in instrument name wins over a file of that name
            fileNamed(name, Instruments.builtInNames().contains(name), true, folder).ifPresent(files::add);
        }
        return files;
    }

    /** True when the campaign at {@code path} names its instrument itself ({@code instrument:}). */
    public static boolean namesInstrument(Path path) {
        String text;
        try {
            text = Files.readString(path);
        } catch (IOException e) {
            throw new FileFormatException(path.toString(), 0, "", "cannot read: " + e, e);
        }
        return Section.of(path.toString(), YamlTreeReader.read(text, path.toString()), TOP).has(InstrumentKey.KEY);
    }

    /** The file {@code name} stands for: beside the campaign, then as given; none for a built-in. */
    private static Optional<Path> fileNamed(String name, boolean builtIn, boolean builtInFirst, Path folder) {
        if (builtIn && builtInFirst) {
            return Optional.empty();
        }
        Path beside = folder == null ? null : folder.resolve(name);
        if (beside != null && Files.isRegularFile(beside)) {
            return Optional.of(beside);
        }
        Path given = Path.of(name);
        return !builtIn && Files.isRegularFile(given) ? Optional.of(given) : Optional.empty();
    }

    /** Parses campaign text for the instrument it names (or the default). */
    public static CampaignSpec parse(String text, String file, Path folder) {
        return parse(text, file, folder, null);
    }

    /** Parses campaign text; {@code folder} resolves a scenario or instrument given as a relative path. */
    public static CampaignSpec parse(String text, String file, Path folder, InstrumentSpec option) {
        Section top = Section.of(file, YamlTreeReader.read(text, file), TOP);
        if (!FORMAT.equals(top.text("format"))) {
            throw new FileFormatException(file, top.required("format").line(), "format", "expected " + FORMAT);
        }
        InstrumentModel model = InstrumentModel.of(InstrumentKey.choose(top, folder, option));
        long seed = (long) whole(top, "seed", 0, SEED_LIMIT - 1);
        int runs = (int) whole(top, "runsPerSet", 1, MAX_RUNS);
        double duration = top.number("durationS");
        if (!(duration > 0 && duration <= MAX_DURATION_SECONDS)) {
            throw top.invalid(top.required("durationS"), "must be positive and at most 1e6 s", duration);
        }
        Scenario base = scenario(top, file, folder);
        double allocation = top.has("allocationBitsPerS") ? positive(top, "allocationBitsPerS", false) : Double.NaN;
        Map<PlasmaParameter, Distribution> draws = top.has("draws") ? draws(file, top.required("draws"))
                : Map.of();
        List<CampaignSpec.GridAxis> grid = grid(file, top.required("grid"));
        if (top.has("linked")) {
            grid = linked(top, grid);
        }
        Distribution shift = top.has("eventShiftS") ? distribution(file, top.required("eventShiftS")) : null;
        long sets = CampaignSpec.sets(grid);
        if (sets > MAX_RUNS / runs) {
            throw new FileFormatException(file, top.required("grid").line(), "grid", (sets == Long.MAX_VALUE
                    ? "more than " + Long.MAX_VALUE : Long.toString(sets)) + " sets x " + runs + " runs is more than "
                    + MAX_RUNS + " runs");
        }
        CampaignSpec spec = new CampaignSpec(top.text("name"), top.text("description", ""), seed, runs, duration,
                base, draws, grid, allocation, shift, model);
        // every set must be a parameter table the flight software accepts, within the instrument's limits
        InstrumentDescription instrument = model.flight();
        InstrumentLimits limits = instrument.limits();
        for (int s = 0; s < spec.setCount(); s++) {
            ParameterTable table = ParameterTable.of(instrument.defaultTable(), spec.parameters(s));
            int status = TableImage.validate(table, limits);
            if (status != 0) {
                throw new FileFormatException(file, top.required("grid").line(), "grid",
                        "set " + s + " " + java.util.Arrays.toString(spec.setValues(s)) + " is refused by the flight software: "
                                + TableStatus.name(status) + limitHint(status, limits));
            }
        }
        return spec;
    }

    /** What the instrument needs, for a refusal against its limits. */
    private static String limitHint(int status, InstrumentLimits limits) {
        return switch (status) {
            case TableStatus.SETTLE_BELOW_SLEW -> " (the HV supply's slew limit needs settleMicrosPerCode >= "
                    + limits.minSettleMicrosPerCodeQ8 / 256.0 + ")";
            case TableStatus.SETTLE_TOO_SHORT -> " (the HV supply's settling needs fixedSettleMicros >= "
                    + limits.minFixedSettleMicros + ")";
            case TableStatus.BAD_EDGE_SEARCH -> " (edgeSearchWindows must be 0.." + WindowTable.CAPACITY + ")";
            case TableStatus.ABOVE_VOLTAGE_LIMIT -> " (the instrument is rated to "
                    + limits.maxModulatorMillivolts / 1000 + " V)";
            default -> "";
        };
    }

    /** The whole number under {@code key}, {@code least} to {@code most}. */
    private static double whole(Section s, String key, double least, double most) {
        double v = s.number(key);
        if (!(v >= least && v <= most && v == Math.rint(v))) {
            throw s.invalid(s.required(key), (least == 1 ? "must be positive and a whole number, at most "
                    : "must be a whole number from " + (long) least + " to ") + (long) most, v);
        }
        return v;
    }

    private static double positive(Section s, String key, boolean zeroAllowed) {
        double v = s.number(key);
        if (v < 0 || (!zeroAllowed && v == 0)) {
            throw s.invalid(s.required(key), zeroAllowed ? "must not be negative" : "must be positive", v);
        }
        return v;
    }

    private static Scenario scenario(Section top, String file, Path folder) {
        String name = top.text("scenario");
        try {
            Path relative = folder == null ? null : folder.resolve(name);
            if (relative != null && Files.isRegularFile(relative)) {
                return ScenarioLoader.load(relative);
            }
            return ScenarioLoader.resolve(name);
        } catch (FileFormatException e) {
            throw new FileFormatException(file, top.required("scenario").line(), "scenario", e.getMessage(), e);
        }
    }

    private static Map<PlasmaParameter, Distribution> draws(String file, YamlNode node) {
        List<String> keys = new ArrayList<>();
        for (PlasmaParameter p : PlasmaParameter.values()) {
            keys.add(p.eventKey());
        }
        Section s = Section.of(file, node, keys);
        Map<PlasmaParameter, Distribution> draws = new LinkedHashMap<>();
        for (PlasmaParameter p : PlasmaParameter.values()) {
            if (s.has(p.eventKey())) {
                YamlNode n = s.required(p.eventKey());
                Distribution d = distribution(file, n);
                checkRange(file, n, p, d);
                draws.put(p, d);
            }
        }
        return draws;
    }

    /**
     * Draws must stay where a scenario may go: a bounded distribution inside the parameter's range;
     * a normal one only for the unbounded drift and for angles (clipped at +-60 deg when drawn).
     */
    private static void checkRange(String file, YamlNode node, PlasmaParameter p, Distribution d) {
        double[] range = Ensemble.range(p);
        double low;
        double high;
        if (d instanceof Distribution.Fixed f) {
            low = f.value();
            high = f.value();
        } else if (d instanceof Distribution.Uniform u) {
            low = u.low();
            high = u.high();
        } else if (d instanceof Distribution.LogUniform u) {
            low = u.low();
            high = u.high();
        } else {
            if (!Ensemble.clipped(p)) {
                throw new FileFormatException(file, node.line(), node.path(),
                        "a normal distribution can leave the allowed range; use uniform or logUniform");
            }
            return;
        }
        boolean openLow = range[0] == 0 && p != PlasmaParameter.ALPHA_ABUNDANCE;
        if (low < range[0] || (openLow && low <= 0) || high > range[1]) {
            throw new FileFormatException(file, node.line(), node.path(), "draws must lie in "
                    + (openLow ? "(" : "[") + FileFormatException.number(range[0]) + ", "
                    + FileFormatException.number(range[1]) + "]");
        }
    }

    private static Distribution distribution(String file, YamlNode node) {
        Section d = Section.of(file, node, KINDS);
        if (!(node instanceof YamlNode.Mapping m) || m.entries().size() != 1) {
            throw new FileFormatException(file, node.line(), node.path(), "give exactly one of " + KINDS);
        }
        String kind = m.entries().keySet().iterator().next();
        YamlNode value = d.required(kind);
        if (kind.equals("fixed")) {
            return new Distribution.Fixed(d.number(value));
        }
        double[] ab = pair(d, value);
        switch (kind) {
            case "uniform":
                ordered(d, value, ab);
                return new Distribution.Uniform(ab[0], ab[1]);
            case "logUniform":
                ordered(d, value, ab);
                if (ab[0] <= 0) {
                    throw d.invalid(value, "a log-uniform range must be positive", ab[0]);
                }
                return new Distribution.LogUniform(ab[0], ab[1]);
            case "normal":
                if (ab[1] < 0) {
                    throw d.invalid(value, "the standard deviation must not be negative", ab[1]);
                }
                return new Distribution.Normal(ab[0], ab[1]);
            default:
                throw new IllegalStateException("unknown kind " + kind);
        }
    }

    private static double[] pair(Section d, YamlNode value) {
        if (!(value instanceof YamlNode.Sequence seq) || seq.items().size() != 2) {
            throw d.typeError(value, "a list of two numbers");
        }
        return new double[] {d.number(seq.items().get(0)), d.number(seq.items().get(1))};
    }

    private static void ordered(Section d, YamlNode value, double[] ab) {
        if (!(ab[1] > ab[0])) {
            throw d.invalid(value, "the upper bound must exceed the lower bound " + FileFormatException.number(ab[0]), ab[1]);
        }
    }

    /**
     * The grid with the axes named by {@code linked} (two or more grid keys, each once, all with the same
     * number of values) marked linked: they take their values together.
     */
    private static List<CampaignSpec.GridAxis> linked(Section top, List<CampaignSpec.GridAxis> grid) {
        YamlNode node = top.required("linked");
        if (!(node instanceof YamlNode.Sequence seq) || seq.items().size() < 2) {
            throw top.typeError(node, "a list of two or more grid keys");
        }
        List<String> keys = new ArrayList<>();
        int place = 0;
        for (YamlNode item : seq.items()) {
            place++;
            if (!(item instanceof YamlNode.Scalar scalar)) {
                throw top.typeError(node, "a list of two or more grid keys");
            }
            String key = scalar.text();
            if (scalar.type() == YamlNode.ScalarType.NULL || key.isBlank()) {
                throw new FileFormatException(top.file(), item.line(), "linked", "entry " + place + " of "
                        + seq.items().size() + " is " + (scalar.type() == YamlNode.ScalarType.NULL ? "null (~, null or "
                        + "nothing)" : "empty") + ", not a grid key");
            }
            if (keys.contains(key)) {
                throw new FileFormatException(top.file(), item.line(), "linked", key + " is named twice");
            }
            if (grid.stream().noneMatch(a -> a.parameter().key().equals(key))) {
                throw new FileFormatException(top.file(), item.line(), "linked", key + " is not a grid key");
            }
            keys.add(key);
        }
        List<CampaignSpec.GridAxis> out = new ArrayList<>();
        int length = -1;
        for (CampaignSpec.GridAxis a : grid) {
            boolean linked = keys.contains(a.parameter().key());
            if (linked && length >= 0 && a.values().size() != length) {
                throw new FileFormatException(top.file(), node.line(), "linked", "the linked grid keys must have as many values each: "
                        + a.parameter().key() + " has " + a.values().size() + ", the first " + length);
            }
            if (linked && length < 0) {
                length = a.values().size();
            }
            out.add(new CampaignSpec.GridAxis(a.parameter(), a.values(), linked));
        }
        return List.copyOf(out);
    }

    private static List<CampaignSpec.GridAxis> grid(String file, YamlNode node) {
        List<String> keys = new ArrayList<>();
        for (TunableParameter t : TunableParameter.values()) {
            keys.add(t.key());
        }
        Section s = Section.of(file, node, keys);
        List<CampaignSpec.GridAxis> axes = new ArrayList<>();
        for (String key : ((YamlNode.Mapping) node).entries().keySet()) { // the file's order
            TunableParameter t = TunableParameter.byKey(key);
            YamlNode list = s.required(t.key());
            if (!(list instanceof YamlNode.Sequence seq) || seq.items().isEmpty()) {
                throw s.typeError(list, "a non-empty list of values");
            }
            List<Double> values = new ArrayList<>();
            for (YamlNode item : seq.items()) {
                double v = s.number(item);
                if (!t.fits(v)) {
                    throw s.invalid(item, "is beyond the flight software's 32-bit field (" + t.key() + " x "
                            + t.scale() + " within +-2^31)", v);
                }
                values.add(v);
            }
            axes.add(new CampaignSpec.GridAxis(t, List.copyOf(values)));
        }
        return axes;
    }
}
