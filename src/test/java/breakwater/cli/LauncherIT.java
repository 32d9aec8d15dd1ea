package breakwater.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Runs the packaged program through the repository's {@code ./breakwater} launcher, as a user does
 * (failsafe runs this after {@code package}, so the jar is fresh and the launcher does not rebuild).
 */
class LauncherIT {
    static final Path ROOT = Path.of(System.getProperty("breakwater.root", ".")).toAbsolutePath();

    record Result(int code, String out, String err) {
    }

    static Result launch(Path dir, String... args) throws IOException, InterruptedException {
        List<String> cmd = new ArrayList<>();
        cmd.add(ROOT.resolve("breakwater").toString());
        cmd.addAll(List.of(args));
        Path out = dir.resolve("stdout.txt");
        Path err = dir.resolve("stderr.txt");
        Process p = new ProcessBuilder(cmd).directory(ROOT.toFile())
                .redirectOutput(out.toFile()).redirectError(err.toFile()).start();
        assertThat(p.waitFor(10, TimeUnit.MINUTES)).as("launcher finished").isTrue();
        return new Result(p.exitValue(), Files.readString(out, StandardCharsets.UTF_8),
                Files.readString(err, StandardCharsets.UTF_8));
    }

    @Test
    void checkOnTheDemoBankWritesEveryFile(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("check");
        Result r = launch(dir, "check", "scenarios/buoy-io.toml", "--bank", "scenarios/buoy-io.bank.csv",
                "--out", out.toString());
        assertThat(r.code()).as(r.err()).isIn(0, 1);
        assertThat(r.out()).contains("Worst case", "Impedance", "anti-resonance", "model is not a measurement");
        for (String f : new String[] {"bom.csv", "impedance.csv", "worst-case.csv", "summary.json", "report.html",
            "impedance.svg", "worst-case.svg"}) {
            assertThat(out.resolve(f)).isRegularFile();
        }
        JsonNode s = new ObjectMapper().readTree(out.resolve("summary.json").toFile());
        assertThat(s.path("worst_case").path("droop_v").asDouble()).isPositive();
        assertThat(Files.readString(out.resolve("impedance.csv")).lines().findFirst().orElseThrow())
                .isEqualTo("frequency_hz,impedance_ohm,phase_deg,target_ohm");
        assertThat(Files.readString(out.resolve("worst-case.csv")).lines().findFirst().orElseThrow())
                .isEqualTo("time_s,load_current_a,voltage_v");
    }

    @Test
    void solveFindsABankThatMeetsTheDemoSpec(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("solve");
        Result r = launch(dir, "solve", "scenarios/drone-core.toml", "--time-limit", "20s", "--seed", "3",
                "--out", out.toString());
        assertThat(r.code()).as(r.out() + r.err()).isZero();
        assertThat(r.err()).contains("seed 3");
        JsonNode s = new ObjectMapper().readTree(out.resolve("summary.json").toFile());
        assertThat(s.path("worst_case").path("passes").asBoolean()).isTrue();
        assertThat(s.path("solver").path("seed").asLong()).isEqualTo(3);
        assertThat(s.path("solver").path("evaluations").asLong()).isPositive();
        assertThat(Files.readString(out.resolve("report.html"))).contains("<svg", "Bill of materials");
    }

    @Test
    void badInputGivesExit3AndNoStackTrace(@TempDir Path dir) throws Exception {
        Path scenario = dir.resolve("broken.toml");
        Files.writeString(scenario, "[rail]\nvoltage = \"one volt\"\n");
        Result r = launch(dir, "check", scenario.toString(), "--bank", "scenarios/buoy-io.bank.csv");
        assertThat(r.code()).isEqualTo(3);
        assertThat(r.err()).contains("broken.toml:2:").doesNotContain("Exception");
    }
}
