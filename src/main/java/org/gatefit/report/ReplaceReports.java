package org.gatefit.report;

import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import org.gatefit.match.Eng;
import org.gatefit.match.Replacement;
import org.gatefit.match.Verdict;

/** Renders {@code replace} results. */
public final class ReplaceReports {
    private static final int WIDTH = 100;

    private ReplaceReports() {
    }

    /** The substitutes for a part, rendered as {@code how} asks. */
    public static void render(Replacement.Result r, Rendering how, Writer out) throws IOException {
        switch (how.format()) {
            case JSON -> json(r, how, out);
            case CSV -> csv(r, how.csv(out));
            case TEXT -> text(r, how, out, false);
            case MARKDOWN -> text(r, how, out, true);
            case HTML -> ReplaceHtml.render(r, how.header(), out);
        }
    }

    static String head(Replacement.Result r) {
        String life = r.original().text("lifecycle");
        double stock = r.original().number("stock");
        return "Substitutes for " + r.kind() + " " + r.part() + " (" + r.original().text("pinout") + ", " + life
                + (Double.isNaN(stock) ? "" : ", stock " + (long) stock) + "): " + r.considered() + " compared, "
                + r.notOffered() + " not offered, " + r.candidates().size() + " listed";
    }

    private static void text(Replacement.Result r, Rendering how, Writer out, boolean md) throws IOException {
        how.head(out, md);
        out.write(md ? "## " + Markdown.escape(head(r)) + "\n\n" : Wrap.wrap(head(r), WIDTH, 2) + "\n");
        String stages = r.stagesUsing().isEmpty() ? "no stage sheet given: pairings not re-checked (use --stages)"
                : "re-checked in stages " + String.join(", ", r.stagesUsing());
        out.write(md ? "- " + Markdown.escape(stages) + "\n\n" : stages + "\n\n");
        if (!r.standing().isEmpty()) {
            String said = "With " + r.part() + " in place (said once; each candidate below lists only what it changes):";
            out.write(md ? Markdown.escape(said) + "\n\n" : Wrap.wrap(said, WIDTH, 2) + "\n");
            for (java.util.Map.Entry<String, List<String>> e : standing(r).entrySet()) {
                List<String> ids = e.getValue();
                String l = (ids.size() == 1 ? "stage " : "stages ") + String.join(", ", ids) + " " + e.getKey();
                out.write(md ? "- " + Markdown.escape(l) + "\n" : "  " + Wrap.wrap(l, WIDTH, 6, 2) + "\n");
            }
            out.write("\n");
        }
        if (r.candidates().isEmpty()) {
            out.write("No substitute in the catalog meets the essential ratings.\n");
        } else {
            TextTable t = new TextTable(List.of("#", "part", "grade", "score", "maker", "pinout", "lifecycle", "stock",
                    "price", "worse/re-verify"), true, false, false, true, false, false, false, true, true, false);
            int i = 1;
            for (Replacement.Candidate c : r.candidates()) {
                t.add(List.of(Integer.toString(i++), c.partNumber(), c.grade().id(), Eng.num(c.score()),
                        c.maker() == null ? "" : c.maker(), String.valueOf(c.pinout()), c.lifecycle(),
                        c.stock() < 0 ? "" : Long.toString(c.stock()), Double.isNaN(c.price()) ? "" : Eng.num(c.price()),
                        count(c, "worse") + "/" + count(c, "re-verify")));
            }
            out.write(md ? t.markdown() : t.render(WIDTH));
            out.write(md ? "\n### Differences\n" : "\nDifferences (equal parameters not shown):\n");
            i = 1;
            for (Replacement.Candidate c : r.candidates()) {
                List<String> lines = new ArrayList<>();
                for (Replacement.Difference d : c.differences()) {
                    if (!d.assessment().equals("equal")) {
                        lines.add(d.assessment() + ": " + d.label() + " " + d.original() + " → " + d.candidate()
                                + (d.unit().isEmpty() ? "" : " " + d.unit()));
                    }
                }
                for (Replacement.StageNote n : c.checks()) {
                    lines.add("stage " + n.stage() + " " + n.rule() + " " + n.verdict().id()
                            + (n.verdict() != n.was() ? " (was " + n.was().id() + ")" : "") + ": " + n.message());
                }
                if (!c.stages().isEmpty()) {
                    lines.add(stagesLine(c));
                }
                for (String reason : c.reasons()) {
                    lines.add("why " + c.grade().id() + ": " + reason);
                }
                out.write(md ? "\n**" + i + ". " + Markdown.escape(c.partNumber()) + "** (" + c.grade().id() + ")\n\n"
                        : "\n" + i + ". " + c.partNumber() + " (" + c.grade().id() + ")\n");
                if (lines.isEmpty()) {
                    lines.add("every compared parameter is equal");
                }
                for (String l : lines) {
                    out.write(md ? "- " + Markdown.escape(l) + "\n" : "   " + Wrap.wrap(l, WIDTH, 7, 3) + "\n");
                }
                i++;
            }
        }
        notOffered(r, out, md);
        out.write("\n" + (md ? "> " + Caution.TEXT : Wrap.wrap(Caution.TEXT, WIDTH, 0)) + "\n");
    }

