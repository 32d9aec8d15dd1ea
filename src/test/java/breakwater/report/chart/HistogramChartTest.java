package breakwater.report.chart;

import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Random;

import static breakwater.report.chart.SvgDocuments.texts;
import static org.assertj.core.api.Assertions.assertThat;

class HistogramChartTest {

    @Test
    void histogramIsSvgWithItsLimitLabel() throws Exception {
        Random rnd = new Random(3);
        double[] values = new double[500];
        for (int k = 0; k < values.length; k++) {
            values[k] = 0.02 + 0.002 * rnd.nextGaussian();
        }
        String h = HistogramChart.svg(new Histogram("worst droop", "V", values, 25,
                List.of(new Limit("allowed 28.5 mV", 0.0285))));
        assertThat(texts(h)).contains("allowed 28.5 mV", "worst droop", "count");
    }
}
