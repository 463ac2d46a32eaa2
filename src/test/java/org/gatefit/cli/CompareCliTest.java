package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code explain --driver A --driver B …} (issue 19, compare): each column is what {@code explain}
 * says of that pair alone (checks and figures), the exit code is 1 when any pair fails, and the
 * HTML page overlays every driver's gate waveform in one chart per edge.
 */
class CompareCliTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    /** GC-MAIN of examples/stages.csv as options: QND-65G150D at 375 V, 200 kHz, 6 V drive. */
    private static final List<String> POINT = List.of("--switch", "QND-65G150D", "--freq", "200", "--bus", "375",
            "--edge", "10", "--drive", "6", "--rg", "10", "--rg-off", "0.5", "--loop", "3", "--v-oh", "4.6", "--v-ol", "0.2");
    private static final List<String> DRIVERS = List.of("QND-D06L", "VHM-4410N", "ISY-5710S");

    @TempDir
    Path tmp;
    Path catalog;

    @BeforeEach
    void importExamples() {
        catalog = CliRun.examples(tmp.resolve("catalog"));
    }

    private CliRun explain(List<String> drivers, String... more) {
        List<String> a = new ArrayList<>(List.of("explain"));
        drivers.forEach(d -> a.addAll(List.of("--driver", d)));
        a.addAll(POINT);
        a.addAll(List.of(more));
        return CliRun.on(catalog, a.toArray(String[]::new));
    }

    @Test
    void eachColumnIsWhatExplainSaysOfThatPairAlone() throws Exception {
        CliRun r = explain(DRIVERS, "--format", "json");
        // VHM-4410N and ISY-5710S need a supply above the 6 V drive (their minimum supply): they fail.
        assertEquals(ExitCode.FAILED, r.exit(), r.dump());
        JsonNode j = JSON.readTree(r.out());
        assertEquals(DRIVERS.size(), j.get("pairs").size());
        for (int i = 0; i < DRIVERS.size(); i++) {
            CliRun alone = explain(List.of(DRIVERS.get(i)), "--format", "json");
            JsonNode one = JSON.readTree(alone.out());
            JsonNode pair = j.get("pairs").get(i);
            assertEquals(DRIVERS.get(i), pair.get("driver").asText());
            for (String f : List.of("verdict", "score", "checks", "figures")) {
                assertEquals(one.get(f), pair.get(f), DRIVERS.get(i) + " " + f);
            }
            assertEquals(one.get("operating_point"), j.get("operating_point"));
        }

        CliRun text = explain(DRIVERS);
        assertEquals(ExitCode.FAILED, text.exit(), text.dump());
        assertTrue(text.out().contains("Drivers QND-D06L, VHM-4410N, ISY-5710S compared with switch QND-65G150D"),
                text.dump());
        assertTrue(Pattern.compile("\\ngate-voltage +pass +fail +fail *\\n").matcher(text.out()).find(), text.dump());
        assertTrue(text.out().contains("VHM-4410N gate-voltage fail: the 6 V supply is below this driver's"), text.dump());

        CliRun md = explain(DRIVERS, "--format", "markdown");
        assertTrue(md.out().contains("| gate-voltage | pass | fail | fail |"), md.dump());
    }

    @Test
    void onlyPassingPairsExitZero() {
        CliRun r = explain(List.of("QND-D06L"), "--format", "csv");
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        CliRun two = explain(List.of("QND-D06L", "VHM-4410N"), "--format", "csv");
        assertEquals(ExitCode.FAILED, two.exit(), two.dump());
        assertTrue(two.out().startsWith("section,name,QND-D06L,VHM-4410N\n"), two.dump());
        assertTrue(two.out().contains("\ncheck,gate-voltage,pass,fail\n"), two.dump());
    }

    @Test
    void theHtmlPageOverlaysEveryDriversWaveformInOneChartPerEdge() {
        CliRun r = explain(DRIVERS, "--format", "html");
        assertEquals(ExitCode.FAILED, r.exit(), r.dump());
        String html = r.out();
        for (String edge : List.of("Turn-on", "Turn-off")) {
            Matcher m = Pattern.compile("<figure>\\s*(<svg.*?</svg>)\\s*<figcaption>" + edge, Pattern.DOTALL)
                    .matcher(html);
            assertTrue(m.find(), edge + " chart missing");
            String svg = m.group(1);
            for (String d : DRIVERS) {
                assertTrue(svg.contains(d + " ("), edge + ": no line for " + d);
            }
        }
    }

    @Test
    void atMostFourDistinctDrivers() {
        CliRun five = explain(List.of("QND-D06L", "VHM-4410N", "ISY-5710S", "VHM-0605S", "CRW-GI5712"));
        assertEquals(ExitCode.USAGE, five.exit(), five.dump());
        assertTrue(five.err().contains("--driver: at most 4 drivers compared at once, got 5"), five.dump());
        CliRun twice = explain(List.of("QND-D06L", "qnd-d06l"));
        assertEquals(ExitCode.USAGE, twice.exit(), twice.dump());
        assertTrue(twice.err().contains("--driver qnd-d06l is named twice"), twice.dump());
    }
}
