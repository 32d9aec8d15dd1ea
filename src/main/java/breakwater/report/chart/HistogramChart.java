package breakwater.report.chart;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.StandardXYBarPainter;
import org.jfree.chart.renderer.xy.XYBarRenderer;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.statistics.HistogramDataset;

import java.awt.geom.Rectangle2D;
import java.util.Arrays;

import static breakwater.report.chart.ChartStyle.DASHED;
import static breakwater.report.chart.ChartStyle.LABEL_BACKGROUND;
import static breakwater.report.chart.ChartStyle.LIMIT;
import static breakwater.report.chart.ChartStyle.NOTE_FONT;
import static breakwater.report.chart.ChartStyle.seriesColour;
import static breakwater.report.chart.ChartStyle.withAlpha;

/**
 * Counts of values in equal bins, e.g. the worst droop over the samples of a Monte Carlo run, with the
 * limits as dashed lines, their labels alternating left and right of the line.
 */
public final class HistogramChart {
    private HistogramChart() {
    }

    /** The chart of {@code h} as one {@code <svg>} element. */
    public static String svg(Histogram h) {
        return SvgWriter.render(ChartStyle.WIDTH, ChartStyle.HEIGHT, "bwh", h.hashCode(), () -> chart(h));
    }

    private static JFreeChart chart(Histogram h) {
        double[] values = h.values();
        double lo = Arrays.stream(values).min().orElseThrow();
        double hi = Arrays.stream(values).max().orElseThrow();
        if (hi == lo) {
            double pad = lo == 0 ? 1e-12 : Math.abs(lo) * 1e-3;
            lo -= pad;
            hi += pad;
        }
        HistogramDataset data = new HistogramDataset();
        double fail = h.failAbove();
        boolean split = !Double.isNaN(fail) && Arrays.stream(values).anyMatch(v -> v > fail);
        if (split) {
            // bins laid so the failing threshold is a bin edge: every bin is all passing or all failing
            double w = (hi - lo) / h.bins();
            double start = fail - Math.ceil((fail - lo) / w - 1e-9) * w;
            int n = (int) Math.ceil((hi - start) / w - 1e-9);
            n = Math.max(n, 1);
            double end = start + n * w;
            double[] pass = Arrays.stream(values).filter(v -> v <= fail).toArray();
            double[] over = Arrays.stream(values).filter(v -> v > fail).toArray();
            data.addSeries("within the allowance", pass.length > 0 ? pass : new double[0], n, start, end);
            data.addSeries("beyond the allowance (failing samples)", over, n, start, end);
            lo = Math.min(lo, start);
            hi = Math.max(hi, end);
        } else {
            data.addSeries("values", values, h.bins(), lo, hi);
        }
        double axisLo = lo;
        double axisHi = hi;
        for (Limit l : h.limits()) {
            axisLo = Math.min(axisLo, l.value());
            axisHi = Math.max(axisHi, l.value());
        }
        double pad = (axisHi - axisLo) * 0.05;
        NumberAxis x = Axes.linearAxis(h.axisLabel(), h.unit(), axisLo - pad, axisHi + pad);
        NumberAxis y = Axes.countAxis("count", maxCount(data) * 1.1);
        XYBarRenderer bars = new XYBarRenderer(0.04);
        bars.setBarPainter(new StandardXYBarPainter());
        bars.setShadowVisible(false);
        bars.setDrawBarOutline(true);
        bars.setSeriesPaint(0, withAlpha(seriesColour(0), 190));
        bars.setSeriesOutlinePaint(0, seriesColour(0).darker());
        bars.setSeriesPaint(1, withAlpha(LIMIT, 150));
        bars.setSeriesOutlinePaint(1, LIMIT.darker());
        XYPlot plot = new XYPlot(data, x, y, bars);
        ChartStyle.style(plot);
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
        if (split) {
            LegendItemCollection legend = new LegendItemCollection();
            legend.add(new LegendItem("within the allowance", null, null, null,
                    new Rectangle2D.Double(-6, -5, 12, 10), withAlpha(seriesColour(0), 190)));
            legend.add(new LegendItem("beyond the allowance: failing samples", null, null, null,
                    new Rectangle2D.Double(-6, -5, 12, 10), withAlpha(LIMIT, 150)));
            plot.setFixedLegendItems(legend);
        }
        return ChartStyle.chart(plot, split);
    }

    /** The largest count of any bin, at least 1. */
    private static int maxCount(HistogramDataset d) {
        int max = 1;
        for (int s = 0; s < d.getSeriesCount(); s++) {
            for (int i = 0; i < d.getItemCount(s); i++) {
                max = Math.max(max, d.getY(s, i).intValue());
            }
        }
        return max;
    }
}
