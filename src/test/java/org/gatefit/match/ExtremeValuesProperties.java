package org.gatefit.match;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.gatefit.catalog.Column;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;
import org.gatefit.catalog.Schema;

/**
 * Every value the catalog schema accepts gives the engines a result or a worded {@code unknown},
 * never an exception (issue: "values the schema accepts crash the engines"). Parts start from the
 * bundled example rows (invented data, used as inputs only) with one to four columns set to the
 * extremes the schema still admits — the bound itself, a subnormal, 1e308, the largest double —
 * and are put through the full evaluation and the ranking, which must agree.
 */
class ExtremeValuesProperties {
    private static final List<Row> DRIVERS = rows(Kind.DRIVER, "examples/drivers.csv");
    private static final List<Row> SWITCHES = rows(Kind.SWITCH, "examples/switches.csv");

    /** Candidate extremes; each column keeps those its schema bounds admit. */
    private static final double[] EXTREMES = {0, Double.MIN_VALUE, 1e-320, 1e-12, 0.5, 3, 1e6, 1e12, 1e308,
        Double.MAX_VALUE, -Double.MIN_VALUE, -1e-12, -3, -1e6, -1e308, -Double.MAX_VALUE};

    private static List<Row> rows(Kind kind, String file) {
        Schema schema = Schema.of(kind);
        List<Row> out = new ArrayList<>();
        try (Reader r = Files.newBufferedReader(Path.of(file), StandardCharsets.UTF_8)) {
            for (CSVRecord rec : CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(r)) {
                LinkedHashMap<String, Object> values = new LinkedHashMap<>();
                for (Column c : schema.columns()) {
                    String cell = rec.isMapped(c.name()) ? rec.get(c.name()) : "";
                    if (!cell.isEmpty()) {
                        values.put(c.name(), c.isNumeric() ? (Object) Double.parseDouble(cell) : cell);
                    }
                }
                out.add(new Row(kind, rec.get("part_number"), file, rec.getRecordNumber() + 1, Row.owned(values), Map.of()));
            }
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
        return out;
    }

    private static boolean admitted(Column c, double v) {
        if (c.minimum() != null && (c.minExclusive() ? v <= c.minimum() : v < c.minimum())) {
            return false;
        }
        return c.maximum() == null || v <= c.maximum();
    }

    /** A row with some numeric columns set to admitted extremes. */
    private static Arbitrary<Row> extreme(List<Row> base, Kind kind) {
        List<Column> numeric = Schema.of(kind).columns().stream().filter(c -> c.isNumeric()
                && !c.name().equals("stock") && !c.name().equals("channels")).toList();
        Arbitrary<Map.Entry<String, Double>> change = Arbitraries.of(numeric).flatMap(c -> {
            List<Double> ok = new ArrayList<>();
            for (double v : EXTREMES) {
                if (admitted(c, v)) {
                    ok.add(v);
                }
            }
            return Arbitraries.of(ok).map(v -> Map.entry(c.name(), v));
        });
        return Combinators.combine(Arbitraries.of(base), change.list().ofMinSize(1).ofMaxSize(4)).as((row, changes) -> {
            LinkedHashMap<String, Object> values = new LinkedHashMap<>(row.values());
            for (Map.Entry<String, Double> e : changes) {
                values.put(e.getKey(), e.getValue());
            }
            return new Row(kind, row.key(), row.file(), row.line(), Row.owned(values), Map.of());
        });
    }

    @Provide
    Arbitrary<Row> drivers() {
        return extreme(DRIVERS, Kind.DRIVER);
    }

    @Provide
    Arbitrary<Row> switches() {
        return extreme(SWITCHES, Kind.SWITCH);
    }

    @Provide
    Arbitrary<OperatingPoint.Spec> points() {
        Arbitrary<Double> any = Arbitraries.oneOf(Arbitraries.of(1e-320, 1e-12, 1e308, Double.MAX_VALUE),
                Arbitraries.doubles().between(0.01, 1000));
        return Combinators.combine(Arbitraries.of(true, false), any, any, any, any, any, any,
                Arbitraries.of(0.0, 1e-320, 1e-9, 1e308)).as((h, bus, f, edge, on, rg, loop, dvdtOrNot) -> {
                    OperatingPoint.Spec s = new OperatingPoint.Spec();
                    s.highSide = h;
                    s.bus = bus;
                    s.fSw = f;
                    s.edge = edge;
                    s.vDrive = on;
                    s.rG = rg;
                    s.loop = loop;
                    s.dutyMax = 0.5;
                    return s;
                });
    }

    @Property(tries = 1500)
    void admittedExtremesGiveAResultNeverAnException(@ForAll("drivers") Row dr, @ForAll("switches") Row sw) {
        DriverPart d = DriverPart.of(dr);
        SwitchPart s = SwitchPart.of(sw);
        OperatingPoint.Spec spec = new OperatingPoint.Spec();
        spec.fSw = 100e3;
        spec.bus = 48.0;
        spec.highSide = true;
        spec.dutyMax = 0.9;
        OperatingPoint op = spec.resolve(s);
        judgedAlike(d, s, op);
    }

    @Property(tries = 600)
    void extremeOperatingPointsAreRefusedOrJudged(@ForAll("points") OperatingPoint.Spec spec) {
        for (Row sw : SWITCHES.subList(0, 6)) {
            SwitchPart s = SwitchPart.of(sw);
            OperatingPoint op;
            try {
                op = spec.copy().resolve(s);
            } catch (IllegalArgumentException refused) {
                // The command line turns this into a usage error (exit 2) with the message.
                assertTrue(refused.getMessage().startsWith("expected"), refused.getMessage());
                continue;
            }
            for (Row dr : DRIVERS.subList(0, 8)) {
                judgedAlike(DriverPart.of(dr), s, op);
            }
        }
    }

    private static void judgedAlike(DriverPart d, SwitchPart s, OperatingPoint op) {
        PairResult full = Rules.evaluate(d, s, op, Margins.DEFAULT);
        Rules.Ranking ranking = new Rules.Ranking(Question.of(s, op, Margins.DEFAULT));
        ranking.rank(d);
        assertEquals(full.verdict(), ranking.verdict());
        assertEquals(full.score(), ranking.score(), 0.0);
        assertTrue(full.score() >= 0 && full.score() <= 1, "score " + full.score());
        for (Check c : full.checks()) {
            assertFalse(c.message().isBlank(), c.rule().id());
        }
        for (Figure f : full.figures()) {
            assertTrue(Double.isFinite(f.value()), f.name());
        }
    }
}
