package breakwater.report;

import breakwater.report.ReportModel.BomRow;
import breakwater.report.ReportModel.Section;
import breakwater.report.ReportModel.Table;
import breakwater.report.ReportModel.Verdict;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;
import org.w3c.dom.Element;

import java.io.StringWriter;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** The page is checked with the JDK's XML parser: polyglot XHTML5 must be well-formed XML. */
class HtmlReportTest {

    private static String html(ReportModel m) throws Exception {
        StringWriter w = new StringWriter();
        HtmlReport.write(m, w);
        return w.toString();
    }

    private static ReportModel with(ReportModel m, String title, Verdict verdict, List<Section> sections) {
        return new ReportModel(title, m.subtitleLines(), verdict, m.keyFigures(), m.impedance(), m.worstCase(), m.bom(),
                m.resonances(), sections, m.settings(), m.cautions());
    }

    @Test
    void pageIsWellFormedXhtmlWithBothChartsInline() throws Exception {
        ReportModel m = ExampleReport.model();
        String page = html(m);
        assertThat(page).startsWith("<!DOCTYPE html>\n<html xmlns=\"http://www.w3.org/1999/xhtml\"");
        Document d = XmlSupport.parse(page);
        assertThat(d.getDocumentElement().getNamespaceURI()).isEqualTo(XmlSupport.XHTML);
        assertThat(XmlSupport.elements(XmlSupport.byId(d, "section", "impedance"), XmlSupport.SVG, "svg")).hasSize(1);
        assertThat(XmlSupport.elements(XmlSupport.byId(d, "section", "worst-case"), XmlSupport.SVG, "svg")).hasSize(1);
        // two main charts plus one per extra-section chart
        int extra = m.sections().stream().mapToInt(s -> s.chartsSvg().size()).sum();
        assertThat(XmlSupport.elements(d, XmlSupport.SVG, "svg")).hasSize(2 + extra);
        assertThat(page).doesNotContain("<?xml").doesNotContain("&nbsp;").doesNotContain("<script")
                .doesNotContain("http://www.w3.org/Graphics/SVG/1.1/DTD");
        assertThat(XmlSupport.elements(d, XmlSupport.XHTML, "title").get(0).getTextContent()).isEqualTo(m.title());
    }

    @Test
    void bomRowsAppearWithTheirCountsAndCostsAndTextSurvivesEscaping() throws Exception {
        ReportModel m = ExampleReport.model();
        Document d = XmlSupport.parse(html(m));
        List<Element> rows = XmlSupport.elements(XmlSupport.byId(d, "section", "bom"), XmlSupport.XHTML, "tr").stream()
                .filter(tr -> !cells(tr).isEmpty()).toList(); // body rows only: the header row has th cells
        for (BomRow r : m.bom().rows()) {
            Element tr = rows.stream().filter(e -> cells(e).get(0).equals(r.part())).findFirst()
                    .orElseThrow(() -> new AssertionError("no BOM row for " + r.part()));
            List<String> c = cells(tr);
            assertThat(c.get(1)).isEqualTo(r.description()); // one holds "<demo & test>": escaped, read back intact
            assertThat(c.get(2)).isEqualTo(r.caseCode());
            assertThat(Integer.parseInt(c.get(3))).isEqualTo(r.count());
            assertThat(Double.parseDouble(c.get(5))).isEqualTo(r.extendedCost());
        }
        List<String> total = cells(rows.get(rows.size() - 1));
        assertThat(total.get(0)).isEqualTo("total");
        assertThat(Integer.parseInt(total.get(3))).isEqualTo(m.bom().rows().stream().mapToInt(BomRow::count).sum());
        assertThat(Double.parseDouble(total.get(5))).isEqualTo(m.bom().totalCost());
    }

