package breakwater.network;

import java.util.List;
import java.util.Objects;

/**
 * The lumped small-signal power network (docs/network-model.md#the-lumped-network), seen from the load:
 * <pre>
 * regulator ─ R_reg ─ L_reg ─┬─ board node ─ R_pkg ─ L_pkg ─┬─ load node
 *                            │                               │
 *                            ├─ boardBranches           loadBranches
 *                            └─ R_r ─ L_r ─ region node ─ its branches   (per region)
 * </pre>
 * The regulator's far end is AC ground. Without a package the load node is the board node and
 * {@code loadBranches} is empty (the die, if any, is then one of the board branches). Regions
 * (docs/network-model.md#placement-regions) hang off the board node through their spreading paths; a
 * region with no branches carries no current and is left out of every computation, and a region whose
 * path is a short (R = L = 0) is the board node itself ({@link #boardNodeBranches}).
 *
 * @param regulatorResistanceOhms R_reg &ge; 0
 * @param regulatorInductanceH    L_reg &ge; 0 (not both zero)
 * @param boardBranches           shunt branches at the board node: plane, bank (one branch per part type)
 * @param hasPackage              whether a package path separates board and load node
 * @param packageResistanceOhms   R_pkg &ge; 0
 * @param packageInductanceH      L_pkg &ge; 0
 * @param loadBranches            shunt branches at the load node (the die); empty without a package
 * @param regions                 placement regions behind their spreading paths (empty: every part on the
 *                                board node, as {@code boardBranches})
 */
