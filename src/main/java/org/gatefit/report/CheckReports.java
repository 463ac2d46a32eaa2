package org.gatefit.report;

import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import org.gatefit.match.Check;
import org.gatefit.match.Eng;
import org.gatefit.match.Figure;
import org.gatefit.match.StageCheck;
import org.gatefit.match.Verdict;

/** Renders {@code check} results, and the JUnit-XML report for CI systems. */
public final class CheckReports {
    private static final int WIDTH = 100;

    private CheckReports() {
    }

    /** The stage check's result, rendered as {@code how} asks. */
    public static void render(StageCheck.Report r, Rendering how, Writer out) throws IOException {
        switch (how.format()) {
            case JSON -> json(r, how, out);
            case CSV -> csv(r, how.csv(out));
            case TEXT -> text(r, how, out, false, how.colour());
            case MARKDOWN -> text(r, how, out, true, false);
            case HTML -> CheckHtml.render(r, how.header(), out);
        }
    }

    static String summary(StageCheck.Report r) {
        return r.results().size() + " stages checked in " + r.file() + ": " + r.count(Verdict.FAIL) + " failed, "
                + r.count(Verdict.WARN) + " warned, " + r.count(Verdict.PASS) + " passed";
    }

    private static void text(StageCheck.Report r, Rendering how, Writer out, boolean md, boolean colour)
            throws IOException {
        how.head(out, md);
        out.write(md ? "## " + Markdown.escape(summary(r)) + "\n\n" : summary(r) + "\n");
        out.write((md ? "- **Margins:** " + Markdown.escape(MatchJson.marginsLine(r.margins()))
                : Wrap.wrap("Margins: " + MatchJson.marginsLine(r.margins()), WIDTH, 4)) + "\n");
        for (String n : r.bomNotes()) {
            out.write((md ? "- **BOM:** " + Markdown.escape(n) : "BOM warning: " + n) + "\n");
        }
        out.write("\n");
        TextTable t = new TextTable(List.of("stage", "verdict", "score", "driver", "switch", "failing / warning rules"),
                false, false, true, false, false, false);
        if (colour) {
            t.paint(1, Ansi::paintByWord);
        }
        for (StageCheck.StageResult s : r.results()) {
            List<String> bad = new ArrayList<>();
            for (Check c : s.checks()) {
                if (c.verdict() != Verdict.PASS) {
                    bad.add(c.rule().id() + " " + c.verdict().id());
                }
            }
            t.add(List.of(s.stage(), symbol(s.verdict()), Eng.num(s.score()), ref(s.driverRef(), s.driver()),
                    ref(s.switchRef(), s.switchPart()), String.join(", ", bad)));
        }
        out.write(md ? t.markdown() : t.render(WIDTH));
        boolean any = false;
        for (StageCheck.StageResult s : r.results()) {
            List<String> lines = new ArrayList<>();
            for (Check c : s.checks()) {
                if (c.verdict() != Verdict.PASS) {
                    lines.add(c.verdict().id() + " " + c.rule().id() + ": " + c.message());
                }
            }
            lines.addAll(s.notes().stream().map(n -> "note: " + n).toList());
            if (s.point() != null) {
                for (String a : s.point().assumed()) {
                    lines.add("assumed: " + a);
                }
            }
            if (lines.isEmpty()) {
                continue;
            }
            if (!any) {
                out.write(md ? "\n### What to fix\n" : "\nWhat to fix, stage by stage:\n");
                any = true;
            }
            out.write(md ? "\n**" + Markdown.escape(s.stage()) + "** (line " + s.line() + ")\n\n"
                    : "\n" + s.stage() + " (line " + s.line() + ", " + s.verdict().id() + ")\n");
            for (String l : lines) {
                out.write(md ? "- " + Markdown.escape(l) + "\n" : "  " + Wrap.wrap(l, WIDTH, 6, 2) + "\n");
            }
        }
        out.write("\n" + (md ? "> " + Caution.TEXT : Wrap.wrap(Caution.TEXT, WIDTH, 0)) + "\n");
    }

    /** Verdicts as words and symbols, so they read without colour. */
    static String symbol(Verdict v) {
        return switch (v) {
            case PASS -> "✓ pass";
            case WARN -> "! warn";
            case UNKNOWN -> "? unknown";
            case FAIL -> "✗ FAIL";
        };
    }

    static String ref(String ref, String pn) {
        if (pn == null) {
            return ref + " (?)";
        }
        return ref.equalsIgnoreCase(pn) ? pn : ref + " " + pn;
    }