    @Test
    void cautionsAndVerdictAreShown() throws Exception {
        ReportModel m = ExampleReport.model();
        Document d = XmlSupport.parse(html(m));
        List<String> items = XmlSupport.elements(XmlSupport.byId(d, "section", "cautions"), XmlSupport.XHTML, "li")
                .stream().map(Element::getTextContent).toList();
        assertThat(items).containsExactlyElementsOf(m.cautions());
        assertThat(items).contains(ReportModel.STANDARD_CAUTION);
        Element verdict = XmlSupport.byId(d, "div", "verdict");
        assertThat(verdict.getAttribute("class")).isEqualTo("verdict pass");
        assertThat(verdict.getTextContent()).contains(m.verdict().headline()).contains(m.verdict().reasons().get(0));

        ReportModel failing = with(m, m.title(), new Verdict(false, "Does not meet the spec",
                List.of("worst droop 31.2 mV exceeds the 28.5 mV allowed")), m.sections());
        Element v2 = XmlSupport.byId(XmlSupport.parse(html(failing)), "div", "verdict");
        assertThat(v2.getAttribute("class")).isEqualTo("verdict fail");
        assertThat(v2.getTextContent()).contains("Does not meet the spec");

        ReportModel thin = with(m, m.title(), new Verdict(true, "Meets the spec",
                List.of("Note: the margin (5 µV) is under 5 % of the allowance"), true), m.sections());
        Element v3 = XmlSupport.byId(XmlSupport.parse(html(thin)), "div", "verdict");
        assertThat(v3.getAttribute("class")).isEqualTo("verdict pass thin");
        assertThat(v3.getTextContent()).contains("under 5 % of the allowance");
    }

    @Test
    void numericColumnsAreRightAlignedAndTextColumnsAreNot() throws Exception {
        Document d = XmlSupport.parse(html(ExampleReport.model()));
        Element firstRow = XmlSupport.elements(XmlSupport.byId(d, "section", "resonances"), XmlSupport.XHTML, "tbody")
                .get(0).getElementsByTagNameNS(XmlSupport.XHTML, "tr").item(0) instanceof Element e ? e : null;
        assertThat(firstRow).isNotNull();
        for (Element td : XmlSupport.elements(firstRow, XmlSupport.XHTML, "td")) {
            assertThat(td.getAttribute("class")).as(td.getTextContent()).isEqualTo("num");
        }
        Table mixed = new Table("", List.of("setting", "value"), List.of(List.of("seed", "1"), List.of("version", "0.1.0")));
        assertThat(HtmlReport.numericColumns(mixed)).containsExactly(false, true);
        Table words = new Table("", List.of("a"), List.of(List.of("1 part"), List.of("two parts")));
        assertThat(HtmlReport.numericColumns(words)).containsExactly(false);
    }

    @Test
    void extraSectionsAcceptSvgDocumentsAndHostileText() throws Exception {
        ReportModel m = ExampleReport.model();
        String svgDocument = "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n"
                + "<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"10\" height=\"10\"><rect width=\"5\" height=\"5\"/></svg>";
        Section s = Section.text("Notes & <checks>", "a \"quoted\" 'word', a bell \u0007 and a non-breaking\u00A0space")
                .withTable(new Table("t", List.of("x"), List.of(List.of("]]> & <"))))
                .withChart(svgDocument);
        String page = html(with(m, "Rail <A&B> \u0001", m.verdict(), List.of(s)));
        Document d = XmlSupport.parse(page); // a prolog left inside the body would make this throw
        Element sec = XmlSupport.byId(d, "section", "extra-1");
        assertThat(XmlSupport.elements(sec, XmlSupport.XHTML, "h2").get(0).getTextContent()).isEqualTo("Notes & <checks>");
        assertThat(XmlSupport.elements(sec, XmlSupport.XHTML, "p").get(0).getTextContent())
                .isEqualTo("a \"quoted\" 'word', a bell  and a non-breaking\u00A0space");
        assertThat(XmlSupport.elements(sec, XmlSupport.XHTML, "td").get(0).getTextContent()).isEqualTo("]]> & <");
        assertThat(XmlSupport.elements(sec, XmlSupport.SVG, "rect")).hasSize(1);
        assertThat(XmlSupport.elements(d, XmlSupport.XHTML, "h1").get(0).getTextContent()).isEqualTo("Rail <A&B> ");
        assertThat(page).contains("&#160;").doesNotContain("&nbsp;");
    }

    private static List<String> cells(Element tr) {
        return XmlSupport.elements(tr, XmlSupport.XHTML, "td").stream().map(Element::getTextContent).toList();
    }
}
