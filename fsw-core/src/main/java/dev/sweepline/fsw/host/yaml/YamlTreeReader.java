package dev.sweepline.fsw.host.yaml;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import java.io.IOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Reads one YAML document into {@link YamlNode}s with real line numbers, using Jackson's streaming
 * YAML parser. Rejects what the scenario format never needs and what hides mistakes: duplicate keys,
 * more than one document, a root that is not a mapping.
 */
public final class YamlTreeReader {
    private static final YAMLFactory FACTORY = new YAMLFactory();

    private final String file;
    /** Path of the value being read, for the message of a syntax error. */
    private String currentPath = "";

    private YamlTreeReader(String file) {
        this.file = file;
    }

    /**
     * Parses {@code text}; {@code file} names it in errors.
     *
     * @throws FileFormatException on a syntax error or a document of the wrong shape
     */
    public static YamlNode.Mapping read(String text, String file) {
        return new YamlTreeReader(file).readDocument(text);
    }

    private YamlNode.Mapping readDocument(String text) {
        try (JsonParser p = FACTORY.createParser(text)) {
            JsonToken first = p.nextToken();
            if (first == null) {
                throw new FileFormatException(file, 1, "", "the file is empty");
            }
            YamlNode root = readValue(p, first, "", line(p.currentTokenLocation()));
            if (!(root instanceof YamlNode.Mapping mapping)) {
                throw new FileFormatException(file, root.line(), "", "the file must be a mapping of keys, got " + root.kind());
            }
            if (p.nextToken() != null) {
                throw new FileFormatException(file, line(p.currentTokenLocation()), "",
                        "only one YAML document per file; a second one starts here");
            }
            return mapping;
        } catch (JsonProcessingException e) {
            throw new FileFormatException(file, line(e.getLocation()), currentPath,
                    "not valid YAML: " + firstLine(e.getOriginalMessage()), e);
        } catch (IOException e) {
            throw new FileFormatException(file, 0, "", "cannot read: " + e.getMessage(), e);
        }
    }

    private YamlNode readValue(JsonParser p, JsonToken token, String path, int line) throws IOException {
        currentPath = path;
        return switch (token) {
            case START_OBJECT -> readMapping(p, path, line);
            case START_ARRAY -> readSequence(p, path, line);
            case VALUE_NUMBER_INT, VALUE_NUMBER_FLOAT ->
                    new YamlNode.Scalar(path, line, p.getText(), YamlNode.ScalarType.NUMBER);
            // YAML 1.1 spells booleans many ways (yes, On, FALSE...); keep only the value.
            case VALUE_TRUE -> new YamlNode.Scalar(path, line, "true", YamlNode.ScalarType.BOOLEAN);
            case VALUE_FALSE -> new YamlNode.Scalar(path, line, "false", YamlNode.ScalarType.BOOLEAN);
            case VALUE_STRING -> new YamlNode.Scalar(path, line, p.getText(), YamlNode.ScalarType.TEXT);
            case VALUE_NULL -> new YamlNode.Scalar(path, line, "", YamlNode.ScalarType.NULL);
            default -> throw new FileFormatException(file, line, path, "unsupported YAML construct (" + token + ")");
        };
    }

    private YamlNode.Mapping readMapping(JsonParser p, String path, int line) throws IOException {
        Map<String, YamlNode> entries = new LinkedHashMap<>();
        JsonToken t;
        while ((t = p.nextToken()) == JsonToken.FIELD_NAME) {
            String key = p.currentName();
            int keyLine = line(p.currentTokenLocation());
            String childPath = path.isEmpty() ? key : path + "." + key;
            if (entries.containsKey(key)) {
                throw new FileFormatException(file, keyLine, childPath,
                        "duplicate key (first given on line " + entries.get(key).line() + ")");
            }
            entries.put(key, readValue(p, p.nextToken(), childPath, keyLine));
        }
        if (t != JsonToken.END_OBJECT) {
            throw new FileFormatException(file, line(p.currentTokenLocation()), path, "unexpected " + t);
        }
        return new YamlNode.Mapping(path, line, entries);
    }

    private YamlNode.Sequence readSequence(JsonParser p, String path, int line) throws IOException {
        List<YamlNode> items = new ArrayList<>();
        JsonToken t;
        while ((t = p.nextToken()) != JsonToken.END_ARRAY) {
            if (t == null) {
                throw new FileFormatException(file, line, path, "unexpected end of file in a list");
            }
            items.add(readValue(p, t, path + "[" + items.size() + "]", line(p.currentTokenLocation())));
        }
        return new YamlNode.Sequence(path, line, items);
    }

    private static int line(JsonLocation location) {
        return location == null ? 0 : Math.max(location.getLineNr(), 0);
    }

    private static String firstLine(String s) {
        if (s == null) {
            return "syntax error";
        }
        int nl = s.indexOf('\n');
        return nl < 0 ? s : s.substring(0, nl);
    }
}
