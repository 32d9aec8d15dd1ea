package breakwater.cli;

import picocli.CommandLine.Option;

import java.nio.file.Path;
import java.util.Optional;

/** Options every command shares. */
final class OutputOptions {
    @Option(names = "--out", paramLabel = "DIR",
            description = "Write the result files (bom.csv, impedance.csv, summary.json, ...) into DIR.")
    Path out;

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
}
