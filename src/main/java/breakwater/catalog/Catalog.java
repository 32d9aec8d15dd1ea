package breakwater.catalog;

import breakwater.diagnostic.Diagnostic;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * The parts a bank may be built from, in file order.
 *
 * @param source   the file as the user named it (for messages)
 * @param parts    the parts; names are unique
 * @param warnings values the reader accepted but that are unusual for the part's case
 *                 (docs/file-contracts.md#plausible-values), located at their cells
 */
public record Catalog(String source, List<Part> parts, List<Diagnostic> warnings) {
    /**
     * The most parts a catalog may list: a large stockroom's worth, and with {@link BankEntry#MAX_COUNT}
     * the bound that keeps a bank's total count a whole number without overflow.
     */
    public static final int MAX_PARTS = 20_000;

    /** A catalog without warnings. */
    public Catalog(String source, List<Part> parts) {
        this(source, parts, List.of());
    }

    public Catalog {
        Objects.requireNonNull(source, "source");
        parts = List.copyOf(parts);
        warnings = List.copyOf(warnings);
        if (parts.size() > MAX_PARTS) {
            throw new IllegalArgumentException("a catalog lists at most " + MAX_PARTS + " parts, got " + parts.size());
        }
        long distinct = parts.stream().map(Part::name).distinct().count();
        if (distinct != parts.size()) {
            throw new IllegalArgumentException("part names in a catalog must be unique");
        }
    }

    public Optional<Part> find(String name) {
        return parts.stream().filter(p -> p.name().equals(name)).findFirst();
    }

    public List<String> names() {
        return parts.stream().map(Part::name).toList();
    }
}
