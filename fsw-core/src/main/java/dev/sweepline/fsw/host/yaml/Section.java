package dev.sweepline.fsw.host.yaml;

import java.util.List;
import java.util.Set;
import java.util.regex.Pattern;

/**
 * Typed, checked access to one mapping of a scenario file. Built with the keys the mapping may hold,
 * so an unknown key (usually a typo) is reported before the missing key it was meant to be.
 */
public final class Section {
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
     * @throws FileFormatException naming the first other key
     */
    public static Section of(String file, YamlNode node, List<String> allowed) {
        if (!(node instanceof YamlNode.Mapping mapping)) {
            throw new FileFormatException(file, node.line(), node.path(), "expected a mapping of keys, got " + node.kind());
        }
        Set<String> keys = Set.copyOf(allowed);
        for (var entry : mapping.entries().entrySet()) {
            YamlNode child = entry.getValue();
            if (!keys.contains(entry.getKey())) {
                throw new FileFormatException(file, child.line(), child.path(),
                        "unknown key; allowed here: " + String.join(", ", allowed));
            }
        }
        return new Section(file, mapping);
    }

    /** The file this section came from. */
    public String file() {
        return file;
    }

    /** Line of this mapping's own key. */
    public int line() {
        return node.line();
    }

    /** Dotted path of this mapping. */
    public String path() {
        return node.path();
    }

    /** Whether {@code key} is present. */
    public boolean has(String key) {
        return node.entries().containsKey(key);
    }

    /** The node under {@code key}, which must be present. */
    public YamlNode required(String key) {
        YamlNode child = node.entries().get(key);
        if (child == null) {
            throw new FileFormatException(file, node.line(), childPath(key), "missing required field");
        }
        return child;
    }

    /** A required number. */
    public double number(String key) {
        return number(required(key));
    }

    /** An optional number, {@code absent} when the key is not there. */
    public double number(String key, double absent) {
        return has(key) ? number(key) : absent;
    }

    /** A required text. */
    public String text(String key) {
        YamlNode child = required(key);
        if (child instanceof YamlNode.Scalar s && s.type() != YamlNode.ScalarType.NULL) {
            return s.text();
        }
        throw typeError(child, "text");
    }

    /** An optional text. */
    public String text(String key, String absent) {
        return has(key) ? text(key) : absent;
    }

    /** An optional boolean. */
    public boolean bool(String key, boolean absent) {
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
    public double number(YamlNode child) {
        if (child instanceof YamlNode.Scalar s
                && (s.type() == YamlNode.ScalarType.NUMBER || s.type() == YamlNode.ScalarType.TEXT)
                && DECIMAL.matcher(s.text()).matches()) {
            return Double.parseDouble(s.text().replace("_", ""));
        }
        throw typeError(child, "a finite number");
    }

    /** An error at {@code child}: {@code problem}, got {@code value}. */
    public FileFormatException invalid(YamlNode child, String problem, double value) {
        return new FileFormatException(file, child.line(), child.path(), problem + ", got " + FileFormatException.number(value));
    }

    /** A failure naming what was expected and what was found. */
    public FileFormatException typeError(YamlNode child, String expected) {
        return new FileFormatException(file, child.line(), child.path(), "expected " + expected + ", got " + child.kind());
    }

    private String childPath(String key) {
        return node.path().isEmpty() ? key : node.path() + "." + key;
    }
}
