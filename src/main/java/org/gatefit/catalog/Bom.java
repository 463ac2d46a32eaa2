package org.gatefit.catalog;

import java.io.IOException;
import java.math.BigInteger;
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

/**
 * A bill of materials as EDA tools export it: a designator column (also called reference or
 * refdes) whose cells hold lists and ranges such as {@code Q1, Q3-Q6}, a part-number column (also
 * MPN or manufacturer part number), and optional quantity and do-not-place columns, all matched
 * case-insensitively.
 */
public final class Bom {
    /** Headings of each column, compared as {@link Headings#normalise} compares them (case, spaces, dots, brackets ignored). */
    private static final List<String> DESIGNATOR = normalised("designator", "designators", "reference", "references",
            "refdes", "ref des", "ref", "part reference", "ref designator", "reference designator", "ref. des.",
            "designator(s)", "refs");
    private static final List<String> PART = normalised("manufacturer part number", "mpn", "mfr part number",
            "mfg part number", "mfr. part number", "mfr. part no.", "mfr part no", "mfg part no", "manufacturer part no",
            "manufacturer_part_number", "part number", "part_number", "part no", "part no.", "partnumber", "part #",
            "p/n", "mfr p/n");
    private static final List<String> QUANTITY = normalised("quantity", "qty", "qty.", "count", "qty per board");
    private static final List<String> DNP = normalised("dnp", "do not place", "do not populate", "dni", "not fitted", "nf",
            "fitted?");
    /** Records before the header that the header search looks through (title rows). */
    private static final int TITLE_ROWS = 10;

