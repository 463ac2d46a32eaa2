package org.gatefit.catalog;

import java.util.Locale;

/**
 * Reads one cell for one column into its canonical value ({@link Row}) and applies the schema's
 * bounds. Also used for values typed on the command line, so both read the same way.
 */
public final class Cells {
    /** Characters that make a spreadsheet run a cell as a formula (OWASP CSV injection guidance). */
    static final String FORMULA_START = "=+-@\t\r";
    private static final java.util.regex.Pattern THOUSANDS = java.util.regex.Pattern.compile("[+-]?[1-9]\\d{0,2}(\\.\\d{3})+(\\s*[^\\d.,].*)?");
    private static final java.util.regex.Pattern SPACE = java.util.regex.Pattern.compile("\\s+");
    private static final java.util.regex.Pattern PLAIN = java.util.regex.Pattern.compile("[+-]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][+-]?\\d+)?");

    private Cells() {
    }

    /**
     * Parses a cell. Returns null for an empty cell (unknown); the caller decides whether that is
     * allowed.
     */
    public static Object parse(Column c, String raw, boolean decimalComma) throws BadValueException {
        return parse(c, raw, decimalComma, c.unit() == null ? 0 : c.unit().exponent());
    }

    /**
     * {@link #parse(Column, String, boolean)} where a bare number in a column with a unit is in
     * {@code 10^bareExponent} of the base unit (the unit the sheet's heading or units row names)
     * and is converted to the column's unit.
     */
    public static Object parse(Column c, String raw, boolean decimalComma, int bareExponent) throws BadValueException {
        String t = raw == null ? "" : raw.strip();
        if (t.isEmpty()) {
            return null;
        }
        return switch (c.type()) {
            case TEXT -> text(c, raw.strip());
            case CHOICE -> choice(c, t);
            case NUMBER -> {
                if (decimalComma && THOUSANDS.matcher(t).matches()) {
                    throw new BadValueException(Problem.quote(t) + " has a point in a file whose numbers take a decimal"
                            + " comma; is it a thousands separator? (expected the number without separators, e.g. "
                            + t.replace(".", "") + ", or a decimal comma)");
                }
                double v = c.unit() == null ? plainNumber(c, t, decimalComma)
                        : Units.parse(t, c.unit(), decimalComma, bareExponent);
                checkBounds(c, v, t);
                yield v;
            }
            case INTEGER -> {
                if (decimalComma && THOUSANDS.matcher(t).matches()) {
                    // 1.200 in a file with decimal commas is most likely twelve hundred, never 1.2: not guessed
                    throw new BadValueException(Problem.quote(t) + " has a point in a file whose numbers take a decimal"
                            + " comma; is it a thousands separator? (expected a whole number without separators, e.g. "
                            + t.replace(".", "") + ")");
                }
                long v = Units.parseInteger(t);
                checkBounds(c, v, t);
                yield v;
            }
        };
    }

