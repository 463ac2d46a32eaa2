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
class JsonTest {

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
            return l.stream().map(JsonTest::numbersAsDoubles).toList();
        }
        return v instanceof Json.Num n ? (Object) (n.doubleValue() + 0.0) : v; // + 0.0: "-0" is 0 in a tree of ints
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
            Object ours = numbersAsDoubles(Json.parse(text));
            Object theirs = plain(new ObjectMapper().readTree(text));
            assertEquals(theirs, ours, f.toString());
            assertEquals(new ArrayList<>(((Map<?, ?>) theirs).keySet()), new ArrayList<>(((Map<?, ?>) ours).keySet()));
        }
    }

    // RFC 8259 sections 4-7: objects, arrays, numbers (minus, fraction, exponent with sign), string escapes.
    @ParameterizedTest
    @ValueSource(strings = {"{}", "[]", " [ ] ", "-0", "0.5e-3", "1E+2", "[1e5, -12.25, 0]", "\"\\u00b5\\ud83d\\ude00\"",
        "\"\\\"\\\\\\/\\b\\f\\n\\r\\t\"", "{\"a\": {\"b\": [[], {}, [null, true, false]]}, \"c\": \"\"}",
        "\r\n\t{\"z\":1,\"y\":2,\"x\":3}\n", "\"µ and ü as they are\""})
    void awkwardTextsReadAsJacksonsTreeModelReadsThem(String text) throws Exception {
        assertEquals(plain(new ObjectMapper().readTree(text)), numbersAsDoubles(Json.parse(text)), text);
    }

    @Test
    void valuesOfEveryKind() {
        Object v = Json.parse(" {\"a\": [1, -2.5e3, 0.001], \"b\": \"x\\u00b5\\n\\\"\", \"c\": true, \"d\": null, \"e\": {}} ");
        Map<?, ?> m = (Map<?, ?>) v;
        assertEquals(List.of(new Json.Num("1"), new Json.Num("-2.5e3"), new Json.Num("0.001")), m.get("a"));
        assertEquals(-2500.0, ((Json.Num) ((List<?>) m.get("a")).get(1)).doubleValue());
        assertEquals("xµ\n\"", m.get("b"));
        assertEquals(Boolean.TRUE, m.get("c"));
        assertTrue(m.containsKey("d") && m.get("d") == null);
        assertEquals(Map.of(), m.get("e"));
    }

    // RFC 8259: no trailing commas, no leading zeros, no single quotes, strings closed, one value only.
    @ParameterizedTest
    @ValueSource(strings = {"{\"a\": 1,}", "[01]", "{'a': 1}", "\"open", "[1] [2]", "{\"a\" 1}", "[1.]", "[-]", "tru",
        "{\"a\": 1, \"a\": 2}", "[\"tab\there\"]"})
    void syntaxErrorsAreRefusedWithTheLineAndColumn(String text) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Json.parse(text));
        assertTrue(e.getMessage().matches("(?s)JSON line 1, column \\d+: .+"), e.getMessage());
    }

    @Test
    void anErrorOnALaterLineNamesThatLine() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Json.parse("{\n  \"headings\": {\n    \"V_DS\": v_block_v\n  }\n}"));
        assertTrue(e.getMessage().startsWith("JSON line 3, column "), e.getMessage());
    }
}
