package breakwater.scenario;

import java.util.Objects;

/**
 * A placement region (docs/network-model.md#placement-regions): where on the board a group of parts sits,
 * its spreading path to the board node (where the package connects), and its own room.
 *
 * @param name           the region's name, the TOML table name in {@code [region.NAME]}
 * @param resistanceOhms spreading resistance to the board node, &ge; 0
 * @param inductanceH    spreading inductance to the board node, &ge; 0
 * @param room           the region's own limits: {@code max_parts} and {@code max_per_case}
 *                       ({@link Board#maxDistinct()} is always −1 here)
 */
public record Region(String name, double resistanceOhms, double inductanceH, Board room) {
    public Region {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(room, "room");
        if (!(resistanceOhms >= 0) || !Double.isFinite(resistanceOhms)
                || !(inductanceH >= 0) || !Double.isFinite(inductanceH)) {
            throw new IllegalArgumentException("region " + name + ": spreading R and L must be finite and >= 0");
        }
    }
}
