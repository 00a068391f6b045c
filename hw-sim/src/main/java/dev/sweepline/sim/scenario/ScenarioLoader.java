package dev.sweepline.sim.scenario;

import dev.sweepline.fsw.host.yaml.BuiltIns;
import dev.sweepline.fsw.host.yaml.FileFormatException;
import dev.sweepline.fsw.host.yaml.YamlTreeReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/**
 * Finds and loads scenarios: files given by path, and the built-ins shipped in the jar under
 * {@code scenarios/}, listed by {@code scenarios/index.txt} (a jar cannot list a directory).
 */
public final class ScenarioLoader {
    /** Resource folder of the built-ins. */
    static final String RESOURCE_DIR = "scenarios/";
    /** The index of built-in names, one a line; '#' starts a comment. */
    static final String INDEX = RESOURCE_DIR + "index.txt";
    /** The scenario a run uses when none is named. */
    static final String DEFAULT_NAME = "quiet-perihelion";
    /** The built-ins and their index. */
    private static final BuiltIns BUILT_INS = new BuiltIns(RESOURCE_DIR, "scenario");
    /** The evaluation cases (invented demo data beside the built-ins, for the evaluation table) and their index. */
    private static final BuiltIns EVALUATION = new BuiltIns(RESOURCE_DIR + "evaluation/", "evaluation scenario");

    private ScenarioLoader() {
    }

    /**
     * Loads the scenario in {@code file}.
     *
     * @throws ScenarioException if it cannot be read or is not a valid scenario
     */
    public static Scenario load(Path file) {
        String text;
        try {
            text = BuiltIns.file(file);
        } catch (FileFormatException e) {
            throw ScenarioException.of(e);
        }
        return parse(text, file.toString());
    }

    /**
     * Parses scenario text; {@code file} names it in errors.
     *
     * @throws ScenarioException if it is not a valid scenario
     */
    public static Scenario parse(String text, String file) {
        try {
            return ScenarioReader.read(YamlTreeReader.read(text, file), file);
        } catch (FileFormatException e) {
            throw ScenarioException.of(e);
        }
    }

    /**
     * The built-in scenario {@code name}.
     *
     * @throws ScenarioException if there is none of that name (the message lists the built-ins)
     */
    public static Scenario builtIn(String name) {
        if (!builtInNames().contains(name)) {
            throw unknown(name);
        }
        String resource = RESOURCE_DIR + name + ".yaml";
        Scenario s = parse(readResource(resource), resource);
        if (!s.name().equals(name)) {
            throw new ScenarioException(resource, 0, "name", "a built-in's name must match its file, got '" + s.name() + "'");
        }
        return s;
    }

    /** The names of the built-in scenarios, in index order. */
    public static List<String> builtInNames() {
        return BUILT_INS.names();
    }

    /**
     * The evaluation cases under {@code scenarios/evaluation/}, in index order: scenarios that are not
     * built-ins but exercise the ground's fit where it is weakest (alpha peak above the table, alpha-rich
     * ejecta, flow near the split collector's reach, a strong shock inside a sweep).
     *
     * @throws ScenarioException if one is invalid or its name does not match its file
     */
    public static List<Scenario> evaluationCases() {
        List<Scenario> cases = new java.util.ArrayList<>();
        for (String name : EVALUATION.names()) {
            String resource = EVALUATION.resourceOf(name);
            Scenario s;
            try {
                s = parse(EVALUATION.resource(resource), resource);
            } catch (FileFormatException e) {
                throw ScenarioException.of(e);
            }
            if (!s.name().equals(name)) {
                throw new ScenarioException(resource, 0, "name", "an evaluation case's name must match its file, got '"
                        + s.name() + "'");
            }
            cases.add(s);
        }
        return List.copyOf(cases);
    }

    /** The name of the default scenario, a built-in. */
    public static String defaultName() {
        return DEFAULT_NAME;
    }

    /**
     * A built-in by name, or else the file at the path {@code nameOrPath}. A built-in name wins over a
     * file of the same name in the working directory; write {@code ./name} for the file.
     *
     * @throws ScenarioException if it is neither (the message lists the built-ins) or is invalid
     */
    public static Scenario resolve(String nameOrPath) {
        if (builtInNames().contains(nameOrPath)) {
            return builtIn(nameOrPath);
        }
        Path path = Path.of(nameOrPath);
        if (Files.isRegularFile(path)) {
            return load(path);
        }
        throw unknown(nameOrPath);
    }

    private static ScenarioException unknown(String name) {
        return ScenarioException.of(BUILT_INS.unknown(name));
    }

    private static String readResource(String resource) {
        try {
            return BUILT_INS.resource(resource);
        } catch (FileFormatException e) {
            throw ScenarioException.of(e);
        }
    }
}
