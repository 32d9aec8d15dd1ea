package breakwater.report;

import breakwater.optimize.ExcursionFrontier;
import breakwater.optimize.FrontierResult;
import breakwater.report.chart.Frontier;
import breakwater.report.chart.FrontierChart;
import breakwater.report.chart.LabelledPoint;
import breakwater.report.chart.Limit;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.io.IOException;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import static breakwater.report.Figures.format;
import static breakwater.units.Quantity.VOLTAGE;

/**
 * Writes what {@code frontier} found: the cost of each excursion limit (console table, summary.json
 * {@code frontier}, a report section with the cost–excursion chart); the bank shown and the files are the
 * spec limit's.
 */
public final class FrontierReport {
    static final List<String> HEADERS = List.of("limit", "cost", "parts", "worst droop", "worst overshoot", "meets",
            "vs. the spec's bank", "note");

    private FrontierReport() {
    }

    public static void write(FrontierResult r, ResultWriter.Target target, PrintWriter out) throws IOException {
        ResultWriter.write(new ResultWriter.Shown("frontier", r.footprintName(), r.judge(), r.evaluation(), Optional.empty(),
                r.verdict()), output(r), target, out);
    }

    static ModeOutput output(FrontierResult r) {
        List<List<String>> rows = rows(r.frontier());
        String asymmetric = asymmetric(r);
        return new ModeOutput(console(r, rows, asymmetric), json -> summary(json, r),
                List.of(section(r, rows, asymmetric)));
    }

    static List<List<String>> rows(ExcursionFrontier.Result f) {
        ExcursionFrontier.Point specPoint = f.specPoint();
        List<List<String>> rows = new ArrayList<>();
        for (ExcursionFrontier.Point p : f.points()) {
            double dc = p.costTotal() - specPoint.costTotal();
            double dx = specPoint.excursionV() - p.excursionV();
            String vs = p == specPoint ? "-" : String.format(Locale.ROOT, "%+.4f for %s less", dc, format(dx, VOLTAGE));
            rows.add(List.of(format(p.limitV(), VOLTAGE), Texts.money(p.costTotal()),
                    Integer.toString(p.bank().totalParts()), format(p.evaluation().figures().droopV(), VOLTAGE),
                    format(p.evaluation().figures().overshootV(), VOLTAGE), p.meetsLimit() ? "YES" : "NO", vs, p.note()));
        }
        return rows;
    }

    /** Why the limits end where they do, when the spec allows more on one side; "" when it does not. */
    static String asymmetric(FrontierResult r) {
        ExcursionFrontier.Headroom h = r.headroom();
        return h.asymmetric() ? String.format(Locale.ROOT, "each limit holds both worst droop and worst overshoot; "
                        + "the spec allows %s of droop and %s of overshoot from the %s operating point, and the worst "
                        + "overshoot is always the worst droop less ΔI·Z(0) = %s, so the spec is met once the droop is "
                        + "within %s, where the limits end",
                format(h.droopAllowedV(), VOLTAGE), format(h.overshootAllowedV(), VOLTAGE), format(h.operatingV(), VOLTAGE, 5),
                format(h.settleV(), VOLTAGE), format(r.frontier().allowedV(), VOLTAGE)) : "";
    }

    static String console(FrontierResult r, List<List<String>> rows, String asymmetric) {
        ExcursionFrontier.Result f = r.frontier();
        int n = f.points().size();
        StringBuilder c = new StringBuilder();
        c.append(Texts.wrapLines(String.format(Locale.ROOT, "Frontier   smallest worst excursion found %s, spec allows %s: %d limits "
                        + "from one to the other; the %s time limit was split over %d searches, %s each%s%n",
                format(f.tightestV(), VOLTAGE), format(f.allowedV(), VOLTAGE), n, Texts.duration(r.all().timeLimit()),
                n + 1, Texts.duration(r.each().timeLimit()), r.interrupted() ? " (stopped by the user)" : ""), "           "));
        if (!asymmetric.isEmpty()) {
            c.append(Texts.wrap(String.format(Locale.ROOT, "%-10s %s", "", asymmetric), "           "));
        }
        String currency = r.judge().scenario().cost().currency();
        ConsoleTable t = new ConsoleTable(List.of("limit", currency.isEmpty() ? "cost" : "cost (" + currency + ")",
                "parts", "worst droop", "worst overshoot", "meets limit", "vs. the spec's bank"),
                true, true, true, true, true, false, false);
        List<String> notes = new ArrayList<>();
        for (List<String> row : rows) {
            t.row(row.subList(0, 7));
            if (!row.get(7).isEmpty()) {
                notes.add(row.get(0) + ": " + row.get(7));
            }
        }
        c.append(t.render());
        for (String note : notes) {
            c.append(Texts.wrap("  note, limit " + note, "    "));
        }
        c.append(String.format(Locale.ROOT, "%-10s the bank above and the files are the spec limit's bank%n", "Shown"));
        return c.toString();
    }

