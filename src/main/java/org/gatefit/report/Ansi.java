package org.gatefit.report;

import java.util.Locale;
import org.gatefit.match.Verdict;

/**
 * ANSI colours for verdicts in text output on a terminal. Callers decide whether colour is wanted
 * (standard output a terminal, {@code NO_COLOR} unset, no {@code --output} file); the words and
 * symbols stay, so colour only adds to them.
 */
public final class Ansi {
    static final String RESET = "\u001b[0m";

    private Ansi() {
    }

    static String code(Verdict v) {
        return switch (v) {
            case PASS -> "\u001b[32m";
            case WARN -> "\u001b[33m";
            case UNKNOWN -> "\u001b[36m";
            case FAIL -> "\u001b[1;31m";
        };
    }

    /** {@code text} in the colour of {@code v}. */
    static String paint(Verdict v, String text) {
        return code(v) + text + RESET;
    }

    /** {@code text} in the colour of the verdict word it holds (fail, unknown, warn, pass), else as it is. */
    static String paintByWord(String text) {
        String t = text.toLowerCase(Locale.ROOT);
        for (Verdict v : new Verdict[] {Verdict.FAIL, Verdict.UNKNOWN, Verdict.WARN, Verdict.PASS}) {
            if (t.contains(v.id())) {
                return paint(v, text);
            }
        }
        return text;
    }
}
