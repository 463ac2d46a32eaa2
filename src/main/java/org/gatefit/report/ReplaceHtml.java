package org.gatefit.report;

import java.awt.Color;
import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import org.gatefit.match.Eng;
import org.gatefit.match.Replacement;
import org.gatefit.match.Verdict;

/** HTML page of {@code replace}: ranked substitutes, a comparison chart, the differences per candidate. */
final class ReplaceHtml {
    private static final List<String> ASSESSMENTS = List.of("better", "equal", "within-window", "re-verify", "worse");
    private static final List<Color> ASSESSMENT_COLOURS = List.of(new Color(0x1A7F37), new Color(0xB0B7C3),
            new Color(0x6FA8DC), new Color(0xD9730D), new Color(0xC62828));

    private ReplaceHtml() {
    }

    /** An assessment as a symbol and word. */
    static String assessment(String a) {
        String sym = switch (a) {
            case "better" -> "▲ ";
            case "worse" -> "▼ ";
            case "re-verify" -> "? ";
            case "equal" -> "= ";
            default -> "≈ ";
        };
        return Html.esc(sym + a);
    }

    static void render(Replacement.Result r, ReportHeader header, Writer out) throws IOException {
        Html.begin(out, "Substitutes for " + r.part(), header);
        out.write("<h1>Substitutes for " + Html.esc(r.kind().id()) + " " + Html.part(r.part()) + "</h1>\n");
        out.write("<p class=\"summary\">" + Html.withParts(ReplaceReports.head(r), r.part()) + "</p>\n");
        List<String[]> ctx = new ArrayList<>();
        String maker = r.original().text("maker");
        if (maker != null) {
            ctx.add(new String[] {"Maker", maker});
        }
        String desc = r.original().text("description");
        if (desc != null) {
            ctx.add(new String[] {"Description", desc});
        }
        ctx.add(new String[] {"Stages", r.stagesUsing().isEmpty() ? "no stage sheet given: pairings not re-checked (use --stages)"
                : "re-checked in stages " + String.join(", ", r.stagesUsing())});
        ctx.add(new String[] {"Margins", MatchJson.marginsLine(r.margins())});
        out.write(Html.context(ctx));
        if (!r.standing().isEmpty()) {
            out.write("<h2>With " + Html.part(r.part()) + " in place</h2>\n<p>Said once: each candidate below lists"
                    + " only what it changes.</p>\n<table class=\"stage-notes\">\n<thead><tr><th>stages</th>"
                    + "<th>check</th></tr></thead>\n<tbody>\n");
            for (java.util.Map.Entry<String, List<String>> e : ReplaceReports.standing(r).entrySet()) {
                out.write("<tr><td>" + Html.esc(String.join(", ", e.getValue())) + "</td><td>" + Html.esc(e.getKey())
                        + "</td></tr>\n");
            }
            out.write("</tbody>\n</table>\n");
        }
        if (r.candidates().isEmpty()) {
            out.write("<p>No substitute in the catalog meets the essential ratings.</p>\n");
            notOffered(r, out);
            Html.end(out);
            return;
        }
        out.write("<h2>Ranking</h2>\n<table class=\"ranking\">\n<thead><tr><th>#</th><th>part</th><th>grade</th>"
                + "<th>score</th><th>maker</th><th>pinout</th><th>lifecycle</th><th>stock</th><th>price</th>"
                + "<th>worse / re-verify</th><th>stage checks</th></tr></thead>\n<tbody>\n");
        int i = 1;
        for (Replacement.Candidate c : r.candidates()) {
            Verdict worst = Verdict.PASS;
            for (Replacement.StageOutcome o : c.stages()) {
                worst = worst.and(o.verdict());
            }
            out.write("<tr><td class=\"num\">" + i + "</td><td><a href=\"#cand-" + i + "\">" + Html.part(c.partNumber())
                    + "</a></td><td><span class=\"v v-grade\">" + Html.esc(c.grade().id()) + "</span></td><td class=\"num\">"
                    + Eng.num(c.score()) + "</td><td>" + Html.esc(c.maker()) + "</td><td>" + Html.esc(c.pinout())
                    + "</td><td>" + Html.esc(c.lifecycle()) + "</td><td class=\"num\">" + (c.stock() < 0 ? ""
                    : c.stock()) + "</td><td class=\"num\">" + (Double.isNaN(c.price()) ? "" : Eng.num(c.price()))
                    + "</td><td class=\"num\">" + ReplaceReports.count(c, "worse") + " / "
                    + ReplaceReports.count(c, "re-verify") + "</td><td>" + (r.stagesUsing().isEmpty() ? "<span class=\"muted\">"
                    + "not re-checked</span>" : Html.verdict(worst) + " " + changes(c)) + "</td></tr>\n");
            i++;
        }
        out.write("</tbody>\n</table>\n");
        List<Replacement.Candidate> top = r.candidates().subList(0, Math.min(10, r.candidates().size()));
        List<String> cats = new ArrayList<>();
        i = 1;
        for (Replacement.Candidate c : top) {
            cats.add(i++ + " " + c.partNumber());
        }
        double[][] counts = new double[ASSESSMENTS.size()][top.size()];
        for (int c = 0; c < top.size(); c++) {
            for (int a = 0; a < ASSESSMENTS.size(); a++) {
                counts[a][c] = ReplaceReports.count(top.get(c), ASSESSMENTS.get(a));
            }
        }
        out.write("<h2>Comparison of the top candidates</h2>\n");
        // No chart of the scores: it would only repeat the table's score column (issue 19).
        out.write(Html.figureHtml(Charts.stacked("Compared parameters by assessment", "parameters", cats, ASSESSMENTS,
                counts, ASSESSMENT_COLOURS), Html.withParts("How each candidate's parameters compare with " + r.part()
                + ": better, equal, within the window, to re-verify, worse.", r.part())));
        out.write("<h2>Differences per candidate</h2>\n");
        i = 1;
        for (Replacement.Candidate c : r.candidates()) {
            out.write("<section class=\"candidate\" id=\"cand-" + i + "\">\n<h3>" + i + ". " + Html.part(c.partNumber())
                    + " <span class=\"v v-grade\">" + Html.esc(c.grade().id()) + "</span></h3>\n");
            out.write("<table class=\"differences\">\n<thead><tr><th>parameter</th><th>" + Html.part(r.part())
                    + "</th><th>" + Html.part(c.partNumber()) + "</th><th>unit</th><th>assessment</th></tr></thead>\n<tbody>\n");
            for (Replacement.Difference d : c.differences()) {
                out.write("<tr><td>" + Html.esc(d.label()) + " <span class=\"muted\">" + Html.esc(d.parameter())
                        + "</span></td><td class=\"num\">" + Html.esc(d.original()) + "</td><td class=\"num\">"
                        + Html.esc(d.candidate()) + "</td><td>" + Html.esc(d.unit()) + "</td><td>"
                        + assessment(d.assessment()) + "</td></tr>\n");
            }
            out.write("</tbody>\n</table>\n");
            if (!c.stages().isEmpty()) {
                out.write("<table class=\"stage-results\">\n<thead><tr><th>stage</th><th>with " + Html.part(c.partNumber())
                        + "</th><th>with " + Html.part(r.part()) + "</th><th>against the original</th></tr></thead>\n<tbody>\n");
                for (Replacement.StageOutcome o : c.stages()) {
                    out.write("<tr><td>" + Html.esc(o.stage()) + "</td><td>" + Html.verdict(o.verdict()) + "</td><td>"
                            + Html.verdict(o.was()) + "</td><td>" + change(o.change()) + "</td></tr>\n");
                }
                out.write("</tbody>\n</table>\n");
            }
            if (!c.checks().isEmpty()) {
                out.write("<table class=\"stage-notes\">\n<thead><tr><th>stage</th><th>rule</th><th>verdict</th>"
                        + "<th>was</th><th>why</th></tr></thead>\n<tbody>\n");
                for (Replacement.StageNote n : c.checks()) {
                    out.write("<tr><td>" + Html.esc(n.stage()) + "</td><td>" + Html.esc(n.rule()) + "</td><td>"
                            + Html.verdict(n.verdict()) + "</td><td>" + Html.verdict(n.was()) + "</td><td>"
                            + Html.esc(n.message()) + "</td></tr>\n");
                }
                out.write("</tbody>\n</table>\n");
            }
            if (!c.reasons().isEmpty()) {
                out.write("<ul>\n");
                for (String reason : c.reasons()) {
                    out.write("<li>why " + Html.esc(c.grade().id()) + ": " + Html.esc(reason) + "</li>\n");
                }
                out.write("</ul>\n");
            }
            out.write("</section>\n");
            i++;
        }
        notOffered(r, out);
        Html.end(out);
    }

