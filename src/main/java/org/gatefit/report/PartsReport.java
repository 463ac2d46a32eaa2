package org.gatefit.report;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.gatefit.catalog.Column;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Numbers;
import org.gatefit.catalog.Row;
import org.gatefit.catalog.Schema;

/**
 * Renders catalog parts (find, show, export). JSON and CSV carry the catalog column names with
 * values in the columns' units, exactly as a CSV export, so they can be imported again.
 */
public final class PartsReport {
    private static final JsonFactory JSON = new JsonFactory();

    private static final List<String> SWITCH_SUMMARY = List.of("part_number", "maker", "technology", "v_block_v",
            "i_cont_a", "r_on_mohm", "q_g_nc", "package", "lifecycle", "stock");
    private static final List<String> DRIVER_SUMMARY = List.of("part_number", "maker", "topology",
            "i_source_a", "i_sink_a", "v_supply_max_v", "package", "lifecycle", "stock");

    private PartsReport() {
    }

    /** A list of parts: {@code {"parts":[...]}} in JSON, one table per kind in text and Markdown. */
    public static void list(List<Row> parts, Rendering how, Writer out) throws IOException {
        Format format = how.format();
        switch (format) {
            case JSON -> {
                try (JsonGenerator g = generator(out)) {
                    g.writeStartObject();
                    g.writeArrayFieldStart("parts");
                    for (Row r : parts) {
                        writePart(g, r);
                    }
                    g.writeEndArray();
                    g.writeEndObject();
                }
                out.write('\n');
            }
            case CSV -> {
                if (parts.isEmpty()) {
                    return;
                }
                Kind k = parts.get(0).kind();
                boolean mixed = parts.stream().anyMatch(r -> r.kind() != k);
                Csv csv = how.csv(out);
                if (mixed) {
                    for (Kind kind : List.of(Kind.SWITCH, Kind.DRIVER)) {
                        List<Row> some = parts.stream().filter(r -> r.kind() == kind).toList();
                        if (!some.isEmpty()) {
                            csv(kind, some, csv, true);
                            csv.blankLine();
                        }
                    }
                } else {
                    csv(k, parts, csv, false);
                }
                csv.flush();
            }
            case HTML -> throw Format.noHtml("find");
            case TEXT, MARKDOWN -> {
                if (parts.isEmpty()) {
                    out.write(format == Format.MARKDOWN ? "_No parts match._\n" : "No parts match.\n");
                    return;
                }
                for (Kind kind : List.of(Kind.SWITCH, Kind.DRIVER)) {
                    List<Row> some = parts.stream().filter(r -> r.kind() == kind).toList();
                    if (some.isEmpty()) {
                        continue;
                    }
                    List<String> cols = kind == Kind.SWITCH ? SWITCH_SUMMARY : DRIVER_SUMMARY;
                    TextTable t = new TextTable(cols, rightAligned(kind, cols));
                    for (Row r : some) {
                        List<String> cells = new ArrayList<>();
                        for (String c : cols) {
                            cells.add(display(r, c));
                        }
                        t.add(cells);
                    }
                    String title = some.size() + (kind == Kind.SWITCH ? (some.size() == 1 ? " switch" : " switches")
                            : (some.size() == 1 ? " driver" : " drivers"));
                    if (format == Format.MARKDOWN) {
                        out.write("### " + title + "\n\n" + t.markdown() + "\n");
                    } else {
                        out.write(title + "\n" + t.render(100) + "\n");
                    }
                }
            }
        }
    }

    /** One part with every column, its unit and meaning. */
    public static void sheet(Row r, Rendering how, Writer out) throws IOException {
        Format format = how.format();
        switch (format) {
            case JSON -> {
                try (JsonGenerator g = generator(out)) {
                    writePart(g, r);
                }
                out.write('\n');
            }
            case CSV -> {
                Csv csv = how.csv(out);
                csv(r.kind(), List.of(r), csv, false);
                csv.flush();
            }
            case HTML -> throw Format.noHtml("show");
            case TEXT, MARKDOWN -> {
                Schema s = Schema.of(r.kind());
                TextTable t = new TextTable(List.of("column", "value", "unit", "meaning"));
                for (Column c : s.columns()) {
                    Object v = r.values().get(c.name());
                    t.add(List.of(c.name(), v == null ? "unknown" : display(r, c.name()), c.unitSymbol(),
                            c.description()));
                }
                r.extras().forEach((k, v) -> t.add(List.of(k, v, "", "extra column (not in the schema)")));
                String head = r.kind().id() + " " + r.key() + (r.file() == null || r.file().isEmpty() ? ""
                        : "  (imported from " + r.file() + " line " + r.line() + ")");
                if (format == Format.MARKDOWN) {
                    out.write("### " + Markdown.escape(head) + "\n\n" + t.markdown());
                } else {
                    out.write(head + "\n" + t.render(Integer.MAX_VALUE));
                }
            }
        }
    }

