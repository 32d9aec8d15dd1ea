package breakwater.cli;

import breakwater.catalog.BankEntry;
import breakwater.catalog.Part;
import breakwater.design.BankEvaluator;
import breakwater.design.Evaluation;
import breakwater.optimize.ExcursionFrontier;
import breakwater.optimize.MaxCounts;
import breakwater.optimize.SearchSettings;
import breakwater.report.ReportModel;
import breakwater.report.chart.Frontier;
import breakwater.report.chart.FrontierChart;
import breakwater.report.chart.LabelledPoint;
import breakwater.report.chart.Limit;
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
import static breakwater.units.Quantity.VOLTAGE;

/** {@code breakwater frontier SCENARIO}: what a smaller worst excursion costs. */
@Command(name = "frontier", mixinStandardHelpOptions = true,
        description = {
            "Shows what each smaller worst excursion costs.",
            "",
            "The cost-excursion trade-off: first the smallest worst excursion (larger of worst droop and worst",
            "overshoot) the search reaches, then for K limits evenly spaced from it up to the spec's allowed",
            "excursion, the cheapest bank whose worst droop and overshoot both stay within the limit (and",
            "inside the spec and board limits). Each search starts from the previous, tighter limit's bank.",
            "A tighter limit never costs less: if a looser limit's search returns a dearer bank, the tighter",
            "limit's bank (which meets the looser limit too) is used, and the table says so.",
            "The time limit is shared: each of the K + 1 searches gets an equal part of it.",
            "The result files (bom.csv, ...) describe the bank at the spec's own limit.",
            "Exit 0 when that bank meets the spec; 1 otherwise."})
