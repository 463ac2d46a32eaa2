package org.gatefit.catalog;

import java.util.Locale;

/**
 * Reads one cell for one column into its canonical value ({@link Row}) and applies the schema's
 * bounds. Also used for values typed on the command line, so both read the same way.
 */
public final class Cells {
    /** Characters that make a spreadsheet run a cell as a formula (OWASP CSV injection guidance). */
    static final String FORMULA_START = "=+-@\t\r";
    private static final java.util.regex.Pattern SPACE = java.util.regex.Pattern.compile("\\s+");
    private static final java.util.regex.Pattern PLAIN = java.util.regex.Pattern.compile("[+-]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][+-]?\\d+)?");

    private Cells() {
    }

    /**
     * Parses a cell. Returns null for an empty cell (unknown); the caller decides whether that is
     * allowed.
     */
    public static Object parse(Column c, String raw, boolean decimalComma) throws BadValueException {
        String t = raw == null ? "" : raw.strip();
        if (t.isEmpty()) {
            return null;
        }
        return switch (c.type()) {
            case TEXT -> text(c, raw.strip());
            case CHOICE -> choice(c, t);
            case NUMBER -> {
                double v = c.unit() == null ? plainNumber(c, t, decimalComma) : Units.parse(t, c.unit(), decimalComma);
                checkBounds(c, v, t);
                yield v;
            }
            case INTEGER -> {
                long v = Units.parseInteger(t);
                checkBounds(c, v, t);
                yield v;
            }
        };
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

    private static String text(Column c, String t) throws BadValueException {
        String v = restoreText(t);
        if (c.pattern() != null) {
            v = v.toLowerCase(Locale.ROOT);
            if (hasWhitespace(v)) {
                v = SPACE.matcher(v).replaceAll("");
            }
            if (!c.pattern().matcher(v).matches()) {
                throw new BadValueException("'" + t + "' is not valid (expected " + c.description()
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
            throw new BadValueException("'" + t + "' is not one of the allowed values (expected one of "
                    + String.join(", ", c.choices()) + ")");
        }
        return v;
    }

    private static double plainNumber(Column c, String t, boolean decimalComma) throws BadValueException {
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
            throw new BadValueException("'" + t + "' is not a number (expected " + c.expectation() + ")");
        }
    }

    private static void checkBounds(Column c, double v, String t) throws BadValueException {
        if (c.minimum() != null) {
            double min = c.minimum();
            if (c.minExclusive() ? v <= min : v < min) {
                String rel = c.minExclusive() ? "above " : "at least ";
                throw new BadValueException("'" + t + "' is out of range (expected a value " + rel
                        + Numbers.format(min) + unitSuffix(c) + ")");
            }
        }
        if (c.maximum() != null && v > c.maximum()) {
            throw new BadValueException("'" + t + "' is out of range (expected a value at most "
                    + Numbers.format(c.maximum()) + unitSuffix(c) + ")");
        }
    }

    /** " nC" for messages, or empty for a column without unit (only built when a bound fails). */
    private static String unitSuffix(Column c) {
        return c.unitSymbol().isEmpty() ? "" : " " + c.unitSymbol();
    }
}
