package org.gatefit.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Paint;
import java.awt.geom.Rectangle2D;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import org.gatefit.match.Verdict;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.CategoryAxis;
import org.jfree.chart.axis.CategoryLabelPositions;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.labels.ItemLabelAnchor;
import org.jfree.chart.labels.ItemLabelPosition;
import org.jfree.chart.labels.StandardCategoryItemLabelGenerator;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.category.BarRenderer;
import org.jfree.chart.renderer.category.StackedBarRenderer;
import org.jfree.chart.renderer.category.StandardBarPainter;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.category.DefaultCategoryDataset;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.svg.SVGGraphics2D;
import org.jfree.svg.ViewBox;

/**
 * Charts of the HTML reports, drawn by JFreeChart into SVG with JFreeSVG. AWT is used headless;
 * this class is loaded only when an HTML report is rendered, so start-up (help, version, text
 * reports) never loads AWT.
 */
final class Charts {
    static {
        // Before any AWT class initialises its toolkit: no display is needed or wanted.
        System.setProperty("java.awt.headless", "true");
    }

    static final int WIDTH = 900;
    private static final AtomicInteger IDS = new AtomicInteger();
    private static final Font TITLE = new Font("SansSerif", Font.BOLD, 15);
    private static final Font LABEL = new Font("SansSerif", Font.PLAIN, 12);
    private static final Font TICK = new Font("SansSerif", Font.PLAIN, 11);
    private static final Color GRID = new Color(0xDD, 0xDD, 0xDD);
    /** Series colours, distinguishable in grey print too (dark, mid, light). */
    private static final Color[] SERIES = {new Color(0x1F4E9A), new Color(0xD9730D), new Color(0x2E8B57),
        new Color(0x8E44AD), new Color(0x7F7F7F)};

    private Charts() {
    }

    /** Colour of a verdict, matching the HTML badges. */
    static Color colour(Verdict v) {
        return switch (v) {
            case PASS -> new Color(0x1A7F37);
            case WARN -> new Color(0xB35900);
            case UNKNOWN -> new Color(0x6E6E6E);
            case FAIL -> new Color(0xC62828);
        };
    }

    /** One named line of an XY chart. */
    record Line(String name, double[] x, double[] y, boolean dashed) {
    }

    /** A horizontal reference line with a label. */
    record Level(String label, double value, Color colour) {
    }

    /**
     * A gate edge: V_GS (upper plot) and I_G (lower plot) against time, the plateau shaded and
     * the plateau and threshold levels drawn.
     */
    static String edge(String title, String timeUnit, double[] t, double[] v, String currentUnit, double[] i,
                       double plateauStart, double plateauEnd, List<Level> levels) {
        NumberAxis time = axis("time (" + timeUnit + ")");
        CombinedDomainXYPlot plot = new CombinedDomainXYPlot(time);
        plot.setGap(12);
        plot.setAxisOffset(new RectangleInsets(0, 4, 4, 0));
        XYPlot vp = xy(List.of(new Line("V_GS", t, v, false)), "V_GS (V)");
        double lo = 0;
        double hi = 0;
        for (double x : v) {
            lo = Math.min(lo, x);
            hi = Math.max(hi, x);
        }
        addLevels(vp, levels, lo, hi, 0.6 * (460 - 110));
        XYPlot ip = xy(List.of(new Line("I_G", t, i, false)), "I_G (" + currentUnit + ")");
        ip.getRenderer().setSeriesPaint(0, SERIES[1]);
        ip.addRangeMarker(new ValueMarker(0, Color.GRAY, new BasicStroke(0.8f)));
        if (plateauEnd > plateauStart) {
            for (XYPlot p : List.of(vp, ip)) {
                IntervalMarker m = new IntervalMarker(plateauStart, plateauEnd, new Color(0xFF, 0xE0, 0x8A, 0x90));
                p.addDomainMarker(m, Layer.BACKGROUND);
            }
            IntervalMarker label = (IntervalMarker) vp.getDomainMarkers(Layer.BACKGROUND).iterator().next();
            label.setLabel("Miller plateau");
            label.setLabelFont(TICK);
            label.setLabelAnchor(RectangleAnchor.BOTTOM);
            label.setLabelTextAnchor(TextAnchor.BOTTOM_CENTER);
        }
        plot.add(vp, 3);
        plot.add(ip, 2);
        JFreeChart chart = new JFreeChart(title, TITLE, plot, false);
        return svg(chart, WIDTH, 460, title);
    }

