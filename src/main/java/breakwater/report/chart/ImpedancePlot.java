package breakwater.report.chart;

import java.util.List;

import static breakwater.report.chart.Checks.require;

/**
 * The impedance chart's data: one or more curves (overlays such as old and new bank, or one per
 * footprint), the target impedance, the band in which it is judged, and optional markers.
 */
public record ImpedancePlot(List<ImpedanceSeries> series, double targetOhm, double bandFromHz, double bandToHz,
                            List<ImpedanceMarker> markers) {
    public ImpedancePlot {
        series = List.copyOf(series);
        require(!series.isEmpty(), "impedance plot has no series; it needs at least one curve");
        require(targetOhm > 0 && Double.isFinite(targetOhm), "target impedance " + targetOhm
                + " Ω must be positive and finite");
        require(bandFromHz > 0 && bandToHz > bandFromHz && Double.isFinite(bandToHz), "band " + bandFromHz + " .. "
                + bandToHz + " Hz must be positive and ordered");
        markers = List.copyOf(markers);
    }

    public ImpedancePlot(List<ImpedanceSeries> series, double targetOhm, double bandFromHz, double bandToHz) {
        this(series, targetOhm, bandFromHz, bandToHz, List.of());
    }
}
