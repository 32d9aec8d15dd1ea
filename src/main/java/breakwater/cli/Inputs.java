package breakwater.cli;

import breakwater.catalog.BankFileReader;
import breakwater.catalog.Catalog;
import breakwater.catalog.CatalogReader;
import breakwater.catalog.Part;
import breakwater.design.CapacitorBank;
import breakwater.design.VoltageRatings;
import breakwater.diagnostic.Diagnostic;
import breakwater.diagnostic.HiddenCharacters;
import breakwater.diagnostic.TextFiles;
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
record Inputs(Scenario scenario, Catalog catalog, Optional<Footprint> footprint, List<String> warnings) {

    Inputs {
        warnings = List.copyOf(warnings);
    }

    static Inputs load(Path scenarioFile, String footprintName) throws InputException, IOException {
        Inputs in = loadChecked(scenarioFile, footprintName);
        List<String> warnings = new java.util.ArrayList<>();
        warnings.addAll(spaceWarnings(scenarioFile, display(scenarioFile), HiddenCharacters.Syntax.TOML));
        warnings.addAll(spaceWarnings(in.scenario().catalogFile(), in.catalog().source(), HiddenCharacters.Syntax.CSV));
        breakwater.scenario.ScenarioPlaces places = breakwater.scenario.ScenarioPlaces.of(scenarioFile,
                display(scenarioFile));
        breakwater.scenario.ScenarioRanges.warnings(in.scenario(), places).forEach(d -> warnings.add(d.render()));
        in.catalog().warnings().forEach(d -> warnings.add(d.render()));
        warnings.addAll(caseWarnings(scenarioFile, in));
        return new Inputs(in.scenario(), in.catalog(), in.footprint(), warnings);
    }

    /**
     * The no-break spaces between a number and its unit that the readers accepted as plain spaces
     * ({@link HiddenCharacters}), as located warnings.
     */
    private static List<String> spaceWarnings(Path file, String shown, HiddenCharacters.Syntax syntax)
            throws InputException, IOException {
        return HiddenCharacters.scan(TextFiles.readUtf8(file, shown), shown, syntax).warnings().stream()
                .map(Diagnostic::render).toList();
    }

    /**
     * Case codes the scenario names that no catalog part has ({@code [footprint.NAME]},
     * {@code [board.max_per_case]}), located in the scenario; and, for the footprint chosen, the catalog's
     * cases it gives no mounting inductance for (those parts keep the catalog's {@code mount_inductance}).
     */
    static List<String> caseWarnings(Path scenarioFile, Inputs in) throws InputException, IOException {
        java.util.Set<String> cases = new java.util.TreeSet<>();
        in.catalog().parts().forEach(p -> cases.add(p.caseCode()));
        List<String> out = new java.util.ArrayList<>();
        breakwater.scenario.ScenarioPlaces places = null;
        for (String code : in.scenario().board().maxPerCase().keySet()) {
            if (!cases.contains(code)) {
                places = places != null ? places : breakwater.scenario.ScenarioPlaces.of(scenarioFile,
                        display(scenarioFile));
                out.add(places.at(List.of("board", "max_per_case", code), "board.max_per_case." + code
                        + ": no part of the catalog has case " + code + ", so this limit limits nothing "
                        + "(a typing slip?)").render());
            }
        }
        for (Footprint f : in.scenario().footprints().values()) {
            for (String code : f.mountInductanceByCaseH().keySet()) {
                if (!cases.contains(code)) {
                    places = places != null ? places : breakwater.scenario.ScenarioPlaces.of(scenarioFile,
                            display(scenarioFile));
                    out.add(places.at(List.of("footprint", f.name(), code), "footprint." + f.name() + "." + code
                            + ": no part of the catalog has case " + code + ", so this mounting inductance is "
                            + "never used (a typing slip?)").render());
                }
            }
        }
        if (in.footprint().isPresent()) {
            Footprint f = in.footprint().get();
            List<String> left = cases.stream().filter(c -> !f.mountInductanceByCaseH().containsKey(c))
                    .map(c -> c.isEmpty() ? "(no case)" : c).toList();
            if (!left.isEmpty()) {
                out.add("footprint " + f.name() + " gives no mounting inductance for case" + (left.size() == 1 ? " "
                        : "s ") + String.join(", ", left) + ": those parts keep the catalog's mount_inductance");
            }
        }
        return out;
    }

