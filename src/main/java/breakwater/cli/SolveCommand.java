package breakwater.cli;

import breakwater.catalog.Part;
import breakwater.design.BankEvaluator;
import breakwater.design.CapacitorBank;
import breakwater.design.Evaluation;
import breakwater.design.DesignMargin;
import breakwater.optimize.BankSearch;
import breakwater.optimize.MaxCounts;
import breakwater.optimize.SearchResult;
import breakwater.optimize.SearchSettings;
import breakwater.report.ReportModel;
import breakwater.units.EngineeringNotation;
import breakwater.units.NotationException;
import breakwater.units.Quantity;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;

import static breakwater.units.EngineeringNotation.format;
import static breakwater.units.Quantity.VOLTAGE;

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

    @Parameters(index = "0", paramLabel = "SCENARIO", description = "Rail scenario (TOML).")
    Path scenarioFile;

    @Mixin
    OutputOptions output;

    @Mixin
    SearchOptions search;

    @Mixin
    MonteCarloOptions monteCarlo;

    @Option(names = "--margin", paramLabel = "VOLTAGE", converter = VoltageConverter.class,
            description = "Keep the worst case at least this far inside the tolerance band on both sides "
                    + "(e.g. 1mV): a design margin for part spread and model error. Default: [solver] margin, "
                    + "else none.")
    Double marginV;

    /** Parses a voltage in engineering notation ("1 mV", "0.5m", "1e-3"). */
    static final class VoltageConverter implements CommandLine.ITypeConverter<Double> {
        @Override
        public Double convert(String value) {
            double v;
            try {
                v = EngineeringNotation.parse(value, Quantity.VOLTAGE);
            } catch (NotationException e) {
                throw new CommandLine.TypeConversionException(e.getMessage());
            }
            if (!(v >= 0)) {
                throw new CommandLine.TypeConversionException("a margin must be at least 0 V, got '" + value + "'");
            }
            return v;
        }
    }

    /**
     * The margin the run asked for (from {@code source}): summary key, console line, report section, and
     * its condition for exit 0.
     */
    static RunExtras marginExtras(DesignMargin.Kept k) {
        double marginV = k.asked().marginV();
        String source = k.asked().source();
        double kept = k.keptV();
        boolean met = k.met();
        String line = String.format(Locale.ROOT, "Margin     %s required inside the tolerance band (%s), %s kept: %s",
                format(marginV, VOLTAGE), source, format(kept, VOLTAGE), met ? "met" : "NOT MET");
        ReportModel.Section section = ReportModel.Section.text("Required margin", String.format(Locale.ROOT,
                "The run asked for the worst-case droop and overshoot to stay at least %s inside the tolerance band "
                        + "(%s), as a design margin for part spread and model error. Margin kept: %s (%s).",
                format(marginV, VOLTAGE), source, format(kept, VOLTAGE), met ? "met" : "not met"));
        return RunExtras.of(List.of(section), summary -> {
            summary.put("required_margin_v", marginV);
            summary.put("required_margin_met", met);
        }, line).withFailure(met, k.failure().orElse(null)).withMarginAsked();
    }

    @Override
    public Integer call() throws Exception {
        Inputs in = Inputs.load(scenarioFile, output.footprint);
        BankEvaluator evaluator = new BankEvaluator(in.scenario(), in.footprint());
        // --margin overrides the scenario's [solver] margin
        double margin = marginV != null ? marginV : in.scenario().designMarginV();
        java.util.Optional<DesignMargin> asked = margin > 0
                ? java.util.Optional.of(new DesignMargin(margin, marginV != null ? "--margin" : "solver.margin", marginV == null))
                : java.util.Optional.empty();
        BankEvaluator searchJudge = asked.isPresent() ? asked.get().narrow(evaluator) : evaluator;
        List<Part> candidates = in.catalog().parts();
        int[] max = MaxCounts.of(candidates, in.scenario());
        SearchSettings settings = search.settings(in.scenario());
        BankSearch bankSearch = new BankSearch(searchJudge, candidates, max);

        PrintWriter err = spec.commandLine().getErr();
        if (!output.quiet) {
            err.printf(Locale.ROOT, "breakwater: searching %d parts for up to %s with %d solver%s, seed %d%s%n",
                    candidates.size(), Durations.describe(settings.timeLimit()), settings.solvers(),
                    settings.solvers() == 1 ? "" : "s", settings.seed(),
                    settings.moveLimit() > 0 ? ", move limit " + settings.moveLimit() : "");
            err.flush();
        }
        try (StopOnInterrupt guard = new StopOnInterrupt(bankSearch, err)) {
            // progress in the search's own terms: with --margin, "allowed" is the narrowed band
            SearchResult result = Searches.runWithProgress(bankSearch, settings, CapacitorBank.EMPTY, err, output.quiet,
                    searchJudge);
            Evaluation e = evaluator.evaluate(result.bank());
            RunExtras extras = monteCarlo.run(evaluator, e.bank(), in.scenario(), output.quiet, err);
            if (asked.isPresent()) {
                extras = extras.plus(marginExtras(asked.get().kept(e)));
            }
            return Results.emit("solve", in, output.footprint, evaluator, e, java.util.Optional.of(result), extras,
                    output, spec.commandLine().getOut(), err);
        }
    }
}
