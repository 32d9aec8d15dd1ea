package breakwater.report.chart;


import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.block.BlockBorder;
import org.jfree.chart.plot.Plot;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.GraphicsEnvironment;
import java.awt.Paint;
import java.awt.Stroke;
import java.awt.geom.Line2D;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

/**
 * The look every chart shares: size, colours, fonts, strokes, the number formats of axis ticks and
 * labels, and the styling of the chart frame, the plot, its axes, value lines and legend lines.
 *
 * <p>First used while a chart is built inside {@link SvgWriter#render}, whose class initialisation puts
 * AWT in headless mode before the font lookup here asks the graphics environment for its fonts.
 */
final class ChartStyle {
    static final int WIDTH = 900;
    static final int HEIGHT = 420;

    /** Okabe–Ito colours: distinguishable with the common forms of colour blindness, and in grey print. */
    private static final Color[] PALETTE = {
            new Color(0x0072B2), new Color(0xD55E00), new Color(0x009E73), new Color(0xCC79A7),
            new Color(0xE69F00), new Color(0x56B4E9), new Color(0x000000)};
    static final Color LIMIT = new Color(0xB2182B);
    static final Color NOMINAL = new Color(0x555555);
    static final Color GRID = new Color(0xDDDDDD);
    static final Color MINOR_GRID = new Color(0xEEEEEE);
    static final Color BAND = new Color(0x0072B2);
    static final Color MARK = new Color(0x333333);
    static final Color LABEL_BACKGROUND = new Color(255, 255, 255, 215);
    /** Plot outline, axis lines and tick marks; also the dots of candidates that are not highlighted. */
    static final Color OUTLINE = new Color(0x999999);
    static final Color AXIS_LABEL = new Color(0x222222);
    static final Color TICK_LABEL = new Color(0x333333);
    /**
     * Text is laid out with AWT font metrics but drawn by the browser, so both should use the same face:
     * the first installed of a metric-compatible group (Liberation Sans has Arial's metrics, Arial and
     * Helvetica are near-identical), else DejaVu Sans, else the logical sans-serif font.
     */
    /** System property naming the chart font family to use when it is installed (else the usual choice). */
    static final String FONT_PROPERTY = "breakwater.chart.font";
    private static final String FAMILY = chooseFamily();
    /** The font-family list written into the SVG for {@link #FAMILY}. */
    static final String CSS_FAMILY = switch (FAMILY) {
        case "Liberation Sans", "Arial", "Helvetica" -> "Liberation Sans, Arial, Helvetica, sans-serif";
        case "DejaVu Sans" -> "DejaVu Sans, Verdana, sans-serif";
        default -> "sans-serif";
    };
    static final Font TICK_FONT = new Font(FAMILY, Font.PLAIN, 12);
    static final Font LABEL_FONT = new Font(FAMILY, Font.PLAIN, 13);
    static final Font NOTE_FONT = new Font(FAMILY, Font.PLAIN, 11);
    static final Font LEGEND_FONT = new Font(FAMILY, Font.PLAIN, 12);
    static final Stroke LINE = new BasicStroke(1.8f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    static final Stroke DASHED = new BasicStroke(1.4f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
            new float[]{7f, 4f}, 0f);
    static final Stroke THIN = new BasicStroke(0.9f);
    /** A fine dotted line, e.g. the instant of the worst deviation across stacked plots. */
    static final Stroke DOTTED = new BasicStroke(0.8f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
            new float[]{2f, 3f}, 0f);
    /** The ring drawn around a highlighted point. */
    static final Stroke RING = new BasicStroke(2.2f);
    private static final Stroke GRID_STROKE = new BasicStroke(0.7f);
    private static final Stroke MINOR_GRID_STROKE = new BasicStroke(0.5f);

    private ChartStyle() {
    }

    private static String chooseFamily() {
        List<String> installed;
        try {
            installed = Arrays.asList(GraphicsEnvironment.getLocalGraphicsEnvironment()
                    .getAvailableFontFamilyNames(Locale.ROOT));
        } catch (RuntimeException | Error e) { // no font configuration at all: fall back to the logical font
            return Font.SANS_SERIF;
        }
        // a family asked for by name (the tests pin one, so chart digests do not depend on what else is installed)
        String asked = System.getProperty(FONT_PROPERTY, "");
        if (!asked.isEmpty() && installed.contains(asked)) {
            return asked;
        }
        for (String f : List.of("Liberation Sans", "Arial", "Helvetica", "DejaVu Sans")) {
            if (installed.contains(f)) {
                return f;
            }
        }
        return Font.SANS_SERIF;
    }

    /** The colour of the {@code index}-th curve, the palette repeating after its last colour. */
    static Color seriesColour(int index) {
        return PALETTE[index % PALETTE.length];
    }

    static Color withAlpha(Color c, int alpha) {
        return new Color(c.getRed(), c.getGreen(), c.getBlue(), alpha);
    }

    // ------------------------------------------------------------------------------------------------
    // Number formats of axis ticks and of labels

    /** Ticks of a log axis: each value with its own SI prefix ("10 kHz", "100 mΩ"). */
    static EngineeringFormat logTicks(String unit) {
        return EngineeringFormat.perValue(unit);
    }

    /** Ticks of a linear axis from {@code lo} to {@code hi}: one SI prefix for the whole axis. */
    static EngineeringFormat linearTicks(String unit, double lo, double hi) {
        return EngineeringFormat.forRange(unit, lo, hi);
    }

    /** Ticks without an SI prefix (money, counts), decimals chosen for the span {@code lo} .. {@code hi}. */
    static EngineeringFormat plainTicks(String unit, double lo, double hi) {
        return EngineeringFormat.plain(unit, lo, hi);
    }

    /** One value in a label, with its own SI prefix: "9.5 mΩ", "1 µs". */
    static String withPrefix(double value, String unit) {
        return EngineeringFormat.perValue(unit).text(value);
    }

    /** Voltages with four significant digits and no prefix change across 1 V: "0.9215 V". */
    static String fourDigits(double v, String unit) {
        return new BigDecimal(v).round(new MathContext(4)).stripTrailingZeros().toPlainString()
                + " " + unit;
    }

    // ------------------------------------------------------------------------------------------------
    // Styling of the chart, the plot, the axes, lines and legend items

    /** The chart around {@code plot}: no title, white, padded, anti-aliased, the legend (if any) below. */
    static JFreeChart chart(Plot plot, boolean legend) {
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

    /** White plot, grey outline and grid; minor grid lines along log axes. */
    static void style(XYPlot p) {
        p.setBackgroundPaint(Color.WHITE);
        p.setOutlinePaint(OUTLINE);
        p.setDomainGridlinePaint(GRID);
        p.setRangeGridlinePaint(GRID);
        p.setDomainGridlineStroke(GRID_STROKE);
        p.setRangeGridlineStroke(GRID_STROKE);
        p.setDomainMinorGridlinePaint(MINOR_GRID);
        p.setRangeMinorGridlinePaint(MINOR_GRID);
        p.setDomainMinorGridlineStroke(MINOR_GRID_STROKE);
        p.setRangeMinorGridlineStroke(MINOR_GRID_STROKE);
        p.setAxisOffset(new RectangleInsets(2, 2, 2, 2));
        if (p.getDomainAxis() instanceof LogAxis) {
            p.setDomainMinorGridlinesVisible(true);
        }
        if (p.getRangeAxis() instanceof LogAxis) {
            p.setRangeMinorGridlinesVisible(true);
        }
    }

    static void styleAxis(ValueAxis a) {
        a.setAxisLineVisible(false); // the plot outline already draws it
        a.setLabelFont(LABEL_FONT);
        a.setTickLabelFont(TICK_FONT);
        a.setLabelPaint(AXIS_LABEL);
        a.setTickLabelPaint(TICK_LABEL);
        a.setAxisLinePaint(OUTLINE);
        a.setTickMarkPaint(OUTLINE);
    }

    /** Lines only, one palette colour per series, each series drawn as one path. */
    static XYLineAndShapeRenderer lineRenderer(int n) {
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, false);
        for (int i = 0; i < n; i++) {
            r.setSeriesPaint(i, seriesColour(i));
            r.setSeriesStroke(i, LINE);
        }
        r.setDrawSeriesLineAsPath(true);
        return r;
    }

    /** A labelled line at {@code value}, the label at the right end, above the line or {@code below} it. */
    static ValueMarker valueLine(double value, String label, Paint paint, Stroke stroke, boolean below) {
        return valueLine(value, label, paint, stroke, below, false);
    }

    /** As {@link #valueLine(double, String, Paint, Stroke, boolean)}, the label at the left end when {@code left}. */
    static ValueMarker valueLine(double value, String label, Paint paint, Stroke stroke, boolean below, boolean left) {
        ValueMarker m = new ValueMarker(value, paint, stroke);
        m.setLabel(label);
        m.setLabelFont(NOTE_FONT);
        m.setLabelPaint(paint);
        m.setLabelAnchor(left ? (below ? RectangleAnchor.BOTTOM_LEFT : RectangleAnchor.TOP_LEFT)
                : (below ? RectangleAnchor.BOTTOM_RIGHT : RectangleAnchor.TOP_RIGHT));
        m.setLabelTextAnchor(left ? (below ? TextAnchor.TOP_LEFT : TextAnchor.BOTTOM_LEFT)
                : (below ? TextAnchor.TOP_RIGHT : TextAnchor.BOTTOM_RIGHT));
        m.setLabelOffset(new RectangleInsets(2, 6, 2, 6));
        m.setLabelBackgroundColor(LABEL_BACKGROUND);
        return m;
    }

    /** A legend entry drawn as a short line in {@code paint} and {@code stroke}. */
    static LegendItem lineItem(String label, Paint paint, Stroke stroke) {
        return new LegendItem(label, null, null, null, new Line2D.Double(-12, 0, 12, 0), stroke, paint);
    }
}
