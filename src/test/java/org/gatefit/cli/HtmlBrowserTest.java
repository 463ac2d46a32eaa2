package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Opens each HTML report in headless Chromium (Debian's {@code /usr/bin/chromium}; {@code .ci/run}
 * installs it): the rendered DOM holds the plots and tables, and a screenshot is not blank. Without
 * Chromium the test fails in CI ({@code CI=true}) unless {@code GATEFIT_SKIP_BROWSER=1} asks to
 * skip it, and is skipped with the install command elsewhere.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class HtmlBrowserTest {
    static final String SKIP = "GATEFIT_SKIP_BROWSER";

    Path tmp;
    HtmlFixture fx;
    Path chromium;

    @BeforeAll
    void setUp(@TempDir Path dir) throws IOException {
        tmp = dir;
        chromium = findChromium();
        if (chromium != null) {
            fx = new HtmlFixture(dir.resolve("reports"));
        }
    }

    /**
     * Without Chromium: each report's test fails in CI and is skipped (aborted, so reported as
     * skipped one by one) elsewhere, with the install command. Checked here rather than in
     * {@code @BeforeAll}, where an abort skips the class before any test exists and the run reports
     * none run and none skipped.
     */
    @BeforeEach
    void needsChromium() {
        if (chromium == null) {
            String hint = "headless Chromium not found (/usr/bin/chromium or 'chromium' on PATH): install it with"
                    + " 'apt-get update && apt-get install -y chromium' (.ci/run does)";
            // CI must render the pages; a developer's machine without Chromium skips, saying why.
            if ("true".equalsIgnoreCase(System.getenv("CI")) && !"1".equals(System.getenv(SKIP))) {
                fail(hint + ", or set " + SKIP + "=1 to skip this test");
            }
            Assumptions.abort(hint + "; browser test skipped outside CI");
        }
    }

    private static Path findChromium() {
        Path debian = Path.of("/usr/bin/chromium");
        if (Files.isExecutable(debian)) {
            return debian;
        }
        String path = System.getenv("PATH");
        if (path != null) {
            for (String d : path.split(java.io.File.pathSeparator)) {
                Path p = Path.of(d, "chromium");
                if (Files.isExecutable(p)) {
                    return p;
                }
            }
        }
        return null;
    }

    /** Runs headless Chromium on a file with a fresh profile; returns standard output. */
    private String browse(Path page, String name, String... extra) throws IOException, InterruptedException {
        Path profile = Files.createDirectories(tmp.resolve("profile-" + name));
        List<String> cmd = new ArrayList<>(List.of(chromium.toString(), "--headless", "--no-sandbox", "--disable-gpu",
                "--disable-background-networking", "--no-first-run", "--disable-component-update", "--disable-sync",
                "--disable-quic", "--hide-scrollbars", "--user-data-dir=" + profile));
        cmd.addAll(List.of(extra));
        cmd.add(page.toUri().toString());
        Path out = tmp.resolve(name + ".out");
        Path err = tmp.resolve(name + ".err");
        Process p = new ProcessBuilder(cmd).redirectOutput(out.toFile()).redirectError(err.toFile()).start();
        if (!p.waitFor(180, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            fail("Chromium did not finish on " + page + "; stderr:\n" + Files.readString(err));
        }
        assertEquals(0, p.exitValue(), "Chromium exit code; stderr:\n" + Files.readString(err));
        return Files.readString(out, StandardCharsets.UTF_8);
    }

    @ParameterizedTest
    @ValueSource(strings = {"explain", "shortlist", "check", "replace"})
    void reportRendersWithPlotsAndTablesFetchingNothing(String name) throws Exception {
        Path page = fx.reports.get(name);
        String source = fx.html(name);
        String dom = browse(page, name + "-dom", "--dump-dom");
        String lower = dom.toLowerCase(Locale.ROOT);
        int svgs = count(source, "<svg");
        assertTrue(svgs > 0, name + " has plots");
        assertEquals(svgs, count(dom, "<svg"), name + ": every plot is in the rendered page");
        assertTrue(count(dom, "<table") > 0, name + ": tables in the rendered page");
        assertTrue(dom.contains("default-src 'none'"), name + ": the page's CSP forbids every fetch");
        for (String banned : List.of("<script", "src=", "http://", "https://", "<link")) {
            assertFalse(lower.contains(banned), name + ": rendered page holds " + banned);
        }

        Path shot = tmp.resolve(name + ".png");
        browse(page, name + "-shot", "--screenshot=" + shot, "--window-size=1200,1600");
        assertTrue(Files.size(shot) > 0, "screenshot written");
        BufferedImage img = ImageIO.read(shot.toFile());
        assertEquals(1200, img.getWidth());
        Set<Integer> colours = new HashSet<>();
        long nonWhite = 0;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                int rgb = img.getRGB(x, y) & 0xFFFFFF;
                colours.add(rgb);
                if (rgb != 0xFFFFFF) {
                    nonWhite++;
                }
            }
        }
        double share = (double) nonWhite / ((long) img.getWidth() * img.getHeight());
        assertTrue(colours.size() > 100, name + ": screenshot has " + colours.size() + " colours");
        assertTrue(share > 0.02, name + ": screenshot is " + share + " non-white");
        Path keep = Path.of("target", "browser-screenshots");
        Files.createDirectories(keep);
        Files.copy(shot, keep.resolve(name + ".png"), java.nio.file.StandardCopyOption.REPLACE_EXISTING);
    }

    private static int count(String haystack, String needle) {
        int n = 0;
        for (int i = haystack.indexOf(needle); i >= 0; i = haystack.indexOf(needle, i + 1)) {
            n++;
        }
        return n;
    }
}
