package breakwater.report.chart;


import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

import java.awt.geom.Ellipse2D;
import java.util.List;

import static breakwater.report.chart.ChartStyle.DASHED;
import static breakwater.report.chart.ChartStyle.DOTTED;
import static breakwater.report.chart.ChartStyle.LIMIT;
import static breakwater.report.chart.ChartStyle.LINE;
import static breakwater.report.chart.ChartStyle.MARK;
import static breakwater.report.chart.ChartStyle.NOMINAL;
import static breakwater.report.chart.ChartStyle.NOTE_FONT;
import static breakwater.report.chart.ChartStyle.THIN;
import static breakwater.report.chart.ChartStyle.fourDigits;
import static breakwater.report.chart.ChartStyle.lineItem;
import static breakwater.report.chart.ChartStyle.lineRenderer;
import static breakwater.report.chart.ChartStyle.seriesColour;
import static breakwater.report.chart.ChartStyle.valueLine;
import static breakwater.report.chart.ChartStyle.withPrefix;

/**
 * A worst-case load pattern: load current (above) and load voltage (below) sharing one time axis, with
 * the voltage limits dashed, the nominal thin, and the instant of the largest deviation from nominal
 * marked. The same chart draws a close-up near the worst instant when given the cropped waveform.
 */
public final class WorstCaseChart {
    /** Taller than the other charts: two plots share it. */
    private static final int HEIGHT = ChartStyle.HEIGHT + 60;

    private WorstCaseChart() {
    }

    /** The chart of {@code plot} as one {@code <svg>} element. */
    public static String svg(WaveformPlot plot) {
        return SvgWriter.render(ChartStyle.WIDTH, HEIGHT, "bww", plot.hashCode(), () -> chart(plot));
    }

    private static JFreeChart chart(WaveformPlot plot) {
        double tMin = Double.POSITIVE_INFINITY;
        double tMax = Double.NEGATIVE_INFINITY;
        double iMin = Double.POSITIVE_INFINITY;
        double iMax = Double.NEGATIVE_INFINITY;
        double vMin = plot.lowerLimitV();
        double vMax = plot.upperLimitV();
        XYSeriesCollection currents = new XYSeriesCollection();
        XYSeriesCollection voltages = new XYSeriesCollection();
        int index = 0;
        for (WaveformSeries s : plot.series()) {
            XYSeries ci = new XYSeries(index + " " + s.label(), false, true);
            XYSeries cv = new XYSeries(index + " " + s.label(), false, true);
            index++;
            double[] t = s.timeS();
            double[] i = s.currentA();
            double[] v = s.voltageV();
            for (int k = 0; k < t.length; k++) {
                ci.add(t[k], i[k], false);
                cv.add(t[k], v[k], false);
                iMin = Math.min(iMin, i[k]);
                iMax = Math.max(iMax, i[k]);
                vMin = Math.min(vMin, v[k]);
                vMax = Math.max(vMax, v[k]);
            }
            tMin = Math.min(tMin, t[0]);
            tMax = Math.max(tMax, t[t.length - 1]);
            currents.addSeries(ci);
            voltages.addSeries(cv);
        }
        NumberAxis timeAxis = Axes.linearAxis("time", "s", tMin, tMax);
        double iPad = Math.max((iMax - iMin) * 0.12, Math.max(Math.abs(iMax), 1e-12) * 0.05);
        NumberAxis currentAxis = Axes.linearAxis("load current", "A", iMin - iPad, iMax + iPad);
        double vPad = (vMax - vMin) * 0.10;
        NumberAxis voltageAxis = Axes.linearAxis("load voltage", "V", vMin - vPad, vMax + vPad);

        XYLineAndShapeRenderer iLines = lineRenderer(plot.series().size());
        XYPlot top = new XYPlot(currents, null, currentAxis, iLines);
        ChartStyle.style(top);
        XYLineAndShapeRenderer vLines = lineRenderer(plot.series().size());
        XYPlot bottom = new XYPlot(voltages, null, voltageAxis, vLines);
        ChartStyle.style(bottom);

        bottom.addRangeMarker(valueLine(plot.upperLimitV(), "upper limit " + fourDigits(plot.upperLimitV(), "V"),
                LIMIT, DASHED, false), Layer.FOREGROUND);
        bottom.addRangeMarker(valueLine(plot.lowerLimitV(), "lower limit " + fourDigits(plot.lowerLimitV(), "V"),
                LIMIT, DASHED, true), Layer.FOREGROUND);
        bottom.addRangeMarker(new ValueMarker(plot.nominalV(), NOMINAL, THIN), Layer.BACKGROUND);

        // the instant of the largest deviation from nominal, on the first waveform
        WaveformSeries first = plot.series().get(0);
        double[] t = first.timeS();
        double[] v = first.voltageV();
        int worst = 0;
        for (int k = 1; k < v.length; k++) {
            if (Math.abs(v[k] - plot.nominalV()) > Math.abs(v[worst] - plot.nominalV())) {
                worst = k;
            }
        }
        boolean low = v[worst] < plot.nominalV();
        String what = (low ? "minimum " : "maximum ") + fourDigits(v[worst], "V") + " at " + withPrefix(t[worst], "s");
        boolean nearRightEdge = (t[worst] - tMin) > 0.6 * (tMax - tMin);
        for (XYPlot p : List.of(top, bottom)) {
            ValueMarker m = new ValueMarker(t[worst], MARK, DOTTED);
            p.addDomainMarker(m, Layer.FOREGROUND);
        }
        XYTextAnnotation note = new XYTextAnnotation(what + "  ", t[worst], v[worst]);
        note.setFont(NOTE_FONT);
        note.setPaint(MARK);
        note.setTextAnchor(nearRightEdge ? (low ? TextAnchor.TOP_RIGHT : TextAnchor.BOTTOM_RIGHT)
                : (low ? TextAnchor.TOP_LEFT : TextAnchor.BOTTOM_LEFT));
        vLines.addAnnotation(note);
        XYLineAndShapeRenderer dot = new XYLineAndShapeRenderer(false, true);
        XYSeries worstPoint = new XYSeries("worst", false, true);
        worstPoint.add(t[worst], v[worst]);
        dot.setSeriesShape(0, new Ellipse2D.Double(-4, -4, 8, 8));
        dot.setSeriesPaint(0, MARK);
        bottom.setDataset(1, new XYSeriesCollection(worstPoint));
        bottom.setRenderer(1, dot);

        CombinedDomainXYPlot combined = new CombinedDomainXYPlot(timeAxis);
        combined.setGap(12);
        combined.add(top, 2);
        combined.add(bottom, 3);
        combined.setOrientation(PlotOrientation.VERTICAL);
        LegendItemCollection legend = new LegendItemCollection();
        for (int k = 0; k < plot.series().size(); k++) {
            legend.add(lineItem(plot.series().get(k).label(), seriesColour(k), LINE));
        }
        legend.add(lineItem("limits " + fourDigits(plot.lowerLimitV(), "V") + " / "
                + fourDigits(plot.upperLimitV(), "V"), LIMIT, DASHED));
        legend.add(lineItem("nominal " + fourDigits(plot.nominalV(), "V"), NOMINAL, THIN));
        legend.add(new LegendItem(what, null, null, null, new Ellipse2D.Double(-4, -4, 8, 8), MARK));
        combined.setFixedLegendItems(legend);
        return ChartStyle.chart(combined, true);
    }
}
