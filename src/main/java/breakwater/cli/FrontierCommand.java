package breakwater.cli;

import breakwater.design.BankEvaluator;
import breakwater.optimize.FrontierResult;
import breakwater.report.FrontierReport;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

import java.util.concurrent.Callable;

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

    @Mixin
    ScenarioArgument scenario;

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
        Inputs in = scenario.load(output.footprint);
        BankEvaluator judge = new BankEvaluator(in.scenario(), in.footprint());
        var settings = search.settings(in.scenario());
        try (Searches progress = new Searches(spec.commandLine().getErr(), output.silent(), true)) {
            FrontierResult r = FrontierResult.frontier(judge, output.footprint, in.catalog().parts(), settings, points,
                    progress);
            FrontierReport.write(r, output.target(), spec.commandLine().getOut());
            return ExitCodes.of(r.verdict());
        }
    }
}
