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
        XYPlot vp = xy(List.of(new Line("V_GS", t, v, false)), "V_GS (V)");
        for (Level l : levels) {
            vp.addRangeMarker(level(l));
        }
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
            plot.addRangeMarker(level(l));
            lo = Math.min(lo, l.value());
            hi = Math.max(hi, l.value());
        }
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
     * coloured by verdict, clipped to [−1, 3] with the true value printed.
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
                return (v > 3 ? "> 3 · " : v < -1 ? "< −1 · " : "") + org.gatefit.match.Eng.num(v);
            }
        });
        r.setDefaultItemLabelsVisible(true);
        r.setDefaultItemLabelFont(TICK);
        CategoryPlot plot = category(data, r, valueLabel, PlotOrientation.HORIZONTAL);
        plot.getRangeAxis().setRange(-1.1, 3.3);
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
        CategoryPlot plot = category(data, r, valueLabel, PlotOrientation.VERTICAL);
        plot.getRangeAxis().setRange(lo, hi);
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
        CategoryAxis cats = new CategoryAxis();
        cats.setTickLabelFont(TICK);
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
        plot.setAxisOffset(RectangleInsets.ZERO_INSETS);
        return plot;
    }

    private static NumberAxis axis(String label) {
        NumberAxis a = new NumberAxis(label);
        a.setLabelFont(LABEL);
        a.setTickLabelFont(TICK);
        a.setAutoRangeIncludesZero(false);
        return a;
    }

    private static ValueMarker level(Level l) {
        ValueMarker m = new ValueMarker(l.value(), l.colour(), new BasicStroke(1.2f, BasicStroke.CAP_BUTT,
                BasicStroke.JOIN_ROUND, 1f, new float[] {5f, 3f}, 0f));
        m.setLabel(l.label());
        m.setLabelFont(TICK);
        m.setLabelPaint(l.colour().darker());
        m.setLabelAnchor(RectangleAnchor.TOP_RIGHT);
        m.setLabelTextAnchor(TextAnchor.BOTTOM_RIGHT);
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
        String svg = g.getSVGElement(null, false, new ViewBox(0, 0, w, h), null, null);
        svg = svg.replaceAll("\\s+xmlns(:[a-z]+)?=(\"[^\"]*\"|'[^']*')", "");
        return Html.xmlChars(svg).replaceFirst("<svg", "<svg role=\"img\" aria-label=\"" + Html.esc(name) + "\"");
    }
}
