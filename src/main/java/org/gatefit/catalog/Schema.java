package org.gatefit.catalog;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Pattern;

/**
 * The columns of one kind of row, read from the JSON Schema (2020-12) files in
 * {@code catalog-schema/} (bundled in the jar). These files are the single source of truth: the
 * importer, {@code validate}, {@code find --where} and export all read columns from here.
 *
 * <p>Besides standard keywords ({@code type}, {@code enum}, {@code pattern}, {@code minimum},
 * {@code exclusiveMinimum}, {@code maximum}, {@code default}, {@code required}, {@code examples})
 * the files use annotations of ours: {@code x-unit} (the unit of a number, e.g. {@code nC})
 * {@code x-default-from} (the column whose value fills an empty cell) and {@code x-words-only}
 * (a free text searched by its words, not compared or sorted, so the index keeps no exact term or
 * sort value for it), {@code x-headings} (the headings people's sheets name the column by, see
 * {@link Headings}), {@code x-choice-words} (per choice, the other ways people write it) and
 * {@code x-replacement} (how {@code replace} compares a substitute's value: label, compare —
 * same, higher, lower, yes, window-relative, window-absolute — essential, window; the one place
 * that column knowledge lives, {@link Column.Substitute}).
 */
public final class Schema {
    /** Classpath folder of the bundled schema files. */
    public static final String RESOURCE_DIR = "/org/gatefit/catalog/schema/";

    /** Loaded schemas by kind ordinal: read without a lock on every lookup (hot in scans), loaded once under one. */
    private static final java.util.concurrent.atomic.AtomicReferenceArray<Schema> CACHE =
            new java.util.concurrent.atomic.AtomicReferenceArray<>(Kind.values().length);

    private final Kind kind;
    private final List<Column> columns;
    private final Map<String, Column> byName;
    private final Map<String, Unit> units = new java.util.HashMap<>();
    /** Position of each column by name (see {@link #slot}). */
    private final Map<String, Integer> slots = new java.util.HashMap<>();

    private Schema(Kind kind, List<Column> columns) {
        this.kind = kind;
        this.columns = List.copyOf(columns);
        Map<String, Column> m = new LinkedHashMap<>();
        for (Column c : columns) {
            slots.put(c.name(), slots.size());
            m.put(c.name(), c);
            if (c.unit() != null) {
                units.put(c.name(), c.unit());
            }
        }
        this.byName = m;
    }

    /** The bundled schema of a kind. */
    public static Schema of(Kind kind) {
        Schema s = CACHE.get(kind.ordinal());
        return s != null ? s : load(kind);
    }

    private static synchronized Schema load(Kind k) {
        Schema s = CACHE.get(k.ordinal());
        if (s != null) {
            return s;
        }
        String res = RESOURCE_DIR + k.id() + ".schema.json";
        try (InputStream in = Schema.class.getResourceAsStream(res)) {
            if (in == null) {
                throw new IllegalStateException("schema resource missing from the build: " + res);
            }
            String text = new String(in.readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
            s = parse(k, Json.parse(text));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + res, e);
        }
        CACHE.set(k.ordinal(), s);
        return s;
    }

    /** Builds a schema from a parsed JSON Schema document ({@link Json} values). */
    @SuppressWarnings("unchecked")
    static Schema parse(Kind kind, Object document) {
        Map<String, Object> root = (Map<String, Object>) document;
        Set<String> required = new HashSet<>();
        for (Object n : (List<Object>) root.getOrDefault("required", List.of())) {
            required.add(text(n));
        }
        List<Column> cols = new ArrayList<>();
        for (Map.Entry<String, Object> e : ((Map<String, Object>) root.getOrDefault("properties", Map.of())).entrySet()) {
            cols.add(column(e.getKey(), (Map<String, Object>) e.getValue(), required.contains(e.getKey())));
        }
        for (String r : required) {
            if (cols.stream().noneMatch(c -> c.name().equals(r))) {
                throw new IllegalStateException(kind + " schema requires undefined column " + r);
            }
        }
        return new Schema(kind, cols);
    }

    /** A JSON value as text: strings as they are, numbers as written, booleans as true/false. */
    private static String text(Object v) {
        return v == null ? "null" : v.toString();
    }

    private static Double number(Object v) {
        return v instanceof Json.Num n ? n.doubleValue() : Double.parseDouble(text(v));
    }

