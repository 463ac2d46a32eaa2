package org.gatefit.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Issue 14, finding 8: {@link Html#esc} (HTML and JUnit XML) and {@link Html#xmlChars} (the charts'
 * SVG) drop every character XML 1.0 forbids. The allowed set is XML 1.0 (fifth edition) §2.2,
 * production [2] Char: #x9 | #xA | #xD | [#x20-#xD7FF] | [#xE000-#xFFFD] | [#x10000-#x10FFFF].
 */
class XmlEscapeTest {
    /** columns: text as hex UTF-16 units, what esc keeps (hex), what the rule is */
    @ParameterizedTest(name = "{2}")
    @CsvSource(delimiter = '|', textBlock = """
            0041 FFFE 0042 | 0041 0042           | U+FFFE is no XML character
            0041 FFFF 0042 | 0041 0042           | U+FFFF is no XML character
            0000 0001 001F | ''                  | C0 controls other than tab, LF, CR are none
            0009 000A      | 0009 000A           | tab and line feed are kept
            D800 0041      | 0041                | a lone high surrogate is dropped
            0041 DC00      | 0041                | a lone low surrogate is dropped
            DC00 D800      | ''                  | a low before a high surrogate is no pair
            D83D DE00      | D83D DE00           | a surrogate pair (U+1F600) is kept
            E000 FFFD      | E000 FFFD           | the private-use area up to U+FFFD is allowed
            007F 0085      | 007F 0085           | DEL and C1 controls are XML characters (discouraged, allowed)
            """)
    void escDropsWhatXmlForbidsAndKeepsTheRest(String in, String kept, String rule) {
        assertEquals(text(kept), Html.esc(text(in)), rule);
        assertEquals(text(kept), Html.xmlChars(text(in)), rule);
    }

    private static String text(String hex) {
        StringBuilder sb = new StringBuilder();
        for (String h : hex.trim().split("\\s+")) {
            if (!h.isEmpty()) {
                sb.append((char) Integer.parseInt(h, 16));
            }
        }
        return sb.toString();
    }
}
