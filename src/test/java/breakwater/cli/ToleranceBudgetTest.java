package breakwater.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The rail's tolerance budget end to end: the demo rail with and without a set-point accuracy and a
 * ripple, checked with its demo bank. Handbook arithmetic (common practice: tolerance = set point +
 * ripple/2 + transient, either side): 0.90 V ± 3 % is ±27 mV; a ±1 % set point (9 mV) and 6 mV of ripple
 * peak-to-peak (±3 mV) leave ±15 mV, so both limits move in by exactly 12 mV, the margin shrinks by
 * exactly that, the worst case itself does not change, and Z_t = 15 mV / 2.5 A = 6 mΩ.
 */
class ToleranceBudgetTest {

    @TempDir
    Path dir;

    private JsonNode check(String extraRailLines, String name) throws Exception {
        String toml = Files.readString(CliTest.DEMO)
                .replace("edge_time = \"1 ns\"", "edge_time = \"1 ns\"\n" + extraRailLines)
                .replace("\"../parts-catalog/", "\"" + CliTest.ROOT.resolve("parts-catalog").toString().replace('\\', '/') + "/");
        Path scenario = dir.resolve(name + ".toml");
        Files.writeString(scenario, toml);
        Path out = dir.resolve(name);
        CliTest.Run r = CliTest.run("check", scenario.toString(), "--bank", CliTest.DEMO_BANK.toString(),
                "--out", out.toString());
        assertThat(r.err()).doesNotContain("Exception");
        if (!extraRailLines.isEmpty()) {
            // the console wraps long lines to the terminal width: compare with the wrapping undone
            String console = r.out().replaceAll("\n {11}", " ");
            assertThat(console).contains("Budget     set point ± 1 % (9.00 mV), ripple 6.00 mV peak-to-peak (± 3.00 mV), "
                    + "left for the transient ± 15.0 mV (0.8850 V .. 0.9150 V)");
            assertThat(console).contains("Z_t = 6.00 mΩ  ((V × tolerance − V × set point − ripple/2) / ΔI)");
            assertThat(Files.readString(out.resolve("report.html"))).contains("Tolerance budget: set point ± 1 %");
        }
        return new ObjectMapper().readTree(out.resolve("summary.json").toFile());
    }

    @Test
    void setPointAndRippleNarrowTheBandTheWorstCaseMustStayInside() throws Exception {
        JsonNode whole = check("", "whole");
        JsonNode budget = check("set_point_accuracy = \"1 %\"\nripple = \"6 mV\"", "budget");
        assertThat(whole.at("/rail/set_point_accuracy").asDouble()).isZero();
        assertThat(whole.at("/rail/ripple_v").asDouble()).isZero();
        assertThat(whole.at("/rail/transient_allowance_v").asDouble()).isCloseTo(27e-3, within(1e-15));
        assertThat(budget.at("/rail/set_point_accuracy").asDouble()).isCloseTo(0.01, within(1e-15));
        assertThat(budget.at("/rail/ripple_v").asDouble()).isCloseTo(6e-3, within(1e-15));
        assertThat(budget.at("/rail/transient_allowance_v").asDouble()).isCloseTo(15e-3, within(1e-15));
        assertThat(budget.at("/rail/tolerance_lower_v").asDouble()).isCloseTo(0.873, within(1e-15));
        assertThat(budget.at("/rail/target_impedance_ohm").asDouble()).isCloseTo(6e-3, within(1e-15));
        double shift = 9e-3 + 6e-3 / 2;
        assertThat(budget.at("/worst_case/lower_limit_v").asDouble() - whole.at("/worst_case/lower_limit_v").asDouble())
                .isCloseTo(shift, within(1e-15));
        assertThat(whole.at("/worst_case/upper_limit_v").asDouble() - budget.at("/worst_case/upper_limit_v").asDouble())
                .isCloseTo(shift, within(1e-15));
        assertThat(budget.at("/worst_case/droop_v").asDouble()).isEqualTo(whole.at("/worst_case/droop_v").asDouble());
        assertThat(whole.at("/worst_case/margin_v").asDouble() - budget.at("/worst_case/margin_v").asDouble())
                .isCloseTo(shift, within(1e-15));
    }
}
