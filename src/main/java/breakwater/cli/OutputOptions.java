package breakwater.cli;

import breakwater.report.ResultWriter;
import picocli.CommandLine.Option;

import java.nio.file.Path;
import java.util.Optional;

/** Options every command shares. */
final class OutputOptions {
    @Option(names = "--out", paramLabel = "DIR", converter = FolderConverter.class,
            description = "Write the result files (bom.csv, impedance.csv, summary.json, ...) into DIR.")
    Path out;

    /** Refuses, before any work, an --out that names an existing file rather than a folder. */
    static final class FolderConverter implements picocli.CommandLine.ITypeConverter<Path> {
        @Override
        public Path convert(String value) {
            if (value.isBlank()) {
                throw new picocli.CommandLine.TypeConversionException("'" + value + "' names no folder; give the "
                        + "folder for the results, e.g. --out results (it is created if missing)");
            }
            Path p;
            try {
                p = Path.of(value);
            } catch (java.nio.file.InvalidPathException e) {
                throw new picocli.CommandLine.TypeConversionException("'" + value + "' is not a valid path");
            }
            if (java.nio.file.Files.exists(p) && !java.nio.file.Files.isDirectory(p)) {
                throw new picocli.CommandLine.TypeConversionException("'" + value + "' is a file, not a folder; "
                        + "give a folder for the results (it is created if missing)");
            }
            return p;
        }
    }

    @Option(names = Inputs.ACCEPT_LOW_RATING, description = "Let parts rated below the rail's highest voltage "
            + "(nominal plus tolerance) be judged (check, trim, compare --bank) and chosen (the searches); by default "
            + "a bank with one is refused and the searches leave them out.")
    boolean acceptLowRating;

    @Option(names = "--json", description = "Print summary.json to standard output instead of the text summary.")
    boolean json;

    @Option(names = "--quiet", description = "Print nothing but errors (and the JSON with --json).")
    boolean quiet;

    @Option(names = "--footprint", paramLabel = "NAME", defaultValue = "",
            description = "Use the mounting inductances of [footprint.NAME] from the scenario.")
    String footprint;

    Optional<Path> outDir() {
        return Optional.ofNullable(out);
    }

    /** Where the results go; {@code quiet} also when the JSON takes standard output. */
    ResultWriter.Target target() {
        if (out != null) {
            try {
                breakwater.report.OutputDirectory.checkCreatable(out, Inputs.display(out));
            } catch (java.io.IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        }
        return new ResultWriter.Target(json, quiet, outDir(), out == null ? "" : Inputs.display(out), java.util.List.of())
                .withLowRatingAccepted(acceptLowRating);
    }

    /** No progress on the error stream: --quiet, or --json (the JSON alone on standard output). */
    boolean silent() {
        return quiet || json;
    }
}
