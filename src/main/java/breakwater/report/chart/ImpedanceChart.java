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

import java.awt.Shape;
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
            for (ImpedanceMarker m : plot.markers()) {
                if (!m.label().isEmpty()) {
                    // a tenth of a decade above the marker, in data units on the log axis
                    XYTextAnnotation a = new XYTextAnnotation(m.label(), m.frequencyHz(), m.impedanceOhm() * 1.3);
                    a.setFont(NOTE_FONT);
                    a.setPaint(MARK);
                    a.setTextAnchor(TextAnchor.BOTTOM_CENTER);
                    lines.addAnnotation(a);
                }
            }
        }
        xy.setFixedLegendItems(legend);
        return ChartStyle.chart(xy, true);
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
