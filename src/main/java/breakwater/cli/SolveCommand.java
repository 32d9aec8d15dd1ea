package breakwater.cli;

import breakwater.design.BankEvaluator;
import breakwater.design.DesignMargin;
import breakwater.optimize.SolveResult;
import breakwater.report.SolveReport;
import breakwater.report.ResultWriter;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

import java.util.Optional;
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
            "With --margin (or [solver] margin) the search keeps the worst case that far inside the band.",
            "Exit 0 when the bank found meets the spec (and keeps the margin asked for); 1 when none was",
            "found (the closest is written)."})
final class SolveCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Mixin
    ScenarioArgument scenario;

    @Mixin
    OutputOptions output;

    @Mixin
    ExportOptions export;

    @Mixin
    SearchOptions search;

    @Mixin
    MonteCarloOptions monteCarlo;

    @Option(names = "--margin", paramLabel = "VOLTAGE", converter = VoltageConverter.class,
            description = "Keep the worst case at least this far inside the tolerance band on both sides "
                    + "(e.g. 1mV): a design margin for part spread and model error. Default: [solver] margin, "
                    + "else none.")
    Double marginV;

    /** --margin, else the scenario's [solver] margin, else none. */
    Optional<DesignMargin> margin(double scenarioMarginV) {
        if (marginV != null) {
            return marginV > 0 ? Optional.of(new DesignMargin(marginV, "--margin", false)) : Optional.empty();
        }
        return scenarioMarginV > 0 ? Optional.of(new DesignMargin(scenarioMarginV, "solver.margin", true))
                : Optional.empty();
    }

    @Override
    public Integer call() throws Exception {
        ResultWriter.Target target = export.target(output);
        Inputs in = scenario.load(output.footprint);
        target = target.withWarnings(in.warnings());
        BankEvaluator judge = new BankEvaluator(in.scenario(), in.footprint());
        var settings = search.settings(in.scenario());
        var draws = monteCarlo.settings(in);
        // progress stays on the error stream with --json (only --quiet silences it)
        try (Searches progress = new Searches(spec.commandLine().getErr(), output.quiet, true)) {
            SolveResult r = SolveResult.solve(judge, output.footprint, in.searchParts(output.acceptLowRating), settings,
                    margin(in.scenario().designMarginV()), draws, progress);
            SolveReport.write(r, target, spec.commandLine().getOut());
            return ExitCodes.of(r.verdict());
        }
    }
}
