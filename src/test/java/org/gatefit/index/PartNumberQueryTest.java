package org.gatefit.index;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;
import org.gatefit.catalog.Cells;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code find --where part_number = X} matches the parts whose part number lower-cased
 * ({@link String#toLowerCase} with {@link Locale#ROOT}) equals X lower-cased, the rule the
 * lower-cased keyword term of earlier index formats applied. Checked on part numbers where that
 * rule and upper-casing disagree (Java's case mappings from the Unicode Character Database: the
 * Kelvin sign U+212A lower-cases to {@code k} but upper-cases to itself; U+0130 lower-cases to
 * {@code i} plus U+0307), and with more {@code k}s than the query expands. Invented parts.
 */
class PartNumberQueryTest {
    private static final List<String> PARTS = List.of("TST-K1", "TST-\u212A1", "TST-\u01302", "TST-I\u03072", "TST-I3",
            "Tst-kK4", "\tTST-5", "TST-KKKKKKKKK6", "tst-\u212Akkkkkkkk6x", "TST-\u00DF7", "TST-SS8");
    private static final List<String> QUERIES = List.of("tst-k1", "TST-\u212A1", "tst-\u01302", "tst-i\u03072",
            "tst-i3", "TST-\u01313", "tst-kk4", "TST-\u212A\u212A4", "'\tTST-5", "TST-5", "tst-kkkkkkkkk6",
            "TST-KKKKKKKKK6X", "tst-\u00DF7", "TST-SS7", "tst-ss8", "TST-9");

    @TempDir
    Path tmp;

    @Test
    void matchesExactlyThePartsWhoseLowerCaseEqualsTheValuesLowerCase() throws Exception {
        StringBuilder csv = new StringBuilder("part_number,maker,technology,v_block_v,v_gs_max_v,v_gs_min_v,q_g_nc\n");
        for (String p : PARTS) {
            String cell = p.startsWith("\t") ? "'" + p : p;
            csv.append('"').append(cell).append("\",Testmaker,si-mosfet,100,20,-20,50\n");
        }
        Path f = Files.writeString(tmp.resolve("parts.csv"), csv.toString(), StandardCharsets.UTF_8);
        Path dir = tmp.resolve("catalog");
        new Importer(dir, Clock.systemUTC()).run(List.of(f), List.of("parts.csv"), new Importer.Options(null, false, null),
                n -> { });
        try (Catalog c = Catalog.open(dir)) {
            assertEquals(PARTS.size(), c.count(Kind.SWITCH), "every part number is its own part");
            for (String q : QUERIES) {
                String value = Cells.restoreText(q);
                Set<String> expected = PARTS.stream()
                        .filter(p -> p.toLowerCase(Locale.ROOT).equals(value.toLowerCase(Locale.ROOT)))
                        .collect(Collectors.toCollection(TreeSet::new));
                Set<String> notExpected = new TreeSet<>(PARTS);
                notExpected.removeAll(expected);
                for (Kind kind : new Kind[] {Kind.SWITCH, null}) {
                    assertEquals(expected, keys(PartSearch.find(c, kind, List.of(),
                            List.of(PartSearch.Condition.parse("part_number = " + q)), null, 100)), q);
                    assertEquals(notExpected, keys(PartSearch.find(c, kind, List.of(),
                            List.of(PartSearch.Condition.parse("part_number != " + q)), null, 100)), "!= " + q);
                }
            }
        }
    }

    private static Set<String> keys(List<Row> rows) {
        return rows.stream().map(Row::key).collect(Collectors.toCollection(TreeSet::new));
    }
}
