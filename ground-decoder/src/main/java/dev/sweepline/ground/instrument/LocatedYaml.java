package dev.sweepline.ground.instrument;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import java.io.IOException;
import java.io.Reader;
import java.util.LinkedHashMap;

/**
 * Reads a YAML document into {@link YamlNode}s with the Jackson YAML streaming parser, which gives the
 * line of every token (a tree model would lose it). A key written twice in one mapping is refused:
 * the format has no use for it and the second value would silently win. Stateless.
 */
final class LocatedYaml {
    /** Nesting deeper than this is no description: a guard against a hostile file. */
    static final int MAX_DEPTH = 16;

    private static final YAMLFactory FACTORY = new YAMLFactory();

    private LocatedYaml() {
    }

    /**
     * The document's root mapping.
     *
     * @param file the name used in errors
     * @throws InstrumentFileException on a syntax error, an empty document or a root that is no mapping
     */
    static YamlNode read(String file, Reader in) {
        try (JsonParser p = FACTORY.createParser(in)) {
            JsonToken t = p.nextToken();
            if (t == null) {
                throw new InstrumentFileException(file, 0, "", "empty file: expected a mapping of the keys of "
                        + "FORMAT.md");
            }
            if (t != JsonToken.START_OBJECT) {
                throw new InstrumentFileException(file, line(p), "", "expected a mapping of the keys of FORMAT.md");
            }
            YamlNode root = mapping(file, p, "", 0);
            if (p.nextToken() != null) {
                throw new InstrumentFileException(file, line(p), "", "a second document: one description per file");
            }
            return root;
        } catch (JsonProcessingException e) {
            JsonLocation at = e.getLocation();
            throw new InstrumentFileException(file, at == null ? 0 : at.getLineNr(), "",
                    "not YAML: " + e.getOriginalMessage(), e);
        } catch (IOException e) {
            throw new InstrumentFileException(file, 0, "", "cannot read: " + e.getMessage(), e);
        }
    }

    private static int line(JsonParser p) {
        return p.currentTokenLocation().getLineNr();
    }

    /** The mapping whose START_OBJECT is the current token. */
    private static YamlNode mapping(String file, JsonParser p, String path, int depth) throws IOException {
        if (depth > MAX_DEPTH) {
            throw new InstrumentFileException(file, line(p), path, "nested deeper than " + MAX_DEPTH + " levels");
        }
        int start = line(p);
        LinkedHashMap<String, YamlNode> entries = new LinkedHashMap<>();
        LinkedHashMap<String, Integer> keyLines = new LinkedHashMap<>();
        for (JsonToken t = p.nextToken(); t != JsonToken.END_OBJECT; t = p.nextToken()) {
            String key = p.currentName();
            int keyLine = line(p);
            String field = path.isEmpty() ? key : path + "." + key;
            if (entries.containsKey(key)) {
                throw new InstrumentFileException(file, keyLine, field,
                        "written twice (first on line " + keyLines.get(key) + ")");
            }
            entries.put(key, value(file, p, p.nextToken(), field, depth));
            keyLines.put(key, keyLine);
        }
        return YamlNode.mapping(start, entries, keyLines);
    }

    private static YamlNode value(String file, JsonParser p, JsonToken t, String field, int depth) throws IOException {
        int at = line(p);
        switch (t) {
            case START_OBJECT:
                return mapping(file, p, field, depth + 1);
            case START_ARRAY:
                p.skipChildren();
                return YamlNode.sequence(at);
            case VALUE_NUMBER_INT:
            case VALUE_NUMBER_FLOAT:
                return YamlNode.scalar(at, p.getText(), true);
            case VALUE_NULL:
                return YamlNode.scalar(at, "", false);
            case VALUE_STRING:
            case VALUE_TRUE:
            case VALUE_FALSE:
                return YamlNode.scalar(at, p.getText(), false);
            default:
                throw new InstrumentFileException(file, at, field, "unexpected YAML token " + t);
        }
    }
}
