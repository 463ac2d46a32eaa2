package org.gatefit.catalog;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadFeature;
import java.io.IOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The reader of the bundled JSON Schema files and of users' mapping files: Jackson's streaming
 * parser, strict (duplicate members refused), building a plain tree — ordered maps, lists, strings,
 * booleans, null, and numbers as written ({@link Num}, from the parser's text of the number token).
 * A hand-written reader stood beside it as a fast path until 3 December 2026; it saved 0.1–0.2 s
 * of one start-up on a loaded machine and nothing measurable with the class-data archive
 * (docs/PERFORMANCE.md), which no user would notice, so it was deleted.
 */
final class Json {
    /** A JSON number as written, so a schema's {@code 0.5} or {@code 20} reads as it is spelled. */
    record Num(String text) {
        double doubleValue() {
            return Double.parseDouble(text);
        }

        @Override
        public String toString() {
            return text;
        }
    }

    private static final JsonFactory FACTORY = JsonFactory.builder()
            .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION).build();

    private Json() {
    }

    /** Parses one JSON value (the whole text); a syntax error names the line, the column and what was expected (Jackson's words). */
    static Object parse(String text) {
        try (JsonParser p = FACTORY.createParser(text)) {
            if (p.nextToken() == null) {
                throw new IllegalArgumentException("JSON line 1, column 1: expected a value, got end of input");
            }
            Object v = value(p);
            JsonToken after = p.nextToken();
            if (after != null) {
                throw new IllegalArgumentException("JSON line " + p.currentTokenLocation().getLineNr() + ", column "
                        + p.currentTokenLocation().getColumnNr() + ": expected end of input, got " + after);
            }
            return v;
        } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
            com.fasterxml.jackson.core.JsonLocation at = e.getLocation();
            throw new IllegalArgumentException("JSON" + (at == null ? "" : " line " + at.getLineNr() + ", column "
                    + at.getColumnNr()) + ": " + e.getOriginalMessage(), e);
        } catch (IOException e) {
            throw new IllegalArgumentException("JSON: " + e.getMessage(), e);
        }
    }

    private static Object value(JsonParser p) throws IOException {
        JsonToken t = p.currentToken();
        switch (t) {
            case START_OBJECT -> {
                Map<String, Object> m = new LinkedHashMap<>();
                while (p.nextToken() == JsonToken.FIELD_NAME) {
                    String name = p.currentName();
                    p.nextToken();
                    m.put(name, value(p));
                }
                return m;
            }
            case START_ARRAY -> {
                List<Object> a = new ArrayList<>();
                while (p.nextToken() != JsonToken.END_ARRAY) {
                    a.add(value(p));
                }
                return a;
            }
            case VALUE_STRING -> {
                return p.getText();
            }
            case VALUE_NUMBER_INT, VALUE_NUMBER_FLOAT -> {
                return new Num(p.getText());
            }
            case VALUE_TRUE -> {
                return Boolean.TRUE;
            }
            case VALUE_FALSE -> {
                return Boolean.FALSE;
            }
            case VALUE_NULL -> {
                return null;
            }
            default -> throw new IllegalArgumentException("JSON: expected a value, got " + t);
        }
    }
}
