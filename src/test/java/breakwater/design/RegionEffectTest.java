package breakwater.design;

import breakwater.catalog.BankEntry;
import breakwater.network.NetworkBuilder;
import breakwater.network.PowerNetwork;
import breakwater.scenario.Scenario;
import breakwater.scenario.ScenarioReader;
import breakwater.catalog.CatalogReader;
import breakwater.catalog.Catalog;
import org.junit.jupiter.api.Test;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** {@link RegionEffect}: |Z| at each peak with one region's parts removed, against the network built without them. */
class RegionEffectTest {

    @Test
    void eachEffectIsTheImpedanceOfTheBankWithoutThatRegionsParts() throws Exception {
        Path root = Path.of("").toAbsolutePath();
        String text = Files.readString(root.resolve("scenarios/drone-core.toml"))
                + "\n[region.near]\nresistance = \"0.05 mOhm\"\ninductance = \"10 pH\"\n"
                + "[region.far]\nresistance = \"0.3 mOhm\"\ninductance = \"300 pH\"\n";
        Scenario s = ScenarioReader.parse(text, root.resolve("scenarios"), "placed.toml");
        Catalog catalog = CatalogReader.read(s.catalogFile(), "general-purpose.csv");
        List<BankEntry> bank = List.of(
                new BankEntry(catalog.find("C0201-X5R-100N-10").orElseThrow(), 20, "near"),
                new BankEntry(catalog.find("C0402-X5R-1U0-10").orElseThrow(), 12, "near"),
                new BankEntry(catalog.find("C0805-X5R-22U-6V3").orElseThrow(), 6, "far"),
                new BankEntry(catalog.find("BWP-D-330U-2V5").orElseThrow(), 3, "far"));
        Evaluation e = new BankEvaluator(s, Optional.empty()).evaluate(new CapacitorBank(bank));
        List<List<RegionEffect>> effects = RegionEffect.of(e);
        assertThat(effects).hasSize(e.impedance().antiResonances().size()).isNotEmpty();
        for (List<RegionEffect> row : effects) {
            assertThat(row).extracting(RegionEffect::region).containsExactly("near", "far");
            for (RegionEffect x : row) {
                PowerNetwork without = NetworkBuilder.build(s,
                        bank.stream().filter(b -> !b.region().equals(x.region())).toList(), Optional.empty());
                double expected = without.magnitude(x.frequencyHz());
                assertThat(x.withoutOhms()).isCloseTo(expected, within(1e-12 * expected));
                assertThat(x.withOhms()).isCloseTo(e.network().magnitude(x.frequencyHz()), within(1e-15));
            }
        }
    }
}
