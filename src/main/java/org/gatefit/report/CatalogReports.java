package org.gatefit.report;

import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.io.Writer;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Problem;
import org.gatefit.catalog.SheetReader;
import org.gatefit.index.ImportRecord;

/** Renders {@code validate} and {@code info} results. */
public final class CatalogReports {
    private CatalogReports() {
    }

    /** Files checked by validate, with their problems. */
    public static void validation(List<SheetReader.Summary> files, Rendering how, Writer out) throws IOException {
        switch (how.format()) {
            case JSON -> {
                try (JsonGenerator g = PartsReport.generator(out)) {
                    g.writeStartObject();
                    g.writeArrayFieldStart("files");
                    for (SheetReader.Summary s : files) {
                        g.writeStartObject();
                        g.writeStringField("file", s.file());
                        g.writeStringField("kind", s.kind() == null ? null : s.kind().id());
                        g.writeNumberField("rows", s.rows());
                        g.writeNumberField("rejected", s.rejected());
                        g.writeStringField("sha256", s.sha256());
                        g.writeArrayFieldStart("unknown_columns");
                        for (String c : s.unknownColumns()) {
                            g.writeString(c);
                        }
                        g.writeEndArray();
                        g.writeNumberField("problem_count", s.problemCount());
                        g.writeArrayFieldStart("problems");
                        for (Problem p : s.problems()) {
                            problem(g, p);
                        }
                        g.writeEndArray();
                        g.writeEndObject();
                    }
                    g.writeEndArray();
                    g.writeEndObject();
                }
                out.write('\n');
            }
            case CSV -> {
                Csv csv = how.csv(out);
                csv.row("file", "line", "column", "column_number", "text", "message");
                for (SheetReader.Summary s : files) {
                    for (Problem p : s.problems()) {
                        csv.row(p.file(), p.line(), p.column() == null ? "" : p.column(),
                                p.columnNumber() == 0 ? "" : (Object) p.columnNumber(), p.text() == null ? "" : p.text(),
                                p.message());
                    }
                }
                csv.flush();
            }
            case HTML -> throw Format.noHtml("validate");
            case TEXT, MARKDOWN -> {
                for (SheetReader.Summary s : files) {
                    String what = s.kind() == null ? "?" : s.kind().id();
                    if (s.clean()) {
                        out.write("ok      " + s.file() + ": " + s.rows() + " " + what + " rows, no problems\n");
                    } else {
                        out.write("invalid " + s.file() + ": " + s.problemCount() + (s.problemCount() == 1
                                ? " problem" : " problems") + " (" + s.rows() + " good rows, " + s.rejected()
                                + " bad)\n");
                        for (Problem p : s.problems()) {
                            out.write("  " + p + "\n");
                        }
                        if (s.problemCount() > s.problems().size()) {
                            out.write("  … and " + (s.problemCount() - s.problems().size()) + " more\n");
                        }
                    }
                    if (!s.unknownColumns().isEmpty()) {
                        out.write("        extra columns (kept, not checked): " + String.join(", ", s.unknownColumns()) + "\n");
                    }
                }
            }
        }
    }

    static void problem(JsonGenerator g, Problem p) throws IOException {
        g.writeStartObject();
        g.writeStringField("file", p.file());
        g.writeNumberField("line", p.line());
        if (p.column() != null) {
            g.writeStringField("column", p.column());
        }
        if (p.columnNumber() > 0) {
            g.writeNumberField("column_number", p.columnNumber());
        }
        if (p.text() != null) {
            g.writeStringField("text", p.text());
        }
        g.writeStringField("message", p.message());
        g.writeEndObject();
    }

    /**
     * What the catalog holds and where it came from, with its content hash ({@code contentSha256},
     * null when empty: the value report headers name it by).
     */
    public static void info(Path dir, String contentSha256, Map<Kind, Integer> counts, List<ImportRecord> history,
                            Rendering how, Writer out) throws IOException {
        Format format = how.format();
        switch (format) {
            case JSON -> {
                try (JsonGenerator g = PartsReport.generator(out)) {
                    g.writeStartObject();
                    g.writeStringField("catalog", dir.toString());
                    g.writeStringField("content_sha256", contentSha256);
                    g.writeObjectFieldStart("counts");
                    for (Map.Entry<Kind, Integer> e : counts.entrySet()) {
                        g.writeNumberField(e.getKey().id(), e.getValue());
                    }
                    g.writeEndObject();
                    g.writeArrayFieldStart("imports");
                    for (ImportRecord r : history) {
                        g.writeStartObject();
                        g.writeStringField("file", r.file());
                        g.writeStringField("kind", r.kind());
                        g.writeNumberField("rows", r.rows());
                        g.writeStringField("sha256", r.sha256());
                        g.writeStringField("time", r.time().toString());
                        g.writeStringField("mode", r.mode());
                        g.writeEndObject();
                    }
                    g.writeEndArray();
                    g.writeEndObject();
                }
                out.write('\n');
            }
            case CSV -> {
                Csv csv = how.csv(out);
                csv.row("time", "file", "kind", "rows", "mode", "sha256");
                for (ImportRecord r : history) {
                    csv.row(r.time().toString(), r.file(), r.kind(), r.rows(), r.mode(), r.sha256());
                }
                csv.flush();
            }
            case HTML -> throw Format.noHtml("info");
            case TEXT, MARKDOWN -> {
                boolean md = format == Format.MARKDOWN;
                out.write((md ? "**Catalog:** " : "catalog:  ") + (md ? Markdown.escape(dir.toString()) : dir) + "\n");
                List<String> parts = new ArrayList<>();
                counts.forEach((k, v) -> parts.add(v + (k == Kind.SWITCH ? " switches" : " drivers")));
                out.write((md ? "**Holds:** " : "holds:    ") + String.join(", ", parts) + "\n");
                if (contentSha256 != null) {
                    out.write((md ? "**Content SHA-256:** `" + contentSha256 + "`" : "content:  SHA-256 " + contentSha256)
                            + "\n");
                }
                out.write("\n");
                if (history.isEmpty()) {
                    out.write("Nothing imported yet: run 'gatefit import FILE...'.\n");
                    return;
                }
                TextTable t = new TextTable(List.of("imported (UTC)", "file", "kind", "rows", "mode", "sha256"),
                        false, false, false, true, false, false);
                for (ImportRecord r : history) {
                    t.add(List.of(r.time().toString().replace('T', ' ').replaceAll("\\.\\d+Z$", "Z"), r.file(), r.kind(),
                            Long.toString(r.rows()), r.mode(), r.sha256().substring(0, Math.min(16, r.sha256().length()))));
                }
                out.write(md ? t.markdown() : t.render(Integer.MAX_VALUE));
            }
        }
    }
}
