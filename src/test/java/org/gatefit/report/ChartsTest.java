package org.gatefit.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/** Chart layout that does not need a browser: where JFreeChart put each label. */
class ChartsTest {
    /** The y of the baseline of the text {@code label} in {@code svg}. */
    private static double baseline(String svg, String label) {
        Matcher m = Pattern.compile("<text x='[-0-9.]+' y='([-0-9.]+)'[^>]*>" + Pattern.quote(label) + "</text>")
                .matcher(svg);
        assertTrue(m.find(), label + " in the chart");
        return Double.parseDouble(m.group(1));
    }

    /**
     * Two levels closer than a label's height (0.1 V on a 0 … 6 V plot about 210 px high, some 3.5 px):
     * their labels are a full 11 px line apart (one below its line), not drawn over each other.
     */
    @Test
    void closeLevelsHaveTheirLabelsApart() {
        double[] t = {0, 1, 2, 3, 4};
        double[] v = {0, 3, 3, 5.5, 6};
        double[] i = {1, 0.5, 0.5, 0.2, 0};
        String svg = Charts.edge("Turn-on", "ns", t, v, "A", i, 1, 2, List.of(
                new Charts.Level("plateau 3 V", 3.0, Color.ORANGE), new Charts.Level("V_th,max 2.9 V", 2.9, Color.BLUE),
                new Charts.Level("V_th,min 1.1 V", 1.1, Color.RED)));
        double a = baseline(svg, "plateau 3 V");
        double b = baseline(svg, "V_th,max 2.9 V");
        assertTrue(Math.abs(a - b) >= 11, "labels " + Math.abs(a - b) + " px apart");
        // A level far from the others keeps its label above its line (a smaller y than the line's).
        double c = baseline(svg, "V_th,min 1.1 V");
        assertTrue(c > b + 11, "the lowest label below the others");
    }

    /** Each text says the width it was laid out with, so the browser's font cannot shift it. */
    @Test
    void everyTextCarriesItsLaidOutWidth() {
        String svg = Charts.margins("Margins", "margin", List.of(new Charts.Bar("drive-current: long label", 1.5,
                org.gatefit.match.Verdict.PASS), new Charts.Bar("uvlo", -0.5, org.gatefit.match.Verdict.FAIL)));
        Matcher m = Pattern.compile("<text [^>]*>").matcher(svg);
        int n = 0;
        while (m.find()) {
            n++;
            assertTrue(m.group().contains("textLength='") && m.group().contains("lengthAdjust='spacingAndGlyphs'"),
                    m.group());
        }
        assertTrue(n >= 6, "texts: " + n);
        assertEquals(-1, svg.indexOf("textLength='0'"), "no empty width");
    }

    /**
     * Part numbers as bar labels stay whole: the slanted category labels of the vertical charts
     * (drawn as outlines, so read here from the axis that makes them) are one line, neither broken
     * after a hyphen nor cut short with an ellipsis, however little room a category has.
     */
    @Test
    void partNumberBarLabelsAreNeverBrokenOrCut() {
        String label = "10 QZX-9999-ABCD-LONGNAME-01";
        Charts.WholeLabels axis = new Charts.WholeLabels();
        axis.setMaximumCategoryLabelLines(2);
        java.awt.Graphics2D g = new java.awt.image.BufferedImage(4, 4, java.awt.image.BufferedImage.TYPE_INT_RGB)
                .createGraphics();
        try {
            org.jfree.chart.text.TextBlock b = axis.createLabel(label, 40f, org.jfree.chart.ui.RectangleEdge.BOTTOM, g);
            assertEquals(1, b.getLines().size(), "one line");
            org.jfree.chart.text.TextLine line = (org.jfree.chart.text.TextLine) b.getLines().get(0); // a raw list
            assertEquals(label, line.getFirstTextFragment().getText());
            assertTrue(line.getFirstTextFragment() == line.getLastTextFragment(), "one piece of text");
        } finally {
            g.dispose();
        }
    }
}
