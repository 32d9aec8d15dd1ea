package breakwater.report.chart;


import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

import org.jfree.chart.ChartRenderingInfo;

import java.awt.Graphics2D;
import java.awt.Shape;
import java.awt.image.BufferedImage;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;

import static breakwater.report.chart.ChartStyle.BAND;
import static breakwater.report.chart.ChartStyle.DASHED;
import static breakwater.report.chart.ChartStyle.LABEL_BACKGROUND;
import static breakwater.report.chart.ChartStyle.LIMIT;
import static breakwater.report.chart.ChartStyle.LINE;
import static breakwater.report.chart.ChartStyle.MARK;
import static breakwater.report.chart.ChartStyle.NOTE_FONT;
import static breakwater.report.chart.ChartStyle.THIN;
import static breakwater.report.chart.ChartStyle.lineItem;
import static breakwater.report.chart.ChartStyle.lineRenderer;
import static breakwater.report.chart.ChartStyle.seriesColour;
import static breakwater.report.chart.ChartStyle.withAlpha;
import static breakwater.report.chart.ChartStyle.withPrefix;

/**
 * |Z| at the load against frequency on log–log axes: one curve per series, the band in which the target
 * is judged shaded, the target impedance as a dashed line, and markers (e.g. anti-resonances) as
 * triangles with their labels.
 */
public final class ImpedanceChart {
    private ImpedanceChart() {
    }

    /** The chart of {@code plot} as one {@code <svg>} element. */
    public static String svg(ImpedancePlot plot) {
        return SvgWriter.render(ChartStyle.WIDTH, ChartStyle.HEIGHT, "bwz", plot.hashCode(), () -> chart(plot));
    }

    private static JFreeChart chart(ImpedancePlot plot) {
        XYSeriesCollection data = new XYSeriesCollection();
        double fMin = Double.POSITIVE_INFINITY;
        double fMax = 0;
        double zMin = plot.targetOhm();
        double zMax = plot.targetOhm();
        int index = 0;
        for (ImpedanceSeries s : plot.series()) {
            XYSeries xy = new XYSeries(index++ + " " + s.label(), false, true);
            double[] f = s.frequencyHz();
            double[] z = s.impedanceOhm();
            for (int i = 0; i < f.length; i++) {
                xy.add(f[i], z[i], false);
                zMin = Math.min(zMin, z[i]);
                zMax = Math.max(zMax, z[i]);
            }
            fMin = Math.min(fMin, f[0]);
            fMax = Math.max(fMax, f[f.length - 1]);
            data.addSeries(xy);
        }
        // the frequency axis ends where the curve does (no empty decade after it); |Z| spans whole decades
        LogAxis fAxis = Axes.logAxis("frequency", "Hz", fMin, fMax, false);
        LogAxis zAxis = Axes.logAxis("|Z| at the load", "Ω", zMin, zMax, true);
        XYLineAndShapeRenderer lines = lineRenderer(plot.series().size());
        XYPlot xy = new XYPlot(data, fAxis, zAxis, lines);
        ChartStyle.style(xy);

        IntervalMarker band = new IntervalMarker(plot.bandFromHz(), plot.bandToHz(), withAlpha(BAND, 28), THIN,
                withAlpha(BAND, 28), THIN, 1f);
        band.setLabel("band " + withPrefix(plot.bandFromHz(), "Hz") + " – " + withPrefix(plot.bandToHz(), "Hz"));
        band.setLabelFont(NOTE_FONT);
        band.setLabelPaint(BAND.darker());
        band.setLabelAnchor(RectangleAnchor.TOP_LEFT);
        band.setLabelTextAnchor(TextAnchor.TOP_LEFT);
        band.setLabelOffset(new RectangleInsets(4, 6, 4, 6));
        band.setLabelBackgroundColor(LABEL_BACKGROUND);
        xy.addDomainMarker(band, Layer.BACKGROUND);

        String targetText = "target " + withPrefix(plot.targetOhm(), "Ω");
        ValueMarker target = new ValueMarker(plot.targetOhm(), LIMIT, DASHED);
        target.setLabel(targetText);
        target.setLabelFont(NOTE_FONT);
        target.setLabelPaint(LIMIT);
        target.setLabelAnchor(RectangleAnchor.TOP_RIGHT);
        target.setLabelTextAnchor(TextAnchor.BOTTOM_RIGHT);
        target.setLabelOffset(new RectangleInsets(3, 6, 3, 6));
        target.setLabelBackgroundColor(LABEL_BACKGROUND);
        xy.addRangeMarker(target, Layer.FOREGROUND);

        LegendItemCollection legend = new LegendItemCollection();
        for (int i = 0; i < plot.series().size(); i++) {
            legend.add(lineItem(plot.series().get(i).label(), seriesColour(i), LINE));
        }
        legend.add(lineItem(targetText, LIMIT, DASHED));
        legend.add(new LegendItem("band", null, null, null, new Rectangle2D.Double(-6, -5, 12, 10),
                withAlpha(BAND, 60)));

        if (!plot.markers().isEmpty()) {
            XYSeries marks = new XYSeries("markers", false, true);
            for (ImpedanceMarker m : plot.markers()) {
                marks.add(m.frequencyHz(), m.impedanceOhm());
            }
            XYLineAndShapeRenderer shapes = new XYLineAndShapeRenderer(false, true);
            Shape triangle = downTriangle(5);
            shapes.setSeriesShape(0, triangle);
            shapes.setSeriesPaint(0, MARK);
            shapes.setSeriesVisibleInLegend(0, false);
            xy.setDataset(1, new XYSeriesCollection(marks));
            xy.setRenderer(1, shapes);
            legend.add(new LegendItem("anti-resonance", null, null, null, triangle, MARK));
        }
        xy.setFixedLegendItems(legend);
        JFreeChart chart = ChartStyle.chart(xy, true);
        if (plot.markers().stream().anyMatch(m -> !m.label().isEmpty())) {
            labelMarkers(chart, xy, plot, fAxis, zAxis, lines, targetText, band.getLabel());
        }
        return chart;
    }

