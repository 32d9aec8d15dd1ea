package breakwater.cli;

import breakwater.catalog.BankEntry;
import breakwater.catalog.BankFileReader;
import breakwater.catalog.Part;
import breakwater.design.BankEvaluator;
import breakwater.design.CapacitorBank;
import breakwater.design.Evaluation;
import breakwater.design.WorstCaseVolts;
import breakwater.optimize.BankSearch;
import breakwater.optimize.CostDown;
import breakwater.optimize.SearchResult;
import breakwater.optimize.SearchSettings;
import breakwater.report.Overlays;
import breakwater.report.ReportModel;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;

import static breakwater.units.EngineeringNotation.format;
import static breakwater.units.Quantity.RESISTANCE;
import static breakwater.units.Quantity.VOLTAGE;

/** {@code breakwater trim SCENARIO}: the cheapest bank that loses nothing the existing bank achieves. */
@Command(name = "trim", mixinStandardHelpOptions = true,
        description = {
            "Costs down an existing bank without losing margin.",
            "",
            "Searches, starting from the existing bank, for the cheapest bank whose worst droop",
            "and worst overshoot are no worse than the existing bank's (--keep margin, the default) or that",
            "merely meets the spec (--keep spec); board limits and [objective] require_target still hold.",
            "The existing bank is the scenario's [existing] file unless --bank names another.",
            "If the search finds nothing strictly cheaper within those limits, the existing bank is returned",
            "unchanged, and the output says so.",
            "",
            "Prints what changed per part (old count -> new count), the savings per board and per 1,000",
            "boards, and old against new worst case; the report overlays both banks' impedance and worst case.",
            "Exit 0 when the result meets the spec (and the keep rule); 1 otherwise."})
