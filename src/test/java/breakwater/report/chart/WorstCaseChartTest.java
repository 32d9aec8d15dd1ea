package breakwater.report.chart;

import org.junit.jupiter.api.Test;

import java.util.List;

import static breakwater.report.chart.SvgDocuments.dip;
import static breakwater.report.chart.SvgDocuments.texts;
import static org.assertj.core.api.Assertions.assertThat;

class WorstCaseChartTest {

    @Test
    void worstCaseChartMarksTheLargestDeviationOfTheWaveform() throws Exception {
        String svg = WorstCaseChart.svg(dip());
        List<String> texts = texts(svg);
        assertThat(texts).anyMatch(s -> s.equals("minimum 0.93 V at 1 µs"));
        assertThat(texts).contains("load current", "load voltage", "time", "upper limit 0.9785 V", "lower limit 0.9215 V");
        // ticks on a single prefix per axis
        assertThat(texts).contains("0 µs", "1 µs", "3 A", "6 A");
    }

    /** A dip of 20 mV below 0.95 V at {@code atS}, sampled every {@code stepS} over {@code n} points. */
    static WaveformSeries dipAt(String label, double atS, double stepS, int n) {
        double[] t = new double[n];
        double[] i = new double[n];
        double[] v = new double[n];
        for (int k = 0; k < n; k++) {
            t[k] = k * stepS;
            i[k] = 3;
            double x = (t[k] - atS) / (20 * stepS);
            v[k] = 0.95 - 0.02 * Math.exp(-x * x);
        }
        return new WaveformSeries(label, t, i, v);
    }

    @Test
    void oneTimeUnitForTicksAndLegend() throws Exception {
        // 300 µs long, worst at 168.3 µs: the ticks and the legend both in µs (not "0.02 ms" beside "168.3 µs")
        String svg = WorstCaseChart.svg(new WaveformPlot(List.of(dipAt("long", 168.3e-6, 0.1e-6, 3001)), 0.95,
                0.9215, 0.9785));
        List<String> texts = texts(svg);
        assertThat(texts).anyMatch(s -> s.startsWith("minimum") && s.endsWith("168.3 µs"));
        List<String> timeTicks = texts.stream().filter(s -> s.matches("[−0-9.]+ [a-zµ]?s")).toList();
        assertThat(timeTicks).isNotEmpty().allSatisfy(s -> assertThat(s).endsWith(" µs"));
    }

    @Test
    void overlaidPatternsAreAlignedAtEachOnesWorstInstantWithADotEach() throws Exception {
        WaveformPlot two = new WaveformPlot(List.of(dipAt("early", 0.4e-6, 1e-9, 2001), dipAt("late", 1.6e-6, 1e-9,
                2001)), 0.95, 0.9215, 0.9785);
        List<String> texts = texts(WorstCaseChart.svg(two));
        assertThat(texts).contains("time from each pattern's worst instant");
        assertThat(texts).anyMatch(s -> s.startsWith("early: minimum 0.93 V"))
                .anyMatch(s -> s.startsWith("late: minimum 0.93 V"));
        // aligned: the axis runs from before the later pattern's worst instant to after the earlier one's,
        // with 0 (both worst instants) inside
        assertThat(texts).contains("0 µs").anyMatch(s -> s.startsWith("−1") && s.endsWith("µs"))
                .anyMatch(s -> s.matches("1(\\.0+)? µs"));
    }
}
