package breakwater.diagnostic;

import java.util.Objects;

/**
 * One problem found in an input file, located like a compiler message:
 * {@code file:line:column: what is wrong, the rule. Maybe …}.
 *
 * @param source the file as the user named it, or "" when the problem has no file
 * @param line   1-based line, or 0 when unknown
 * @param column 1-based column, or 0 when unknown
 * @param message what is wrong and the rule it breaks
 * @param hint    a suggestion ("did you mean …"), or "" for none
 */
public record Diagnostic(String source, int line, int column, String message, String hint) {

    public Diagnostic {
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(message, "message");
        Objects.requireNonNull(hint, "hint");
        if (line < 0 || column < 0) {
            throw new IllegalArgumentException("line and column must be >= 0");
        }
    }

    public static Diagnostic at(String source, int line, int column, String message) {
        return new Diagnostic(source, line, column, message, "");
    }

    public static Diagnostic of(String source, String message) {
        return new Diagnostic(source, 0, 0, message, "");
    }

    public Diagnostic withHint(String newHint) {
        return new Diagnostic(source, line, column, message, newHint);
    }

    /** The message as printed for people: {@code scenario.toml:12:5: ... Maybe ...}. */
    public String render() {
        StringBuilder b = new StringBuilder();
        if (!source.isEmpty()) {
            b.append(source);
            if (line > 0) {
                b.append(':').append(line);
                if (column > 0) {
                    b.append(':').append(column);
                }
            }
            b.append(": ");
        }
        b.append(message);
        if (!hint.isEmpty()) {
            if (!message.endsWith(".")) {
                b.append('.');
            }
            b.append(" Maybe ").append(hint);
        }
        return b.toString();
    }

    @Override
    public String toString() {
        return render();
    }
}
