package breakwater.report.chart;

import java.util.Arrays;
import java.util.List;

import static breakwater.report.chart.Checks.require;

/**
 * Histogram data: {@code values} counted in {@code bins} equal bins; {@code unit} is an SI symbol or "".
 * Values above {@code failAbove} (NaN: none) are failing samples, drawn shaded apart from the rest.
 */
public record Histogram(String axisLabel, String unit, double[] values, int bins, List<Limit> limits,
                        double failAbove) {
    /** A histogram with no failing values marked. */
    public Histogram(String axisLabel, String unit, double[] values, int bins, List<Limit> limits) {
        this(axisLabel, unit, values, bins, limits, Double.NaN);
    }

    public Histogram {
        require(axisLabel != null && unit != null, "histogram label or unit is null");
        values = values.clone();
        require(values.length > 0, "histogram '" + axisLabel + "' has no values");
        require(bins >= 1, "histogram '" + axisLabel + "' has " + bins + " bins; it needs at least 1");
        for (double v : values) {
            require(Double.isFinite(v), "histogram '" + axisLabel + "' holds a non-finite value " + v);
        }
        limits = List.copyOf(limits);
    }

    @Override
    public double[] values() {
        return values.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Histogram h && h.axisLabel.equals(axisLabel) && h.unit.equals(unit)
                && Arrays.equals(h.values, values) && h.bins == bins && h.limits.equals(limits)
                && Double.compare(h.failAbove, failAbove) == 0;
    }

    @Override
    public int hashCode() {
        return axisLabel.hashCode() * 31 + Arrays.hashCode(values) + bins;
    }

    @Override
    public String toString() {
        return "Histogram[" + axisLabel + ", " + values.length + " values, " + bins + " bins]";
    }
}