    /**
     * All parts of a kind as an importable CSV in {@code style} (import reads either style back):
     * every schema column, then extra columns; text a spreadsheet would run as a formula is
     * neutralised with a leading apostrophe (OWASP), which import removes again.
     */
    public static void csv(Kind kind, List<Row> parts, CsvStyle style, Writer out) throws IOException {
        Csv csv = Csv.start(out, style);
        csv(kind, parts, csv, false);
        csv.flush();
    }

    private static void csv(Kind kind, List<Row> parts, Csv out, boolean withKind) throws IOException {
        Schema s = Schema.of(kind);
        Set<String> extras = new LinkedHashSet<>();
        for (Row r : parts) {
            extras.addAll(r.extras().keySet());
        }
        List<String> header = new ArrayList<>();
        if (withKind) {
            header.add("kind");
        }
        header.addAll(s.names());
        header.addAll(extras);
        out.row(header); // neutralised: extra columns' names are outside text
        for (Row r : parts) {
            List<Object> rec = new ArrayList<>(header.size());
            if (withKind) {
                rec.add(kind.id());
            }
            for (Column c : s.columns()) {
                rec.add(cell(r.values().get(c.name())));
            }
            for (String x : extras) {
                String v = r.extras().get(x);
                rec.add(v == null ? "" : v);
            }
            out.row(rec);
        }
    }

    /** Export as JSON: {@code {"parts":[...]}} (same as find). */
    public static void json(List<Row> parts, Writer out) throws IOException {
        list(parts, Rendering.of(Format.JSON), out);
    }

    /** A column's value for {@link Csv#row}: numbers shortest and plain, as the export has always written them. */
    private static Object cell(Object v) {
        if (v == null) {
            return "";
        }
        if (v instanceof Double d) {
            return new Csv.Plain(d);
        }
        return v;
    }

    /** A value for people: numbers formatted shortest, unknown empty. */
    public static String display(Row r, String column) {
        Object v = r.values().get(column);
        if (v == null) {
            return "";
        }
        if (v instanceof Double d) {
            return Numbers.format(d);
        }
        return v.toString();
    }

    private static boolean[] rightAligned(Kind kind, List<String> cols) {
        boolean[] b = new boolean[cols.size()];
        Schema s = Schema.of(kind);
        for (int i = 0; i < cols.size(); i++) {
            b[i] = s.column(cols.get(i)).map(Column::isNumeric).orElse(false);
        }
        return b;
    }

    static JsonGenerator generator(Writer out) throws IOException {
        JsonGenerator g = JSON.createGenerator(out);
        g.disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
        g.useDefaultPrettyPrinter();
        return g;
    }

    /** Writes one part object: part_number and kind first, then columns, then extras. */
    public static void writePart(JsonGenerator g, Row r) throws IOException {
        g.writeStartObject();
        g.writeStringField("part_number", r.key());
        g.writeStringField("kind", r.kind().id());
        for (Map.Entry<String, Object> e : r.values().entrySet()) {
            if (e.getKey().equals("part_number")) {
                continue;
            }
            Object v = e.getValue();
            if (v instanceof Double d) {
                g.writeNumberField(e.getKey(), d);
            } else if (v instanceof Long l) {
                g.writeNumberField(e.getKey(), l);
            } else {
                g.writeStringField(e.getKey(), v.toString());
            }
        }
        for (Map.Entry<String, String> e : r.extras().entrySet()) {
            if (!e.getKey().equals("kind") && !r.values().containsKey(e.getKey())) {
                g.writeStringField(e.getKey(), e.getValue());
            }
        }
        g.writeEndObject();
    }
}