final class TrimCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "SCENARIO", description = "Rail scenario (TOML).")
    Path scenarioFile;

    @Option(names = "--bank", paramLabel = "FILE",
            description = "Existing bank to cost down (CSV: part,count). Default: the scenario's [existing] file.")
    Path bankFile;

    @Option(names = "--keep", paramLabel = "RULE", defaultValue = "margin",
            description = "What the cheaper bank must keep: margin (worst droop and overshoot no worse than the "
                    + "existing bank's) or spec (merely inside the tolerance). Default: ${DEFAULT-VALUE}.")
    CostDown.Keep keep;

    @Mixin
    OutputOptions output;

    @Mixin
    SearchOptions search;

    @Mixin
    MonteCarloOptions monteCarlo;

    @Mixin
    ExportOptions export;

    @Override
    public Integer call() throws Exception {
        export.requireOut(output);
        Inputs in = Inputs.load(scenarioFile, output.footprint);
        Path file = bankFile != null ? bankFile : in.scenario().existingBank().orElseThrow(() -> new UsageException(
                "trim needs a bank to start from: give --bank FILE, or name one in the scenario's [existing] "
                        + "section (file = \"my-bank.csv\")"));
        if (bankFile == null && !java.nio.file.Files.isRegularFile(file)) {
            // named inside the scenario: the scenario is what is wrong (a missing --bank is an I/O error)
            throw new breakwater.diagnostic.InputException(List.of(breakwater.diagnostic.Diagnostic.of(
                    in.scenario().source(), "existing.file: bank file not found (looked for " + file + ")")
                    .withHint("the path is relative to the scenario's folder; or give the bank with --bank FILE")));
        }
        List<BankEntry> entries = BankFileReader.read(file, Inputs.display(file), in.catalog());
        CapacitorBank existing = new CapacitorBank(entries);
        BankEvaluator specJudge = new BankEvaluator(in.scenario(), in.footprint());
        Evaluation old = specJudge.evaluate(existing);
        BankEvaluator judge = CostDown.judge(specJudge, old, keep);
        List<Part> candidates = in.catalog().parts();
        int[] max = CostDown.maxCounts(candidates, in.scenario(), existing);
        SearchSettings settings = search.settings(in.scenario());
        BankSearch bankSearch = new BankSearch(judge, candidates, max);

        PrintWriter err = spec.commandLine().getErr();
        boolean quiet = output.quiet || output.json;
        if (!quiet) {
            err.printf(Locale.ROOT, "breakwater: trimming %s (%d parts, cost %s) keeping %s; searching %d parts for up "
                            + "to %s with %d solver%s, seed %d%s%n", Inputs.display(file), existing.totalParts(),
                    Text.money(old.cost().total()), keep == CostDown.Keep.MARGIN && old.figures().passes()
                            ? "its worst droop " + format(old.figures().droopV(), VOLTAGE) + " and overshoot "
                            + format(old.figures().overshootV(), VOLTAGE) + " or better"
                            : keep == CostDown.Keep.MARGIN ? "the spec (the existing bank itself misses it, so it has "
                            + "no margin to keep)" : "the spec",
                    candidates.size(), Durations.describe(settings.timeLimit()), settings.solvers(),
                    settings.solvers() == 1 ? "" : "s", settings.seed(),
                    settings.moveLimit() > 0 ? ", move limit " + settings.moveLimit() : "");
            err.flush();
        }
        try (StopOnInterrupt guard = new StopOnInterrupt(bankSearch, err)) {
            SearchResult result = Searches.runWithProgress(bankSearch, settings, existing, err, quiet, judge);
            CostDown.Decision d = CostDown.decide(judge, existing, result.bank());
            Evaluation e = specJudge.evaluate(d.chosen());
            boolean kept = keep == CostDown.Keep.SPEC || (e.figures().droopV() <= old.figures().droopV()
                    && e.figures().overshootV() <= old.figures().overshootV());
            RunExtras extras = extras(in, specJudge, old, e, d, kept)
                    .plus(monteCarlo.run(specJudge, d.chosen(), in.scenario(), quiet, err));
            return Results.emit("trim", in, output.footprint, specJudge, e, Optional.of(result), extras, output, export,
                    spec.commandLine().getOut(), err);
        }
    }

    private RunExtras extras(Inputs in, BankEvaluator specJudge, Evaluation old, Evaluation e, CostDown.Decision d,
                             boolean kept) {
        String currency = in.scenario().cost().currency();
        String cur = currency.isEmpty() ? "" : " " + currency;
        // in decimal, like the costs themselves (0.062, not 0.06200000000000028)
        double savings = java.math.BigDecimal.valueOf(old.cost().total()).subtract(java.math.BigDecimal.valueOf(e.cost().total())).doubleValue();
        List<CostDown.Change> changes = CostDown.changes(d.existing(), d.chosen());
        WorstCaseVolts was = old.figures();
        WorstCaseVolts now = e.figures();

        StringBuilder c = new StringBuilder();
        if (d.unchanged()) {
            c.append(String.format(Locale.ROOT, "%-10s existing bank returned UNCHANGED: %s%n", "Trim", d.reason()));
            if (!was.passes()) {
                c.append(String.format(Locale.ROOT, "%-10s the existing bank does not meet the spec itself; "
                        + "'breakwater solve' searches for one that does%n", ""));
            }
        } else {
            c.append(String.format(Locale.ROOT, "%-10s %d part count%s changed (keeping %s):%n", "Trim", changes.size(),
                    changes.size() == 1 ? "" : "s", keep == CostDown.Keep.MARGIN ? "the existing margin" : "the spec"));
            for (CostDown.Change ch : changes) {
                c.append(String.format(Locale.ROOT, "  %-24s %4d -> %-4d %s%n", ch.part(), ch.from(), ch.to(),
                        ch.to() == 0 ? "(removed)" : ch.from() == 0 ? "(added)" : ""));
            }
        }
        c.append(String.format(Locale.ROOT, "%-10s %s%s per board, %s%s per 1,000 boards (%s -> %s%s)%n", "Savings",
                Text.money(savings), cur, String.format(Locale.ROOT, "%.2f", 1000 * savings), cur,
                Text.money(old.cost().total()), Text.money(e.cost().total()), cur));
        c.append(String.format(Locale.ROOT, "%-10s droop %s -> %s, overshoot %s -> %s, margin %s -> %s, peak |Z| %s -> %s%n",
                "Old -> new", format(was.droopV(), VOLTAGE), format(now.droopV(), VOLTAGE),
                format(was.overshootV(), VOLTAGE), format(now.overshootV(), VOLTAGE), format(was.marginV(), VOLTAGE),
                format(now.marginV(), VOLTAGE), format(old.impedance().peakOhms(), RESISTANCE),
                format(e.impedance().peakOhms(), RESISTANCE)));

        List<List<String>> changeRows = new ArrayList<>();
        for (CostDown.Change ch : changes) {
            changeRows.add(List.of(ch.part(), Integer.toString(ch.from()), Integer.toString(ch.to()),
                    ch.to() == 0 ? "removed" : ch.from() == 0 ? "added" : ch.to() < ch.from() ? "fewer" : "more"));
        }
        List<List<String>> cmp = List.of(
                List.of("cost per board", Text.money(old.cost().total()) + cur, Text.money(e.cost().total()) + cur),
                List.of("parts", Integer.toString(old.bank().totalParts()), Integer.toString(e.bank().totalParts())),
                List.of("worst droop", format(was.droopV(), VOLTAGE), format(now.droopV(), VOLTAGE)),
                List.of("worst overshoot", format(was.overshootV(), VOLTAGE), format(now.overshootV(), VOLTAGE)),
                List.of("margin to the limits", format(was.marginV(), VOLTAGE), format(now.marginV(), VOLTAGE)),
                List.of("peak |Z|", format(old.impedance().peakOhms(), RESISTANCE), format(e.impedance().peakOhms(), RESISTANCE)),
                List.of("ripple in the band", String.format(Locale.ROOT, "%.2f dB", old.impedance().rippleDb()),
                        String.format(Locale.ROOT, "%.2f dB", e.impedance().rippleDb())));
        String intro = d.unchanged()
                ? "The existing bank is returned unchanged: " + d.reason() + "."
                : String.format(Locale.ROOT, "Keeping %s, the trimmed bank saves %s%s per board (%.2f%s per 1,000 "
                        + "boards). The charts above overlay the trimmed bank (first) and the existing one.",
                keep == CostDown.Keep.MARGIN ? "the existing bank's worst droop and overshoot" : "the spec",
                Text.money(savings), cur, 1000 * savings, cur);
        ReportModel.Section section = new ReportModel.Section("Cost-down of the existing bank", List.of(intro),
                List.of(new ReportModel.Table("Part counts changed", List.of("part", "existing", "trimmed", "change"),
                                changeRows),
                        new ReportModel.Table("Existing against trimmed", List.of("figure", "existing", "trimmed"), cmp)),
                List.of());

        String trimmedLabel = d.unchanged() ? "existing bank (unchanged)" : "trimmed bank";
        var model = (java.util.function.UnaryOperator<ReportModel>) m -> {
            ReportModel r = m;
            if (!d.unchanged()) {
                r = Overlays.withImpedance(r, List.of(Overlays.impedance(trimmedLabel, e),
                        Overlays.impedance("existing bank", old)));
                r = Overlays.withWorstCase(r, List.of(
                        Overlays.waveform(trimmedLabel + ": worst-case droop", specJudge.droopWaveform(e)),
                        Overlays.waveform("existing bank: worst-case droop", specJudge.droopWaveform(old))));
            }
            return Overlays.withKeyFigure(r, new ReportModel.KeyFigure("Savings per board",
                    Text.money(savings) + cur + (d.unchanged() ? " (unchanged)" : "")));
        };
        return new RunExtras(List.of(section), json -> {
            ObjectNode t = json.putObject("trim");
            t.put("keep", keep.name().toLowerCase(Locale.ROOT));
            t.put("unchanged", d.unchanged());
            t.put("reason", d.reason());
            ObjectNode ex = t.putObject("existing");
            ex.put("cost_total", old.cost().total());
            ex.put("total_parts", old.bank().totalParts());
            ObjectNode w = ex.putObject("worst_case");
            w.put("droop_v", was.droopV());
            w.put("overshoot_v", was.overshootV());
            w.put("passes", was.passes());
            ex.putObject("impedance").put("peak_ohm", old.impedance().peakOhms());
            t.put("savings", savings);
            t.put("savings_per_1000", java.math.BigDecimal.valueOf(savings).multiply(java.math.BigDecimal.valueOf(1000)).doubleValue());
            t.put("keep_rule_met", kept);
            ArrayNode arr = t.putArray("changes");
            for (CostDown.Change ch : changes) {
                ObjectNode o = arr.addObject();
                o.put("part", ch.part());
                o.put("from", ch.from());
                o.put("to", ch.to());
            }
        }, c.toString(), model, kept, kept ? "" : "TRIM LOST MARGIN: the result is worse than the existing bank");
    }
}
