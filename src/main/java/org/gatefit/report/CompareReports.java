package org.gatefit.report;

import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.gatefit.match.Check;
import org.gatefit.match.Eng;
import org.gatefit.match.Figure;
import org.gatefit.match.PairResult;
import org.gatefit.match.Rule;

/**
 * {@code explain} with two to four drivers for one switch at one operating point: the pairs side
 * by side, a column per driver (checks, then figures), and in HTML the gate waveforms overlaid.
 */
public final class CompareReports {
    private static final int WIDTH = 100;

    private CompareReports() {
    }

    /**
     * @param pairs  one per driver, in the order given, all for the same switch and operating point
     * @param drives the matching gate drives (for the HTML waveforms)
     */
    public static void render(List<PairResult> pairs, List<GateDrive> drives, Rendering how, Writer out)
            throws IOException {
        switch (how.format()) {
            case TEXT -> text(pairs, how, out, false);
            case MARKDOWN -> text(pairs, how, out, true);
            case JSON -> json(pairs, how, out);
            case CSV -> csv(pairs, how.csv(out));
            case HTML -> MatchHtml.compare(pairs, drives, how.header(), out);
        }
    }

    static String title(List<PairResult> pairs) {
        List<String> d = pairs.stream().map(PairResult::driver).toList();
        return "Drivers " + String.join(", ", d) + " compared with switch " + pairs.get(0).switchPart();
    }

    /** Rule ids in the order the first pair lists them, then any other pair's. */
    static List<Rule> rules(List<PairResult> pairs) {
        List<Rule> out = new ArrayList<>();
        for (PairResult p : pairs) {
            for (Check c : p.checks()) {
                if (!out.contains(c.rule())) {
                    out.add(c.rule());
                }
            }
        }
        return out;
    }

    /** Figure names in the order the first pair lists them, then any other pair's. */
    static List<String> figures(List<PairResult> pairs) {
        Map<String, Boolean> out = new LinkedHashMap<>();
        for (PairResult p : pairs) {
            for (Figure f : p.figures()) {
                out.putIfAbsent(f.name(), true);
            }
        }
        return List.copyOf(out.keySet());
    }

    static String verdict(PairResult p, Rule r) {
        return p.checks().stream().filter(c -> c.rule() == r).map(c -> c.verdict().id()).findFirst().orElse("");
    }

    static String value(PairResult p, String figure) {
        return p.figure(figure).map(f -> Eng.of(f.value(), f.unit().equals("1") ? "" : f.unit())).orElse("");
    }

    private static void text(List<PairResult> pairs, Rendering how, Writer out, boolean md) throws IOException {
        how.head(out, md);
        out.write(md ? "## " + Markdown.escape(title(pairs)) + "\n\n" : Wrap.wrap(title(pairs), WIDTH, 2) + "\n");
        for (String[] l : MatchHtml.context(pairs.get(0).point(), pairs.get(0).margins(), null)) {
            out.write(md ? "- **" + l[0] + ":** " + Markdown.escape(l[1]) + "\n" : Wrap.wrap(l[0] + ": " + l[1], WIDTH, 4)
                    + "\n");
        }
        List<String> head = new ArrayList<>(List.of(""));
        pairs.forEach(p -> head.add(p.driver()));
        boolean[] right = new boolean[head.size()];
        TextTable verdicts = new TextTable(head);
        List<String> row = new ArrayList<>(List.of("verdict"));
        pairs.forEach(p -> row.add(p.verdict().id()));
        verdicts.add(row);
        List<String> score = new ArrayList<>(List.of("score"));
        pairs.forEach(p -> score.add(Eng.num(p.score())));
        verdicts.add(score);
        for (Rule r : rules(pairs)) {
            List<String> l = new ArrayList<>(List.of(r.id()));
            pairs.forEach(p -> l.add(verdict(p, r)));
            verdicts.add(l);
        }
        out.write(md ? "\n### Checks\n\n" + verdicts.markdown() : "\nChecks\n" + verdicts.render(WIDTH));
        java.util.Arrays.fill(right, true);
        right[0] = false;
        TextTable figs = new TextTable(head, right);
        for (String f : figures(pairs)) {
            List<String> l = new ArrayList<>(List.of(f));
            pairs.forEach(p -> l.add(value(p, f)));
            figs.add(l);
        }
        out.write(md ? "\n### Figures\n\n" + figs.markdown() : "\nFigures\n" + figs.render(WIDTH));
        // What each check says, per driver, where it does not pass.
        List<String> notes = new ArrayList<>();
        for (PairResult p : pairs) {
            for (Check c : p.checks()) {
                if (c.verdict() != org.gatefit.match.Verdict.PASS) {
                    notes.add(p.driver() + " " + c.rule().id() + " " + c.verdict().id() + ": " + c.message());
                }
            }
        }
        if (!notes.isEmpty()) {
            out.write(md ? "\n### Not passing\n\n" : "\nNot passing\n");
            for (String n : notes) {
                out.write(md ? "- " + Markdown.escape(n) + "\n" : "  " + Wrap.wrap(n, WIDTH, 6, 2) + "\n");
            }
        }
        out.write("\n" + (md ? "> " + Caution.TEXT : Wrap.wrap(Caution.TEXT, WIDTH, 0)) + "\n");
    }

    private static void json(List<PairResult> pairs, Rendering how, Writer out) throws IOException {
        try (JsonGenerator g = PartsReport.generator(out)) {
            g.writeStartObject();
            how.head(g);
            g.writeStringField("switch", pairs.get(0).switchPart());
            g.writeArrayFieldStart("pairs");
            for (PairResult p : pairs) {
                g.writeStartObject();
                g.writeStringField("driver", p.driver());
                g.writeStringField("verdict", p.verdict().id());
                g.writeNumberField("score", MatchJson.round(p.score()));
                MatchJson.checks(g, p);
                MatchJson.figures(g, p);
                g.writeEndObject();
            }
            g.writeEndArray();
            MatchJson.point(g, pairs.get(0).point());
            MatchJson.margins(g, pairs.get(0).margins());
            g.writeStringField("caution", Caution.TEXT);
            g.writeEndObject();
        }
        out.write('\n');
    }

    private static void csv(List<PairResult> pairs, Csv out) throws IOException {
        List<Object> head = new ArrayList<>(List.of("section", "name"));
        pairs.forEach(p -> head.add(p.driver()));
        out.row(head);
        for (Rule r : rules(pairs)) {
            List<Object> l = new ArrayList<>(List.of("check", r.id()));
            pairs.forEach(p -> l.add(verdict(p, r)));
            out.row(l);
        }
        for (String f : figures(pairs)) {
            List<Object> l = new ArrayList<>(List.of("figure", f));
            pairs.forEach(p -> l.add(p.figure(f).map(x -> (Object) x.value()).orElse("")));
            out.row(l);
        }
        out.flush();
    }
}
