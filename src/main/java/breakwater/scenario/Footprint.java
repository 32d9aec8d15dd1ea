package breakwater.scenario;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;

/**
 * A layout option: mounting inductance per EIA case code, overriding the catalog's column for parts of
 * those cases. Cases not listed keep the catalog value.
 */
public record Footprint(String name, Map<String, Double> mountInductanceByCaseH) {
    public Footprint {
        Objects.requireNonNull(name, "name");
        // in the order given (file order), like every map of the scenario
        mountInductanceByCaseH = Collections.unmodifiableMap(new LinkedHashMap<>(mountInductanceByCaseH));
        for (var e : mountInductanceByCaseH.entrySet()) {
            if (!(e.getValue() >= 0)) {
                throw new IllegalArgumentException("footprint " + name + ": mounting inductance for "
                        + e.getKey() + " must be >= 0");
            }
        }
    }
}