    /**
     * What {@link #parse} gives for a cell held as {@code chars[from..to)}, when that is quick to
     * tell without making a string of it; null when {@link #parse} must decide. Quick are a plain
     * number (digits with an optional sign and one decimal mark, at most 15 digits, between ASCII
     * spaces) within the column's bounds in a NUMBER or INTEGER column, and a CHOICE cell that is
     * exactly one of {@code choices}. Anything else (empty, units, exponents, other spaces, out of
     * range, text) is left to {@link #parse}, which also words the problems.
     *
     * @param choices the column's choices that read as themselves (already lower case), or null
     */
    static Object parseQuick(Column c, String[] choices, char[] chars, int from, int to, boolean decimalComma) {
        if (c.type() == ColumnType.TEXT) {
            return null;
        }
        while (from < to && isAsciiSpace(chars[from])) {
            from++;
        }
        while (to > from && isAsciiSpace(chars[to - 1])) {
            to--;
        }
        int n = to - from;
        if (n == 0 || n > 18) {
            return null;
        }
        switch (c.type()) {
            case TEXT -> {
                return null;
            }
            case CHOICE -> {
                if (choices != null) {
                    for (String choice : choices) {
                        if (choice.length() == n && same(choice, chars, from)) {
                            return choice;
                        }
                    }
                }
                return null;
            }
            case INTEGER -> {
                // Units.parseInteger's plain path: an optional sign and digits.
                int i = chars[from] == '-' || chars[from] == '+' ? from + 1 : from;
                if (i == to) {
                    return null;
                }
                long v = 0;
                for (; i < to; i++) {
                    char ch = chars[i];
                    if (ch < '0' || ch > '9') {
                        return null;
                    }
                    v = v * 10 + (ch - '0');
                }
                if (chars[from] == '-') {
                    v = -v;
                }
                return inBounds(c, v) ? Long.valueOf(v) : null;
            }
            case NUMBER -> {
                // Units.plainDecimal / plainDecimalValue; a comma is the decimal mark only where plainNumber
                // turns it into a point (no unit, decimal-comma file).
                boolean comma = decimalComma && c.unit() == null;
                int i = from;
                boolean negative = false;
                if (chars[i] == '-' || chars[i] == '+') {
                    negative = chars[i] == '-';
                    i++;
                }
                long m = 0;
                int digits = 0;
                int fraction = -1;
                for (; i < to; i++) {
                    char ch = chars[i];
                    if (ch >= '0' && ch <= '9') {
                        m = m * 10 + (ch - '0');
                        digits++;
                        if (fraction >= 0) {
                            fraction++;
                        }
                    } else if (ch == '.' && decimalComma) {
                        return null; // parse decides whether it is a thousands separator
                    } else if ((ch == '.' || ch == ',' && comma) && fraction < 0) {
                        fraction = 0;
                    } else {
                        return null;
                    }
                }
                if (digits == 0 || digits > 15) {
                    return null;
                }
                double d = fraction > 0 ? m / Units.exactPow10(fraction) : (double) m;
                if (negative) {
                    d = -d;
                }
                if (c.unit() != null && d == 0) {
                    d = 0.0; // Units.parse gives +0 for -0
                }
                return inBounds(c, d) ? Double.valueOf(d) : null;
            }
        }
        return null;
    }

    /** Characters {@link String#strip} removes that are ASCII. */
    private static boolean isAsciiSpace(char ch) {
        return ch < 128 && Character.isWhitespace(ch);
    }

    private static boolean same(String s, char[] chars, int from) {
        for (int i = 0, n = s.length(); i < n; i++) {
            if (s.charAt(i) != chars[from + i]) {
                return false;
            }
        }
        return true;
    }

    /** Whether {@link #checkBounds} lets {@code v} pass. */
    private static boolean inBounds(Column c, double v) {
        if (c.minimum() != null) {
            double min = c.minimum();
            if (c.minExclusive() ? v <= min : v < min) {
                return false;
            }
        }
        return c.maximum() == null || !(v > c.maximum());
    }

    /**
     * The choices of a CHOICE column that {@link #parse} reads as themselves when written exactly
     * (those already in lower case), for {@link #parseQuick}; null for other columns.
     */
    static String[] quickChoices(Column c) {
        if (c.type() != ColumnType.CHOICE) {
            return null;
        }
        return c.choices().stream().filter(x -> !x.isEmpty() && x.equals(x.toLowerCase(Locale.ROOT))
                && x.strip().equals(x)).toArray(String[]::new);
    }

    /** Undoes the export's formula neutralisation: a leading apostrophe before a formula character. */
    public static String restoreText(String t) {
        if (t.length() >= 2 && t.charAt(0) == '\'' && (FORMULA_START.indexOf(t.charAt(1)) >= 0 || t.charAt(1) == '\'')) {
            return t.substring(1);
        }
        return t;
    }

