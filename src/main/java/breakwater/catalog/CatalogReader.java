package breakwater.catalog;

import breakwater.diagnostic.Diagnostic;
import breakwater.diagnostic.Diagnostics;
import breakwater.diagnostic.HiddenCharacters;
import breakwater.diagnostic.InputException;
import breakwater.diagnostic.Suggestions;
import breakwater.diagnostic.TextFiles;
import breakwater.units.CaseCode;
import breakwater.units.EngineeringNotation;
import breakwater.units.NotationException;
import breakwater.units.CaseRange;
import breakwater.units.Plausible;
import breakwater.units.Quantity;
import java.io.IOException;
import java.io.Reader;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Stream;

/**
 * Reads a parts catalog (CSV, docs/file-contracts.md#catalog-csv).
 *
 * <p>Format: an optional block of {@code #} comment lines, a header row naming the columns (any case,
 * any order), then one row per part. Required columns: {@code part, capacitance, esr, esl,
 * mount_inductance, cost}. Optional: {@code description, case, dielectric, voltage_rating, tolerance,
 * dc_bias_retention, max_count}. Values are plain SI numbers or engineering notation ({@code 100n},
 * {@code 4u7}, {@code 0.5 mOhm}); capacitance in F, esr in Ω, esl and mount_inductance in H,
 * voltage_rating in V, tolerance and dc_bias_retention as a ratio or with %, cost a plain number,
 * max_count a whole number &ge; 0. An empty optional cell means "not given".
 *
 * <p>Every problem of the file is collected and thrown together in one {@link InputException}. Each
 * diagnostic reads {@code file:line:column: what is wrong, the rule. Maybe …}, where line and column are
 * 1-based and the column is the character position (in Unicode code points) of the offending field's
 * first character in its line — for a quoted field, its opening quote.
 */
public final class CatalogReader {

    /** Columns every catalog must have. */
    public static final List<String> REQUIRED_COLUMNS =
            List.of("part", "capacitance", "esr", "esl", "mount_inductance", "cost");

    /** Columns a catalog may have. */
    public static final List<String> OPTIONAL_COLUMNS = List.of("description", "case", "dielectric",
            "voltage_rating", "tolerance", "dc_bias_retention", "max_count");

    private static final List<String> ALL_COLUMNS =
            Stream.concat(REQUIRED_COLUMNS.stream(), OPTIONAL_COLUMNS.stream()).toList();

    private CatalogReader() {
    }

    /**
     * Reads the catalog in {@code file} (UTF-8).
     *
     * @param displayName the file as the user named it, used in messages and as {@link Catalog#source()}
     * @throws InputException every problem found in the file
     * @throws IOException    if the file cannot be read
     */
    public static Catalog read(Path file, String displayName) throws InputException, IOException {
        return parseText(TextFiles.readUtf8(file, displayName, "a catalog file (CSV)"), displayName);
    }

    /** Reads a catalog from {@code in}; see {@link #read(Path, String)}. */
    public static Catalog parse(Reader in, String displayName) throws InputException, IOException {
        return parseText(TextFiles.readAll(in), displayName);
    }

