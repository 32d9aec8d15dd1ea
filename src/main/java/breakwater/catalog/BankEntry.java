package breakwater.catalog;

import java.util.Objects;

/**
 * A number of identical parts placed in parallel.
 *
 * @param part   the catalog part
 * @param count  how many, &ge; 0
 * @param region the placement region they sit in (docs/network-model.md#placement-regions), or "" when the
 *               scenario declares none (the board node)
 */
public record BankEntry(Part part, int count, String region) {

    /** Parts on the board node (no placement regions). */
    public BankEntry(Part part, int count) {
        this(part, count, "");
    }

    /** The same parts in {@code newRegion}. */
    public BankEntry inRegion(String newRegion) {
        return new BankEntry(part, count, newRegion);
    }

    /** The same part and region with {@code newCount}. */
    public BankEntry withCount(int newCount) {
        return new BankEntry(part, newCount, region);
    }

    public BankEntry {
        Objects.requireNonNull(part, "part");
        Objects.requireNonNull(region, "region");
        if (count < 0) {
            throw new IllegalArgumentException("count must be >= 0, got " + count);
        }
    }
}
