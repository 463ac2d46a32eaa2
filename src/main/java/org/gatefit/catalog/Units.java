package org.gatefit.catalog;

import java.math.BigDecimal;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Parses quantities as people write them in catalog cells and on the command line.
 *
 * <ul>
 *   <li>A bare number is in the column's unit: {@code 130} in {@code q_g_nc} is 130 nC.</li>
 *   <li>A number may carry a unit with an SI prefix, with or without a space: {@code 130nC},
 *       {@code 0.13 uC}, {@code 4.7µF}, {@code 100kHz}, {@code 50 ns}. The prefix alone also works:
 *       {@code 130 n} in a charge column is 130 nC.</li>
 *   <li>Resistance may use the IEC 60062 letter-and-digit code, where the letter marks the decimal
 *       point and the multiplier: R (×1), K or k (×10³), M (×10⁶), G (×10⁹), T (×10¹²), e.g.
 *       {@code 4k7} = 4.7 kΩ, {@code 2R2} = 2.2 Ω, {@code R47} = 0.47 Ω, {@code 1M0} = 1 MΩ.
 *       Capacitance may use the same code with p, n, u/µ, m: {@code 4n7} = 4.7 nF.</li>
 *   <li>A ratio column accepts a per-cent sign: {@code 95%} = 0.95.</li>
 *   <li>A unit of another dimension ({@code 12 A} in a volts column) is an error, as are NaN,
 *       infinities and text that is not a number.</li>
 * </ul>
 *
 * Scaling between prefixes is done in decimal ({@link BigDecimal}), so {@code 0.13 uC} becomes
 * exactly the double nearest 130 in a nanocoulomb column.
 */
public final class Units {

    private static final Pattern NUMBER =
            Pattern.compile("^([+-]?(?:\\d+(?:[.,]\\d*)?|[.,]\\d+)(?:[eE][+-]?\\d+)?)\\s*(.*)$");
    private static final Pattern RES_CODE = Pattern.compile("^(\\d*)([RKkMGT])(\\d*)$");
    private static final Pattern CAP_CODE = Pattern.compile("^(\\d+)([pnuµμm])(\\d+)$");

    private Units() {
    }

    /**
     * Parses {@code text} for a column in {@code unit} and returns the value in that unit.
     *
     * @param decimalComma whether a comma may stand for the decimal point (files separated by
     *                     semicolons or tabs, as spreadsheets in many locales write them)
     */
    public static double parse(String text, Unit unit, boolean decimalComma) throws BadValueException {
        checkLength(text.strip(), expectation(unit, null));
        try {
            return parseNumber(text, unit, decimalComma);
        } catch (NumberFormatException | ArithmeticException e) {
            // BigDecimal refuses exponents beyond int range ("1e99999999999") and scale overflow.
            throw new BadValueException(Problem.quote(text) + " is out of range (expected " + expectation(unit, null) + ")");
        }
    }

    private static double parseNumber(String text, Unit unit, boolean decimalComma) throws BadValueException {
        String t = text.strip();
        if (plainDecimal(t)) {
            // A bare number is already in the column's unit; parseDouble rounds correctly, as BigDecimal would.
            double d = plainDecimalValue(t);
            return d == 0 ? 0.0 : d;
        }
        if (t.isEmpty()) {
            throw new BadValueException("empty value (expected " + expectation(unit, null) + ")");
        }
        BigDecimal code = iecCode(t, unit.dimension());
        if (code != null) {
            return finish(code, 0, unit, text);
        }
        Matcher m = NUMBER.matcher(t);
        if (!m.matches()) {
            throw new BadValueException(Problem.quote(text) + " is not a number (expected " + expectation(unit, null) + ")");
        }
        String num = m.group(1);
        if (num.indexOf(',') >= 0) {
            if (!decimalComma) {
                throw new BadValueException(Problem.quote(text) + " uses a comma as decimal mark; in a comma-separated file"
                        + " write a point (expected " + expectation(unit, null) + ")");
            }
            num = num.replace(',', '.');
        }
        BigDecimal value = new BigDecimal(num);
        String suffix = m.group(2).strip();
        if (suffix.isEmpty()) {
            return finish(value, unit.exponent(), unit, text);
        }
        if (suffix.equals("%")) {
            if (unit.dimension() != Dimension.RATIO) {
                throw new BadValueException(Problem.quote(text) + " is a percentage, but this column is in "
                        + unit.plural() + " (expected " + expectation(unit, null) + ")");
            }
            return finish(value.movePointLeft(2), 0, unit, text);
        }
        Integer exponent = suffixExponent(suffix, unit.dimension());
        if (exponent != null) {
            return finish(value, exponent, unit, text);
        }
        for (Dimension other : Dimension.values()) {
            if (other != unit.dimension() && suffixExponent(suffix, other) != null && !isPrefixOnly(suffix)) {
                throw new BadValueException(Problem.quote(text) + " is a " + other.quantity() + " (" + suffix
                        + "), but this column is a " + unit.dimension().quantity() + " (expected "
                        + expectation(unit, null) + ")");
            }
        }
        throw new BadValueException(Problem.quote(text) + " has an unknown unit '" + suffix + "' (expected "
                + expectation(unit, null) + ")");
    }