final class FrontierCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "SCENARIO", description = "Rail scenario (TOML).")
    Path scenarioFile;

    @Option(names = "--points", paramLabel = "K", defaultValue = "6",
            description = "Number of excursion limits, at least 2 (default: ${DEFAULT-VALUE}).")
    int points;

    @Mixin
    OutputOptions output;

    @Mixin
    SearchOptions search;

    @Override
    public Integer call() throws Exception {
        if (points < 2) {
            throw new UsageException("--points must be at least 2 (the tightest limit and the spec's), got " + points);
        }
        Inputs in = Inputs.load(scenarioFile, output.footprint);
        BankEvaluator specJudge = new BankEvaluator(in.scenario(), in.footprint());
        List<Part> candidates = in.catalog().parts();
        int[] max = MaxCounts.of(candidates, in.scenario());
        SearchSettings all = search.settings(in.scenario());
        SearchSettings each = CompareCommand.split(all, points + 1);
        PrintWriter err = spec.commandLine().getErr();
        boolean quiet = output.quiet || output.json;
        if (!quiet) {
            err.printf(Locale.ROOT, "breakwater: frontier of %d limits; the %s time limit is split over %d searches, "
                            + "%s each, seed %d%n", points, Durations.describe(all.timeLimit()), points + 1,
                    Durations.describe(each.timeLimit()), each.seed());
            err.flush();
        }
        try (StopOnInterrupt seq = new StopOnInterrupt(err)) {
            int[] step = {0};
            ExcursionFrontier.Result f = ExcursionFrontier.run(specJudge, candidates, max, each, points,
                    (bs, judge, settings, start) -> {
                        if (!quiet) {
                            err.println(step[0] == 0 ? "breakwater: the smallest worst excursion within reach"
                                    : "breakwater: limit " + step[0] + " of " + points);
                            err.flush();
                        }
                        step[0]++;
                        seq.running(bs);
                        return Searches.runWithProgress(bs, settings, start, err, quiet, judge);
                    }, seq::interrupted);
            ExcursionFrontier.Point last = f.points().get(f.points().size() - 1);
            Evaluation e = specJudge.evaluate(last.bank());
            return Results.emit("frontier", in, output.footprint, specJudge, e, Optional.empty(),
                    extras(in, f, all, each, seq.interrupted()), output, spec.commandLine().getOut(), err);
        }
    }

    private RunExtras extras(Inputs in, ExcursionFrontier.Result f, SearchSettings all, SearchSettings each,
                             boolean interrupted) {
        String currency = in.scenario().cost().currency();
        List<ExcursionFrontier.Point> pts = f.points();
        ExcursionFrontier.Point specPoint = pts.get(pts.size() - 1);
        List<String> headers = List.of("limit", "cost", "parts", "worst droop", "worst overshoot", "meets",
                "vs. the spec's bank", "note");
        List<List<String>> rows = new ArrayList<>();
        for (ExcursionFrontier.Point p : pts) {
            double dc = p.costTotal() - specPoint.costTotal();
            double dx = specPoint.excursionV() - p.excursionV();
            String vs = p == specPoint ? "-" : String.format(Locale.ROOT, "%+.4f for %s less", dc, format(dx, VOLTAGE));
            rows.add(List.of(format(p.limitV(), VOLTAGE), Text.money(p.costTotal()),
                    Integer.toString(p.bank().totalParts()), format(p.evaluation().figures().droopV(), VOLTAGE),
                    format(p.evaluation().figures().overshootV(), VOLTAGE), p.meetsLimit() ? "yes" : "NO", vs,
                    p.note().isEmpty() ? "" : p.note()));
        }
        StringBuilder c = new StringBuilder();
        c.append(String.format(Locale.ROOT, "Frontier   smallest worst excursion found %s, spec allows %s: %d limits "
                        + "from one to the other; the %s time limit was split over %d searches, %s each%s%n",
                format(f.tightestV(), VOLTAGE), format(f.allowedV(), VOLTAGE), pts.size(),
                Durations.describe(all.timeLimit()), pts.size() + 1, Durations.describe(each.timeLimit()),
                interrupted ? " (stopped by the user)" : ""));
        double op = f.points().get(0).evaluation().figures().operatingV();
        double droopAllowed = op - in.scenario().rail().lowerLimitV();
        double overAllowed = in.scenario().rail().upperLimitV() - op;
        double offset = in.scenario().rail().currentStepA() * f.points().get(0).evaluation().network().dcResistanceOhms();
        String asymmetric = Math.abs(droopAllowed - overAllowed) > 1e-12 ? String.format(Locale.ROOT,
                "each limit holds both worst droop and worst overshoot; the spec allows %s of droop and %s of overshoot "
                        + "from the %s operating point, and the worst overshoot is always the worst droop less "
                        + "ΔI·Z(0) = %s, so the spec is met once the droop is within %s, where the limits end",
                format(droopAllowed, VOLTAGE), format(overAllowed, VOLTAGE), format(op, VOLTAGE, 5),
                format(offset, VOLTAGE), format(f.allowedV(), VOLTAGE)) : "";
        if (!asymmetric.isEmpty()) {
            c.append(String.format(Locale.ROOT, "%-10s %s%n", "", asymmetric));
        }
        c.append(String.format(Locale.ROOT, "  %-10s %10s %6s %12s %15s %6s  %-28s%n", "limit", "cost", "parts",
                "worst droop", "worst overshoot", "meets", "vs. the spec's bank"));
        for (int i = 0; i < rows.size(); i++) {
            List<String> r = rows.get(i);
            c.append(String.format(Locale.ROOT, "  %-10s %10s %6s %12s %15s %6s  %-28s%n", r.get(0), r.get(1), r.get(2),
                    r.get(3), r.get(4), r.get(5), r.get(6)));
            if (!r.get(7).isEmpty()) {
                c.append("             note: ").append(r.get(7)).append('\n');
            }
        }
        c.append(String.format(Locale.ROOT, "%-10s the bank above and the files are the spec limit's bank%n", "Shown"));

        double[] cost = new double[pts.size() + 1];
        double[] exc = new double[pts.size() + 1];
        for (int i = 0; i < pts.size(); i++) {
            cost[i] = pts.get(i).costTotal();
            exc[i] = pts.get(i).excursionV();
        }
        cost[pts.size()] = f.closest().cost().total();
        exc[pts.size()] = f.tightestV();
        List<LabelledPoint> hl = List.of(
                new LabelledPoint("spec's limit", specPoint.costTotal(), specPoint.excursionV()),
                new LabelledPoint("tightest", pts.get(0).costTotal(), pts.get(0).excursionV()));
        String chart = FrontierChart.svg(new Frontier("cost per board", currency, "worst excursion", "V",
                cost, exc, List.of(new Limit("allowed by the spec " + format(f.allowedV(), VOLTAGE), f.allowedV())),
                hl));
        String intro = String.format(Locale.ROOT, "The cheapest bank for each excursion limit (worst droop and worst "
                        + "overshoot each at most the limit), from the smallest worst excursion the search reached, %s, "
                        + "up to what the spec allows, %s. Each search had %s (the %s limit split over %d searches) and "
                        + "started from the previous, tighter limit's bank. A tighter limit never costs less here: where "
                        + "a search returned a dearer bank, the tighter limit's bank is used (see the notes).",
                format(f.tightestV(), VOLTAGE), format(f.allowedV(), VOLTAGE), Durations.describe(each.timeLimit()),
                Durations.describe(all.timeLimit()), pts.size() + 1) + (asymmetric.isEmpty() ? "" : " Note: " + asymmetric + ".");
        ReportModel.Section section = new ReportModel.Section("Cost against worst excursion", List.of(intro),
                List.of(new ReportModel.Table("Frontier, tightest limit first", headers, rows)), List.of(chart));
        return RunExtras.of(List.of(section), json -> {
            ObjectNode fr = json.putObject("frontier_search");
            fr.put("tightest_v", f.tightestV());
            fr.put("allowed_v", f.allowedV());
            fr.put("time_limit_each_s", each.timeLimit().toNanos() / 1e9);
            fr.put("stopped_early", interrupted);
            ArrayNode arr = json.putArray("frontier");
            for (ExcursionFrontier.Point p : pts) {
                ObjectNode o = arr.addObject();
                o.put("limit_v", p.limitV());
                o.put("cost_total", p.costTotal());
                o.put("total_parts", p.bank().totalParts());
                ArrayNode bank = o.putArray("bank");
                for (BankEntry be : p.bank().entries()) {
                    bank.addObject().put("part", be.part().name()).put("count", be.count());
                }
                ObjectNode wc = o.putObject("worst_case");
                wc.put("droop_v", p.evaluation().figures().droopV());
                wc.put("overshoot_v", p.evaluation().figures().overshootV());
                o.put("meets_limit", p.meetsLimit());
                o.put("searched", p.searched());
                o.put("note", p.note());
            }
        }, c.toString());
    }
}
