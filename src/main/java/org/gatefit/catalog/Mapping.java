package org.gatefit.catalog;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

/**
 * Which column the user says a heading fills: {@code --map 'HEADING=column'} options and a mapping
 * file ({@code --map-file}, JSON, {@code catalog-schema/mapping.schema.json}):
 *
 * <pre>{"gatefit-mapping": 1, "headings": {"Vds (V)": "v_block_v", "Our ref": ""}}</pre>
 *
 * An empty column keeps the heading as an extra attribute. Headings are compared as
 * {@link Headings#normalise} compares them, whole or without the unit they name. A column no kind
 * has, a heading given twice with different columns, or two headings on one column is a usage
 * error (exit 2), found before any file is read.
 */
public final class Mapping {
    /** The version {@code gatefit-mapping} names. */
    public static final int VERSION = 1;

    /** Normalised heading → column ("" for an extra attribute). */
    private final Map<String, String> byHeading = new LinkedHashMap<>();
    /** Column → the heading (as written) mapped to it, and where that came from. */
    private final Map<String, Origin> byColumn = new LinkedHashMap<>();

    private Mapping() {
    }

    /** No mapping at all. */
    public static final Mapping NONE = new Mapping();

    /** Whether nothing is mapped. */
    public boolean isEmpty() {
        return byHeading.isEmpty();
    }

    /**
     * The mapping from a file (may be null; {@code shown} names it in messages) and {@code --map}
     * options, which come after the file and may override its headings.
     */
    public static Mapping of(Path file, String shown, List<String> options) throws BadValueException, IOException {
        Mapping m = new Mapping();
        if (file != null) {
            m.readFile(file, shown);
        }
        for (String o : options) {
            int eq = o.lastIndexOf('=');
            if (eq <= 0) {
                throw new BadValueException("--map " + Problem.quote(o) + ": expected HEADING=column, e.g. 'Vds (V)=v_block_v'"
                        + " (an empty column keeps the heading as an extra attribute)");
            }
            m.put(o.substring(0, eq).strip(), o.substring(eq + 1).strip(), "--map " + Problem.quote(o), true);
        }
        return m;
    }

    @SuppressWarnings("unchecked")
    private void readFile(Path file, String shown) throws BadValueException, IOException {
        String text = Files.readString(file, StandardCharsets.UTF_8);
        if (!text.isEmpty() && text.charAt(0) == '\uFEFF') {
            text = text.substring(1);
        }
        Object doc;
        try {
            doc = Json.parse(text);
        } catch (IllegalArgumentException e) {
            throw new BadValueException("--map-file " + shown + ": not a mapping file: " + e.getMessage()
                    + " (expected JSON as catalog-schema/mapping.schema.json describes)");
        }
        if (!(doc instanceof Map<?, ?> root) || !(root.get("headings") instanceof Map<?, ?> headings)) {
            throw new BadValueException("--map-file " + shown + ": expected a JSON object with \"headings\": {\"HEADING\":"
                    + " \"column\", …} (catalog-schema/mapping.schema.json)");
        }
        Object version = root.get("gatefit-mapping");
        if (version != null && !String.valueOf(version).equals(String.valueOf(VERSION))) {
            throw new BadValueException("--map-file " + shown + ": \"gatefit-mapping\" is " + version + " (expected "
                    + VERSION + ")");
        }
        for (Map.Entry<String, Object> e : ((Map<String, Object>) headings).entrySet()) {
            if (!(e.getValue() instanceof String column)) {
                throw new BadValueException("--map-file " + shown + ": heading " + Problem.quote(e.getKey())
                        + " maps to " + e.getValue() + " (expected a column name as a string, or \"\" for an extra attribute)");
            }
            put(e.getKey().strip(), column.strip(), "--map-file " + shown, false);
        }
    }

    private void put(String heading, String column, String where, boolean override) throws BadValueException {
        if (heading.isEmpty()) {
            throw new BadValueException(where + ": the heading is empty (expected HEADING=column)");
        }
        if (!column.isEmpty() && !allColumns().contains(column)) {
            throw new BadValueException(where + ": unknown column " + Problem.quote(column) + " (expected a column of the"
                    + " switch, driver or stage schema, e.g. v_block_v; catalog-schema/README.md lists them)");
        }
        String key = Headings.normalise(heading);
        String before = byHeading.get(key);
        if (before != null && !before.equals(column)) {
            if (!override) {
                throw new BadValueException(where + ": heading " + Problem.quote(heading) + " is mapped twice, to "
                        + (before.isEmpty() ? "an extra attribute" : before) + " and to "
                        + (column.isEmpty() ? "an extra attribute" : column) + " (expected one column per heading)");
            }
            byColumn.values().removeIf(o -> Headings.normalise(o.heading()).equals(key)); // --map overrides the file
        }
        if (!column.isEmpty()) {
            Origin other = byColumn.get(column);
            if (other != null && !Headings.normalise(other.heading()).equals(key)) {
                throw new BadValueException(where + ": headings " + Problem.quote(other.heading()) + " (" + other.where()
                        + ") and " + Problem.quote(heading) + " are both mapped to column " + column + " (expected one"
                        + " heading per column; map the other to \"\" to keep it as an extra attribute)");
            }
            byColumn.put(column, new Origin(heading, where));
        }
        byHeading.put(key, column);
    }

    /** Where a heading's mapping was given. */
    private record Origin(String heading, String where) {
    }

    private static Set<String> allColumns() {
        Set<String> all = new TreeSet<>();
        for (Kind k : Kind.values()) {
            all.addAll(Schema.of(k).names());
        }
        return all;
    }

    /** The column mapped to a heading as written in a sheet ("" for an extra attribute), or null when not mapped. */
    public String target(String heading) {
        String t = byHeading.get(Headings.normalise(heading));
        if (t != null) {
            return t;
        }
        for (String name : Headings.nameParts(heading)) {
            t = byHeading.get(Headings.normalise(name));
            if (t != null) {
                return t;
            }
        }
        return null;
    }

    /**
     * A mapping file of the headings read: heading → column, or "" for an extra attribute, and
     * per missing required column the nearest headings (ignored when the file is read back).
     */
    public static String json(Map<String, String> headings, Map<String, List<String>> missing) {
        StringBuilder sb = new StringBuilder("{\n  \"gatefit-mapping\": ").append(VERSION).append(",\n  \"headings\": {");
        List<String> lines = new ArrayList<>();
        headings.forEach((h, c) -> lines.add("\n    " + quote(h) + ": " + quote(c)));
        sb.append(String.join(",", lines)).append(lines.isEmpty() ? "}" : "\n  }");
        if (!missing.isEmpty()) {
            sb.append(",\n  \"missing\": {");
            List<String> ms = new ArrayList<>();
            missing.forEach((c, near) -> ms.add("\n    " + quote(c) + ": [" + String.join(", ",
                    near.stream().map(Mapping::quote).toList()) + "]"));
            sb.append(String.join(",", ms)).append("\n  }");
        }
        return sb.append("\n}\n").toString();
    }

    /** A JSON string literal. */
    static String quote(String s) {
        StringBuilder sb = new StringBuilder("\"");
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '"' -> sb.append("\\\"");
                case '\\' -> sb.append("\\\\");
                case '\n' -> sb.append("\\n");
                case '\r' -> sb.append("\\r");
                case '\t' -> sb.append("\\t");
                default -> {
                    if (c < 0x20) {
                        sb.append(String.format("\\u%04x", (int) c));
                    } else {
                        sb.append(c);
                    }
                }
            }
        }
        return sb.append('"').toString();
    }
}
