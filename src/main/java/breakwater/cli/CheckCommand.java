package breakwater.cli;

import breakwater.design.BankEvaluator;
import breakwater.design.CheckResult;
import breakwater.report.CheckReport;
import breakwater.report.ResultWriter;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

import java.nio.file.Path;
import java.util.concurrent.Callable;

/** {@code breakwater check SCENARIO --bank FILE}: judges a given bank. */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = {"Judges a bank you give.", "",
            "Impedance, flatness, anti-resonances, the exact worst-case transient, cost.",
            "Exit 0 when it meets the spec, 1 when it does not."})
final class CheckCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Mixin
    ScenarioArgument scenario;

    @Option(names = "--bank", required = true, paramLabel = "FILE", description = "Bank to judge (CSV: part,count).")
    Path bankFile;

    @Mixin
    OutputOptions output;

    @Mixin
    ExportOptions export;

    @Mixin
    MonteCarloOptions monteCarlo;

    @Override
    public Integer call() throws Exception {
        ResultWriter.Target target = export.target(output);
        Inputs in = scenario.load(output.footprint);
        target = target.withWarnings(in.warnings());
        var bank = in.bank(bankFile, output.acceptLowRating);
        BankEvaluator judge = new BankEvaluator(in.scenario(), in.footprint());
        try (Searches progress = new Searches(spec.commandLine().getErr(), output.silent(), false)) {
            CheckResult r = CheckResult.check(judge, output.footprint, bank, monteCarlo.settings(in),
                    progress);
            CheckReport.write(r, target, spec.commandLine().getOut());
            return ExitCodes.of(r.verdict());
        }
    }
}
