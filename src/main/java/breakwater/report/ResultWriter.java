package breakwater.report;

import breakwater.design.BankEvaluator;
import breakwater.design.Evaluation;
import breakwater.design.Verdict;
import breakwater.optimize.SearchResult;
import breakwater.report.chart.ImpedanceChart;
import breakwater.report.chart.WorstCaseChart;
import breakwater.report.export.ExportFormat;
import breakwater.report.export.ExportedRail;
import breakwater.timedomain.Waveform;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;

/**
 * Writes what a run found: the console text or summary.json on standard output, and the result files of
 * {@code --out}, moved in as one set ({@link OutputDirectory}). The mode reporters call it with the
 * bank the run shows and what their mode adds.
 */
public final class ResultWriter {
    private ResultWriter() {
    }

    /**
     * Where the results go.
     *
     * @param json       print summary.json instead of the console text
     * @param quiet      print nothing (but the JSON with {@code json})
     * @param outDir     the folder for the result files, if any
     * @param outDirName how the user knows that folder (in the "Wrote ..." line)
     * @param exports    the files for other tools to write beside the results (SPICE decks, Touchstone)
     * @param warnings   what the inputs allow but a careful reader should know, each a located message;
     *                   shown in the console, summary.json {@code warnings[]} and the report's cautions
     * @param lowRatingAccepted parts rated below the rail's highest voltage were let in
     *                   ({@code --accept-low-rating}): said before the verdict, first among the report's
     *                   cautions and in {@code warnings[]}; otherwise the report's cautions say what the
     *                   rating check held each part to
     */
    public record Target(boolean json, boolean quiet, Optional<Path> outDir, String outDirName,
                         List<ExportFormat> exports, List<String> warnings, boolean lowRatingAccepted) {
        public Target {
            Objects.requireNonNull(outDir, "outDir");
            Objects.requireNonNull(outDirName, "outDirName");
            exports = List.copyOf(exports);
            warnings = List.copyOf(warnings);
            if (!exports.isEmpty() && outDir.isEmpty()) {
                throw new IllegalArgumentException("exports are written into the output folder; none was given");
            }
        }

        /** The same target, also writing {@code formats}. */
        public Target withExports(List<ExportFormat> formats) {
            return new Target(json, quiet, outDir, outDirName, formats, warnings, lowRatingAccepted);
        }

        public Target(boolean json, boolean quiet, Optional<Path> outDir, String outDirName, List<ExportFormat> exports) {
            this(json, quiet, outDir, outDirName, exports, List.of(), false);
        }

        /** The same target, with {@code more} warnings after its own. */
        public Target withWarnings(List<String> more) {
            List<String> all = new ArrayList<>(warnings);
            all.addAll(more);
            return new Target(json, quiet, outDir, outDirName, exports, all, lowRatingAccepted);
        }

        /** The same target, saying that parts rated below the rail were let in ({@code accepted}) or not. */
        public Target withLowRatingAccepted(boolean accepted) {
            return new Target(json, quiet, outDir, outDirName, exports, warnings, accepted);
        }
    }

    /**
     * The bank a run shows and the run's verdict.
     *
     * @param mode          the command ("check", "solve", ...), written into summary.json and the report
     * @param footprintName the footprint of {@code evaluation} ("" for the catalog's mounting inductance)
     * @param judge         the rail's own judge of {@code evaluation}
     */
    record Shown(String mode, String footprintName, BankEvaluator judge, Evaluation evaluation,
                 Optional<SearchResult> search, Verdict verdict) {
    }

