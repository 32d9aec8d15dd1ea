package breakwater.scenario;

import breakwater.diagnostic.Diagnostic;
import breakwater.diagnostic.InputException;
import breakwater.diagnostic.TextFiles;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

/**
 * Where the keys of a scenario file sit, for messages about a scenario already read (a case code the
 * catalog does not have, say): {@code file:line:column} of a key path such as
 * {@code [footprint, two-via, 0420]}.
 */
public final class ScenarioPlaces {
    private final String source;
    private final TomlLocator locator;

    private ScenarioPlaces(String source, TomlLocator locator) {
        this.source = source;
        this.locator = locator;
    }

    /** The places of {@code file}, shown as {@code displayName}. */
    public static ScenarioPlaces of(Path file, String displayName) throws IOException, InputException {
        return new ScenarioPlaces(displayName, new TomlLocator(TextFiles.readUtf8(file, displayName)));
    }

    /** A message at the value of {@code path} (its key, or its table's header, when that is not found). */
    public Diagnostic at(List<String> path, String message) {
        TomlLocator.Pos p = locator.value(path);
        return Diagnostic.at(source, p.line(), p.column(), message);
    }
}
