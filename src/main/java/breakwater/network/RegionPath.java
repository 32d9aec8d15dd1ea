package breakwater.network;

import java.util.List;
import java.util.Objects;

/**
 * A placement region (docs/network-model.md#placement-regions): the parts placed there, behind the plane's
 * spreading path R + sL from the board node (where the package connects) to the region's own node.
 * A region with R = L = 0 is the board node itself.
 *
 * @param name           the region's name in the scenario, for reports and exported decks
 * @param resistanceOhms spreading resistance to the board node, &ge; 0
 * @param inductanceH    spreading inductance to the board node, &ge; 0
 * @param branches       shunt branches at the region's node (one per part type placed there)
 */
public record RegionPath(String name, double resistanceOhms, double inductanceH, List<SeriesBranch> branches) {

    public RegionPath {
        Objects.requireNonNull(name, "name");
        branches = List.copyOf(branches);
        if (!(resistanceOhms >= 0) || !Double.isFinite(resistanceOhms)
                || !(inductanceH >= 0) || !Double.isFinite(inductanceH)) {
            throw new IllegalArgumentException("region " + name + ": spreading R and L must be finite and >= 0");
        }
    }

    /** Whether the path is a short (R = L = 0): its branches then sit on the board node itself. */
    public boolean isShort() {
        return resistanceOhms == 0.0 && inductanceH == 0.0;
    }

    /**
     * Adds to {@code acc} (real, imaginary) the admittance that a node of admittance g = gr + j·gi presents
     * through a series path q = qr + j·qi: y = g / (1 + g·q), written so it stays defined where g = 0.
     */
    static void addBehindPath(double gr, double gi, double qr, double qi, double[] acc) {
        double dr = 1 + gr * qr - gi * qi;
        double di = gr * qi + gi * qr;
        double md = dr * dr + di * di;
        acc[0] += (gr * dr + gi * di) / md;
        acc[1] += (gi * dr - gr * di) / md;
    }

    /** The same path holding {@code newBranches}. */
    public RegionPath withBranches(List<SeriesBranch> newBranches) {
        return new RegionPath(name, resistanceOhms, inductanceH, newBranches);
    }
}