    static ReportModel.Section section(FrontierResult r, List<List<String>> rows, String asymmetric) {
        ExcursionFrontier.Result f = r.frontier();
        List<ExcursionFrontier.Point> pts = f.points();
        ExcursionFrontier.Point specPoint = f.specPoint();
        // the points, then the bank closest to the unreachable limit
        double[] cost = new double[pts.size() + 1];
        double[] exc = new double[pts.size() + 1];
        for (int i = 0; i < pts.size(); i++) {
            cost[i] = pts.get(i).costTotal();
            exc[i] = pts.get(i).excursionV();
        }
        cost[pts.size()] = f.closest().cost().total();
        exc[pts.size()] = f.tightestV();
        List<LabelledPoint> highlighted = List.of(
                new LabelledPoint("spec's limit", specPoint.costTotal(), specPoint.excursionV()),
                new LabelledPoint("tightest", pts.get(0).costTotal(), pts.get(0).excursionV()));
        String chart = FrontierChart.svg(new Frontier("cost per board", r.judge().scenario().cost().currency(),
                "worst excursion", "V", cost, exc, List.of(new Limit("allowed by the spec "
                + format(f.allowedV(), VOLTAGE), f.allowedV())), highlighted));
        String intro = String.format(Locale.ROOT, "The cheapest bank for each excursion limit (worst droop and worst "
                        + "overshoot each at most the limit), from the smallest worst excursion the search reached, %s, "
                        + "up to what the spec allows, %s. Each search had %s (the %s limit split over %d searches) and "
                        + "started from the previous, tighter limit's bank. Each limit shows the cheapest bank that any of "
                        + "the searches found within it, whichever limit's search found it (the notes say so), so a "
                        + "tighter limit never costs less.",
                format(f.tightestV(), VOLTAGE), format(f.allowedV(), VOLTAGE), Texts.duration(r.each().timeLimit()),
                Texts.duration(r.all().timeLimit()), pts.size() + 1) + (asymmetric.isEmpty() ? "" : " Note: " + asymmetric + ".");
        return new ReportModel.Section("Cost against worst excursion", List.of(intro),
                List.of(new ReportModel.Table("Frontier, tightest limit first", HEADERS, rows)), List.of(chart)).asLead();
    }

    static void summary(ObjectNode json, FrontierResult r) {
        ExcursionFrontier.Result f = r.frontier();
        ObjectNode fr = json.putObject("frontier_search");
        fr.put("tightest_v", f.tightestV());
        fr.put("allowed_v", f.allowedV());
        fr.put("time_limit_each_s", r.each().timeLimit().toNanos() / 1e9);
        fr.put("stopped_early", r.interrupted());
        ArrayNode arr = json.putArray("frontier");
        for (ExcursionFrontier.Point p : f.points()) {
            ObjectNode o = arr.addObject();
            o.put("limit_v", p.limitV());
            o.put("cost_total", p.costTotal());
            o.put("total_parts", p.bank().totalParts());
            SummaryJson.bank(o.putArray("bank"), p.bank());
            ObjectNode wc = o.putObject("worst_case");
            wc.put("droop_v", p.evaluation().figures().droopV());
            wc.put("overshoot_v", p.evaluation().figures().overshootV());
            o.put("meets_limit", p.meetsLimit());
            o.put("searched", p.searched());
            o.put("note", p.note());
        }
    }
}