    /** Lines against a common x axis, with reference levels. */
    static String lines(String title, String xLabel, String yLabel, List<Line> lines, List<Level> levels) {
        XYPlot plot = xy(lines, yLabel);
        plot.setDomainAxis(axis(xLabel));
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (Line l : lines) {
            for (double v : l.y()) {
                lo = Math.min(lo, v);
                hi = Math.max(hi, v);
            }
        }
        for (Level l : levels) {
            lo = Math.min(lo, l.value());
            hi = Math.max(hi, l.value());
        }
        addLevels(plot, levels, lo, hi, 380 - 120);
        if (hi > lo) {
            double pad = 0.06 * (hi - lo);
            plot.getRangeAxis().setRange(Math.min(0, lo - pad), hi + pad);
        }
        JFreeChart chart = new JFreeChart(title, TITLE, plot, true);
        chart.getLegend().setItemFont(LABEL);
        return svg(chart, WIDTH, 380, title);
    }

    /** One bar of a margin chart. */
    record Bar(String label, double value, Verdict verdict) {
    }

    /**
     * Horizontal bars of margins against their limits (0 at the limit, positive inside it),
     * coloured by verdict, clipped to [-1, 3] with the true value printed.
     */
    static String margins(String title, String valueLabel, List<Bar> bars) {
        DefaultCategoryDataset data = new DefaultCategoryDataset();
        for (Bar b : bars) {
            data.addValue(Math.max(-1, Math.min(3, b.value())), "margin", b.label());
        }
        BarRenderer r = new BarRenderer() {
            private static final long serialVersionUID = 1L;

            @Override
            public Paint getItemPaint(int row, int column) {
                return colour(bars.get(column).verdict());
            }
        };
        r.setDefaultItemLabelGenerator(new StandardCategoryItemLabelGenerator("{2}", new java.text.DecimalFormat("0.##")) {
            private static final long serialVersionUID = 1L;

            @Override
            public String generateLabel(org.jfree.data.category.CategoryDataset dataset, int row, int column) {
                double v = bars.get(column).value();
                return (v > 3 ? "> 3 · " : v < -1 ? "< -1 · " : "") + org.gatefit.match.Eng.num(v); // one minus sign: Eng.num writes ASCII
            }
        });
        r.setDefaultItemLabelsVisible(true);
        r.setDefaultItemLabelFont(TICK);
        // Each value beside the end of its own bar (right of a bar inside its limit, left of one beyond
        // it), level with the bar: never above it, where it would sit on the neighbouring bar.
        r.setDefaultPositiveItemLabelPosition(new ItemLabelPosition(ItemLabelAnchor.OUTSIDE3, TextAnchor.CENTER_LEFT));
        r.setDefaultNegativeItemLabelPosition(new ItemLabelPosition(ItemLabelAnchor.OUTSIDE9, TextAnchor.CENTER_RIGHT));
        r.setItemLabelInsets(new RectangleInsets(4, 4, 4, 4));
        CategoryPlot plot = category(data, r, valueLabel, PlotOrientation.HORIZONTAL);
        double lo = 0;
        double hi = 0;
        for (Bar b : bars) {
            double v = Math.max(-1, Math.min(3, b.value()));
            lo = Math.min(lo, v);
            hi = Math.max(hi, v);
        }
        // Fitted to the bars, 0 (the limit) always in view, with room beside the outermost bars for
        // their values (a label of about 12 characters, against a plot about half the chart wide).
        double span = Math.max(hi - lo, 0.5);
        plot.getRangeAxis().setRange(lo - (lo < 0 ? 0.3 : 0.05) * span, hi + 0.3 * span);
        plot.addRangeMarker(new ValueMarker(0, Color.BLACK, new BasicStroke(1.4f)), Layer.FOREGROUND);
        JFreeChart chart = new JFreeChart(title, TITLE, plot, false);
        return svg(chart, WIDTH, Math.max(200, 90 + 30 * bars.size()), title);
    }