public record PowerNetwork(
        double regulatorResistanceOhms,
        double regulatorInductanceH,
        List<SeriesBranch> boardBranches,
        boolean hasPackage,
        double packageResistanceOhms,
        double packageInductanceH,
        List<SeriesBranch> loadBranches,
        List<RegionPath> regions) {

    /** A network without placement regions: every shunt branch at the board or load node. */
    public PowerNetwork(double regulatorResistanceOhms, double regulatorInductanceH, List<SeriesBranch> boardBranches,
                        boolean hasPackage, double packageResistanceOhms, double packageInductanceH,
                        List<SeriesBranch> loadBranches) {
        this(regulatorResistanceOhms, regulatorInductanceH, boardBranches, hasPackage, packageResistanceOhms,
                packageInductanceH, loadBranches, List.of());
    }

    public PowerNetwork {
        boardBranches = List.copyOf(boardBranches);
        loadBranches = List.copyOf(loadBranches);
        regions = List.copyOf(regions);
        if (!(regulatorResistanceOhms >= 0) || !(regulatorInductanceH >= 0)
                || (regulatorResistanceOhms == 0 && regulatorInductanceH == 0)) {
            throw new IllegalArgumentException("regulator needs R >= 0, L >= 0, not both zero");
        }
        if (!(packageResistanceOhms >= 0) || !(packageInductanceH >= 0)) {
            throw new IllegalArgumentException("package R and L must be >= 0");
        }
        if (!hasPackage && (!loadBranches.isEmpty() || packageResistanceOhms != 0 || packageInductanceH != 0)) {
            throw new IllegalArgumentException("without a package the load node is the board node: "
                    + "put every branch on the board");
        }
        Objects.requireNonNull(boardBranches);
    }

    /**
     * Every branch electrically at the board node: {@code boardBranches}, then the branches of each region
     * whose path is a short (R = L = 0), in region order.
     */
    public List<SeriesBranch> boardNodeBranches() {
        if (regions.isEmpty()) {
            return boardBranches;
        }
        java.util.ArrayList<SeriesBranch> all = new java.util.ArrayList<>(boardBranches);
        for (RegionPath r : regions) {
            if (r.isShort()) {
                all.addAll(r.branches());
            }
        }
        return List.copyOf(all);
    }

    /** The regions behind a real spreading path (R or L &gt; 0) that hold at least one branch. */
    public List<RegionPath> spreadRegions() {
        if (regions.isEmpty()) {
            return regions;
        }
        return regions.stream().filter(r -> !r.isShort() && !r.branches().isEmpty()).toList();
    }

    /**
     * Resistance at DC, Z(0) = R_reg + R_pkg: every shunt branch holds a capacitor, so no DC current
     * flows in it (docs/network-model.md#dc-and-summing-admittances).
     */
    public double dcResistanceOhms() {
        return regulatorResistanceOhms + (hasPackage ? packageResistanceOhms : 0.0);
    }

    /**
     * Whether Z(∞) is finite: a branch with a capacitance and no series inductance sits directly at the
     * load node. Then Z(∞) is the parallel combination of those branches' resistances.
     */
    public boolean hasFiniteHighFrequencyLimit() {
        boolean boardFinite = regulatorInductanceH == 0.0
                || boardNodeBranches().stream().anyMatch(b -> b.inductanceH() == 0.0)
                || spreadRegions().stream().anyMatch(r -> r.inductanceH() == 0.0
                        && r.branches().stream().anyMatch(b -> b.inductanceH() == 0.0));
        if (!hasPackage) {
            return boardFinite;
        }
        return loadBranches.stream().anyMatch(b -> b.inductanceH() == 0.0) || (packageInductanceH == 0.0 && boardFinite);
    }

    /** The branches directly at the load node (the board node's when there is no package). */
    public List<SeriesBranch> loadNodeBranches() {
        return hasPackage ? loadBranches : boardNodeBranches();
    }

    /**
     * Impedance at the load node at {@code frequencyHz}, written to {@code out[0]} (real, Ω) and
     * {@code out[1]} (imaginary, Ω). f = 0 is handled explicitly: Z(0) = R_reg + R_pkg.
     * Admittances are summed; no complex division by zero is attempted.
     */
    public void impedance(double frequencyHz, double[] out) {
        if (frequencyHz == 0.0) {
            out[0] = dcResistanceOhms();
            out[1] = 0.0;
            return;
        }
        if (!(frequencyHz > 0) || !Double.isFinite(frequencyHz)) {
            throw new IllegalArgumentException("frequency must be >= 0 and finite, got " + frequencyHz);
        }
        double w = 2 * Math.PI * frequencyHz;
        double[] y = new double[2];
        // regulator branch R + jωL (never zero here: R > 0 or ωL > 0)
        double yr = 0;
        double yi = 0;
        {
            double r = regulatorResistanceOhms;
            double x = w * regulatorInductanceH;
            double m = r * r + x * x;
            yr += r / m;
            yi += -x / m;
        }
        for (SeriesBranch b : boardNodeBranches()) {
            b.admittance(w, y);
            yr += y[0];
            yi += y[1];
        }
        for (RegionPath r : spreadRegions()) {
            // the region's node admittance Y_r behind its path Q = R + jωL: y = Y_r / (1 + Y_r·Q)
            double gr = 0;
            double gi = 0;
            for (SeriesBranch b : r.branches()) {
                b.admittance(w, y);
                gr += y[0];
                gi += y[1];
            }
            double[] acc = {yr, yi};
            RegionPath.addBehindPath(gr, gi, r.resistanceOhms(), w * r.inductanceH(), acc);
            yr = acc[0];
            yi = acc[1];
        }
        double zr;
        double zi;
        {
            double m = yr * yr + yi * yi;
            zr = yr / m;
            zi = -yi / m;
        }
        if (hasPackage) {
            zr += packageResistanceOhms;
            zi += w * packageInductanceH;
            double m = zr * zr + zi * zi;
            yr = zr / m;
            yi = -zi / m;
            for (SeriesBranch b : loadBranches) {
                b.admittance(w, y);
                yr += y[0];
                yi += y[1];
            }
            m = yr * yr + yi * yi;
            zr = yr / m;
            zi = -yi / m;
        }
        out[0] = zr;
        out[1] = zi;
    }

    /**
     * The board node's admittance without any bank or region at ω: the regulator's branch, then
     * {@code boardBranches} (the plane, the die without a package), summed in that order, into
     * {@code out[0]} (real) and {@code out[1]} (imaginary). The fast engine and the bound over every bank
     * start from it.
     */
    public void fixedBoardAdmittance(double omega, double[] out) {
        double r = regulatorResistanceOhms;
        double x = omega * regulatorInductanceH;
        double m = r * r + x * x;
        double yr = r / m;
        double yi = -x / m;
        double[] y = new double[2];
        for (SeriesBranch b : boardBranches) {
            b.admittance(omega, y);
            yr += y[0];
            yi += y[1];
        }
        out[0] = yr;
        out[1] = yi;
    }

    /** Σ of {@code loadBranches}' admittances at ω (0 without a package), into {@code out}. */
    public void loadAdmittance(double omega, double[] out) {
        double yr = 0;
        double yi = 0;
        double[] y = new double[2];
        for (SeriesBranch b : loadBranches) {
            b.admittance(omega, y);
            yr += y[0];
            yi += y[1];
        }
        out[0] = yr;
        out[1] = yi;
    }

    /** |Z| at the load node, Ω. */
    public double magnitude(double frequencyHz) {
        double[] z = new double[2];
        impedance(frequencyHz, z);
        return Math.hypot(z[0], z[1]);
    }
}
