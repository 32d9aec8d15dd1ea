package breakwater.report;

import breakwater.report.chart.ImpedanceSeries;
import breakwater.report.chart.WaveformPlot;
import breakwater.report.chart.WaveformSeries;
import breakwater.report.ReportModel.Table;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

class ReportModelTest {

    @Test
    void seriesRejectMismatchedNonPositiveAndUnorderedData() {
        assertThatThrownBy(() -> new ImpedanceSeries("a", new double[]{1, 2, 3}, new double[]{1, 2}))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("3 frequencies but 2 impedances");
        assertThatThrownBy(() -> new ImpedanceSeries("a", new double[]{1, 2}, new double[]{1, 0}))
                .hasMessageContaining("impedanceOhm[1] = 0.0 must be positive");
        assertThatThrownBy(() -> new ImpedanceSeries("a", new double[]{2, 1}, new double[]{1, 1}))
                .hasMessageContaining("must ascend");
        assertThatThrownBy(() -> new WaveformSeries("w", new double[]{0, 1}, new double[]{1, 1}, new double[]{1}))
                .hasMessageContaining("same length");
        assertThatThrownBy(() -> new WaveformSeries("w", new double[]{0, 2, 1}, new double[3], new double[3]))
                .hasMessageContaining("must not decrease");
        WaveformSeries ok = new WaveformSeries("w", new double[]{0, 1}, new double[2], new double[]{1, 1});
        assertThatThrownBy(() -> new WaveformPlot(List.of(ok), 1.0, 1.1, 1.2)).hasMessageContaining("ordered");
    }

    @Test
    void tablesNeedOneCellPerColumn() {
        assertThatThrownBy(() -> new Table("t", List.of("a", "b"), List.of(List.of("1", "2"), List.of("3"))))
                .hasMessage("table 't' row 2 has 1 cells for 2 columns; every row needs one cell per column");
    }

    @Test
    void arraysAreCopiedInAndOut() {
        double[] f = {1, 10};
        double[] z = {1, 2};
        ImpedanceSeries s = new ImpedanceSeries("a", f, z);
        f[0] = 5;
        s.impedanceOhm()[0] = 7;
        assertThat(s.frequencyHz()).containsExactly(1, 10);
        assertThat(s.impedanceOhm()).containsExactly(1, 2);
        assertThat(new ImpedanceSeries("a", new double[]{1, 10}, new double[]{1, 2})).isEqualTo(s);
    }
}
