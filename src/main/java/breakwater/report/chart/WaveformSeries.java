package breakwater.report.chart;

import java.util.Arrays;

import static breakwater.report.chart.Checks.require;
import static breakwater.report.chart.Checks.requireFinite;
import static breakwater.report.chart.Checks.requireText;

/**
 * A load-current pattern and the load voltage it causes, on a common time base (ascending seconds).
 */
public record WaveformSeries(String label, double[] timeS, double[] currentA, double[] voltageV) {
    public WaveformSeries {
        requireText(label, "waveform label");
        timeS = timeS.clone();
        currentA = currentA.clone();
        voltageV = voltageV.clone();
        String what = "waveform '" + label + "'";
        require(timeS.length >= 2, what + " has " + timeS.length + " samples; a waveform needs at least 2");
        require(currentA.length == timeS.length && voltageV.length == timeS.length, what + ": " + timeS.length
                + " times, " + currentA.length + " currents, " + voltageV.length
                + " voltages; the arrays must have the same length");
        requireFinite(timeS, what + " timeS");
        requireFinite(currentA, what + " currentA");
        requireFinite(voltageV, what + " voltageV");
        for (int i = 1; i < timeS.length; i++) {
            require(timeS[i] >= timeS[i - 1], what + " timeS[" + i + "] = " + timeS[i] + " is before timeS["
                    + (i - 1) + "] = " + timeS[i - 1] + "; times must not decrease");
        }
        require(timeS[timeS.length - 1] > timeS[0], what + " spans no time");
    }

    @Override
    public double[] timeS() {
        return timeS.clone();
    }

    @Override
    public double[] currentA() {
        return currentA.clone();
    }

    @Override
    public double[] voltageV() {
        return voltageV.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof WaveformSeries s && s.label.equals(label) && Arrays.equals(s.timeS, timeS)
                && Arrays.equals(s.currentA, currentA) && Arrays.equals(s.voltageV, voltageV);
    }

    @Override
    public int hashCode() {
        return label.hashCode() * 31 + Arrays.hashCode(timeS) * 17 + Arrays.hashCode(currentA) * 7
                + Arrays.hashCode(voltageV);
    }

    @Override
    public String toString() {
        return "WaveformSeries[" + label + ", " + timeS.length + " samples]";
    }
}
