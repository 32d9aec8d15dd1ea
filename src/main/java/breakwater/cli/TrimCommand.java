package breakwater.cli;

import breakwater.design.BankEvaluator;
import breakwater.optimize.CostDown;
import breakwater.optimize.TrimResult;
import breakwater.report.TrimReport;
import breakwater.report.ResultWriter;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

import java.nio.file.Path;
import java.util.concurrent.Callable;

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

    @Mixin
    ScenarioArgument scenario;

    @Option(names = "--bank", paramLabel = "FILE",
            description = "Existing bank to cost down (CSV: part,count). Default: the scenario's [existing] file.")
    Path bankFile;

    @Option(names = "--keep", paramLabel = "RULE", defaultValue = "margin", converter = KeepConverter.class,
            description = "What the cheaper bank must keep: margin (worst droop and overshoot no worse than the "
                    + "existing bank's) or spec (merely inside the tolerance). Default: ${DEFAULT-VALUE}.")
    CostDown.Keep keep;

    @Option(names = "--no-new-parts",
            description = "Only remove parts or lower the counts of part numbers already on the existing bank: "
                    + "no new part number (a qualified BOM takes none without requalification).")
    boolean noNewParts;

    @Mixin
    OutputOptions output;

    @Mixin
    ExportOptions export;

    @Mixin
    SearchOptions search;

    @Mixin
    MonteCarloOptions monteCarlo;

    /** {@code margin} or {@code spec}, in any case; the refusal names them as the help does. */
    static final class KeepConverter implements picocli.CommandLine.ITypeConverter<CostDown.Keep> {
        @Override
        public CostDown.Keep convert(String value) {
            for (CostDown.Keep k : CostDown.Keep.values()) {
                if (k.name().equalsIgnoreCase(value.strip())) {
                    return k;
                }
            }
            throw new picocli.CommandLine.TypeConversionException("'" + value
                    + "' is not a keep rule; use margin or spec");
        }
    }

    @Override
    public Integer call() throws Exception {
        ResultWriter.Target target = export.target(output);
        Inputs in = scenario.load(output.footprint);
        target = target.withWarnings(in.warnings());
        Path file = in.existingBankFile(bankFile);
        var existing = in.bank(file, output.acceptLowRating);
        BankEvaluator judge = new BankEvaluator(in.scenario(), in.footprint());
        var settings = search.settings(in.scenario());
        var draws = monteCarlo.settings(in);
        try (Searches progress = new Searches(spec.commandLine().getErr(), output.silent(), true)) {
            TrimResult r = TrimResult.trim(judge, output.footprint, Inputs.display(file), existing, keep, noNewParts,
                    in.searchParts(output.acceptLowRating), settings, draws, progress);
            TrimReport.write(r, target, spec.commandLine().getOut());
            return ExitCodes.of(r.verdict());
        }
    }
}
