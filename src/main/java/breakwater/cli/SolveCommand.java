package breakwater.cli;

import breakwater.catalog.Part;
import breakwater.design.BankEvaluator;
import breakwater.design.CapacitorBank;
import breakwater.design.Evaluation;
import breakwater.optimize.BankSearch;
import breakwater.optimize.MaxCounts;
import breakwater.optimize.SearchResult;
import breakwater.optimize.SearchSettings;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;


/** {@code breakwater solve SCENARIO}: searches for the cheapest bank that meets the spec. */
@Command(name = "solve", mixinStandardHelpOptions = true,
        description = {
            "Finds the cheapest bank that meets the spec.",
            "",
            "Searches part counts for the cheapest bank whose exact worst-case transient stays inside the",
            "rail's tolerance (and, with [objective] require_target, whose |Z| stays under the target),",
            "within the board limits; ties are broken by flatter impedance, then fewer parts.",
            "",
            "Each part is tried from 0 up to its catalog max_count; without one, up to",
            "clamp(ceil(4 x ESR / Z_t), 8, 64) - enough parts that their ESR in parallel is a quarter of the",
            "target impedance - and never beyond the board's max_per_case and max_parts.",
            "",
            "Progress is printed on stderr; Ctrl-C stops the search and still writes the best bank found.",
            "Exit 0 when the bank found meets the spec; 1 when none was found (the closest is written)."})
final class SolveCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "SCENARIO", description = "Rail scenario (TOML).")
    Path scenarioFile;

    @Mixin
    OutputOptions output;

    @Mixin
    SearchOptions search;

    @Mixin
    MonteCarloOptions monteCarlo;

    @Override
    public Integer call() throws Exception {
        Inputs in = Inputs.load(scenarioFile, output.footprint);
        BankEvaluator evaluator = new BankEvaluator(in.scenario(), in.footprint());
        List<Part> candidates = in.catalog().parts();
        int[] max = MaxCounts.of(candidates, in.scenario());
        SearchSettings settings = search.settings(in.scenario());
        BankSearch bankSearch = new BankSearch(evaluator, candidates, max);

        PrintWriter err = spec.commandLine().getErr();
        if (!output.quiet) {
            err.printf(Locale.ROOT, "breakwater: searching %d parts for up to %s with %d solver%s, seed %d%s%n",
                    candidates.size(), Durations.describe(settings.timeLimit()), settings.solvers(),
                    settings.solvers() == 1 ? "" : "s", settings.seed(),
                    settings.moveLimit() > 0 ? ", move limit " + settings.moveLimit() : "");
            err.flush();
        }
        try (StopOnInterrupt guard = new StopOnInterrupt(bankSearch, err)) {
            SearchResult result = Searches.runWithProgress(bankSearch, settings, CapacitorBank.EMPTY, err, output.quiet,
                    evaluator);
            Evaluation e = evaluator.evaluate(result.bank());
            RunExtras mc = monteCarlo.run(evaluator, e.bank(), in.scenario(), output.quiet, err);
            return Results.emit("solve", in, output.footprint, evaluator, e, java.util.Optional.of(result), mc,
                    output, spec.commandLine().getOut(), err);
        }
    }
}
