package dev.sweepline.fsw.host.yaml;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A YAML value that remembers where it stood: the dotted path from the root and the 1-based line of
 * its key (for a mapping entry) or of its first token (for a list item or the root). Jackson's own
 * tree drops token locations, so the loader builds this one from the streaming parser.
 */
public sealed interface YamlNode permits YamlNode.Mapping, YamlNode.Sequence, YamlNode.Scalar {

    /** Dotted path, e.g. {@code events[2].set.protonDensity}; empty for the root. */
    String path();

    /** 1-based line. */
    int line();

    /** What kind of value this is, for messages ("a mapping", "a list", "a number"...). */
    String kind();

    /** A mapping with its keys in file order. */
    record Mapping(String path, int line, Map<String, YamlNode> entries) implements YamlNode {
        public Mapping {
            entries = new LinkedHashMap<>(entries);
        }

        @Override
        public String kind() {
            return "a mapping";
        }
    }

    /** A list. */
    record Sequence(String path, int line, List<YamlNode> items) implements YamlNode {
        public Sequence {
            items = List.copyOf(items);
        }

        @Override
        public String kind() {
            return "a list";
        }
    }

    /**
     * A scalar: its text as written and what YAML made of it.
     *
     * @param type NUMBER, BOOLEAN, TEXT or NULL
     */
    record Scalar(String path, int line, String text, ScalarType type) implements YamlNode {
        @Override
        public String kind() {
            return switch (type) {
                case NUMBER -> "the number " + text;
                case BOOLEAN -> "the boolean " + text;
                case TEXT -> "the text '" + text + "'";
                case NULL -> "nothing";
            };
        }
    }

    /** What YAML made of a scalar. */
    enum ScalarType {
        NUMBER, BOOLEAN, TEXT, NULL
    }
}
