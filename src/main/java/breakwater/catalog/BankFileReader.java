package breakwater.catalog;

import breakwater.diagnostic.Diagnostic;
import breakwater.diagnostic.Diagnostics;
import breakwater.diagnostic.HiddenCharacters;
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
 * row per part of the catalog with how many of it are placed; with placement regions an optional
 * {@code region} column says where (one row per part and region). {@code #} lines are comments. Rows with
 * count 0 are accepted and dropped. Breakwater's own {@code bom.csv} reads back as a bank: its columns
 * {@code description, case, unit_cost, extended_cost} are ignored and its {@code TOTAL} row skipped.
 *
 * <p>All problems of the file are thrown together in one {@link InputException}; diagnostics are
 * located as in {@link CatalogReader}: 1-based line, and the column of the offending field's first
 * character in that line (in Unicode code points).
 */
public final class BankFileReader {

    private static final List<String> COLUMNS = List.of("part", "count");
    /** The optional column naming each row's placement region (docs/network-model.md#placement-regions). */
    static final String REGION_COLUMN = "region";
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
        return read(file, displayName, catalog, List.of());
    }

    /**
     * Reads the bank in {@code file} for a scenario with the placement regions {@code regions} (names in
     * file order; empty: none). The optional {@code region} column names each row's region; a row without
     * one goes to the only region, and is an error naming the regions when there are several.
     */
    public static List<BankEntry> read(Path file, String displayName, Catalog catalog, List<String> regions)
            throws InputException, IOException {
        return parseText(TextFiles.readUtf8(file, displayName, "a bank file (CSV: part,count)"), displayName, catalog,
                regions);
    }

    /** Reads a bank from {@code in}; see {@link #read(Path, String, Catalog)}. */
    public static List<BankEntry> parse(Reader in, String displayName, Catalog catalog)
            throws InputException, IOException {
        return parseText(TextFiles.readAll(in), displayName, catalog, List.of());
    }

    /** Reads a bank from {@code in}; see {@link #read(Path, String, Catalog, List)}. */
    public static List<BankEntry> parse(Reader in, String displayName, Catalog catalog, List<String> regions)
            throws InputException, IOException {
        return parseText(TextFiles.readAll(in), displayName, catalog, regions);
    }

    private static List<BankEntry> parseText(String raw, String source, Catalog catalog, List<String> regions)
            throws InputException, IOException {
        TextFiles.checkLines(raw, source);
        // a bank holds names and whole counts, no value with a unit: no space stands in for a plain one
        String text = HiddenCharacters.scan(raw, source, HiddenCharacters.Syntax.CSV, false).textOrThrow();
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
            if (!COLUMNS.contains(name) && !name.equals(REGION_COLUMN)) {
                Diagnostic d = Diagnostic.at(source, cell.line(), cell.column(), "unknown column '"
                        + cell.value() + "', a bank file has the columns part, count and, optionally, region");
                List<String> known = new ArrayList<>(COLUMNS);
                known.add(REGION_COLUMN);
                problems.add(Suggestions.closest(name, known).map(s -> d.withHint("you meant '" + s + "'?"))
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
        int regionIndex = columns.getOrDefault(REGION_COLUMN, -1);
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
            String region = regionIndex < 0 ? "" : row.cell(regionIndex).value().strip();
            CsvTable.Cell regionCell = regionIndex < 0 ? partCell : row.cell(regionIndex);
            boolean regionOk = true;
            if (regions.isEmpty() && !region.isEmpty()) {
                problems.error(source, regionCell.line(), regionCell.column(), "region '" + region
                        + "' but the scenario declares no placement regions: leave the region column empty, or"
                        + " declare [region." + region + "] in the scenario");
                regionOk = false;
            } else if (!regions.isEmpty() && region.isEmpty()) {
                if (regions.size() == 1) {
                    region = regions.get(0);
                } else {
                    problems.error(source, regionCell.line(), regionCell.column(), "this row names no region, and"
                            + " the scenario has several: " + String.join(", ", regions) + "; add a region column"
                            + " (part,count,region) and name one on every row");
                    regionOk = false;
                }
            } else if (!regions.isEmpty() && !regions.contains(region)) {
                Diagnostic d = Diagnostic.at(source, regionCell.line(), regionCell.column(), "unknown region '"
                        + region + "', the scenario's regions are " + String.join(", ", regions));
                String shown = region;
                problems.add(Suggestions.closest(shown, regions).map(s -> d.withHint("you meant '" + s + "'?")).orElse(d));
                regionOk = false;
            }
            String key = region.isEmpty() ? name : name + "\u0000" + region;
            Optional<Part> part = Optional.empty();
            if (name.isEmpty()) {
                problems.error(source, partCell.line(), partCell.column(),
                        "empty part name, every row names a part of the catalog");
            } else if (firstLine.containsKey(key)) {
                problems.error(source, partCell.line(), partCell.column(), "part '" + name
                        + "' is listed twice" + (region.isEmpty() ? "" : " in region " + region) + " (first on line "
                        + firstLine.get(key) + "), list each part once" + (region.isEmpty() ? "" : " per region")
                        + " with its total count");
            } else {
                firstLine.put(key, row.line());
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
            if (part.isPresent() && count > 0 && regionOk) {
                entries.add(new BankEntry(part.get(), count, region));
            }
        }
        problems.throwIfAnyInFileOrder();
        return List.copyOf(entries);
    }
}
