package breakwater.report.chart;

import static breakwater.report.chart.Checks.require;

/** A point to mark on the impedance chart, e.g. an anti-resonance; an empty label draws no text. */
public record ImpedanceMarker(String label, double frequencyHz, double impedanceOhm) {
    public ImpedanceMarker {
        require(label != null, "impedance marker label is null");
        require(frequencyHz > 0 && Double.isFinite(frequencyHz), "impedance marker frequency " + frequencyHz
                + " Hz must be positive and finite");
        require(impedanceOhm > 0 && Double.isFinite(impedanceOhm), "impedance marker |Z| " + impedanceOhm
                + " Ω must be positive and finite");
    }
}
