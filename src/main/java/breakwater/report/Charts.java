package breakwater.report;

import breakwater.report.ReportModel.ImpedancePlot;
import breakwater.report.ReportModel.WaveformPlot;
import breakwater.report.chart.ImpedanceChart;
import breakwater.report.chart.SvgWriter;
import breakwater.report.chart.WorstCaseChart;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.block.BlockBorder;
import org.jfree.chart.plot.DatasetRenderingOrder;
import org.jfree.chart.plot.Plot;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.StandardXYBarPainter;
import org.jfree.chart.renderer.xy.XYBarRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.renderer.xy.XYStepRenderer;
import org.jfree.chart.text.TextUtils;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.statistics.HistogramDataset;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.svg.SVGGraphics2D;
import org.jfree.svg.ViewBox;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.GraphicsEnvironment;
import java.awt.Paint;
import java.awt.Stroke;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

/**
 * The report's charts, drawn by JFreeChart into JFreeSVG and returned as one {@code <svg>} element each
 * (no XML prolog, a {@code viewBox} so the page can scale it). Rendering is headless and needs no GPU.
 * Output is deterministic: element ids come from a hash of the chart's data, not from the clock.
 */
public final class Charts {
    public static final int WIDTH = 900;
    public static final int HEIGHT = 420;

    static {
        if (System.getProperty("java.awt.headless") == null) {
            System.setProperty("java.awt.headless", "true");
        }
        // draw rotated labels as rotated text, not as glyph outlines: the SVG stays searchable and small
        TextUtils.setUseDrawRotatedStringWorkaround(false);
    }

