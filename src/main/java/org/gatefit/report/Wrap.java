package org.gatefit.report;

/** Word wrapping for text reports. */
final class Wrap {
    private Wrap() {
    }

    /** Wraps {@code text} to {@code width}, every line after the first indented by {@code indent} spaces. */
    static String wrap(String text, int width, int indent) {
        StringBuilder out = new StringBuilder();
        int col = 0;
        String pad = " ".repeat(indent);
        for (String word : text.split(" ")) {
            if (col > 0 && col + 1 + word.length() > width) {
                out.append('\n').append(pad);
                col = indent;
            } else if (col > 0) {
                out.append(' ');
                col++;
            }
            out.append(word);
            col += word.length();
        }
        return out.toString();
    }
}
