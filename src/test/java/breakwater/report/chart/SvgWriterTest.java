package breakwater.report.chart;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;

class SvgWriterTest {

    @Test
    void stripPrologRemovesDeclarationAndDoctype() {
        String doc = "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n<!DOCTYPE svg PUBLIC \"-//W3C//DTD SVG 1.1//EN\" "
                + "\"http://www.w3.org/Graphics/SVG/1.1/DTD/svg11.dtd\">\n<svg xmlns=\"http://www.w3.org/2000/svg\"/>";
        assertThat(SvgWriter.stripProlog(doc)).isEqualTo("<svg xmlns=\"http://www.w3.org/2000/svg\"/>");
    }
}
