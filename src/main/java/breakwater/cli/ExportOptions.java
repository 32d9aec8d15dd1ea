package breakwater.cli;

import breakwater.design.BankEvaluator;
import breakwater.design.Evaluation;
import breakwater.report.OutputDirectory;
import breakwater.report.export.ExportFormat;
import breakwater.report.export.ExportedRail;
import breakwater.report.export.RailExports;
import breakwater.timedomain.Waveform;
import picocli.CommandLine;
import picocli.CommandLine.Option;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.stream.Collectors;

/** {@code --export spice,touchstone}: the judged rail in open file formats, for other tools. */
final class ExportOptions {
    @Option(names = "--export", paramLabel = "FORMAT", split = ",", converter = FormatConverter.class,
            description = "Also write the judged rail for other tools (needs --out): spice = rail-droop.cir and "
                    + "rail-overshoot.cir, SPICE3 decks that replay the worst droop and overshoot; touchstone = "
                    + "impedance.s1p, the impedance at the load. Give both as spice,touchstone or repeat the option.")
    List<ExportFormat> formats = new ArrayList<>();

    /** No export asked for: what commands without the option pass on. */
    static ExportOptions none() {
        return new ExportOptions();
    }

    /** Refuses --export without --out, before any work: exit 2. */
    void requireOut(OutputOptions output) {
        if (!formats.isEmpty() && output.outDir().isEmpty()) {
            throw new UsageException("--export writes files beside the other results, so it needs --out DIR; "
                    + "add --out DIR (e.g. --out out/rail) or leave out --export");
        }
    }

    /** Writes the asked-for files into {@code dir}; returns their names (empty when none was asked for). */
    List<String> write(OutputDirectory dir, Inputs in, String footprintName, BankEvaluator evaluator, Evaluation e,
                       Waveform droop, Waveform overshoot) throws IOException {
        if (formats.isEmpty()) {
            return List.of();
        }
        return RailExports.write(dir, formats, new ExportedRail(in.scenario(), footprintName, evaluator.footprint(), e,
                droop, overshoot, ExportedRail.programVersion()));
    }

    /** "spice" or "touchstone", any case; says what is accepted otherwise. */
    static final class FormatConverter implements CommandLine.ITypeConverter<ExportFormat> {
        @Override
        public ExportFormat convert(String value) {
            return ExportFormat.byWord(value).orElseThrow(() -> new CommandLine.TypeConversionException("'" + value
                    + "' is not an export format; use " + Arrays.stream(ExportFormat.values()).map(ExportFormat::word)
                    .collect(Collectors.joining(", ")) + ", or both separated by a comma"));
        }
    }
}
