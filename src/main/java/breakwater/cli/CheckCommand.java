package breakwater.cli;

import breakwater.catalog.BankEntry;
import breakwater.catalog.BankFileReader;
import breakwater.design.BankEvaluator;
import breakwater.design.CapacitorBank;
import breakwater.design.Evaluation;
import breakwater.report.ConsoleReport;
import breakwater.report.CsvOutputs;
import breakwater.report.OutputDirectory;
import breakwater.report.SummaryJson;
import com.fasterxml.jackson.databind.node.ObjectNode;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;

/** {@code breakwater check SCENARIO --bank FILE}: judges a given bank. */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = {"Judges a bank you give: impedance, flatness, anti-resonances, worst-case transient, cost.",
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

    @Override
    public Integer call() throws Exception {
        Inputs in = Inputs.load(scenarioFile, output.footprint);
        List<BankEntry> entries = BankFileReader.read(bankFile, Inputs.display(bankFile), in.catalog());
        BankEvaluator evaluator = new BankEvaluator(in.scenario(), in.footprint());
        Evaluation e = evaluator.evaluate(new CapacitorBank(entries));
        ObjectNode summary = SummaryJson.of("check", in.scenario(), output.footprint, e);
        boolean meets = Verdicts.meetsSpec(in.scenario(), e);
        summary.put("meets_spec", meets);

        PrintWriter out = spec.commandLine().getOut();
        if (output.json) {
            StringWriter sw = new StringWriter();
            SummaryJson.write(summary, sw);
            out.print(sw);
        } else if (!output.quiet) {
            out.print(ConsoleReport.render(in.scenario(), output.footprint, e));
            out.println();
            out.println(Verdicts.describe(in.scenario(), e));
        }
        if (output.outDir().isPresent()) {
            OutputDirectory dir = new OutputDirectory(output.outDir().get());
            dir.write("bom.csv", w -> CsvOutputs.writeBom(e, in.scenario().cost().currency(), w));
            dir.write("impedance.csv", w -> CsvOutputs.writeImpedance(e.curve(), evaluator.targetImpedanceOhms(), w));
            dir.write("summary.json", w -> SummaryJson.write(summary, w));
            if (!output.quiet && !output.json) {
                out.println("Wrote bom.csv, impedance.csv, summary.json to " + Inputs.display(dir.path()));
            }
        }
        out.flush();
        return meets ? ExitCodes.OK : ExitCodes.SPEC_NOT_MET;
    }
}
