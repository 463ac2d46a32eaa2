package org.gatefit.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The schema reader against a general-purpose JSON library (Jackson): every bundled schema file
 * reads to the same tree, member order included; and RFC 8259 syntax errors are refused.
 */
class MiniJsonTest {

    /** Jackson's tree as the reader's values (numbers compared by value). */
    private static Object plain(JsonNode n) {
        if (n.isObject()) {
            Map<String, Object> m = new LinkedHashMap<>();
            Iterator<Map.Entry<String, JsonNode>> it = n.properties().iterator();
            while (it.hasNext()) {
                Map.Entry<String, JsonNode> e = it.next();
                m.put(e.getKey(), plain(e.getValue()));
            }
            return m;
        }
        if (n.isArray()) {
            List<Object> a = new ArrayList<>();
            n.forEach(x -> a.add(plain(x)));
            return a;
        }
        if (n.isNumber()) {
            return n.asDouble();
        }
        if (n.isBoolean()) {
            return n.asBoolean();
        }
        return n.isNull() ? null : n.asText();
    }

    private static Object numbersAsDoubles(Object v) {
        if (v instanceof Map<?, ?> m) {
            Map<String, Object> out = new LinkedHashMap<>();
            m.forEach((k, x) -> out.put((String) k, numbersAsDoubles(x)));
            return out;
        }
        if (v instanceof List<?> l) {
            return l.stream().map(MiniJsonTest::numbersAsDoubles).toList();
        }
        return v instanceof MiniJson.Num n ? (Object) n.doubleValue() : v;
    }

    @Test
    void everySchemaFileReadsAsJacksonReadsIt() throws Exception {
        List<Path> files;
        try (Stream<Path> s = Files.list(Path.of("catalog-schema"))) {
            files = s.filter(p -> p.toString().endsWith(".json")).sorted().toList();
        }
        assertEquals(4, files.size(), files.toString()); // three kinds and the mapping file
        for (Path f : files) {
            String text = Files.readString(f);
            Object ours = numbersAsDoubles(MiniJson.parse(text));
            Object theirs = plain(new ObjectMapper().readTree(text));
            assertEquals(theirs, ours, f.toString());
            assertEquals(new ArrayList<>(((Map<?, ?>) theirs).keySet()), new ArrayList<>(((Map<?, ?>) ours).keySet()));
        }
    }

    /**
     * The fast path ({@link MiniJson}) and its shipped reference ({@link JacksonJson}, {@link FastPath#JSON})
     * side by side: the same tree, numbers as written included, for every schema file (and the same
     * schema built from it) and for awkward texts.
     */
    @Test
    void theReferenceReaderReadsEverySchemaFileToTheSameTreeAndSchema() throws Exception {
        for (Kind k : Kind.values()) {
            String text = Files.readString(Path.of("catalog-schema", k.id() + ".schema.json"));
            Object fast = MiniJson.parse(text);
            assertEquals(JacksonJson.parse(text), fast, k.id());
            assertEquals(Schema.parse(k, JacksonJson.parse(text)).columns().toString(),
                    Schema.parse(k, fast).columns().toString(), k.id());
        }
    }

    // RFC 8259 sections 4-7: objects, arrays, numbers (minus, fraction, exponent with sign), string escapes.
    @ParameterizedTest
    @ValueSource(strings = {"{}", "[]", " [ ] ", "-0", "0.5e-3", "1E+2", "[1e5, -12.25, 0]", "\"\\u00b5\\ud83d\\ude00\"",
        "\"\\\"\\\\\\/\\b\\f\\n\\r\\t\"", "{\"a\": {\"b\": [[], {}, [null, true, false]]}, \"c\": \"\"}",
        "\r\n\t{\"z\":1,\"y\":2,\"x\":3}\n", "\"µ and ü as they are\""})
    void theReferenceReaderReadsAwkwardTextsAlike(String text) {
        assertEquals(JacksonJson.parse(text), MiniJson.parse(text), text);
    }

    @Test
    void valuesOfEveryKind() {
        Object v = MiniJson.parse(" {\"a\": [1, -2.5e3, 0.001], \"b\": \"x\\u00b5\\n\\\"\", \"c\": true, \"d\": null, \"e\": {}} ");
        Map<?, ?> m = (Map<?, ?>) v;
        assertEquals(List.of(new MiniJson.Num("1"), new MiniJson.Num("-2.5e3"), new MiniJson.Num("0.001")), m.get("a"));
        assertEquals(-2500.0, ((MiniJson.Num) ((List<?>) m.get("a")).get(1)).doubleValue());
        assertEquals("xµ\n\"", m.get("b"));
        assertEquals(Boolean.TRUE, m.get("c"));
        assertTrue(m.containsKey("d") && m.get("d") == null);
        assertEquals(Map.of(), m.get("e"));
    }

    // RFC 8259: no trailing commas, no leading zeros, no single quotes, strings closed, one value only.
    @ParameterizedTest
    @ValueSource(strings = {"{\"a\": 1,}", "[01]", "{'a': 1}", "\"open", "[1] [2]", "{\"a\" 1}", "[1.]", "[-]", "tru",
        "{\"a\": 1, \"a\": 2}", "[\"tab\there\"]"})
    void syntaxErrorsAreRefusedWithTheOffset(String text) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> MiniJson.parse(text));
        assertTrue(e.getMessage().startsWith("JSON at offset "), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> JacksonJson.parse(text), "the reference refuses it too");
    }
}