    private static Catalog parseText(String raw, String source) throws InputException, IOException {
        TextFiles.checkLines(raw, source);
        String text = HiddenCharacters.scan(raw, source, HiddenCharacters.Syntax.CSV).textOrThrow();
        Diagnostics problems = new Diagnostics();
        Optional<CsvTable> read = CsvTable.read(text, source, problems);
        if (read.isEmpty()) {
            if (problems.isEmpty()) {
                problems.error(source, 1, 1, "the catalog is empty, it needs a header row naming the columns "
                        + String.join(", ", REQUIRED_COLUMNS) + " and one row per part");
            }
            problems.throwIfAnyInFileOrder();
        }
        CsvTable table = read.orElseThrow();
        if (!table.header.separatorProblem().isEmpty()) {
            problems.error(source, table.header.line(), 1, table.header.separatorProblem());
            problems.throwIfAnyInFileOrder();
        }
        Map<String, Integer> columns = readHeader(table.header, source, problems);
        boolean headerComplete = columns.keySet().containsAll(REQUIRED_COLUMNS);

        List<Part> parts = new ArrayList<>();
        List<Diagnostic> warnings = new ArrayList<>();
        Map<String, Integer> firstLineOfPart = new HashMap<>();
        if (headerComplete) {
            for (CsvTable.Row row : table.rows) {
                if (parts.size() == Catalog.MAX_PARTS) {
                    problems.error(source, row.line(), 1, "the catalog lists more than " + Catalog.MAX_PARTS
                            + " parts, the most breakwater reads from one catalog; split it or keep the parts"
                            + " this rail can use");
                    break;
                }
                readRow(row, table.header.size(), columns, source, problems, firstLineOfPart, warnings)
                        .ifPresent(parts::add);
            }
            if (table.rows.isEmpty()) {
                problems.error(source, table.header.line(), 1,
                        "the catalog lists no parts, a catalog needs at least one row below its header");
            }
        }
        problems.throwIfAnyInFileOrder();
        return new Catalog(source, parts, warnings);
    }

    /** Column name (lower case) → field index; reports unknown, duplicate and missing columns. */
    private static Map<String, Integer> readHeader(CsvTable.Row header, String source, Diagnostics problems) {
        Map<String, Integer> columns = new LinkedHashMap<>();
        for (int k = 0; k < header.size(); k++) {
            CsvTable.Cell cell = header.cell(k);
            String name = cell.value().toLowerCase(Locale.ROOT);
            if (name.isEmpty()) {
                problems.error(source, cell.line(), cell.column(),
                        "empty column name in the header, every column needs a name");
            } else if (!ALL_COLUMNS.contains(name)) {
                Diagnostic d = Diagnostic.at(source, cell.line(), cell.column(), "unknown column '" + cell.value()
                        + "', a catalog has the columns " + String.join(", ", ALL_COLUMNS));
                Optional<String> near = Suggestions.closest(name, ALL_COLUMNS);
                problems.add(near.map(s -> d.withHint("you meant '" + s + "'?")).orElse(d));
            } else if (columns.containsKey(name)) {
                problems.error(source, cell.line(), cell.column(), "column '" + name + "' appears twice in"
                        + " the header, each column may appear once");
            } else {
                columns.put(name, k);
            }
        }
        for (String required : REQUIRED_COLUMNS) {
            if (!columns.containsKey(required)) {
                problems.error(source, header.line(), 1, "missing required column '" + required
                        + "', every catalog needs the columns " + String.join(", ", REQUIRED_COLUMNS));
            }
        }
        return columns;
    }

