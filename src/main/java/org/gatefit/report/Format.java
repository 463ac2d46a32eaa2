package org.gatefit.report;

import java.util.Locale;

/** Output formats of every command that prints results. */
public enum Format {
    TEXT, JSON, CSV, MARKDOWN, HTML, SPICE;

    /** The commands whose results have an HTML report. */
    public static final java.util.List<String> HTML_COMMANDS = java.util.List.of("explain", "shortlist", "check", "replace");

    /** The commands that write a SPICE netlist (the gate loop of one pair). */
    public static final java.util.List<String> SPICE_COMMANDS = java.util.List.of("explain");

    /** The commands that make this format: every command for text, JSON, CSV and Markdown. */
    public java.util.List<String> commands() {
        return this == HTML ? HTML_COMMANDS : this == SPICE ? SPICE_COMMANDS : null;
    }

    /** Whether {@code command} makes this format. */
    public boolean madeBy(String command) {
        return commands() == null || commands().contains(command);
    }

    /** The error of a renderer without an HTML report (the command line rejects the format before this). */
    static IllegalArgumentException noHtml(String command) {
        return new IllegalArgumentException("--format html is not available for " + command + "; it is for "
                + String.join(", ", HTML_COMMANDS));
    }

    /** Parses {@code text}, {@code json}, {@code csv}, {@code markdown} (also {@code md}), {@code html} or {@code spice}. */
    public static Format of(String s) {
        return switch (s.strip().toLowerCase(Locale.ROOT)) {
            case "text", "txt" -> TEXT;
            case "json" -> JSON;
            case "csv" -> CSV;
            case "markdown", "md" -> MARKDOWN;
            case "html", "htm" -> HTML;
            case "spice", "cir" -> SPICE;
            default -> throw new IllegalArgumentException("expected text, json, csv, markdown, html or spice, got '" + s + "'");
        };
    }

    @Override
    public String toString() {
        return name().toLowerCase(Locale.ROOT);
    }
}
