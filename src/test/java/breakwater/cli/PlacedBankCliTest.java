package breakwater.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import breakwater.cli.CliTest.Run;

import static breakwater.cli.CliTest.run;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** check on a placed bank (docs/network-model.md#placement-regions), through the command line in-process. */
class PlacedBankCliTest {

    /** Three invented regions (common-practice orders of magnitude for a core rail's layout). */
    static final String REGIONS = """

            [region.under-package]          # back side, under the ball field
            resistance = "%s"
            inductance = "%s"
            max_parts = 40
            [region.under-package.max_per_case]
            0201 = 30
            0402 = 16

            [region.ring]                   # around the package, top side
            resistance = "%s"
            inductance = "%s"
            max_parts = 80

            [region.bulk]                   # beside the regulator
            resistance = "%s"
            inductance = "%s"
            """;

    static final String PLACED_BANK = """
            part,count,region
            BWP-D-330U-2V5,3,bulk
            C0805-X5R-22U-6V3,6,ring
            C0603-X5R-10U-6V3,6,ring
            C0402-X5R-1U0-10,8,under-package
            C0402-X5R-1U0-10,12,ring
            C0201-X5R-100N-10,24,under-package
            """;

    /** The drone-core demo scenario with the regions appended (inductances given), catalog path made absolute. */
    static Path scenario(Path dir, String l1, String l2, String l3) throws IOException {
        return scenario(dir, "0.05 mOhm", l1, "0.1 mOhm", l2, "0.3 mOhm", l3);
    }

    static Path scenario(Path dir, String r1, String l1, String r2, String l2, String r3, String l3) throws IOException {
        String text = Files.readString(CliTest.DEMO)
                .replace("../parts-catalog/general-purpose.csv",
                        CliTest.ROOT.resolve("parts-catalog/general-purpose.csv").toString().replace("\\", "/"))
                .replace("file = \"drone-core.bank.csv\"", "file = \"" + CliTest.DEMO_BANK.toString().replace("\\", "/") + "\"");
        Path p = dir.resolve("placed.toml");
        Files.writeString(p, text + REGIONS.formatted(r1, l1, r2, l2, r3, l3));
        return p;
    }

    static Path bank(Path dir, String text) throws IOException {
        Path p = dir.resolve("placed.bank.csv");
        Files.writeString(p, text);
        return p;
    }

    @Test
    void checkShowsThePlacementInEveryOutputAndTheBomReadsBack(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("out");
        Run r = run("check", scenario(dir, "8 pH", "40 pH", "250 pH").toString(), "--bank",
                bank(dir, PLACED_BANK).toString(), "--out", out.toString(), "--quiet");
        assertThat(r.code()).as(r.err()).isIn(ExitCodes.OK, ExitCodes.SPEC_NOT_MET);
        JsonNode s = new ObjectMapper().readTree(out.resolve("summary.json").toFile());
        assertThat(s.path("bank").size()).isEqualTo(6);
        assertThat(s.path("bank").get(3).path("region").asText()).isEqualTo("under-package");
        JsonNode regions = s.path("regions");
        assertThat(regions.size()).isEqualTo(3);
        assertThat(regions.get(0).path("name").asText()).isEqualTo("under-package");
        assertThat(regions.get(0).path("parts").asInt()).isEqualTo(32);
        assertThat(regions.get(0).path("per_case").path("0201").path("placed").asInt()).isEqualTo(24);
        assertThat(regions.get(1).path("parts").asInt()).isEqualTo(24);
        assertThat(regions.get(2).path("inductance_h").asDouble()).isCloseTo(250e-12, within(1e-24));
        assertThat(s.path("total_parts").asInt()).isEqualTo(59);
        assertThat(s.path("distinct_parts").asInt()).isEqualTo(5);
        String bom = Files.readString(out.resolve("bom.csv"));
        assertThat(bom.lines().findFirst().orElseThrow()).endsWith(",region");
        // per anti-resonance, |Z| with each region's parts removed; the report's placement view
        JsonNode without = s.path("anti_resonances").get(0).path("impedance_without_region_ohm");
        assertThat(without.size()).isEqualTo(3);
        assertThat(without.path("bulk").asDouble()).isPositive();
        String report = Files.readString(out.resolve("report.html"));
        assertThat(report).contains("<h2>Placement</h2>").contains("32 parts of 40").contains("case 0201: 24 of 30")
                .contains("without under-package");
        Run again = run("check", dir.resolve("placed.toml").toString(), "--bank", out.resolve("bom.csv").toString(),
                "--json");
        JsonNode second = new ObjectMapper().readTree(again.out());
        assertThat(second.path("bank")).isEqualTo(s.path("bank"));
        assertThat(second.path("worst_case").path("droop_v").asDouble())
                .isEqualTo(s.path("worst_case").path("droop_v").asDouble());
    }

    /**
     * With every spreading path a short the placed bank is the single-node bank: the same worst case and
     * peak as the demo's own bank on the demo scenario, to 1e-12 relative; with real paths the worst
     * droop grows (the spreading inductance adds to each part's).
     */
    @Test
    void shortPathsGiveTheSingleNodeResultsAndRealPathsCostDroop(@TempDir Path dir) throws IOException {
        Run flat = run("check", CliTest.DEMO.toString(), "--bank", CliTest.DEMO_BANK.toString(), "--json");
        Path zeroDir = Files.createDirectory(dir.resolve("zero"));
        Run zero = run("check", scenario(zeroDir, "0 Ohm", "0 H", "0 Ohm", "0 H", "0 Ohm", "0 H").toString(), "--bank",
                bank(zeroDir, PLACED_BANK).toString(), "--json");
        Run real = run("check", scenario(dir, "8 pH", "40 pH", "250 pH").toString(), "--bank",
                bank(dir, PLACED_BANK).toString(), "--json");
        JsonNode f = new ObjectMapper().readTree(flat.out());
        JsonNode z = new ObjectMapper().readTree(zero.out());
        JsonNode p = new ObjectMapper().readTree(real.out());
        double droop = f.path("worst_case").path("droop_v").asDouble();
        assertThat(z.path("worst_case").path("droop_v").asDouble()).isCloseTo(droop, within(1e-12 * droop));
        double peak = f.path("impedance").path("peak_ohm").asDouble();
        assertThat(z.path("impedance").path("peak_ohm").asDouble()).isCloseTo(peak, within(1e-12 * peak));
        assertThat(p.path("worst_case").path("droop_v").asDouble()).isGreaterThan(droop);
    }

    @Test
    void aRowWithoutARegionIsLocatedAndNamesTheRegions(@TempDir Path dir) throws IOException {
        Run r = run("check", scenario(dir, "8 pH", "40 pH", "250 pH").toString(), "--bank",
                CliTest.DEMO_BANK.toString());
        assertThat(r.code()).isEqualTo(ExitCodes.INVALID_INPUT);
        assertThat(r.err()).contains("drone-core.bank.csv:2:").contains("under-package, ring, bulk");
    }

    @Test
    void anUnknownRegionIsLocatedWithASuggestion(@TempDir Path dir) throws IOException {
        Run r = run("check", scenario(dir, "8 pH", "40 pH", "250 pH").toString(), "--bank",
                bank(dir, PLACED_BANK.replace(",bulk", ",blk")).toString());
        assertThat(r.code()).isEqualTo(ExitCodes.INVALID_INPUT);
        assertThat(r.err()).contains("placed.bank.csv:2:").contains("unknown region 'blk'").contains("bulk");
    }

    @Test
    void aRegionOverItsRoomFailsTheVerdictWithTheLimitNamed(@TempDir Path dir) throws IOException {
        Run r = run("check", scenario(dir, "8 pH", "40 pH", "250 pH").toString(), "--bank",
                bank(dir, PLACED_BANK.replace("C0201-X5R-100N-10,24,under-package", "C0201-X5R-100N-10,33,under-package"))
                        .toString(), "--json");
        assertThat(r.code()).isEqualTo(ExitCodes.SPEC_NOT_MET);
        JsonNode s = new ObjectMapper().readTree(r.out());
        assertThat(s.path("board_violations").toString()).contains("region.under-package.max_parts")
                .contains("region.under-package.max_per_case.0201");
    }

    @Test
    void badRegionTablesAreLocated(@TempDir Path dir) throws IOException {
        Path sc = scenario(dir, "-8 pH", "40 pH", "250 pH");
        Files.writeString(sc, Files.readString(sc).replace("max_parts = 80", "max_part = 80"));
        Run r = run("check", sc.toString(), "--bank", bank(dir, PLACED_BANK).toString());
        assertThat(r.code()).isEqualTo(ExitCodes.INVALID_INPUT);
        assertThat(r.err()).contains("region.under-package.inductance").contains("negative")
                .contains("unknown key 'max_part' in [region.ring]").contains("max_parts");
    }

    /**
     * solve chooses parts, counts and regions: its bank meets the spec with every spreading path, respects
     * each region's room, and reads back through check to the same worst case.
     */
    @Test
    void solveChoosesAPlacedBankThatMeetsTheSpecWithinEachRegionsRoom(@TempDir Path dir) throws IOException {
        Path sc = scenario(dir, "8 pH", "40 pH", "250 pH");
        // a little more room than the demo rail's 3 %, so that a short move-limited search lands inside it
        Files.writeString(sc, Files.readString(sc).replace("tolerance = \"3 %\"", "tolerance = \"3.5 %\""));
        Path out = dir.resolve("solved");
        Run r = run("solve", sc.toString(), "--seed", "1", "--moves", "1500", "--solvers", "1", "--time-limit", "60s",
                "--out", out.toString(), "--quiet");
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
        JsonNode s = new ObjectMapper().readTree(out.resolve("summary.json").toFile());
        assertThat(s.path("meets_spec").asBoolean()).isTrue();
        assertThat(s.path("board_violations").size()).isZero();
        for (JsonNode b : s.path("bank")) {
            assertThat(b.path("region").asText()).isIn("under-package", "ring", "bulk");
        }
        JsonNode under = s.path("regions").get(0);
        assertThat(under.path("parts").asInt()).isLessThanOrEqualTo(40);
        assertThat(under.path("per_case").path("0201").path("placed").asInt()).isLessThanOrEqualTo(30);
        Run back = run("check", sc.toString(), "--bank", out.resolve("bom.csv").toString(), "--json");
        JsonNode c = new ObjectMapper().readTree(back.out());
        assertThat(c.path("worst_case").path("droop_v").asDouble())
                .isEqualTo(s.path("worst_case").path("droop_v").asDouble());
    }

    /** trim starts from a placed bank and lists its changes per part and region. */
    @Test
    void trimListsItsChangesPerPartAndRegion(@TempDir Path dir) throws IOException {
        Path sc = scenario(dir, "8 pH", "40 pH", "250 pH");
        Files.writeString(sc, Files.readString(sc).replace("tolerance = \"3 %\"", "tolerance = \"3.5 %\""));
        Run r = run("trim", sc.toString(), "--bank", bank(dir, PLACED_BANK).toString(), "--keep", "spec", "--seed", "1",
                "--moves", "600", "--solvers", "1", "--json");
        assertThat(r.code()).as(r.err()).isIn(ExitCodes.OK, ExitCodes.SPEC_NOT_MET);
        JsonNode s = new ObjectMapper().readTree(r.out());
        assertThat(s.path("trim").path("changes").size()).isPositive();
        for (JsonNode c : s.path("trim").path("changes")) {
            assertThat(c.path("region").asText()).isIn("under-package", "ring", "bulk");
            assertThat(c.has("moved_between_regions")).isTrue();
        }
    }

    /** Monte Carlo draws a placed bank's parts in their regions, around the bank's own worst case. */
    @Test
    void monteCarloOfAPlacedBankStartsFromTheBanksOwnWorstCase(@TempDir Path dir) throws IOException {
        Path sc = scenario(dir, "8 pH", "40 pH", "250 pH");
        Path b = bank(dir, PLACED_BANK);
        Run plain = run("check", sc.toString(), "--bank", b.toString(), "--json");
        Run mc = run("check", sc.toString(), "--bank", b.toString(), "--monte-carlo", "8", "--json");
        assertThat(mc.code()).as(mc.err()).isIn(ExitCodes.OK, ExitCodes.SPEC_NOT_MET);
        JsonNode p = new ObjectMapper().readTree(plain.out());
        JsonNode m = new ObjectMapper().readTree(mc.out());
        double droop = p.path("worst_case").path("droop_v").asDouble();
        JsonNode run = m.path("monte_carlo");
        assertThat(run.path("samples").asInt()).isEqualTo(8);
        assertThat(run.path("parts").size()).isEqualTo(6);
        // the samples spread around the placed bank's own worst case (parts within about ±20 %)
        assertThat(run.path("droop_v").path("p50").asDouble()).isBetween(0.8 * droop, 1.2 * droop);
        assertThat(m.path("worst_case").path("droop_v").asDouble()).isEqualTo(droop);
    }
}
