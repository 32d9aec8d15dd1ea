package breakwater.report;

import breakwater.report.ReportModel.ImpedanceMarker;
import breakwater.report.ReportModel.ImpedancePlot;
import breakwater.report.ReportModel.WaveformPlot;
import breakwater.report.ReportModel.WaveformSeries;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;
import org.w3c.dom.Element;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static org.assertj.core.api.Assertions.assertThat;

class ChartsTest {

    private static ImpedancePlot impedance() {
        // 1 kHz .. 1 GHz, so the frequency axis spans exactly six decades
        var s = ExampleReport.curve("bank", ExampleReport.NEW_BANK);
        return new ImpedancePlot(List.of(s), 9.5e-3, 10e3, 150e6, List.of(new ImpedanceMarker("66 kHz", 66e3, 30e-3)));
    }

    /** A Gaussian dip of 20 mV centred at 1 µs on 0.95 V: its minimum, 0.93 V at 1 µs, is known in closed form. */
    private static WaveformPlot dip() {
        int n = 2001;
        double[] t = new double[n];
        double[] i = new double[n];
        double[] v = new double[n];
        for (int k = 0; k < n; k++) {
            t[k] = k * 1e-9;
            i[k] = t[k] > 0.5e-6 && t[k] < 1e-6 ? 6 : 3;
            double x = (t[k] - 1e-6) / 0.2e-6;
            v[k] = 0.95 - 0.02 * Math.exp(-x * x);
        }
        return new WaveformPlot(List.of(new WaveformSeries("dip", t, i, v)), 0.95, 0.9215, 0.9785);
    }

    private static Element svgRoot(String svg) throws Exception {
        Document d = XmlSupport.parse(svg); // throws unless the string is well-formed XML
        Element root = d.getDocumentElement();
        assertThat(root.getNamespaceURI()).isEqualTo(XmlSupport.SVG);
        assertThat(root.getLocalName()).isEqualTo("svg");
        return root;
    }

    @Test
    void histogramAndFrontierAreSvgWithTheirLimitLabels() throws Exception {
        Random rnd = new Random(3);
        double[] values = new double[500];
        for (int k = 0; k < values.length; k++) {
            values[k] = 0.02 + 0.002 * rnd.nextGaussian();
        }
        String h = Charts.histogramChart(new Charts.Histogram("worst droop", "V", values, 25,
                List.of(new Charts.Limit("allowed 28.5 mV", 0.0285))));
        assertThat(XmlSupport.svgTexts(svgRoot(h))).contains("allowed 28.5 mV", "worst droop", "count");

        double[] cost = {1.0, 2.0, 1.5, 3.0};
        double[] exc = {0.05, 0.02, 0.03, 0.025};
        String f = Charts.frontierChart(new Charts.Frontier("cost", "USD", "excursion", "V", cost, exc,
                List.of(new Charts.Limit("allowed", 0.0285)), List.of(new Charts.LabelledPoint("chosen", 2.0, 0.02))));
        assertThat(XmlSupport.svgTexts(svgRoot(f))).contains("allowed", "chosen", "cost", "excursion");
    }

    @Test
    void sameDataGivesTheSameBytesAndDifferentChartsDoNotShareIds() throws Exception {
        String a = Charts.impedanceChart(impedance());
        String w = Charts.worstCaseChart(dip());
        assertThat(Charts.impedanceChart(impedance())).isEqualTo(a);
        Set<String> idsA = ids(a);
        Set<String> idsW = ids(w);
        assertThat(idsA).isNotEmpty();
        idsA.retainAll(idsW);
        assertThat(idsA).as("ids both charts define; inlined together they would clash").isEmpty();
    }

    private static Set<String> ids(String svg) {
        Matcher m = Pattern.compile("id='([^']*)'|id=\"([^\"]*)\"").matcher(svg);
        Set<String> out = new HashSet<>();
        while (m.find()) {
            out.add(m.group(1) != null ? m.group(1) : m.group(2));
        }
        return out;
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
            List<List<Double>> actual = Charts.frontier(x, y).stream().map(p -> List.of(p[0], p[1])).toList();
            assertThat(actual).containsExactlyInAnyOrderElementsOf(expected);
            for (int k = 1; k < actual.size(); k++) {
                assertThat(actual.get(k).get(0)).isGreaterThan(actual.get(k - 1).get(0));
                assertThat(actual.get(k).get(1)).isLessThan(actual.get(k - 1).get(1));
            }
        }
    }

    @Test
    void chartsRenderHeadless() {
        Charts.impedanceChart(impedance());
        assertThat(java.awt.GraphicsEnvironment.isHeadless()).isTrue();
    }
}
