package org.annalist.brief;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import com.fasterxml.jackson.dataformat.yaml.YAMLParser;
import java.io.IOException;
import java.io.Reader;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A YAML document as nodes that remember where they stand (line and column, 1-based), so that a
 * spec's every mistake can be reported at its place — what a plain tree of values forgets.
 */
final class YamlTree {

    /** A node of the document and where it starts. */
    sealed interface Node permits Scalar, Mapping, Sequence {
        int line();

        int column();
    }

    /** @param text the value as written; null for YAML's null ({@code ~} or nothing) */
    record Scalar(String text, boolean quoted, int line, int column) implements Node {
    }

    /** @param keys where each key stands, for messages about the key itself, in the spec's order */
    record Mapping(Map<String, Node> entries, Map<String, Position> keys, int line, int column) implements Node {
    }

    /** A place in the spec, 1-based. */
    record Position(int line, int column) {
    }

    record Sequence(List<Node> items, int line, int column) implements Node {
    }

    private YamlTree() {
    }

    static Node read(Path spec, Reader text) {
        try (JsonParser parser = new YAMLFactory().createParser(text)) {
            JsonToken token = parser.nextToken();
            if (token == null) {
                throw new SpecProblem(spec, 1, 1, "the spec is empty; expected a mapping with a 'briefs' list");
            }
            return node(spec, parser, token);
        } catch (IOException e) {
            JsonLocation at = e instanceof com.fasterxml.jackson.core.JsonProcessingException p ? p.getLocation() : null;
            String reason = e instanceof com.fasterxml.jackson.core.JsonProcessingException p ? p.getOriginalMessage()
                    : e.getMessage();
            throw new SpecProblem(spec, at == null ? 1 : Math.max(1, at.getLineNr()),
                    at == null ? 1 : Math.max(1, at.getColumnNr()), "not valid YAML: " + firstLine(reason));
        }
    }

    private static Node node(Path spec, JsonParser parser, JsonToken token) throws IOException {
        JsonLocation at = parser.currentTokenLocation();
        int line = at.getLineNr();
        int column = at.getColumnNr();
        refuseAlias(spec, parser);
        switch (token) {
            case START_OBJECT -> {
                Map<String, Node> entries = new LinkedHashMap<>();
                Map<String, Position> keys = new LinkedHashMap<>();
                for (JsonToken t = parser.nextToken(); t != JsonToken.END_OBJECT; t = parser.nextToken()) {
                    String key = parser.currentName();
                    JsonLocation keyAt = parser.currentTokenLocation();
                    refuseAlias(spec, parser);
                    if (entries.containsKey(key)) {
                        throw new SpecProblem(spec, keyAt.getLineNr(), keyAt.getColumnNr(), "'" + key
                                + "' is given twice");
                    }
                    keys.put(key, new Position(keyAt.getLineNr(), keyAt.getColumnNr()));
                    entries.put(key, node(spec, parser, parser.nextToken()));
                }
                return new Mapping(entries, keys, line, column);
            }
            case START_ARRAY -> {
                List<Node> items = new ArrayList<>();
                for (JsonToken t = parser.nextToken(); t != JsonToken.END_ARRAY; t = parser.nextToken()) {
                    items.add(node(spec, parser, t));
                }
                return new Sequence(items, line, column);
            }
            case VALUE_NULL -> {
                return new Scalar(null, false, line, column);
            }
            default -> {
                return new Scalar(parser.getText(), token == JsonToken.VALUE_STRING, line, column);
            }
        }
    }

    /**
     * An alias ({@code *name}) would otherwise read as the text {@code name}, not as the anchored value;
     * a spec is short enough to write each value where it is meant (and aliases can multiply a small file).
     */
    private static void refuseAlias(Path spec, JsonParser parser) throws IOException {
        if (parser instanceof YAMLParser yaml && yaml.isCurrentAlias()) {
            JsonLocation at = parser.currentTokenLocation();
            throw new SpecProblem(spec, Math.max(1, at.getLineNr()), Math.max(1, at.getColumnNr()), "'*" + parser.getText()
                    + "' is a YAML alias; aliases and anchors are not supported, expected the value itself");
        }
    }

    private static String firstLine(String s) {
        if (s == null) {
            return "unreadable";
        }
        int end = s.indexOf('\n');
        return end < 0 ? s : s.substring(0, end);
    }
}
