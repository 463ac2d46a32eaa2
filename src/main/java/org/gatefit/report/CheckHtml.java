package org.gatefit.report;

import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import org.gatefit.match.Check;
import org.gatefit.match.Eng;
import org.gatefit.match.StageCheck;
import org.gatefit.match.Verdict;

/** HTML page of {@code check}: summary, stage table, margins, and each stage's calculation sheet. */
final class CheckHtml {
    private CheckHtml() {
    }

    /** Anchor of a stage's sheet: by position, so any stage id makes a valid, unique fragment. */
    static String anchor(int index) {
        return "stage-" + (index + 1);
    }

    static void render(StageCheck.Report r, ReportHeader header, Writer out) throws IOException {
        Html.begin(out, "gatefit check: " + r.file(), header);
        out.write("<h1>Design check: " + Html.esc(r.file()) + "</h1>\n");
        out.write("<p class=\"summary\">" + r.results().size() + " stages: " + Html.verdict(Verdict.FAIL) + " "
                + r.count(Verdict.FAIL) + " failed, " + Html.verdict(Verdict.WARN) + " " + r.count(Verdict.WARN)
                + " warned, " + Html.verdict(Verdict.PASS) + " " + r.count(Verdict.PASS) + " passed</p>\n");
        List<String[]> ctx = new ArrayList<>();
        ctx.add(new String[] {"Summary", CheckReports.summary(r)});
        ctx.add(new String[] {"Margins", MatchJson.marginsLine(r.margins())});
        for (String n : r.bomNotes()) {
            ctx.add(new String[] {"BOM warning", n});
        }
        out.write(Html.context(ctx));

        out.write("<h2 id=\"stages\">Stages</h2>\n<table class=\"stages\">\n<thead><tr><th>stage</th><th>verdict</th><th>score</th>"
                + "<th>driver</th><th>switch</th><th>failing / warning rules</th></tr></thead>\n<tbody>\n");
        List<StageCheck.StageResult> rs = r.results();
        for (int i = 0; i < rs.size(); i++) {
            StageCheck.StageResult s = rs.get(i);
            List<String> bad = new ArrayList<>();
            for (Check c : s.checks()) {
                if (c.verdict() != Verdict.PASS) {
                    bad.add(c.rule().id() + " " + c.verdict().id());
                }
            }
            out.write("<tr><td><a href=\"#" + anchor(i) + "\">" + Html.esc(s.stage()) + "</a></td><td>"
                    + Html.verdict(s.verdict()) + "</td><td class=\"num\">" + Eng.num(s.score()) + "</td><td>"
                    + Html.withParts(CheckReports.ref(s.driverRef(), s.driver()), s.driver()) + "</td><td>"
                    + Html.withParts(CheckReports.ref(s.switchRef(), s.switchPart()), s.switchPart()) + "</td><td>"
                    + Html.esc(String.join(", ", bad)) + "</td></tr>\n");
        }
        out.write("</tbody>\n</table>\n");

        List<Charts.Bar> worst = new ArrayList<>();
        for (StageCheck.StageResult s : rs) {
            Check.Comparison tight = null;
            Check at = null;
            for (Check c : s.checks()) {
                Check.Comparison x = Html.tightest(c);
                if (x != null && (tight == null || Html.margin(x) < Html.margin(tight))) {
                    tight = x;
                    at = c;
                }
            }
            if (tight != null) {
                worst.add(new Charts.Bar(s.stage() + ": " + at.rule().id() + " (" + tight.quantity() + ")",
                        Html.margin(tight), s.verdict()));
            }
        }
        if (!worst.isEmpty()) {
            out.write("<h2>Tightest margin per stage</h2>\n");
            out.write(Html.figure(Charts.margins("Tightest margin of each stage", "margin against the limit"
                    + " (0 = at the limit)", worst), "Each bar is the stage's tightest comparison of any rule, as a"
                    + " fraction of its limit; colour follows the stage's verdict (the table says it in words)."));
        }

        for (int i = 0; i < rs.size(); i++) {
            StageCheck.StageResult s = rs.get(i);
            out.write("<section class=\"stage\" id=\"" + anchor(i) + "\">\n<h2>Stage " + Html.esc(s.stage()) + " "
                    + Html.verdict(s.verdict()) + "</h2>\n");
            List<String[]> lines = new ArrayList<>();
            lines.add(new String[] {"Line", Long.toString(s.line())});
            lines.add(new String[] {"Driver", CheckReports.ref(s.driverRef(), s.driver())});
            lines.add(new String[] {"Switch", CheckReports.ref(s.switchRef(), s.switchPart())});
            lines.add(new String[] {"Score", Eng.num(s.score())});
            if (s.point() != null) {
                lines.add(new String[] {"Operating point", MatchJson.pointLine(s.point())});
                for (String a : s.point().assumed()) {
                    lines.add(new String[] {"Assumed", a});
                }
            }
            for (String n : s.notes()) {
                lines.add(new String[] {"Note", n});
            }
            out.write(Html.context(lines, s.driver(), s.switchPart()));
            out.write("<h3>Checks</h3>\n" + Html.checks(s.checks()));
            out.write(Html.marginChart("Stage " + s.stage() + ": margins", s.checks()));
            if (!s.figures().isEmpty()) {
                out.write("<h3>Calculation</h3>\n" + Html.figures(s.figures()));
            }
            out.write("<p><a href=\"#stages\">back to the stage table</a></p>\n</section>\n");
        }
        Html.end(out);
    }
}
