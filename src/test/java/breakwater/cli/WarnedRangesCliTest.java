package breakwater.cli;

import breakwater.catalog.Catalog;
import breakwater.catalog.CatalogReader;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import static breakwater.cli.CliTest.run;
import static breakwater.cli.CountLimitsCliTest.demoCopy;
import static org.assertj.core.api.Assertions.assertThat;

/**
 * Values a real design could reach but that are unusual are warned about where they are written, in the
 * console, summary.json and the report; the run goes on. The bounds are common practice, written from
 * memory (units.CaseRange, scenario.ScenarioRanges).
 */
class WarnedRangesCliTest {

    @Test
    void aCapacitanceBeyondItsCaseAndAnEslFarBelowItAreWarnedAtTheirCells(@TempDir Path dir) throws IOException {
        Path rail = demoCopy(dir, "[band]", "[band]");
        Path cat = dir.resolve("parts.csv");
        // the 0201 100 nF part becomes 100 mF (a lost prefix: no 0201 holds more than some µF), the 0402 1 µF
        // part an ESL of 5 pH (no conventional 0402 comes within a factor of ten of that)
        String text = Files.readString(cat)
                .replace("C0201-X5R-100N-10,\"100 nF X5R, 0201\",0201,X5R,100n,", "C0201-X5R-100N-10,\"100 nF X5R, 0201\",0201,X5R,100m,")
                .replace("C0402-X5R-1U0-10,\"1 uF X5R, 0402\",0402,X5R,1u,15 mOhm,0.35 nH,", "C0402-X5R-1U0-10,\"1 uF X5R, 0402\",0402,X5R,1u,15 mOhm,5 pH,");
        Files.writeString(cat, text);
        int big = CliTest.lineOf(cat, "C0201-X5R-100N-10,");
        int small = CliTest.lineOf(cat, "C0402-X5R-1U0-10,");
        Path out = dir.resolve("out");
        CliTest.Run r = run("check", rail.toString(), "--bank", dir.resolve("drone-core.bank.csv").toString(),
                "--out", out.toString());
        assertThat(r.code()).as(r.err()).isIn(ExitCodes.OK, ExitCodes.SPEC_NOT_MET);
        String capacitance = "parts.csv:" + big + ":47: capacitance '100m' is more than a case 0201 part holds (up to "
                + "about 10 µF, common practice): check the unit prefix and the case code";
        String esl = "parts.csv:" + small + ":55: esl '5 pH' is far below what a case 0402 part has (about 50 pH at the "
                + "least, common practice)";
        assertThat(r.out()).contains("Warnings", capacitance, esl);
        JsonNode summary = new ObjectMapper().readTree(out.resolve("summary.json").toFile());
        assertThat(summary.path("warnings").toString()).contains(capacitance, esl);
        assertThat(Files.readString(out.resolve("report.html"))).contains("Warning: ").contains("more than a case 0201");
    }

    @Test
    void aSlowEdgeAndABandBeyondTheModelsSpanAreWarnedAtTheirKeys(@TempDir Path dir) throws IOException {
        Path rail = demoCopy(dir, "edge_time = \"1 ns\"", "edge_time = \"200 us\"");
        Files.writeString(rail, Files.readString(rail).replace("from = \"10 kHz\"", "from = \"100 Hz\"")
                .replace("to = \"150 MHz\"", "to = \"3 GHz\""));
        // read as Inputs reads it (the console, summary.json and report plumbing is the catalog test's above;
        // judging a 3 GHz band with a 200 µs edge takes the worst-case search long, for nothing more here)
        String warnings;
        try {
            var scenario = breakwater.scenario.ScenarioReader.read(rail, "rail.toml");
            warnings = breakwater.scenario.ScenarioRanges.warnings(scenario,
                    breakwater.scenario.ScenarioPlaces.of(rail, "rail.toml")).toString();
        } catch (breakwater.diagnostic.InputException e) {
            throw new AssertionError(e.getMessage(), e);
        }
        assertThat(warnings).contains("rail.toml:" + CliTest.lineOf(rail, "edge_time") + ":13: rail.edge_time 200 µs is slower "
                        + "than 100 µs", "rail.toml:" + CliTest.lineOf(rail, "from =") + ":8: band.from 100 Hz is below 1 kHz",
                "rail.toml:" + CliTest.lineOf(rail, "to =") + ":6: band.to 3 GHz is above 1 GHz");
    }

    @Test
    void theDemoCatalogsAndTheGeneratedOneRaiseNoWarning() throws IOException {
        try (var files = Files.list(CliTest.ROOT.resolve("parts-catalog"))) {
            for (Path f : files.filter(p -> p.toString().endsWith(".csv")).toList()) {
                Catalog c = CatalogReader.read(f, f.getFileName().toString());
                assertThat(c.warnings()).as(f.toString()).isEmpty();
            }
        } catch (breakwater.diagnostic.InputException e) {
            throw new AssertionError(e.getMessage(), e);
        }
        for (long seed = 1; seed <= 3; seed++) {
            try {
                Catalog generated = CatalogReader.parse(new StringReader(breakwater.bench.CatalogGenerator.catalog(2000,
                        seed)), "generated.csv");
                assertThat(generated.warnings()).as("seed " + seed).isEmpty();
            } catch (breakwater.diagnostic.InputException e) {
                throw new AssertionError(e.getMessage(), e);
            }
        }
        // and the demo rails' scenarios none either (CaseWarningsCliTest runs the core rail through check)
        try (var files = Files.list(CliTest.ROOT.resolve("scenarios"))) {
            for (Path f : files.filter(p -> p.toString().endsWith(".toml")).toList()) {
                var scenario = breakwater.scenario.ScenarioReader.read(f, f.getFileName().toString());
                assertThat(breakwater.scenario.ScenarioRanges.warnings(scenario,
                        breakwater.scenario.ScenarioPlaces.of(f, f.getFileName().toString()))).as(f.toString()).isEmpty();
            }
        } catch (breakwater.diagnostic.InputException e) {
            throw new AssertionError(e.getMessage(), e);
        }
    }
}
