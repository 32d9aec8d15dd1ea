package breakwater.report;

/** Tiny CSV helpers: RFC 4180 quoting and full-precision, locale-independent numbers. */
final class Csv {
    private Csv() {
    }

    /** Shortest text that reads back to the same double ({@link Double#toString} is locale-independent). */
    static String num(double v) {
        return Double.toString(v);
    }

    /** Quotes a field when it holds a comma, quote or line break (RFC 4180). */
    static String text(String s) {
        if (s.indexOf(',') >= 0 || s.indexOf('"') >= 0 || s.indexOf('\n') >= 0 || s.indexOf('\r') >= 0) {
            return '"' + s.replace("\"", "\"\"") + '"';
        }
        return s;
    }
}
