package breakwater.cli;

import breakwater.optimize.CompareResult;
import breakwater.report.CompareReport;
import breakwater.report.ResultWriter;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;

/** {@code breakwater compare SCENARIO}: the best bank under each footprint, side by side. */
@Command(name = "compare", mixinStandardHelpOptions = true,
        description = {
            "Compares footprints (layout options) side by side.",
            "",
            "For each footprint (default: every [footprint.NAME] of the scenario, in",
            "file order) solves for the cheapest bank under that footprint's mounting inductances, or with",
            "--bank judges the given bank under each, and shows cost, parts, worst droop and overshoot,",
            "margin, flatness and peak |Z| side by side; the report overlays their impedance and worst case.",
            "The name 'catalog' stands for the catalog's own mount_inductance column.",
            "The time limit is shared: each footprint's search gets an equal part of it.",
            "The result files (bom.csv, ...) describe the cheapest bank that meets the spec (else the first).",
            "Exit 0 when every footprint's bank meets the spec; 1 otherwise."})
final class CompareCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Mixin
    ScenarioArgument scenario;

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

    @Override
    public Integer call() throws Exception {
        if (!output.footprint.isEmpty()) {
            throw new UsageException("compare takes --footprints A,B,... (plural), not --footprint");
        }
        ResultWriter.Target target = output.target(); // an --out that cannot be made is said before any work
        Inputs in = scenario.load("");
        target = target.withWarnings(in.warnings());
        List<String> names = FootprintNames.chosen(footprintNames, in.scenario());
        var given = bankFile == null ? Optional.<breakwater.design.CapacitorBank>empty() : Optional.of(in.bank(bankFile, output.acceptLowRating));
        var settings = search.settings(in.scenario());
        try (Searches progress = new Searches(spec.commandLine().getErr(), output.silent(), true)) {
            CompareResult r = CompareResult.compare(in.scenario(), names, given,
                    Optional.ofNullable(bankFile).map(Inputs::display), in.searchParts(output.acceptLowRating), settings, progress);
            CompareReport.write(r, target, spec.commandLine().getOut());
            return ExitCodes.of(r.verdict());
        }
    }
}
