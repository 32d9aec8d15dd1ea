package breakwater.report;

import java.util.ArrayList;
import java.util.List;

/**
 * A console table: every column as wide as its widest cell or header, two spaces between columns, text
 * columns left-aligned and figures right-aligned, the header underlined, so no two headers run together.
 */
final class ConsoleTable {
    private final List<String> headers;
    private final boolean[] right;
    private final List<List<String>> rows = new ArrayList<>();

    /** Columns named by {@code headers}; {@code rightAligned} marks the figure columns. */
    ConsoleTable(List<String> headers, boolean... rightAligned) {
        if (rightAligned.length != headers.size()) {
            throw new IllegalArgumentException(headers.size() + " headers but " + rightAligned.length + " alignments");
        }
        this.headers = List.copyOf(headers);
        this.right = rightAligned.clone();
    }

    ConsoleTable row(List<String> cells) {
        if (cells.size() != headers.size()) {
            throw new IllegalArgumentException("a row of " + cells.size() + " cells in a table of " + headers.size()
                    + " columns");
        }
        rows.add(List.copyOf(cells));
        return this;
    }

    /** The table, each line indented by two spaces and ended by a newline. */
    String render() {
        int n = headers.size();
        int[] width = new int[n];
        for (int c = 0; c < n; c++) {
            width[c] = headers.get(c).length();
            for (List<String> r : rows) {
                width[c] = Math.max(width[c], r.get(c).length());
            }
        }
        StringBuilder b = new StringBuilder();
        line(b, headers, width);
        List<String> rule = new ArrayList<>();
        for (int c = 0; c < n; c++) {
            rule.add("-".repeat(width[c]));
        }
        line(b, rule, width);
        for (List<String> r : rows) {
            line(b, r, width);
        }
        return b.toString();
    }

    private void line(StringBuilder b, List<String> cells, int[] width) {
        StringBuilder l = new StringBuilder("  ");
        for (int c = 0; c < cells.size(); c++) {
            String cell = cells.get(c);
            String pad = " ".repeat(width[c] - cell.length());
            l.append(right[c] ? pad + cell : cell + pad);
            if (c < cells.size() - 1) {
                l.append("  ");
            }
        }
        b.append(l.toString().stripTrailing()).append('\n');
    }
}
