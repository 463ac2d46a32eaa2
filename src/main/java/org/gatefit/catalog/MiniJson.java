package org.gatefit.catalog;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A small strict JSON (RFC 8259) reader for the bundled schema files, so loading a schema does not
 * start a general JSON library on every command's start-up path. Objects become ordered maps,
 * arrays lists, strings {@link String}, {@code true}/{@code false} {@link Boolean}, {@code null}
 * {@code null}, and numbers {@link Num} (the literal text, as written).
 */
public final class MiniJson {
    /** A JSON number as written, e.g. {@code 0}, {@code 1e-3}. */
    public record Num(String text) {
        public double doubleValue() {
            return Double.parseDouble(text);
        }

        @Override
        public String toString() {
            return text;
        }
    }

    private final String s;
    private int i;

    private MiniJson(String s) {
        this.s = s;
    }

    /** Parses one JSON value (the whole text); a syntax error names the offset and what was expected. */
    public static Object parse(String text) {
        MiniJson p = new MiniJson(text);
        p.ws();
        Object v = p.value();
        p.ws();
        if (p.i != text.length()) {
            throw p.error("end of input");
        }
        return v;
    }

    private IllegalArgumentException error(String expected) {
        String got = i >= s.length() ? "end of input" : "'" + s.charAt(i) + "'";
        return new IllegalArgumentException("JSON at offset " + i + ": expected " + expected + ", got " + got);
    }

    private void ws() {
        while (i < s.length()) {
            char c = s.charAt(i);
            if (c == ' ' || c == '\t' || c == '\n' || c == '\r') {
                i++;
            } else {
                return;
            }
        }
    }

    private Object value() {
        if (i >= s.length()) {
            throw error("a value");
        }
        char c = s.charAt(i);
        switch (c) {
            case '{':
                return object();
            case '[':
                return array();
            case '"':
                return string();
            case 't':
                return word("true", Boolean.TRUE);
            case 'f':
                return word("false", Boolean.FALSE);
            case 'n':
                return word("null", null);
            default:
                if (c == '-' || (c >= '0' && c <= '9')) {
                    return number();
                }
                throw error("a value");
        }
    }

    private Object word(String w, Object v) {
        if (!s.startsWith(w, i)) {
            throw error("'" + w + "'");
        }
        i += w.length();
        return v;
    }

    private Map<String, Object> object() {
        Map<String, Object> m = new LinkedHashMap<>();
        i++;
        ws();
        if (i < s.length() && s.charAt(i) == '}') {
            i++;
            return m;
        }
        while (true) {
            ws();
            if (i >= s.length() || s.charAt(i) != '"') {
                throw error("a member name in double quotes");
            }
            String k = string();
            ws();
            if (i >= s.length() || s.charAt(i) != ':') {
                throw error("':'");
            }
            i++;
            ws();
            if (m.containsKey(k)) {
                throw new IllegalArgumentException("JSON at offset " + i + ": duplicate member \"" + k + "\"");
            }
            m.put(k, value());
            ws();
            if (i < s.length() && s.charAt(i) == ',') {
                i++;
            } else if (i < s.length() && s.charAt(i) == '}') {
                i++;
                return m;
            } else {
                throw error("',' or '}'");
            }
        }
    }

    private List<Object> array() {
        List<Object> a = new ArrayList<>();
        i++;
        ws();
        if (i < s.length() && s.charAt(i) == ']') {
            i++;
            return a;
        }
        while (true) {
            ws();
            a.add(value());
            ws();
            if (i < s.length() && s.charAt(i) == ',') {
                i++;
            } else if (i < s.length() && s.charAt(i) == ']') {
                i++;
                return a;
            } else {
                throw error("',' or ']'");
            }
        }
    }

    private String string() {
        StringBuilder b = new StringBuilder();
        i++;
        while (true) {
            if (i >= s.length()) {
                throw error("a closing '\"'");
            }
            char c = s.charAt(i++);
            if (c == '"') {
                return b.toString();
            }
            if (c < 0x20) {
                i--;
                throw error("an escaped control character");
            }
            if (c != '\\') {
                b.append(c);
                continue;
            }
            if (i >= s.length()) {
                throw error("an escape");
            }
            char e = s.charAt(i++);
            switch (e) {
                case '"' -> b.append('"');
                case '\\' -> b.append('\\');
                case '/' -> b.append('/');
                case 'b' -> b.append('\b');
                case 'f' -> b.append('\f');
                case 'n' -> b.append('\n');
                case 'r' -> b.append('\r');
                case 't' -> b.append('\t');
                case 'u' -> {
                    if (i + 4 > s.length()) {
                        throw error("four hex digits");
                    }
                    try {
                        b.append((char) Integer.parseInt(s.substring(i, i + 4), 16));
                    } catch (NumberFormatException x) {
                        throw error("four hex digits");
                    }
                    i += 4;
                }
                default -> {
                    i--;
                    throw error("one of \\\" \\\\ \\/ \\b \\f \\n \\r \\t \\u");
                }
            }
        }
    }

    private Num number() {
        int start = i;
        if (s.charAt(i) == '-') {
            i++;
        }
        if (i < s.length() && s.charAt(i) == '0') {
            i++;
        } else if (i < s.length() && s.charAt(i) >= '1' && s.charAt(i) <= '9') {
            digits();
        } else {
            throw error("a digit");
        }
        if (i < s.length() && s.charAt(i) == '.') {
            i++;
            if (i >= s.length() || !Character.isDigit(s.charAt(i))) {
                throw error("a digit after '.'");
            }
            digits();
        }
        if (i < s.length() && (s.charAt(i) == 'e' || s.charAt(i) == 'E')) {
            i++;
            if (i < s.length() && (s.charAt(i) == '+' || s.charAt(i) == '-')) {
                i++;
            }
            if (i >= s.length() || !Character.isDigit(s.charAt(i))) {
                throw error("a digit in the exponent");
            }
            digits();
        }
        return new Num(s.substring(start, i));
    }

    private void digits() {
        while (i < s.length() && s.charAt(i) >= '0' && s.charAt(i) <= '9') {
            i++;
        }
    }
}
