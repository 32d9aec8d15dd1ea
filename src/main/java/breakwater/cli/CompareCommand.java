package breakwater.cli;

import breakwater.catalog.BankEntry;
import breakwater.catalog.BankFileReader;
import breakwater.catalog.Part;
import breakwater.design.BankEvaluator;
import breakwater.design.CapacitorBank;
import breakwater.design.Evaluation;
import breakwater.diagnostic.Suggestions;
import breakwater.optimize.BankSearch;
import breakwater.optimize.MaxCounts;
import breakwater.optimize.SearchResult;
import breakwater.optimize.SearchSettings;
import breakwater.report.Overlays;
import breakwater.report.ReportModel;
import breakwater.scenario.Footprint;
import breakwater.scenario.Scenario;
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
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Callable;

import static breakwater.units.EngineeringNotation.format;
import static breakwater.units.Quantity.RESISTANCE;
import static breakwater.units.Quantity.VOLTAGE;

/** {@code breakwater compare SCENARIO}: the best bank under each footprint, side by side. */
@Command(name = "compare", mixinStandardHelpOptions = true,
        description = {
            "Compares footprints (layout options) side by side.",
            "",
            "For each footprint (default: every [footprint.NAME] of the scenario, in",
            "file order) solves for the cheapest bank under that footprint's mounting inductances, or with",
            "--bank judges the given bank under each, and shows cost, parts, worst droop and overshoot,",
            "margin, ripple and peak |Z| side by side; the report overlays their impedance and worst case.",
            "The name 'catalog' stands for the catalog's own mount_inductance column.",
            "The time limit is shared: each footprint's search gets an equal part of it.",
            "The result files (bom.csv, ...) describe the cheapest bank that meets the spec (else the first).",
            "Exit 0 when every footprint's bank meets the spec; 1 otherwise."})