    /**
     * The anti-resonance labels, each above (else below) its triangle where it covers no other label,
     * nor the target's or the band's: the chart is laid out once off-screen to learn where its data area
     * falls, and the labels are placed in pixels by {@link LabelPlacer}.
     */
    private static void labelMarkers(JFreeChart chart, XYPlot xy, ImpedancePlot plot, LogAxis fAxis, LogAxis zAxis,
                                     XYLineAndShapeRenderer lines, String targetText, String bandText) {
        ChartRenderingInfo info = new ChartRenderingInfo();
        BufferedImage scratch = new BufferedImage(ChartStyle.WIDTH, ChartStyle.HEIGHT, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = scratch.createGraphics();
        try {
            chart.draw(g, new Rectangle2D.Double(0, 0, ChartStyle.WIDTH, ChartStyle.HEIGHT), info);
        } finally {
            g.dispose();
        }
        Rectangle2D area = info.getPlotInfo().getDataArea();
        double fLo = Math.log10(fAxis.getLowerBound());
        double fHi = Math.log10(fAxis.getUpperBound());
        double zLo = Math.log10(zAxis.getLowerBound());
        double zHi = Math.log10(zAxis.getUpperBound());
        java.util.function.DoubleUnaryOperator px = f -> area.getMinX() + (Math.log10(f) - fLo) / (fHi - fLo) * area.getWidth();
        java.util.function.DoubleUnaryOperator py = z -> area.getMaxY() - (Math.log10(z) - zLo) / (zHi - zLo) * area.getHeight();
        LabelPlacer placer = new LabelPlacer(NOTE_FONT, area);
        // the target's label sits right-aligned just above its line; the band's at the band's top left
        Rectangle2D t = placer.size(targetText);
        double ty = py.applyAsDouble(plot.targetOhm());
        placer.reserve(new Rectangle2D.Double(area.getMaxX() - 6 - t.getWidth() - 4, ty - 3 - t.getHeight() - 4,
                t.getWidth() + 8, t.getHeight() + 8));
        // and no label is struck through by the dashed target line
        placer.reserve(new Rectangle2D.Double(area.getMinX(), ty - 2, area.getWidth(), 4));
        Rectangle2D b = placer.size(bandText);
        double bx = Math.max(area.getMinX(), px.applyAsDouble(plot.bandFromHz()));
        placer.reserve(new Rectangle2D.Double(bx, area.getMinY(), b.getWidth() + 16, b.getHeight() + 12));
        for (ImpedanceMarker m : plot.markers()) {
            if (m.label().isEmpty()) {
                continue;
            }
            Rectangle2D box = placer.place(m.label(), px.applyAsDouble(m.frequencyHz()),
                    py.applyAsDouble(m.impedanceOhm()), 6);
            if (box == null) {
                continue; // no free place: the frequency is in the anti-resonance table
            }
            double zAt = Math.pow(10, zLo + (area.getMaxY() - box.getCenterY()) / area.getHeight() * (zHi - zLo));
            XYTextAnnotation a = new XYTextAnnotation(m.label(), m.frequencyHz(), zAt);
            a.setFont(NOTE_FONT);
            a.setPaint(MARK);
            a.setTextAnchor(TextAnchor.CENTER);
            a.setBackgroundPaint(LABEL_BACKGROUND);
            lines.addAnnotation(a);
        }
    }

    /** A triangle pointing down, {@code s} from its centre to each side. */
    private static Shape downTriangle(double s) {
        Path2D.Double p = new Path2D.Double();
        p.moveTo(-s, -s);
        p.lineTo(s, -s);
        p.lineTo(0, s);
        p.closePath();
        return p;
    }
}