    /**
     * The original's standing checks, the same sentence said once for every stage it applies to:
     * "rule verdict: message" → stage ids, in the order first met.
     */
    static java.util.Map<String, List<String>> standing(Replacement.Result r) {
        java.util.Map<String, List<String>> out = new java.util.LinkedHashMap<>();
        for (Replacement.StageNote n : r.standing()) {
            out.computeIfAbsent(n.rule() + " " + n.verdict().id() + ": " + n.message(), k -> new ArrayList<>())
                    .add(n.stage());
        }
        return out;
    }

    /** Each stage's result with the candidate against the original's, grouped: "stages: better A, B; unchanged C". */
    static String stagesLine(Replacement.Candidate c) {
        StringBuilder sb = new StringBuilder("stages against ");
        sb.append("the original:");
        String sep = " ";
        for (Replacement.Change ch : Replacement.Change.values()) {
            List<String> ids = new ArrayList<>();
            for (Replacement.StageOutcome o : c.stages()) {
                if (o.change() == ch) {
                    ids.add(o.stage() + (o.verdict() != o.was() ? " (" + o.was().id() + " → " + o.verdict().id() + ")"
                            : ""));
                }
            }
            if (!ids.isEmpty()) {
                sb.append(sep).append(ch.id()).append(' ').append(String.join(", ", ids));
                sep = "; ";
            }
        }
        return sb.toString();
    }

    /** The parts compared and not offered: each with the reason (--all), or how to list them. */
    private static void notOffered(Replacement.Result r, Writer out, boolean md) throws IOException {
        if (r.notOffered() == 0) {
            return;
        }
        if (!r.listed()) {
            String hint = "--all lists the " + r.notOffered() + " part" + (r.notOffered() == 1 ? "" : "s")
                    + " not offered, each with the reason.";
            out.write("\n" + (md ? Markdown.escape(hint) : hint) + "\n");
            return;
        }
        out.write(md ? "\n### Not offered\n\n" : "\nNot offered (" + r.notOfferedParts().size() + "):\n");
        for (Replacement.NotOffered n : r.notOfferedParts()) {
            out.write(md ? "- **" + Markdown.escape(n.partNumber()) + "**: " + Markdown.escape(n.reason()) + "\n"
                    : "  " + Wrap.wrap(n.partNumber() + ": " + n.reason(), WIDTH, 6, 2) + "\n");
        }
    }

    static int count(Replacement.Candidate c, String assessment) {
        return (int) c.differences().stream().filter(d -> d.assessment().equals(assessment)).count();
    }

