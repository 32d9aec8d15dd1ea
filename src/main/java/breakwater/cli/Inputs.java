package breakwater.cli;

import breakwater.catalog.BankFileReader;
import breakwater.catalog.Catalog;
import breakwater.catalog.CatalogReader;
import breakwater.design.CapacitorBank;
import breakwater.diagnostic.Diagnostic;
import breakwater.diagnostic.InputException;
import breakwater.diagnostic.Suggestions;
import breakwater.scenario.Footprint;
import breakwater.scenario.Scenario;
import breakwater.scenario.ScenarioReader;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
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

    /** The bank in {@code file} (CSV: part,count), its parts from the catalog. */
    CapacitorBank bank(Path file) throws InputException, IOException {
        return new CapacitorBank(BankFileReader.read(file, display(file), catalog, scenario.regionNames()));
    }

    /**
     * The bank to start a cost-down from: {@code given} (--bank) when there is one, else the scenario's
     * [existing] file, which must then exist (else the scenario is what is wrong).
     */
    Path existingBankFile(Path given) throws InputException {
        if (given != null) {
            return given;
        }
        Path file = scenario.existingBank().orElseThrow(() -> new UsageException("trim needs a bank to start from: "
                + "give --bank FILE, or name one in the scenario's [existing] section (file = \"my-bank.csv\")"));
        if (!Files.isRegularFile(file)) {
            // named inside the scenario: the scenario is what is wrong (a missing --bank is an I/O error)
            throw new InputException(List.of(Diagnostic.of(scenario.source(), "existing.file: bank file not found "
                    + "(looked for " + file + ")").withHint("the path is relative to the scenario's folder; or give "
                    + "the bank with --bank FILE")));
        }
        return file;
    }

    /** The path as a user would recognise it: relative to the working folder when it lies below it. */
    static String display(Path p) {
        Path abs = p.toAbsolutePath().normalize();
        Path cwd = Path.of("").toAbsolutePath();
        return abs.startsWith(cwd) ? cwd.relativize(abs).toString() : abs.toString();
    }
}
