package breakwater.report.chart;

import java.util.Arrays;

import static breakwater.report.chart.Checks.require;
import static breakwater.report.chart.Checks.requireAscending;
import static breakwater.report.chart.Checks.requirePositive;
import static breakwater.report.chart.Checks.requireText;

/** One |Z| curve: {@code impedanceOhm[i]} at {@code frequencyHz[i]}, frequencies ascending, all positive. */
public record ImpedanceSeries(String label, double[] frequencyHz, double[] impedanceOhm) {
    public ImpedanceSeries {
        requireText(label, "impedance series label");
        frequencyHz = frequencyHz.clone();
        impedanceOhm = impedanceOhm.clone();
        String what = "impedance series '" + label + "'";
        require(frequencyHz.length >= 2, what + " has " + frequencyHz.length + " points; a curve needs at least 2");
        require(frequencyHz.length == impedanceOhm.length, what + ": " + frequencyHz.length + " frequencies but "
                + impedanceOhm.length + " impedances; the arrays must have the same length");
        requirePositive(frequencyHz, what + " frequencyHz");
        requirePositive(impedanceOhm, what + " impedanceOhm");
        requireAscending(frequencyHz, what + " frequencyHz");
    }

    @Override
    public double[] frequencyHz() {
        return frequencyHz.clone();
    }

    @Override
    public double[] impedanceOhm() {
        return impedanceOhm.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ImpedanceSeries s && s.label.equals(label) && Arrays.equals(s.frequencyHz, frequencyHz)
                && Arrays.equals(s.impedanceOhm, impedanceOhm);
    }

    @Override
    public int hashCode() {
        return label.hashCode() * 31 + Arrays.hashCode(frequencyHz) * 17 + Arrays.hashCode(impedanceOhm);
    }

    @Override
    public String toString() {
        return "ImpedanceSeries[" + label + ", " + frequencyHz.length + " points]";
    }
}
