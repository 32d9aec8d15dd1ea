package breakwater.report;

import breakwater.report.chart.EngineeringFormat;
import breakwater.report.ReportModel.BomRow;
import breakwater.report.ReportModel.KeyFigure;
import breakwater.report.ReportModel.Section;
import breakwater.report.ReportModel.Table;
import breakwater.report.chart.ImpedanceChart;
import breakwater.report.chart.SvgWriter;
import breakwater.report.chart.WorstCaseChart;

import java.io.IOException;
import java.io.Writer;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.List;
import java.util.regex.Pattern;

/**
 * report.html: one self-contained page (inline SVG charts, embedded stylesheet, no scripts, no external
 * references). The markup is polyglot XHTML5: it is well-formed XML as well as valid HTML, so it can be
 * checked with any XML parser. Only the five XML escapes and numeric character references are used.
 */
public final class HtmlReport {
    private static final String XHTML = "http://www.w3.org/1999/xhtml";
    /** A cell that starts like a number ("12", "−3.1 mV", "0.95", "+4 %", "×2.1") is right-aligned. */
    private static final Pattern NUMERIC = Pattern.compile("^[+\\-−×≈~]?\\s?[0-9.][0-9.,]*([eE][+\\-−]?[0-9]+)?(\\s?\\S{0,4}\\s?\\S{0,4})?$");

    private static final String CSS = """
            :root { --ink: #1d1d1f; --muted: #5a5a60; --rule: #d8d8dc; --pass: #1b7a3d; --fail: #b2182b; }
            * { box-sizing: border-box; }
            body { font-family: "Helvetica Neue", Helvetica, Arial, "Liberation Sans", "DejaVu Sans", sans-serif;
              color: var(--ink); margin: 0 auto; padding: 24px 32px 40px; max-width: 1000px; line-height: 1.4;
              font-size: 14px; }
            h1 { font-size: 24px; margin: 0 0 4px; }
            h2 { font-size: 17px; margin: 28px 0 8px; padding-bottom: 3px; border-bottom: 1px solid var(--rule); }
            p.sub { margin: 0; color: var(--muted); }
            .verdict { margin: 14px 0 4px; padding: 10px 14px; border-left: 6px solid; border-radius: 3px; }
            .verdict.pass { border-color: var(--pass); background: #eef7f0; }
            .verdict.fail { border-color: var(--fail); background: #fbeeee; }
            .verdict strong { font-size: 16px; }
            .verdict.pass strong { color: var(--pass); }
            .verdict.pass.thin { border-color: #c98a00; background: #fff8e5; }
            .verdict.pass.thin strong { color: #7a5200; }
            .verdict.fail strong { color: var(--fail); }
            .verdict ul { margin: 4px 0 0; padding-left: 20px; }
            dl.figures { display: grid; grid-template-columns: repeat(auto-fill, minmax(180px, 1fr)); gap: 8px;
              margin: 0; }
            dl.figures div { border: 1px solid var(--rule); border-radius: 4px; padding: 6px 10px; }
            dl.figures dt { font-size: 12px; color: var(--muted); }
            dl.figures dd { margin: 0; font-size: 16px; font-weight: 600; font-variant-numeric: tabular-nums; }
            dl.figures div.good dd { color: var(--pass); }
            dl.figures div.bad dd { color: var(--fail); }
            figure { margin: 0; }
            figure svg { width: 100%; height: auto; display: block; }
            figcaption { color: var(--muted); font-size: 12px; margin-top: 2px; }
            table { border-collapse: collapse; margin: 6px 0 10px; font-size: 13px;
              font-variant-numeric: tabular-nums; }
            caption { text-align: left; color: var(--muted); font-size: 12px; padding-bottom: 4px; }
            th, td { padding: 4px 10px; border-bottom: 1px solid var(--rule); text-align: left; vertical-align: top; }
            th { background: #f3f3f5; font-weight: 600; border-bottom: 1px solid #b8b8be; }
            td.num { text-align: right; white-space: nowrap; }
            th.num { text-align: right; }
            .wide { overflow-x: auto; max-width: 100%; }
            tr.total td { font-weight: 600; border-top: 1.5px solid #888; border-bottom: none; }
            .note { color: var(--muted); font-size: 12px; }
            .cautions { margin-top: 28px; padding: 10px 16px; border: 2px solid #c98a00; background: #fff8e5;
              border-radius: 4px; }
            .cautions h2 { border: none; margin: 0 0 4px; color: #7a5200; }
            .cautions ul { margin: 0; padding-left: 20px; }
            footer { margin-top: 24px; color: var(--muted); font-size: 11px; }
            @page { size: A4; margin: 14mm; }
            @media print {
              body { padding: 0; max-width: none; font-size: 11pt; }
              section, figure, table, .verdict, .cautions { break-inside: avoid; }
              th { background: #eee; }
            }
            """;

