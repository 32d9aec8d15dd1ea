package breakwater.report;

import breakwater.design.Evaluation;
import breakwater.design.WorstCaseVolts;
import breakwater.optimize.CostDown;
import breakwater.optimize.TrimResult;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.io.IOException;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.UnaryOperator;

import static breakwater.report.Texts.money;
import static breakwater.report.Figures.format;
import static breakwater.units.Quantity.RESISTANCE;
import static breakwater.units.Quantity.VOLTAGE;

/**
 * Writes what {@code trim} found: what changed per part, the savings, old against new worst case (console,
 * summary.json {@code trim}, a report section), both banks overlaid on the report's charts, then the
 * Monte Carlo figures when there are any.
 */
public final class TrimReport {
    private TrimReport() {
    }

    public static void write(TrimResult r, ResultWriter.Target target, PrintWriter out) throws IOException {
        ResultWriter.write(new ResultWriter.Shown("trim", r.footprintName(), r.judge(), r.trimmed(),
                Optional.of(r.search()), r.verdict()), output(r).plus(MonteCarloReport.output(r.monteCarlo())), target, out);
    }

    static ModeOutput output(TrimResult r) {
        return new ModeOutput(console(r), json -> summary(json, r), List.of(section(r)), overlays(r));
    }

    /** The rule applied, in the wording every output shares ({@link Texts#keepRule}). */
    private static String keeping(TrimResult r) {
        return Texts.keepRule(r.keep(), r.existing().figures())
                + (r.existingPartsOnly() ? " and only the existing part numbers" : "");
    }

    static String console(TrimResult r) {
        String cur = Texts.currency(r.judge().scenario().cost().currency());
        Evaluation old = r.existing();
        Evaluation e = r.trimmed();
        WorstCaseVolts was = old.figures();
        WorstCaseVolts now = e.figures();
        double savings = r.savings();
        StringBuilder c = new StringBuilder();
        if (r.unchanged()) {
            c.append(String.format(Locale.ROOT, "%-10s existing bank returned UNCHANGED, keeping %s: %s%n", "Trim",
                    keeping(r), r.reason()));
            if (!was.passes()) {
                c.append(String.format(Locale.ROOT, "%-10s the existing bank does not meet the spec itself; "
                        + "'breakwater solve' searches for one that does%n", ""));
            }
        } else {
            c.append(String.format(Locale.ROOT, "%-10s %d part count%s changed, keeping %s:%n", "Trim",
                    r.changes().size(), Texts.plural(r.changes().size()), keeping(r)));
            for (CostDown.Change ch : r.changes()) {
                c.append(String.format(Locale.ROOT, "  %-24s %4d -> %-4d %s%s%n", ch.part(), ch.from(), ch.to(),
                        ch.to() == 0 ? "(removed)" : ch.from() == 0 ? "(added)" : "",
                        (ch.region().isEmpty() ? "" : " in " + ch.region()) + (ch.moved() ? ", moved between regions" : "")));
            }
        }
        c.append(String.format(Locale.ROOT, "%-10s %s%s per board, %s%s per 1,000 boards (%s -> %s%s)%n", "Savings",
                money(savings), cur, String.format(Locale.ROOT, "%.2f", 1000 * savings), cur,
                money(old.cost().total()), money(e.cost().total()), cur));
        c.append(String.format(Locale.ROOT, "%-10s droop %s -> %s, overshoot %s -> %s, margin %s -> %s, peak |Z| %s -> %s%n",
                "Old -> new", format(was.droopV(), VOLTAGE), format(now.droopV(), VOLTAGE),
                format(was.overshootV(), VOLTAGE), format(now.overshootV(), VOLTAGE), format(was.marginV(), VOLTAGE),
                format(now.marginV(), VOLTAGE), format(old.impedance().peakOhms(), RESISTANCE),
                format(e.impedance().peakOhms(), RESISTANCE)));
        return c.toString();
    }

