package breakwater.report;

import breakwater.report.chart.ImpedanceSeries;
import breakwater.report.chart.WaveformSeries;
import breakwater.design.Evaluation;
import breakwater.optimize.CompareResult;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.io.IOException;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import static breakwater.report.Figures.format;
import static breakwater.units.Quantity.RESISTANCE;
import static breakwater.units.Quantity.VOLTAGE;

/**
 * Writes what {@code compare} found: the footprints side by side (console table, summary.json
 * {@code footprints}, a report section), every footprint's |Z| and worst-case droop overlaid on the report's
 * charts; the bank shown and the files are the primary footprint's.
 */
public final class CompareReport {
    static final List<String> HEADERS = List.of("footprint", "cost", "parts", "worst droop", "worst overshoot",
            "margin", "flatness", "peak |Z|", "verdict");

    private CompareReport() {
    }

    public static void write(CompareResult r, ResultWriter.Target target, PrintWriter out) throws IOException {
        CompareResult.Row p = r.primary();
        ResultWriter.write(new ResultWriter.Shown("compare", p.name(), p.judge(), p.evaluation(), p.search(),
                r.verdict()), output(r), target, out);
    }

    static ModeOutput output(CompareResult r) {
        List<List<String>> table = table(r);
        return new ModeOutput(console(r, table), json -> summary(json, r), List.of(section(r, table)), m -> {
            List<ImpedanceSeries> z = new ArrayList<>();
            List<WaveformSeries> w = new ArrayList<>();
            for (CompareResult.Row row : r.rows()) {
                z.add(Overlays.impedance(row.name(), row.evaluation()));
                w.add(Overlays.waveform(row.name() + ": worst-case droop", row.judge().droopWaveform(row.evaluation())));
            }
            return Overlays.withWorstCase(Overlays.withImpedance(m, z), w);
        });
    }

    static List<List<String>> table(CompareResult r) {
        List<List<String>> table = new ArrayList<>();
        for (CompareResult.Row row : r.rows()) {
            Evaluation e = row.evaluation();
            table.add(List.of(row.name(), Texts.money(e.cost().total()), Integer.toString(e.bank().totalParts()),
                    format(e.figures().droopV(), VOLTAGE), format(e.figures().overshootV(), VOLTAGE),
                    format(e.figures().marginV(), VOLTAGE), String.format(Locale.ROOT, "%.2f dB", e.impedance().flatnessDb()),
                    format(e.impedance().peakOhms(), RESISTANCE), row.meets() ? "MEETS SPEC" : "FAILS SPEC"));
        }
        return table;
    }

    static String console(CompareResult r, List<List<String>> table) {
        StringBuilder c = new StringBuilder();
        c.append(r.givenBank() ? "Compare    the given bank under each footprint\n"
                : String.format(Locale.ROOT, "Compare    the cheapest bank found under each footprint; the %s time "
                        + "limit was split, %s per footprint%s%n", Texts.duration(r.all().timeLimit()),
                Texts.duration(r.each().timeLimit()),
                r.interrupted() ? " (stopped by the user: later footprints not searched)" : ""));
        List<String> headers = new ArrayList<>(HEADERS);
        String currency = r.primary().judge().scenario().cost().currency();
        headers.set(1, currency.isEmpty() ? "cost" : "cost (" + currency + ")");
        ConsoleTable t = new ConsoleTable(headers, false, true, true, true, true, true, true, true, false);
        table.forEach(t::row);
        c.append(t.render());
        c.append(String.format(Locale.ROOT, "%-10s the bank above and the files describe footprint %s%s%n", "Shown",
                r.primary().name(), r.primary().meets() ? " (the cheapest that meets the spec)" : " (none meets the spec)"));
        return c.toString();
    }

    static ReportModel.Section section(CompareResult r, List<List<String>> table) {
        String currency = r.primary().judge().scenario().cost().currency();
        String intro = (r.givenBank() ? "One bank judged under each footprint's mounting inductances."
                : String.format(Locale.ROOT, "For each footprint, the cheapest bank the search found under its "
                        + "mounting inductances (%s of the %s time limit each, seed %d).",
                Texts.duration(r.each().timeLimit()), Texts.duration(r.all().timeLimit()), r.each().seed()))
                + " The charts below overlay every footprint's |Z| and worst-case droop; the bill of materials "
                + "is that of " + r.primary().name() + ". Costs in "
                + (currency.isEmpty() ? "the catalog's currency" : currency) + ".";
        return new ReportModel.Section("Footprints compared", List.of(intro),
                List.of(new ReportModel.Table("Side by side", HEADERS, table)), List.of()).asLead();
    }

    static void summary(ObjectNode json, CompareResult r) {
        json.put("compare_bank_given", r.givenBank());
        json.put("compare_time_limit_each_s", r.each().timeLimit().toNanos() / 1e9);
        ArrayNode arr = json.putArray("footprints");
        for (CompareResult.Row row : r.rows()) {
            Evaluation e = row.evaluation();
            ObjectNode o = arr.addObject();
            o.put("name", row.name());
            o.put("cost_total", e.cost().total());
            o.put("total_parts", e.bank().totalParts());
            o.put("meets_spec", row.meets());
            SummaryJson.bank(o.putArray("bank"), e.bank());
            ObjectNode wc = o.putObject("worst_case");
            wc.put("droop_v", e.figures().droopV());
            wc.put("overshoot_v", e.figures().overshootV());
            wc.put("margin_v", e.figures().marginV());
            wc.put("passes", e.figures().passes());
            ObjectNode imp = o.putObject("impedance");
            imp.put("peak_ohm", e.impedance().peakOhms());
            imp.put("flatness_db", e.impedance().flatnessDb());
            row.search().ifPresent(s -> o.put("search_time_s", s.seconds()));
        }
    }
}
