package breakwater.catalog;

import breakwater.diagnostic.Diagnostics;
import java.io.IOException;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * A CSV file read with Commons CSV, each field carrying the line and column where it starts.
 *
 * <p>Lines starting with {@code #} are comments, empty lines are skipped, spaces around fields are
 * trimmed. Positions are 1-based: the line of the field's first character and the column of that
 * character counted in Unicode code points from the start of its line (for a quoted field, the opening
 * quote).
 */
final class CsvTable {

    /** One field with the position where it starts. */
    record Cell(String value, int line, int column) {
    }

    /** One record; {@code line} is the line of its first field, {@code endColumn} the column after its text. */
    record Row(int line, List<Cell> cells, int endColumn) {
        int size() {
            return cells.size();
        }

        Cell cell(int index) {
            return cells.get(index);
        }

        /**
         * For a header read as a single field that holds semicolons or tabs: the message saying the file
         * uses another separator (a spreadsheet's export in some locales), else empty.
         */
        String separatorProblem() {
            if (cells.size() != 1) {
                return "";
            }
            String v = cells.get(0).value();
            for (String sep : new String[] {";", "\t"}) {
                if (v.contains(sep)) {
                    return "the header '" + v.replace("\t", "\\t") + "' is split by '" + (sep.equals(";") ? ";" : "\\t")
                            + "', not by commas: this is a comma-separated file format (export or save it as CSV "
                            + "with commas and decimal points)";
                }
            }
            return "";
        }

        /**
         * For a row with more fields than the header: a hint when two neighbouring fields look like one
         * number split at a decimal comma ("4,7u" read as "4" and "7u"), else empty.
         */
        String decimalCommaHint() {
            for (int k = 0; k + 1 < cells.size(); k++) {
                Cell a = cells.get(k);
                Cell b = cells.get(k + 1);
                boolean adjacent = a.line() == b.line() && b.column() == a.column() + a.value().length() + 1;
                if (adjacent && a.value().matches("[+-]?\\d+") && b.value().matches("\\d.*")) {
                    String joined = a.value() + "," + b.value();
                    return "; '" + joined + "' looks like a number with a decimal comma: numbers use a point ("
                            + a.value() + "." + b.value() + ")";
                }
            }
            return "";
        }
    }

    private static final CSVFormat FORMAT = CSVFormat.DEFAULT.builder()
            .setCommentMarker('#')
            .setIgnoreEmptyLines(true)
            .setIgnoreSurroundingSpaces(true)
            .setTrim(true)
            .get();

    private static final Pattern ERROR_LINE = Pattern.compile("line:? (\\d+)");
    private static final Pattern ERROR_POSITION = Pattern.compile("position:? (\\d+)");

    private final String text;
    private final int[] lineStarts;
    final Row header;
    final List<Row> rows;

    private CsvTable(String text, int[] lineStarts, Row header, List<Row> rows) {
        this.text = text;
        this.lineStarts = lineStarts;
        this.header = header;
        this.rows = rows;
    }

    /**
     * Reads {@code text}. A malformed record (bad quoting) is added to {@code problems} and ends the
     * reading; the rows before it are kept. Empty when there is no record at all.
     */
    static Optional<CsvTable> read(String text, String source, Diagnostics problems) throws IOException {
        int[] lineStarts = lineStarts(text);
        List<Row> all = new ArrayList<>();
        try (CSVParser parser = CSVParser.parse(new StringReader(text), FORMAT)) {
            try {
                for (CSVRecord record : parser) {
                    List<String> values = record.toList();
                    if (values.stream().allMatch(String::isEmpty)) {
                        continue; // a line of blanks
                    }
                    all.add(locate(text, lineStarts, (int) record.getCharacterPosition(), values));
                }
            } catch (UncheckedIOException e) {
                String message = e.getCause() == null ? e.getMessage() : e.getCause().getMessage();
                int line = (int) parser.getCurrentLineNumber() + 1;
                int column = 1;
                Matcher m = ERROR_LINE.matcher(message == null ? "" : message);
                if (m.find()) {
                    line = Integer.parseInt(m.group(1));
                }
                Matcher p = ERROR_POSITION.matcher(message == null ? "" : message);
                if (p.find()) {
                    int offset = Math.max(0, Math.min(text.length(), Integer.parseInt(p.group(1))) - 1);
                    int[] lc = position(text, lineStarts, offset);
                    if (lc[0] == line) {
                        column = lc[1];
                    }
                }
                problems.error(source, line, column, "malformed CSV here: a quoted field must end with a"
                        + " quote right before the next comma or the line end, and a quote inside a quoted"
                        + " field is written twice (\"\")");
            }
        }
        if (all.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new CsvTable(text, lineStarts, all.get(0), List.copyOf(all.subList(1, all.size()))));
    }

    /** Line number (1-based) of the last line of the text, for messages about the end of the file. */
    int lastLine() {
        return position(text, lineStarts, Math.max(0, text.length() - 1))[0];
    }

    private static Row locate(String text, int[] lineStarts, int recordOffset, List<String> values) {
        int q = skipCommentsAndBlankLines(text, Math.max(0, Math.min(recordOffset, text.length())));
        List<Integer> starts = new ArrayList<>();
        int i = q;
        int n = text.length();
        int end = q;
        while (true) {
            while (i < n && (text.charAt(i) == ' ' || text.charAt(i) == '\t')) {
                i++;
            }
            starts.add(i);
            if (i < n && text.charAt(i) == '"') {
                i++;
                while (i < n) {
                    if (text.charAt(i) == '"') {
                        if (i + 1 < n && text.charAt(i + 1) == '"') {
                            i += 2;
                            continue;
                        }
                        i++;
                        break;
                    }
                    i++;
                }
            }
            while (i < n && text.charAt(i) != ',' && text.charAt(i) != '\n' && text.charAt(i) != '\r') {
                i++;
            }
            end = i;
            if (i < n && text.charAt(i) == ',') {
                i++;
                continue;
            }
            break;
        }
        List<Cell> cells = new ArrayList<>(values.size());
        for (int k = 0; k < values.size(); k++) {
            int[] lc = k < starts.size() ? position(text, lineStarts, starts.get(k)) : position(text, lineStarts, q);
            cells.add(new Cell(values.get(k), lc[0], lc[1]));
        }
        int[] first = position(text, lineStarts, q);
        int[] last = position(text, lineStarts, end);
        int endColumn = last[0] == first[0] ? last[1] : first[1];
        return new Row(first[0], List.copyOf(cells), endColumn);
    }

    private static int skipCommentsAndBlankLines(String text, int offset) {
        int q = offset;
        while (q < text.length()) {
            int lineEnd = text.indexOf('\n', q);
            if (lineEnd < 0) {
                lineEnd = text.length();
            }
            String line = text.substring(q, lineEnd);
            if (line.isBlank() || line.startsWith("#")) {
                q = lineEnd + 1;
                continue;
            }
            break;
        }
        return Math.min(q, text.length());
    }

    private static int[] lineStarts(String text) {
        List<Integer> starts = new ArrayList<>();
        starts.add(0);
        for (int k = 0; k < text.length(); k++) {
            if (text.charAt(k) == '\n') {
                starts.add(k + 1);
            }
        }
        return starts.stream().mapToInt(Integer::intValue).toArray();
    }

    /** {line, column}, both 1-based, column in code points. */
    private static int[] position(String text, int[] lineStarts, int offset) {
        int idx = Arrays.binarySearch(lineStarts, offset);
        int lineIndex = idx >= 0 ? idx : -idx - 2;
        int start = lineStarts[lineIndex];
        int column = text.codePointCount(start, Math.min(offset, text.length())) + 1;
        return new int[] {lineIndex + 1, column};
    }
}