    private static Optional<Part> readRow(CsvTable.Row row, int width, Map<String, Integer> columns,
                                          String source, Diagnostics problems,
                                          Map<String, Integer> firstLineOfPart, List<Diagnostic> warnings) {
        if (row.size() != width) {
            int column = row.size() > width ? row.cell(width).column() : row.endColumn();
            problems.error(source, row.line(), column, "this row has " + row.size() + " field"
                    + (row.size() == 1 ? "" : "s") + " but the header names " + width
                    + " columns, every row needs one field per column (leave optional ones empty"
                    + " between commas)"
                    + (row.size() > width ? row.decimalCommaHint() : ""));
            return Optional.empty();
        }
        RowReader r = new RowReader(row, columns, source, problems);

        String name = r.text("part");
        CsvTable.Cell nameCell = r.cell("part");
        if (name.isEmpty()) {
            r.error(nameCell, "empty part name, every part needs a unique name");
        } else if (firstLineOfPart.containsKey(name)) {
            r.error(nameCell, "duplicate part '" + name + "', first defined on line " + firstLineOfPart.get(name)
                    + "; part names must be unique");
        } else {
            firstLineOfPart.put(name, row.line());
        }

        double capacitance = r.required("capacitance", Quantity.CAPACITANCE);
        if (capacitance <= 0) {
            r.error(r.cell("capacitance"), "capacitance '" + r.text("capacitance")
                    + "' is not positive, a capacitor needs a capacitance > 0");
        }
        double esr = r.required("esr", Quantity.RESISTANCE);
        if (esr < 0) {
            r.error(r.cell("esr"), "esr '" + r.text("esr") + "' is negative, ESR must be >= 0");
        }
        double esl = r.required("esl", Quantity.INDUCTANCE);
        if (esl <= 0) {
            r.error(r.cell("esl"), "esl '" + r.text("esl") + "' is not positive, every real capacitor has an"
                    + " ESL > 0");
        }
        double mount = r.required("mount_inductance", Quantity.INDUCTANCE);
        if (mount < 0) {
            r.error(r.cell("mount_inductance"), "mount_inductance '" + r.text("mount_inductance")
                    + "' is negative, mounting inductance must be >= 0");
        }
        double cost = r.required("cost", Quantity.PLAIN);
        if (cost < 0) {
            r.error(r.cell("cost"), "cost '" + r.text("cost") + "' is negative, a price must be >= 0");
        }

        String description = r.text("description");
        String caseCode = r.text("case");
        if (!caseCode.isEmpty() && !CaseCode.isValid(caseCode)) {
            r.error(r.cell("case"), "case '" + caseCode + "' is not a case code, " + CaseCode.RULE);
        }
        String dielectric = r.text("dielectric");

        double rating = r.optional("voltage_rating", Quantity.VOLTAGE, Double.NaN);
        if (rating <= 0) {
            r.error(r.cell("voltage_rating"), "voltage_rating '" + r.text("voltage_rating")
                    + "' is not positive, a rated voltage must be > 0");
        }
        double tolerance = r.optional("tolerance", Quantity.FRACTION, Double.NaN);
        if (tolerance < 0 || tolerance >= 1) {
            // 100 % would let a Monte Carlo draw take the capacitance to 0: refused here, at its cell
            String hint = tolerance > 1 && !r.text("tolerance").contains("%")
                    ? "write '" + r.text("tolerance") + " %' for percent; a plain number is a ratio" : "";
            r.problem(Diagnostic.at(source, r.cell("tolerance").line(), r.cell("tolerance").column(),
                    "tolerance '" + r.text("tolerance") + "' is outside 0..100 % (100 % itself excluded), a "
                            + "tolerance is a share of the nominal capacitance").withHint(hint));
        }
        double retention = r.optional("dc_bias_retention", Quantity.FRACTION, 1.0);
        if (!(retention > 0 && retention <= 1) && !Double.isNaN(retention)) {
            String hint = retention > 1 && !r.text("dc_bias_retention").contains("%")
                    ? "write '" + r.text("dc_bias_retention") + " %' for percent; a plain number is a ratio" : "";
            r.problem(Diagnostic.at(source, r.cell("dc_bias_retention").line(),
                    r.cell("dc_bias_retention").column(), "dc_bias_retention '" + r.text("dc_bias_retention")
                            + "' is outside (0, 1], it is the share of nominal capacitance left at the rail"
                            + " voltage").withHint(hint));
        }
        int maxCount = r.count("max_count");
        // values of the right sign but outside what any real part has: refused with the range
        r.plausible("capacitance", capacitance, Plausible.CAPACITANCE);
        r.plausible("esr", esr, Plausible.ESR);
        r.plausible("esl", esl, Plausible.ESL);
        r.plausible("mount_inductance", mount, Plausible.MOUNT);
        r.plausible("cost", cost, Plausible.PRICE);
        r.plausible("voltage_rating", rating, Plausible.RATING);

        if (r.failed()) {
            return Optional.empty();
        }
        // beyond what the case usually holds: warned at the cell, not refused (the case code is only a label)
        Optional<CaseRange> usual = CaseRange.of(caseCode);
        if (usual.isPresent()) {
            usual.get().capacitanceWarning("capacitance", r.text("capacitance"), capacitance)
                    .ifPresent(w -> warnings.add(Diagnostic.at(source, r.cell("capacitance").line(),
                            r.cell("capacitance").column(), w)));
            usual.get().eslWarning("esl", r.text("esl"), esl)
                    .ifPresent(w -> warnings.add(Diagnostic.at(source, r.cell("esl").line(), r.cell("esl").column(), w)));
        }
        return Optional.of(new Part(name, description, caseCode, dielectric, capacitance, esr, esl, mount, cost,
                rating, tolerance, retention, maxCount));
    }

