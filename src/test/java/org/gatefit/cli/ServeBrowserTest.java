package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import org.gatefit.report.Caution;
import org.gatefit.serve.Server;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;
import org.openqa.selenium.By;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.support.ui.WebDriverWait;

/**
 * {@code gatefit serve}'s pages in a real browser: Selenium driving Debian's {@code chromium} through
 * {@code chromium-driver} ({@code .ci/run} installs both). Without them the test fails in CI
 * ({@code CI=true}) unless {@code GATEFIT_SKIP_BROWSER=1}, and is skipped with the install command
 * elsewhere, as {@link HtmlBrowserTest}.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class ServeBrowserTest {
    static final Path CHROMIUM = Path.of("/usr/bin/chromium");
    static final Path DRIVER = Path.of("/usr/bin/chromedriver");
    static final String HOSTILE = "<script>window.pwned=1</script><img src=x onerror=\"window.pwned=2\"> switch";

    Path cat;
    Server server;
    WebDriver browser;
    boolean present;

    @BeforeAll
    void start(@TempDir Path tmp) throws Exception {
        present = Files.isExecutable(CHROMIUM) && Files.isExecutable(DRIVER);
        if (!present) {
            return;
        }
        cat = CliRun.examples(tmp.resolve("cat"));
        Path hostile = tmp.resolve("hostile.csv");
        Files.writeString(hostile, "part_number,maker,technology,channel,v_block_v,v_gs_max_v,v_gs_min_v,q_g_nc,description\n"
                + "XSS-1,Test <b>Maker</b>,si-mosfet,n,100,20,-20,30,\"" + HOSTILE.replace("\"", "\"\"") + "\"\n");
        assertEquals(ExitCode.OK, CliRun.on(cat, "import", "--kind", "switch", hostile.toString()).exit());
        server = Server.start(new Server.Settings("127.0.0.1", 0, cat, null, 1 << 20, Duration.ofSeconds(60), 4),
                new Answers(cat, CliRun.CLOCK));
    }

    @BeforeEach
    void needsBrowser() {
        if (!present) {
            String hint = "Chromium and its driver not found (" + CHROMIUM + ", " + DRIVER + "): install them with"
                    + " 'apt-get update && apt-get install -y chromium chromium-driver' (.ci/run does)";
            if ("true".equalsIgnoreCase(System.getenv("CI")) && !"1".equals(System.getenv(HtmlBrowserTest.SKIP))) {
                fail(hint + ", or set " + HtmlBrowserTest.SKIP + "=1 to skip this test");
            }
            Assumptions.abort(hint + "; browser test skipped outside CI");
        }
        ChromeOptions o = new ChromeOptions();
        o.setBinary(CHROMIUM.toFile());
        o.addArguments("--headless=new", "--no-sandbox", "--disable-gpu", "--disable-dev-shm-usage",
                "--disable-background-networking", "--no-first-run", "--disable-component-update", "--disable-sync",
                "--window-size=1400,1600");
        ChromeDriverService service = new ChromeDriverService.Builder().usingDriverExecutable(DRIVER.toFile())
                .usingAnyFreePort().build();
        browser = new ChromeDriver(service, o);
    }

    @AfterEach
    void quit() {
        if (browser != null) {
            browser.quit();
        }
    }

    @AfterAll
    void stop() throws Exception {
        if (server != null) {
            server.close();
        }
    }

    WebDriverWait waiting() {
        return new WebDriverWait(browser, Duration.ofSeconds(60));
    }

    /** The result table's text ("" while there is none); the pages replace it as answers come. */
    String tableText() {
        for (int attempt = 0; ; attempt++) {
            try {
                List<WebElement> t = browser.findElements(By.cssSelector("#out table"));
                return t.isEmpty() ? "" : t.get(0).getText();
            } catch (org.openqa.selenium.StaleElementReferenceException replaced) {
                if (attempt == 10) {
                    throw replaced;
                }
            }
        }
    }

    /** Every resource the page loaded came from the server, and the caution is on the page. */
    void onlyOwnOrigin() {
        String origin = server.url().replaceFirst("/$", "");
        @SuppressWarnings("unchecked")
        List<String> loaded = (List<String>) ((JavascriptExecutor) browser).executeScript(
                "return performance.getEntriesByType('resource').map(e => e.name)"
                        + ".concat(performance.getEntriesByType('navigation').map(e => e.name));");
        assertFalse(loaded.isEmpty());
        for (String u : loaded) {
            assertTrue(u.startsWith(origin + "/"), "requested outside the server: " + u);
        }
        assertTrue(browser.findElement(By.cssSelector(".caution")).getText().contains(Caution.TEXT.substring(0, 60)));
    }

    @Test
    void switchPageReranksWhenTheBusVoltageChanges() {
        browser.get(server.url() + "switch?switch=CVL-1025TL&side=high&freq=20&bus=30&all=true");
        browser.findElement(By.name("all")).click(); // show the failing drivers too
        waiting().until(d -> tableText().contains("fail"));
        String before = tableText();
        WebElement bus = browser.findElement(By.id("op-bus"));
        bus.clear();
        bus.sendKeys("95");
        waiting().until(d -> !tableText().isEmpty() && !tableText().equals(before));
        assertFalse(tableText().equals(before), "the ranking follows the bus voltage");
        assertTrue(tableText().contains("\u2716 fail"), "verdicts as symbol and word: " + tableText());
        onlyOwnOrigin();
    }

    @Test
    void pairPageShowsTheSheetWithItsPlots() {
        browser.get(server.url() + "pair?switch=QND-65G150D&driver=QND-D06L&driver=QND-D06H&freq=200&bus=375");
        waiting().until(d -> d.findElements(By.cssSelector("#sheets iframe")).size() == 2);
        assertTrue(browser.findElement(By.id("compare")).getText().contains("drive-current"));
        // Both drivers' gate waveforms overlaid: one uPlot per edge, each with both drivers in its legend.
        waiting().until(d -> d.findElements(By.cssSelector("#overlay .overlay-plot .uplot canvas")).size() == 2);
        for (WebElement plot : browser.findElements(By.cssSelector("#overlay .overlay-plot"))) {
            String legend = plot.findElement(By.cssSelector(".u-legend")).getText();
            assertTrue(legend.contains("QND-D06L") && legend.contains("QND-D06H"), legend);
        }
        // The gate-drive network of each pair on the page, as explain sizes it: a row per part, a
        // column per driver with the value as the sheet shows it and its rating.
        waiting().until(d -> !d.findElements(By.cssSelector("#network table.network")).isEmpty());
        WebElement net = browser.findElement(By.cssSelector("#network table.network"));
        String head = net.findElement(By.tagName("thead")).getText();
        assertTrue(head.contains("QND-D06L") && head.contains("QND-D06H"), head);
        for (String d : List.of("QND-D06L", "QND-D06H")) {
            CliRun e = CliRun.on(cat, "explain", "--driver", d, "--switch", "QND-65G150D", "--freq", "200", "--bus", "375",
                    "--format", "json");
            JsonNode parts;
            try {
                parts = new ObjectMapper().readTree(e.out()).get("network");
            } catch (java.io.IOException ex) {
                throw new AssertionError(e.dump(), ex);
            }
            assertTrue(parts.size() >= 3, e.out());
            int column = d.equals("QND-D06L") ? 1 : 2;
            for (JsonNode p : parts) {
                WebElement row = null;
                for (WebElement tr : net.findElements(By.cssSelector("tbody tr"))) {
                    if (tr.findElements(By.tagName("td")).get(0).getText().equals(p.get("role").asText())) {
                        row = tr;
                    }
                }
                assertTrue(row != null, "a row for " + p.get("role") + ": " + net.getText());
                String cell = row.findElements(By.tagName("td")).get(column).getText();
                assertTrue(cell.startsWith(p.get("value_text").asText()) && cell.contains("rating: " + p.get("rating")
                        .asText()), d + " " + p.get("role") + ": " + cell);
            }
            String box = browser.findElement(By.id("network")).getText();
            try {
                for (JsonNode note : new ObjectMapper().readTree(e.out()).get("network_left_out")) {
                    assertTrue(box.contains(d + ": left out \u2014 " + note.asText()), box);
                }
            } catch (java.io.IOException ex) {
                throw new AssertionError(e.dump(), ex);
            }
        }
        WebElement frame = browser.findElements(By.cssSelector("#sheets iframe")).get(0);
        browser.switchTo().frame(frame);
        waiting().until(d -> d.findElements(By.tagName("svg")).size() >= 3);
        assertTrue(browser.findElements(By.tagName("svg")).size() >= 3, "gate waveforms, step response, margins");
        browser.switchTo().defaultContent();
        onlyOwnOrigin();
    }

    @Test
    void designPageShowsTheFailingStage() throws Exception {
        Path stages = Project.file("examples/stages.csv");
        Path bom = Project.file("examples/bom.csv");
        CliRun c = CliRun.on(cat, "check", stages.toString(), "--bom", bom.toString(), "--format", "json");
        JsonNode report = new ObjectMapper().readTree(c.out());
        List<String> failing = new ArrayList<>();
        for (JsonNode s : report.get("results")) {
            if (s.get("verdict").asText().equals("fail")) {
                failing.add(s.get("stage").asText());
            }
        }
        assertFalse(failing.isEmpty(), "the example design has a failing stage");
        browser.get(server.url() + "design");
        browser.findElement(By.name("stages")).sendKeys(stages.toAbsolutePath().toString());
        browser.findElement(By.name("bom")).sendKeys(bom.toAbsolutePath().toString());
        browser.findElement(By.cssSelector("#q button")).click();
        waiting().until(d -> !tableText().isEmpty());
        for (WebElement row : browser.findElements(By.cssSelector("#out tbody tr"))) {
            String stage = row.findElements(By.tagName("td")).get(0).getText();
            assertEquals(failing.contains(stage), row.getText().contains("\u2716 fail"), stage + ": " + row.getText());
        }
        assertEquals(3, browser.findElements(By.cssSelector("#downloads button")).size(), "JSON, JUnit XML, HTML");
        // Each stage opens its pair's calculation sheet at the stage's operating point: the pair page
        // explains it with the stage's own verdict for a pair rule (PFC-B: drive-current fails there).
        String verdict = null;
        for (JsonNode s : report.get("results")) {
            if (s.get("stage").asText().equals("PFC-B")) {
                for (JsonNode ch : s.get("checks")) {
                    if (ch.get("rule").asText().equals("drive-current")) {
                        verdict = ch.get("verdict").asText();
                    }
                }
            }
        }
        assertEquals("fail", verdict, "the example's PFC-B fails drive-current (examples/README.md)");
        WebElement pfcB = null;
        for (WebElement row : browser.findElements(By.cssSelector("#out tbody tr"))) {
            if (row.findElements(By.tagName("td")).get(0).getText().equals("PFC-B")) {
                pfcB = row;
            }
        }
        assertTrue(pfcB != null, "a PFC-B row");
        String href = pfcB.findElement(By.linkText("calculation sheet")).getAttribute("href");
        assertTrue(href.contains("bridge=no") && href.contains("tj=125") && href.contains("edge=40"), href);
        browser.get(href);
        waiting().until(d -> browser.findElement(By.id("compare")).getText().contains("drive-current"));
        String compare = browser.findElement(By.id("compare")).getText();
        assertTrue(compare.contains("YSP-G65T75"), compare);
        String row = compare.lines().filter(l -> l.startsWith("drive-current")).findFirst().orElse("");
        assertTrue(row.contains("fail"), "the stage's drive-current verdict on its sheet: " + compare);
        onlyOwnOrigin();
    }

    /**
     * A stage of a bridge of unlike halves (GC-CLAMP, QND-65G300D, against GC-MAIN, QND-65G150D): its
     * link carries the partner's edge, so the pair page's sheet says check's own dv-dt sentence.
     */
    @Test
    void designPageOpensABridgeStageJudgedOnItsPartnersEdge() throws Exception {
        Path stages = Project.file("examples/stages.csv");
        Path bom = Project.file("examples/bom.csv");
        CliRun c = CliRun.on(cat, "check", stages.toString(), "--bom", bom.toString(), "--format", "json");
        String message = null;
        for (JsonNode s : new ObjectMapper().readTree(c.out()).get("results")) {
            if (s.get("stage").asText().equals("GC-CLAMP")) {
                for (JsonNode ch : s.get("checks")) {
                    if (ch.get("rule").asText().equals("dv-dt")) {
                        message = ch.get("message").asText();
                    }
                }
            }
        }
        assertTrue(message != null && message.contains("(GC-MAIN's turn-on)"), message);
        browser.get(server.url() + "design");
        browser.findElement(By.name("stages")).sendKeys(stages.toAbsolutePath().toString());
        browser.findElement(By.name("bom")).sendKeys(bom.toAbsolutePath().toString());
        browser.findElement(By.cssSelector("#q button")).click();
        waiting().until(d -> !tableText().isEmpty());
        WebElement clamp = null;
        for (WebElement r : browser.findElements(By.cssSelector("#out tbody tr"))) {
            if (r.findElements(By.tagName("td")).get(0).getText().equals("GC-CLAMP")) {
                clamp = r;
            }
        }
        assertTrue(clamp != null, "a GC-CLAMP row");
        assertTrue(clamp.getText().contains("calculation sheet (dv-dt on GC-MAIN\u2019s turn-on)"), clamp.getText());
        String href = clamp.findElement(By.linkText("calculation sheet")).getAttribute("href");
        assertTrue(href.contains("twin-edge=GC-MAIN"), href);
        assertFalse(href.contains("power-loop"), "a value check left unknown stays unsaid: " + href);
        browser.get(href);
        assertTrue(browser.findElement(By.id("twin-edge")).getAttribute("value").startsWith("GC-MAIN="),
                "the partner's edge in the form, to see and to clear");
        waiting().until(d -> d.findElements(By.cssSelector("#sheets iframe")).size() == 1);
        browser.switchTo().frame(browser.findElement(By.cssSelector("#sheets iframe")));
        String want = message;
        waiting().until(d -> d.findElement(By.tagName("body")).getText().contains(want));
        browser.switchTo().defaultContent();
        onlyOwnOrigin();
    }

    /**
     * A stage id with markup (a user's sheet is text too) names the partner's edge on the design page
     * and in the pair page's sheet: as text, no element made of it (the policy would stop its handler
     * from running, so the test looks for the element and the literal text).
     */
    @Test
    void aStageIdWithMarkupShowsAsTextOnTheDesignAndPairPages() throws Exception {
        String id = "<img src=x onerror=\"window.pwned=3\">HI";
        Path sheet = Files.createTempFile("stages", ".csv");
        Files.writeString(sheet, "stage,driver,switch,side,bus_v,f_sw_khz,v_drive_v,leg\n\"" + id.replace("\"", "\"\"")
                + "\",PGL-HB1046,CVL-1025TL,high,48,20,12,L1\nLO,PGL-HB1046,CVL-1045D8,low,48,20,12,L1\n");
        try {
            browser.get(server.url() + "design");
            browser.findElement(By.name("stages")).sendKeys(sheet.toAbsolutePath().toString());
            browser.findElement(By.cssSelector("#q button")).click();
            waiting().until(d -> tableText().contains("LO"));
            WebElement lo = null;
            for (WebElement r : browser.findElements(By.cssSelector("#out tbody tr"))) {
                if (r.findElements(By.tagName("td")).get(0).getText().equals("LO")) {
                    lo = r;
                }
            }
            assertTrue(lo != null, tableText());
            assertTrue(lo.getText().contains("(dv-dt on " + id + "\u2019s turn-on)"), lo.getText());
            assertTrue(tableText().contains(id), tableText());
            assertTrue(browser.findElements(By.cssSelector("#out img")).isEmpty(), "no element made of a stage id");
            browser.get(lo.findElement(By.linkText("calculation sheet")).getAttribute("href"));
            waiting().until(d -> d.findElements(By.cssSelector("#sheets iframe")).size() == 1);
            assertTrue(browser.findElements(By.cssSelector("main img")).isEmpty());
            browser.switchTo().frame(browser.findElement(By.cssSelector("#sheets iframe")));
            waiting().until(d -> d.findElement(By.tagName("body")).getText().contains("(" + id + "'s turn-on)"));
            assertTrue(browser.findElements(By.cssSelector("img[src=x]")).isEmpty(), "no element made of it in the sheet");
            browser.switchTo().defaultContent();
            assertEquals(Boolean.TRUE, ((JavascriptExecutor) browser).executeScript("return window.pwned === undefined;"));
            onlyOwnOrigin();
        } finally {
            Files.delete(sheet);
        }
    }

    @Test
    void catalogTextWithMarkupShowsAsText() {
        browser.get(server.url() + "part?kind=switch&part=XSS-1");
        waiting().until(d -> tableText().contains("XSS-1"));
        assertTrue(tableText().contains(HOSTILE), "the description shows as typed: " + tableText());
        assertTrue(tableText().contains("Test <b>Maker</b>"));
        Object pwned = ((JavascriptExecutor) browser).executeScript("return window.pwned === undefined;");
        assertEquals(Boolean.TRUE, pwned, "no catalog text ran as script");
        browser.get(server.url() + "?words=XSS");
        waiting().until(d -> tableText().contains("XSS-1"));
        assertTrue(tableText().contains(HOSTILE));
        assertEquals(Boolean.TRUE, ((JavascriptExecutor) browser).executeScript("return window.pwned === undefined;"));
        onlyOwnOrigin();

        // A partner's name with markup in the pair page's link: shown as text on the page and in its sheet.
        browser.get(server.url() + "pair?switch=QND-65G150D&driver=QND-D06L&freq=200&bus=375&twin-edge="
                + java.net.URLEncoder.encode(HOSTILE + "=100,90", java.nio.charset.StandardCharsets.UTF_8));
        waiting().until(d -> !d.findElements(By.cssSelector("#network table.network")).isEmpty());
        assertEquals(HOSTILE + "=100,90", browser.findElement(By.id("twin-edge")).getAttribute("value"));
        assertEquals(Boolean.TRUE, ((JavascriptExecutor) browser).executeScript("return window.pwned === undefined;"));
        browser.switchTo().frame(browser.findElement(By.cssSelector("#sheets iframe")));
        waiting().until(d -> d.findElement(By.tagName("body")).getText().contains(HOSTILE + "'s turn-on"));
        assertEquals(Boolean.TRUE, ((JavascriptExecutor) browser).executeScript("return window.pwned === undefined;"));
        browser.switchTo().defaultContent();
        onlyOwnOrigin();
    }
}
