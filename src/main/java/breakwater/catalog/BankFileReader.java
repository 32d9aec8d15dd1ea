package breakwater.catalog;

import breakwater.diagnostic.Diagnostic;
import breakwater.diagnostic.Diagnostics;
import breakwater.diagnostic.InputException;
import breakwater.diagnostic.Suggestions;
import breakwater.diagnostic.TextFiles;
import java.io.IOException;
import java.io.Reader;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/**
 * Reads a bank file (CSV, docs/file-contracts.md#bank-csv): a header row {@code part,count} (any case, any order), then one
 * row per part of the catalog with how many of it are placed. {@code #} lines are comments. Rows with
 * count 0 are accepted and dropped. Breakwater's own {@code bom.csv} reads back as a bank: its columns
 * {@code description, case, unit_cost, extended_cost} are ignored and its {@code TOTAL} row skipped.
 *
 * <p>All problems of the file are thrown together in one {@link InputException}; diagnostics are
 * located as in {@link CatalogReader}: 1-based line, and the column of the offending field's first
 * character in that line (in Unicode code points).
 */
public final class BankFileReader {

    private static final List<String> COLUMNS = List.of("part", "count");
    /** The other columns of Breakwater's own bom.csv: accepted and ignored, so a BOM can be read back. */
    private static final List<String> BOM_COLUMNS = List.of("description", "case", "unit_cost", "extended_cost");
    /** The part name of bom.csv's summary row, skipped when reading a BOM back. */
    static final String BOM_TOTAL_ROW = "TOTAL";

    private BankFileReader() {
    }

    /**
     * Reads the bank in {@code file} (UTF-8), resolving part names in {@code catalog}.
     *
     * @return the entries with count &gt; 0, in file order
     * @throws InputException every problem found in the file
     * @throws IOException    if the file cannot be read
     */
    public static List<BankEntry> read(Path file, String displayName, Catalog catalog)
            throws InputException, IOException {
        return parseText(TextFiles.readUtf8(file, displayName), displayName, catalog);
    }

    /** Reads a bank from {@code in}; see {@link #read(Path, String, Catalog)}. */
    public static List<BankEntry> parse(Reader in, String displayName, Catalog catalog)
            throws InputException, IOException {
        return parseText(TextFiles.readAll(in), displayName, catalog);
    }

    private static List<BankEntry> parseText(String text, String source, Catalog catalog)
            throws InputException, IOException {
        Diagnostics problems = new Diagnostics();
        Optional<CsvTable> read = CsvTable.read(text, source, problems);
        if (read.isEmpty()) {
            if (problems.isEmpty()) {
                problems.error(source, 1, 1, "the bank file is empty, it needs a header row 'part,count'"
                        + " and one row per part");
            }
            problems.throwIfAnyInFileOrder();
        }
        CsvTable table = read.orElseThrow();
        if (!table.header.separatorProblem().isEmpty()) {
            problems.error(source, table.header.line(), 1, table.header.separatorProblem());
            problems.throwIfAnyInFileOrder();
        }

        Map<String, Integer> columns = new HashMap<>();
        for (int k = 0; k < table.header.size(); k++) {
            CsvTable.Cell cell = table.header.cell(k);
            String name = cell.value().toLowerCase(Locale.ROOT);
            if (BOM_COLUMNS.contains(name)) {
                continue;
            }
            if (!COLUMNS.contains(name)) {
                Diagnostic d = Diagnostic.at(source, cell.line(), cell.column(), "unknown column '"
                        + cell.value() + "', a bank file has exactly the columns part, count");
                problems.add(Suggestions.closest(name, COLUMNS).map(s -> d.withHint("you meant '" + s + "'?"))
                        .orElse(d));
            } else if (columns.containsKey(name)) {
                problems.error(source, cell.line(), cell.column(), "column '" + name
                        + "' appears twice in the header, each column may appear once");
            } else {
                columns.put(name, k);
            }
        }
        for (String required : COLUMNS) {
            if (!columns.containsKey(required)) {
                problems.error(source, table.header.line(), 1, "missing required column '" + required
                        + "', a bank file has the header row 'part,count'");
            }
        }
        problems.throwIfAnyInFileOrder();

        int width = table.header.size();
        int partIndex = columns.get("part");
        int countIndex = columns.get("count");
        List<BankEntry> entries = new ArrayList<>();
        Map<String, Integer> firstLine = new HashMap<>();
        for (CsvTable.Row row : table.rows) {
            if (row.size() != width) {
                int column = row.size() > width ? row.cell(width).column() : row.endColumn();
                problems.error(source, row.line(), column, "this row has " + row.size() + " field"
                        + (row.size() == 1 ? "" : "s") + " but the header names " + width
                        + " columns, every row needs a part and a count"
                        + (row.size() > width ? row.decimalCommaHint() : ""));
                continue;
            }
            CsvTable.Cell partCell = row.cell(partIndex);
            CsvTable.Cell countCell = row.cell(countIndex);
            String name = partCell.value();
            if (name.equals(BOM_TOTAL_ROW) && catalog.find(name).isEmpty()) {
                continue; // the summary row of a bom.csv written by Breakwater
            }
            Optional<Part> part = Optional.empty();
            if (name.isEmpty()) {
                problems.error(source, partCell.line(), partCell.column(),
                        "empty part name, every row names a part of the catalog");
            } else if (firstLine.containsKey(name)) {
                problems.error(source, partCell.line(), partCell.column(), "part '" + name
                        + "' is listed twice (first on line " + firstLine.get(name)
                        + "), list each part once with its total count");
            } else {
                firstLine.put(name, row.line());
                part = catalog.find(name);
                if (part.isEmpty()) {
                    Diagnostic d = Diagnostic.at(source, partCell.line(), partCell.column(), "unknown part '"
                            + name + "', every part of a bank must be in the catalog " + catalog.source());
                    problems.add(Suggestions.closest(name, catalog.names())
                            .map(s -> d.withHint("you meant '" + s + "'?")).orElse(d));
                }
            }
            int count = -1;
            String v = countCell.value();
            if (v.matches("-\\d+")) {
                problems.error(source, countCell.line(), countCell.column(), "count '" + v
                        + "' is negative, a count is a whole number >= 0");
            } else if (!v.matches("\\+?\\d+")) {
                problems.error(source, countCell.line(), countCell.column(), "count '" + v
                        + "' is not a whole number, a count is a whole number >= 0");
            } else {
                String digits = (v.startsWith("+") ? v.substring(1) : v).replaceFirst("^0+(?=\\d)", "");
                if (digits.length() > 6 || Integer.parseInt(digits) > BankEntry.MAX_COUNT) {
                    problems.error(source, countCell.line(), countCell.column(), "count '" + v
                            + "' is too large, a count is at most " + BankEntry.MAX_COUNT
                            + " (the most parts of one type breakwater places)");
                } else {
                    count = Integer.parseInt(digits);
                }
            }
            if (part.isPresent() && count > 0) {
                entries.add(new BankEntry(part.get(), count));
            }
        }
        problems.throwIfAnyInFileOrder();
        return List.copyOf(entries);
    }
}
