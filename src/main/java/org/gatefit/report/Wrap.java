package org.gatefit.report;

/** Word wrapping for text reports. */
final class Wrap {
    private Wrap() {
    }

    /** Wraps {@code text} to {@code width}, every line after the first indented by {@code indent} spaces. */
    static String wrap(String text, int width, int indent) {
        return wrap(text, width, indent, 0);
    }

    /**
     * Wraps {@code text} that starts at column {@code startColumn} of a line (after a label), so
     * that no line passes {@code width}; continuation lines are indented by {@code indent}.
     */
    static String wrap(String text, int width, int indent, int startColumn) {
        StringBuilder out = new StringBuilder();
        int col = startColumn;
        boolean first = true;
        String pad = " ".repeat(indent);
        for (String word : text.split(" ")) {
            if (!first && col + 1 + word.length() > width) {
                out.append('\n').append(pad);
                col = indent;
            } else if (!first) {
                out.append(' ');
                col++;
            }
            first = false;
            out.append(word);
            col += word.length();
        }
        return out.toString();
    }
}