    /** Digits with an optional sign and one decimal point, nothing else (the common case, parsed fast). */
    static boolean plainDecimal(String t) {
        int n = t.length();
        if (n == 0 || n > 18) {
            return false;
        }
        int i = t.charAt(0) == '-' || t.charAt(0) == '+' ? 1 : 0;
        boolean digit = false;
        boolean point = false;
        for (; i < n; i++) {
            char c = t.charAt(i);
            if (c >= '0' && c <= '9') {
                digit = true;
            } else if (c == '.' && !point) {
                point = true;
            } else {
                return false;
            }
        }
        return digit;
    }

    /** Exact powers of ten as doubles (10^0 to 10^22 are all exactly representable in binary64). */
    private static final double[] EXACT_POW10 = new double[23];

    static {
        double p = 1;
        for (int i = 0; i < EXACT_POW10.length; i++) {
            EXACT_POW10[i] = p;
            p *= 10;
        }
    }

    /** 10^n for 0 ≤ n ≤ 22, exactly. */
    static double exactPow10(int n) {
        return EXACT_POW10[n];
    }

    /**
     * The double nearest a {@link #plainDecimal} text, as {@link Double#parseDouble} gives it. With
     * at most 15 digits the digits form an integer below 2^53 and the power of ten is exact, so one
     * IEEE division is correctly rounded (the classic exact fast path); longer texts go to
     * {@code parseDouble}.
     */
    static double plainDecimalValue(String t) {
        int n = t.length();
        int i = 0;
        boolean negative = false;
        char first = t.charAt(0);
        if (first == '-' || first == '+') {
            negative = first == '-';
            i = 1;
        }
        long m = 0;
        int digits = 0;
        int fraction = -1;
        for (; i < n; i++) {
            char c = t.charAt(i);
            if (c == '.') {
                fraction = 0;
                continue;
            }
            m = m * 10 + (c - '0');
            digits++;
            if (fraction >= 0) {
                fraction++;
            }
        }
        if (digits > 15) {
            return Double.parseDouble(t);
        }
        double d = fraction > 0 ? m / EXACT_POW10[fraction] : (double) m;
        return negative ? -d : d;
    }

    /**
     * Longest number a cell or option may hold, in characters (after surrounding spaces are
     * removed). A double has 17 significant digits; 100 characters leave room for leading zeros,
     * an exponent and a unit. Longer text is refused before it is parsed: {@link BigDecimal}'s
     * parsing grows with the square of the digits (a million digits took 15 s).
     */
    public static final int MAX_NUMBER_CHARS = 100;

    /** Refuses a number longer than {@link #MAX_NUMBER_CHARS}; {@code expected} words what the column takes. */
    static void checkLength(String t, String expected) throws BadValueException {
        if (t.length() > MAX_NUMBER_CHARS) {
            throw new BadValueException(Problem.quote(t) + " is too long for a number (expected at most "
                    + MAX_NUMBER_CHARS + " characters: " + expected + ")");
        }
    }

    /** Parses a whole non-negative or signed count, e.g. stock; a point with zeros after it is accepted. */
    public static long parseInteger(String text) throws BadValueException {
        String t = text.strip();
        checkLength(t, "an integer, e.g. 1200");
        int n = t.length();
        if (n > 0 && n <= 18) {
            // Plain digits with an optional sign (the common case): the same value BigDecimal gives.
            int i = t.charAt(0) == '-' || t.charAt(0) == '+' ? 1 : 0;
            long v = 0;
            boolean digits = i < n;
            for (int j = i; j < n && digits; j++) {
                char c = t.charAt(j);
                if (c >= '0' && c <= '9') {
                    v = v * 10 + (c - '0');
                } else {
                    digits = false;
                }
            }
            if (digits) {
                return t.charAt(0) == '-' ? -v : v;
            }
        }
        try {
            BigDecimal d = new BigDecimal(t);
            return d.longValueExact();
        } catch (NumberFormatException | ArithmeticException e) {
            throw new BadValueException(Problem.quote(text) + " is not a whole number (expected an integer, e.g. 1200)");
        }
    }

    /**
     * What a column expects, for messages: {@code nanocoulombs, e.g. 130 or 130nC}.
     *
     * @param example an example value in the column's unit, or null for a generic one
     */
    public static String expectation(Unit unit, Double example) {
        String ex = example == null ? "1.5" : Numbers.format(example);
        if (unit.dimension() == Dimension.RATIO) {
            return "a fraction from 0 to 1, e.g. 0.95 or 95%";
        }
        return unit.plural() + ", e.g. " + ex + " or " + ex + unit.symbol();
    }

