package org.gatefit.catalog;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.math.BigInteger;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * A bill of materials as EDA tools export it: a designator column (also called reference or
 * refdes) whose cells hold lists and ranges such as {@code Q1, Q3-Q6}, a part-number column (also
 * MPN or manufacturer part number), and optional quantity and do-not-place columns, all matched
 * case-insensitively.
 */
public final class Bom {
    private static final List<String> DESIGNATOR = List.of("designator", "designators", "reference", "references",
            "refdes", "ref des", "ref", "part reference", "ref designator", "reference designator");
    private static final List<String> PART = List.of("manufacturer part number", "mpn", "mfr part number",
            "mfg part number", "mfr. part number", "manufacturer_part_number", "part number", "part_number",
            "part no", "part no.", "partnumber");
    private static final List<String> QUANTITY = List.of("quantity", "qty", "qty.", "count");
    private static final List<String> DNP = List.of("dnp", "do not place", "do not populate", "dni", "not fitted", "nf");
    private static final Pattern RANGE = Pattern.compile("^([A-Za-z_]+)(\\d+)\\s*[-–]\\s*([A-Za-z_]*)(\\d+)$");
    private static final Pattern DASH = Pattern.compile("\\s*[-–]\\s*");
    private static final Pattern SINGLE = Pattern.compile("^[A-Za-z_]+\\d*[A-Za-z]?$");
    /** Most designators one range may expand to (guards against "R1-R999999"). */
    static final int RANGE_LIMIT = 10_000;

    /**
     * One designator of the BOM.
     *
     * @param designator as written, upper-cased
     * @param partNumber the part number of its row
     * @param doNotPlace whether the row is marked do-not-place
     * @param line       physical line of its row
     */
    public record Entry(String designator, String partNumber, boolean doNotPlace, long line) {
    }

    private final String file;
    private final Map<String, Entry> byDesignator;
    private final List<String> notes;

    private Bom(String file, Map<String, Entry> byDesignator, List<String> notes) {
        this.file = file;
        this.byDesignator = byDesignator;
        this.notes = List.copyOf(notes);
    }

    /** The file name as given. */
    public String file() {
        return file;
    }

    /** A designator's entry (matched case-insensitively). */
    public Optional<Entry> get(String designator) {
        return Optional.ofNullable(byDesignator.get(designator.strip().toUpperCase(Locale.ROOT)));
    }

    /** How many designators the BOM lists. */
    public int size() {
        return byDesignator.size();
    }

    /** Warnings found while reading (quantity disagreeing with the designator count). */
    public List<String> notes() {
        return notes;
    }

    /** Expands a designator cell: {@code "Q1, Q3-Q6"} → Q1, Q3, Q4, Q5, Q6. */
    public static List<String> expand(String cell) throws BadValueException {
        List<String> out = new ArrayList<>();
        for (String part : DASH.matcher(cell).replaceAll("-").split("[,;\\s]+")) {
            String p = part.strip();
            if (p.isEmpty()) {
                continue;
            }
            Matcher m = RANGE.matcher(p);
            if (m.matches()) {
                String prefix = m.group(1);
                if (!m.group(3).isEmpty() && !m.group(3).equalsIgnoreCase(prefix)) {
                    throw new BadValueException("range '" + p + "' mixes prefixes " + prefix + " and " + m.group(3)
                            + " (expected e.g. Q3-Q6)");
                }
                // BigInteger: the digits may be longer than a long holds ("R1-R99999999999999999999")
                BigInteger a = new BigInteger(m.group(2));
                BigInteger b = new BigInteger(m.group(4));
                if (b.compareTo(a) < 0) {
                    throw new BadValueException("range '" + p + "' runs backwards (expected the lower number first)");
                }
                BigInteger count = b.subtract(a).add(BigInteger.ONE);
                if (count.compareTo(BigInteger.valueOf(RANGE_LIMIT)) > 0) {
                    throw new BadValueException("range '" + p + "' expands to " + count + " designators (at most "
                            + RANGE_LIMIT + ")");
                }
                int width = m.group(2).length() > 1 && m.group(2).startsWith("0") ? m.group(2).length() : 0;
                for (BigInteger i = a; i.compareTo(b) <= 0; i = i.add(BigInteger.ONE)) {
                    String num = i.toString();
                    if (num.length() < width) {
                        num = "0".repeat(width - num.length()) + num;
                    }
                    out.add((prefix + num).toUpperCase(Locale.ROOT));
                }
            } else if (SINGLE.matcher(p).matches()) {
                out.add(p.toUpperCase(Locale.ROOT));
            } else {
                throw new BadValueException("'" + p + "' is not a designator (expected e.g. Q1, or a range such as Q3-Q6)");
            }
        }
        return out;
    }

