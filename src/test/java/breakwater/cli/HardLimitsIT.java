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

    /** Two runs of different rails into one --out at once: the folder ends with one run's files, whole. */
    @Test
    void twoRunsIntoOneFolderLeaveOneWholeSet(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("shared");
        for (int round = 0; round < 2; round++) {
            Path a = Files.createDirectories(dir.resolve("a" + round));
            Path b = Files.createDirectories(dir.resolve("b" + round));
            var first = java.util.concurrent.CompletableFuture.supplyAsync(() -> quietly(() -> launch(a, Map.of(),
                    "check", "scenarios/drone-core.toml", "--bank", "scenarios/drone-core.bank.csv", "--out",
                    out.toString(), "--quiet")));
            var second = java.util.concurrent.CompletableFuture.supplyAsync(() -> quietly(() -> launch(b, Map.of(),
                    "check", "scenarios/buoy-io.toml", "--bank", "scenarios/buoy-io.bank.csv", "--out",
                    out.toString(), "--quiet", "--export", "spice")));
            assertThat(first.get().code()).as(first.get().err()).isIn(0, 1);
            assertThat(second.get().code()).as(second.get().err()).isIn(0, 1);
            var summary = new com.fasterxml.jackson.databind.ObjectMapper().readTree(out.resolve("summary.json").toFile());
            String rail = summary.path("rail").path("name").asText();
            boolean buoy = Files.readString(ROOT.resolve("scenarios/buoy-io.toml")).contains(rail);
            // every part of bom.csv is in summary.json's bank, and the report names the same rail
            String bom = Files.readString(out.resolve("bom.csv"));
            for (var part : summary.path("bank")) {
                assertThat(bom).contains(part.path("part").asText() + ",");
            }
            assertThat(bom.lines().filter(l -> !l.startsWith("part,") && !l.startsWith("TOTAL,")).count())
                    .isEqualTo(summary.path("bank").size());
            assertThat(Files.readString(out.resolve("report.html"))).contains(htmlEscaped(rail));
            // the SPICE decks belong to the buoy run only
            assertThat(Files.exists(out.resolve("rail-droop.cir"))).isEqualTo(buoy);
            try (var left = Files.list(dir)) {
                assertThat(left.map(p -> p.getFileName().toString())).noneMatch(n -> n.contains("staging"));
            }
        }
    }

    private static String htmlEscaped(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
    }

    interface Launch {
        LauncherIT.Result run() throws Exception;
    }

    private static LauncherIT.Result quietly(Launch l) {
        try {
            return l.run();
        } catch (Exception e) {
            throw new IllegalStateException(e);
        }
    }
}
