package org.gatefit.catalog;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.commons.text.similarity.LevenshteinDistance;

/**
 * Tells which schema column a heading of someone's sheet names: the column's own name, or one of
 * its {@code x-headings} ({@code Vds}, {@code Rds(on)}, {@code Qg total}, {@code Mfr}), compared
 * with case, spaces, underscores, dots, brackets and inner hyphens ignored ({@link #normalise}). A
 * heading that may carry its unit ({@code Qg (nC)}, {@code Rds(on) [mΩ]}, {@code Ciss, pF},
 * {@code Rds(on) mOhm}, {@code Vds/V}, {@code Qg in nC}) gives the unit of that column's bare
 * numbers. A heading that names two columns (listed under both, like {@code Vgs(th)}) is
 * ambiguous and not guessed. A {@link Mapping} given by the user comes first.
 */
public final class Headings {
    private Headings() {
    }

    /** Ways a heading carries its unit: {@code Name (unit)}, {@code Name [unit]}, {@code Name, unit}, {@code Name/unit}, {@code Name in unit}, {@code Name unit}. */
    private static final List<Pattern> SPLITS = List.of(
            Pattern.compile("^(.*\\S)\\s*[(\\[]\\s*([^()\\[\\]]+?)\\s*[)\\]]$"),
            Pattern.compile("^(.*\\S)\\s*,\\s*(\\S+)$"),
            Pattern.compile("^(.*\\S)\\s*/\\s*([^\\s/]+)$"),
            Pattern.compile("^(.*\\S)\\s+in\\s+(\\S+)$", Pattern.CASE_INSENSITIVE),
            Pattern.compile("^(.*\\S)\\s+(\\S+)$"));

    /** The heading without each unit it may name ({@code Vds (V)} → {@code Vds}), for matching a mapping. */
    static List<String> nameParts(String heading) {
        List<String> out = new ArrayList<>();
        for (Pattern p : SPLITS) {
            Matcher m = p.matcher(heading.strip());
            if (m.matches()) {
                out.add(m.group(1));
            }
        }
        return out;
    }

    /** Currencies a price heading may name; the price is kept as written (not converted). */
    private static final Set<String> CURRENCIES = Set.of("€", "$", "£", "¥", "eur", "usd", "gbp", "chf", "jpy", "cny",
            "sek", "nok", "dkk", "pln", "czk", "huf", "inr", "cad", "aud");

    /** Normalised heading → the columns naming it, per kind. */
    private static final Map<Kind, Map<String, List<String>>> NAMES = new ConcurrentHashMap<>();

    /**
     * A heading as compared: lower case, without spaces, underscores, dots, brackets, and hyphens
     * between letters or digits ({@code V_DS} = {@code Vds}, {@code Rds(on)} = {@code RDS on},
     * {@code N-ch} = {@code Nch}, while {@code UVLO-} keeps its sign).
     */
    public static String normalise(String heading) {
        String h = heading.strip().toLowerCase(Locale.ROOT);
        StringBuilder sb = new StringBuilder(h.length());
        for (int i = 0; i < h.length(); i++) {
            char c = h.charAt(i);
            if (Character.isWhitespace(c) || c == '\u00a0' || c == '_' || c == '.' || c == '(' || c == ')'
                    || c == '[' || c == ']' || c == '{' || c == '}') {
                continue;
            }
            if (c == '-' && i + 1 < h.length() && Character.isLetterOrDigit(h.charAt(i + 1))) {
                continue;
            }
            sb.append(c == 'μ' ? 'µ' : c);
        }
        return sb.toString();
    }

    private static Map<String, List<String>> names(Schema schema) {
        return NAMES.computeIfAbsent(schema.kind(), k -> {
            Map<String, List<String>> m = new HashMap<>();
            for (Column c : schema.columns()) {
                Set<String> keys = new LinkedHashSet<>();
                keys.add(normalise(c.name()));
                for (String h : c.headings()) {
                    keys.add(normalise(h));
                }
                for (String key : keys) {
                    m.computeIfAbsent(key, x -> new ArrayList<>()).add(c.name());
                }
            }
            return m;
        });
    }

    /** The columns a heading names (by its whole text), none, one, or more (ambiguous). */
    public static List<String> columns(Schema schema, String heading) {
        return names(schema).getOrDefault(normalise(heading), List.of());
    }

    /**
     * How one heading was read.
     *
     * @param heading      as written
     * @param column       the column it fills, or null (an extra attribute)
     * @param unitText     the unit it names (null when none), as written
     * @param bareExponent power of ten of a bare number in this column (the column's own unless the heading names a unit)
     * @param mapped       whether a user mapping decided it
     * @param ambiguous    the columns it could name when it was not guessed, else empty
     * @param problem      what is wrong with it (a unit of another dimension, a mapping to a column the kind lacks), or null
     */
    public record Read(String heading, String column, String unitText, int bareExponent, boolean mapped,
                       List<String> ambiguous, String problem) {
        public Read {
            ambiguous = List.copyOf(ambiguous);
        }
    }

