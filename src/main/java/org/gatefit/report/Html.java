package org.gatefit.report;

import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import org.gatefit.match.Check;
import org.gatefit.match.Eng;
import org.gatefit.match.Figure;
import org.gatefit.match.Verdict;

/**
 * Building blocks of the self-contained HTML reports: the page (inline CSS, a Content-Security-Policy
 * that forbids every fetch, print layout), escaping, verdict badges, check and figure tables, and
 * margin bars. Every piece of text from outside (catalog, stage sheet, BOM) goes through
 * {@link #esc}.
 */
final class Html {
    /** Nothing may be fetched: no scripts, fonts, images or styles from anywhere; inline CSS and data: images only. */
    static final String CSP = "default-src 'none'; style-src 'unsafe-inline'; img-src data:";

    private static final String CSS = """
            :root { color-scheme: light; }
            body { font-family: system-ui, -apple-system, "Segoe UI", Roboto, "DejaVu Sans", sans-serif; color: #1b1b1b;
              margin: 2rem auto; max-width: 960px; padding: 0 1rem; line-height: 1.45; }
            h1 { font-size: 1.5rem; margin-bottom: .25rem; } h2 { font-size: 1.2rem; margin-top: 2rem;
              border-bottom: 1px solid #ccc; padding-bottom: .2rem; } h3 { font-size: 1.05rem; margin-top: 1.5rem; }
            table { border-collapse: collapse; width: 100%; margin: .5rem 0 1rem; font-size: .9rem; }
            th, td { border-bottom: 1px solid #e2e2e2; padding: .3rem .5rem; text-align: left; vertical-align: top; }
            th { background: #f3f4f6; font-weight: 600; } td.num { text-align: right; font-variant-numeric: tabular-nums;
              white-space: nowrap; }
            .v { font-weight: 700; white-space: nowrap; padding: .05rem .4rem; border-radius: .25rem; border: 1px solid; }
            .v-pass { color: #1a7f37; background: #e9f7ee; } .v-warn { color: #8a4500; background: #fff3e0; }
            .v-unknown { color: #555; background: #f0f0f0; } .v-fail { color: #b71c1c; background: #fdecea; }
            .v-grade { color: #1f4e9a; background: #eaf1fb; }
            dl.ctx { display: grid; grid-template-columns: max-content minmax(0, 1fr); gap: .15rem 1rem; font-size: .9rem; }
            dl.ctx dt { font-weight: 600; } dl.ctx dd { margin: 0; overflow-wrap: anywhere; }
            header.report-head { color: #444; border-bottom: 1px solid #ccc; padding-bottom: .3rem; margin-bottom: 1rem; }
            header.report-head dl.ctx { font-size: .8rem; margin: 0; }
            code.hash { font-family: ui-monospace, "DejaVu Sans Mono", monospace; font-size: .95em; overflow-wrap: anywhere; }
            figure { margin: 1rem 0; } figure svg { width: 100%; height: auto; display: block; }
            figcaption { font-size: .85rem; color: #444; margin-top: .25rem; }
            .pn { white-space: nowrap; }
            .est { color: #8a4500; font-size: .8rem; } .note { color: #444; font-size: .9rem; }
            .caution { border: 2px solid #b71c1c; background: #fff8f7; padding: .6rem .8rem; margin: 1.5rem 0;
              font-weight: 600; }
            .summary { font-size: 1.05rem; } .muted { color: #666; }
            a { color: #1f4e9a; }
            @media screen and (max-width: 1000px) {
              table { font-size: .8rem; } th, td { padding: .25rem .3rem; }
            }
            @page { margin: 14mm 12mm; }
            @media print {
              body { margin: 0; max-width: none; font-size: 10pt; }
              h2 { break-after: avoid; } figure, tr, .caution { break-inside: avoid; }
              section.stage { break-before: page; } a { color: inherit; text-decoration: none; }
              th { background: #eee !important; -webkit-print-color-adjust: exact; print-color-adjust: exact; }
              .v { -webkit-print-color-adjust: exact; print-color-adjust: exact; }
            }
            """;

    private Html() {
    }

