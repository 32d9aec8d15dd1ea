package breakwater.cli;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Hard limits through the repository's {@code ./breakwater} launcher, where the exit code, the JVM's own
 * errors and signals matter: what a user's shell sees.
 */
class HardLimitsIT {
    static final Path ROOT = LauncherIT.ROOT;

    static LauncherIT.Result launch(Path dir, Map<String, String> env, String... args)
            throws IOException, InterruptedException {
        List<String> cmd = new ArrayList<>();
        cmd.add(ROOT.resolve("breakwater").toString());
        cmd.addAll(List.of(args));
        Path out = dir.resolve("stdout.txt");
        Path err = dir.resolve("stderr.txt");
        ProcessBuilder pb = new ProcessBuilder(cmd).directory(ROOT.toFile())
                .redirectOutput(out.toFile()).redirectError(err.toFile());
        pb.environment().remove(Main.DEBUG_ENV);
        pb.environment().putAll(env);
        Process p = pb.start();
        boolean finished = p.waitFor(3, TimeUnit.MINUTES);
        if (!finished) {
            p.destroyForcibly();
        }
        assertThat(finished).as("launcher finished within 3 minutes").isTrue();
        return new LauncherIT.Result(p.exitValue(), Files.readString(out, StandardCharsets.UTF_8),
                Files.readString(err, StandardCharsets.UTF_8));
    }

    /** A heap too small for a check: the JVM's OutOfMemoryError must end as our exit 70. */
    @Test
    void outOfMemoryIsExit70WithOneLineAndTheTraceOnlyWhenAsked(@TempDir Path dir) throws Exception {
        String[] args = {"check", "scenarios/drone-core.toml", "--bank", "scenarios/drone-core.bank.csv", "--quiet"};
        // 6 MB of heap: enough to start and read the inputs, not to judge the bank (found by trying)
        LauncherIT.Result r = launch(dir, Map.of("BREAKWATER_JAVA_OPTS", "-Xmx6m"), args);
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.INTERNAL);
        assertThat(r.err().lines().filter(l -> l.contains("internal error"))).hasSize(1);
        assertThat(r.err()).contains("ran out of memory", "please report it").doesNotContain("\tat ", "Exception in");

        LauncherIT.Result traced = launch(dir, Map.of("BREAKWATER_JAVA_OPTS", "-Xmx6m", Main.DEBUG_ENV, "1"), args);
        assertThat(traced.code()).as(traced.err()).isEqualTo(ExitCodes.INTERNAL);
        assertThat(traced.err()).contains("java.lang.OutOfMemoryError", "\tat ");
    }
}