    /** A stage's change as a symbol and word. */
    static String change(Replacement.Change ch) {
        return Html.esc(switch (ch) {
            case BETTER -> "▲ better";
            case WORSE -> "▼ worse";
            case UNCHANGED -> "= unchanged";
        });
    }

    /** How many of the candidate's stages got better, stayed, got worse. */
    private static String changes(Replacement.Candidate c) {
        List<String> parts = new ArrayList<>();
        for (Replacement.Change ch : Replacement.Change.values()) {
            long n = ReplaceReports.changes(c, ch);
            if (n > 0) {
                parts.add(n + " " + ch.id());
            }
        }
        return "<span class=\"muted\">(" + Html.esc(String.join(", ", parts)) + ")</span>";
    }

    private static void notOffered(Replacement.Result r, Writer out) throws IOException {
        if (r.notOffered() == 0) {
            return;
        }
        if (!r.listed()) {
            out.write("<p class=\"muted\">" + r.notOffered() + " not offered; <code>--all</code> lists each with the"
                    + " reason.</p>\n");
            return;
        }
        out.write("<h2>Not offered</h2>\n<table class=\"not-offered\">\n<thead><tr><th>part</th><th>reason</th></tr>"
                + "</thead>\n<tbody>\n");
        for (Replacement.NotOffered n : r.notOfferedParts()) {
            out.write("<tr><td>" + Html.part(n.partNumber()) + "</td><td>" + Html.esc(n.reason()) + "</td></tr>\n");
        }
        out.write("</tbody>\n</table>\n");
    }
}
