package breakwater.report.chart;

import org.junit.jupiter.api.Test;

import java.awt.GraphicsEnvironment;
import java.util.Set;

import static breakwater.report.chart.SvgDocuments.dip;
import static breakwater.report.chart.SvgDocuments.ids;
import static breakwater.report.chart.SvgDocuments.impedance;
import static org.assertj.core.api.Assertions.assertThat;

class SvgWriterTest {

    @Test
    void sameDataGivesTheSameBytesAndDifferentChartsDoNotShareIds() {
        String a = ImpedanceChart.svg(impedance());
        String w = WorstCaseChart.svg(dip());
        assertThat(ImpedanceChart.svg(impedance())).isEqualTo(a);
        Set<String> idsA = ids(a);
        Set<String> idsW = ids(w);
        assertThat(idsA).isNotEmpty();
        idsA.retainAll(idsW);
        assertThat(idsA).as("ids both charts define; inlined together they would clash").isEmpty();
    }

    @Test
    void stripPrologRemovesDeclarationAndDoctype() {
        String doc = "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n<!DOCTYPE svg PUBLIC \"-//W3C//DTD SVG 1.1//EN\" "
                + "\"http://www.w3.org/Graphics/SVG/1.1/DTD/svg11.dtd\">\n<svg xmlns=\"http://www.w3.org/2000/svg\"/>";
        assertThat(SvgWriter.stripProlog(doc)).isEqualTo("<svg xmlns=\"http://www.w3.org/2000/svg\"/>");
    }

    @Test
    void chartsRenderHeadless() {
        ImpedanceChart.svg(impedance());
        assertThat(GraphicsEnvironment.isHeadless()).isTrue();
    }
}
