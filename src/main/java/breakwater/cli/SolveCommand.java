package breakwater.cli;

import breakwater.catalog.Part;
import breakwater.design.BankEvaluator;
import breakwater.design.CapacitorBank;
import breakwater.design.Evaluation;
import breakwater.design.Limits;
import breakwater.network.NetworkBuilder;
import breakwater.diagnostic.Diagnostic;
import breakwater.diagnostic.InputException;
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

    @Mixin
    ExportOptions export;

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
     * The judge the search uses with a design margin: the tolerance band narrowed by the margin on both
     * sides. A margin that leaves no room on one side is refused, saying how much room there is: a usage
     * error for --margin, an input error for the scenario's solver.margin.
     *
     * @param source "--margin" or "solver.margin", where the margin was given
     */
    static BankEvaluator narrowed(BankEvaluator spec, double marginV, String source) throws InputException {
        Limits band = spec.limits();
        double op = spec.operatingPointV();
        double below = op - band.lowerV();
        double above = band.upperV() - op;
        // no bank droops less than ΔI·Z(0) (where its step response settles: final value theorem), so the
        // droop side has that much less room than the band; a margin of the whole room leaves nothing
        double settle = spec.scenario().rail().currentStepA()
                * NetworkBuilder.build(spec.scenario(), List.of(), spec.footprint()).dcResistanceOhms();
        double room = Math.min(below - settle, above);
        if (!(marginV < room * (1 - 1e-9))) {
            String message = String.format(Locale.ROOT, "%s %s leaves no room: from the %s operating point the "
                            + "tolerance band allows %s of droop and %s of overshoot, and no bank droops less than "
                            + "ΔI·Z(0) = %s; choose a margin below %s", source,
                    format(marginV, VOLTAGE), format(op, VOLTAGE, 5), format(below, VOLTAGE), format(above, VOLTAGE),
                    format(settle, VOLTAGE), format(room, VOLTAGE));
            if (source.startsWith("--")) {
                throw new UsageException(message);
            }
            throw new InputException(Diagnostic.of(spec.scenario().source(), message));
        }
        return spec.withLimits(new Limits(band.lowerV() + marginV, band.upperV() - marginV));
    }

    /**
     * The margin the run asked for (from {@code source}): summary key, console line, report section, and
     * its condition for exit 0.
     */
    static RunExtras marginExtras(Evaluation e, double marginV, String source) {
        double kept = e.figures().marginV();
        // the search judged the same worst case (to rounding): allow a nanovolt
        boolean met = kept >= marginV - 1e-9;
        String line = String.format(Locale.ROOT, "Margin     %s required inside the tolerance band (%s), %s kept: %s",
                format(marginV, VOLTAGE), source, format(kept, VOLTAGE), met ? "met" : "NOT MET");
        String why = String.format(Locale.ROOT, "the margin kept (%s) is less than the %s required by %s",
                format(kept, VOLTAGE), format(marginV, VOLTAGE), source);
        ReportModel.Section section = ReportModel.Section.text("Required margin", String.format(Locale.ROOT,
                "The run asked for the worst-case droop and overshoot to stay at least %s inside the tolerance band "
                        + "(%s), as a design margin for part spread and model error. Margin kept: %s (%s).",
                format(marginV, VOLTAGE), source, format(kept, VOLTAGE), met ? "met" : "not met"));
        return RunExtras.of(List.of(section), summary -> {
            summary.put("required_margin_v", marginV);
            summary.put("required_margin_met", met);
        }, line).withModeCondition(met, why);
    }

    @Override
    public Integer call() throws Exception {
        export.requireOut(output);
        Inputs in = Inputs.load(scenarioFile, output.footprint);
        BankEvaluator evaluator = new BankEvaluator(in.scenario(), in.footprint());
        // --margin overrides the scenario's [solver] margin
        double margin = marginV != null ? marginV : in.scenario().designMarginV();
        String marginSource = marginV != null ? "--margin" : "solver.margin";
        BankEvaluator searchJudge = margin > 0 ? narrowed(evaluator, margin, marginSource) : evaluator;
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
            if (margin > 0) {
                extras = extras.plus(marginExtras(e, margin, marginSource));
            }
            return Results.emit("solve", in, output.footprint, evaluator, e, java.util.Optional.of(result), extras,
                    output, export, spec.commandLine().getOut(), err);
        }
    }
}
