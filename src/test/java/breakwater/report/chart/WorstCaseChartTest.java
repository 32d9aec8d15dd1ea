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
}
