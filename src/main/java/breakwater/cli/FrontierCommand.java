package breakwater.cli;

import breakwater.design.BankEvaluator;
import breakwater.optimize.FrontierResult;
import breakwater.report.FrontierReport;
import breakwater.report.ResultWriter;
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
            description = "Number of excursion limits, 2 to " + FrontierCommand.MAX_POINTS + " (default: "
                    + "${DEFAULT-VALUE}); each of the K + 1 searches needs at least " + FrontierCommand.MIN_SEARCH_MS
                    + " ms of the time limit unless --moves bounds it.")
    int points;

    /** The most limits a frontier has: a curve of 50 points is as fine as a chart or a table can show. */
    static final int MAX_POINTS = 50;
    /** The least time a search of the frontier is given; shorter ones end before the first bank is judged. */
    static final long MIN_SEARCH_MS = 200;

    @Mixin
    OutputOptions output;

    @Mixin
    SearchOptions search;

    @Override
    public Integer call() throws Exception {
        if (points < 2 || points > MAX_POINTS) {
            throw new UsageException("--points is 2 (the tightest limit and the spec's) to " + MAX_POINTS + ", got "
                    + points);
        }
        ResultWriter.Target target = output.target(); // an --out that cannot be made is said before any work
        Inputs in = scenario.load(output.footprint);
        target = target.withWarnings(in.warnings());
        BankEvaluator judge = new BankEvaluator(in.scenario(), in.footprint());
        var settings = search.settings(in.scenario());
        long shareMs = settings.timeLimit().toMillis() / (points + 1);
        if (settings.moveLimit() == 0 && shareMs < MIN_SEARCH_MS) {
            long fit = Math.max(1, settings.timeLimit().toMillis() / MIN_SEARCH_MS - 1);
            throw new UsageException("--points " + points + " leaves each of the " + (points + 1) + " searches "
                    + shareMs + " ms of the " + seconds(settings.timeLimit().toMillis()) + " time limit, under the "
                    + MIN_SEARCH_MS + " ms a search needs; " + (fit >= 2 ? "at most " + fit + " points fit, or " : "")
                    + "give a longer --time-limit (at least "
                    + seconds(MIN_SEARCH_MS * (points + 1)) + ")");
        }
        try (Searches progress = new Searches(spec.commandLine().getErr(), output.silent(), true)) {
            FrontierResult r = FrontierResult.frontier(judge, output.footprint, in.searchParts(output.acceptLowRating), settings, points,
                    progress);
            FrontierReport.write(r, target, spec.commandLine().getOut());
            return ExitCodes.of(r.verdict());
        }
    }

    private static String seconds(long millis) {
        return String.format(java.util.Locale.ROOT, "%.1f s", millis / 1000.0);
    }
}
