package org.gatefit.report;

import java.util.Locale;

/** Output formats of every command that prints results. */
public enum Format {
    TEXT, JSON, CSV, MARKDOWN, HTML;

    /** The commands whose results have an HTML report. */
    public static final java.util.List<String> HTML_COMMANDS = java.util.List.of("explain", "shortlist", "check", "replace");

    /** The error of a renderer without an HTML report (the command line rejects the format before this). */
    static IllegalArgumentException noHtml(String command) {
        return new IllegalArgumentException("--format html is not available for " + command + "; it is for "
                + String.join(", ", HTML_COMMANDS));
    }

    /** Parses {@code text}, {@code json}, {@code csv}, {@code markdown} (also {@code md}) or {@code html}. */
    public static Format of(String s) {
        return switch (s.strip().toLowerCase(Locale.ROOT)) {
            case "text", "txt" -> TEXT;
            case "json" -> JSON;
            case "csv" -> CSV;
            case "markdown", "md" -> MARKDOWN;
            case "html", "htm" -> HTML;
            default -> throw new IllegalArgumentException("expected text, json, csv, markdown or html, got '" + s + "'");
        };
    }

    @Override
    public String toString() {
        return name().toLowerCase(Locale.ROOT);
    }
}
