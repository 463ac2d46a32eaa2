package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.Reader;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.apache.commons.csv.CSVRecord;
import org.gatefit.catalog.Column;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Schema;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Extreme values through the whole command line (issue: values the schema accepts crashed the
 * engines with "internal error"). Each numeric column of a switch, a driver and a stage gets a
 * value at the edge of what the schema admits — zero where allowed, a subnormal, 1e308, −1e308 —
 * in one row of the example catalog (invented parts, inputs only). Import either takes it or
 * refuses the cell (exit 3); then explain, shortlist, check and replace each end with a result or
 * a worded refusal (exit 0 to 3), never an internal error.
 */
class ExtremeValuesCliTest {
    private static final String[] VALUES = {"1e308", "1e-320", "-1e308", "0", "1e-320", "1e308"};
    private static final Set<Integer> FINISHED = Set.of(ExitCode.OK, ExitCode.FAILED, ExitCode.USAGE, ExitCode.BAD_DATA);

    @TempDir
    Path tmp;

    static Stream<Arguments> cells() {
        List<Arguments> out = new ArrayList<>();
        int i = 0;
        for (Kind k : List.of(Kind.SWITCH, Kind.DRIVER, Kind.STAGE)) {
            for (Column c : Schema.of(k).columns()) {
                if (c.isNumeric()) {
                    // One extreme per column, cycling through the list (deterministic).
                    out.add(Arguments.of(k, c.name(), VALUES[i++ % VALUES.length]));
                }
            }
        }
        return out.stream();
    }

    @ParameterizedTest(name = "{0} {1} = {2}")
    @MethodSource("cells")
    void everyCommandEndsWithAResultOrAWordedRefusal(Kind kind, String column, String value) throws IOException {
        Path switches = copy("switches.csv", kind == Kind.SWITCH ? "QND-65G150D" : null, column, value);
        Path drivers = copy("drivers.csv", kind == Kind.DRIVER ? "QND-D06L" : null, column, value);
        Path stages = copy("stages.csv", kind == Kind.STAGE ? "MC-UH" : null, column, value);
        Path bom = tmp.resolve("bom.csv");
        Files.copy(Path.of("examples/bom.csv"), bom);
        Path cat = tmp.resolve("catalog");
        CliRun imp = CliRun.on(cat, "import", switches.toString(), drivers.toString());
        assertTrue(imp.exit() == ExitCode.OK || imp.exit() == ExitCode.BAD_DATA, imp.dump());
        if (imp.exit() == ExitCode.BAD_DATA) {
            assertTrue(imp.err().contains(column), "the refusal names the column: " + imp.dump());
            return;
        }
        String[] point = {"--freq", "200", "--bus", "375", "--duty-max", "0.5"};
        List<String[]> commands = List.of(
                concat(new String[] {"explain", "--driver", "QND-D06L", "--switch", "QND-65G150D", "--side", "high"}, point),
                concat(new String[] {"shortlist", "--switch", "QND-65G150D", "--all"}, point),
                concat(new String[] {"explain", "--driver", "QND-D06L", "--switch", "QND-65G150D", "--format", "json"}, point),
                new String[] {"check", stages.toString(), "--bom", bom.toString(), "--format", "json"},
                new String[] {"replace", "QND-D06L", "--stages", stages.toString(), "--bom", bom.toString()},
                new String[] {"replace", "QND-65G150D"});
        for (String[] args : commands) {
            CliRun r = CliRun.on(cat, args);
            assertTrue(FINISHED.contains(r.exit()), String.join(" ", args) + "\n" + r.dump());
            assertFalse(r.err().contains("internal error"), String.join(" ", args) + "\n" + r.dump());
        }
    }

    private static String[] concat(String[] a, String[] b) {
        return Stream.concat(Stream.of(a), Stream.of(b)).toArray(String[]::new);
    }

    /** The example sheet with {@code column} of row {@code key} set to {@code value} (unchanged when key is null). */
    private Path copy(String name, String key, String column, String value) throws IOException {
        Path to = tmp.resolve(name);
        if (key == null) {
            Files.copy(Path.of("examples", name), to);
            return to;
        }
        CSVFormat in = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get();
        StringWriter w = new StringWriter();
        int changed = 0;
        try (Reader r = Files.newBufferedReader(Path.of("examples", name), StandardCharsets.UTF_8);
             org.apache.commons.csv.CSVParser p = in.parse(r)) {
            List<String> header = p.getHeaderNames();
            try (CSVPrinter out = new CSVPrinter(w, CSVFormat.DEFAULT.builder().setHeader(header.toArray(String[]::new))
                    .get())) {
                for (CSVRecord rec : p) {
                    List<String> cells = new ArrayList<>(rec.toList());
                    if (rec.get(0).equals(key)) {
                        int at = header.indexOf(column);
                        if (at < 0) {
                            header = new ArrayList<>(header);
                        }
                        if (at >= 0) {
                            cells.set(at, value);
                            changed++;
                        }
                    }
                    out.printRecord(cells);
                }
            }
        }
        Files.writeString(to, changed == 1 ? w.toString() : withColumn(Path.of("examples", name), key, column, value));
        return to;
    }

    /** The sheet with a column added (a stage column the example sheet leaves out), set in row {@code key} only. */
    private static String withColumn(Path sheet, String key, String column, String value) throws IOException {
        List<String> lines = Files.readAllLines(sheet, StandardCharsets.UTF_8);
        StringBuilder sb = new StringBuilder(lines.get(0)).append(',').append(column).append('\n');
        int hits = 0;
        for (String line : lines.subList(1, lines.size())) {
            boolean mine = line.startsWith(key + ",");
            hits += mine ? 1 : 0;
            sb.append(line).append(',').append(mine ? value : "").append('\n');
        }
        assertEquals(1, hits, "one row " + key + " in " + sheet);
        return sb.toString();
    }
}