    /** Grouped vertical bars: one group per category, one bar per series. */
    static String grouped(String title, String valueLabel, List<String> categories, List<String> series,
                          double[][] values, double lo, double hi) {
        DefaultCategoryDataset data = new DefaultCategoryDataset();
        for (int s = 0; s < series.size(); s++) {
            for (int c = 0; c < categories.size(); c++) {
                double v = values[s][c];
                data.addValue(Double.isNaN(v) ? null : (Number) Math.max(lo, Math.min(hi, v)), series.get(s),
                        categories.get(c));
            }
        }
        BarRenderer r = new BarRenderer();
        r.setItemMargin(0.05);
        // A bar cut at the edge of the scale says its value above (or below) its end.
        r.setDefaultItemLabelGenerator(new StandardCategoryItemLabelGenerator() {
            private static final long serialVersionUID = 1L;

            @Override
            public String generateLabel(org.jfree.data.category.CategoryDataset dataset, int row, int column) {
                double v = values[row][column];
                return v > hi || v < lo ? org.gatefit.match.Eng.num(v) : null;
            }
        });
        r.setDefaultItemLabelsVisible(true);
        r.setDefaultItemLabelFont(TICK);
        CategoryPlot plot = category(data, r, valueLabel, PlotOrientation.VERTICAL);
        double top = 0;
        double bottom = 0;
        boolean clipped = false;
        for (double[] row : values) {
            for (double v : row) {
                if (!Double.isNaN(v)) {
                    top = Math.max(top, Math.min(hi, v));
                    bottom = Math.min(bottom, Math.max(lo, v));
                    clipped |= v > hi || v < lo;
                }
            }
        }
        // Fitted to the bars (0 in view), within the scale [lo, hi]; room for the values of cut bars.
        double span = Math.max(top - bottom, 1e-9 + (hi - lo) * 0.1);
        double pad = (clipped ? 0.1 : 0.05) * span;
        plot.getRangeAxis().setRange(bottom < 0 ? bottom - pad : bottom, top + pad);
        plot.addRangeMarker(new ValueMarker(0, Color.BLACK, new BasicStroke(1.4f)), Layer.FOREGROUND);
        JFreeChart chart = new JFreeChart(title, TITLE, plot, true);
        chart.getLegend().setItemFont(LABEL);
        return svg(chart, WIDTH, 400, title);
    }

    /** Stacked vertical bars: counts per category. */
    static String stacked(String title, String valueLabel, List<String> categories, List<String> series,
                          double[][] values, List<Color> colours) {
        DefaultCategoryDataset data = new DefaultCategoryDataset();
        for (int s = 0; s < series.size(); s++) {
            for (int c = 0; c < categories.size(); c++) {
                data.addValue(values[s][c], series.get(s), categories.get(c));
            }
        }
        StackedBarRenderer r = new StackedBarRenderer();
        for (int s = 0; s < colours.size(); s++) {
            r.setSeriesPaint(s, colours.get(s));
        }
        CategoryPlot plot = category(data, r, valueLabel, PlotOrientation.VERTICAL);
        ((NumberAxis) plot.getRangeAxis()).setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        JFreeChart chart = new JFreeChart(title, TITLE, plot, true);
        chart.getLegend().setItemFont(LABEL);
        return svg(chart, WIDTH, 380, title);
    }

    private static CategoryPlot category(DefaultCategoryDataset data, BarRenderer r, String valueLabel,
                                         PlotOrientation o) {
        r.setBarPainter(new StandardBarPainter());
        r.setShadowVisible(false);
        r.setDrawBarOutline(false);
        r.setMaximumBarWidth(0.08);
        if (!(r instanceof StackedBarRenderer)) {
            for (int s = 0; s < SERIES.length; s++) {
                r.setSeriesPaint(s, SERIES[s]);
            }
        }
        CategoryAxis cats = o == PlotOrientation.VERTICAL ? new WholeLabels() : new CategoryAxis();
        cats.setTickLabelFont(TICK);
        cats.setMaximumCategoryLabelLines(2);
        cats.setMaximumCategoryLabelWidthRatio(o == PlotOrientation.HORIZONTAL ? 0.45f : 1f);
        if (o == PlotOrientation.VERTICAL && data.getColumnCount() > 6) {
            cats.setCategoryLabelPositions(CategoryLabelPositions.UP_45);
        }
        CategoryPlot plot = new CategoryPlot(data, cats, axis(valueLabel), r);
        plot.setOrientation(o);
        plot.setBackgroundPaint(Color.WHITE);
        plot.setRangeGridlinePaint(GRID);
        plot.setRangeGridlinesVisible(true);
        plot.setOutlineVisible(false);
        return plot;
    }

