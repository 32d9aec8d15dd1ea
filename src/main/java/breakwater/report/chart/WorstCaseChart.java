package breakwater.report.chart;


import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.Layer;
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
import static breakwater.report.chart.ChartStyle.THIN;
import static breakwater.report.chart.ChartStyle.fourDigits;
import static breakwater.report.chart.ChartStyle.lineItem;
import static breakwater.report.chart.ChartStyle.lineRenderer;
import static breakwater.report.chart.ChartStyle.seriesColour;
import static breakwater.report.chart.ChartStyle.valueLine;

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

    /** The sample of {@code s} farthest from nominal: the worst instant of its pattern. */
    private static int worstIndex(WaveformSeries s, double nominalV) {
        double[] v = s.voltageV();
        int worst = 0;
        for (int k = 1; k < v.length; k++) {
            if (Math.abs(v[k] - nominalV) > Math.abs(v[worst] - nominalV)) {
                worst = k;
            }
        }
        return worst;
    }

    private static JFreeChart chart(WaveformPlot plot) {
        double tMin = Double.POSITIVE_INFINITY;
        double tMax = Double.NEGATIVE_INFINITY;
        double iMin = Double.POSITIVE_INFINITY;
        double iMax = Double.NEGATIVE_INFINITY;
        double vMin = plot.lowerLimitV();
        double vMax = plot.upperLimitV();
        // several patterns are overlaid aligned at each one's worst instant (time counted from it), so
        // their worst moments can be compared; one pattern keeps its own time base
        boolean aligned = plot.series().size() > 1;
        int n = plot.series().size();
        double[] worstT = new double[n];
        double[] worstV = new double[n];
        XYSeriesCollection currents = new XYSeriesCollection();
        XYSeriesCollection voltages = new XYSeriesCollection();
        for (int index = 0; index < n; index++) {
            WaveformSeries s = plot.series().get(index);
            XYSeries ci = new XYSeries(index + " " + s.label(), false, true);
            XYSeries cv = new XYSeries(index + " " + s.label(), false, true);
            double[] t = s.timeS();
            double[] i = s.currentA();
            double[] v = s.voltageV();
            int worst = worstIndex(s, plot.nominalV());
            double shift = aligned ? t[worst] : 0;
            worstT[index] = t[worst] - shift;
            worstV[index] = v[worst];
            for (int k = 0; k < t.length; k++) {
                ci.add(t[k] - shift, i[k], false);
                cv.add(t[k] - shift, v[k], false);
                iMin = Math.min(iMin, i[k]);
                iMax = Math.max(iMax, i[k]);
                vMin = Math.min(vMin, v[k]);
                vMax = Math.max(vMax, v[k]);
            }
            tMin = Math.min(tMin, t[0] - shift);
            tMax = Math.max(tMax, t[t.length - 1] - shift);
            currents.addSeries(ci);
            voltages.addSeries(cv);
        }
        NumberAxis timeAxis = Axes.linearAxis(aligned ? "time from each pattern's worst instant" : "time", "s",
                tMin, tMax);
        // one time unit for the whole chart: the ticks, the worst instants in the legend
        EngineeringFormat time = EngineeringFormat.forRangeInWholeUnits("s", tMin, tMax);
        timeAxis.setNumberFormatOverride(time);
        double iPad = Math.max((iMax - iMin) * 0.12, Math.max(Math.abs(iMax), 1e-12) * 0.05);
        NumberAxis currentAxis = Axes.linearAxis("load current", "A", iMin - iPad, iMax + iPad);
        double vPad = (vMax - vMin) * 0.10;
        NumberAxis voltageAxis = Axes.linearAxis("load voltage", "V", vMin - vPad, vMax + vPad);

        XYLineAndShapeRenderer iLines = lineRenderer(n);
        XYPlot top = new XYPlot(currents, null, currentAxis, iLines);
        ChartStyle.style(top);
        XYLineAndShapeRenderer vLines = lineRenderer(n);
        XYPlot bottom = new XYPlot(voltages, null, voltageAxis, vLines);
        ChartStyle.style(bottom);

        // the limits' labels at the end of the chart away from the worst instants, so no dot sits on them
        boolean labelsLeft = java.util.Arrays.stream(worstT).max().orElse(tMin) > tMin + 0.5 * (tMax - tMin);
        bottom.addRangeMarker(valueLine(plot.upperLimitV(), "upper limit " + fourDigits(plot.upperLimitV(), "V"),
                LIMIT, DASHED, false, labelsLeft), Layer.FOREGROUND);
        bottom.addRangeMarker(valueLine(plot.lowerLimitV(), "lower limit " + fourDigits(plot.lowerLimitV(), "V"),
                LIMIT, DASHED, true, labelsLeft), Layer.FOREGROUND);
        bottom.addRangeMarker(new ValueMarker(plot.nominalV(), NOMINAL, THIN), Layer.BACKGROUND);

        // each pattern's worst instant: a dot in its own colour (in the legend with its value), one dotted line
        // through both plots per distinct instant. The words are in the legend, not beside the dot: there
        // they would cover the limit's label, at the same height whenever the worst case is near its limit.
        XYLineAndShapeRenderer dots = new XYLineAndShapeRenderer(false, true);
        XYSeriesCollection worstPoints = new XYSeriesCollection();
        java.util.Set<Double> lines = new java.util.LinkedHashSet<>();
        String[] what = new String[n];
        for (int k = 0; k < n; k++) {
            boolean low = worstV[k] < plot.nominalV();
            what[k] = (n > 1 ? plot.series().get(k).label() + ": " : "") + (low ? "minimum " : "maximum ")
                    + fourDigits(worstV[k], "V") + (aligned ? "" : " at " + time.text(worstT[k]));
            XYSeries point = new XYSeries("worst " + k, false, true);
            point.add(worstT[k], worstV[k]);
            worstPoints.addSeries(point);
            // later dots smaller, so dots at one instant (aligned patterns) stay visible as rings
            double r = Math.max(2, 5 - 1.5 * k);
            dots.setSeriesShape(k, new Ellipse2D.Double(-r, -r, 2 * r, 2 * r));
            dots.setSeriesPaint(k, n > 1 ? seriesColour(k) : MARK);
            dots.setSeriesVisibleInLegend(k, false);
            lines.add(worstT[k]);
        }
        for (double at : lines) {
            for (XYPlot p : List.of(top, bottom)) {
                p.addDomainMarker(new ValueMarker(at, MARK, DOTTED), Layer.FOREGROUND);
            }
        }
        bottom.setDataset(1, worstPoints);
        bottom.setRenderer(1, dots);

        CombinedDomainXYPlot combined = new CombinedDomainXYPlot(timeAxis);
        combined.setGap(12);
        combined.add(top, 2);
        combined.add(bottom, 3);
        combined.setOrientation(PlotOrientation.VERTICAL);
        LegendItemCollection legend = new LegendItemCollection();
        for (int k = 0; k < n; k++) {
            legend.add(lineItem(plot.series().get(k).label(), seriesColour(k), LINE));
        }
        legend.add(lineItem("limits " + fourDigits(plot.lowerLimitV(), "V") + " / "
                + fourDigits(plot.upperLimitV(), "V"), LIMIT, DASHED));
        legend.add(lineItem("nominal " + fourDigits(plot.nominalV(), "V"), NOMINAL, THIN));
        for (int k = 0; k < n; k++) {
            legend.add(new LegendItem(what[k], null, null, null, new Ellipse2D.Double(-4, -4, 8, 8),
                    n > 1 ? seriesColour(k) : MARK));
        }
        combined.setFixedLegendItems(legend);
        return ChartStyle.chart(combined, true);
    }
}
