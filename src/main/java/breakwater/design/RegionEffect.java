package breakwater.design;

import breakwater.network.AntiResonance;
import breakwater.network.PowerNetwork;
import breakwater.network.RegionPath;

import java.util.ArrayList;
import java.util.List;

/**
 * How much each placement region's parts hold down an anti-resonance
 * (docs/network-model.md#placement-regions): |Z| at the peak's frequency with that region's parts removed
 * (its spreading path then carries nothing), against |Z| with every part in place.
 *
 * @param region           the region's name
 * @param frequencyHz      the anti-resonance's frequency
 * @param withOhms         |Z| there with the whole bank
 * @param withoutOhms      |Z| there with this region's parts removed
 */
public record RegionEffect(String region, double frequencyHz, double withOhms, double withoutOhms) {

    /** |Z| without the region over |Z| with it: how many times higher the peak would stand without it. */
    public double rise() {
        return withoutOhms / withOhms;
    }

    /**
     * For each anti-resonance of {@code e} (outer list, same order as {@code e.impedance().antiResonances()}),
     * one effect per region of the network that holds parts (inner list, in region order); empty lists
     * without regions.
     */
    public static List<List<RegionEffect>> of(Evaluation e) {
        PowerNetwork n = e.network();
        List<List<RegionEffect>> out = new ArrayList<>();
        for (AntiResonance a : e.impedance().antiResonances()) {
            List<RegionEffect> row = new ArrayList<>();
            double with = n.magnitude(a.frequencyHz());
            for (int r = 0; r < n.regions().size(); r++) {
                RegionPath region = n.regions().get(r);
                if (region.branches().isEmpty()) {
                    continue;
                }
                List<RegionPath> without = new ArrayList<>(n.regions());
                without.set(r, region.withBranches(List.of()));
                PowerNetwork m = new PowerNetwork(n.regulatorResistanceOhms(), n.regulatorInductanceH(),
                        n.boardBranches(), n.hasPackage(), n.packageResistanceOhms(), n.packageInductanceH(),
                        n.loadBranches(), without);
                row.add(new RegionEffect(region.name(), a.frequencyHz(), with, m.magnitude(a.frequencyHz())));
            }
            out.add(row);
        }
        return out;
    }
}
