package breakwater.report.chart;

import static breakwater.report.chart.Checks.require;

/** A labelled point to emphasise, e.g. the chosen bank on a frontier. */
public record LabelledPoint(String label, double x, double y) {
    public LabelledPoint {
        require(label != null, "point label is null");
        require(Double.isFinite(x) && Double.isFinite(y), "point '" + label + "' is not finite");
    }
}