    private static void json(StageCheck.Report r, Rendering how, Writer out) throws IOException {
        try (JsonGenerator g = PartsReport.generator(out)) {
            g.writeStartObject();
            how.head(g);
            g.writeStringField("file", r.file());
            g.writeObjectFieldStart("summary");
            g.writeNumberField("stages", r.results().size());
            g.writeNumberField("failed", r.count(Verdict.FAIL));
            g.writeNumberField("warned", r.count(Verdict.WARN));
            g.writeNumberField("passed", r.count(Verdict.PASS));
            g.writeEndObject();
            MatchJson.margins(g, r.margins());
            g.writeArrayFieldStart("bom_notes");
            for (String n : r.bomNotes()) {
                g.writeString(n);
            }
            g.writeEndArray();
            g.writeArrayFieldStart("results");
            for (StageCheck.StageResult s : r.results()) {
                g.writeStartObject();
                g.writeStringField("stage", s.stage());
                g.writeNumberField("line", s.line());
                g.writeStringField("driver", s.driver() == null ? s.driverRef() : s.driver());
                g.writeStringField("switch", s.switchPart() == null ? s.switchRef() : s.switchPart());
                g.writeStringField("driver_ref", s.driverRef());
                g.writeStringField("switch_ref", s.switchRef());
                g.writeStringField("verdict", s.verdict().id());
                g.writeNumberField("score", MatchJson.round(s.score()));
                g.writeArrayFieldStart("checks");
                for (Check c : s.checks()) {
                    MatchJson.check(g, c);
                }
                g.writeEndArray();
                g.writeArrayFieldStart("figures");
                for (Figure f : s.figures()) {
                    MatchJson.figure(g, f);
                }
                g.writeEndArray();
                g.writeArrayFieldStart("notes");
                for (String n : s.notes()) {
                    g.writeString(n);
                }
                g.writeEndArray();
                if (s.point() != null) {
                    MatchJson.point(g, s.point());
                }
                g.writeEndObject();
            }
            g.writeEndArray();
            g.writeStringField("caution", Caution.TEXT);
            g.writeEndObject();
        }
        out.write('\n');
    }

    private static void csv(StageCheck.Report r, Csv out) throws IOException {
        out.row("stage", "line", "driver", "switch", "stage_verdict", "score", "rule", "verdict", "message");
        for (StageCheck.StageResult s : r.results()) {
            for (Check c : s.checks()) {
                out.row(s.stage(), s.line(), s.driver() == null ? s.driverRef() : s.driver(),
                        s.switchPart() == null ? s.switchRef() : s.switchPart(), s.verdict().id(),
                        MatchJson.round(s.score()), c.rule().id(), c.verdict().id(), c.message());
            }
        }
        out.flush();
    }

    /**
     * JUnit XML (the format CI servers read): one test suite, one test case per stage and rule.
     * A failing rule is a {@code <failure>}; an unknown one is {@code <skipped>}; a warning passes
     * with its message in {@code <system-out>}.
     */
    public static void junit(StageCheck.Report r, Writer out) throws IOException {
        junit(r, null, out);
    }

    /** The JUnit XML with the report header as the suite's {@code <properties>} (none when {@code header} is null). */
    public static void junit(StageCheck.Report r, ReportHeader header, Writer out) throws IOException {
        int tests = 0;
        int failures = 0;
        int skipped = 0;
        for (StageCheck.StageResult s : r.results()) {
            for (Check c : s.checks()) {
                tests++;
                if (c.verdict() == Verdict.FAIL) {
                    failures++;
                } else if (c.verdict() == Verdict.UNKNOWN) {
                    skipped++;
                }
            }
        }
        out.write("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n");
        out.write("<testsuites name=\"gatefit check\" tests=\"" + tests + "\" failures=\"" + failures + "\" errors=\"0\" skipped=\""
                + skipped + "\">\n");
        out.write("  <testsuite name=\"" + xml(r.file()) + "\" tests=\"" + tests + "\" failures=\"" + failures
                + "\" errors=\"0\" skipped=\"" + skipped + "\">\n");
        if (header != null) {
            out.write(header.junitProperties(CheckReports::xml, "    "));
        }
        for (StageCheck.StageResult s : r.results()) {
            for (Check c : s.checks()) {
                out.write("    <testcase classname=\"" + xml("stage." + s.stage()) + "\" name=\"" + xml(c.rule().id()) + "\">");
                String msg = c.message();
                switch (c.verdict()) {
                    case FAIL -> out.write("\n      <failure message=\"" + xml(msg) + "\" type=\"" + c.rule().id() + "\">"
                            + xml(s.stage() + ": " + ref(s.driverRef(), s.driver()) + " with " + ref(s.switchRef(), s.switchPart())
                            + " (line " + s.line() + ")\n" + msg) + "</failure>\n    ");
                    case UNKNOWN -> out.write("\n      <skipped message=\"" + xml(msg) + "\"/>\n    ");
                    case WARN -> out.write("\n      <system-out>" + xml("warn: " + msg) + "</system-out>\n    ");
                    case PASS -> {
                    }
                }
                out.write("</testcase>\n");
            }
        }
        out.write("  </testsuite>\n</testsuites>\n");
    }

    /** Escapes text for XML attributes and content (the same rules as HTML); drops characters XML 1.0 cannot hold. */
    static String xml(String s) {
        return Html.esc(s);
    }

}
