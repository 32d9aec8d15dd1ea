package breakwater.report.chart;

import static breakwater.report.chart.Checks.require;

/** A labelled value line, e.g. a tolerance limit on a histogram or a spec on a frontier. */
public record Limit(String label, double value) {
    public Limit {
        require(label != null, "limit label is null");
        require(Double.isFinite(value), "limit '" + label + "' value " + value + " is not finite");
    }
}