    /** Reads the cells of one row, reporting problems; a failed cell reads as NaN (or -1 for counts). */
    private static final class RowReader {
        private final CsvTable.Row row;
        private final Map<String, Integer> columns;
        private final String source;
        private final Diagnostics problems;
        private boolean failed;

        RowReader(CsvTable.Row row, Map<String, Integer> columns, String source, Diagnostics problems) {
            this.row = row;
            this.columns = columns;
            this.source = source;
            this.problems = problems;
        }

        boolean failed() {
            return failed;
        }

        CsvTable.Cell cell(String column) {
            return row.cell(columns.get(column));
        }

        String text(String column) {
            return columns.containsKey(column) ? cell(column).value() : "";
        }

        void error(CsvTable.Cell cell, String message) {
            problem(Diagnostic.at(source, cell.line(), cell.column(), message));
        }

        void problem(Diagnostic d) {
            problems.add(d);
            failed = true;
        }

        double required(String column, Quantity quantity) {
            CsvTable.Cell cell = cell(column);
            if (cell.value().isEmpty()) {
                error(cell, "empty " + column + ", every part needs a " + column);
                return Double.NaN;
            }
            return number(column, cell, quantity);
        }

        double optional(String column, Quantity quantity, double absent) {
            if (!columns.containsKey(column) || cell(column).value().isEmpty()) {
                return absent;
            }
            return number(column, cell(column), quantity);
        }

        private double number(String column, CsvTable.Cell cell, Quantity quantity) {
            try {
                return EngineeringNotation.parse(cell.value(), quantity);
            } catch (NotationException e) {
                error(cell, column + ": " + e.getMessage());
                return Double.NaN;
            }
        }

        /** Refuses a value of the right sign (others are reported already) that lies outside {@code range}. */
        void plausible(String column, double v, Plausible range) {
            if (Double.isNaN(v) || v < 0 || (v == 0 && !range.zeroOk()) || range.accepts(v)) {
                return;
            }
            error(cell(column), range.refusal(column, text(column)));
        }

        int count(String column) {
            if (!columns.containsKey(column) || cell(column).value().isEmpty()) {
                return -1;
            }
            CsvTable.Cell cell = cell(column);
            String v = cell.value();
            if (v.matches("-\\d+")) {
                error(cell, column + " '" + v + "' is negative, it must be a whole number >= 0");
                return -1;
            }
            if (!v.matches("\\+?\\d+")) {
                error(cell, column + " '" + v + "' is not a whole number, it must be a whole number >= 0");
                return -1;
            }
            String digits = (v.startsWith("+") ? v.substring(1) : v).replaceFirst("^0+(?=\\d)", "");
            if (digits.length() > 6 || Integer.parseInt(digits) > BankEntry.MAX_COUNT) {
                error(cell, column + " '" + v + "' is too large, it must be at most " + BankEntry.MAX_COUNT
                        + " (the most parts of one type breakwater places)");
                return -1;
            }
            return Integer.parseInt(digits);
        }
    }
}
