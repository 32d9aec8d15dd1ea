package breakwater.cli;

import breakwater.design.BankEvaluator;
import breakwater.design.Evaluation;
import breakwater.design.Verdict;
import breakwater.optimize.SearchResult;
import breakwater.report.Charts;
import breakwater.report.ConsoleReport;
import breakwater.report.HtmlReport;
import breakwater.report.ReportBuilder;
import breakwater.report.ReportModel;
import breakwater.report.CsvOutputs;
import breakwater.report.OutputDirectory;
import breakwater.report.SummaryJson;
import breakwater.report.Verdicts;
import breakwater.timedomain.Waveform;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/** Writes what a run found: console text or JSON, and the files in --out. Returns the exit code. */
final class Results {
    private Results() {
    }

    static int emit(String mode, Inputs in, BankEvaluator evaluator, Evaluation e, Optional<SearchResult> search,
                    OutputOptions output, PrintWriter out, PrintWriter err) throws IOException {
        return emit(mode, in, evaluator, e, search, List.of(), output, out, err);
    }

    static int emit(String mode, Inputs in, BankEvaluator evaluator, Evaluation e, Optional<SearchResult> search,
                    List<ReportModel.Section> extraSections, OutputOptions output, PrintWriter out, PrintWriter err)
            throws IOException {
        return emit(mode, in, output.footprint, evaluator, e, search, RunExtras.of(extraSections, s -> { }, ""),
                output, out, err);
    }

    /** As above, with what the mode adds; {@code footprintName} names the footprint of {@code e}. */
    static int emit(String mode, Inputs in, String footprintName, BankEvaluator evaluator, Evaluation e,
                    Optional<SearchResult> search, RunExtras extras, OutputOptions output, PrintWriter out,
                    PrintWriter err) throws IOException {
        ObjectNode summary = SummaryJson.of(mode, in.scenario(), footprintName, e);
        // one verdict everywhere (console, JSON, report, exit code): the bank's and the mode's together
        Verdict verdict = Verdict.of(e, in.scenario().requireTarget(), extras.failures(), extras.yield(),
                extras.marginAsked());
        summary.put("meets_spec", verdict.meetsSpec());
        search.ifPresent(r -> {
            ObjectNode s = summary.putObject("solver");
            s.put("seed", r.seed());
            s.put("solvers", r.solvers());
            s.put("time_s", r.seconds());
            s.put("evaluations", r.evaluations());
            s.put("stopped_early", r.stoppedEarly());
        });
        extras.summary().accept(summary);
        if (output.json) {
            StringWriter sw = new StringWriter();
            SummaryJson.write(summary, sw);
            out.print(sw);
        } else if (!output.quiet) {
            out.print(ConsoleReport.render(in.scenario(), footprintName, e));
            search.ifPresent(r -> out.printf(Locale.ROOT, "%nSearch     %d banks evaluated in %.1f s by %d solver%s, seed %d%s%n",
                    r.evaluations(), r.seconds(), r.solvers(), r.solvers() == 1 ? "" : "s", r.seed(),
                    r.stoppedEarly() ? " (stopped by the user)" : ""));
            if (!extras.console().isEmpty()) {
                out.println();
                out.print(extras.console().endsWith("\n") ? extras.console() : extras.console() + "\n");
            }
            out.println();
            out.print(Verdicts.console(verdict));
        }
        if (output.outDir().isPresent()) {
            OutputDirectory dir = new OutputDirectory(output.outDir().get());
            List<String> written = new java.util.ArrayList<>();
            dir.write("bom.csv", w -> CsvOutputs.writeBom(e, in.scenario().cost().currency(), w));
            written.add("bom.csv");
            dir.write("impedance.csv", w -> CsvOutputs.writeImpedance(e.curve(), evaluator.targetImpedanceOhms(), w));
            written.add("impedance.csv");
            Waveform droop = evaluator.droopWaveform(e);
            Waveform overshoot = evaluator.overshootWaveform(e);
            dir.write("worst-case.csv", w -> CsvOutputs.writeWorstCase(droop, w));
            written.add("worst-case.csv");
            ReportModel finalModel = extras.model().apply(ReportBuilder.build(new ReportBuilder.Run(mode,
                    in.scenario(), footprintName, e, verdict, droop, overshoot, search, extras.sections())));
            dir.write("impedance.svg", w -> w.write(Charts.impedanceChart(finalModel.impedance())));
            written.add("impedance.svg");
            dir.write("worst-case.svg", w -> w.write(Charts.worstCaseChart(finalModel.worstCase())));
            written.add("worst-case.svg");
            dir.write("report.html", w -> HtmlReport.write(finalModel, w));
            written.add("report.html");
            dir.write("summary.json", w -> SummaryJson.write(summary, w));
            written.add("summary.json");
            if (!output.quiet && !output.json) {
                out.println("Wrote " + String.join(", ", written) + " to " + Inputs.display(dir.path()));
            }
        }
        out.flush();
        err.flush();
        return verdict.meetsSpec() ? ExitCodes.OK : ExitCodes.SPEC_NOT_MET;
    }
}
