package breakwater.report.chart;

import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import static breakwater.report.chart.SvgDocuments.texts;
import static org.assertj.core.api.Assertions.assertThat;

class FrontierChartTest {

    @Test
    void frontierIsSvgWithItsLimitAndHighlightLabels() throws Exception {
        double[] cost = {1.0, 2.0, 1.5, 3.0};
        double[] exc = {0.05, 0.02, 0.03, 0.025};
        String f = FrontierChart.svg(new Frontier("cost", "USD", "excursion", "V", cost, exc,
                List.of(new Limit("allowed", 0.0285)), List.of(new LabelledPoint("chosen", 2.0, 0.02))));
        assertThat(texts(f)).contains("allowed", "chosen", "cost", "excursion");
    }

    @Test
    void frontierKeepsExactlyTheParetoOptimalPoints() {
        // Definition (Pareto optimality, minimising both): p is kept iff no q has q.x <= p.x and q.y <= p.y
        // with at least one strict. Checked against that definition by brute force on random points.
        Random rnd = new Random(11);
        for (int trial = 0; trial < 50; trial++) {
            int n = 1 + rnd.nextInt(60);
            double[] x = new double[n];
            double[] y = new double[n];
            for (int k = 0; k < n; k++) {
                x[k] = rnd.nextDouble();
                y[k] = rnd.nextDouble();
            }
            List<List<Double>> expected = new ArrayList<>();
            for (int p = 0; p < n; p++) {
                boolean dominated = false;
                for (int q = 0; q < n && !dominated; q++) {
                    dominated = q != p && x[q] <= x[p] && y[q] <= y[p] && (x[q] < x[p] || y[q] < y[p]);
                }
                if (!dominated) {
                    expected.add(List.of(x[p], y[p]));
                }
            }
            List<List<Double>> actual = FrontierChart.nonDominated(x, y).stream().map(p -> List.of(p[0], p[1])).toList();
            assertThat(actual).containsExactlyInAnyOrderElementsOf(expected);
            for (int k = 1; k < actual.size(); k++) {
                assertThat(actual.get(k).get(0)).isGreaterThan(actual.get(k - 1).get(0));
                assertThat(actual.get(k).get(1)).isLessThan(actual.get(k - 1).get(1));
            }
        }
    }
}
