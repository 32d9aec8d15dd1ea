package breakwater.catalog;

import java.util.Objects;

/** A number of identical parts placed in parallel. */
public record BankEntry(Part part, int count) {
    public BankEntry {
        Objects.requireNonNull(part, "part");
        if (count < 0) {
            throw new IllegalArgumentException("count must be >= 0, got " + count);
        }
    }
}