    private static Inputs loadChecked(Path scenarioFile, String footprintName) throws InputException, IOException {
        Scenario scenario = ScenarioReader.read(scenarioFile, display(scenarioFile));
        List<Diagnostic> implausible = breakwater.scenario.ScenarioRanges.refusals(scenario,
                breakwater.scenario.ScenarioPlaces.of(scenarioFile, display(scenarioFile)));
        if (!implausible.isEmpty()) {
            throw new InputException(implausible);
        }
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
        return new Inputs(scenario, catalog, footprint, List.of());
    }

    /** The bank in {@code file} (CSV: part,count), its parts from the catalog. */
    CapacitorBank bank(Path file) throws InputException, IOException {
        return new CapacitorBank(BankFileReader.read(file, display(file), catalog, scenario.regionNames()));
    }

    /**
     * The bank in {@code file}, refused when a part of it is rated below the rail's highest voltage
     * ({@link VoltageRatings}) unless {@code acceptLowRating}.
     */
    CapacitorBank bank(Path file, boolean acceptLowRating) throws InputException, IOException {
        CapacitorBank bank = bank(file);
        double highest = VoltageRatings.highestRailVoltage(scenario.rail());
        if (acceptLowRating) {
            return bank;
        }
        List<String> lines = Files.readAllLines(file, java.nio.charset.StandardCharsets.UTF_8);
        List<Diagnostic> problems = new java.util.ArrayList<>();
        for (var e : bank.entries()) {
            List<String> low = VoltageRatings.underrated(List.of(e.part()), highest);
            if (!low.isEmpty()) {
                problems.add(Diagnostic.at(display(file), lineOf(lines, e.part().name()), 1, low.get(0)
                        + " is rated below the rail's highest voltage " + volts(highest) + " (nominal plus "
                        + "tolerance)").withHint("use a part rated for the rail, or give " + ACCEPT_LOW_RATING
                        + " to judge the bank anyway"));
            }
        }
        if (!problems.isEmpty()) {
            throw new InputException(problems);
        }
        return bank;
    }

    /** The option that lets parts rated below the rail's highest voltage be judged and chosen. */
    static final String ACCEPT_LOW_RATING = "--accept-low-rating";

    /**
     * The catalog parts a search may choose: those rated for the rail's highest voltage (or unrated),
     * all of them with {@code acceptLowRating}; refused when none is left.
     */
    List<Part> searchParts(boolean acceptLowRating) throws InputException {
        if (acceptLowRating) {
            return catalog.parts();
        }
        double highest = VoltageRatings.highestRailVoltage(scenario.rail());
        List<Part> rated = VoltageRatings.ratedFor(catalog.parts(), highest);
        if (rated.isEmpty()) {
            int line = 1;
            try {
                line = lineOf(Files.readAllLines(scenario.catalogFile(), java.nio.charset.StandardCharsets.UTF_8),
                        catalog.parts().get(0).name());
            } catch (IOException unreadable) {
                // read a moment ago; the message still names the file
            }
            throw new InputException(List.of(Diagnostic.at(catalog.source(), line, 1, "no part is rated for the rail's "
                    + "highest voltage " + volts(highest) + " (nominal plus tolerance)").withHint("add parts rated "
                    + "for the rail, or give " + ACCEPT_LOW_RATING + " to search the catalog anyway")));
        }
        return rated;
    }

    /**
     * Refuses, as an input error at each part's catalog row, a capacitance tolerance that Monte Carlo
     * samples cannot be drawn within ({@link breakwater.design.MonteCarlo#drawable}).
     */
    void checkTolerances(breakwater.design.MonteCarlo.ToleranceRule rule) throws InputException {
        List<Diagnostic> problems = new java.util.ArrayList<>();
        List<String> lines = null;
        for (Part p : catalog.parts()) {
            double t = rule.capacitanceTolerance(p);
            if (!breakwater.design.MonteCarlo.drawable(t)) {
                if (lines == null) {
                    try {
                        lines = Files.readAllLines(scenario.catalogFile(), java.nio.charset.StandardCharsets.UTF_8);
                    } catch (IOException unreadable) {
                        lines = List.of(); // read a moment ago; the message still names the file
                    }
                }
                problems.add(Diagnostic.at(catalog.source(), lineOf(lines, p.name()), 1, "part " + p.name()
                        + ": capacitance tolerance " + (Double.isFinite(t) ? String.format(java.util.Locale.ROOT,
                        "%.4g %%", 100 * t) : "missing") + " cannot be drawn within for --monte-carlo, it must be "
                        + "at least 0 % and below 100 %").withHint("give the part a tolerance such as 10 % in the "
                        + "catalog's tolerance column"));
            }
        }
        if (!problems.isEmpty()) {
            throw new InputException(problems);
        }
    }