    /** Neutralises text a spreadsheet would run as a formula by a leading apostrophe; {@link #restoreText} undoes it. */
    public static String neutraliseText(String t) {
        if (!t.isEmpty() && (FORMULA_START.indexOf(t.charAt(0)) >= 0
                || (t.length() >= 2 && t.charAt(0) == '\'' && (FORMULA_START.indexOf(t.charAt(1)) >= 0 || t.charAt(1) == '\'')))) {
            return "'" + t;
        }
        return t;
    }

    /**
     * Longest text, in UTF-8 bytes, of a column that is indexed as one term (every TEXT column but
     * the words-only ones): Lucene's limit for a term or a sorted value ({@code
     * IndexWriter.MAX_TERM_LENGTH}). Words-only texts have no such limit (their words are split at
     * 255 characters).
     */
    public static final int MAX_TERM_BYTES = 32_766;

    private static String text(Column c, String t) throws BadValueException {
        if (!c.wordsOnly() && t.length() * 3L > MAX_TERM_BYTES) {
            int bytes = t.getBytes(java.nio.charset.StandardCharsets.UTF_8).length;
            if (bytes > MAX_TERM_BYTES) {
                throw new BadValueException("the text is " + bytes + " bytes long in UTF-8 (expected at most "
                        + MAX_TERM_BYTES + ": the catalog indexes " + c.name() + " as one term)");
            }
        }
        String v = restoreText(t);
        if (c.pattern() != null) {
            v = v.toLowerCase(Locale.ROOT);
            if (hasWhitespace(v)) {
                v = SPACE.matcher(v).replaceAll("");
            }
            if (!c.pattern().matcher(v).matches()) {
                throw new BadValueException(Problem.quote(t) + " is not valid (expected " + c.description()
                        .replaceAll("\\.$", "").toLowerCase(Locale.ROOT) + ")");
            }
        }
        return v;
    }

    /** Whether {@link #SPACE} would find anything (it matches exactly the characters below). */
    private static boolean hasWhitespace(String v) {
        for (int i = 0; i < v.length(); i++) {
            char ch = v.charAt(i);
            if (ch == ' ' || ch == '\t' || ch == '\n' || ch == 0x0B || ch == '\f' || ch == '\r') {
                return true;
            }
        }
        return false;
    }

    private static String choice(Column c, String t) throws BadValueException {
        String v = t.toLowerCase(Locale.ROOT);
        java.util.List<String> choices = c.choices();
        if (choices.size() == 2 && choices.get(0).equals("yes") && choices.get(1).equals("no")) {
            v = switch (v) {
                case "y", "true", "1", "yes" -> "yes";
                case "n", "false", "0", "no" -> "no";
                default -> v;
            };
        }
        if (!c.choices().contains(v)) {
            String tolerant = tolerantChoice(c, t);
            if (tolerant != null) {
                return tolerant;
            }
            throw new BadValueException(Problem.quote(t) + " is not one of the allowed values (expected one of "
                    + String.join(", ", c.choices()) + ")");
        }
        return v;
    }

    /**
     * A choice as people write it: the choice or one of its {@code x-choice-words} compared with case,
     * spaces, underscores, dots, brackets and inner hyphens ignored ({@code Low side} = {@code low-side},
     * {@code N-ch} = {@code n}, {@code EOL} = {@code obsolete}); null when none is meant.
     */
    static String tolerantChoice(Column c, String t) {
        String n = Headings.normalise(t);
        if (n.isEmpty()) {
            return null;
        }
        for (String choice : c.choices()) {
            if (Headings.normalise(choice).equals(n)) {
                return choice;
            }
        }
        for (java.util.Map.Entry<String, String> w : c.choiceWords().entrySet()) {
            if (Headings.normalise(w.getKey()).equals(n)) {
                return w.getValue();
            }
        }
        return null;
    }

