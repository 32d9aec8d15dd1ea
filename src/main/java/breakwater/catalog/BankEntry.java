package breakwater.catalog;

import java.util.Objects;

/**
 * A number of identical parts placed in parallel.
 *
 * @param part   the catalog part
 * @param count  how many, 0 … {@link #MAX_COUNT}
 * @param region the placement region they sit in (docs/network-model.md#placement-regions), or "" when the
 *               scenario declares none (the board node)
 */
public record BankEntry(Part part, int count, String region) {
    /**
     * The most parts of one type a bank may hold (catalog {@code max_count}, a bank file's count): far more
     * than any board carries, small enough that a bank of {@link Catalog#MAX_PARTS} types at this count
     * still totals less than {@link Integer#MAX_VALUE}, so every sum of counts is exact.
     */
    public static final int MAX_COUNT = 100_000;

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
        if (count < 0 || count > MAX_COUNT) {
            throw new IllegalArgumentException("count must be in 0 .. " + MAX_COUNT + ", got " + count);
        }
    }
}