    static void write(Shown run, ModeOutput mode, Target target, PrintWriter out) throws IOException {
        var scenario = run.judge().scenario();
        Evaluation e = run.evaluation();
        ObjectNode summary = SummaryJson.of(run.mode(), scenario, run.footprintName(), e);
        summary.put("meets_spec", run.verdict().meetsSpec());
        run.search().ifPresent(r -> SummaryJson.solver(summary, r));
        mode.summary().accept(summary);
        var warned = summary.putArray("warnings");
        String notEnforced = target.lowRatingAccepted() ? RatingsNote.notEnforced(scenario, e) : "";
        if (!notEnforced.isEmpty()) {
            warned.add(notEnforced);
        }
        target.warnings().forEach(warned::add);
        if (target.json()) {
            StringWriter sw = new StringWriter();
            SummaryJson.write(summary, sw);
            out.print(sw);
        } else if (!target.quiet()) {
            out.print(ConsoleReport.render(scenario, run.footprintName(), e));
            run.search().ifPresent(r -> out.printf(Locale.ROOT, "%nSearch     %d banks evaluated in %.1f s by %d "
                            + "solver%s, seed %d%s%n", r.evaluations(), r.seconds(), r.solvers(), Texts.plural(r.solvers()),
                    r.seed(), r.stoppedEarly() ? " (stopped by the user)" : ""));
            run.search().flatMap(SearchResult::screening).filter(sc -> !sc.dropped().isEmpty())
                    .ifPresent(sc -> out.printf(Locale.ROOT, "Screening  %s%n", sc.summary()));
            if (!mode.console().isEmpty()) {
                out.println();
                out.print(mode.console().endsWith("\n") ? mode.console() : mode.console() + "\n");
            }
            out.println();
            if (!target.warnings().isEmpty()) {
                out.println("Warnings");
                target.warnings().forEach(w -> out.println("  " + w));
                out.println();
            }
            if (!notEnforced.isEmpty()) {
                out.println(notEnforced + ".");
            }
            out.print(Verdicts.console(run.verdict()));
        }
        if (target.outDir().isPresent()) {
            try (OutputDirectory dir = new OutputDirectory(target.outDir().get(), target.outDirName())) {
            List<String> written = new ArrayList<>();
            String currency = scenario.cost().currency();
            dir.write("bom.csv", w -> CsvOutputs.writeBom(e, currency, w));
            written.add("bom.csv");
            dir.write("impedance.csv", w -> CsvOutputs.writeImpedance(e.curve(), run.judge().targetImpedanceOhms(), w));
            written.add("impedance.csv");
            Waveform droop = run.judge().droopWaveform(e);
            Waveform overshoot = run.judge().overshootWaveform(e);
            dir.write("worst-case.csv", w -> CsvOutputs.writeWorstCase(droop, w));
            written.add("worst-case.csv");
            written.addAll(RailExports.write(dir, target.exports(), new ExportedRail(scenario, run.footprintName(),
                    run.judge().footprint(), e, droop, overshoot, ExportedRail.programVersion())));
            ReportModel built = mode.model().apply(ReportBuilder.build(new ReportBuilder.Run(run.mode(), scenario,
                    run.footprintName(), e, run.verdict(), droop, overshoot, run.search(), mode.sections())));
            List<String> cautions = new ArrayList<>(built.cautions());
            if (!notEnforced.isEmpty()) {
                cautions.add(0, notEnforced + ".");
            } else {
                cautions.add(RatingsNote.checked(scenario, e));
            }
            target.warnings().forEach(w -> cautions.add("Warning: " + w));
            List<String> subtitle = new ArrayList<>(built.subtitleLines());
            if (!notEnforced.isEmpty()) {
                subtitle.add(notEnforced + "."); // at the top too, where the rail is named
            }
            ReportModel model = new ReportModel(built.title(),
                    subtitle, built.verdict(), built.keyFigures(), built.impedance(), built.worstCase(),
                    built.bom(), built.resonances(), built.sections(), built.settings(), cautions);
            dir.write("impedance.svg", w -> w.write(ImpedanceChart.svg(model.impedance())));
            written.add("impedance.svg");
            dir.write("worst-case.svg", w -> w.write(WorstCaseChart.svg(model.worstCase())));
            written.add("worst-case.svg");
            dir.write("report.html", w -> HtmlReport.write(model, w));
            written.add("report.html");
            dir.write("summary.json", w -> SummaryJson.write(summary, w));
            written.add("summary.json");
            dir.commit(); // the whole set at once, never mixed with another run's
            if (!target.quiet() && !target.json()) {
                out.println("Wrote " + String.join(", ", written) + " to " + target.outDirName());
            }
            }
        }
        out.flush();
    }
}