    /** Okabe–Ito colours: distinguishable with the common forms of colour blindness, and in grey print. */
    private static final Color[] PALETTE = {
            new Color(0x0072B2), new Color(0xD55E00), new Color(0x009E73), new Color(0xCC79A7),
            new Color(0xE69F00), new Color(0x56B4E9), new Color(0x000000)};
    private static final Color LIMIT = new Color(0xB2182B);
    private static final Color GRID = new Color(0xDDDDDD);
    private static final Color MINOR_GRID = new Color(0xEEEEEE);
    private static final Color MARK = new Color(0x333333);
    private static final Color LABEL_BACKGROUND = new Color(255, 255, 255, 215);
    /**
     * Text is laid out with AWT font metrics but drawn by the browser, so both should use the same face:
     * the first installed of a metric-compatible group (Liberation Sans has Arial's metrics, Arial and
     * Helvetica are near-identical), else DejaVu Sans, else the logical sans-serif font.
     */
    private static final String FAMILY = chooseFamily();
    private static final String CSS_FAMILY = switch (FAMILY) {
        case "Liberation Sans", "Arial", "Helvetica" -> "Liberation Sans, Arial, Helvetica, sans-serif";
        case "DejaVu Sans" -> "DejaVu Sans, Verdana, sans-serif";
        default -> "sans-serif";
    };
    private static final Font TICK_FONT = new Font(FAMILY, Font.PLAIN, 12);
    private static final Font LABEL_FONT = new Font(FAMILY, Font.PLAIN, 13);
    private static final Font NOTE_FONT = new Font(FAMILY, Font.PLAIN, 11);
    private static final Font LEGEND_FONT = new Font(FAMILY, Font.PLAIN, 12);
    private static final Stroke LINE = new BasicStroke(1.8f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    private static final Stroke DASHED = new BasicStroke(1.4f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
            new float[]{7f, 4f}, 0f);

    private Charts() {
    }

    private static String chooseFamily() {
        List<String> installed;
        try {
            installed = Arrays.asList(GraphicsEnvironment.getLocalGraphicsEnvironment()
                    .getAvailableFontFamilyNames(Locale.ROOT));
        } catch (RuntimeException | Error e) { // no font configuration at all: fall back to the logical font
            return Font.SANS_SERIF;
        }
        for (String f : List.of("Liberation Sans", "Arial", "Helvetica", "DejaVu Sans")) {
            if (installed.contains(f)) {
                return f;
            }
        }
        return Font.SANS_SERIF;
    }

    /** A labelled value line, e.g. a tolerance limit on a histogram or a spec on a frontier. */
    public record Limit(String label, double value) {
        public Limit {
            ReportModel.require(label != null, "limit label is null");
            ReportModel.require(Double.isFinite(value), "limit '" + label + "' value " + value + " is not finite");
        }
    }

    /** A labelled point to emphasise, e.g. the chosen bank on a frontier. */
    public record LabelledPoint(String label, double x, double y) {
        public LabelledPoint {
            ReportModel.require(label != null, "point label is null");
            ReportModel.require(Double.isFinite(x) && Double.isFinite(y), "point '" + label + "' is not finite");
        }
    }

    /** Histogram data: {@code values} counted in {@code bins} equal bins; {@code unit} is an SI symbol or "". */
    public record Histogram(String axisLabel, String unit, double[] values, int bins, List<Limit> limits) {
        public Histogram {
            ReportModel.require(axisLabel != null && unit != null, "histogram label or unit is null");
            values = values.clone();
            ReportModel.require(values.length > 0, "histogram '" + axisLabel + "' has no values");
            ReportModel.require(bins >= 1, "histogram '" + axisLabel + "' has " + bins + " bins; it needs at least 1");
            for (double v : values) {
                ReportModel.require(Double.isFinite(v), "histogram '" + axisLabel + "' holds a non-finite value " + v);
            }
            limits = List.copyOf(limits);
        }

        @Override
        public double[] values() {
            return values.clone();
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof Histogram h && h.axisLabel.equals(axisLabel) && h.unit.equals(unit)
                    && Arrays.equals(h.values, values) && h.bins == bins && h.limits.equals(limits);
        }

        @Override
        public int hashCode() {
            return axisLabel.hashCode() * 31 + Arrays.hashCode(values) + bins;
        }

        @Override
        public String toString() {
            return "Histogram[" + axisLabel + ", " + values.length + " values, " + bins + " bins]";
        }
    }

    /**
     * Candidates in a cost–excursion plane: every candidate as a point, the non-dominated ones (no other
     * candidate is both cheaper or equal and lower or equal) joined as a staircase. {@code costUnit} is
     * printed without SI prefix (money); {@code excursionUnit} with one.
     */
    public record Frontier(String costLabel, String costUnit, String excursionLabel, String excursionUnit,
                           double[] cost, double[] excursion, List<Limit> excursionLimits,
                           List<LabelledPoint> highlighted) {
        public Frontier {
            ReportModel.require(costLabel != null && costUnit != null && excursionLabel != null
                    && excursionUnit != null, "frontier label or unit is null");
            cost = cost.clone();
            excursion = excursion.clone();
            ReportModel.require(cost.length > 0 && cost.length == excursion.length, "frontier has " + cost.length
                    + " costs and " + excursion.length + " excursions; it needs the same number, at least one");
            for (int i = 0; i < cost.length; i++) {
                ReportModel.require(Double.isFinite(cost[i]) && Double.isFinite(excursion[i]), "frontier point " + i
                        + " is not finite");
            }
            excursionLimits = List.copyOf(excursionLimits);
            highlighted = List.copyOf(highlighted);
        }

        @Override
        public double[] cost() {
            return cost.clone();
        }

        @Override
        public double[] excursion() {
            return excursion.clone();
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof Frontier f && Arrays.equals(f.cost, cost) && Arrays.equals(f.excursion, excursion)
                    && f.costLabel.equals(costLabel) && f.excursionLabel.equals(excursionLabel)
                    && f.costUnit.equals(costUnit) && f.excursionUnit.equals(excursionUnit)
                    && f.excursionLimits.equals(excursionLimits) && f.highlighted.equals(highlighted);
        }

        @Override
        public int hashCode() {
            return Arrays.hashCode(cost) * 31 + Arrays.hashCode(excursion);
        }

        @Override
        public String toString() {
            return "Frontier[" + cost.length + " candidates]";
        }
    }

    // ------------------------------------------------------------------------------------------------
    // Impedance and worst case, drawn by their own classes

    /** |Z| against frequency on log–log axes, with the band shaded and the target as a dashed line. */
    public static String impedanceChart(ImpedancePlot plot) {
        return ImpedanceChart.svg(plot);
    }

    /**
     * Load current (above) and load voltage (below) sharing one time axis, with the voltage limits
     * dashed, the nominal thin, and the instant of the largest deviation from nominal marked.
     */
    public static String worstCaseChart(WaveformPlot plot) {
        return WorstCaseChart.svg(plot);
    }

    // ------------------------------------------------------------------------------------------------
    // Histogram and frontier, for modes that explore many banks or many samples

    /** Counts of {@code values} in equal bins, with optional limit lines. */
    public static String histogramChart(Histogram h) {
        return histogramChart(h, WIDTH, HEIGHT);
    }

    public static String histogramChart(Histogram h, int width, int height) {
        double[] values = h.values();
        double lo = Arrays.stream(values).min().orElseThrow();
        double hi = Arrays.stream(values).max().orElseThrow();
        if (hi == lo) {
            double pad = lo == 0 ? 1e-12 : Math.abs(lo) * 1e-3;
            lo -= pad;
            hi += pad;
        }
        HistogramDataset data = new HistogramDataset();
        data.addSeries("values", values, h.bins(), lo, hi);
        double axisLo = lo;
        double axisHi = hi;
        for (Limit l : h.limits()) {
            axisLo = Math.min(axisLo, l.value());
            axisHi = Math.max(axisHi, l.value());
        }
        double pad = (axisHi - axisLo) * 0.05;
        NumberAxis x = linearAxis(h.axisLabel(), h.unit(), axisLo - pad, axisHi + pad);
        NumberAxis y = new NumberAxis("count");
        styleAxis(y);
        y.setAutoRange(false);
        double top = maxCount(data) * 1.1;
        y.setRange(0, top);
        y.setTickUnit(new NumberTickUnit(niceStep(top / 6), EngineeringFormat.plain("", 0, 100)), false, true);
        XYBarRenderer bars = new XYBarRenderer(0.04);
        bars.setBarPainter(new StandardXYBarPainter());
        bars.setShadowVisible(false);
        bars.setDrawBarOutline(true);
        bars.setSeriesPaint(0, withAlpha(PALETTE[0], 190));
        bars.setSeriesOutlinePaint(0, PALETTE[0].darker());
        XYPlot plot = new XYPlot(data, x, y, bars);
        style(plot);
        plot.setDomainGridlinesVisible(false);
        boolean left = true;
        for (Limit l : h.limits()) {
            ValueMarker m = new ValueMarker(l.value(), LIMIT, DASHED);
            m.setLabel(l.label());
            m.setLabelFont(NOTE_FONT);
            m.setLabelPaint(LIMIT);
            m.setLabelAnchor(left ? RectangleAnchor.TOP_LEFT : RectangleAnchor.TOP_RIGHT);
            m.setLabelTextAnchor(left ? TextAnchor.TOP_RIGHT : TextAnchor.TOP_LEFT);
            m.setLabelOffset(new RectangleInsets(6, 4, 6, 4));
            m.setLabelBackgroundColor(LABEL_BACKGROUND);
            plot.addDomainMarker(m, Layer.FOREGROUND);
            left = !left;
        }
        return toSvg(chart(plot, false), width, height, "bwh", h.hashCode());
    }

    /** Every candidate as a grey dot, the cost–excursion frontier as a staircase, highlights labelled. */
    public static String frontierChart(Frontier f) {
        return frontierChart(f, WIDTH, HEIGHT);
    }

    public static String frontierChart(Frontier f, int width, int height) {
        double[] cost = f.cost();
        double[] exc = f.excursion();
        XYSeries all = new XYSeries("candidates", false, true);
        for (int i = 0; i < cost.length; i++) {
            all.add(cost[i], exc[i], false);
        }
        XYSeries front = new XYSeries("frontier", true, true);
        for (double[] p : frontier(cost, exc)) {
            front.add(p[0], p[1], false);
        }
        double xLo = Arrays.stream(cost).min().orElseThrow();
        double xHi = Arrays.stream(cost).max().orElseThrow();
        double yLo = Arrays.stream(exc).min().orElseThrow();
        double yHi = Arrays.stream(exc).max().orElseThrow();
        for (Limit l : f.excursionLimits()) {
            yLo = Math.min(yLo, l.value());
            yHi = Math.max(yHi, l.value());
        }
        double xPad = Math.max((xHi - xLo) * 0.06, Math.abs(xHi) * 0.02 + 1e-12);
        double yPad = Math.max((yHi - yLo) * 0.08, Math.abs(yHi) * 0.02 + 1e-15);
        NumberAxis x = linearAxis(f.costLabel(), f.costUnit(), xLo - xPad, xHi + xPad);
        x.setNumberFormatOverride(EngineeringFormat.plain(f.costUnit(), xLo - xPad, xHi + xPad));
        NumberAxis y = linearAxis(f.excursionLabel(), f.excursionUnit(), yLo - yPad, yHi + yPad);

        XYLineAndShapeRenderer dots = new XYLineAndShapeRenderer(false, true);
        dots.setSeriesShape(0, new Ellipse2D.Double(-2.5, -2.5, 5, 5));
        dots.setSeriesPaint(0, new Color(0x999999));
        XYStepRenderer steps = new XYStepRenderer();
        steps.setSeriesPaint(0, PALETTE[0]);
        steps.setSeriesStroke(0, LINE);
        steps.setDefaultShapesVisible(true);
        steps.setSeriesShape(0, new Ellipse2D.Double(-3.5, -3.5, 7, 7));
        // drawn in index order: candidates below, the frontier over them, highlights on top
        XYPlot plot = new XYPlot(new XYSeriesCollection(all), x, y, dots);
        plot.setDataset(1, new XYSeriesCollection(front));
        plot.setRenderer(1, steps);
        plot.setDatasetRenderingOrder(DatasetRenderingOrder.FORWARD);
        style(plot);
        for (Limit l : f.excursionLimits()) {
            plot.addRangeMarker(valueLine(l.value(), l.label(), LIMIT, DASHED, false), Layer.FOREGROUND);
        }
        for (LabelledPoint p : f.highlighted()) {
            // below and left of a frontier point lies the region no candidate reaches: room for text
            XYTextAnnotation a = new XYTextAnnotation(p.label() + "    ", p.x(), p.y());
            a.setFont(NOTE_FONT);
            a.setPaint(MARK);
            a.setTextAnchor(TextAnchor.TOP_RIGHT);
            steps.addAnnotation(a, Layer.FOREGROUND);
        }
        if (!f.highlighted().isEmpty()) {
            XYSeries hs = new XYSeries("highlighted", false, true);
            f.highlighted().forEach(p -> hs.add(p.x(), p.y()));
            XYLineAndShapeRenderer ring = new XYLineAndShapeRenderer(false, true);
            ring.setSeriesShape(0, new Ellipse2D.Double(-7, -7, 14, 14));
            ring.setSeriesShapesFilled(0, false);
            ring.setUseOutlinePaint(false);
            ring.setSeriesPaint(0, PALETTE[1]);
            ring.setSeriesStroke(0, new BasicStroke(2.2f));
            ring.setSeriesOutlineStroke(0, new BasicStroke(2.2f));
            ring.setDrawOutlines(true);
            plot.setDataset(2, new XYSeriesCollection(hs));
            plot.setRenderer(2, ring);
        }
        LegendItemCollection legend = new LegendItemCollection();
        legend.add(new LegendItem("candidate", null, null, null, new Ellipse2D.Double(-3, -3, 6, 6),
                new Color(0x999999)));
        legend.add(lineItem("frontier (no cheaper bank with a lower " + f.excursionLabel() + ")", PALETTE[0], LINE));
        if (!f.excursionLimits().isEmpty()) {
            legend.add(lineItem(f.excursionLimits().get(0).label(), LIMIT, DASHED));
        }
        plot.setFixedLegendItems(legend);
        return toSvg(chart(plot, true), width, height, "bwf", f.hashCode());
    }

    /**
     * The non-dominated points for minimising both coordinates, sorted by ascending x: each has a y
     * strictly below every point with a smaller or equal x.
     */
    static List<double[]> frontier(double[] x, double[] y) {
        Integer[] order = new Integer[x.length];
        for (int i = 0; i < order.length; i++) {
            order[i] = i;
        }
        Arrays.sort(order, Comparator.<Integer>comparingDouble(i -> x[i]).thenComparingDouble(i -> y[i]));
        List<double[]> out = new ArrayList<>();
        double best = Double.POSITIVE_INFINITY;
        for (int i : order) {
            if (y[i] < best) {
                out.add(new double[]{x[i], y[i]});
                best = y[i];
            }
        }
        return out;
    }

    // ------------------------------------------------------------------------------------------------
    // Shared pieces

    private static JFreeChart chart(Plot plot, boolean legend) {
        JFreeChart c = new JFreeChart(null, LABEL_FONT, plot, legend);
        c.setBackgroundPaint(Color.WHITE);
        c.setPadding(new RectangleInsets(6, 4, 4, 12));
        c.setAntiAlias(true);
        c.setTextAntiAlias(true);
        LegendTitle l = c.getLegend();
        if (l != null) {
            l.setItemFont(LEGEND_FONT);
            l.setFrame(BlockBorder.NONE);
            l.setBackgroundPaint(Color.WHITE);
            l.setPosition(RectangleEdge.BOTTOM);
            l.setItemLabelPadding(new RectangleInsets(2, 4, 2, 14));
        }
        return c;
    }

    private static void style(XYPlot p) {
        p.setBackgroundPaint(Color.WHITE);
        p.setOutlinePaint(new Color(0x999999));
        p.setDomainGridlinePaint(GRID);
        p.setRangeGridlinePaint(GRID);
        p.setDomainGridlineStroke(new BasicStroke(0.7f));
        p.setRangeGridlineStroke(new BasicStroke(0.7f));
        p.setDomainMinorGridlinePaint(MINOR_GRID);
        p.setRangeMinorGridlinePaint(MINOR_GRID);
        p.setDomainMinorGridlineStroke(new BasicStroke(0.5f));
        p.setRangeMinorGridlineStroke(new BasicStroke(0.5f));
        p.setAxisOffset(new RectangleInsets(2, 2, 2, 2));
        if (p.getDomainAxis() instanceof LogAxis) {
            p.setDomainMinorGridlinesVisible(true);
        }
        if (p.getRangeAxis() instanceof LogAxis) {
            p.setRangeMinorGridlinesVisible(true);
        }
    }

    private static void styleAxis(ValueAxis a) {
        a.setAxisLineVisible(false); // the plot outline already draws it
        a.setLabelFont(LABEL_FONT);
        a.setTickLabelFont(TICK_FONT);
        a.setLabelPaint(new Color(0x222222));
        a.setTickLabelPaint(new Color(0x333333));
        a.setAxisLinePaint(new Color(0x999999));
        a.setTickMarkPaint(new Color(0x999999));
    }

    private static NumberAxis linearAxis(String label, String unit, double lo, double hi) {
        if (!(hi > lo)) {
            double pad = lo == 0 ? 1 : Math.abs(lo) * 0.01;
            lo -= pad;
            hi += pad;
        }
        NumberAxis a = new NumberAxis(label);
        styleAxis(a);
        a.setAutoRange(false);
        a.setRange(lo, hi);
        a.setNumberFormatOverride(EngineeringFormat.forRange(unit, lo, hi));
        return a;
    }

    private static ValueMarker valueLine(double value, String label, Paint paint, Stroke stroke, boolean below) {
        ValueMarker m = new ValueMarker(value, paint, stroke);
        m.setLabel(label);
        m.setLabelFont(NOTE_FONT);
        m.setLabelPaint(paint);
        m.setLabelAnchor(below ? RectangleAnchor.BOTTOM_RIGHT : RectangleAnchor.TOP_RIGHT);
        m.setLabelTextAnchor(below ? TextAnchor.TOP_RIGHT : TextAnchor.BOTTOM_RIGHT);
        m.setLabelOffset(new RectangleInsets(2, 6, 2, 6));
        m.setLabelBackgroundColor(LABEL_BACKGROUND);
        return m;
    }

    private static LegendItem lineItem(String label, Paint paint, Stroke stroke) {
        LegendItem item = new LegendItem(label, null, null, null, new Line2D.Double(-12, 0, 12, 0), stroke, paint);
        return item;
    }

    private static Color withAlpha(Color c, int alpha) {
        return new Color(c.getRed(), c.getGreen(), c.getBlue(), alpha);
    }

    private static int maxCount(HistogramDataset d) {
        int max = 1;
        for (int i = 0; i < d.getItemCount(0); i++) {
            max = Math.max(max, d.getY(0, i).intValue());
        }
        return max;
    }

    /** The 1–2–5 step at or above {@code raw}, at least 1 (counts are integers). */
    static double niceStep(double raw) {
        if (raw <= 1) {
            return 1;
        }
        double p = Math.pow(10, Math.floor(Math.log10(raw)));
        for (double m : new double[]{1, 2, 5, 10}) {
            if (m * p >= raw * (1 - 1e-12)) {
                return m * p;
            }
        }
        return 10 * p;
    }

    static String toSvg(JFreeChart chart, int width, int height, String kind, int hash) {
        ReportModel.require(width >= 100 && height >= 80, "chart size " + width + " × " + height
                + " is too small; use at least 100 × 80");
        String prefix = kind + Integer.toHexString(hash);
        SVGGraphics2D g = new SVGGraphics2D(width, height);
        g.setDefsKeyPrefix(prefix);
        g.setFontFunction(family -> CSS_FAMILY);
        chart.draw(g, new Rectangle2D.Double(0, 0, width, height));
        return stripProlog(g.getSVGElement(prefix, true, new ViewBox(0, 0, width, height), null, null));
    }

    /** Removes an XML declaration and a DOCTYPE, if present, so the SVG can be inlined in a page. */
    public static String stripProlog(String svg) {
        return SvgWriter.stripProlog(svg);
    }
}