    static ReportModel.Section section(TrimResult r) {
        String cur = Texts.currency(r.judge().scenario().cost().currency());
        Evaluation old = r.existing();
        Evaluation e = r.trimmed();
        WorstCaseVolts was = old.figures();
        WorstCaseVolts now = e.figures();
        double savings = r.savings();
        List<List<String>> changeRows = new ArrayList<>();
        for (CostDown.Change ch : r.changes()) {
            changeRows.add(List.of(ch.part() + (ch.region().isEmpty() ? "" : " in " + ch.region()),
                    Integer.toString(ch.from()), Integer.toString(ch.to()),
                    (ch.to() == 0 ? "removed" : ch.from() == 0 ? "added" : ch.to() < ch.from() ? "fewer" : "more")
                            + (ch.moved() ? ", moved between regions" : "")));
        }
        List<List<String>> cmp = List.of(
                List.of("cost per board", money(old.cost().total()) + cur, money(e.cost().total()) + cur),
                List.of("parts", Integer.toString(old.bank().totalParts()), Integer.toString(e.bank().totalParts())),
                List.of("worst droop", format(was.droopV(), VOLTAGE), format(now.droopV(), VOLTAGE)),
                List.of("worst overshoot", format(was.overshootV(), VOLTAGE), format(now.overshootV(), VOLTAGE)),
                List.of("margin to the limits", format(was.marginV(), VOLTAGE), format(now.marginV(), VOLTAGE)),
                List.of("peak |Z|", format(old.impedance().peakOhms(), RESISTANCE), format(e.impedance().peakOhms(), RESISTANCE)),
                List.of("flatness (max/min |Z|)", String.format(Locale.ROOT, "%.2f dB", old.impedance().flatnessDb()),
                        String.format(Locale.ROOT, "%.2f dB", e.impedance().flatnessDb())));
        String intro = r.unchanged()
                ? "Keeping " + keeping(r) + ", the existing bank is returned unchanged: " + r.reason() + "."
                : String.format(Locale.ROOT, "Keeping %s, the trimmed bank saves %s%s per board (%.2f%s per 1,000 "
                        + "boards). The charts below overlay the trimmed bank (first) and the existing one.",
                keeping(r), money(savings), cur, 1000 * savings, cur);
        return new ReportModel.Section("Cost-down of the existing bank", List.of(intro),
                List.of(new ReportModel.Table("Part counts changed", List.of("part", "existing", "trimmed", "change"),
                                changeRows),
                        new ReportModel.Table("Existing against trimmed", List.of("figure", "existing", "trimmed"), cmp)),
                List.of()).asLead();
    }

    /** Both banks' |Z| and worst-case droop on the main charts (unless unchanged), and the savings as a key figure. */
    static UnaryOperator<ReportModel> overlays(TrimResult r) {
        String cur = Texts.currency(r.judge().scenario().cost().currency());
        String trimmedLabel = r.unchanged() ? "existing bank (unchanged)" : "trimmed bank";
        return m -> {
            ReportModel out = m;
            if (!r.unchanged()) {
                out = Overlays.withImpedance(out, List.of(Overlays.impedance(trimmedLabel, r.trimmed()),
                        Overlays.impedance("existing bank", r.existing())));
                out = Overlays.withWorstCase(out, List.of(
                        Overlays.waveform(trimmedLabel + ": worst-case droop", r.judge().droopWaveform(r.trimmed())),
                        Overlays.waveform("existing bank: worst-case droop", r.judge().droopWaveform(r.existing()))));
            }
            return Overlays.withKeyFigure(out, new ReportModel.KeyFigure("Savings per board",
                    money(r.savings()) + cur + (r.unchanged() ? " (unchanged)" : "")));
        };
    }

    static void summary(ObjectNode json, TrimResult r) {
        Evaluation old = r.existing();
        ObjectNode t = json.putObject("trim");
        t.put("keep", r.keep().name().toLowerCase(Locale.ROOT));
        t.put("keep_asked", r.keepAsked().name().toLowerCase(Locale.ROOT));
        t.put("existing_parts_only", r.existingPartsOnly());
        t.put("unchanged", r.unchanged());
        t.put("reason", r.reason());
        ObjectNode ex = t.putObject("existing");
        ex.put("cost_total", old.cost().total());
        ex.put("total_parts", old.bank().totalParts());
        ObjectNode w = ex.putObject("worst_case");
        w.put("droop_v", old.figures().droopV());
        w.put("overshoot_v", old.figures().overshootV());
        w.put("passes", old.figures().passes());
        ex.putObject("impedance").put("peak_ohm", old.impedance().peakOhms());
        t.put("savings", r.savings());
        t.put("savings_per_1000", r.savingsPer1000());
        t.put("keep_rule_met", r.keepRuleMet());
        ArrayNode arr = t.putArray("changes");
        for (CostDown.Change ch : r.changes()) {
            ObjectNode o = arr.addObject();
            o.put("part", ch.part());
            if (!ch.region().isEmpty()) {
                o.put("region", ch.region());
                o.put("moved_between_regions", ch.moved());
            }
            o.put("from", ch.from());
            o.put("to", ch.to());
        }
    }
}
