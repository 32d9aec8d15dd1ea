package breakwater.report;

import breakwater.report.ReportModel.ImpedancePlot;
import breakwater.report.ReportModel.WaveformPlot;
import breakwater.report.chart.ImpedanceChart;
import breakwater.report.chart.SvgWriter;
import breakwater.report.chart.WorstCaseChart;

/**
 * The report's impedance and worst-case charts, drawn by their classes in {@code breakwater.report.chart}
 * and returned as one {@code <svg>} element each.
 */
public final class Charts {
    private Charts() {
    }

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

    /** Removes an XML declaration and a DOCTYPE, if present, so the SVG can be inlined in a page. */
    public static String stripProlog(String svg) {
        return SvgWriter.stripProlog(svg);
    }
}