    /** Reads one heading for a kind; {@code mapping} (may be null) first. */
    public static Read read(Schema schema, String heading, Mapping mapping) {
        String h = heading.strip();
        if (mapping != null) {
            String target = mapping.target(h);
            if (target != null) {
                if (target.isEmpty()) {
                    return new Read(h, null, null, 0, true, List.of(), null);
                }
                Column c = schema.column(target).orElse(null);
                if (c == null) {
                    return new Read(h, null, null, 0, true, List.of(), "the mapping names column " + target
                            + ", which a " + schema.kind().id() + " " + (schema.kind() == Kind.STAGE ? "sheet" : "catalog")
                            + " does not have (expected one of " + String.join(", ", schema.names()) + ")");
                }
                for (Pattern p : SPLITS) {
                    Matcher m = p.matcher(h);
                    if (m.matches()) {
                        Read r = withUnit(c, h, m.group(2), true);
                        if (r != null && r.problem() == null) {
                            return r;
                        }
                    }
                }
                return new Read(h, c.name(), null, exponent(c), true, List.of(), null);
            }
        }
        if (h.isEmpty()) {
            return new Read(h, null, null, 0, false, List.of(), null);
        }
        Column exact = schema.column(h.toLowerCase(Locale.ROOT)).orElse(null);
        if (exact != null) {
            return new Read(h, exact.name(), null, exponent(exact), false, List.of(), null);
        }
        List<String> whole = columns(schema, h);
        if (whole.size() == 1) {
            Column c = schema.column(whole.get(0)).orElseThrow();
            return new Read(h, c.name(), null, exponent(c), false, List.of(), null);
        }
        if (whole.size() > 1) {
            return new Read(h, null, null, 0, false, whole, null);
        }
        for (Pattern p : SPLITS) {
            Matcher m = p.matcher(h);
            if (!m.matches()) {
                continue;
            }
            List<String> cols = columns(schema, m.group(1));
            if (cols.isEmpty()) {
                continue;
            }
            if (cols.size() > 1) {
                if (Units.headingDimension(m.group(2)) != null || isCurrency(m.group(2))) {
                    return new Read(h, null, m.group(2), 0, false, cols, null);
                }
                continue;
            }
            Read r = withUnit(schema.column(cols.get(0)).orElseThrow(), h, m.group(2), false);
            if (r != null) {
                return r;
            }
        }
        return new Read(h, null, null, 0, false, List.of(), null);
    }

    /** The column's reading with the unit {@code unit} from its heading; null when that is no unit at all. */
    private static Read withUnit(Column c, String h, String unit, boolean mapped) {
        if (c.unit() != null) {
            Integer e = Units.headingExponent(unit, c.unit().dimension());
            if (e != null) {
                return new Read(h, c.name(), unit, e, mapped, List.of(), null);
            }
            Dimension other = Units.headingDimension(unit);
            if (other != null) {
                return new Read(h, c.name(), unit, exponent(c), mapped, List.of(), "the heading names " + unit + ", a "
                        + other.quantity() + " unit, but " + c.name() + " is a " + c.unit().dimension().quantity()
                        + " (expected a unit such as " + c.unitSymbol() + ")");
            }
            return null;
        }
        if (c.type() == ColumnType.NUMBER && isCurrency(unit)) {
            return new Read(h, c.name(), unit, 0, mapped, List.of(), null);
        }
        return null;
    }

    /** Whether a heading's unit names a currency ({@code €}, {@code EUR}). */
    static boolean isCurrency(String unit) {
        return CURRENCIES.contains(unit.strip().toLowerCase(Locale.ROOT));
    }

    private static int exponent(Column c) {
        return c.unit() == null ? 0 : c.unit().exponent();
    }

    /**
     * Headings of the sheet nearest a column by edit distance over the normalised text (its name
     * and its {@code x-headings}), at most {@code limit}, nearest first.
     */
    public static List<String> nearest(Column c, List<String> candidates, int limit) {
        LevenshteinDistance d = LevenshteinDistance.getDefaultInstance();
        List<String> keys = new ArrayList<>();
        keys.add(normalise(c.name()));
        c.headings().forEach(h -> keys.add(normalise(h)));
        Map<String, Integer> best = new LinkedHashMap<>();
        for (String cand : candidates) {
            String n = normalise(cand);
            for (Pattern p : SPLITS) {
                Matcher m = p.matcher(cand.strip());
                if (m.matches() && (Units.headingDimension(m.group(2)) != null || isCurrency(m.group(2)))) {
                    n = normalise(m.group(1));
                    break;
                }
            }
            if (n.isEmpty()) {
                continue;
            }
            int min = Integer.MAX_VALUE;
            for (String k : keys) {
                min = Math.min(min, d.apply(k, n));
            }
            best.merge(cand, min, Math::min);
        }
        return best.entrySet().stream().sorted(Map.Entry.<String, Integer>comparingByValue()
                        .thenComparing(Map.Entry.comparingByKey(Comparator.naturalOrder())))
                .limit(limit).map(Map.Entry::getKey).toList();
    }

    /**
     * The column a heading that names none is probably a misspelling of (edit distance at most 2
     * over the normalised text, headings of four characters or more), or null.
     */
    public static String misspeltColumn(Schema schema, String heading) {
        String n = normalise(heading);
        if (n.length() < 4) {
            return null;
        }
        LevenshteinDistance d = new LevenshteinDistance(2);
        String best = null;
        int bestD = Integer.MAX_VALUE;
        for (Map.Entry<String, List<String>> e : names(schema).entrySet()) {
            if (e.getValue().size() != 1 || e.getKey().length() < 4) {
                continue;
            }
            int dist = d.apply(e.getKey(), n);
            if (dist >= 0 && dist < bestD) {
                bestD = dist;
                best = e.getValue().get(0);
            }
        }
        return best;
    }
}
