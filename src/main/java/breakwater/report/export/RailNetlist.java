package breakwater.report.export;

import breakwater.catalog.BankEntry;
import breakwater.catalog.Part;
import breakwater.network.PartBranches;
import breakwater.network.PowerNetwork;
import breakwater.network.SeriesBranch;
import breakwater.scenario.Footprint;

import java.util.List;
import java.util.Optional;

/**
 * The lumped network of a judged bank as a SPICE3 subcircuit, element for element as Breakwater models
 * it (README, "The model"):
 * <pre>
 * Vreg ─ R_reg ─ L_reg ─┬─ board ─ R_pkg ─ L_pkg ─┬─ load
 *                       │                         │
 *              plane, one branch per part type    die
 * </pre>
 * The ideal DC source at V_nom stands for the regulator's set point; R_reg and L_reg are its output
 * impedance above its loop bandwidth. Each part type is its n parallel copies folded into one series
 * R–L–C branch (R/n, L/n, n·C), with a comment giving the per-part values. Without a package the load
 * node is the board node and is named {@code load}.
 *
 * <p>Ports: {@value #LOAD} and {@value #GROUND}. Node names: {@value #REGULATOR} (the source's
 * terminal), {@value #BOARD} (the bank's node, when a package separates it from the load), {@value #LOAD};
 * inside a branch {@code TAG_l} and {@code TAG_c}; a placement region behind a spreading path
 * (docs/network-model.md#placement-regions) is its path {@code pathK} from the board node to its own
 * node {@code regionK}, then its branches as {@link #shunt}s there (a region with a short path puts its
 * branches on the board node).
 */
final class RailNetlist {
    static final String SUBCIRCUIT = "rail";
    static final String LOAD = "load";
    static final String GROUND = "gnd";
    static final String BOARD = "board";
    static final String REGULATOR = "reg";

    private RailNetlist() {
    }

    /**
     * The subcircuit of {@code network}; {@code bank} and {@code footprint} supply the per-part values for
     * the comments (each bank branch of the network is matched to its part by name and checked to be that
     * part's folded branch).
     *
     * @param footprintName the footprint's name for the comments, "" for the catalog's mounting inductances
     */
    static List<String> subcircuit(PowerNetwork network, double nominalV, List<BankEntry> bank,
                                   Optional<Footprint> footprint, String footprintName) {
        SpiceNetlist n = new SpiceNetlist();
        String boardNode = network.hasPackage() ? BOARD : LOAD;
        n.comment("The rail as Breakwater models it. Ports: " + LOAD + " (the load node), " + GROUND + " (ground).");
        n.comment("Plain SI values: ohms, henries, farads, volts.");
        n.line(".subckt " + SUBCIRCUIT + " " + LOAD + " " + GROUND);
        n.comment("Regulator: ideal DC source at V_nom behind R_reg and L_reg, its output impedance above its "
                + "loop bandwidth (the loop itself is not modelled).");
        n.line(n.declare("Vreg") + " " + REGULATOR + " " + GROUND + " DC " + SpiceNetlist.number(nominalV));
        n.series("reg", REGULATOR, boardNode, network.regulatorResistanceOhms(), network.regulatorInductanceH(), 0);
        // numbers of the part branches (b1, b2, …) and of the other branches (s1, …) written so far
        int[] numbers = new int[2];
        n.comment("Branches at the " + (network.hasPackage() ? "board node (" + BOARD + ")" : "board node, which is the "
                + "load node here (no package)") + ":");
        shunts(n, boardNode, network.boardBranches(), bank, footprint, footprintName, numbers);
        int regionNo = 0;
        for (breakwater.network.RegionPath r : network.regions()) {
            if (r.branches().isEmpty()) {
                continue;
            }
            regionNo++;
            String node = r.isShort() ? boardNode : "region" + regionNo;
            if (r.isShort()) {
                n.comment("Region " + r.name() + ": no spreading path (R = L = 0), its parts sit at the board node:");
            } else {
                n.comment("Region " + r.name() + " (node " + node + "): spreading path from the board node, R = "
                        + SpiceNetlist.number(r.resistanceOhms()) + " Ohm, L = " + SpiceNetlist.number(r.inductanceH())
                        + " H, then its parts:");
                n.series("path" + regionNo, boardNode, node, r.resistanceOhms(), r.inductanceH(), 0);
            }
            shunts(n, node, r.branches(), bank, footprint, footprintName, numbers);
        }
        if (network.hasPackage()) {
            n.comment("Package path from the board node to the load node: R_pkg, L_pkg.");
            n.series("pkg", BOARD, LOAD, network.packageResistanceOhms(), network.packageInductanceH(), 0);
            n.comment("Branches at the load node (" + LOAD + "):");
            for (SeriesBranch b : network.loadBranches()) {
                numbers[1]++;
                shunt(n, describeOther(n, b, "s" + numbers[1]), LOAD, b);
            }
        }
        n.line(".ends " + SUBCIRCUIT);
        return n.lines();
    }