    /**
     * A category axis whose labels are never wrapped or cut short: the vertical charts' categories
     * are part numbers ("1 QZX-…"), which JFreeChart would otherwise break after a hyphen or end with
     * an ellipsis when the space between ticks is narrow (they are drawn at 45 degrees when many).
     */
    static final class WholeLabels extends CategoryAxis {
        private static final long serialVersionUID = 1L;

        @Override
        @SuppressWarnings("rawtypes") // JFreeChart declares the raw Comparable
        protected org.jfree.chart.text.TextBlock createLabel(Comparable category, float width,
                                                             org.jfree.chart.ui.RectangleEdge edge,
                                                             java.awt.Graphics2D g2) {
            return org.jfree.chart.text.TextUtils.createTextBlock(category.toString(), getTickLabelFont(category),
                    getTickLabelPaint(category));
        }
    }

    private static XYPlot xy(List<Line> lines, String yLabel) {
        XYSeriesCollection data = new XYSeriesCollection();
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, false);
        r.setDrawSeriesLineAsPath(true);
        int k = 0;
        for (Line l : lines) {
            XYSeries s = new XYSeries(l.name(), false, true);
            for (int j = 0; j < l.x().length; j++) {
                s.add(l.x()[j], l.y()[j], false);
            }
            data.addSeries(s);
            r.setSeriesPaint(k, SERIES[k % SERIES.length]);
            r.setSeriesStroke(k, l.dashed() ? new BasicStroke(2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 1f,
                    new float[] {7f, 4f}, 0f) : new BasicStroke(2f));
            k++;
        }
        NumberAxis y = axis(yLabel);
        y.setAutoRangeIncludesZero(true);
        XYPlot plot = new XYPlot(data, null, y, r);
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(GRID);
        plot.setRangeGridlinePaint(GRID);
        plot.setOutlineVisible(false);
        // A few pixels between the axes and the data, so the tick labels at the corner (0 and 0.0) stay apart.
        plot.setAxisOffset(new RectangleInsets(0, 4, 4, 0));
        return plot;
    }

    private static NumberAxis axis(String label) {
        NumberAxis a = new NumberAxis(label);
        a.setLabelFont(LABEL);
        a.setTickLabelFont(TICK);
        a.setAutoRangeIncludesZero(false);
        return a;
    }

    /** Height of a level's label with its box, in pixels (11 px type). */
    private static final double LEVEL_LABEL_PX = 16;

    /**
     * The levels as dashed lines, each labelled at the right above its line; a level closer than a
     * label's height below the one above it (on a plot about {@code plotPx} high showing about
     * {@code lo} to {@code hi} with the levels) has its label below its line instead, so two labels
     * never overlap.
     */
    private static void addLevels(XYPlot plot, List<Level> levels, double lo, double hi, double plotPx) {
        double min = lo;
        double max = hi;
        for (Level l : levels) {
            min = Math.min(min, l.value());
            max = Math.max(max, l.value());
        }
        double labelUnits = max > min ? LEVEL_LABEL_PX * 1.1 * (max - min) / plotPx : 0;
        List<Level> down = levels.stream().sorted(java.util.Comparator.comparingDouble(Level::value).reversed()).toList();
        double above = Double.POSITIVE_INFINITY; // the lowest edge taken by a label so far
        for (Level l : down) {
            boolean under = l.value() + labelUnits > above;
            plot.addRangeMarker(level(l, under));
            above = under ? l.value() - labelUnits : l.value();
        }
    }

    private static ValueMarker level(Level l, boolean under) {
        ValueMarker m = new ValueMarker(l.value(), l.colour(), new BasicStroke(1.2f, BasicStroke.CAP_BUTT,
                BasicStroke.JOIN_ROUND, 1f, new float[] {5f, 3f}, 0f));
        m.setLabel(l.label());
        m.setLabelFont(TICK);
        m.setLabelPaint(l.colour().darker());
        m.setLabelAnchor(under ? RectangleAnchor.BOTTOM_RIGHT : RectangleAnchor.TOP_RIGHT);
        m.setLabelTextAnchor(under ? TextAnchor.TOP_RIGHT : TextAnchor.BOTTOM_RIGHT);
        return m;
    }

    /**
     * The chart as an inline {@code <svg>} element: scalable (view box, no fixed size), ids
     * unique within the page, no namespace URIs (the HTML parser places it in the SVG namespace),
     * and an accessible name.
     */
    /** Coordinates to 0.01 px: plenty for a 900 px chart, and a fifth of the size. */
    private static String twoDecimals(double v) {
        if (Double.isNaN(v) || Double.isInfinite(v)) {
            return "0";
        }
        String s = String.format(java.util.Locale.ROOT, "%.2f", v);
        s = s.contains(".") ? s.replaceAll("0+$", "").replaceAll("\\.$", "") : s;
        return s.equals("-0") ? "0" : s;
    }

    private static final java.util.regex.Pattern TEXT = java.util.regex.Pattern.compile(
            "<text ([^>]*?style='([^']*)'[^>]*)>([^<]*)</text>");
    private static final java.util.regex.Pattern SIZE = java.util.regex.Pattern.compile("font-size: ?([0-9.]+)px");
    private static final java.util.regex.Pattern FAMILY = java.util.regex.Pattern.compile("font-family: ?([^;]+)");

    /**
     * Every text of the chart given the width JFreeChart laid it out with ({@code textLength}, glyphs
     * and spacing adjusted): the layout measures text with Java's fonts, the browser draws it with its
     * own, often narrower or wider, and without this a right-aligned label ends short of its bar, a
     * centred one drifts and a label's box no longer fits its text.
     */
    static String fitText(SVGGraphics2D g, String svg) {
        java.util.regex.Matcher m = TEXT.matcher(svg);
        StringBuilder sb = new StringBuilder(svg.length() + svg.length() / 8);
        while (m.find()) {
            String style = m.group(2);
            java.util.regex.Matcher size = SIZE.matcher(style);
            java.util.regex.Matcher family = FAMILY.matcher(style);
            String text = m.group(3).replace("&lt;", "<").replace("&gt;", ">").replace("&quot;", "\"")
                    .replace("&apos;", "'").replace("&amp;", "&");
            if (!size.find() || text.isBlank() || m.group(1).contains("textLength")) {
                m.appendReplacement(sb, java.util.regex.Matcher.quoteReplacement(m.group()));
                continue;
            }
            String fam = family.find() ? family.group(1).strip() : "sans-serif";
            String javaFamily = switch (fam) {
                case "sans-serif" -> Font.SANS_SERIF;
                case "serif" -> Font.SERIF;
                case "monospace" -> Font.MONOSPACED;
                default -> fam.replace("'", "").replace("\"", "");
            };
            int styleBits = (style.contains("font-weight: bold") ? Font.BOLD : 0)
                    | (style.contains("font-style: italic") ? Font.ITALIC : 0);
            Font f = new Font(javaFamily, styleBits, 1).deriveFont(Float.parseFloat(size.group(1)));
            double width = g.getFontMetrics(f).getStringBounds(text, g).getWidth();
            m.appendReplacement(sb, java.util.regex.Matcher.quoteReplacement("<text " + m.group(1) + " textLength='"
                    + twoDecimals(width) + "' lengthAdjust='spacingAndGlyphs'>" + m.group(3) + "</text>"));
        }
        m.appendTail(sb);
        return sb.toString();
    }

    static String svg(JFreeChart chart, int w, int h, String name) {
        chart.setBackgroundPaint(Color.WHITE);
        chart.setPadding(new RectangleInsets(6, 6, 6, 12));
        TextTitle t = chart.getTitle();
        if (t != null) {
            t.setFont(TITLE);
        }
        SVGGraphics2D g = new SVGGraphics2D(w, h);
        g.setDefsKeyPrefix("g" + IDS.incrementAndGet() + "_");
        g.setGeomDoubleConverter(Charts::twoDecimals);
        g.setTransformDoubleConverter(Charts::twoDecimals);
        chart.draw(g, new Rectangle2D.Double(0, 0, w, h));
        String svg = fitText(g, g.getSVGElement(null, false, new ViewBox(0, 0, w, h), null, null));
        svg = svg.replaceAll("\\s+xmlns(:[a-z]+)?=(\"[^\"]*\"|'[^']*')", "");
        return Html.xmlChars(svg).replaceFirst("<svg", "<svg role=\"img\" aria-label=\"" + Html.esc(name) + "\"");
    }
}