    private static final String NUM = "(\\d+(?:[.,]\\d+)?|[.,]\\d+)\\s*([a-zA-Zµμ]*)";
    private static final java.util.regex.Pattern PLUS_MINUS = java.util.regex.Pattern.compile(
            "^(?:±|\\+/-|\\+-|\\+ / -)\\s*" + NUM + "$");
    private static final java.util.regex.Pattern PLUS_SLASH_MINUS = java.util.regex.Pattern.compile(
            "^\\+?\\s*" + NUM + "\\s*/\\s*-\\s*" + NUM + "$");
    private static final java.util.regex.Pattern MINUS_SLASH_PLUS = java.util.regex.Pattern.compile(
            "^-\\s*" + NUM + "\\s*/\\s*\\+?\\s*" + NUM + "$");

    /**
     * A gate-limit cell that gives both limits: {@code ±20} (also {@code +/-20}, {@code +-20}) is
     * +20 and −20; {@code +22/-8} and {@code -8/+22} are +22 and −8. Returns the positive and the
     * negative limit as cell texts, or null for any other cell.
     */
    public static String[] gateLimits(String cell) {
        String t = cell.strip();
        java.util.regex.Matcher m = PLUS_MINUS.matcher(t);
        if (m.matches()) {
            return new String[] {m.group(1) + m.group(2), "-" + m.group(1) + m.group(2)};
        }
        m = PLUS_SLASH_MINUS.matcher(t);
        if (m.matches()) {
            return new String[] {m.group(1) + m.group(2), "-" + m.group(3) + m.group(4)};
        }
        m = MINUS_SLASH_PLUS.matcher(t);
        if (m.matches()) {
            return new String[] {m.group(3) + m.group(4), "-" + m.group(1) + m.group(2)};
        }
        return null;
    }

    private static final java.util.regex.Pattern WITH_CHANNEL = java.util.regex.Pattern.compile(
            "^(.*?)[\\s,/(-]*\\b([np])[\\s-]?(?:ch|chan|channel)\\b\\.?\\)?$", java.util.regex.Pattern.CASE_INSENSITIVE);

    /**
     * A technology cell that also names the channel ({@code Si MOSFET P-ch}, {@code SiC N-channel}):
     * the technology's text and the channel ({@code n} or {@code p}), or null for any other cell.
     */
    public static String[] technologyWithChannel(String cell) {
        java.util.regex.Matcher m = WITH_CHANNEL.matcher(cell.strip());
        if (!m.matches() || m.group(1).isBlank()) {
            return null;
        }
        return new String[] {m.group(1).strip(), m.group(2).toLowerCase(Locale.ROOT)};
    }

    private static double plainNumber(Column c, String t, boolean decimalComma) throws BadValueException {
        Units.checkLength(t, c.expectation());
        String s = decimalComma ? t.replace(',', '.') : t;
        if (Units.plainDecimal(s)) {
            return Units.plainDecimalValue(s); // what the pattern and parseDouble below give, without them
        }
        try {
            if (!PLAIN.matcher(s).matches()) {
                throw new NumberFormatException();
            }
            double d = Double.parseDouble(s);
            if (!Double.isFinite(d)) {
                throw new NumberFormatException();
            }
            return d;
        } catch (NumberFormatException e) {
            throw new BadValueException(Problem.quote(t) + " is not a number (expected " + c.expectation() + ")");
        }
    }

    private static void checkBounds(Column c, double v, String t) throws BadValueException {
        if (c.minimum() != null) {
            double min = c.minimum();
            if (c.minExclusive() ? v <= min : v < min) {
                String rel = c.minExclusive() ? "above " : "at least ";
                throw new BadValueException(Problem.quote(t) + " is out of range (expected a value " + rel
                        + Numbers.format(min) + unitSuffix(c) + ")");
            }
        }
        if (c.maximum() != null && v > c.maximum()) {
            throw new BadValueException(Problem.quote(t) + " is out of range (expected a value at most "
                    + Numbers.format(c.maximum()) + unitSuffix(c) + ")");
        }
    }

    /** " nC" for messages, or empty for a column without unit (only built when a bound fails). */
    private static String unitSuffix(Column c) {
        return c.unitSymbol().isEmpty() ? "" : " " + c.unitSymbol();
    }
}
