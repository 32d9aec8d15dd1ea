package breakwater.cli;

import breakwater.design.BankEvaluator;
import breakwater.design.Evaluation;
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
        return emit(mode, in, footprintName, evaluator, e, search, extras, output, ExportOptions.none(), out, err);
    }

    /** As above, also writing the files of {@code export} into --out. */
    static int emit(String mode, Inputs in, String footprintName, BankEvaluator evaluator, Evaluation e,
                    Optional<SearchResult> search, RunExtras extras, OutputOptions output, ExportOptions export,
                    PrintWriter out, PrintWriter err) throws IOException {
        ObjectNode summary = SummaryJson.of(mode, in.scenario(), footprintName, e);
        boolean bankMeets = Verdicts.meetsSpec(in.scenario(), e);
        // one verdict everywhere (console, JSON, report, exit code): the bank's and the mode's together
        boolean meets = bankMeets && extras.modeMet();
        summary.put("meets_spec", meets);
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
            if (!extras.modeVerdict().isEmpty()) {
                out.println(extras.modeVerdict());
            }
            String bankVerdict = Verdicts.describe(in.scenario(), e);
            if (bankMeets && !extras.modeMet()) {
                // the bank shown meets the spec, but the run as a whole does not (see the line above)
                bankVerdict = bankVerdict.replaceFirst("^MEETS SPEC", "The bank shown meets the spec; the run as a whole does not.");
            }
            out.println(bankVerdict);
            marginNote(e, summary).ifPresent(out::println);
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
            written.addAll(export.write(dir, in, footprintName, evaluator, e, droop, overshoot));
            ReportModel built = extras.model().apply(ReportBuilder.build(new ReportBuilder.Run(mode, in.scenario(),
                    footprintName, e, droop, overshoot, search, extras.sections())));
            ReportModel model = meets || !built.verdict().meetsSpec() ? built : withVerdict(built,
                    new ReportModel.Verdict(false, "Does not meet the spec as a whole",
                            List.of(extras.modeVerdict().isEmpty() ? "see the mode's table below" : extras.modeVerdict())));
            if (meets) {
                // a pass on a thin margin says so in the report too, beside the verdict
                ReportModel passed = model;
                model = marginNote(e, summary).map(note -> withVerdict(passed, new ReportModel.Verdict(true,
                        "Meets the spec in the model, but with little to spare", List.of(note), true))).orElse(model);
            }
            ReportModel finalModel = model;
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
        return meets ? ExitCodes.OK : ExitCodes.SPEC_NOT_MET;
    }

    private static ReportModel withVerdict(ReportModel m, ReportModel.Verdict v) {
        return new ReportModel(m.title(), m.subtitleLines(), v, m.keyFigures(), m.impedance(), m.worstCase(), m.bom(),
                m.resonances(), m.sections(), m.settings(), m.cautions());
    }

    /**
     * Whether a passing bank needs a caution: judged by the Monte Carlo yield when there is one (below
     * {@value #YIELD_CAUTION}), else by a margin under 5 % of the allowance. A failing bank has its verdict.
     */
    static boolean needsCaution(boolean passes, double marginV, double allowanceV, java.util.OptionalDouble yield) {
        if (!passes) {
            return false;
        }
        return yield.isPresent() ? yield.getAsDouble() < YIELD_CAUTION : marginV < 0.05 * allowanceV;
    }

    /** Below this Monte Carlo yield a passing bank gets a caution whatever its nominal margin. */
    static final double YIELD_CAUTION = 0.95;

    /**
     * A caution for a bank that passes in the model but may not in production: after a Monte Carlo run,
     * when fewer than {@value #YIELD_CAUTION} of the samples meet the spec; without one, when the margin is
     * under 5 % of what the tolerance allows (part-to-part spread alone can take it over). Says how to
     * check or what to ask for; empty when there is nothing to say.
     */
    static Optional<String> marginNote(Evaluation e, ObjectNode summary) {
        var f = e.figures();
        double allowance = Math.min(f.operatingV() - f.lowerLimitV(), f.upperLimitV() - f.operatingV());
        com.fasterxml.jackson.databind.JsonNode yield = summary.path("monte_carlo").path("yield");
        java.util.OptionalDouble drawn = yield.isNumber() ? java.util.OptionalDouble.of(yield.asDouble())
                : java.util.OptionalDouble.empty();
        if (!needsCaution(f.passes(), f.marginV(), allowance, drawn)) {
            return Optional.empty();
        }
        String margin = breakwater.units.EngineeringNotation.format(f.marginV(), breakwater.units.Quantity.VOLTAGE);
        // a run that already asked for a margin is told to ask for more, not for one
        String ask = summary.path("required_margin_v").isNumber() ? "a larger design margin (--margin)"
                : "a design margin (solve --margin)";
        if (drawn.isPresent()) {
            return Optional.of(String.format(Locale.ROOT, "Caution: the margin is %s, and with parts drawn within "
                            + "their tolerances only %.1f %% of the samples meet the spec (see the Monte Carlo "
                            + "figures): ask for %s or a flatter bank, and verify on hardware.", margin,
                    100 * drawn.getAsDouble(), ask));
        }
        return Optional.of(String.format(Locale.ROOT, "Note: the margin (%s) is under 5 %% of the allowance; part "
                + "tolerances can use it up. Check the yield with --monte-carlo 1000, ask for %s, and verify on "
                + "hardware.", margin, ask));
    }
}
