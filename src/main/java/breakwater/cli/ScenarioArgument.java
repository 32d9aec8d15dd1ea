package breakwater.cli;

import breakwater.diagnostic.InputException;
import picocli.CommandLine.Parameters;

import java.io.IOException;
import java.nio.file.Path;

/** The scenario every command takes as its first argument. */
final class ScenarioArgument {
    @Parameters(index = "0", paramLabel = "SCENARIO", description = "Rail scenario (TOML).")
    Path file;

    /** The scenario with its catalog and the footprint named ("" for none), checked before any work. */
    Inputs load(String footprintName) throws InputException, IOException {
        return Inputs.load(file, footprintName);
    }
}
