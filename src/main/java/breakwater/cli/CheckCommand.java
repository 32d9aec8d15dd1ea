package breakwater.cli;

import breakwater.catalog.BankEntry;
import breakwater.catalog.BankFileReader;
import breakwater.design.BankEvaluator;
import breakwater.design.CapacitorBank;
import breakwater.design.Evaluation;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;

/** {@code breakwater check SCENARIO --bank FILE}: judges a given bank. */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = {"Judges a bank you give.", "",
            "Impedance, flatness, anti-resonances, the exact worst-case transient, cost.",
            "Exit 0 when it meets the spec, 1 when it does not."})
final class CheckCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "SCENARIO", description = "Rail scenario (TOML).")
    Path scenarioFile;

    @Option(names = "--bank", required = true, paramLabel = "FILE", description = "Bank to judge (CSV: part,count).")
    Path bankFile;

    @Mixin
    OutputOptions output;

    @Mixin
    MonteCarloOptions monteCarlo;

    @Mixin
    ExportOptions export;

    @Override
    public Integer call() throws Exception {
        export.requireOut(output);
        Inputs in = Inputs.load(scenarioFile, output.footprint);
        List<BankEntry> entries = BankFileReader.read(bankFile, Inputs.display(bankFile), in.catalog());
        BankEvaluator evaluator = new BankEvaluator(in.scenario(), in.footprint());
        Evaluation e = evaluator.evaluate(new CapacitorBank(entries));
        RunExtras mc = monteCarlo.run(evaluator, e.bank(), in.scenario(), output.quiet || output.json,
                spec.commandLine().getErr());
        return Results.emit("check", in, output.footprint, evaluator, e, java.util.Optional.empty(), mc, output, export,
                spec.commandLine().getOut(), spec.commandLine().getErr());
    }
}
