package dev.sweepline.ground.instrument;

import java.math.BigDecimal;
import java.util.List;

/**
 * One mapping of a description (the top level, {@code geometry}, {@code modulator}, ...) read key by
 * key. It is opened with the keys FORMAT.md gives the mapping and refuses any other key at once, so a
 * misspelt key is named as such (not reported as the missing key it was meant to be) and never passes
 * as a default; each getter then checks the value's kind and range and names file, line and dotted
 * field when it fails. Immutable.
 */
final class DescriptionSection {
    private final String file;
    private final String path;
    private final YamlNode node;

    private DescriptionSection(String file, String path, YamlNode node, List<String> keys) {
        this.file = file;
        this.path = path;
        this.node = node;
        for (String key : node.entries().keySet()) {
            if (!keys.contains(key)) {
                throw fail(key, "unknown key (FORMAT.md: " + (path.isEmpty() ? "the top level" : path) + " has "
                        + String.join(", ", keys) + ")");
            }
        }
    }

    /** The document's top level, which may hold only {@code keys}. */
    static DescriptionSection top(String file, YamlNode root, List<String> keys) {
        return new DescriptionSection(file, "", root, keys);
    }

    /** The dotted field of {@code key}. */
    String field(String key) {
        return path.isEmpty() ? key : path + "." + key;
    }

    /** True when {@code key} is written. */
    boolean has(String key) {
        return node.entries().containsKey(key);
    }

    /** A failure at {@code key}'s line (the section's own line when the key is missing). */
    InstrumentFileException fail(String key, String problem) {
        return new InstrumentFileException(file, node.keyLine(key), field(key), problem);
    }

    private YamlNode required(String key, YamlNode.Kind kind, String expected) {
        YamlNode v = node.entries().get(key);
        if (v == null) {
            throw new InstrumentFileException(file, node.line(), field(key), "missing: expected " + expected);
        }
        if (v.kind() != kind || kind == YamlNode.Kind.SCALAR && v.text().isEmpty()) {
            String got = v.kind() == YamlNode.Kind.SCALAR ? "'" + v.text() + "'" : "a " + v.kind().name().toLowerCase();
            throw new InstrumentFileException(file, v.line(), field(key), "expected " + expected + ", got " + got);
        }
        return v;
    }

    /** The nested mapping {@code key}, which may hold only {@code keys}. */
    DescriptionSection section(String key, List<String> keys) {
        return new DescriptionSection(file, field(key), required(key, YamlNode.Kind.MAPPING, "a mapping"), keys);
    }

    /** Text of {@code key}, any non-empty scalar. */
    String text(String key) {
        return required(key, YamlNode.Kind.SCALAR, "text").text();
    }

    /** Text of {@code key}, one of {@code allowed}. */
    String choice(String key, List<String> allowed) {
        String v = text(key);
        if (!allowed.contains(v)) {
            throw fail(key, "must be " + String.join(" or ", allowed) + ", got '" + v + "'");
        }
        return v;
    }

    /** A number in the range {@code range} describes. */
    double number(String key, NumberRange range) {
        return checked(key, range, false);
    }

    /** A whole number in {@code lo..hi}. */
    int whole(String key, long lo, long hi) {
        return (int) checked(key, NumberRange.whole(lo, hi), true);
    }

    private double checked(String key, NumberRange range, boolean whole) {
        String expected = (whole ? "a whole number " : "a number ") + range.text();
        YamlNode v = required(key, YamlNode.Kind.SCALAR, expected);
        BigDecimal x;
        try {
            x = v.isNumber() ? new BigDecimal(v.text()) : null;
        } catch (NumberFormatException e) {
            x = null; // a YAML float such as .inf or .nan
        }
        if (x == null) {
            throw new InstrumentFileException(file, v.line(), field(key), "expected " + expected + ", got '" + v.text()
                    + "'");
        }
        if (whole && x.stripTrailingZeros().scale() > 0 || !range.holds(x.doubleValue())) {
            throw new InstrumentFileException(file, v.line(), field(key), "must be " + expected + ", got " + v.text());
        }
        return x.doubleValue();
    }
}
