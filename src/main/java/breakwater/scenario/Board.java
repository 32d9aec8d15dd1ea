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

    public Board {
        maxPerCase = Collections.unmodifiableMap(new LinkedHashMap<>(maxPerCase));
        if (maxParts < -1 || maxDistinct < -1) {
            throw new IllegalArgumentException("board limits must be >= 0");
        }
        for (var e : maxPerCase.entrySet()) {
            if (e.getValue() < 0) {
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
