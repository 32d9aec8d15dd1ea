package breakwater.network;

import breakwater.catalog.BankEntry;
import breakwater.scenario.Die;
import breakwater.scenario.Footprint;
import breakwater.scenario.Region;
import breakwater.scenario.PackagePath;
import breakwater.scenario.Plane;
import breakwater.scenario.Scenario;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/** Builds the {@link PowerNetwork} of a scenario with a given bank (docs/network-model.md#the-lumped-network). */
public final class NetworkBuilder {
    private NetworkBuilder() {
    }

    /**
     * The network of {@code scenario} with {@code bank} on the board node (or, when the scenario declares
     * placement regions, each entry in its region behind that region's spreading path), mounting inductances taken from
     * {@code footprint} where it lists a part's case. The plane sits at the board node; the die at the load
     * node behind the package, or at the board node when there is no package.
     */
    public static PowerNetwork build(Scenario scenario, List<BankEntry> bank, Optional<Footprint> footprint) {
        return build(scenario, bank, footprint, scenario.plane(), scenario.packagePath(), scenario.die());
    }

    /** As {@link #build(Scenario, List, Optional)} with the given plane, package and die instead of the scenario's. */
    public static PowerNetwork build(Scenario scenario, List<BankEntry> bank, Optional<Footprint> footprint,
                                     Plane plane, PackagePath packagePath, Die die) {
        List<SeriesBranch> board = new ArrayList<>();
        List<SeriesBranch> load = new ArrayList<>();
        if (plane.isPresent()) {
            board.add(new SeriesBranch("plane", plane.resistanceOhms(), 0.0, plane.capacitanceF()));
        }
        List<RegionPath> regions = new ArrayList<>();
        for (Region r : scenario.regions()) {
            List<SeriesBranch> here = new ArrayList<>();
            for (BankEntry e : bank) {
                if (e.count() > 0 && e.region().equals(r.name())) {
                    here.add(PartBranches.single(e.part(), footprint).parallel(e.count()));
                }
            }
            regions.add(new RegionPath(r.name(), r.resistanceOhms(), r.inductanceH(), here));
        }
        for (BankEntry e : bank) {
            if (e.count() > 0 && scenario.region(e.region()).isEmpty()) {
                if (!e.region().isEmpty() || !scenario.regions().isEmpty()) {
                    throw new IllegalArgumentException(e.part().name() + ": placed in region '" + e.region()
                            + "', the scenario's regions are " + scenario.regionNames());
                }
                board.add(PartBranches.single(e.part(), footprint).parallel(e.count()));
            }
        }
        boolean hasPackage = packagePath.present();
        if (die.isPresent()) {
            SeriesBranch dieBranch = new SeriesBranch("die", die.resistanceOhms(), 0.0, die.capacitanceF());
            (hasPackage ? load : board).add(dieBranch);
        }
        return new PowerNetwork(scenario.regulator().resistanceOhms(), scenario.regulator().inductanceH(),
                board, hasPackage,
                hasPackage ? packagePath.resistanceOhms() : 0.0,
                hasPackage ? packagePath.inductanceH() : 0.0,
                load, regions);
    }
}
