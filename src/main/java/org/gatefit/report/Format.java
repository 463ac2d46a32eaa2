package org.gatefit.report;

import java.util.Locale;

/** Output formats of every command that prints results. */
public enum Format {
    TEXT, JSON, CSV, MARKDOWN;

    /** Parses {@code text}, {@code json}, {@code csv} or {@code markdown} (also {@code md}). */
    public static Format of(String s) {
        return switch (s.strip().toLowerCase(Locale.ROOT)) {
            case "text", "txt" -> TEXT;
            case "json" -> JSON;
            case "csv" -> CSV;
            case "markdown", "md" -> MARKDOWN;
            default -> throw new IllegalArgumentException("expected text, json, csv or markdown, got '" + s + "'");
        };
    }

    @Override
    public String toString() {
        return name().toLowerCase(Locale.ROOT);
    }
}