    private static List<String> normalised(String... headings) {
        return java.util.Arrays.stream(headings).map(Headings::normalise).toList();
    }
    private static final Pattern RANGE = Pattern.compile("^([A-Za-z_]+)(\\d+)\\s*[-–]\\s*([A-Za-z_]*)(\\d+)$");
    private static final Pattern SINGLE = Pattern.compile("^[A-Za-z_]+\\d*[A-Za-z]?$");
    /** Most designators one range may expand to (guards against "R1-R999999"). */
    static final int RANGE_LIMIT = 10_000;
    /** Longest designator or range, in characters (reading a longer number would take time growing with its square). */
    static final int DESIGNATOR_CHARS = 100;

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
        for (String part : joinDashes(cell).split("[,;\\s]+")) {
            String p = part.strip();
            if (p.isEmpty()) {
                continue;
            }
            if (p.length() > DESIGNATOR_CHARS) {
                throw new BadValueException(Problem.quote(p) + " is too long for a designator or range (expected at most "
                        + DESIGNATOR_CHARS + " characters, e.g. Q1 or Q3-Q6)");
            }
            Matcher m = RANGE.matcher(p);
            if (m.matches()) {
                String prefix = m.group(1);
                if (!m.group(3).isEmpty() && !m.group(3).equalsIgnoreCase(prefix)) {
                    throw new BadValueException("range " + Problem.quote(p) + " mixes prefixes " + prefix + " and " + m.group(3)
                            + " (expected e.g. Q3-Q6)");
                }
                // BigInteger: the digits may be longer than a long holds ("R1-R99999999999999999999")
                BigInteger a = new BigInteger(m.group(2));
                BigInteger b = new BigInteger(m.group(4));
                if (b.compareTo(a) < 0) {
                    throw new BadValueException("range " + Problem.quote(p) + " runs backwards (expected the lower number first)");
                }
                BigInteger count = b.subtract(a).add(BigInteger.ONE);
                if (count.compareTo(BigInteger.valueOf(RANGE_LIMIT)) > 0) {
                    throw new BadValueException("range " + Problem.quote(p) + " expands to " + count + " designators (at most "
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
                throw new BadValueException(Problem.quote(p) + " is not a designator (expected e.g. Q1, or a range such as Q3-Q6)");
            }
        }
        return out;
    }

    /**
     * The cell with each dash ({@code -} or {@code –}) written {@code -} and the spaces around it
     * removed ({@code Q3 – Q6} → {@code Q3-Q6}), in one pass (a regular expression for it takes
     * time growing with the square of a run of spaces).
     */
    private static String joinDashes(String cell) {
        StringBuilder sb = new StringBuilder(cell.length());
        int n = cell.length();
        for (int i = 0; i < n; ) {
            char c = cell.charAt(i);
            if (space(c)) {
                int j = i;
                while (j < n && space(cell.charAt(j))) {
                    j++;
                }
                boolean dashBefore = sb.length() > 0 && sb.charAt(sb.length() - 1) == '-';
                boolean dashAfter = j < n && (cell.charAt(j) == '-' || cell.charAt(j) == '–');
                if (!dashBefore && !dashAfter) {
                    sb.append(cell, i, j);
                }
                i = j;
            } else {
                sb.append(c == '–' ? '-' : c);
                i++;
            }
        }
        return sb.toString();
    }

    /** What {@code \s} matches in a regular expression, and the split below splits on. */
    private static boolean space(char c) {
        return c == ' ' || c == '\t' || c == '\n' || c == 0x0B || c == '\f' || c == '\r';
    }

    /**
     * Reads a BOM through the same front end as catalogs ({@link SheetReader#records}: UTF-8 with
     * or without a byte-order mark, comma, semicolon or tab separated, lines of any length); every
     * problem is reported with file, line and column.
     */
    public static Bom read(Path path, String name) throws IOException, CatalogDataException {
        return read(path, name, SheetReader.Options.DEFAULT);
    }

    /**
     * Reads a BOM with the options of the sheet reader (encoding, sheet of a workbook, header row);
     * its notes (the encoding read, title rows skipped) go to the options' listener.
     */
    public static Bom read(Path path, String name, SheetReader.Options options) throws IOException, CatalogDataException {
        if (Files.size(path) == 0) {
            throw new CatalogDataException(Problem.ofLine(name, 0, "the BOM is empty (expected a header with"
                    + " designator and part-number columns)"));
        }
        Reading reading = new Reading(name, options.headerRow(), options.notes());
        SheetReader.records(path, name, options, reading);
        return reading.finish();
    }

    /** The BOM as its records arrive: the header's columns, then one entry per designator. */
    private static final class Reading implements SheetReader.Records {
        private final String name;
        private final List<Problem> problems = new ArrayList<>();
        private final List<String> notes = new ArrayList<>();
        private final Map<String, Entry> map = new LinkedHashMap<>();
        private int dCol = -1;
        private int pCol = -1;
        private int qCol = -1;
        private int nCol = -1;
        private List<String> headerCells;
        private final long headerRow;
        private long firstLine;
        private List<String> firstCells;
        private int before;

        private final java.util.function.Consumer<String> heard;

        Reading(String name, long headerRow, java.util.function.Consumer<String> heard) {
            this.name = name;
            this.headerRow = headerRow;
            this.heard = heard;
        }

        @Override
        public void record(long line, List<String> rec) throws CatalogDataException {
            if (headerCells == null) {
                if (headerRow > 0 && line < headerRow) {
                    before++;
                    return;
                }
                if (firstCells == null) {
                    firstCells = rec;
                    firstLine = line;
                }
                // Title rows above the header are skipped: the header is the first record naming both columns.
                boolean last = headerRow > 0 || before + 1 >= TITLE_ROWS;
                if (!header(line, rec, firstLine, firstCells, last)) {
                    before++;
                    return;
                }
                if (before > 0) {
                    heard.accept("note: " + name + ": " + before + (before == 1 ? " row" : " rows")
                            + " above the header skipped; the header is line " + line);
                }
                return;
            }
            String dCell = dCol < rec.size() ? rec.get(dCol) : "";
            String pn = pCol < rec.size() ? rec.get(pCol).strip() : "";
            if (dCell.isBlank()) {
                return;
            }
            List<String> des;
            try {
                des = expand(dCell);
            } catch (BadValueException e) {
                problems.add(new Problem(name, line, column(dCol), dCol + 1, dCell, e.getMessage()));
                return;
            }
            boolean dnp = nCol >= 0 && nCol < rec.size() && truthy(rec.get(nCol));
            if (pn.isEmpty() && !dnp) {
                problems.add(new Problem(name, line, column(pCol), pCol + 1, "", "no part number for "
                        + Problem.excerpt(dCell.strip()) + " (expected a part number, or mark the row do-not-place)"));
                return;
            }
            if (qCol >= 0 && qCol < rec.size() && !rec.get(qCol).isBlank()) {
                try {
                    long q = Units.parseInteger(rec.get(qCol));
                    if (q != des.size()) {
                        notes.add(name + " line " + line + ": quantity " + q + " but " + des.size() + " designators ("
                                + Problem.excerpt(dCell.strip()) + ")");
                    }
                } catch (BadValueException e) {
                    problems.add(new Problem(name, line, column(qCol), qCol + 1, rec.get(qCol), e.getMessage()));
                }
            }
            for (String d : des) {
                Entry prev = map.putIfAbsent(d, new Entry(d, pn, dnp, line));
                if (prev != null) {
                    problems.add(new Problem(name, line, column(dCol), dCol + 1, dCell,
                            "designator " + d + " is also on line " + prev.line() + " (expected each designator once)"));
                }
            }
        }

        /**
         * Takes {@code rec} as the header when it names a designator and a part-number column; else,
         * when {@code last}, fails naming what the first record ({@code firstLine}) held.
         */
        private boolean header(long line, List<String> rec, long firstLine, List<String> first, boolean last)
                throws CatalogDataException {
            dCol = pCol = qCol = nCol = -1;
            headerCells = rec;
            for (int i = 0; i < rec.size(); i++) {
                String h = Headings.normalise(rec.get(i));
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
                if (!last) {
                    headerCells = null;
                    return false;
                }
                boolean d = false;
                boolean p = false;
                for (String c : first) {
                    d |= DESIGNATOR.contains(Headings.normalise(c));
                    p |= PART.contains(Headings.normalise(c));
                }
                throw new CatalogDataException(Problem.ofLine(name, firstLine, "the BOM header lacks a "
                        + (!d ? "designator column (expected one named Designator, Reference or RefDes)"
                        : "part-number column (expected one named Manufacturer Part Number, MPN or Part Number)")
                        + "; found: " + Problem.names(first)));
            }
            return true;
        }

        private String column(int i) {
            return Problem.excerpt(headerCells.get(i).strip());
        }

        Bom finish() throws CatalogDataException {
            if (headerCells == null && firstCells != null) {
                header(firstLine, firstCells, firstLine, firstCells, true);
            }
            if (headerCells == null) {
                throw new CatalogDataException(Problem.ofLine(name, 0, "the BOM has no header line"));
            }
            if (!problems.isEmpty()) {
                throw new CatalogDataException(problems, problems.size());
            }
            return new Bom(name, map, notes);
        }
    }

    private static boolean truthy(String s) {
        return switch (s.strip().toLowerCase(Locale.ROOT)) {
            case "yes", "y", "x", "true", "1", "dnp", "dni", "nf" -> true;
            default -> false;
        };
    }
}