    private HtmlReport() {
    }

    /** Writes the whole page to {@code out} (UTF-8 is the caller's choice of encoding; the page declares it). */
    public static void write(ReportModel model, Writer out) throws IOException {
        out.write(render(model));
        out.flush();
    }

    /** The whole page as a string. */
    public static String render(ReportModel m) {
        StringBuilder b = new StringBuilder(256 * 1024);
        b.append("<!DOCTYPE html>\n<html xmlns=\"").append(XHTML).append("\" lang=\"en\" xml:lang=\"en\">\n<head>\n")
                .append("<meta charset=\"UTF-8\"/>\n")
                .append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\"/>\n")
                .append("<title>").append(esc(m.title())).append("</title>\n")
                .append("<style>\n").append(CSS).append("</style>\n</head>\n<body>\n");

        header(b, m);
        if (!m.keyFigures().isEmpty()) {
            b.append("<section id=\"key-figures\">\n<h2>Key figures</h2>\n<dl class=\"figures\">\n");
            for (KeyFigure f : m.keyFigures()) {
                String cls = switch (f.tone()) {
                    case GOOD -> " class=\"good\"";
                    case BAD -> " class=\"bad\"";
                    case NEUTRAL -> "";
                };
                b.append("<div").append(cls).append("><dt>").append(esc(f.label())).append("</dt><dd>")
                        .append(esc(f.value())).append("</dd></div>\n");
            }
            b.append("</dl>\n</section>\n");
        }

        // the section the mode exists for (trim's changes, compare's table, the frontier) comes first
        int lead = 0;
        for (Section s : m.sections()) {
            if (s.lead()) {
                section(b, s, "lead-" + ++lead);
            }
        }

        var z = m.impedance();
        EngineeringFormat hz = EngineeringFormat.perValue("Hz");
        b.append("<section id=\"impedance\">\n<h2>Impedance at the load</h2>\n<figure>\n")
                .append(ImpedanceChart.svg(z)).append('\n')
                .append("<figcaption>|Z| against frequency. Shaded: the band ").append(esc(hz.text(z.bandFromHz())))
                .append(" – ").append(esc(hz.text(z.bandToHz()))).append(" where flatness and the target are judged;")
                .append(" dashed: the target impedance ").append(esc(EngineeringFormat.perValue("Ω").text(z.targetOhm())))
                .append(".</figcaption>\n</figure>\n</section>\n");

        var w = m.worstCase();
        b.append("<section id=\"worst-case\">\n<h2>Worst-case load pattern</h2>\n<figure>\n")
                .append(WorstCaseChart.svg(w)).append('\n')
                .append("<figcaption>Above: the load current that drives the rail furthest from nominal. Below: the ")
                .append("load voltage it causes, with the tolerance limits dashed and the nominal voltage thin; the ")
                .append("dot marks the largest deviation.</figcaption>\n</figure>\n</section>\n");

        bom(b, m.bom());

        b.append("<section id=\"resonances\">\n<h2>Anti-resonances</h2>\n");
        if (m.resonances().rows().isEmpty()) {
            b.append("<p class=\"note\">No anti-resonance in the band.</p>\n");
        } else {
            table(b, m.resonances());
        }
        b.append("</section>\n");

