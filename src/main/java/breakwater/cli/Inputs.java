package breakwater.cli;

import breakwater.catalog.Catalog;
import breakwater.catalog.CatalogReader;
import breakwater.diagnostic.InputException;
import breakwater.diagnostic.Suggestions;
import breakwater.scenario.Footprint;
import breakwater.scenario.Scenario;
import breakwater.scenario.ScenarioReader;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Optional;

/** A scenario with its catalog and the chosen footprint, read and checked before anything is written. */
record Inputs(Scenario scenario, Catalog catalog, Optional<Footprint> footprint) {

    static Inputs load(Path scenarioFile, String footprintName) throws InputException, IOException {
        Scenario scenario = ScenarioReader.read(scenarioFile, display(scenarioFile));
        Catalog catalog = CatalogReader.read(scenario.catalogFile(), display(scenario.catalogFile()));
        Optional<Footprint> footprint = Optional.empty();
        if (!footprintName.isEmpty()) {
            footprint = scenario.footprint(footprintName);
            if (footprint.isEmpty()) {
                String known = scenario.footprints().isEmpty() ? "the scenario defines none"
                        : "the scenario defines " + String.join(", ", scenario.footprints().keySet());
                String hint = Suggestions.closest(footprintName, scenario.footprints().keySet())
                        .map(s -> " Did you mean '" + s + "'?").orElse("");
                throw new UsageException("unknown footprint '" + footprintName + "': " + known + "." + hint);
            }
        }
        return new Inputs(scenario, catalog, footprint);
    }

    /** The path as a user would recognise it: relative to the working folder when it lies below it. */
    static String display(Path p) {
        Path abs = p.toAbsolutePath().normalize();
        Path cwd = Path.of("").toAbsolutePath();
        return abs.startsWith(cwd) ? cwd.relativize(abs).toString() : abs.toString();
    }
}