    /** The 1-based line of the first row whose first field is {@code name} (1 when none is found). */
    private static int lineOf(List<String> lines, String name) {
        for (int i = 0; i < lines.size(); i++) {
            String l = lines.get(i).strip();
            if (l.startsWith(name + ",") || l.startsWith("\"" + name + "\",")) {
                return i + 1;
            }
        }
        return 1;
    }

    private static String volts(double v) {
        return String.format(java.util.Locale.ROOT, "%.4g V", v);
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
        // named inside the scenario: the scenario is what is wrong (a missing --bank is an I/O error)
        if (Files.isDirectory(file)) {
            throw placed(new InputException(List.of(Diagnostic.of(scenario.source(), "existing.file: names a folder ("
                    + file + "), not a bank file").withHint("name the bank file itself (CSV: part,count), relative "
                    + "to the scenario's folder; or give the bank with --bank FILE"))));
        }
        if (!Files.isRegularFile(file)) {
            throw placed(new InputException(List.of(Diagnostic.of(scenario.source(), "existing.file: bank file not "
                    + "found (looked for " + file + ")").withHint("the path is relative to the scenario's folder; or "
                    + "give the bank with --bank FILE"))));
        }
        if (!Files.isReadable(file)) {
            throw placed(new InputException(List.of(Diagnostic.of(scenario.source(), "existing.file: the bank file "
                    + file + " cannot be read (no permission)").withHint("make it readable, or give the bank with "
                    + "--bank FILE"))));
        }
        return file;
    }

    private static final java.util.regex.Pattern KEY_FIRST =
            java.util.regex.Pattern.compile("^([a-z_]+)\\.([a-z_]+)[: ]");

    /**
     * {@code e} with each of its scenario diagnostics that has no line, and whose message starts with the
     * key it is about ({@code solver.margin ...}, {@code existing.file: ...}, {@code rail.edge_time: ...}),
     * placed at that key's line and column in the scenario (at its section's header when the key is
     * absent). Problems found after the scenario was read (by the judge, by a command) are so located
     * like the reader's own.
     */
    static InputException placed(InputException e) {
        boolean any = false;
        List<Diagnostic> out = new java.util.ArrayList<>();
        java.util.Map<String, Optional<breakwater.scenario.ScenarioPlaces>> places = new java.util.HashMap<>();
        for (Diagnostic d : e.diagnostics()) {
            java.util.regex.Matcher m = KEY_FIRST.matcher(d.message());
            if (d.line() == 0 && d.source().endsWith(".toml") && m.find()) {
                Optional<breakwater.scenario.ScenarioPlaces> p = places.computeIfAbsent(d.source(), s -> {
                    try {
                        return Optional.of(breakwater.scenario.ScenarioPlaces.of(Path.of(s), s));
                    } catch (IOException | InputException | RuntimeException unreadable) {
                        return Optional.empty(); // read a moment ago; left as it is
                    }
                });
                if (p.isPresent()) {
                    Diagnostic at = p.get().at(List.of(m.group(1), m.group(2)), d.message());
                    out.add(at.withHint(d.hint()));
                    any = true;
                    continue;
                }
            }
            out.add(d);
        }
        return any ? new InputException(out) : e;
    }

    /** The path as a user would recognise it: relative to the working folder when it lies below it. */
    static String display(Path p) {
        Path abs = p.toAbsolutePath().normalize();
        Path cwd = Path.of("").toAbsolutePath();
        return abs.startsWith(cwd) ? cwd.relativize(abs).toString() : abs.toString();
    }
}