    /**
     * The branches at {@code node}, each described by a comment: a bank part's folded branch with its
     * per-part values, or another branch (plane, die) by what it is; {@code numbers} counts both kinds.
     */
    private static void shunts(SpiceNetlist n, String node, List<SeriesBranch> branches, List<BankEntry> bank,
                               Optional<Footprint> footprint, String footprintName, int[] numbers) {
        for (SeriesBranch b : branches) {
            Optional<BankEntry> part = partOf(b, bank, footprint);
            if (part.isPresent()) {
                numbers[0]++;
                describePart(n, "b" + numbers[0], part.get(), footprint, footprintName);
                shunt(n, "b" + numbers[0], node, b);
            } else {
                numbers[1]++;
                shunt(n, describeOther(n, b, "s" + numbers[1]), node, b);
            }
        }
    }

    /** A shunt branch R + sL + 1/(sC) from {@code node} to ground, zero-valued R or L left out. */
    static void shunt(SpiceNetlist n, String tag, String node, SeriesBranch b) {
        n.series(tag, node, GROUND, b.resistanceOhms(), b.inductanceH(), b.capacitanceF());
    }

    private static String describeOther(SpiceNetlist n, SeriesBranch b, String fallbackTag) {
        String tag = switch (b.label()) {
            case "plane" -> "plane";
            case "die" -> "die";
            default -> fallbackTag;
        };
        String what = switch (b.label()) {
            case "plane" -> "Plane capacitance with its series resistance";
            case "die" -> "On-die capacitance with its grid resistance";
            default -> "Branch " + b.label();
        };
        n.comment(tag + ": " + what + ": R = " + SpiceNetlist.number(b.resistanceOhms()) + " Ohm, L = "
                + SpiceNetlist.number(b.inductanceH()) + " H, C = " + SpiceNetlist.number(b.capacitanceF()) + " F.");
        return tag;
    }

    private static void describePart(SpiceNetlist n, String tag, BankEntry e, Optional<Footprint> footprint,
                                     String footprintName) {
        Part p = e.part();
        int count = e.count();
        double mount = PartBranches.mountInductanceH(p, footprint);
        boolean fromFootprint = footprint.isPresent() && footprint.get().mountInductanceByCaseH().containsKey(p.caseCode());
        n.comment(tag + ": " + count + " x " + p.name() + (p.caseCode().isEmpty() ? "" : " (case " + p.caseCode() + ")")
                + (count == 1 ? ", one part: R = ESR, L = ESL + L_mount, C = C_eff."
                : " in parallel, folded into one branch: R = ESR/" + count + ", L = (ESL + L_mount)/" + count
                + ", C = " + count + " * C_eff."));
        n.comment("    per part: C_eff = " + SpiceNetlist.number(p.effectiveCapacitanceF()) + " F (nominal "
                + SpiceNetlist.number(p.capacitanceF()) + " F x DC-bias retention "
                + SpiceNetlist.number(p.dcBiasRetention()) + "), ESR = " + SpiceNetlist.number(p.esrOhms())
                + " Ohm, ESL = " + SpiceNetlist.number(p.eslH()) + " H, L_mount = " + SpiceNetlist.number(mount)
                + " H (" + (fromFootprint ? "footprint " + footprintName : "catalog value") + "), count " + count + ".");
    }

    /** The bank entry whose folded branch {@code b} is, if any. */
    static Optional<BankEntry> partOf(SeriesBranch b, List<BankEntry> bank, Optional<Footprint> footprint) {
        for (BankEntry e : bank) {
            if (e.count() > 0 && e.part().name().equals(b.label())
                    && PartBranches.single(e.part(), footprint).parallel(e.count()).equals(b)) {
                return Optional.of(e);
            }
        }
        return Optional.empty();
    }
}
