package breakwater.report.chart;

import breakwater.report.ExampleReport;
import breakwater.report.XmlSupport;
import org.w3c.dom.Document;
import org.w3c.dom.Element;

import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static org.assertj.core.api.Assertions.assertThat;

/** Chart inputs shared by the chart tests, and checks of the SVG the charts return. */
final class SvgDocuments {
    private SvgDocuments() {
    }

    static ImpedancePlot impedance() {
        // 1 kHz .. 1 GHz, so the frequency axis spans exactly six decades
        var s = ExampleReport.curve("bank", ExampleReport.NEW_BANK);
        return new ImpedancePlot(List.of(s), 9.5e-3, 10e3, 150e6, List.of(new ImpedanceMarker("66 kHz", 66e3, 30e-3)));
    }

    /** A Gaussian dip of 20 mV centred at 1 µs on 0.95 V: its minimum, 0.93 V at 1 µs, is known in closed form. */
    static WaveformPlot dip() {
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

    static Element svgRoot(String svg) throws Exception {
        Document d = XmlSupport.parse(svg); // throws unless the string is well-formed XML
        Element root = d.getDocumentElement();
        assertThat(root.getNamespaceURI()).isEqualTo(XmlSupport.SVG);
        assertThat(root.getLocalName()).isEqualTo("svg");
        return root;
    }

    /** Text content of every SVG text element of a chart, in document order. */
    static List<String> texts(String svg) throws Exception {
        return XmlSupport.svgTexts(svgRoot(svg));
    }

    static Set<String> ids(String svg) {
        Matcher m = Pattern.compile("id='([^']*)'|id=\"([^\"]*)\"").matcher(svg);
        Set<String> out = new HashSet<>();
        while (m.find()) {
            out.add(m.group(1) != null ? m.group(1) : m.group(2));
        }
        return out;
    }
}
