package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class HtmlReportsTest {
    Path tmp;

    HtmlFixture fx;

    @BeforeAll
    void render(@TempDir Path dir) throws IOException {
        tmp = dir;
        fx = new HtmlFixture(dir);
    }

    private static String esc(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;")
                .replace("'", "&#39;");
    }

    private static int count(String haystack, String needle) {
        int n = 0;
        for (int i = haystack.indexOf(needle); i >= 0; i = haystack.indexOf(needle, i + 1)) {
            n++;
        }
        return n;
    }

    @ParameterizedTest
    @ValueSource(strings = {"explain", "shortlist", "check", "replace"})
    void everyReportIsOneSelfContainedPageWithPlotsTablesAndTheCaution(String name) throws IOException {
        String html = fx.html(name);
        assertTrue(html.startsWith("<!DOCTYPE html>"), name);
        assertTrue(html.contains("<meta http-equiv=\"Content-Security-Policy\" content=\"default-src 'none';"
                + " style-src 'unsafe-inline'; img-src data:\">"), name + " forbids every fetch");
        assertTrue(count(html, "<svg") >= 1, name + " has a plot");
        assertTrue(count(html, "<table") >= 1, name + " has a table");
        assertTrue(html.contains("@media print") && html.contains("@page"), name + " has a print layout");
        assertTrue(html.contains(esc(org.gatefit.report.Caution.TEXT)), name + " carries the caution");
        String lower = html.toLowerCase(Locale.ROOT);
        for (String banned : List.of("http://", "https://", "src=", "<script", "<link", "@import", "@font-face",
                "<iframe", "<object", "<img")) {
            assertFalse(lower.contains(banned), name + " must not contain " + banned);
        }
        Matcher url = Pattern.compile("url\\((?!#)").matcher(lower);
        assertFalse(url.find(), name + ": only in-page url(#id) references");
        // Every verdict badge says its word and symbol, not only a colour.
        Matcher badge = Pattern.compile("<span class=\"v v-(pass|warn|unknown|fail)\">([^<]*)</span>").matcher(html);
        int badges = 0;
        while (badge.find()) {
            badges++;
            String word = badge.group(1);
            assertTrue(badge.group(2).toLowerCase(Locale.ROOT).contains(word) && badge.group(2).length() > word.length() + 1,
                    name + ": badge " + badge.group());
        }
        assertTrue(badges > 0, name + " shows verdicts");
    }

    @Test
    void explainPlotsBothEdgesTheStepResponseWithTheRecommendedResistorAndTheMargins() throws IOException {
        String html = fx.html("explain");
        assertEquals(4, count(html, "<svg"), "margins, turn-on, turn-off, step response");
        assertTrue(html.contains("Turn-on: V_GS and I_G") && html.contains("Turn-off: V_GS and I_G"));
        assertTrue(html.contains("Miller plateau") && html.contains("V_th,min 1.1 V") && html.contains("plateau 3 V"));
        // TST-G650A on TST-D06A at 6 V, R_g 10 Ω / 0.5 Ω, 10 ns (REFERENCES §8; driver ×1.4 at 125 °C, from
        // memory): plateau current 3 V / (1.4 + 10 + 1.6) Ω = 231 mA against 1.5 × 0.6 nC / 10 ns = 90 mA;
        // plateau 0.6 nC / 231 mA = 2.6 ns. Resistor range: top 3 V / 90 mA − 1.4 − 1.6 = 30.3 Ω; the floor
        // is the dv-dt one (6.05 Ω, above damping's 0.7·2√(3 nH/125 pF) − 2.6 = 4.26 Ω); the recommended
        // value the E24 value nearest half the top (15.2 Ω → 15 Ω, IEC 60063).
        assertTrue(html.contains("gate-resistor-recommended 15 Ω"), "the recommended resistor's curve");
        assertTrue(html.contains("chosen R_g 10 Ω"), "the chosen resistor's curve");
        assertTrue(html.contains("<td>plateau-time-on</td><td class=\"num\">2.6 ns</td>"), "calculation table with units");
        assertTrue(html.contains("≈ estimate"), "estimate flags");
        assertTrue(html.contains("plateau current, turn-on: 231 mA ≥ 90 mA"), "value vs limit");
    }

    @Test
    void checkLinksEachStageRowToItsSheet() throws IOException {
        String html = fx.html("check");
        for (int i = 1; i <= 3; i++) {
            assertTrue(html.contains("<a href=\"#stage-" + i + "\">"), "row link " + i);
            assertTrue(html.contains("<section class=\"stage\" id=\"stage-" + i + "\">"), "sheet " + i);
        }
        assertTrue(html.contains("polarity fail"), "the inverting driver's stage fails on polarity");
        assertTrue(count(html, "<svg") >= 4, "overview and per-stage margin bars");
    }

    @Test
    void shortlistAndReplaceChartTheirTopCandidates() throws IOException {
        String shortlist = fx.html("shortlist");
        assertTrue(shortlist.contains("Margins against the limits, top 3"));
        for (String d : List.of("TST-D06A", "TST-D06B", "TST-D06C")) {
            assertTrue(shortlist.contains("<td><span class=\"pn\">" + d + "</span></td>"), d);
        }
        String replace = fx.html("replace");
        assertTrue(replace.contains("Compared parameters by assessment"));
        assertFalse(replace.contains("Score of each substitute"), "a chart that only repeats the table's score column");
        assertTrue(replace.contains("<table class=\"differences\">"));
        assertTrue(replace.contains("TST-G650C") && replace.contains("TST-G650B"));
    }

    @Test
    void hostileCatalogTextIsEscapedInEveryReport() throws IOException {
        for (String name : fx.reports.keySet()) {
            String html = fx.html(name);
            assertFalse(html.contains(HtmlFixture.SCRIPT), name + " has raw " + HtmlFixture.SCRIPT);
            assertFalse(html.contains(HtmlFixture.QUOTES), name + " has raw " + HtmlFixture.QUOTES);
            assertFalse(html.toLowerCase(Locale.ROOT).contains("<script"), name);
        }
        assertTrue(fx.html("explain").contains("by " + esc(HtmlFixture.QUOTES)), "switch maker in explain");
        assertTrue(fx.html("shortlist").contains("by " + esc(HtmlFixture.QUOTES)), "switch maker in shortlist");
        String check = fx.html("check");
        assertTrue(check.contains(">" + esc(HtmlFixture.SCRIPT) + "</a>"), "stage id in the check table");
        assertTrue(check.contains("Stage " + esc("S2 " + HtmlFixture.QUOTES)), "stage id in its sheet");
        String replace = fx.html("replace");
        assertTrue(replace.contains("<dd>" + esc("650 V GaN " + HtmlFixture.SCRIPT) + "</dd>"), "description");
        assertTrue(replace.contains("<td>" + esc("Testmaker " + HtmlFixture.SCRIPT) + "</td>"), "candidate maker");
    }

    @Test
    void withoutAnOutputFileThePageGoesToStandardOutput() throws IOException {
        String[] args = new String[4 + HtmlFixture.POINT.length + 2];
        String[] head = {"explain", "--driver", "TST-D06A", "--switch", "TST-G650A"};
        List<String> all = new java.util.ArrayList<>(List.of(head));
        all.addAll(List.of(HtmlFixture.POINT));
        all.addAll(List.of("--format", "html"));
        CliRun r = CliRun.on(fx.catalog, all.toArray(args));
        assertEquals(0, r.exit(), r.dump());
        assertTrue(r.out().startsWith("<!DOCTYPE html>") && r.out().strip().endsWith("</html>"), r.dump());
        assertEquals(count(fx.html("explain"), "<svg"), count(r.out(), "<svg"));
    }

    @ParameterizedTest
    @ValueSource(strings = {"find", "show", "info", "validate", "export"})
    void commandsWithoutAnHtmlReportRejectTheFormatAsAUsageError(String command) throws IOException {
        List<String> args = switch (command) {
            case "show" -> List.of("show", "TST-G650A");
            case "validate" -> List.of("validate", fx.stages.toString());
            case "export" -> List.of("export", "--kind", "switch");
            default -> List.of(command);
        };
        Path out = tmp.resolve(command + "-rejected.html");
        String[] all = new String[args.size() + 4];
        for (int i = 0; i < args.size(); i++) {
            all[i] = args.get(i);
        }
        all[args.size()] = "--format";
        all[args.size() + 1] = "html";
        all[args.size() + 2] = "--output";
        all[args.size() + 3] = out.toString();
        CliRun r = CliRun.on(fx.catalog, command.equals("export") ? new String[] {"export", "--kind", "switch",
            "--format", "html"} : all);
        assertEquals(2, r.exit(), r.dump());
        assertTrue(r.err().contains("--format html is not available for " + command), r.dump());
        assertTrue(r.err().contains("explain, shortlist, check, replace"), r.dump());
        assertFalse(Files.exists(out), "nothing written");
    }
}
