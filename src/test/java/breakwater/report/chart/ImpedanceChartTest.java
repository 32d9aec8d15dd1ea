package breakwater.report.chart;

import breakwater.report.XmlSupport;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Element;

import java.util.Arrays;
import java.util.List;

import static breakwater.report.chart.SvgDocuments.impedance;
import static breakwater.report.chart.SvgDocuments.svgRoot;
import static org.assertj.core.api.Assertions.assertThat;

class ImpedanceChartTest {

    @Test
    void impedanceChartIsSvgWithDecadeLabelsAtBothEndsAndTheTarget() throws Exception {
        String svg = ImpedanceChart.svg(impedance());
        assertThat(svg).startsWith("<svg");
        Element root = svgRoot(svg);
        assertThat(Arrays.stream(root.getAttribute("viewBox").split(" ")).mapToDouble(Double::parseDouble)
                .toArray()).containsExactly(0, 0, 900, 420);
        List<String> texts = XmlSupport.svgTexts(root);
        // decades of the data range, including the first and the last (SI prefixes: BIPM SI Brochure, Table 7)
        assertThat(texts).contains("1 kHz", "10 kHz", "100 kHz", "1 MHz", "10 MHz", "100 MHz", "1 GHz");
        assertThat(texts).contains("1 mΩ", "10 mΩ", "100 mΩ");
        assertThat(texts).contains("target 9.5 mΩ", "band 10 kHz – 150 MHz", "66 kHz", "bank", "anti-resonance");
    }
}
