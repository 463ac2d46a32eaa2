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

    /** The extras of a row without any (shared: read-only). */
    private static final Map<String, String> NO_EXTRAS = Collections.unmodifiableMap(new LinkedHashMap<>());

    public Row {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(key, "key");
        extras = extras.isEmpty() ? NO_EXTRAS : Collections.unmodifiableMap(new LinkedHashMap<>(extras));
        if (values instanceof Slots s) {
            for (Object v : s.values) { // the same check as below, without an entry per value
                if (v != null) {
                    checkType(v);
                }
            }
        } else {
            values = values instanceof Owned ? values : Collections.unmodifiableMap(new LinkedHashMap<>(values));
            for (Object v : values.values()) {
                checkType(v);
            }
        }
    }

    private static void checkType(Object v) {
        if (!(v instanceof String || v instanceof Double || v instanceof Long)) {
            throw new IllegalArgumentException("expected String, Double or Long values, got " + v);
        }
    }

    /**
     * The value of column {@code position} of the kind's schema, or null when the row has none;
     * for a row the importer built, an array read (no lookup by name).
     */
    public Object valueAt(int position) {
        if (values instanceof Slots s) {
            return s.values[position];
        }
        return values.get(Schema.of(kind).columns().get(position).name());
    }

    /**
     * Hands values held by schema position to a row without a copy (the importer builds one per
     * row): {@code values[i]} is the value of column {@code i} of {@code schema}, or null when the
     * row has none. The caller gives up the array. The row's map reads exactly like the one
     * {@link #owned} gives: read-only, the columns with values in schema order.
     */
    static Map<String, Object> bySlot(Schema schema, Object[] values) {
        if (values.length != schema.columns().size()) {
            throw new IllegalArgumentException("expected " + schema.columns().size() + " values, got " + values.length);
        }
        return new Slots(schema, values);
    }

    /** A read-only map over values by schema position (see {@link #bySlot}); absent columns are null. */
    private static final class Slots extends java.util.AbstractMap<String, Object> {
        private final Schema schema;
        private final Object[] values;
        private final int size;
        private java.util.Set<Map.Entry<String, Object>> entries;

        Slots(Schema schema, Object[] values) {
            this.schema = schema;
            this.values = values;
            int n = 0;
            for (Object v : values) {
                if (v != null) {
                    n++;
                }
            }
            this.size = n;
        }

        @Override
        public Object get(Object key) {
            int i = schema.slot(key);
            return i < 0 ? null : values[i];
        }

        @Override
        public boolean containsKey(Object key) {
            return get(key) != null;
        }

        @Override
        public int size() {
            return size;
        }

        @Override
        public java.util.Set<Map.Entry<String, Object>> entrySet() {
            if (entries == null) {
                entries = Collections.unmodifiableSet(new java.util.AbstractSet<>() {
                    @Override
                    public java.util.Iterator<Map.Entry<String, Object>> iterator() {
                        return new java.util.Iterator<>() {
                            private int next = advance(0);

                            private int advance(int from) {
                                while (from < values.length && values[from] == null) {
                                    from++;
                                }
                                return from;
                            }

                            @Override
                            public boolean hasNext() {
                                return next < values.length;
                            }

                            @Override
                            public Map.Entry<String, Object> next() {
                                if (next >= values.length) {
                                    throw new java.util.NoSuchElementException();
                                }
                                int i = next;
                                next = advance(i + 1);
                                return new java.util.AbstractMap.SimpleImmutableEntry<>(
                                        schema.columns().get(i).name(), values[i]);
                            }
                        };
                    }

                    @Override
                    public int size() {
                        return size;
                    }
                });
            }
            return entries;
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
