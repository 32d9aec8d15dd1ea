package breakwater.report;

import breakwater.report.chart.ImpedancePlot;
import breakwater.report.chart.WaveformPlot;
import java.util.Arrays;
import java.util.List;

/**
 * Everything the HTML report shows, as plain data: already-formatted text where people read text, SI
 * doubles where a chart draws. It knows nothing of networks, banks or solvers, so any mode (solve, check,
 * compare, trim, Monte Carlo, …) can fill it; mode-specific content goes in {@link #sections()}.
 *
 * @param title          the report's heading, e.g. the rail's name
 * @param subtitleLines  lines under the heading: rail, target, settings (may be empty)
 * @param verdict        whether the design meets the spec, and why
 * @param keyFigures     the figures a reader looks at first (worst droop, margin, cost, …)
 * @param impedance      |Z| at the load against frequency, with target and band
 * @param worstCase      the worst-case load pattern and the voltage it causes
 * @param bom            the bill of materials
 * @param resonances     the anti-resonance table (frequency, |Z|, Q, step/sine/square responses, …)
 * @param sections       extra sections added by later modes, shown after the resonance table
 * @param settings       run settings: seed, time limit, evaluations, solver time, versions
 * @param cautions       shown in a box at the end of the report
 */
public record ReportModel(
        String title,
        List<String> subtitleLines,
        Verdict verdict,
        List<KeyFigure> keyFigures,
        ImpedancePlot impedance,
        WaveformPlot worstCase,
        Bom bom,
        Table resonances,
        List<Section> sections,
        Table settings,
        List<String> cautions) {

    /** The caution every report carries unless a mode supplies its own list. */
    public static final String STANDARD_CAUTION = "A model is not a measurement: verify the design on hardware; "
            + "respect part ratings (voltage, temperature, ripple current, DC bias) and local codes.";

    public ReportModel {
        requireText(title, "title");
        subtitleLines = List.copyOf(subtitleLines);
        require(verdict != null, "verdict is null");
        keyFigures = List.copyOf(keyFigures);
        require(impedance != null, "impedance plot is null");
        require(worstCase != null, "worst-case plot is null");
        require(bom != null, "bom is null");
        require(resonances != null, "resonance table is null");
        sections = List.copyOf(sections);
        require(settings != null, "settings table is null");
        cautions = List.copyOf(cautions);
    }

    /**
     * The design's verdict: {@code headline} such as "Meets the spec", with the reasons under it;
     * {@code thinMargin}: it passes, but on a margin part spread can use up (drawn as a caution).
     */
    public record Verdict(boolean meetsSpec, String headline, List<String> reasons, boolean thinMargin) {
        public Verdict {
            requireText(headline, "verdict headline");
            reasons = List.copyOf(reasons);
            require(meetsSpec || !thinMargin, "a thin margin belongs to a passing verdict");
        }

        public Verdict(boolean meetsSpec, String headline, List<String> reasons) {
            this(meetsSpec, headline, reasons, false);
        }
    }

    /** How a key figure should be read at a glance. */
    public enum Tone { NEUTRAL, GOOD, BAD }

    /** One labelled figure, value already formatted ("41.2 mV"). */
    public record KeyFigure(String label, String value, Tone tone) {
        public KeyFigure {
            requireText(label, "key figure label");
            require(value != null, "key figure '" + label + "' has a null value");
            require(tone != null, "key figure '" + label + "' has a null tone");
        }

        public KeyFigure(String label, String value) {
            this(label, value, Tone.NEUTRAL);
        }
    }


    /**
     * One BOM line; {@code caseCode} is text ("0402"), costs are in the BOM's currency; {@code region} is the
     * placement region ("" without regions).
     */
    public record BomRow(String part, String description, String caseCode, int count, double unitCost,
                         double extendedCost, String region) {
        /** A row on the board node (no placement regions). */
        public BomRow(String part, String description, String caseCode, int count, double unitCost, double extendedCost) {
            this(part, description, caseCode, count, unitCost, extendedCost, "");
        }

        public BomRow {
            require(region != null, "BOM row '" + part + "' has a null region");
            requireText(part, "BOM part");
            require(description != null && caseCode != null, "BOM row '" + part + "' has a null description or case");
            require(count >= 0, "BOM row '" + part + "' has count " + count + "; counts are never negative");
            require(Double.isFinite(unitCost) && Double.isFinite(extendedCost), "BOM row '" + part
                    + "' has a non-finite cost");
        }
    }

    /**
     * The bill of materials. {@code totalCost} may exceed the sum of the extended costs when placement and
     * line-item charges apply; {@code totalNote} says so (empty for none). {@code currency} may be empty.
     */
    public record Bom(List<BomRow> rows, double totalCost, String currency, String totalNote) {
        public Bom {
            rows = List.copyOf(rows);
            require(Double.isFinite(totalCost), "BOM total " + totalCost + " is not finite");
            require(currency != null && totalNote != null, "BOM currency or note is null; use \"\" for none");
        }

        public Bom(List<BomRow> rows, double totalCost, String currency) {
            this(rows, totalCost, currency, "");
        }

        public int totalCount() {
            return rows.stream().mapToInt(BomRow::count).sum();
        }
    }

    /** A generic table of already-formatted cells; every row has one cell per header. */
    public record Table(String caption, List<String> headers, List<List<String>> rows) {
        public Table {
            require(caption != null, "table caption is null; use \"\" for none");
            headers = List.copyOf(headers);
            require(!headers.isEmpty(), "table '" + caption + "' has no columns");
            rows = rows.stream().map(List::copyOf).toList();
            for (int i = 0; i < rows.size(); i++) {
                require(rows.get(i).size() == headers.size(), "table '" + caption + "' row " + (i + 1) + " has "
                        + rows.get(i).size() + " cells for " + headers.size() + " columns; every row needs one cell per column");
            }
        }
    }

    /**
     * An extra section: a heading, paragraphs, then any tables and charts (inline SVG, e.g. from
     * {@link breakwater.report.chart.HistogramChart}). Lists may be empty; that is how a section says
     * "no table" or "no chart".
     */
    public record Section(String heading, List<String> paragraphs, List<Table> tables, List<String> chartsSvg,
                          boolean lead) {
        public Section {
            requireText(heading, "section heading");
            paragraphs = List.copyOf(paragraphs);
            tables = List.copyOf(tables);
            chartsSvg = List.copyOf(chartsSvg);
            for (String svg : chartsSvg) {
                require(svg.contains("<svg"), "section '" + heading + "' has a chart that is not SVG");
            }
        }

        /** A section shown after the single bank's details. */
        public Section(String heading, List<String> paragraphs, List<Table> tables, List<String> chartsSvg) {
            this(heading, paragraphs, tables, chartsSvg, false);
        }

        /** The same section shown first, right after the key figures: the one a mode exists for. */
        public Section asLead() {
            return new Section(heading, paragraphs, tables, chartsSvg, true);
        }

        public static Section text(String heading, String paragraph) {
            return new Section(heading, List.of(paragraph), List.of(), List.of());
        }

        public Section withTable(Table table) {
            return new Section(heading, paragraphs, append(tables, table), chartsSvg, lead);
        }

        public Section withChart(String svg) {
            return new Section(heading, paragraphs, tables, append(chartsSvg, svg), lead);
        }

        private static <T> List<T> append(List<T> list, T item) {
            return java.util.stream.Stream.concat(list.stream(), java.util.stream.Stream.of(item)).toList();
        }
    }

    static void require(boolean condition, String message) {
        if (!condition) {
            throw new IllegalArgumentException(message);
        }
    }

    private static void requireText(String s, String what) {
        require(s != null && !s.isBlank(), what + " is empty; it needs some text");
    }

    private static void requireFinite(double[] values, String what) {
        for (int i = 0; i < values.length; i++) {
            require(Double.isFinite(values[i]), what + "[" + i + "] = " + values[i] + " is not finite");
        }
    }

    private static void requirePositive(double[] values, String what) {
        for (int i = 0; i < values.length; i++) {
            require(values[i] > 0 && Double.isFinite(values[i]), what + "[" + i + "] = " + values[i]
                    + " must be positive and finite (it is drawn on a log axis)");
        }
    }

    private static void requireAscending(double[] values, String what) {
        for (int i = 1; i < values.length; i++) {
            require(values[i] > values[i - 1], what + "[" + i + "] = " + values[i] + " does not exceed the value before it;"
                    + " values must ascend");
        }
    }
}
