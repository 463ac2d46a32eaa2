package org.gatefit.report;

import java.util.ArrayList;
import java.util.List;

/**
 * A plain-text table: columns padded to their widest cell, numbers right-aligned, cells cut with
 * an ellipsis so that a row fits the given width (100 columns by default).
 */
public final class TextTable {
    private final List<String> headers;
    private final boolean[] right;
    private final List<List<String>> rows = new ArrayList<>();
    private int paintColumn = -1;
    private java.util.function.UnaryOperator<String> painter = java.util.function.UnaryOperator.identity();

    public TextTable(List<String> headers, boolean... rightAligned) {
        this.headers = List.copyOf(headers);
        this.right = new boolean[headers.size()];
        for (int i = 0; i < rightAligned.length && i < right.length; i++) {
            right[i] = rightAligned[i];
        }
    }

    public TextTable add(List<String> cells) {
        if (cells.size() != headers.size()) {
            throw new IllegalArgumentException("expected " + headers.size() + " cells, got " + cells.size());
        }
        rows.add(List.copyOf(cells));
        return this;
    }

    /**
     * Decorates the cells of one column (after padding is worked out, so escape codes take no
     * width), e.g. ANSI colour for verdicts on a terminal.
     */
    public TextTable paint(int column, java.util.function.UnaryOperator<String> p) {
        this.paintColumn = column;
        this.painter = p;
        return this;
    }

    public boolean isEmpty() {
        return rows.isEmpty();
    }

    /**
     * Renders with at most {@code width} characters a line, shrinking the widest columns first
     * (never the first column, which holds the part number or id, nor below a header's length).
     */
    public String render(int width) {
        int n = headers.size();
        int[] w = new int[n];
        for (int i = 0; i < n; i++) {
            w[i] = headers.get(i).length();
            for (List<String> r : rows) {
                w[i] = Math.max(w[i], r.get(i).length());
            }
        }
        int total = (n - 1) * 2;
        for (int x : w) {
            total += x;
        }
        while (total > width) {
            int widest = -1;
            for (int i = 1; i < n; i++) {
                if (w[i] > Math.max(6, headers.get(i).length()) && (widest < 0 || w[i] > w[widest])) {
                    widest = i;
                }
            }
            if (widest < 0) {
                break;
            }
            w[widest]--;
            total--;
        }
        StringBuilder sb = new StringBuilder();
        line(sb, headers, w, new boolean[n], -1, null);
        List<String> rule = new ArrayList<>();
        for (int x : w) {
            rule.add("-".repeat(x));
        }
        line(sb, rule, w, new boolean[n], -1, null);
        for (List<String> r : rows) {
            line(sb, r, w, right, paintColumn, painter);
        }
        return sb.toString();
    }

    private static void line(StringBuilder sb, List<String> cells, int[] w, boolean[] right, int paintColumn,
                             java.util.function.UnaryOperator<String> painter) {
        StringBuilder l = new StringBuilder();
        for (int i = 0; i < cells.size(); i++) {
            String c = cells.get(i);
            if (c.length() > w[i]) {
                c = c.substring(0, Math.max(0, w[i] - 1)) + "…";
            }
            String pad = " ".repeat(w[i] - c.length());
            if (i > 0) {
                l.append("  ");
            }
            String shown = i == paintColumn && !c.isEmpty() ? painter.apply(c) : c;
            l.append(right[i] ? pad + shown : shown + (i == cells.size() - 1 ? "" : pad));
        }
        sb.append(l.toString().stripTrailing()).append('\n');
    }

    /** Renders as a GitHub-flavoured Markdown table (pipes in cells escaped). */
    public String markdown() {
        StringBuilder sb = new StringBuilder();
        mdLine(sb, headers);
        StringBuilder rule = new StringBuilder("|");
        for (int i = 0; i < headers.size(); i++) {
            rule.append(right[i] ? " ---: |" : " --- |");
        }
        sb.append(rule).append('\n');
        for (List<String> r : rows) {
            mdLine(sb, r);
        }
        return sb.toString();
    }

    private static void mdLine(StringBuilder sb, List<String> cells) {
        sb.append('|');
        for (String c : cells) {
            sb.append(' ').append(Markdown.escape(c)).append(" |");
        }
        sb.append('\n');
    }
}
