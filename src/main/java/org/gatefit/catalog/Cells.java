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
            v = SPACE.matcher(v.toLowerCase(Locale.ROOT)).replaceAll("");
            if (!c.pattern().matcher(v).matches()) {
                throw new BadValueException("'" + t + "' is not valid (expected " + c.description()
                        .replaceAll("\\.$", "").toLowerCase(Locale.ROOT) + ")");
            }
        }
        return v;
    }

    private static String choice(Column c, String t) throws BadValueException {
        String v = t.toLowerCase(Locale.ROOT);
        if (c.choices().equals(java.util.List.of("yes", "no"))) {
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
        String unit = c.unitSymbol().isEmpty() ? "" : " " + c.unitSymbol();
        if (c.minimum() != null) {
            double min = c.minimum();
            if (c.minExclusive() ? v <= min : v < min) {
                String rel = c.minExclusive() ? "above " : "at least ";
                throw new BadValueException("'" + t + "' is out of range (expected a value " + rel
                        + Numbers.format(min) + unit + ")");
            }
        }
        if (c.maximum() != null && v > c.maximum()) {
            throw new BadValueException("'" + t + "' is out of range (expected a value at most "
                    + Numbers.format(c.maximum()) + unit + ")");
        }
    }
}
