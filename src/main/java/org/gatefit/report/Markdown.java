package org.gatefit.report;

/** Escaping of catalog text for Markdown output. */
public final class Markdown {
    private Markdown() {
    }

    /** Escapes characters that would change a table cell or inline markup; newlines become spaces. */
    public static String escape(String s) {
        StringBuilder sb = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '|', '\\', '*', '_', '`', '[', ']', '<', '>', '#' -> sb.append('\\').append(c);
                case '\n', '\r' -> sb.append(' ');
                default -> sb.append(c);
            }
        }
        return sb.toString();
    }
}
