package breakwater.report.chart;

import java.util.List;

import static breakwater.report.chart.Checks.require;

/** The worst-case chart's data: one or more waveforms with the rail's nominal voltage and limits. */
public record WaveformPlot(List<WaveformSeries> series, double nominalV, double lowerLimitV, double upperLimitV) {
    public WaveformPlot {
        series = List.copyOf(series);
        require(!series.isEmpty(), "worst-case plot has no waveform; it needs at least one");
        require(Double.isFinite(lowerLimitV) && Double.isFinite(upperLimitV) && lowerLimitV <= nominalV
                && nominalV <= upperLimitV, "voltage limits " + lowerLimitV + " <= " + nominalV + " <= "
                + upperLimitV + " V must be finite and ordered");
    }
}
