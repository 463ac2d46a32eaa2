package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.openqa.selenium.By;
import org.openqa.selenium.Dimension;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.Rectangle;
import org.openqa.selenium.TakesScreenshot;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;

/**
 * The HTML reports laid out by a real browser (Selenium driving headless Chromium, as
 * {@link ServeBrowserTest}): the report header is on the page, visible without scrolling, and names
 * the catalog's content hash and each input's; and nothing is wider than the page's content column
 * (the page never scrolls sideways, no element sticks out of the body), at a desktop width and at a
 * narrow one. Screenshots go to {@code target/browser-screenshots/}. Without Chromium it fails in CI
 * and is skipped elsewhere, as {@link HtmlBrowserTest}.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class HtmlLayoutBrowserTest {
    HtmlFixture fx;
    WebDriver browser;
    boolean present;

    /**
     * Elements whose border box passes the body's content box (1 px of rounding allowed); inside an
     * SVG chart only the {@code <svg>} itself counts (it is scaled to the column). Each as tag, class and
     * how far it sticks out.
     */
    private static final String OVERFLOWING = """
            const body = document.body;
            const cs = getComputedStyle(body);
            const box = body.getBoundingClientRect();
            const left = box.left + parseFloat(cs.paddingLeft), right = box.right - parseFloat(cs.paddingRight);
            const out = [];
            for (const el of body.querySelectorAll('*')) {
              const svg = el.closest('svg');
              if (svg && svg !== el) continue;
              const r = el.getBoundingClientRect();
              if (r.width === 0 && r.height === 0) continue;
              if (r.right > right + 1 || r.left < left - 1) {
                out.push(el.tagName.toLowerCase() + '.' + el.className + ' "' + (el.textContent || '').slice(0, 40)
                    + '" ' + Math.round(r.left) + '..' + Math.round(r.right) + ' outside ' + Math.round(left) + '..'
                    + Math.round(right));
              }
            }
            return out;""";

    @BeforeAll
    void start(@TempDir Path dir) throws Exception {
        present = Files.isExecutable(ServeBrowserTest.CHROMIUM) && Files.isExecutable(ServeBrowserTest.DRIVER);
        if (!present) {
            return;
        }
        fx = new HtmlFixture(dir.resolve("reports"));
        ChromeOptions o = new ChromeOptions();
        o.setBinary(ServeBrowserTest.CHROMIUM.toFile());
        o.addArguments("--headless=new", "--no-sandbox", "--disable-gpu", "--disable-dev-shm-usage",
                "--disable-background-networking", "--no-first-run", "--disable-component-update", "--disable-sync",
                "--hide-scrollbars", "--window-size=1200,1600");
        ChromeDriverService service = new ChromeDriverService.Builder()
                .usingDriverExecutable(ServeBrowserTest.DRIVER.toFile()).usingAnyFreePort().build();
        browser = new ChromeDriver(service, o);
    }

    @BeforeEach
    void needsBrowser() {
        if (!present) {
            String hint = "Chromium and its driver not found (" + ServeBrowserTest.CHROMIUM + ", "
                    + ServeBrowserTest.DRIVER + "): install them with 'apt-get update && apt-get install -y chromium"
                    + " chromium-driver' (.ci/run does)";
            if ("true".equalsIgnoreCase(System.getenv("CI")) && !"1".equals(System.getenv(HtmlBrowserTest.SKIP))) {
                fail(hint + ", or set " + HtmlBrowserTest.SKIP + "=1 to skip this test");
            }
            Assumptions.abort(hint + "; browser test skipped outside CI");
        }
    }

    @AfterAll
    void quit() {
        if (browser != null) {
            browser.quit();
        }
    }

    @ParameterizedTest
    @CsvSource({"compare, 1200", "compare, 800", "replace, 1200", "replace, 800", "explain, 1200", "check, 1200",
        "shortlist, 1200"})
    void theHeaderIsVisibleAndNothingIsWiderThanThePage(String report, int width) throws Exception {
        browser.manage().window().setSize(new Dimension(width, 1600));
        browser.get(fx.reports.get(report).toUri().toString());
        String source = fx.html(report);

        WebElement head = browser.findElement(By.id("report-head"));
        assertTrue(head.isDisplayed(), report + ": the header is displayed");
        Rectangle r = head.getRect();
        assertTrue(r.getWidth() > 200 && r.getHeight() > 20, report + ": the header has a size, " + r);
        long viewport = ((Number) js("return window.innerHeight;")).longValue();
        assertTrue(r.getY() + r.getHeight() <= viewport, report + ": the header is seen without scrolling, " + r);
        String text = head.getText();
        for (String want : List.of("Report", "Catalog", "content SHA-256", "gatefit")) {
            assertTrue(text.contains(want), report + ": the header says " + want + ":\n" + text);
        }
        java.util.regex.Matcher hash = java.util.regex.Pattern.compile("<code class=\"hash\">([0-9a-f]{64})</code>")
                .matcher(source);
        assertTrue(hash.find(), report + ": the catalog hash in the source");
        for (WebElement code : head.findElements(By.cssSelector("code.hash"))) {
            assertTrue(code.isDisplayed(), report + ": hash shown");
            assertTrue(code.getText().replaceAll("\\s", "").matches("[0-9a-f]{64}"), report + ": " + code.getText());
        }
        if (report.equals("replace")) {
            assertTrue(text.contains("Stage sheet") && text.contains(fx.stages.getFileName().toString()),
                    report + ": the stage sheet in the header:\n" + text);
            assertEquals(2, head.findElements(By.cssSelector("code.hash")).size(), report + ": catalog and stage sheet");
        }

        List<?> out = (List<?>) js(OVERFLOWING);
        assertTrue(out.isEmpty(), report + " at " + width + " px: wider than the content column:\n"
                + String.join("\n", out.stream().map(Object::toString).toList()));

        Map<?, ?> widths = (Map<?, ?>) js("return {page: document.documentElement.scrollWidth, view:"
                + " document.documentElement.clientWidth, body: document.body.scrollWidth, bodyBox:"
                + " document.body.clientWidth};");
        assertTrue(((Number) widths.get("page")).longValue() <= ((Number) widths.get("view")).longValue(),
                report + " at " + width + " px: the page scrolls sideways " + widths);
        assertTrue(((Number) widths.get("body")).longValue() <= ((Number) widths.get("bodyBox")).longValue(),
                report + " at " + width + " px: the content is wider than its column " + widths);
        Path keep = Path.of("target", "browser-screenshots");
        Files.createDirectories(keep);
        Files.write(keep.resolve(report + "-" + width + ".png"), ((TakesScreenshot) browser).getScreenshotAs(OutputType.BYTES));
    }

    /** Invented long part numbers (no such parts exist), with hyphens a browser may break after. */
    static final String LONG_SWITCH = "QZX-9999-ABCD-LONGNAME-01";
    static final String LONG_SWITCH_2 = "QZX-9999-ABCD-LONGNAME-02";
    static final String LONG_DRIVER = "QZX-9999-ABCD-LONGNAME-D1";

    /**
     * Each occurrence of a long part number outside the charts, as the number of line boxes its text
     * takes ({@code Range.getClientRects}: one rectangle per line it spans), where it stands, and the
     * height of its one line against the line height of its element.
     */
    private static final String PART_LINES = """
            const re = /QZX-9999-ABCD-LONGNAME-[0-9A-Z]+/g;
            const out = [];
            const walk = document.createTreeWalker(document.body, NodeFilter.SHOW_TEXT);
            for (let n; (n = walk.nextNode());) {
              if (n.parentElement.closest('svg')) continue;
              for (const m of n.data.matchAll(re)) {
                const range = document.createRange();
                range.setStart(n, m.index);
                range.setEnd(n, m.index + m[0].length);
                const rects = range.getClientRects();
                out.push(rects.length + ' ' + n.parentElement.closest('td,th,h1,h2,h3,li,p,dd,figcaption,a,span')
                    .tagName.toLowerCase() + ' ' + m[0]);
              }
            }
            return out;""";

    /**
     * Part numbers never break across lines: in a phone-wide window (360 px) the shortlist and replace
     * reports of parts with long, hyphenated invented numbers show every one of them on one line — in
     * the headings, the summary, the tables and the lists.
     */
    @ParameterizedTest
    @CsvSource({"shortlist, 360", "replace, 360", "shortlist, 800", "replace, 800"})
    void longPartNumbersStayOnOneLine(String report, int width) throws Exception {
        Path dir = fx.dir.resolve("long");
        if (!Files.exists(dir.resolve("replace.html"))) {
            Files.createDirectories(dir);
            for (String f : List.of("switches.csv", "drivers.csv", "stages.csv")) {
                Files.writeString(dir.resolve(f), Files.readString(fx.dir.resolve(f)).replace("TST-G650A", LONG_SWITCH)
                        .replace("TST-G650B", LONG_SWITCH_2).replace("TST-D06A", LONG_DRIVER));
            }
            Path cat = dir.resolve("catalog");
            CliRun imp = CliRun.on(cat, "import", dir.resolve("switches.csv").toString(),
                    dir.resolve("drivers.csv").toString());
            assertEquals(0, imp.exit(), imp.dump());
            List<String> shortlist = new java.util.ArrayList<>(List.of("shortlist", "--switch", LONG_SWITCH, "--all",
                    "--format", "html", "--output", dir.resolve("shortlist.html").toString()));
            shortlist.addAll(List.of(HtmlFixture.POINT));
            CliRun s = CliRun.on(cat, shortlist.toArray(String[]::new));
            assertEquals(0, s.exit(), s.dump());
            CliRun r = CliRun.on(cat, "replace", LONG_SWITCH, "--stages", dir.resolve("stages.csv").toString(),
                    "--format", "html", "--output", dir.resolve("replace.html").toString());
            assertEquals(0, r.exit(), r.dump());
        }
        browser.manage().window().setSize(new Dimension(width, 1600));
        browser.get(dir.resolve(report + ".html").toUri().toString());
        List<String> found = ((List<?>) js(PART_LINES)).stream().map(Object::toString).toList();
        // The switch in the heading and summary; the driver (shortlist) or the substitute (replace) in the table.
        String other = report.equals("shortlist") ? LONG_DRIVER : LONG_SWITCH_2;
        assertTrue(found.stream().anyMatch(f -> f.endsWith(LONG_SWITCH)) && found.stream().anyMatch(f -> f.endsWith(other)),
                report + ": the long part numbers are on the page: " + found);
        List<String> broken = found.stream().filter(f -> !f.startsWith("1 ")).toList();
        assertTrue(broken.isEmpty(), report + " at " + width + " px: part numbers broken across lines (lines, element,"
                + " part):\n" + String.join("\n", broken));
        Path keep = Path.of("target", "browser-screenshots");
        Files.createDirectories(keep);
        Files.write(keep.resolve(report + "-long-parts-" + width + ".png"),
                ((TakesScreenshot) browser).getScreenshotAs(OutputType.BYTES));
    }

    /**
     * The charts as laid out: per {@code <svg>}, its name, its texts (box, whether rotated, text), its
     * bars (filled rectangles other than the white backgrounds, which are the two largest) and the plot
     * area (the second white rectangle), all in page pixels.
     */
    private static final String CHART_LAYOUT = """
            const box = e => { const r = e.getBoundingClientRect(); return [r.left, r.top, r.right, r.bottom]; };
            const out = [];
            for (const svg of document.querySelectorAll('svg')) {
              const rects = [...svg.querySelectorAll('rect')];
              const white = rects.filter(r => /fill:\\s*rgb\\(255,\\s*255,\\s*255\\)/.test(r.getAttribute('style') || ''));
              const bars = rects.filter(r => !white.includes(r) && r.getAttribute('style')
                  && /fill:\\s*rgb\\(/.test(r.getAttribute('style')) && !/fill-opacity:\\s*0\\./.test(r.getAttribute('style')))
                  .map(box);
              const texts = [...svg.querySelectorAll('text')].filter(t => t.textContent.trim() !== '')
                  .map(t => ({box: box(t), rotated: !!t.getAttribute('transform') && /matrix|rotate/.test(t.getAttribute('transform'))
                      && !/matrix\\(1,0,0,1/.test(t.getAttribute('transform').replace(/\\s/g, '')), text: t.textContent}));
              out.push({name: svg.getAttribute('aria-label'), plot: white.length > 1 ? box(white[1]) : null, bars, texts});
            }
            return out;""";

    private static double[] rect(Object o) {
        List<?> l = (List<?>) o;
        return new double[] {((Number) l.get(0)).doubleValue(), ((Number) l.get(1)).doubleValue(),
            ((Number) l.get(2)).doubleValue(), ((Number) l.get(3)).doubleValue()};
    }

    private static boolean overlap(double[] a, double[] b) {
        double tol = 0.5;
        return a[0] < b[2] - tol && b[0] < a[2] - tol && a[1] < b[3] - tol && b[1] < a[3] - tol;
    }

    /**
     * The charts of every report, as the browser draws them: no two labels overlap and no label lies
     * on a bar (nothing hidden under another bar); in the horizontal margin charts each value stands
     * level with its own bar's label, the bar labels end at one edge beside the axis (the browser's
     * font need not be Java's, which laid them out), and the axis is fitted to the bars (the longest
     * takes at least 45 % of the plot's width, not a fixed −1 … 3).
     */
    @ParameterizedTest
    @CsvSource({"explain", "check", "shortlist", "replace", "compare"})
    void chartLabelsSitWithTheirBarsAndNeverOverlap(String report) throws Exception {
        browser.manage().window().setSize(new Dimension(1200, 1600));
        browser.get(fx.reports.get(report).toUri().toString());
        List<String> problems = new java.util.ArrayList<>();
        int margins = 0;
        for (Object o : (List<?>) js(CHART_LAYOUT)) {
            Map<?, ?> chart = (Map<?, ?>) o;
            String name = (String) chart.get("name");
            List<Map<?, ?>> texts = ((List<?>) chart.get("texts")).stream().<Map<?, ?>>map(t -> (Map<?, ?>) t).toList();
            List<double[]> bars = ((List<?>) chart.get("bars")).stream().map(HtmlLayoutBrowserTest::rect).toList();
            boolean barChart = name.contains("argin") || name.startsWith("Score") || name.startsWith("Compared");
            for (int i = 0; i < texts.size(); i++) {
                double[] a = rect(texts.get(i).get("box"));
                for (int j = i + 1; j < texts.size(); j++) {
                    if (Boolean.TRUE.equals(texts.get(i).get("rotated")) || Boolean.TRUE.equals(texts.get(j).get("rotated"))) {
                        continue; // parallel slanted labels: their upright boxes overlap while the text does not
                    }
                    if (overlap(a, rect(texts.get(j).get("box")))) {
                        problems.add(name + ": '" + texts.get(i).get("text") + "' overlaps '" + texts.get(j).get("text") + "'");
                    }
                }
                if (barChart) {
                    for (double[] b : bars) {
                        if (overlap(a, b)) {
                            problems.add(name + ": '" + texts.get(i).get("text") + "' lies on a bar");
                        }
                    }
                }
            }
            if (!name.contains("argin") || chart.get("plot") == null || name.startsWith("Margins against")) {
                continue; // the horizontal margin charts (explain, check) below
            }
            margins++;
            double[] plot = rect(chart.get("plot"));
            List<double[]> cats = texts.stream().map(t -> rect(t.get("box")))
                    .filter(b -> b[2] <= plot[0] + 1 && b[1] >= plot[1] - 1).toList();
            List<Map<?, ?>> values = texts.stream().filter(t -> {
                double[] b = rect(t.get("box"));
                return b[0] >= plot[0] - 1 && b[1] >= plot[1] + 1 && b[3] <= plot[3] + 1;
            }).toList();
            if (cats.isEmpty() || values.isEmpty()) {
                problems.add(name + ": no bar labels or values found");
                continue;
            }
            double right = cats.stream().mapToDouble(b -> b[2]).max().orElseThrow();
            double left = cats.stream().mapToDouble(b -> b[2]).min().orElseThrow();
            if (right - left > 2) {
                problems.add(name + ": bar labels end between " + Math.round(left) + " and " + Math.round(right) + " px");
            }
            for (Map<?, ?> v : values) {
                double[] b = rect(v.get("box"));
                double mid = (b[1] + b[3]) / 2;
                if (cats.stream().noneMatch(c -> Math.abs((c[1] + c[3]) / 2 - mid) <= 2)) {
                    problems.add(name + ": value '" + v.get("text") + "' is not level with any bar's label");
                }
            }
            double longest = bars.stream().mapToDouble(b -> b[2] - b[0]).max().orElse(0);
            if (longest < 0.45 * (plot[2] - plot[0])) {
                problems.add(name + ": the longest bar takes " + Math.round(100 * longest / (plot[2] - plot[0]))
                        + " % of the plot's width: the axis is not fitted to the bars");
            }
        }
        if (report.equals("explain") || report.equals("check")) {
            assertTrue(margins > 0, report + ": a margin chart was checked");
        }
        assertTrue(problems.isEmpty(), report + ":\n" + String.join("\n", problems));
    }

    private Object js(String script) {
        return ((JavascriptExecutor) browser).executeScript(script);
    }
}
