package org.gatefit.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.EdgeCasesMode;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/**
 * A row whose values the importer hands over by schema position ({@link Row#bySlot}) reads exactly
 * like one built from a {@link LinkedHashMap} in schema order ({@link Row#owned}), as rows were
 * built before: the same entries in the same order, lookups, equality, hash, text, and the same
 * refusals to change. The values are random inputs; the check is the LinkedHashMap-backed row.
 */
class RowSlotsTest {

    @Provide
    Arbitrary<List<Integer>> picks() {
        return Arbitraries.integers().between(0, 4).list().ofMinSize(60).ofMaxSize(60);
    }

    /** Fills the columns whose pick is not 0 with a value of the column's type (the pick varies it). */
    private static Object[] slots(Schema schema, List<Integer> picks) {
        List<Column> cols = schema.columns();
        Object[] v = new Object[cols.size()];
        for (int i = 0; i < cols.size(); i++) {
            int p = picks.get(i % picks.size());
            if (p == 0) {
                continue;
            }
            v[i] = switch (cols.get(i).type()) {
                case TEXT, CHOICE -> "v" + p;
                case NUMBER -> p * 0.5;
                case INTEGER -> (long) p;
            };
        }
        return v;
    }

    @Property(tries = 400, edgeCases = EdgeCasesMode.MIXIN)
    void aRowBySlotReadsLikeARowFromALinkedHashMap(@ForAll("picks") List<Integer> picks) {
        for (Kind kind : Kind.values()) {
            Schema schema = Schema.of(kind);
            Object[] v = slots(schema, picks);
            LinkedHashMap<String, Object> m = new LinkedHashMap<>();
            for (int i = 0; i < v.length; i++) {
                if (v[i] != null) {
                    m.put(schema.columns().get(i).name(), v[i]);
                }
            }
            Map<String, Object> expected = new Row(kind, "K", "f", 2, Row.owned(m), Map.of()).values();
            Map<String, Object> got = new Row(kind, "K", "f", 2, Row.bySlot(schema, v.clone()), Map.of()).values();
            assertEquals(expected, got);
            assertEquals(got, expected);
            assertEquals(expected.hashCode(), got.hashCode());
            assertEquals(expected.toString(), got.toString());
            assertEquals(expected.size(), got.size());
            assertEquals(expected.isEmpty(), got.isEmpty());
            assertEquals(new ArrayList<>(expected.entrySet()), new ArrayList<>(got.entrySet()), "order");
            assertEquals(new ArrayList<>(expected.keySet()), new ArrayList<>(got.keySet()));
            assertEquals(new ArrayList<>(expected.values()), new ArrayList<>(got.values()));
            List<Object> probes = new ArrayList<>(schema.names());
            probes.addAll(java.util.Arrays.asList(null, "", "no_such_column", 7, "PART_NUMBER"));
            for (Object k : probes) {
                assertEquals(expected.get(k), got.get(k), String.valueOf(k));
                assertEquals(expected.containsKey(k), got.containsKey(k), String.valueOf(k));
                assertEquals(expected.getOrDefault(k, "d"), got.getOrDefault(k, "d"), String.valueOf(k));
            }
            for (Object val : List.of("v1", 1.0, 2L, "zz")) {
                assertEquals(expected.containsValue(val), got.containsValue(val), String.valueOf(val));
            }
            String anyKey = schema.columns().get(0).name();
            List<Consumer<Map<String, Object>>> changes = List.of(
                    x -> x.put(anyKey, "x"), x -> x.remove(anyKey), x -> x.putAll(Map.of(anyKey, "x")),
                    x -> x.entrySet().clear(), x -> x.entrySet().iterator().next().setValue("x"),
                    x -> x.putIfAbsent("no_such_column", "x"), x -> x.entrySet().add(Map.entry(anyKey, "x")));
            for (Consumer<Map<String, Object>> change : changes) {
                Class<? extends Throwable> refused = thrown(change, expected);
                if (refused != null) {
                    assertThrows(refused, () -> change.accept(got));
                }
            }
            assertEquals(expected, got, "unchanged after the refused changes");
        }
    }

    private static Class<? extends Throwable> thrown(Consumer<Map<String, Object>> change, Map<String, Object> m) {
        try {
            change.accept(m);
            return null;
        } catch (RuntimeException e) {
            return e.getClass();
        }
    }

    @Example
    void slotIsThePositionOfEveryColumnAndMinusOneForOtherNames() {
        for (Kind kind : Kind.values()) {
            Schema schema = Schema.of(kind);
            for (Column c : schema.columns()) {
                assertEquals(schema.position(c.name()), schema.slot(c.name()), c.name());
            }
            assertEquals(-1, schema.slot("no_such_column"));
            assertEquals(-1, schema.slot(null));
            assertEquals(-1, schema.slot(schema.columns().get(0).name().toUpperCase(java.util.Locale.ROOT)));
        }
    }

    @Example
    void valuesOfAnotherTypeAreRefusedAsBefore() {
        Schema schema = Schema.of(Kind.SWITCH);
        Object[] v = new Object[schema.columns().size()];
        v[0] = Integer.valueOf(3);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new Row(Kind.SWITCH, "K", "f", 1, Row.bySlot(schema, v), Map.of()));
        assertEquals("expected String, Double or Long values, got 3", e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> Row.bySlot(schema, new Object[1]));
    }
}
