package breakwater.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Path;

import static breakwater.cli.CliTest.run;
import static org.assertj.core.api.Assertions.assertThat;

/** A solve that ends without a passing bank says whether the spec is proven out of reach or only not reached. */
class ReachCliTest {

    @Test
    void aToleranceNoBankCanHoldIsProvenOutOfReach(@TempDir Path dir) throws IOException {
        // the demo core rail at ±0.6 %: the package and die alone ring past 3.9 mV at tens of MHz
        Path rail = CountLimitsCliTest.demoCopy(dir, "tolerance = \"3 %\"", "tolerance = \"0.6 %\"");
        CliTest.Run r = run("solve", rail.toString(), "--moves", "200", "--solvers", "1", "--json");
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.SPEC_NOT_MET);
        JsonNode reach = new ObjectMapper().readTree(r.out()).path("reach");
        assertThat(reach.path("proven_out_of_reach").asBoolean()).as(r.out()).isTrue();
        assertThat(reach.path("droop_at_least_v").asDouble()).isGreaterThan(reach.path("droop_allowed_v").asDouble());
        CliTest.Run text = run("solve", rail.toString(), "--moves", "200", "--solvers", "1");
        assertThat(text.out().replaceAll("\\s+", " ")).contains("Reach no bank of these parts within the board's "
                + "limits can meet the spec", "where 3.90 mV is allowed");
    }

    @Test
    void aSearchCutShortIsOnlyNotReached(@TempDir Path dir) throws IOException {
        // ±2.4 % with the target required: the bound rules nothing out, and 30 moves find no passing bank
        Path rail = CountLimitsCliTest.demoCopy(dir, "tolerance = \"3 %\"", "tolerance = \"2.4 %\"");
        CliTest.Run r = run("solve", rail.toString(), "--moves", "30", "--solvers", "1", "--json");
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.SPEC_NOT_MET);
        JsonNode reach = new ObjectMapper().readTree(r.out()).path("reach");
        assertThat(reach.path("proven_out_of_reach").asBoolean()).as(r.out()).isFalse();
        assertThat(reach.path("bound_computed").asBoolean()).isTrue();
        CliTest.Run text = run("solve", rail.toString(), "--moves", "30", "--solvers", "1");
        assertThat(text.out().replaceAll("\\s+", " ")).contains("but none is ruled out", "--time-limit 60s or more");
    }

    @Test
    void aPassingSolveSaysNothingAboutReach(@TempDir Path dir) throws IOException {
        Path rail = CountLimitsCliTest.demoCopy(dir, "tolerance = \"3 %\"", "tolerance = \"3 %\"");
        CliTest.Run r = run("solve", rail.toString(), "--moves", "200", "--solvers", "1", "--json");
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
        assertThat(new ObjectMapper().readTree(r.out()).has("reach")).isFalse();
    }
}