    /**
     * The power of ten a unit written in a heading or a units row stands for in a column of
     * {@code dim} ({@code mΩ}, {@code mOhm}, {@code Ω}, {@code nC}, {@code kHz}, {@code %} for a
     * fraction), or null when the text is no unit of it; a prefix alone ({@code m}) is no unit here.
     */
    public static Integer headingExponent(String text, Dimension dim) {
        String t = text.strip();
        if (t.isEmpty()) {
            return null;
        }
        if (dim == Dimension.RATIO) {
            return t.equals("%") ? Integer.valueOf(-2) : t.equals("1") ? Integer.valueOf(0) : null;
        }
        if (isPrefixOnly(t)) {
            return null;
        }
        return suffixExponent(t, dim);
    }

    /** The dimension a heading's unit belongs to (the first that reads it), or null. */
    public static Dimension headingDimension(String text) {
        for (Dimension d : Dimension.values()) {
            if (headingExponent(text, d) != null) {
                return d;
            }
        }
        return null;
    }

    /**
     * Parses {@code text} for a column in {@code unit} where a bare number is in {@code 10^bareExponent}
     * of the base unit (the unit a heading such as {@code Rds(on) (Ω)} gives), not in the column's
     * own unit; a cell with its own unit reads as always.
     */
    public static double parse(String text, Unit unit, boolean decimalComma, int bareExponent) throws BadValueException {
        if (bareExponent == unit.exponent()) {
            return parse(text, unit, decimalComma);
        }
        checkLength(text.strip(), expectation(unit, null));
        String t = text.strip();
        Matcher m = NUMBER.matcher(t);
        try {
            if (m.matches() && m.group(2).isBlank()) {
                String num = m.group(1);
                if (num.indexOf(',') >= 0) {
                    if (!decimalComma) {
                        throw new BadValueException(Problem.quote(text) + " uses a comma as decimal mark; in a comma-separated"
                                + " file write a point (expected " + expectation(unit, null) + ")");
                    }
                    num = num.replace(',', '.');
                }
                return finish(new BigDecimal(num), bareExponent, unit, text);
            }
            return parseNumber(text, unit, decimalComma);
        } catch (NumberFormatException | ArithmeticException e) {
            throw new BadValueException(Problem.quote(text) + " is out of range (expected " + expectation(unit, null) + ")");
        }
    }

    private static boolean isPrefixOnly(String suffix) {
        return Unit.Prefix.ofSymbol(suffix) != null;
    }

    /** The total power of ten a suffix stands for in a column of {@code dim}, or null if it is no unit of it. */
    private static Integer suffixExponent(String suffix, Dimension dim) {
        if (dim == Dimension.RATIO) {
            return null;
        }
        for (String base : dim.spellings()) {
            if (suffix.endsWith(base)) {
                Unit.Prefix p = Unit.Prefix.ofSymbol(suffix.substring(0, suffix.length() - base.length()));
                if (p != null) {
                    return p.exponent();
                }
            }
        }
        if (dim == Dimension.RESISTANCE) {
            String lower = suffix.toLowerCase(Locale.ROOT);
            for (String base : new String[] {"ohms", "ohm"}) {
                if (lower.endsWith(base)) {
                    String pre = suffix.substring(0, suffix.length() - base.length());
                    Unit.Prefix p = Unit.Prefix.ofSymbol(pre);
                    if (p != null) {
                        return p.exponent();
                    }
                }
            }
        }
        Unit.Prefix p = Unit.Prefix.ofSymbol(suffix);
        if (p != null && p != Unit.Prefix.NONE) {
            return p.exponent();
        }
        return null;
    }

    /** IEC 60062 letter-and-digit code value in base units (Ω or F scaled by the letter), or null. */
    private static BigDecimal iecCode(String t, Dimension dim) {
        Matcher m;
        int exp;
        if (dim == Dimension.RESISTANCE) {
            m = RES_CODE.matcher(t);
            if (!m.matches() || (m.group(1).isEmpty() && m.group(3).isEmpty())) {
                return null;
            }
            exp = switch (m.group(2)) {
                case "R" -> 0;
                case "K", "k" -> 3;
                case "M" -> 6;
                case "G" -> 9;
                case "T" -> 12;
                default -> throw new IllegalStateException(m.group(2));
            };
        } else if (dim == Dimension.CAPACITANCE) {
            m = CAP_CODE.matcher(t);
            if (!m.matches()) {
                return null;
            }
            exp = Unit.Prefix.ofSymbol(m.group(2)).exponent();
        } else {
            return null;
        }
        String digits = (m.group(1).isEmpty() ? "0" : m.group(1)) + "." + (m.group(3).isEmpty() ? "0" : m.group(3));
        return new BigDecimal(digits).scaleByPowerOfTen(exp);
    }

    /** {@code value × 10^valueExp} is the SI value; returns it in the column's unit. */
    private static double finish(BigDecimal value, int valueExp, Unit unit, String text) throws BadValueException {
        BigDecimal inColumn = value.scaleByPowerOfTen(valueExp - unit.exponent());
        double d = inColumn.doubleValue();
        if (!Double.isFinite(d)) {
            throw new BadValueException(Problem.quote(text) + " is out of range (expected " + expectation(unit, null) + ")");
        }
        return d == 0 ? 0.0 : d;
    }
}
