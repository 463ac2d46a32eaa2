package org.gatefit.catalog;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.Iterator;
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
 * the files use two annotations of ours: {@code x-unit} (the unit of a number, e.g. {@code nC})
 * {@code x-default-from} (the column whose value fills an empty cell) and {@code x-words-only}
 * (a free text searched by its words, not compared or sorted, so the index keeps no exact term or
 * sort value for it).
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

    private Schema(Kind kind, List<Column> columns) {
        this.kind = kind;
        this.columns = List.copyOf(columns);
        Map<String, Column> m = new LinkedHashMap<>();
        for (Column c : columns) {
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
            s = parse(k, new ObjectMapper().readTree(in));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + res, e);
        }
        CACHE.set(k.ordinal(), s);
        return s;
    }

    /** Builds a schema from a parsed JSON Schema document. */
    static Schema parse(Kind kind, JsonNode root) {
        Set<String> required = new HashSet<>();
        root.path("required").forEach(n -> required.add(n.asText()));
        List<Column> cols = new ArrayList<>();
        Iterator<Map.Entry<String, JsonNode>> it = root.path("properties").fields();
        while (it.hasNext()) {
            Map.Entry<String, JsonNode> e = it.next();
            cols.add(column(e.getKey(), e.getValue(), required.contains(e.getKey())));
        }
        for (String r : required) {
            if (cols.stream().noneMatch(c -> c.name().equals(r))) {
                throw new IllegalStateException(kind + " schema requires undefined column " + r);
            }
        }
        return new Schema(kind, cols);
    }

    private static Column column(String name, JsonNode p, boolean required) {
        String jsonType = p.path("type").asText();
        ColumnType type;
        List<String> choices = new ArrayList<>();
        if (p.has("enum")) {
            type = ColumnType.CHOICE;
            p.get("enum").forEach(n -> choices.add(n.asText()));
        } else {
            type = switch (jsonType) {
                case "string" -> ColumnType.TEXT;
                case "number" -> ColumnType.NUMBER;
                case "integer" -> ColumnType.INTEGER;
                default -> throw new IllegalStateException("column " + name + ": unsupported type " + jsonType);
            };
        }
        Unit unit = p.has("x-unit") ? Unit.parse(p.get("x-unit").asText()) : null;
        Double min = null;
        boolean minEx = false;
        if (p.has("exclusiveMinimum")) {
            min = p.get("exclusiveMinimum").asDouble();
            minEx = true;
        } else if (p.has("minimum")) {
            min = p.get("minimum").asDouble();
        }
        Double max = p.has("maximum") ? p.get("maximum").asDouble() : null;
        String def = p.has("default") ? p.get("default").asText() : null;
        String defFrom = p.has("x-default-from") ? p.get("x-default-from").asText() : null;
        String example = p.has("examples") && p.get("examples").size() > 0 ? p.get("examples").get(0).asText() : null;
        Pattern pattern = p.has("pattern") ? Pattern.compile(p.get("pattern").asText()) : null;
        return new Column(name, type, unit, required, choices, pattern, min, minEx, max, def, defFrom,
                p.path("description").asText(""), example, p.path("x-words-only").asBoolean(false));
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

    /** Names of all columns, in order. */
    public List<String> names() {
        return List.copyOf(byName.keySet());
    }

    /** Names of required columns, in order. */
    public List<String> requiredNames() {
        return columns.stream().filter(Column::required).map(Column::name).toList();
    }
}
