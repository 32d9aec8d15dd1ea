package breakwater.scenario;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.OptionalInt;

/**
 * Limits the board puts on the bank.
 *
 * @param maxParts    most parts in total, or -1 for no limit
 * @param maxDistinct most distinct part types, or -1 for no limit
 * @param maxPerCase  most parts per EIA case code (keys are strings such as "0402"), in the order given (file
 *                    order), so that the limits and what breaks them are listed the same way on every run
 */
public record Board(int maxParts, int maxDistinct, Map<String, Integer> maxPerCase) {
    public static final Board UNLIMITED = new Board(-1, -1, Map.of());

    /**
     * The largest {@code max_parts} and {@code max_per_case} accepted: a million parts, more than any one
     * rail of any board carries. A larger limit would limit nothing and only hides a typing slip.
     */
    public static final int MAX_PARTS = 1_000_000;
    /** The largest {@code max_distinct} accepted: as many part types as a catalog may list. */
    public static final int MAX_DISTINCT = 20_000;

    public Board {
        maxPerCase = Collections.unmodifiableMap(new LinkedHashMap<>(maxPerCase));
        if (maxParts < -1 || maxDistinct < -1 || maxParts > MAX_PARTS || maxDistinct > MAX_DISTINCT) {
            throw new IllegalArgumentException("board limits must be in 0 .. " + MAX_PARTS + " (types: "
                    + MAX_DISTINCT + ")");
        }
        for (var e : maxPerCase.entrySet()) {
            if (e.getValue() < 0 || e.getValue() > MAX_PARTS) {
                throw new IllegalArgumentException("max_per_case." + e.getKey() + " must be >= 0");
            }
        }
    }

    public OptionalInt maxPartsLimit() {
        return maxParts < 0 ? OptionalInt.empty() : OptionalInt.of(maxParts);
    }

    public OptionalInt maxDistinctLimit() {
        return maxDistinct < 0 ? OptionalInt.empty() : OptionalInt.of(maxDistinct);
    }
}
