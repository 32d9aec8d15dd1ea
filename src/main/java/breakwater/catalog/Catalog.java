package breakwater.catalog;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * The parts a bank may be built from, in file order.
 *
 * @param source the file as the user named it (for messages)
 * @param parts  the parts; names are unique
 */
public record Catalog(String source, List<Part> parts) {

    public Catalog {
        Objects.requireNonNull(source, "source");
        parts = List.copyOf(parts);
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