    private static void json(Replacement.Result r, Rendering how, Writer out) throws IOException {
        try (JsonGenerator g = PartsReport.generator(out)) {
            g.writeStartObject();
            how.head(g);
            g.writeStringField("part", r.part());
            g.writeStringField("kind", r.kind().id());
            g.writeNumberField("considered", r.considered());
            g.writeNumberField("not_offered_count", r.notOffered());
            if (r.listed()) {
                g.writeArrayFieldStart("not_offered");
                for (Replacement.NotOffered n : r.notOfferedParts()) {
                    g.writeStartObject();
                    g.writeStringField("part_number", n.partNumber());
                    g.writeStringField("reason", n.reason());
                    g.writeEndObject();
                }
                g.writeEndArray();
            }
            g.writeArrayFieldStart("stages");
            for (String s : r.stagesUsing()) {
                g.writeString(s);
            }
            g.writeEndArray();
            g.writeArrayFieldStart("standing");
            for (Replacement.StageNote n : r.standing()) {
                g.writeStartObject();
                g.writeStringField("stage", n.stage());
                g.writeStringField("rule", n.rule());
                g.writeStringField("verdict", n.verdict().id());
                g.writeStringField("message", n.message());
                g.writeEndObject();
            }
            g.writeEndArray();
            MatchJson.margins(g, r.margins());
            g.writeArrayFieldStart("candidates");
            for (Replacement.Candidate c : r.candidates()) {
                g.writeStartObject();
                g.writeStringField("part_number", c.partNumber());
                g.writeStringField("grade", c.grade().id());
                g.writeNumberField("score", MatchJson.round(c.score()));
                g.writeStringField("maker", c.maker());
                g.writeStringField("pinout", c.pinout());
                g.writeStringField("lifecycle", c.lifecycle());
                if (c.stock() >= 0) {
                    g.writeNumberField("stock", c.stock());
                }
                MatchJson.number(g, "unit_price", c.price());
                g.writeArrayFieldStart("differences");
                for (Replacement.Difference d : c.differences()) {
                    g.writeStartObject();
                    g.writeStringField("parameter", d.parameter());
                    g.writeStringField("original", d.original());
                    g.writeStringField("candidate", d.candidate());
                    g.writeStringField("unit", d.unit());
                    g.writeStringField("assessment", d.assessment());
                    g.writeEndObject();
                }
                g.writeEndArray();
                g.writeArrayFieldStart("checks");
                for (Replacement.StageNote n : c.checks()) {
                    g.writeStartObject();
                    g.writeStringField("stage", n.stage());
                    g.writeStringField("rule", n.rule());
                    g.writeStringField("verdict", n.verdict().id());
                    g.writeStringField("was", n.was().id());
                    g.writeStringField("message", n.message());
                    g.writeEndObject();
                }
                g.writeEndArray();
                g.writeArrayFieldStart("stage_results");
                for (Replacement.StageOutcome o : c.stages()) {
                    g.writeStartObject();
                    g.writeStringField("stage", o.stage());
                    g.writeStringField("verdict", o.verdict().id());
                    g.writeStringField("was", o.was().id());
                    g.writeStringField("change", o.change().id());
                    g.writeEndObject();
                }
                g.writeEndArray();
                g.writeArrayFieldStart("reasons");
                for (String s : c.reasons()) {
                    g.writeString(s);
                }
                g.writeEndArray();
                g.writeEndObject();
            }
            g.writeEndArray();
            g.writeStringField("caution", Caution.TEXT);
            g.writeEndObject();
        }
        out.write('\n');
    }

    static long changes(Replacement.Candidate c, Replacement.Change ch) {
        return c.stages().stream().filter(o -> o.change() == ch).count();
    }

    private static void csv(Replacement.Result r, Csv out) throws IOException {
        out.row("rank", "part_number", "grade", "score", "pinout", "lifecycle", "stock", "unit_price", "worse",
                "re_verify", "stage_failures", "stages_worse", "stages_better");
        int i = 1;
        for (Replacement.Candidate c : r.candidates()) {
            long fails = c.checks().stream().filter(n -> n.verdict() == Verdict.FAIL).count();
            out.row(i++, c.partNumber(), c.grade().id(), MatchJson.round(c.score()), String.valueOf(c.pinout()),
                    c.lifecycle(), c.stock() < 0 ? "" : (Object) c.stock(), c.price(), count(c, "worse"),
                    count(c, "re-verify"), fails, changes(c, Replacement.Change.WORSE),
                    changes(c, Replacement.Change.BETTER));
        }
        out.flush();
    }
}