    @SuppressWarnings("unchecked")
    private static Column column(String name, Map<String, Object> p, boolean required) {
        String jsonType = p.containsKey("type") ? text(p.get("type")) : "";
        ColumnType type;
        List<String> choices = new ArrayList<>();
        if (p.containsKey("enum")) {
            type = ColumnType.CHOICE;
            for (Object n : (List<Object>) p.get("enum")) {
                choices.add(text(n));
            }
        } else {
            type = switch (jsonType) {
                case "string" -> ColumnType.TEXT;
                case "number" -> ColumnType.NUMBER;
                case "integer" -> ColumnType.INTEGER;
                default -> throw new IllegalStateException("column " + name + ": unsupported type " + jsonType);
            };
        }
        Unit unit = p.containsKey("x-unit") ? Unit.parse(text(p.get("x-unit"))) : null;
        Double min = null;
        boolean minEx = false;
        if (p.containsKey("exclusiveMinimum")) {
            min = number(p.get("exclusiveMinimum"));
            minEx = true;
        } else if (p.containsKey("minimum")) {
            min = number(p.get("minimum"));
        }
        Double max = p.containsKey("maximum") ? number(p.get("maximum")) : null;
        String def = p.containsKey("default") ? text(p.get("default")) : null;
        String defFrom = p.containsKey("x-default-from") ? text(p.get("x-default-from")) : null;
        List<Object> examples = p.get("examples") instanceof List<?> l ? (List<Object>) l : List.of();
        String example = examples.isEmpty() ? null : text(examples.get(0));
        Pattern pattern = p.containsKey("pattern") ? Pattern.compile(text(p.get("pattern"))) : null;
        List<String> headings = new ArrayList<>();
        for (Object h : (List<Object>) p.getOrDefault("x-headings", List.of())) {
            headings.add(text(h));
        }
        Map<String, String> words = new LinkedHashMap<>();
        for (Map.Entry<String, Object> e : ((Map<String, Object>) p.getOrDefault("x-choice-words", Map.of())).entrySet()) {
            if (!choices.contains(e.getKey())) {
                throw new IllegalStateException("column " + name + ": x-choice-words names " + e.getKey()
                        + ", which is not one of its choices " + choices);
            }
            for (Object w : (List<Object>) e.getValue()) {
                words.put(text(w), e.getKey());
            }
        }
        Column.Substitute replacement = null;
        if (p.get("x-replacement") instanceof Map<?, ?> r) {
            replacement = new Column.Substitute(text(r.get("label")), Column.Compare.of(text(r.get("compare"))),
                    Boolean.TRUE.equals(r.get("essential")), r.containsKey("window") ? number(r.get("window")) : 0);
        }
        return new Column(name, type, unit, required, choices, pattern, min, minEx, max, def, defFrom,
                p.containsKey("description") ? text(p.get("description")) : "", example,
                Boolean.TRUE.equals(p.get("x-words-only")), headings, words, replacement);
    }

    public Kind kind() {
        return kind;
    }

    /** Columns in schema order (the order of export). */
    public List<Column> columns() {
        return columns;
    }

    /** A column by exact (lower-case) name. */
    public Optional<Column> column(String name) {
        return Optional.ofNullable(byName.get(name));
    }

    /** The unit of a number column, or null (no such column, or a number without unit): for hot paths. */
    public Unit unit(String column) {
        return units.get(column);
    }

    /** Position of a column in {@link #columns()} (what {@link RowCursor} takes); an unknown name is a programming error. */
    public int position(String column) {
        for (int i = 0; i < columns.size(); i++) {
            if (columns.get(i).name().equals(column)) {
                return i;
            }
        }
        throw new IllegalArgumentException("expected a " + kind.id() + " column, got '" + column + "'");
    }

    /** Position of a column in {@link #columns()}, or -1 for anything that names none (by hash: hot in row reads). */
    int slot(Object column) {
        Integer i = slots.get(column);
        return i == null ? -1 : i;
    }

    /** Names of all columns, in order. */
    public List<String> names() {
        return List.copyOf(byName.keySet());
    }

    /** Names of required columns, in order. */
    public List<String> requiredNames() {
        return columns.stream().filter(Column::required).map(Column::name).toList();
    }
}
