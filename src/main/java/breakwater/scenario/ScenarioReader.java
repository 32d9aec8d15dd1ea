package breakwater.scenario;

import breakwater.diagnostic.Diagnostic;
import breakwater.diagnostic.Diagnostics;
import breakwater.diagnostic.HiddenCharacters;
import breakwater.diagnostic.InputException;
import breakwater.diagnostic.Suggestions;
import breakwater.diagnostic.TextFiles;
import breakwater.units.CaseCode;
import breakwater.units.EngineeringNotation;
import breakwater.units.NotationException;
import breakwater.units.Quantity;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.toml.TomlMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads a rail scenario (TOML, docs/file-contracts.md#scenario-toml).
 *
 * <p>Sections and keys (required ones marked *):
 * <pre>
 * [rail]       name, voltage*, tolerance*, max_current*, step | current_step (default step = 50 %), edge_time
 * [band]       from*, to*
 * [regulator]  resistance, inductance (at least one)
 * [plane]      capacitance*, resistance              (optional section)
 * [package]    resistance, inductance                (optional section)
 * [die]        capacitance*, resistance              (optional section)
 * [catalog]    file* (relative to the scenario's folder; must exist)
 * [board]      max_parts, max_distinct, [board.max_per_case] CASE = count
 * [footprint.NAME]  CASE = mounting inductance
 * [cost]       placement, line_item, currency
 * [solver]     time_limit ("30 s", "2 min", "500 ms"; a number is seconds), seed, margin (a voltage: solve keeps the worst case that far inside the band)
 * [objective]  require_target
 * [existing]   file (relative to the scenario's folder; read by trim, which reports it if missing)
 * </pre>
 * Physical values are TOML numbers in plain SI units or strings in engineering notation
 * ({@code "0.3 mOhm"}, {@code "4u7"}); fractions are ratios ({@code 0.03}) or percentages
 * ({@code "3 %"}). Case codes are TOML keys and so stay strings ({@code 0402} keeps its zero).
 *
 * <p>Every problem of the file is thrown together in one {@link InputException}; a TOML syntax error is
 * a single diagnostic. Diagnostics read {@code file:line:column: what is wrong, the rule. Maybe …} with
 * 1-based line and column (in Unicode code points) of the offending value, or of the key when the key
 * itself is wrong, or of the section header when a required key is missing (line 1, column 1 when the
 * whole section is missing).
 */
public final class ScenarioReader {

    private static final Map<String, List<String>> SECTIONS = new LinkedHashMap<>();

    static {
        SECTIONS.put("rail", List.of("name", "voltage", "tolerance", "max_current", "step", "current_step",
                "edge_time", "set_point_accuracy", "ripple"));
        SECTIONS.put("band", List.of("from", "to"));
        SECTIONS.put("regulator", List.of("resistance", "inductance"));
        SECTIONS.put("plane", List.of("capacitance", "resistance"));
        SECTIONS.put("package", List.of("resistance", "inductance"));
        SECTIONS.put("die", List.of("capacitance", "resistance"));
        SECTIONS.put("catalog", List.of("file"));
        SECTIONS.put("board", List.of("max_parts", "max_distinct", "max_per_case"));
        SECTIONS.put("footprint", List.of());
        SECTIONS.put("region", List.of());
        SECTIONS.put("cost", List.of("placement", "line_item", "currency"));
        SECTIONS.put("solver", List.of("time_limit", "seed", "margin"));
        SECTIONS.put("objective", List.of("require_target"));
        SECTIONS.put("existing", List.of("file"));
    }

    /** Default share of the maximum current that steps when neither step nor current_step is given. */
    public static final double DEFAULT_STEP_FRACTION = 0.5;

    private ScenarioReader() {
    }

    /**
     * Reads the scenario in {@code file} (UTF-8); relative paths inside it are resolved against the
     * file's folder.
     *
     * @param displayName the file as the user named it, used in messages and as {@link Scenario#source()}
     * @throws InputException every problem found in the file
     * @throws IOException    if the file cannot be read
     */
    public static Scenario read(Path file, String displayName) throws InputException, IOException {
        String text = TextFiles.readUtf8(file, displayName, "a scenario file (TOML)");
        Path dir = file.getParent() == null ? Path.of("") : file.getParent();
        return parse(text, dir, displayName);
    }

    /**
     * Reads a scenario from its text.
     *
     * @param scenarioDir folder that relative paths ({@code catalog.file}, {@code existing.file}) start from
     */
    public static Scenario parse(String tomlText, Path scenarioDir, String displayName) throws InputException {
        String text = !tomlText.isEmpty() && tomlText.charAt(0) == '\uFEFF' ? tomlText.substring(1) : tomlText;
        TextFiles.checkLines(text, displayName);
        text = HiddenCharacters.scan(text, displayName, HiddenCharacters.Syntax.TOML).textOrThrow();
        TomlLocator locator = new TomlLocator(text);
        JsonNode root;
        try {
            root = new TomlMapper().readTree(text);
        } catch (JsonProcessingException e) {
            throw new InputException(syntaxError(e, locator, text, displayName));
        }
        if (root == null || !root.isObject()) {
            root = new TomlMapper().createObjectNode();
        }
        return new Reading(displayName, scenarioDir, locator, (ObjectNode) root).scenario();
    }

    private static Diagnostic syntaxError(JsonProcessingException e, TomlLocator locator, String text, String source) {
        String what = e.getOriginalMessage() == null ? "syntax error" : e.getOriginalMessage().strip();
        JsonLocation at = e.getLocation();
        int line = at == null ? 0 : Math.max(0, at.getLineNr());
        int column = at == null ? 0 : Math.max(0, at.getColumnNr());
        String lower = what.toLowerCase(java.util.Locale.ROOT);
        if (line == 0 && lower.contains("nesting depth")) {
            line = deepestLine(text);
            column = 0;
        }
        if (lower.contains("duplicate") || lower.contains("redefined") || lower.contains("existing non-object")) {
            Optional<TomlLocator.Duplicate> twice = locator.firstDuplicate();
            if (twice.isPresent()) {
                TomlLocator.Duplicate d = twice.get();
                String name = String.join(".", d.path());
                return Diagnostic.at(source, d.at().line(), d.at().column(), d.table()
                        ? "[" + name + "] is defined twice; first at line " + d.firstLine() + ". Merge the two tables"
                        : name + " is given twice; first at line " + d.firstLine() + ". Keep one of the two lines");
            }
            return Diagnostic.at(source, line, column, "a key or table is defined twice (TOML allows each once)");
        }
        return Diagnostic.at(source, line, column, "not valid TOML: " + ownWords(what)
                + ", a scenario is TOML: [section] headers, key = value lines, strings in double quotes");
    }

    /** The 1-based line where brackets and braces outside strings and comments nest deepest (1 if none). */
    static int deepestLine(String text) {
        int depth = 0;
        int deepest = 0;
        int deepestLine = 1;
        int line = 1;
        char quote = 0;
        boolean comment = false;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '\n') {
                line++;
                comment = false;
                continue;
            }
            if (comment) {
                continue;
            }
            if (quote != 0) {
                if (c == '\\' && quote == '"') {
                    i++;
                } else if (c == quote) {
                    quote = 0;
                }
            } else if (c == '#') {
                comment = true;
            } else if (c == '"' || c == '\'') {
                quote = c;
            } else if (c == '[' || c == '{') {
                if (++depth > deepest) {
                    deepest = depth;
                    deepestLine = line;
                }
            } else if (c == ']' || c == '}') {
                depth = Math.max(0, depth - 1);
            }
        }
        return deepestLine;
    }

    /**
     * The parser's message in our words: its limits (nesting depth, lengths of names, strings and
     * numbers) said plainly, without the parser's setting names; anything else lower-cased as it is.
     */
    static String ownWords(String parserMessage) {
        String m = parserMessage.toLowerCase(java.util.Locale.ROOT);
        if (m.contains("nesting depth")) {
            return "arrays or inline tables nested too deeply (a scenario needs at most two levels inside a key)";
        }
        if (m.contains("exceeds the maximum") || m.contains("exceeds the maximum allowed")) {
            String what = m.contains("name") ? "a key" : m.contains("number") ? "a number" : "a value";
            return what + " too long to read (a scenario's keys and values are a few words)";
        }
        if (m.contains("premature end of file") || m.contains("unexpected end")) {
            return "the file ends inside a value: a closing quote (three quotes for a multi-line string), bracket or "
                    + "brace is missing";
        }
        String cut = parserMessage.replaceAll("\\s*\\(from `[^`]*`\\)", "").replaceAll("`[^`]*`", "").strip();
        return cut.isEmpty() ? "syntax error" : Character.toLowerCase(cut.charAt(0)) + cut.substring(1);
    }

    /** One pass over the parsed tree, collecting every problem. */
    private static final class Reading {
        private final String source;
        private final Path dir;
        private final TomlLocator at;
        private final ObjectNode root;
        private final Diagnostics problems = new Diagnostics();

        Reading(String source, Path dir, TomlLocator at, ObjectNode root) {
            this.source = source;
            this.dir = dir;
            this.at = at;
            this.root = root;
        }

        Scenario scenario() throws InputException {
            checkSections();
            Rail rail = rail();
            Band band = band();
            Regulator regulator = regulator();
            Plane plane = plane();
            PackagePath packagePath = packagePath();
            Die die = die();
            Path catalog = catalog();
            Board board = board();
            Map<String, Footprint> footprints = footprints();
            CostModel cost = cost();
            SolverSettings solver = solver();
            boolean requireTarget = objective();
            double margin = nonNegative("solver", "margin", Quantity.VOLTAGE);
            String existing = existing();
            List<Region> regions = regions();
            problems.throwIfAnyInFileOrder();
            return new Scenario(source, rail, band, regulator, plane, packagePath, die, catalog, board,
                    footprints, cost, solver, requireTarget, existing, margin, regions);
        }

        // ---- structure ----

        private void checkSections() {
            for (Map.Entry<String, JsonNode> e : root.properties()) {
                String name = e.getKey();
                List<String> path = List.of(name);
                if (!SECTIONS.containsKey(name)) {
                    String owner = ownerOf(name);
                    Diagnostic d = Diagnostic.at(source, at.key(path).line(), at.key(path).column(),
                            (e.getValue().isObject() ? "unknown section [" + name + "]" : "key '" + name
                                    + "' outside any section") + ", the sections are "
                                    + String.join(", ", SECTIONS.keySet().stream().map(s -> "[" + s + "]").toList()));
                    if (!e.getValue().isObject() && owner != null) {
                        problems.add(d.withHint("'" + name + "' belongs in [" + owner + "]?"));
                    } else {
                        problems.add(Suggestions.closest(name, SECTIONS.keySet())
                                .map(s -> d.withHint("you meant [" + s + "]?")).orElse(d));
                    }
                } else if (!e.getValue().isObject()) {
                    error(at.key(path), "'" + name + "' must be a section [" + name + "], not a single value");
                } else if (!name.equals("footprint") && !name.equals("region")) {
                    checkKeys(name, (ObjectNode) e.getValue());
                }
            }
        }

        private void checkKeys(String section, ObjectNode table) {
            List<String> allowed = SECTIONS.get(section);
            for (Iterator<String> it = table.fieldNames(); it.hasNext(); ) {
                String key = it.next();
                if (allowed.contains(key)) {
                    continue;
                }
                TomlLocator.Pos p = at.key(List.of(section, key));
                Diagnostic d = Diagnostic.at(source, p.line(), p.column(), "unknown key '" + key + "' in ["
                        + section + "], its keys are " + String.join(", ", allowed));
                Optional<String> near = Suggestions.closest(key, allowed);
                String owner = ownerOf(key);
                if (near.isPresent()) {
                    d = d.withHint("you meant '" + near.get() + "'?");
                } else if (owner != null) {
                    d = d.withHint("'" + key + "' belongs in [" + owner + "]?");
                }
                problems.add(d);
            }
        }

        /** The section that has {@code key}, or null. */
        private static String ownerOf(String key) {
            for (var e : SECTIONS.entrySet()) {
                if (e.getValue().contains(key)) {
                    return e.getKey();
                }
            }
            return null;
        }

        private Optional<ObjectNode> section(String name) {
            JsonNode n = root.get(name);
            return n != null && n.isObject() ? Optional.of((ObjectNode) n) : Optional.empty();
        }

        private boolean has(String section, String key) {
            return section(section).map(s -> s.has(key)).orElse(false);
        }

        private void missing(String section, String key, String rule) {
            TomlLocator.Pos p = section(section).isPresent() ? at.table(List.of(section)) : TomlLocator.Pos.START;
            error(p, "missing required key " + section + "." + key + (section(section).isPresent() ? ""
                    : " (there is no [" + section + "] section)") + ", " + rule);
        }

        // ---- sections ----

        /** Reports a missing required section once; true if it is there. */
        private boolean requiredSection(String name, String keys) {
            if (section(name).isPresent()) {
                return true;
            }
            if (!root.has(name)) {
                error(TomlLocator.Pos.START, "missing section [" + name + "], every scenario needs it with " + keys);
            }
            return false;
        }

        private Rail rail() {
            if (!requiredSection("rail", "voltage, tolerance and max_current")) {
                return null;
            }
            String name = string("rail", "name", "");
            double voltage = required("rail", "voltage", Quantity.VOLTAGE, "the rail's nominal voltage");
            if (voltage <= 0) {
                valueError(List.of("rail", "voltage"), "rail.voltage must be > 0");
            }
            double tolerance = required("rail", "tolerance", Quantity.FRACTION,
                    "the allowed deviation either side of nominal, e.g. \"3 %\"");
            if (!Double.isNaN(tolerance) && !(tolerance > 0 && tolerance < 1)) {
                Diagnostic d = located(List.of("rail", "tolerance"), "rail.tolerance " + shown("rail", "tolerance")
                        + " is outside (0, 100 %), it is the allowed deviation either side of nominal");
                problems.add(tolerance >= 1 && !isText("rail", "tolerance")
                        ? d.withHint("write \"" + fmt(tolerance) + " %\"; a plain number is a ratio") : d);
            }
            double maxCurrent = required("rail", "max_current", Quantity.CURRENT, "the largest load current");
            if (maxCurrent <= 0) {
                valueError(List.of("rail", "max_current"), "rail.max_current must be > 0");
            }
            double stepA = Double.NaN;
            boolean hasStep = has("rail", "step");
            boolean hasCurrentStep = has("rail", "current_step");
            if (hasStep && hasCurrentStep) {
                valueError(List.of("rail", "current_step"), "rail has both step and current_step, give exactly"
                        + " one of them (step as a share of max_current, current_step in A)");
            } else if (hasCurrentStep) {
                stepA = optional("rail", "current_step", Quantity.CURRENT, Double.NaN);
                if (stepA <= 0) {
                    valueError(List.of("rail", "current_step"), "rail.current_step must be > 0");
                } else if (stepA > maxCurrent * (1 + 1e-12)) {
                    valueError(List.of("rail", "current_step"), "rail.current_step " + shown("rail", "current_step")
                            + " exceeds max_current " + shown("rail", "max_current")
                            + ", the load cannot step by more than its largest current");
                }
            } else {
                double step = optional("rail", "step", Quantity.FRACTION, DEFAULT_STEP_FRACTION);
                if (!Double.isNaN(step) && !(step > 0 && step <= 1)) {
                    Diagnostic d = located(List.of("rail", "step"), "rail.step " + shown("rail", "step")
                            + " is outside (0, 100 %], it is the share of max_current that steps");
                    problems.add(step > 1 && !isText("rail", "step")
                            ? d.withHint("write \"" + fmt(step) + " %\"; a plain number is a ratio") : d);
                } else {
                    stepA = step * maxCurrent;
                }
            }
            double edge = optional("rail", "edge_time", Quantity.TIME, 0.0);
            if (edge < 0) {
                valueError(List.of("rail", "edge_time"), "rail.edge_time must be >= 0 (0 for ideal edges)");
            }
            double setPoint = optional("rail", "set_point_accuracy", Quantity.FRACTION, 0.0);
            if (!(setPoint >= 0 && setPoint < 1) && !Double.isNaN(setPoint)) {
                valueError(List.of("rail", "set_point_accuracy"), "rail.set_point_accuracy "
                        + shown("rail", "set_point_accuracy") + " is outside [0, 100 %), it is the regulator's"
                        + " set-point accuracy either side of nominal, e.g. \"1 %\"");
            }
            double rippleVpp = ripple(voltage);
            if (problems.isEmpty()) {
                double left = tolerance - setPoint - rippleVpp / (2 * voltage);
                if (!Rail.leavesRoom(voltage, tolerance, setPoint, rippleVpp)) {
                    List<String> at = has("rail", "ripple") ? List.of("rail", "ripple") : List.of("rail", "set_point_accuracy");
                    valueError(at, String.format(java.util.Locale.ROOT, "the tolerance budget leaves nothing for the"
                                    + " load transient: rail.tolerance %s less rail.set_point_accuracy %s less half of"
                                    + " rail.ripple %s (peak-to-peak) is %s of %s; lower the set-point accuracy or the"
                                    + " ripple, or widen the tolerance",
                            shown("rail", "tolerance"), has("rail", "set_point_accuracy") ? shown("rail", "set_point_accuracy") : "0",
                            has("rail", "ripple") ? shown("rail", "ripple") : "0",
                            EngineeringNotation.format(left * voltage, Quantity.VOLTAGE),
                            EngineeringNotation.format(voltage, Quantity.VOLTAGE)));
                    return null;
                }
                return new Rail(name, voltage, tolerance, maxCurrent, stepA, edge, setPoint, rippleVpp);
            }
            return null;
        }

        /**
         * rail.ripple, volts peak-to-peak: a voltage ("12 mV", or a plain number in volts) or a share of the
         * nominal voltage ("0.5 %"); 0 when absent.
         */
        private double ripple(double voltage) {
            if (!has("rail", "ripple")) {
                return 0.0;
            }
            boolean percent = isText("rail", "ripple") && section("rail").get().get("ripple").asText().strip().endsWith("%");
            double v = optional("rail", "ripple", percent ? Quantity.FRACTION : Quantity.VOLTAGE, 0.0);
            if (Double.isNaN(v)) {
                return 0.0;
            }
            if (!(v >= 0)) {
                valueError(List.of("rail", "ripple"), "rail.ripple " + shown("rail", "ripple") + " is negative, it is"
                        + " the regulator's output ripple peak-to-peak, e.g. \"12 mV\" or \"0.5 %\"");
                return 0.0;
            }
            return percent ? v * voltage : v;
        }

        private Band band() {
            if (!requiredSection("band", "from and to")) {
                return null;
            }
            double from = required("band", "from", Quantity.FREQUENCY, "the lowest frequency of the band");
            double to = required("band", "to", Quantity.FREQUENCY, "the highest frequency of the band");
            if (from <= 0) {
                valueError(List.of("band", "from"), "band.from must be > 0 Hz");
            } else if (from >= to) {
                valueError(List.of("band", "to"), "band.to " + shown("band", "to") + " is not above band.from "
                        + shown("band", "from") + ", the band needs from < to");
            }
            return problems.isEmpty() ? new Band(from, to) : null;
        }

        private Regulator regulator() {
            if (!requiredSection("regulator", "resistance and/or inductance")) {
                return null;
            }
            if (!has("regulator", "resistance") && !has("regulator", "inductance")) {
                missing("regulator", "resistance", "a regulator needs a resistance or an inductance (or both)");
                return null;
            }
            double r = nonNegative("regulator", "resistance", Quantity.RESISTANCE);
            double l = nonNegative("regulator", "inductance", Quantity.INDUCTANCE);
            if (r == 0 && l == 0) {
                valueError(List.of("regulator"), "regulator resistance and inductance are both 0, an ideal"
                        + " source needs no capacitors; give one of them > 0");
            }
            return problems.isEmpty() ? new Regulator(r, l) : null;
        }

        private Plane plane() {
            if (section("plane").isEmpty()) {
                return Plane.NONE;
            }
            if (!has("plane", "capacitance")) {
                missing("plane", "capacitance", "a [plane] section gives the plane capacitance");
            }
            double c = nonNegative("plane", "capacitance", Quantity.CAPACITANCE);
            double r = nonNegative("plane", "resistance", Quantity.RESISTANCE);
            return problems.isEmpty() ? new Plane(c, r) : Plane.NONE;
        }

        private PackagePath packagePath() {
            if (section("package").isEmpty()) {
                return PackagePath.NONE;
            }
            double r = nonNegative("package", "resistance", Quantity.RESISTANCE);
            double l = nonNegative("package", "inductance", Quantity.INDUCTANCE);
            return problems.isEmpty() ? PackagePath.of(r, l) : PackagePath.NONE;
        }

        private Die die() {
            if (section("die").isEmpty()) {
                return Die.NONE;
            }
            if (!has("die", "capacitance")) {
                missing("die", "capacitance", "a [die] section gives the on-die capacitance");
            }
            double c = nonNegative("die", "capacitance", Quantity.CAPACITANCE);
            double r = nonNegative("die", "resistance", Quantity.RESISTANCE);
            return problems.isEmpty() ? new Die(c, r) : Die.NONE;
        }

        private Path catalog() {
            if (!requiredSection("catalog", "file = \"path/to/parts.csv\"")) {
                return Path.of("");
            }
            if (!has("catalog", "file")) {
                missing("catalog", "file", "the parts catalog (CSV), relative to the scenario's folder");
                return Path.of("");
            }
            return existingFile("catalog", "file", "catalog file").orElse(Path.of(""));
        }

        private Board board() {
            int maxParts = integer(List.of("board", "max_parts"), 1, Board.MAX_PARTS, -1);
            int maxDistinct = integer(List.of("board", "max_distinct"), 1, Board.MAX_DISTINCT, -1);
            Map<String, Integer> perCase = new LinkedHashMap<>();
            Optional<ObjectNode> board = section("board");
            JsonNode table = board.map(b -> b.get("max_per_case")).orElse(null);
            if (table != null) {
                if (!table.isObject()) {
                    valueError(List.of("board", "max_per_case"), "board.max_per_case must be a table: write"
                            + " [board.max_per_case] with lines such as 0402 = 40");
                } else {
                    for (Iterator<String> it = table.fieldNames(); it.hasNext(); ) {
                        String code = it.next();
                        List<String> path = List.of("board", "max_per_case", code);
                        if (!CaseCode.isValid(code)) {
                            keyError(path, "'" + code + "' in [board.max_per_case] is not a case code, " + CaseCode.RULE);
                            continue;
                        }
                        int n = integer(path, 0, Board.MAX_PARTS, -1);
                        if (n >= 0) {
                            perCase.put(code, n);
                        }
                    }
                }
            }
            return problems.isEmpty() ? new Board(maxParts, maxDistinct, perCase) : Board.UNLIMITED;
        }

        /** The keys of a {@code [region.NAME]} table. */
        private static final List<String> REGION_KEYS = List.of("resistance", "inductance", "max_parts", "max_per_case");

        /** {@code [region.NAME]} tables in file order (docs/file-contracts.md#scenario-toml). */
        private List<Region> regions() {
            List<Region> result = new ArrayList<>();
            Optional<ObjectNode> section = section("region");
            if (section.isEmpty()) {
                return result;
            }
            for (Map.Entry<String, JsonNode> e : section.get().properties()) {
                String name = e.getKey();
                List<String> rPath = List.of("region", name);
                if (!e.getValue().isObject()) {
                    keyError(rPath, "region." + name + " must be a table: write [region.NAME] followed by"
                            + " resistance, inductance and, if the room is limited, max_parts and [region.NAME.max_per_case]");
                    continue;
                }
                ObjectNode table = (ObjectNode) e.getValue();
                for (Iterator<String> it = table.fieldNames(); it.hasNext(); ) {
                    String key = it.next();
                    if (!REGION_KEYS.contains(key)) {
                        TomlLocator.Pos p = at.key(List.of("region", name, key));
                        Diagnostic d = Diagnostic.at(source, p.line(), p.column(), "unknown key '" + key
                                + "' in [region." + name + "], its keys are " + String.join(", ", REGION_KEYS));
                        problems.add(Suggestions.closest(key, REGION_KEYS).map(s -> d.withHint("you meant '" + s + "'?"))
                                .orElse(d));
                    }
                }
                double r = regionValue(name, table, "resistance", Quantity.RESISTANCE);
                double l = regionValue(name, table, "inductance", Quantity.INDUCTANCE);
                int maxParts = integer(List.of("region", name, "max_parts"), 0, Board.MAX_PARTS, -1);
                Map<String, Integer> perCase = new LinkedHashMap<>();
                JsonNode cases = table.get("max_per_case");
                if (cases != null && !cases.isObject()) {
                    valueError(List.of("region", name, "max_per_case"), "region." + name + ".max_per_case must be a "
                            + "table: write [region." + name + ".max_per_case] with lines such as 0201 = 30");
                } else if (cases != null) {
                    for (Iterator<String> it = cases.fieldNames(); it.hasNext(); ) {
                        String code = it.next();
                        List<String> path = List.of("region", name, "max_per_case", code);
                        if (!CaseCode.isValid(code)) {
                            keyError(path, "'" + code + "' in [region." + name + ".max_per_case] is not a case code, "
                                    + CaseCode.RULE);
                            continue;
                        }
                        int n = integer(path, 0, Board.MAX_PARTS, -1);
                        if (n >= 0) {
                            perCase.put(code, n);
                        }
                    }
                }
                if (Double.isFinite(r) && Double.isFinite(l) && r >= 0 && l >= 0) {
                    result.add(new Region(name, r, l, new Board(maxParts, -1, perCase)));
                }
            }
            return result;
        }

        /** A region's spreading R or L: 0 when absent, reported when negative or unreadable (NaN). */
        private double regionValue(String name, ObjectNode table, String key, Quantity q) {
            JsonNode n = table.get(key);
            if (n == null) {
                return 0.0;
            }
            List<String> path = List.of("region", name, key);
            double v = quantity(path, n, q);
            if (v < 0) {
                valueError(path, "region." + name + "." + key + " is negative, a spreading " + q.description()
                        + " must be >= 0");
                return Double.NaN;
            }
            return v;
        }

        private Map<String, Footprint> footprints() {
            Map<String, Footprint> result = new LinkedHashMap<>();
            Optional<ObjectNode> section = section("footprint");
            if (section.isEmpty()) {
                return result;
            }
            for (Map.Entry<String, JsonNode> e : section.get().properties()) {
                String name = e.getKey();
                List<String> fpPath = List.of("footprint", name);
                if (!e.getValue().isObject()) {
                    keyError(fpPath, "footprint." + name + " must be a table: write [footprint.NAME] followed by"
                            + " lines such as 0402 = \"0.45 nH\"");
                    continue;
                }
                Map<String, Double> byCase = new LinkedHashMap<>();
                for (Iterator<String> cases = e.getValue().fieldNames(); cases.hasNext(); ) {
                    String code = cases.next();
                    List<String> path = List.of("footprint", name, code);
                    if (!CaseCode.isValid(code)) {
                        keyError(path, "'" + code + "' in [footprint." + name + "] is not a case code, "
                                + CaseCode.RULE);
                        continue;
                    }
                    double l = quantity(path, e.getValue().get(code), Quantity.INDUCTANCE);
                    if (l < 0) {
                        valueError(path, "footprint." + name + "." + code + " is negative, a mounting inductance"
                                + " must be >= 0");
                    } else if (!Double.isNaN(l)) {
                        byCase.put(code, l);
                    }
                }
                result.put(name, new Footprint(name, byCase));
            }
            return result;
        }

        private CostModel cost() {
            double placement = nonNegative("cost", "placement", Quantity.PLAIN);
            double lineItem = nonNegative("cost", "line_item", Quantity.PLAIN);
            String currency = string("cost", "currency", "");
            return problems.isEmpty() ? new CostModel(placement, lineItem, currency) : CostModel.DEFAULT;
        }

        private SolverSettings solver() {
            Duration limit = SolverSettings.DEFAULT.timeLimit();
            long seed = SolverSettings.DEFAULT.seed();
            JsonNode t = section("solver").map(s -> s.get("time_limit")).orElse(null);
            if (t != null) {
                limit = duration(List.of("solver", "time_limit"), t).orElse(limit);
            }
            JsonNode s = section("solver").map(x -> x.get("seed")).orElse(null);
            if (s != null) {
                if (s.isIntegralNumber() && s.canConvertToLong()) {
                    seed = s.asLong();
                } else {
                    valueError(List.of("solver", "seed"), "solver.seed must be a whole number such as 1");
                }
            }
            return new SolverSettings(limit, seed);
        }

        private boolean objective() {
            JsonNode n = section("objective").map(s -> s.get("require_target")).orElse(null);
            if (n == null) {
                return false;
            }
            if (!n.isBoolean()) {
                valueError(List.of("objective", "require_target"), "objective.require_target must be true or false");
                return false;
            }
            return n.asBoolean();
        }

        private String existing() {
            if (!has("existing", "file")) {
                return "";
            }
            // checked when a command reads it (trim); check --bank and solve do not need it
            return resolvedFile("existing", "file").map(Path::toString).orElse("");
        }

        // ---- values ----

        private static final Pattern LONG_DURATION =
                Pattern.compile("([+-]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][+-]?\\d+)?)\\s*(min|h)");

        private Optional<Duration> duration(List<String> path, JsonNode n) {
            String shown = n.isTextual() ? "\"" + n.asText() + "\"" : n.toString();
            double seconds;
            if (n.isNumber()) {
                seconds = n.asDouble();
            } else if (n.isTextual()) {
                String text = n.asText().strip();
                Matcher m = LONG_DURATION.matcher(text);
                try {
                    if (m.matches()) {
                        seconds = Double.parseDouble(m.group(1)) * (m.group(2).equals("h") ? 3600 : 60);
                    } else {
                        seconds = EngineeringNotation.parse(text, Quantity.TIME);
                    }
                } catch (NotationException e) {
                    valueError(path, dotted(path) + ": " + e.getMessage() + "; a duration is written like \"30 s\","
                            + " \"2 min\" or \"500 ms\"");
                    return Optional.empty();
                }
            } else {
                valueError(path, dotted(path) + " must be a duration such as \"30 s\", \"2 min\" or \"500 ms\"");
                return Optional.empty();
            }
            if (!(seconds > 0) || !(seconds < 1e9)) {
                valueError(path, dotted(path) + " " + shown + " must be a positive duration below 1e9 s");
                return Optional.empty();
            }
            long nanos = Math.round(seconds * 1e9);
            if (nanos <= 0) {
                valueError(path, dotted(path) + " " + shown + " is shorter than a nanosecond");
                return Optional.empty();
            }
            return Optional.of(Duration.ofNanos(nanos));
        }

        /** The path of {@code section.key} resolved against the scenario's folder, whether or not it exists. */
        private Optional<Path> resolvedFile(String section, String key) {
            List<String> path = List.of(section, key);
            JsonNode n = section(section).orElseThrow().get(key);
            if (!n.isTextual() || n.asText().isBlank()) {
                valueError(path, section + "." + key + " must be a file path in double quotes");
                return Optional.empty();
            }
            try {
                return Optional.of(dir.resolve(n.asText()).normalize());
            } catch (java.nio.file.InvalidPathException e) {
                valueError(path, section + "." + key + " \"" + n.asText() + "\" is not a valid path");
                return Optional.empty();
            }
        }

        private Optional<Path> existingFile(String section, String key, String what) {
            List<String> path = List.of(section, key);
            Optional<Path> found = resolvedFile(section, key);
            if (found.isEmpty()) {
                return found;
            }
            Path resolved = found.get();
            JsonNode n = section(section).orElseThrow().get(key);
            if (Files.isDirectory(resolved)) {
                valueError(path, what + " \"" + n.asText() + "\" is a folder (" + resolved + "), not a file; "
                        + section + "." + key + " names the file itself, relative to the scenario's folder");
                return Optional.empty();
            }
            if (!Files.isRegularFile(resolved)) {
                valueError(path, what + " \"" + n.asText() + "\" not found (looked for " + resolved
                        + "), the path is relative to the scenario's folder");
                return Optional.empty();
            }
            return Optional.of(resolved);
        }

        private String string(String section, String key, String absent) {
            JsonNode n = section(section).map(s -> s.get(key)).orElse(null);
            if (n == null) {
                return absent;
            }
            if (!n.isTextual()) {
                valueError(List.of(section, key), section + "." + key + " must be text in double quotes");
                return absent;
            }
            return n.asText();
        }

        /** A whole number >= min, or {@code absent} if not given; a wrong value is reported, returns absent. */
        /** A whole number in {@code min .. max}, else a located error (saying the range) and {@code absent}. */
        private int integer(List<String> path, int min, int max, int absent) {
            JsonNode n = root;
            for (String p : path) {
                n = n == null || !n.isObject() ? null : n.get(p);
            }
            if (n == null) {
                return absent;
            }
            if (!n.isIntegralNumber()) {
                valueError(path, dotted(path) + " must be a whole number from " + min + " to " + max
                        + (n.isTextual() ? ", written without quotes" : ""));
                return absent;
            }
            if (!n.canConvertToInt() || n.asInt() < min || n.asInt() > max) {
                valueError(path, dotted(path) + " is " + n.asText() + ", it must be a whole number from " + min
                        + " to " + max + (max == Board.MAX_PARTS ? " (the most parts breakwater places on one rail)"
                        : max == Board.MAX_DISTINCT ? " (the most part types a catalog may list)" : ""));
                return absent;
            }
            return n.asInt();
        }

        private double required(String section, String key, Quantity q, String what) {
            if (!has(section, key)) {
                missing(section, key, "it gives " + what);
                return Double.NaN;
            }
            return optional(section, key, q, Double.NaN);
        }

        private double optional(String section, String key, Quantity q, double absent) {
            JsonNode n = section(section).map(s -> s.get(key)).orElse(null);
            return n == null ? absent : quantity(List.of(section, key), n, q);
        }

        /** Optional value, 0 if absent, reported if negative. */
        private double nonNegative(String section, String key, Quantity q) {
            double v = optional(section, key, q, 0.0);
            if (v < 0) {
                valueError(List.of(section, key), section + "." + key + " " + shown(section, key)
                        + " is negative, a " + q.description() + " here must be >= 0");
            }
            return v;
        }

        /** The value in SI units, or NaN after reporting why it cannot be read. */
        private double quantity(List<String> path, JsonNode n, Quantity q) {
            if (n.isNumber()) {
                double v = n.asDouble();
                if (!Double.isFinite(v)) {
                    valueError(path, dotted(path) + " must be a finite number");
                    return Double.NaN;
                }
                return v;
            }
            if (n.isTextual()) {
                try {
                    return EngineeringNotation.parse(n.asText(), q);
                } catch (NotationException e) {
                    valueError(path, dotted(path) + ": " + e.getMessage());
                    return Double.NaN;
                }
            }
            valueError(path, dotted(path) + " must be a number in SI units or a string such as \"" + example(q)
                    + "\", not " + (n.isObject() ? "a table" : n.isArray() ? "an array" : n.getNodeType()
                    .toString().toLowerCase(java.util.Locale.ROOT)));
            return Double.NaN;
        }

        private static String example(Quantity q) {
            return switch (q) {
                case CAPACITANCE -> "6 nF";
                case INDUCTANCE -> "18 nH";
                case RESISTANCE -> "0.3 mOhm";
                case VOLTAGE -> "0.95 V";
                case CURRENT -> "6 A";
                case FREQUENCY -> "10 kHz";
                case TIME -> "0.5 ns";
                case FRACTION -> "3 %";
                case PLAIN -> "0.10";
            };
        }

        private boolean isText(String section, String key) {
            return section(section).map(s -> s.get(key)).map(JsonNode::isTextual).orElse(false);
        }

        /** The value as written, for messages: strings in quotes, numbers as they are. */
        private String shown(String section, String key) {
            JsonNode n = section(section).map(s -> s.get(key)).orElse(null);
            if (n == null) {
                return "";
            }
            return n.isTextual() ? "\"" + n.asText() + "\"" : n.asText();
        }

        /** A number as a person would retype it: 3.0 prints as 3. */
        private static String fmt(double v) {
            return v == Math.rint(v) && Math.abs(v) < 1e15 ? Long.toString((long) v) : Double.toString(v);
        }

        private static String dotted(List<String> path) {
            return String.join(".", path);
        }

        // ---- reporting ----

        private Diagnostic located(List<String> path, String message) {
            TomlLocator.Pos p = at.value(path);
            return Diagnostic.at(source, p.line(), p.column(), message);
        }

        private void valueError(List<String> path, String message) {
            problems.add(located(path, message));
        }

        private void keyError(List<String> path, String message) {
            TomlLocator.Pos p = at.key(path);
            problems.error(source, p.line(), p.column(), message);
        }

        private void error(TomlLocator.Pos p, String message) {
            problems.error(source, p.line(), p.column(), message);
        }
    }
}
