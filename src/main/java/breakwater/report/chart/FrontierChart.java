package breakwater.report.chart;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.DatasetRenderingOrder;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.renderer.xy.XYStepRenderer;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

import java.awt.geom.Ellipse2D;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;

import static breakwater.report.chart.ChartStyle.DASHED;
import static breakwater.report.chart.ChartStyle.LIMIT;
import static breakwater.report.chart.ChartStyle.LINE;
import static breakwater.report.chart.ChartStyle.MARK;
import static breakwater.report.chart.ChartStyle.NOTE_FONT;
import static breakwater.report.chart.ChartStyle.OUTLINE;
import static breakwater.report.chart.ChartStyle.RING;
import static breakwater.report.chart.ChartStyle.lineItem;
import static breakwater.report.chart.ChartStyle.seriesColour;
import static breakwater.report.chart.ChartStyle.valueLine;

/**
 * Cost against worst excursion: every candidate as a grey dot, the frontier (the non-dominated
 * candidates) as a staircase, the excursion limits dashed, highlighted points ringed and labelled.
 */
public final class FrontierChart {
    private FrontierChart() {
    }

    /** The chart of {@code f} as one {@code <svg>} element. */
    public static String svg(Frontier f) {
        return SvgWriter.render(ChartStyle.WIDTH, ChartStyle.HEIGHT, "bwf", f.hashCode(), () -> chart(f));
    }

    private static JFreeChart chart(Frontier f) {
        double[] cost = f.cost();
        double[] exc = f.excursion();
        XYSeries all = new XYSeries("candidates", false, true);
        for (int i = 0; i < cost.length; i++) {
            all.add(cost[i], exc[i], false);
        }
        XYSeries front = new XYSeries("frontier", true, true);
        for (double[] p : nonDominated(cost, exc)) {
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
        NumberAxis x = Axes.linearAxis(f.costLabel(), f.costUnit(), xLo - xPad, xHi + xPad);
        x.setNumberFormatOverride(ChartStyle.plainTicks(f.costUnit(), xLo - xPad, xHi + xPad));
        NumberAxis y = Axes.linearAxis(f.excursionLabel(), f.excursionUnit(), yLo - yPad, yHi + yPad);

        XYLineAndShapeRenderer dots = new XYLineAndShapeRenderer(false, true);
        dots.setSeriesShape(0, new Ellipse2D.Double(-2.5, -2.5, 5, 5));
        dots.setSeriesPaint(0, OUTLINE);
        XYStepRenderer steps = new XYStepRenderer();
        steps.setSeriesPaint(0, seriesColour(0));
        steps.setSeriesStroke(0, LINE);
        steps.setDefaultShapesVisible(true);
        steps.setSeriesShape(0, new Ellipse2D.Double(-3.5, -3.5, 7, 7));
        // drawn in index order: candidates below, the frontier over them, highlights on top
        XYPlot plot = new XYPlot(new XYSeriesCollection(all), x, y, dots);
        plot.setDataset(1, new XYSeriesCollection(front));
        plot.setRenderer(1, steps);
        plot.setDatasetRenderingOrder(DatasetRenderingOrder.FORWARD);
        ChartStyle.style(plot);
        for (Limit l : f.excursionLimits()) {
            plot.addRangeMarker(valueLine(l.value(), l.label(), LIMIT, DASHED, false), Layer.FOREGROUND);
        }
        for (LabelledPoint p : f.highlighted()) {
            // below and left of a frontier point lies the region no candidate reaches: room for text
            // (near the left edge the text goes right of the point instead, so it is not cut off)
            boolean nearLeft = p.x() < xLo - xPad + 0.25 * (xHi - xLo + 2 * xPad);
            double shift = nearLeft ? 0.02 * (xHi - xLo + 2 * xPad) : 0;
            XYTextAnnotation a = new XYTextAnnotation(nearLeft ? p.label() : p.label() + "    ", p.x() + shift, p.y());
            a.setFont(NOTE_FONT);
            a.setPaint(MARK);
            a.setTextAnchor(nearLeft ? TextAnchor.TOP_LEFT : TextAnchor.TOP_RIGHT);
            steps.addAnnotation(a, Layer.FOREGROUND);
        }
        if (!f.highlighted().isEmpty()) {
            XYSeries hs = new XYSeries("highlighted", false, true);
            f.highlighted().forEach(p -> hs.add(p.x(), p.y()));
            XYLineAndShapeRenderer ring = new XYLineAndShapeRenderer(false, true);
            ring.setSeriesShape(0, new Ellipse2D.Double(-7, -7, 14, 14));
            ring.setSeriesShapesFilled(0, false);
            ring.setUseOutlinePaint(false);
            ring.setSeriesPaint(0, seriesColour(1));
            ring.setSeriesStroke(0, RING);
            ring.setSeriesOutlineStroke(0, RING);
            ring.setDrawOutlines(true);
            plot.setDataset(2, new XYSeriesCollection(hs));
            plot.setRenderer(2, ring);
        }
        LegendItemCollection legend = new LegendItemCollection();
        legend.add(new LegendItem("candidate", null, null, null, new Ellipse2D.Double(-3, -3, 6, 6), OUTLINE));
        legend.add(lineItem("frontier (no cheaper bank with a lower " + f.excursionLabel() + ")", seriesColour(0), LINE));
        if (!f.excursionLimits().isEmpty()) {
            legend.add(lineItem(f.excursionLimits().get(0).label(), LIMIT, DASHED));
        }
        plot.setFixedLegendItems(legend);
        return ChartStyle.chart(plot, true);
    }

    /**
     * The non-dominated points for minimising both coordinates, sorted by ascending x: each has a y
     * strictly below every point with a smaller or equal x. {@code x} and {@code y} have the same length.
     */
    public static List<double[]> nonDominated(double[] x, double[] y) {
        Checks.require(x.length == y.length, x.length + " x values but " + y.length
                + " y values; each point needs both");
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
}
