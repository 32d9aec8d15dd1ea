package breakwater.cli;

import breakwater.design.VoltageRatings;
import breakwater.scenario.Rail;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import static breakwater.cli.CliTest.run;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** A part rated below the rail's highest voltage is never chosen, and a bank holding one is refused. */
class RatingsCliTest {

    /** The demo core rail (0.9 V ± 3 %) with every catalog rating, or those matching {@code only}, set to 0.5 V. */
    static Path lowRated(Path dir, String only) throws IOException {
        Path rail = CountLimitsCliTest.demoCopy(dir, "max_parts = 120", "max_parts = 120");
        Path catalog = dir.resolve("parts.csv");
        StringBuilder b = new StringBuilder();
        for (String line : Files.readAllLines(catalog)) {
            b.append(line.startsWith(only) ? line.replaceFirst(",\\d+(\\.\\d+)? V,", ",0.5 V,") : line).append('\n');
        }
        Files.writeString(catalog, b);
        return rail;
    }

    @Test
    void theHighestRailVoltageIsTheNominalPlusTolerance() {
        // V_max = V_nom·(1 + tolerance): 0.9 V + 3 % = 0.927 V (the demo core rail's upper limit)
        assertThat(VoltageRatings.highestRailVoltage(new Rail("core", 0.9, 0.03, 5, 2.5, 1e-9)))
                .isCloseTo(0.927, within(1e-12));
    }

    @Test
    void aCatalogRatedBelowTheRailIsRefusedBySolveAndItsBankByCheck(@TempDir Path dir) throws IOException {
        Path rail = lowRated(dir, "");
        CliTest.Run solve = run("solve", rail.toString(), "--moves", "50", "--solvers", "1");
        assertThat(solve.code()).as(solve.err()).isEqualTo(ExitCodes.INVALID_INPUT);
        assertThat(solve.err()).contains("parts.csv", "no part is rated for the rail's highest voltage 0.9270 V",
                "--accept-low-rating");
        Path bank = dir.resolve("drone-core.bank.csv");
        CliTest.Run check = run("check", rail.toString(), "--bank", bank.toString());
        assertThat(check.code()).as(check.err()).isEqualTo(ExitCodes.INVALID_INPUT);
        assertThat(check.err()).contains("drone-core.bank.csv", "rated below the rail's highest voltage", "(0.5 V)");
        CliTest.Run accepted = run("check", rail.toString(), "--bank", bank.toString(), "--accept-low-rating");
        assertThat(accepted.code()).as(accepted.err()).isIn(ExitCodes.OK, ExitCodes.SPEC_NOT_MET);
    }

    @Test
    void theSearchNeverChoosesAnUnderratedPart(@TempDir Path dir) throws IOException {
        // every 0402 part rated 0.5 V: the search may use any case but that one
        Path rail = lowRated(dir, "C0402");
        CliTest.Run r = run("solve", rail.toString(), "--moves", "300", "--solvers", "1", "--seed", "2", "--json");
        assertThat(r.code()).as(r.err()).isIn(ExitCodes.OK, ExitCodes.SPEC_NOT_MET);
        assertThat(r.out()).contains("\"bank\"").doesNotContain("\"part\" : \"C0402");
    }

    /**
     * The report says what the rating check held each part to: the rail's highest voltage, nominal plus
     * tolerance (0.9 V + 3 % = 0.927 V), the bank's parts with their ratings, the DC-bias retention at the
     * rail voltage, and that derating is the part maker's and local practice's.
     */
    @Test
    void theReportSaysWhatTheRatingCheckHeldThePartsTo(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("out");
        CliTest.Run r = run("check", CliTest.DEMO.toString(), "--bank", CliTest.DEMO_BANK.toString(), "--out",
                out.toString());
        assertThat(r.code()).as(r.err()).isIn(ExitCodes.OK, ExitCodes.SPEC_NOT_MET);
        String html = Files.readString(out.resolve("report.html"));
        assertThat(html).contains("Part ratings: each part&#39;s voltage_rating was checked against the rail&#39;s "
                        + "highest voltage, 0.9270 V (nominal 0.9000 V plus its 3 % tolerance",
                "C0402-X5R-1U0-10 10 V", "dc_bias_retention", "at the rail&#39;s DC voltage of 0.9000 V",
                "derating for temperature, DC bias, ripple current and reliability follows the part maker&#39;s data "
                        + "and your local practice")
                .doesNotContain("NOT ENFORCED");
        assertThat(r.out()).doesNotContain("NOT ENFORCED");
    }

    @Test
    void acceptingLowRatingsIsSaidBeforeTheVerdictAtTheTopOfTheReportAndInWarnings(@TempDir Path dir)
            throws IOException {
        Path rail = lowRated(dir, "C0402");
        Path out = dir.resolve("out");
        CliTest.Run r = run("check", rail.toString(), "--bank", dir.resolve("drone-core.bank.csv").toString(),
                "--accept-low-rating", "--out", out.toString());
        assertThat(r.code()).as(r.err()).isIn(ExitCodes.OK, ExitCodes.SPEC_NOT_MET);
        String line = "PART RATINGS NOT ENFORCED (--accept-low-rating): parts rated below the rail's highest voltage "
                + "0.9270 V were allowed; this bank holds C0402-X5R-1U0-10 (0.5 V), rated below it";
        assertThat(r.out()).contains(line);
        assertThat(r.out().indexOf(line)).as("before the verdict").isLessThan(r.out().indexOf("SPEC"));
        String html = Files.readString(out.resolve("report.html"));
        String escaped = line.replace("'", "&#39;");
        assertThat(html).contains(escaped);
        assertThat(html.indexOf(escaped)).as("at the top, before the charts").isLessThan(html.indexOf("id=\"impedance\""));
        assertThat(html.substring(html.indexOf("id=\"cautions\""))).contains(escaped).doesNotContain("Part ratings: each");
        var summary = new com.fasterxml.jackson.databind.ObjectMapper().readTree(out.resolve("summary.json").toFile());
        assertThat(summary.path("warnings").get(0).asText()).startsWith(line);
    }
}