    /**
     * Escapes text for HTML element content and quoted attribute values (and XML's); drops every
     * character XML 1.0 forbids (§2.2 Char: controls other than tab and line feed, unpaired
     * surrogates, U+FFFE, U+FFFF) and carriage returns.
     */
    static String esc(String s) {
        if (s == null) {
            return "";
        }
        StringBuilder sb = new StringBuilder(s.length() + 16);
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '<' -> sb.append("&lt;");
                case '>' -> sb.append("&gt;");
                case '&' -> sb.append("&amp;");
                case '"' -> sb.append("&quot;");
                case '\'' -> sb.append("&#39;");
                case '\r' -> {
                }
                default -> i = keep(s, i, sb);
            }
        }
        return sb.toString();
    }

    /**
     * {@code s} without the characters XML 1.0 forbids, for markup made by a library (the charts'
     * SVG), which escapes markup but passes such characters through.
     */
    static String xmlChars(String s) {
        StringBuilder sb = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            i = keep(s, i, sb);
        }
        return sb.toString();
    }

    /**
     * Appends {@code s.charAt(i)} when XML 1.0 allows it (tab, line feed, carriage return,
     * U+0020–U+D7FF, U+E000–U+FFFD, a surrogate pair: U+10000–U+10FFFF); returns the index of the
     * last character used.
     */
    private static int keep(String s, int i, StringBuilder sb) {
        char c = s.charAt(i);
        if (c >= 0x20 && c < 0xD800 || c >= 0xE000 && c <= 0xFFFD || c == '\n' || c == '\t' || c == '\r') {
            sb.append(c);
        } else if (Character.isHighSurrogate(c) && i + 1 < s.length() && Character.isLowSurrogate(s.charAt(i + 1))) {
            sb.append(c).append(s.charAt(i + 1));
            return i + 1;
        }
        return i;
    }

    /**
     * A part number, escaped, in a {@code span.pn} that never breaks across lines (CSS
     * {@code white-space: nowrap}: a browser would otherwise break after any hyphen); the text is the
     * part number as written, so copying it gives the real one.
     */
    static String part(String partNumber) {
        return "<span class=\"pn\">" + esc(partNumber) + "</span>";
    }

    /** {@code text}, escaped, with each occurrence of the given part numbers as {@link #part}. */
    static String withParts(String text, String... partNumbers) {
        if (text == null) {
            return "";
        }
        StringBuilder sb = new StringBuilder();
        int from = 0;
        while (true) {
            int at = -1;
            String found = null;
            for (String pn : partNumbers) {
                int i = pn == null || pn.isEmpty() ? -1 : text.indexOf(pn, from);
                if (i >= 0 && (at < 0 || i < at || i == at && pn.length() > found.length())) {
                    at = i;
                    found = pn;
                }
            }
            if (found == null) {
                return sb.append(esc(text.substring(from))).toString();
            }
            sb.append(esc(text.substring(from, at))).append(part(found));
            from = at + found.length();
        }
    }

    /** The document head and the start of the body, with the report header when there is one. */
    static void begin(Writer out, String title, ReportHeader header) throws IOException {
        out.write("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n"
                + "<meta http-equiv=\"Content-Security-Policy\" content=\"" + CSP + "\">\n"
                + "<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n"
                + "<meta name=\"generator\" content=\"gatefit\">\n"
                + "<title>" + esc(title) + "</title>\n<style>\n" + CSS + "</style>\n</head>\n<body>\n"
                + (header == null ? "" : header.html()));
    }

    /** The caution and the end of the document. */
    static void end(Writer out) throws IOException {
        out.write("<p class=\"caution\" role=\"note\">" + esc(Caution.TEXT) + "</p>\n"
                + "<p class=\"muted\">Made by gatefit. Charts drawn with JFreeChart into SVG.</p>\n</body>\n</html>\n");
    }

    /** A verdict as colour, symbol and word, so it reads in grey print and without colour vision. */
    static String verdict(Verdict v) {
        return "<span class=\"v v-" + v.id() + "\">" + esc(CheckReports.symbol(v)) + "</span>";
    }

    /** A definition list of context lines (label, text), the given part numbers kept whole ({@link #part}). */
    static String context(List<String[]> lines, String... partNumbers) {
        StringBuilder sb = new StringBuilder("<dl class=\"ctx\">\n");
        for (String[] l : lines) {
            sb.append("<dt>").append(esc(l[0])).append("</dt><dd>").append(withParts(l[1], partNumbers)).append("</dd>\n");
        }
        return sb.append("</dl>\n").toString();
    }

    /** A figure with an inline chart and a caption. */
    static String figure(String svg, String caption) {
        return figureHtml(svg, esc(caption));
    }

    /** A figure with an inline chart and a caption already in HTML. */
    static String figureHtml(String svg, String captionHtml) {
        return "<figure>\n" + svg + "\n<figcaption>" + captionHtml + "</figcaption>\n</figure>\n";
    }

    /** The checks: rule, verdict (badge), what was compared, message. */
    static String checks(List<Check> checks) {
        StringBuilder sb = new StringBuilder("<table class=\"checks\">\n<thead><tr><th>rule</th><th>verdict</th>"
                + "<th>compared (value vs limit)</th><th>why</th></tr></thead>\n<tbody>\n");
        for (Check c : checks) {
            List<String> cmp = new ArrayList<>();
            for (Check.Comparison x : c.compared()) {
                cmp.add(esc(x.quantity() + ": " + Eng.of(x.value(), x.unit()) + " " + x.relation() + " "
                        + Eng.of(x.limit(), x.unit())));
            }
            sb.append("<tr><td>").append(esc(c.rule().id())).append("</td><td>").append(verdict(c.verdict()))
                    .append("</td><td>").append(String.join("<br>", cmp)).append("</td><td>").append(esc(c.message()))
                    .append("</td></tr>\n");
        }
        return sb.append("</tbody>\n</table>\n").toString();
    }

    /** The calculation table: figure, value with unit, formula, estimate flag. */
    static String figures(List<Figure> figures) {
        StringBuilder sb = new StringBuilder("<table class=\"figures\">\n<thead><tr><th>figure</th><th>value</th>"
                + "<th>how</th><th>estimate</th></tr></thead>\n<tbody>\n");
        for (Figure f : figures) {
            sb.append("<tr><td>").append(esc(f.name())).append("</td><td class=\"num\">")
                    .append(esc(Eng.of(f.value(), f.unit().equals("1") ? "" : f.unit()))).append("</td><td>")
                    .append(esc(f.label())).append("</td><td>")
                    .append(f.estimated() ? "<span class=\"est\">≈ estimate</span>" : "").append("</td></tr>\n");
        }
        return sb.append("</tbody>\n</table>\n").toString();
    }

    /**
     * How far a comparison sits inside its limit, as a fraction of the limit: (value − limit) / |limit|
     * for ≥, (limit − value) / |limit| for ≤ (|value| when the limit is 0); 0 at the limit, negative
     * beyond it; NaN when a side is unknown or the relation is not an inequality.
     */
    static double margin(Check.Comparison c) {
        double v = c.value();
        double l = c.limit();
        if (!Double.isFinite(v) || !Double.isFinite(l)) {
            return Double.NaN;
        }
        double scale = l != 0 ? Math.abs(l) : Math.abs(v) > 0 ? Math.abs(v) : 1;
        return switch (c.relation()) {
            case "≥", ">" -> (v - l) / scale;
            case "≤", "<" -> (l - v) / scale;
            default -> Double.NaN;
        };
    }

    /**
     * The tightest comparison a check's verdict rests on (smallest margin), or null when none has a
     * margin. A passing check's comparisons beyond their limit are advisory (the rule passed anyway,
     * its message says why) and are left out.
     */
    static Check.Comparison tightest(Check c) {
        Check.Comparison best = null;
        double m = Double.POSITIVE_INFINITY;
        for (Check.Comparison x : c.compared()) {
            double v = margin(x);
            if (!Double.isNaN(v) && v < m && !(c.verdict() == org.gatefit.match.Verdict.PASS && v < 0)) {
                m = v;
                best = x;
            }
        }
        return best;
    }

    /** One margin bar per rule that compared figures: its tightest comparison. */
    static List<Charts.Bar> marginBars(List<Check> checks) {
        List<Charts.Bar> bars = new ArrayList<>();
        for (Check c : checks) {
            Check.Comparison x = tightest(c);
            if (x != null) {
                bars.add(new Charts.Bar(c.rule().id() + ": " + x.quantity() + " " + Eng.of(x.value(), x.unit()) + " "
                        + x.relation() + " " + Eng.of(x.limit(), x.unit()), margin(x), c.verdict()));
            }
        }
        return bars;
    }

    /** The margin chart of a pair's checks, or a note when no rule compared figures. */
    static String marginChart(String title, List<Check> checks) {
        List<Charts.Bar> bars = marginBars(checks);
        if (bars.isEmpty()) {
            return "<p class=\"note\">No rule compared figures (parts missing or data unknown).</p>\n";
        }
        return figure(Charts.margins(title, "margin against the limit (0 = at the limit, 1 = 100 % to spare)", bars),
                "Each bar is a rule's tightest comparison: how far the value sits inside its limit, as a fraction of"
                        + " the limit. Bars left of the black line are beyond the limit. Colour follows the verdict;"
                        + " the tables say it in words.");
    }
}
