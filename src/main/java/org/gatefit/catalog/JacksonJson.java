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
 * The reference reader of the bundled JSON Schema files ({@link FastPath#JSON}): Jackson's streaming
 * parser, strict (duplicate members refused), building the tree {@link MiniJson} builds: ordered
 * maps, lists, strings, booleans, null, and numbers as written ({@link MiniJson.Num}, from the
 * parser's text of the number token).
 */
final class JacksonJson {
    private static final JsonFactory FACTORY = JsonFactory.builder()
            .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION).build();

    private JacksonJson() {
    }

    /** Parses one JSON value (the whole text); a syntax error names where and what was expected (Jackson's words). */
    static Object parse(String text) {
        try (JsonParser p = FACTORY.createParser(text)) {
            if (p.nextToken() == null) {
                throw new IllegalArgumentException("JSON at offset 0: expected a value, got end of input");
            }
            Object v = value(p);
            JsonToken after = p.nextToken();
            if (after != null) {
                throw new IllegalArgumentException("JSON at offset " + p.currentTokenLocation().getCharOffset()
                        + ": expected end of input, got " + after);
            }
            return v;
        } catch (IOException e) { // JsonProcessingException: Jackson's message names line, column and what it expected
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
                return new MiniJson.Num(p.getText());
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
