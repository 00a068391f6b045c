package dev.sweepline.sim.scenario;

import java.util.List;
import java.util.Set;
import java.util.regex.Pattern;

/**
 * Typed, checked access to one mapping of a scenario file. Built with the keys the mapping may hold,
 * so an unknown key (usually a typo) is reported before the missing key it was meant to be.
 */
final class Section {
    /** A decimal number as people write it; YAML 1.1 would read some of these as text. */
    private static final Pattern DECIMAL = Pattern.compile("[-+]?(\\d[\\d_]*\\.?[\\d_]*|\\.\\d[\\d_]*)([eE][-+]?\\d+)?");

    private final String file;
    private final YamlNode.Mapping node;

    private Section(String file, YamlNode.Mapping node) {
        this.file = file;
        this.node = node;
    }

    /**
     * Wraps {@code node}, which must be a mapping whose keys are all in {@code allowed}.
     *
     * @throws ScenarioException naming the first other key
     */
    static Section of(String file, YamlNode node, List<String> allowed) {
        if (!(node instanceof YamlNode.Mapping mapping)) {
            throw new ScenarioException(file, node.line(), node.path(), "expected a mapping of keys, got " + node.kind());
        }
        Set<String> keys = Set.copyOf(allowed);
        for (var entry : mapping.entries().entrySet()) {
            YamlNode child = entry.getValue();
            if (!keys.contains(entry.getKey())) {
                throw new ScenarioException(file, child.line(), child.path(),
                        "unknown key; allowed here: " + String.join(", ", allowed));
            }
        }
        return new Section(file, mapping);
    }

    /** The file this section came from. */
    String file() {
        return file;
    }

    /** Line of this mapping's own key. */
    int line() {
        return node.line();
    }

    /** Dotted path of this mapping. */
    String path() {
        return node.path();
    }

    /** Whether {@code key} is present. */
    boolean has(String key) {
        return node.entries().containsKey(key);
    }

    /** The node under {@code key}, which must be present. */
    YamlNode required(String key) {
        YamlNode child = node.entries().get(key);
        if (child == null) {
            throw new ScenarioException(file, node.line(), childPath(key), "missing required field");
        }
        return child;
    }

    /** A required number. */
    double number(String key) {
        return number(required(key));
    }

    /** An optional number, {@code absent} when the key is not there. */
    double number(String key, double absent) {
        return has(key) ? number(key) : absent;
    }

    /** A required text. */
    String text(String key) {
        YamlNode child = required(key);
        if (child instanceof YamlNode.Scalar s && s.type() != YamlNode.ScalarType.NULL) {
            return s.text();
        }
        throw typeError(child, "text");
    }

    /** An optional text. */
    String text(String key, String absent) {
        return has(key) ? text(key) : absent;
    }

    /** An optional boolean. */
    boolean bool(String key, boolean absent) {
        if (!has(key)) {
            return absent;
        }
        YamlNode child = required(key);
        if (child instanceof YamlNode.Scalar s && s.type() == YamlNode.ScalarType.BOOLEAN) {
            return Boolean.parseBoolean(s.text());
        }
        throw typeError(child, "true or false");
    }

    /** The value of a scalar node as a finite number. */
    double number(YamlNode child) {
        if (child instanceof YamlNode.Scalar s
                && (s.type() == YamlNode.ScalarType.NUMBER || s.type() == YamlNode.ScalarType.TEXT)
                && DECIMAL.matcher(s.text()).matches()) {
            return Double.parseDouble(s.text().replace("_", ""));
        }
        throw typeError(child, "a finite number");
    }

    /** An error at {@code child}: {@code problem}, got {@code value}. */
    ScenarioException invalid(YamlNode child, String problem, double value) {
        return new ScenarioException(file, child.line(), child.path(), problem + ", got " + ScenarioException.number(value));
    }

    /** A failure naming what was expected and what was found. */
    ScenarioException typeError(YamlNode child, String expected) {
        return new ScenarioException(file, child.line(), child.path(), "expected " + expected + ", got " + child.kind());
    }

    private String childPath(String key) {
        return node.path().isEmpty() ? key : node.path() + "." + key;
    }
}