final class CompareCommand implements Callable<Integer> {
    /** Stands for the catalog's own mounting inductance, unless the scenario defines a footprint so named. */
    static final String CATALOG = "catalog";

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "SCENARIO", description = "Rail scenario (TOML).")
    Path scenarioFile;

    @Option(names = "--footprints", paramLabel = "A,B", split = ",",
            description = "Footprints to compare, in this order (default: all of the scenario's, in file order).")
    List<String> footprintNames;

    @Option(names = "--bank", paramLabel = "FILE",
            description = "Judge this bank (CSV: part,count) under each footprint instead of solving.")
    Path bankFile;

    @Mixin
    OutputOptions output;

    @Mixin
    SearchOptions search;

    /** One footprint's outcome. */
    record Row(String name, BankEvaluator evaluator, Evaluation evaluation, Optional<SearchResult> search,
               boolean meets) {
    }

    @Override
    public Integer call() throws Exception {
        if (!output.footprint.isEmpty()) {
            throw new UsageException("compare takes --footprints A,B,... (plural), not --footprint");
        }
        Inputs in = Inputs.load(scenarioFile, "");
        Scenario scenario = in.scenario();
        List<String> names = chosen(scenario);
        PrintWriter err = spec.commandLine().getErr();
        boolean quiet = output.quiet || output.json;
        Optional<CapacitorBank> given = Optional.empty();
        if (bankFile != null) {
            List<BankEntry> entries = BankFileReader.read(bankFile, Inputs.display(bankFile), in.catalog());
            given = Optional.of(new CapacitorBank(entries));
        }
        SearchSettings all = search.settings(scenario);
        SearchSettings each = split(all, names.size());
        List<Part> candidates = in.catalog().parts();
        int[] max = MaxCounts.of(candidates, scenario);
        if (!quiet) {
            err.printf(Locale.ROOT, "breakwater: comparing %d footprint%s (%s)%s%n", names.size(),
                    names.size() == 1 ? "" : "s", String.join(", ", names), given.isPresent()
                            ? " with the bank " + Inputs.display(bankFile)
                            : String.format(Locale.ROOT, "; the %s time limit is split: %s per footprint, seed %d",
                            Durations.describe(all.timeLimit()), Durations.describe(each.timeLimit()), each.seed()));
            err.flush();
        }
        List<Row> rows = new ArrayList<>();
        try (StopOnInterrupt seq = new StopOnInterrupt(err)) {
            for (String name : names) {
                Optional<Footprint> fp = footprint(scenario, name);
                BankEvaluator ev = new BankEvaluator(scenario, fp);
                Optional<SearchResult> result = Optional.empty();
                CapacitorBank bank;
                if (given.isPresent()) {
                    bank = given.get();
                } else if (seq.interrupted()) {
                    bank = CapacitorBank.EMPTY;
                } else {
                    if (!quiet) {
                        err.println("breakwater: footprint " + name);
                        err.flush();
                    }
                    BankSearch bs = new BankSearch(ev, candidates, max);
                    seq.running(bs);
                    SearchResult r = Searches.runWithProgress(bs, each, CapacitorBank.EMPTY, err, quiet, ev);
                    result = Optional.of(r);
                    bank = r.bank();
                }
                Evaluation e = ev.evaluate(bank);
                rows.add(new Row(name, ev, e, result, breakwater.design.Verdict.meetsSpec(e, scenario.requireTarget())));
            }
            Row primary = rows.stream().filter(Row::meets)
                    .min((a, b) -> Double.compare(a.evaluation().cost().total(), b.evaluation().cost().total()))
                    .orElse(rows.get(0));
            boolean allMeet = rows.stream().allMatch(Row::meets);
            List<String> failing = rows.stream().filter(r -> !r.meets()).map(Row::name).toList();
            RunExtras extras = extras(in, rows, primary, given.isPresent(), all, each, seq.interrupted())
                    .withFailure(allMeet, new breakwater.design.Verdict.FootprintsFailing(failing));
            return Results.emit("compare", in, primary.name(), primary.evaluator(), primary.evaluation(),
                    primary.search(), extras, output, spec.commandLine().getOut(), err);
        }
    }

    private List<String> chosen(Scenario scenario) {
        Map<String, Footprint> defined = scenario.footprints();
        if (footprintNames == null || footprintNames.isEmpty()) {
            if (defined.isEmpty()) {
                throw new UsageException("compare needs footprints, and " + scenario.source() + " defines none. "
                        + "Maybe add [footprint.NAME] sections (mounting inductance per case, e.g. 0402 = \"0.3 nH\"), "
                        + "or name them with --footprints (the name '" + CATALOG + "' stands for the catalog's own "
                        + "mount_inductance column)");
            }
            return List.copyOf(defined.keySet());
        }
        List<String> out = new ArrayList<>();
        for (String raw : footprintNames) {
            String n = raw.strip();
            if (n.isEmpty()) {
                throw new UsageException("--footprints has an empty name; write e.g. --footprints two-via,via-in-pad");
            }
            if (!defined.containsKey(n) && !n.equals(CATALOG)) {
                String known = defined.isEmpty() ? "the scenario defines none"
                        : "the scenario defines " + String.join(", ", defined.keySet());
                String hint = Suggestions.closest(n, defined.keySet()).map(s -> " Did you mean '" + s + "'?").orElse("");
                throw new UsageException("unknown footprint '" + n + "': " + known + " ('" + CATALOG
                        + "' = the catalog's mounting inductance)." + hint);
            }
            if (out.contains(n)) {
                throw new UsageException("footprint '" + n + "' is named twice in --footprints");
            }
            out.add(n);
        }
        return out;
    }

    static Optional<Footprint> footprint(Scenario s, String name) {
        Optional<Footprint> fp = s.footprint(name);
        return fp.isPresent() || !name.equals(CATALOG) ? fp : Optional.empty();
    }

    /** An equal share of the time limit for each of {@code parts} searches; moves, seed, solvers unchanged. */
    static SearchSettings split(SearchSettings s, int parts) {
        Duration t = s.timeLimit().dividedBy(Math.max(1, parts));
        Duration unimproved = s.unimprovedLimit().compareTo(t) < 0 ? s.unimprovedLimit() : t;
        return new SearchSettings(t, unimproved, s.moveLimit(), s.seed(), s.solvers());
    }

    private RunExtras extras(Inputs in, List<Row> rows, Row primary, boolean givenBank, SearchSettings all,
                             SearchSettings each, boolean interrupted) {
        String currency = in.scenario().cost().currency();
        List<String> headers = List.of("footprint", "cost", "parts", "worst droop", "worst overshoot", "margin",
                "ripple", "peak |Z|", "verdict");
        List<List<String>> table = new ArrayList<>();
        for (Row r : rows) {
            Evaluation e = r.evaluation();
            table.add(List.of(r.name(), Text.money(e.cost().total()), Integer.toString(e.bank().totalParts()),
                    format(e.figures().droopV(), VOLTAGE), format(e.figures().overshootV(), VOLTAGE),
                    format(e.figures().marginV(), VOLTAGE), String.format(Locale.ROOT, "%.2f dB", e.impedance().rippleDb()),
                    format(e.impedance().peakOhms(), RESISTANCE), r.meets() ? "meets spec" : "FAILS"));
        }
        StringBuilder c = new StringBuilder();
        c.append(givenBank ? "Compare    the given bank under each footprint\n"
                : String.format(Locale.ROOT, "Compare    the cheapest bank found under each footprint; the %s time "
                        + "limit was split, %s per footprint%s%n", Durations.describe(all.timeLimit()),
                Durations.describe(each.timeLimit()), interrupted ? " (stopped by the user: later footprints not searched)" : ""));
        c.append(String.format(Locale.ROOT, "  %-16s %10s %6s %12s %12s %11s %9s %10s  %s%n", (Object[]) headers.toArray(String[]::new)));
        for (List<String> row : table) {
            c.append(String.format(Locale.ROOT, "  %-16s %10s %6s %12s %12s %11s %9s %10s  %s%n", row.toArray()));
        }
        c.append(String.format(Locale.ROOT, "%-10s the bank above and the files describe footprint %s%s%n", "Shown",
                primary.name(), primary.meets() ? " (the cheapest that meets the spec)" : " (none meets the spec)"));

        List<ReportModel.ImpedanceSeries> z = new ArrayList<>();
        List<ReportModel.WaveformSeries> w = new ArrayList<>();
        for (Row r : rows) {
            z.add(Overlays.impedance(r.name(), r.evaluation()));
            w.add(Overlays.waveform(r.name() + ": worst-case droop", r.evaluator().droopWaveform(r.evaluation())));
        }
        String intro = (givenBank ? "One bank judged under each footprint's mounting inductances."
                : String.format(Locale.ROOT, "For each footprint, the cheapest bank the search found under its "
                        + "mounting inductances (%s of the %s time limit each, seed %d).",
                Durations.describe(each.timeLimit()), Durations.describe(all.timeLimit()), each.seed()))
                + " The charts above overlay every footprint's |Z| and worst-case droop; the bill of materials "
                + "is that of " + primary.name() + ". Costs in " + (currency.isEmpty() ? "the catalog's currency" : currency) + ".";
        ReportModel.Section section = new ReportModel.Section("Footprints compared", List.of(intro),
                List.of(new ReportModel.Table("Side by side", headers, table)), List.of());
        return RunExtras.of(List.of(section), json -> {
            json.put("compare_bank_given", givenBank);
            json.put("compare_time_limit_each_s", each.timeLimit().toNanos() / 1e9);
            ArrayNode arr = json.putArray("footprints");
            for (Row r : rows) {
                Evaluation e = r.evaluation();
                ObjectNode o = arr.addObject();
                o.put("name", r.name());
                o.put("cost_total", e.cost().total());
                o.put("total_parts", e.bank().totalParts());
                o.put("meets_spec", r.meets());
                ArrayNode bank = o.putArray("bank");
                for (BankEntry be : e.bank().entries()) {
                    bank.addObject().put("part", be.part().name()).put("count", be.count());
                }
                ObjectNode wc = o.putObject("worst_case");
                wc.put("droop_v", e.figures().droopV());
                wc.put("overshoot_v", e.figures().overshootV());
                wc.put("margin_v", e.figures().marginV());
                wc.put("passes", e.figures().passes());
                ObjectNode imp = o.putObject("impedance");
                imp.put("peak_ohm", e.impedance().peakOhms());
                imp.put("ripple_db", e.impedance().rippleDb());
                r.search().ifPresent(s -> o.put("search_time_s", s.seconds()));
            }
        }, c.toString()).withModel(m -> Overlays.withWorstCase(Overlays.withImpedance(m, z), w));
    }
}