        int n = 0;
        for (Section s : m.sections()) {
            if (!s.lead()) {
                section(b, s, ++n);
            }
        }

        b.append("<section id=\"settings\">\n<h2>Run settings</h2>\n");
        table(b, m.settings());
        b.append("</section>\n");

        if (!m.cautions().isEmpty()) {
            b.append("<section id=\"cautions\" class=\"cautions\">\n<h2>Cautions</h2>\n<ul>\n");
            for (String c : m.cautions()) {
                b.append("<li>").append(esc(c)).append("</li>\n");
            }
            b.append("</ul>\n</section>\n");
        }
        b.append("<footer>Written by Breakwater.</footer>\n</body>\n</html>\n");
        return b.toString();
    }

    private static void header(StringBuilder b, ReportModel m) {
        b.append("<header>\n<h1>").append(esc(m.title())).append("</h1>\n");
        for (String line : m.subtitleLines()) {
            b.append("<p class=\"sub\">").append(esc(line)).append("</p>\n");
        }
        var v = m.verdict();
        // a pass with remarks (a thin margin) is drawn amber, not green
        String kind = !v.meetsSpec() ? "fail" : v.thinMargin() ? "pass thin" : "pass";
        b.append("<div id=\"verdict\" class=\"verdict ").append(kind).append("\">\n<strong>")
                .append(!v.meetsSpec() ? "&#10007; " : v.thinMargin() ? "&#9888; " : "&#10003; ")
                .append(esc(v.headline())).append("</strong>\n");
        if (!v.reasons().isEmpty()) {
            b.append("<ul>\n");
            for (String r : v.reasons()) {
                b.append("<li>").append(esc(r)).append("</li>\n");
            }
            b.append("</ul>\n");
        }
        b.append("</div>\n</header>\n");
    }

    private static void bom(StringBuilder b, ReportModel.Bom bom) {
        b.append("<section id=\"bom\">\n<h2>Bill of materials</h2>\n");
        String cur = bom.currency().isEmpty() ? "" : " (" + esc(bom.currency()) + ")";
        boolean placed = bom.rows().stream().anyMatch(r -> !r.region().isEmpty());
        b.append("<table class=\"bom\">\n<thead><tr>").append(placed ? "<th>region</th>" : "")
                .append("<th>part</th><th>description</th><th>case</th>")
                .append("<th class=\"num\">count</th><th class=\"num\">unit cost").append(cur)
                .append("</th><th class=\"num\">extended").append(cur).append("</th></tr></thead>\n<tbody>\n");
        if (bom.rows().isEmpty()) {
            b.append("<tr><td colspan=\"6\" class=\"note\">(empty bank)</td></tr>\n");
        }
        // a placed bank: its rows grouped by region, in the order the regions first appear
        List<BomRow> rows = bom.rows();
        if (placed) {
            List<String> order = rows.stream().map(BomRow::region).distinct().toList();
            rows = rows.stream().sorted(java.util.Comparator.comparingInt(r -> order.indexOf(r.region()))).toList();
        }
        String last = null;
        for (BomRow r : rows) {
            b.append("<tr>");
            if (placed) {
                b.append("<td>").append(r.region().equals(last) ? "" : esc(r.region())).append("</td>");
                last = r.region();
            }
            b.append("<td>").append(esc(r.part())).append("</td><td>").append(esc(r.description()))
                    .append("</td><td>").append(esc(r.caseCode())).append("</td><td class=\"num\">").append(r.count())
                    .append("</td><td class=\"num\">").append(money(r.unitCost())).append("</td><td class=\"num\">")
                    .append(money(r.extendedCost())).append("</td></tr>\n");
        }
        b.append("<tr class=\"total\">").append(placed ? "<td></td>" : "").append("<td>total</td><td>")
                .append(esc(bom.totalNote()))
                .append("</td><td></td><td class=\"num\">").append(bom.totalCount())
                .append("</td><td></td><td class=\"num\">").append(money(bom.totalCost())).append("</td></tr>\n");
        b.append("</tbody>\n</table>\n</section>\n");
    }

    /** Money with at least two decimals and up to four (unit costs of small parts), locale-independent. */
    static String money(double v) {
        // four decimals, as the console prints money: 0.0400, 1.6230
        BigDecimal d = BigDecimal.valueOf(v).setScale(4, RoundingMode.HALF_EVEN);
        String s = d.toPlainString();
        return s.startsWith("-") ? "&#8722;" + s.substring(1) : s;
    }

    private static void section(StringBuilder b, Section s, int n) {
        section(b, s, "extra-" + n);
    }

    private static void section(StringBuilder b, Section s, String id) {
        b.append("<section id=\"").append(id).append("\">\n<h2>").append(esc(s.heading())).append("</h2>\n");
        for (String p : s.paragraphs()) {
            b.append("<p>").append(esc(p)).append("</p>\n");
        }
        for (Table t : s.tables()) {
            table(b, t);
        }
        for (String svg : s.chartsSvg()) {
            b.append("<figure>\n").append(SvgWriter.stripProlog(svg)).append("\n</figure>\n");
        }
        b.append("</section>\n");
    }

    private static void table(StringBuilder b, Table t) {
        boolean[] numeric = numericColumns(t);
        // a table wider than a narrow window scrolls on its own instead of running off the page
        b.append("<div class=\"wide\"><table>\n");
        if (!t.caption().isEmpty()) {
            b.append("<caption>").append(esc(t.caption())).append("</caption>\n");
        }
        b.append("<thead><tr>");
        for (int c = 0; c < t.headers().size(); c++) {
            b.append(numeric[c] ? "<th class=\"num\">" : "<th>").append(esc(t.headers().get(c))).append("</th>");
        }
        b.append("</tr></thead>\n<tbody>\n");
        for (List<String> row : t.rows()) {
            b.append("<tr>");
            for (int c = 0; c < row.size(); c++) {
                b.append(numeric[c] ? "<td class=\"num\">" : "<td>").append(esc(row.get(c))).append("</td>");
            }
            b.append("</tr>\n");
        }
        b.append("</tbody>\n</table></div>\n");
    }

    /** A column is numeric when every non-empty body cell looks like a number, possibly with a unit. */
    static boolean[] numericColumns(Table t) {
        boolean[] numeric = new boolean[t.headers().size()];
        for (int c = 0; c < numeric.length; c++) {
            boolean any = false;
            boolean all = true;
            for (List<String> row : t.rows()) {
                String cell = row.get(c).strip();
                if (cell.isEmpty() || cell.equals("—") || cell.equals("-")) {
                    continue;
                }
                any = true;
                all &= NUMERIC.matcher(cell).matches();
            }
            numeric[c] = any && all;
        }
        return numeric;
    }

    /**
     * Escapes text for XML content and attribute values, and drops characters XML 1.0 forbids (C0
     * controls other than tab, line feed and carriage return; lone surrogates; U+FFFE, U+FFFF).
     */
    static String esc(String s) {
        StringBuilder b = new StringBuilder(s.length() + 16);
        for (int i = 0; i < s.length(); i++) {
            char ch = s.charAt(i);
            switch (ch) {
                case '&' -> b.append("&amp;");
                case '<' -> b.append("&lt;");
                case '>' -> b.append("&gt;");
                case '"' -> b.append("&quot;");
                case '\'' -> b.append("&#39;");
                case '\u00A0' -> b.append("&#160;");
                default -> {
                    if (Character.isHighSurrogate(ch) && i + 1 < s.length() && Character.isLowSurrogate(s.charAt(i + 1))) {
                        b.append(ch).append(s.charAt(++i));
                    } else if ((ch < 0x20 && ch != '\t' && ch != '\n' && ch != '\r') || Character.isSurrogate(ch)
                            || ch == '\uFFFE' || ch == '\uFFFF') {
                        // not allowed in XML 1.0: dropped
                    } else {
                        b.append(ch);
                    }
                }
            }
        }
        return b.toString();
    }
}
