package org.gatefit.catalog;

import java.util.ArrayList;
import java.util.List;

/**
 * The column tables of {@code catalog-schema/README.md}, rendered from the schema files so the
 * documentation cannot drift from what the importer reads (a test compares the two).
 */
public final class SchemaDoc {
    private SchemaDoc() {
    }

    /** The Markdown table of one kind's columns. */
    public static String table(Kind kind) {
        StringBuilder sb = new StringBuilder();
        sb.append("| column | unit | required | values | meaning | headings also read |\n");
        sb.append("| --- | --- | --- | --- | --- | --- |\n");
        for (Column c : Schema.of(kind).columns()) {
            sb.append("| `").append(c.name()).append("` | ").append(c.unitSymbol().isEmpty() ? "" : c.unitSymbol())
                    .append(" | ").append(c.required() ? "yes" : "").append(" | ").append(values(c)).append(" | ")
                    .append(c.description().replace("|", "\\|")).append(" | ")
                    .append(String.join(", ", c.headings().stream().map(SchemaDoc::code).toList())).append(" |\n");
        }
        return sb.toString();
    }

    /** Text as Markdown code, a pipe escaped. */
    private static String code(String s) {
        return "`" + s.replace("|", "\\|") + "`";
    }

    /** " (Si MOSFET, MOSFET)": the other ways people write a choice, or empty. */
    private static String words(Column c, String choice) {
        List<String> w = c.choiceWords().entrySet().stream().filter(e -> e.getValue().equals(choice))
                .map(e -> e.getKey().replace("|", "\\|")).toList();
        return w.isEmpty() ? "" : " (" + String.join(", ", w) + ")";
    }

    private static String values(Column c) {
        List<String> parts = new ArrayList<>();
        switch (c.type()) {
            case TEXT -> parts.add(c.pattern() == null ? "text" : "text, `" + c.pattern().pattern().replace("|", "\\|") + "`");
            case CHOICE -> parts.add(String.join(", ", c.choices().stream().map(x -> "`" + x + "`" + words(c, x)).toList()));
            case INTEGER -> parts.add("integer");
            case NUMBER -> parts.add("number");
        }
        if (c.minimum() != null) {
            parts.add((c.minExclusive() ? "> " : "≥ ") + Numbers.format(c.minimum()));
        }
        if (c.maximum() != null) {
            parts.add("≤ " + Numbers.format(c.maximum()));
        }
        if (c.defaultValue() != null) {
            parts.add("default `" + c.defaultValue() + "`");
        }
        if (c.wordsOnly()) {
            parts.add("searched by words only");
        }
        if (c.defaultFrom() != null) {
            parts.add("default: `" + c.defaultFrom() + "`");
        }
        return String.join("; ", parts);
    }
}
