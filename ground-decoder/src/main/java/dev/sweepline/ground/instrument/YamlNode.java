package dev.sweepline.ground.instrument;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * One node of a YAML document with the line it starts on: a mapping (keys in file order, each with
 * its own line), a sequence (kept only to be refused by name) or a scalar (its text, and whether it
 * was written as a number). Immutable once read.
 */
final class YamlNode {
    /** What a node is. */
    enum Kind {
        MAPPING, SEQUENCE, SCALAR
    }

    private final Kind kind;
    private final int line;
    private final String text;
    private final boolean number;
    private final Map<String, YamlNode> entries;
    private final Map<String, Integer> keyLines;

    private YamlNode(Kind kind, int line, String text, boolean number, Map<String, YamlNode> entries,
            Map<String, Integer> keyLines) {
        this.kind = kind;
        this.line = line;
        this.text = text;
        this.number = number;
        this.entries = entries;
        this.keyLines = keyLines;
    }

    /** A scalar; {@code number} when the YAML parser read it as an integer or a float. */
    static YamlNode scalar(int line, String text, boolean number) {
        return new YamlNode(Kind.SCALAR, line, text, number, Map.of(), Map.of());
    }

    /** A sequence (its items are not kept: no key of the format takes one). */
    static YamlNode sequence(int line) {
        return new YamlNode(Kind.SEQUENCE, line, "", false, Map.of(), Map.of());
    }

    /** A mapping of {@code entries} whose keys start on {@code keyLines}. */
    static YamlNode mapping(int line, LinkedHashMap<String, YamlNode> entries,
            LinkedHashMap<String, Integer> keyLines) {
        return new YamlNode(Kind.MAPPING, line, "", false, Collections.unmodifiableMap(entries),
                Collections.unmodifiableMap(keyLines));
    }

    Kind kind() {
        return kind;
    }

    /** 1-based line the node starts on. */
    int line() {
        return line;
    }

    /** A scalar's text (empty for an empty value). */
    String text() {
        return text;
    }

    /** True for a scalar the parser read as a number. */
    boolean isNumber() {
        return number;
    }

    /** A mapping's entries in file order. */
    Map<String, YamlNode> entries() {
        return entries;
    }

    /** The line of a mapping's key. */
    int keyLine(String key) {
        return keyLines.getOrDefault(key, line);
    }
}
