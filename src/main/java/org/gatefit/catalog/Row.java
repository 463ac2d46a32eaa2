package org.gatefit.catalog;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;

/**
 * One checked row of a catalog or stage sheet. Values are canonical: {@link String} for text and
 * choices, {@link Double} for numbers in the column's unit, {@link Long} for counts; a column with
 * no value is absent (unknown), never zero.
 *
 * @param kind   what the row describes
 * @param key    the row's id as written (part number, or stage id)
 * @param file   where it came from
 * @param line   physical line it starts on
 * @param values schema columns with values, in schema order
 * @param extras columns the schema does not know, kept as text under their header names
 */
public record Row(Kind kind, String key, String file, long line, Map<String, Object> values,
                  Map<String, String> extras) {

    public Row {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(key, "key");
        values = values instanceof Owned ? values : Collections.unmodifiableMap(new LinkedHashMap<>(values));
        extras = Collections.unmodifiableMap(new LinkedHashMap<>(extras));
        for (Object v : values.values()) {
            if (!(v instanceof String || v instanceof Double || v instanceof Long)) {
                throw new IllegalArgumentException("expected String, Double or Long values, got " + v);
            }
        }
    }

    /**
     * Hands a freshly built map to a row without the defensive copy (for scans that build a row
     * per document): the caller gives up the map and must not change it afterwards. The row sees it
     * read-only, in its insertion order.
     */
    public static Map<String, Object> owned(LinkedHashMap<String, Object> values) {
        return new Owned(values);
    }

    /** A read-only map over a map nobody else holds (see {@link #owned}). */
    private static final class Owned extends java.util.AbstractMap<String, Object> {
        private final Map<String, Object> map;

        Owned(LinkedHashMap<String, Object> map) {
            this.map = Collections.unmodifiableMap(map);
        }

        @Override
        public Object get(Object key) {
            return map.get(key);
        }

        @Override
        public boolean containsKey(Object key) {
            return map.containsKey(key);
        }

        @Override
        public int size() {
            return map.size();
        }

        @Override
        public java.util.Set<Map.Entry<String, Object>> entrySet() {
            return map.entrySet();
        }
    }

    /** Text or choice value, or null when unknown. */
    public String text(String column) {
        Object v = values.get(column);
        return v == null ? null : v.toString();
    }

    /** Number in the column's unit, or NaN when unknown. */
    public double number(String column) {
        Object v = values.get(column);
        if (v instanceof Double d) {
            return d;
        }
        if (v instanceof Long l) {
            return l;
        }
        return Double.NaN;
    }

    /** Number converted to SI (V, A, C, s, Ω, F, H, W, Hz), or NaN when unknown. */
    public double si(String column) {
        double v = number(column);
        if (Double.isNaN(v)) {
            return v;
        }
        Unit u = Schema.of(kind).unit(column);
        return u == null ? v : u.toSi(v);
    }

    /** Normalised id used for uniqueness and lookup: trimmed and upper-cased. */
    public static String normaliseKey(String key) {
        return key.strip().toUpperCase(java.util.Locale.ROOT);
    }
}
