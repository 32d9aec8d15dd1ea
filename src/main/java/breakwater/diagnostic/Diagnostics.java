package breakwater.diagnostic;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/** Collects the problems of one file so that all of them are reported together. */
public final class Diagnostics {
    private final List<Diagnostic> found = new ArrayList<>();

    public void add(Diagnostic d) {
        found.add(d);
    }

    public void error(String source, int line, int column, String message) {
        found.add(Diagnostic.at(source, line, column, message));
    }

    public boolean isEmpty() {
        return found.isEmpty();
    }

    public List<Diagnostic> list() {
        return List.copyOf(found);
    }

    /** Throws an {@link InputException} holding every problem collected so far, if there is any. */
    public void throwIfAny() throws InputException {
        if (!found.isEmpty()) {
            throw new InputException(found);
        }
    }

    /**
     * Like {@link #throwIfAny()}, with the problems ordered by line, then column (stable: problems at the
     * same place keep the order they were found in), the way a compiler lists them.
     */
    public void throwIfAnyInFileOrder() throws InputException {
        if (!found.isEmpty()) {
            List<Diagnostic> ordered = new ArrayList<>(found);
            ordered.sort(Comparator.comparingInt(Diagnostic::line).thenComparingInt(Diagnostic::column));
            throw new InputException(ordered);
        }
    }
}
