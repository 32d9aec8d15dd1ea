package breakwater.catalog;

import java.util.Objects;

/** A number of identical parts placed in parallel. */
public record BankEntry(Part part, int count) {
    /**
     * The most parts of one type a bank may hold (catalog {@code max_count}, a bank file's count): far more
     * than any board carries, small enough that a bank of {@link Catalog#MAX_PARTS} types at this count
     * still totals less than {@link Integer#MAX_VALUE}, so every sum of counts is exact.
     */
    public static final int MAX_COUNT = 100_000;

    public BankEntry {
        Objects.requireNonNull(part, "part");
        if (count < 0 || count > MAX_COUNT) {
            throw new IllegalArgumentException("count must be in 0 .. " + MAX_COUNT + ", got " + count);
        }
    }
}
