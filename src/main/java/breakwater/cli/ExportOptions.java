package breakwater.cli;

import breakwater.report.export.ExportFormat;
import breakwater.report.ResultWriter;
import picocli.CommandLine;
import picocli.CommandLine.Option;

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

    /**
     * Where the results go, with the exports asked for; refuses --export without --out, before any work
     * (exit 2).
     */
    ResultWriter.Target target(OutputOptions output) {
        if (!formats.isEmpty() && output.outDir().isEmpty()) {
            throw new UsageException("--export writes files beside the other results, so it needs --out DIR; "
                    + "add --out DIR (e.g. --out out/rail) or leave out --export");
        }
        return output.target().withExports(formats);
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
