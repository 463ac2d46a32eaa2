package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.TreeSet;
import java.util.function.Predicate;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code shortlist} filters, the switch's own status said once, and the deciding column, end to
 * end on the example catalog. Which drivers each filter must keep is read from the CSV cells here,
 * not from gatefit.
 */
class ShortlistFiltersCliTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final Path DRIVERS = Project.file("examples/drivers.csv");
    /** A SiC switch of the example catalog whose lifecycle is nrnd (input only). */
    private static final String NRND_SIC = "OBP-12M020K4";
    private static final String[] POINT = {"--freq", "10", "--bus", "800", "--drive", "18", "--drive-neg", "-4", "--edge", "200",
        "--rg", "2", "--rg-off", "1"};

    @TempDir
    Path tmp;
    Path catalog;

    @BeforeEach
    void importExamples() {
        catalog = CliRun.examples(tmp.resolve("catalog"));
    }

    private static List<CSVRecord> drivers() throws IOException {
        try (Reader in = Files.newBufferedReader(DRIVERS, StandardCharsets.UTF_8)) {
            return CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(in).getRecords();
        }
    }

    private CliRun shortlist(String... more) {
        List<String> a = new ArrayList<>(List.of("shortlist", "--switch", NRND_SIC));
        a.addAll(List.of(POINT));
        a.addAll(List.of(more));
        return CliRun.on(catalog, a.toArray(String[]::new));
    }

    /** The drivers listed by {@code shortlist --all} with the filter options, against the CSV rows meeting {@code keep}. */
    private void filterKeeps(Predicate<CSVRecord> keep, String said, String... options) throws IOException {
        List<String> a = new ArrayList<>(List.of(options));
        a.addAll(List.of("--all", "--top", "1000", "--format", "json"));
        CliRun r = shortlist(a.toArray(String[]::new));
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        JsonNode j = JSON.readTree(r.out());
        Set<String> got = new TreeSet<>();
        j.get("candidates").forEach(c -> got.add(c.get("driver").asText()));
        Set<String> want = new TreeSet<>();
        List<CSVRecord> all = drivers();
        for (CSVRecord d : all) {
            if (keep.test(d)) {
                want.add(d.get("part_number"));
            }
        }
        assertFalse(want.isEmpty(), "the example catalog has drivers for " + said);
        assertEquals(want, got, r.dump());
        assertEquals(all.size() - want.size(), j.get("filtered_out").asInt(), r.dump());
        assertTrue(j.get("asked").toString().contains(said), r.dump());
    }

    @Test
    void eachFilterKeepsExactlyTheDriversItNames() throws IOException {
        filterKeeps(d -> d.get("topology").equals("isolated"), "topology = isolated", "--topology", "isolated");
        filterKeeps(d -> !d.get("stock").isEmpty() && Long.parseLong(d.get("stock")) > 0, "stock > 0", "--in-stock");
        filterKeeps(d -> !d.get("unit_price").isEmpty() && Double.parseDouble(d.get("unit_price")) <= 1.0,
                "unit_price <= 1", "--max-price", "1.0");
        String maker = drivers().get(0).get("maker");
        filterKeeps(d -> d.get("maker").equalsIgnoreCase(maker), "maker = ", "--maker",
                maker.toUpperCase(Locale.ROOT));
        filterKeeps(d -> d.get("topology").equals("half-bridge") && !d.get("unit_price").isEmpty()
                && Double.parseDouble(d.get("unit_price")) <= 1.0, "topology = half-bridge", "--topology",
                "half-bridge", "--max-price", "1");
    }

    @Test
    void theFiltersArePrintedAsWhatWasAskedAndBadOnesAreRefused() {
        CliRun r = shortlist("--topology", "isolated", "--in-stock");
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        assertTrue(r.out().contains("Asked: topology = isolated, stock > 0 ("), r.dump());
        CliRun bad = shortlist("--topology", "floating");
        assertEquals(ExitCode.USAGE, bad.exit(), bad.dump());
        assertTrue(bad.err().contains("--topology: expected one of low-side, high-side, half-bridge, isolated"),
                bad.dump());
        CliRun price = shortlist("--max-price", "-1");
        assertEquals(ExitCode.USAGE, price.exit(), price.dump());
    }

    @Test
    void theSwitchsOwnStatusIsSaidOnceAndDoesNotTurnEveryDriverIntoAWarning() throws IOException {
        CliRun r = shortlist("--top", "40");
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        assertTrue(r.out().contains("Switch status: " + NRND_SIC + " is not recommended for new designs"), r.dump());
        assertEquals(1, r.out().split(NRND_SIC + " is not recommended", -1).length - 1, r.dump());
        JsonNode j = JSON.readTree(shortlist("--top", "40", "--format", "json").out());
        assertTrue(j.get("switch_status").asText().contains("not recommended"), j.toString());
        // An active, stocked driver passes its lifecycle check: the check is about the driver alone.
        boolean anyPass = false;
        for (JsonNode c : j.get("candidates")) {
            anyPass |= c.get("verdict").asText().equals("pass");
            for (JsonNode k : c.get("checks")) {
                if (k.get("rule").asText().equals("lifecycle")) {
                    assertFalse(k.get("message").asText().contains(NRND_SIC), c.toString());
                }
            }
        }
        assertTrue(anyPass, j.toString());
        // explain keeps both parts in the pair's lifecycle check.
        List<String> a = new ArrayList<>(List.of("explain", "--driver", j.get("candidates").get(0).get("driver")
                .asText(), "--switch", NRND_SIC));
        a.addAll(List.of(POINT));
        CliRun e = CliRun.on(catalog, a.toArray(String[]::new));
        assertTrue(e.out().contains("[warn]   lifecycle     " + NRND_SIC + " is not recommended"), e.dump());
    }

    @Test
    void theDecidingColumnNamesTheMostFundamentalFailure() throws IOException {
        // High side at 800 V: the low-side drivers cannot float (high-side fails), and the ones whose
        // rated peak current is far below Q_g/edge fail drive-current too; the deciding rule is high-side.
        CliRun r = shortlist("--side", "high", "--all", "--top", "100");
        JsonNode j = JSON.readTree(shortlist("--side", "high", "--all", "--top", "100", "--format", "json").out());
        int both = 0;
        for (JsonNode c : j.get("candidates")) {
            Set<String> failing = new TreeSet<>();
            c.get("checks").forEach(k -> {
                if (k.get("verdict").asText().equals("fail")) {
                    failing.add(k.get("rule").asText());
                }
            });
            if (failing.contains("high-side") && failing.size() > 1) {
                both++;
                String driver = c.get("driver").asText();
                String line = r.out().lines().filter(l -> l.matches("\\s*\\d+\\s+" + driver + "\\s.*")).findFirst()
                        .orElseThrow();
                assertTrue(line.endsWith("high-side fail"), line + " (fails " + failing + ")");
            }
        }
        assertTrue(both > 0, "some driver fails high-side and another rule\n" + r.dump());
    }
}
