package breakwater.diagnostic;

import java.util.List;
import java.util.stream.Collectors;

/**
 * An input file (catalog, scenario, bank) that cannot be used. Carries every problem found in it, so
 * the user can fix them all in one go. The command line maps it to exit code 3.
 */
public final class InputException extends Exception {
    private final List<Diagnostic> diagnostics;

    public InputException(List<Diagnostic> diagnostics) {
        super(diagnostics.stream().map(Diagnostic::render).collect(Collectors.joining("\n")));
        if (diagnostics.isEmpty()) {
            throw new IllegalArgumentException("an InputException needs at least one diagnostic");
        }
        this.diagnostics = List.copyOf(diagnostics);
    }

    public InputException(Diagnostic diagnostic) {
        this(List.of(diagnostic));
    }

    public List<Diagnostic> diagnostics() {
        return diagnostics;
    }
}