    /** Reads a BOM; every problem is reported with file, line and column. */
    public static Bom read(Path path, String name) throws IOException, CatalogDataException {
        byte[] head = new byte[3];
        try (var in = Files.newInputStream(path)) {
            int n = in.readNBytes(head, 0, 3);
            if (n == 0) {
                throw new CatalogDataException(Problem.ofLine(name, 0, "the BOM is empty (expected a header with"
                        + " designator and part-number columns)"));
            }
        }
        try (Reader r = Files.newBufferedReader(path, StandardCharsets.UTF_8)) {
            BufferedReader br = new BufferedReader(r);
            br.mark(4);
            if (br.read() != '\uFEFF') {
                br.reset();
            }
            String firstLine;
            br.mark(1 << 16);
            firstLine = br.readLine();
            br.reset();
            char delim = firstLine == null ? ',' : count(firstLine, ';') > count(firstLine, ',') ? ';'
                    : count(firstLine, '\t') > count(firstLine, ',') ? '\t' : ',';
            CSVFormat f = CSVFormat.DEFAULT.builder().setDelimiter(delim).setIgnoreEmptyLines(false).get();
            try (CSVParser p = f.parse(br)) {
                return parse(p, name);
            } catch (UncheckedIOException e) {
                throw new CatalogDataException(Problem.ofLine(name, 0, "cannot read the BOM as CSV: "
                        + e.getCause().getMessage()));
            }
        } catch (java.nio.charset.MalformedInputException e) {
            throw new CatalogDataException(Problem.ofLine(name, 0, "the BOM is not UTF-8 text (expected a UTF-8 CSV file)"));
        }
    }

    private static int count(String s, char c) {
        int n = 0;
        for (int i = 0; i < s.length(); i++) {
            if (s.charAt(i) == c) {
                n++;
            }
        }
        return n;
    }

    private static Bom parse(CSVParser p, String name) throws CatalogDataException {
        List<Problem> problems = new ArrayList<>();
        List<String> notes = new ArrayList<>();
        Map<String, Entry> map = new LinkedHashMap<>();
        int dCol = -1;
        int pCol = -1;
        int qCol = -1;
        int nCol = -1;
        long prevEnd = 0;
        boolean header = true;
        List<String> headerCells = List.of();
        for (CSVRecord rec : p) {
            long line = prevEnd + 1;
            prevEnd = p.getCurrentLineNumber();
            if (rec.size() == 1 && rec.get(0).isBlank()) {
                continue;
            }
            if (header) {
                headerCells = rec.toList();
                for (int i = 0; i < rec.size(); i++) {
                    String h = rec.get(i).strip().toLowerCase(Locale.ROOT);
                    if (dCol < 0 && DESIGNATOR.contains(h)) {
                        dCol = i;
                    } else if (pCol < 0 && PART.contains(h)) {
                        pCol = i;
                    } else if (qCol < 0 && QUANTITY.contains(h)) {
                        qCol = i;
                    } else if (nCol < 0 && DNP.contains(h)) {
                        nCol = i;
                    }
                }
                if (dCol < 0 || pCol < 0) {
                    throw new CatalogDataException(Problem.ofLine(name, line, "the BOM header lacks a "
                            + (dCol < 0 ? "designator column (expected one named Designator, Reference or RefDes)"
                            : "part-number column (expected one named Manufacturer Part Number, MPN or Part Number)")
                            + "; found: " + String.join(", ", headerCells)));
                }
                header = false;
                continue;
            }
            String dCell = dCol < rec.size() ? rec.get(dCol) : "";
            String pn = pCol < rec.size() ? rec.get(pCol).strip() : "";
            if (dCell.isBlank()) {
                continue;
            }
            List<String> des;
            try {
                des = expand(dCell);
            } catch (BadValueException e) {
                problems.add(new Problem(name, line, headerCells.get(dCol).strip(), dCol + 1, dCell, e.getMessage()));
                continue;
            }
            boolean dnp = nCol >= 0 && nCol < rec.size() && truthy(rec.get(nCol));
            if (pn.isEmpty() && !dnp) {
                problems.add(new Problem(name, line, headerCells.get(pCol).strip(), pCol + 1, "",
                        "no part number for " + dCell.strip() + " (expected a part number, or mark the row do-not-place)"));
                continue;
            }
            if (qCol >= 0 && qCol < rec.size() && !rec.get(qCol).isBlank()) {
                try {
                    long q = Units.parseInteger(rec.get(qCol));
                    if (q != des.size()) {
                        notes.add(name + " line " + line + ": quantity " + q + " but " + des.size() + " designators ("
                                + dCell.strip() + ")");
                    }
                } catch (BadValueException e) {
                    problems.add(new Problem(name, line, headerCells.get(qCol).strip(), qCol + 1, rec.get(qCol),
                            e.getMessage()));
                }
            }
            for (String d : des) {
                Entry prev = map.putIfAbsent(d, new Entry(d, pn, dnp, line));
                if (prev != null) {
                    problems.add(new Problem(name, line, headerCells.get(dCol).strip(), dCol + 1, dCell,
                            "designator " + d + " is also on line " + prev.line() + " (expected each designator once)"));
                }
            }
        }
        if (header) {
            throw new CatalogDataException(Problem.ofLine(name, 0, "the BOM has no header line"));
        }
        if (!problems.isEmpty()) {
            throw new CatalogDataException(problems, problems.size());
        }
        return new Bom(name, map, notes);
    }

    private static boolean truthy(String s) {
        return switch (s.strip().toLowerCase(Locale.ROOT)) {
            case "yes", "y", "x", "true", "1", "dnp", "dni", "nf" -> true;
            default -> false;
        };
    }
}
