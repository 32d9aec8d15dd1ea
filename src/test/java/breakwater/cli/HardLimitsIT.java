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

    /**
     * Out of memory inside the Monte Carlo's parallel stream: 64 workers (the common pool widened) each need
     * their own workspace, which a 14 MB heap cannot hold while the main thread's judgement fits (found by
     * trying). Workers die on their own threads, some while starting; the run must still end, at once, with
     * exit 70 and one line, never hang on a dead worker's part or print the JVM's own words.
     */
    @Test
    void outOfMemoryInParallelWorkersIsExit70WithOneLine(@TempDir Path dir) throws Exception {
        String[] args = {"check", "scenarios/drone-core.toml", "--bank", "scenarios/drone-core.bank.csv", "--quiet",
            "--monte-carlo", "20000"};
        for (int round = 0; round < 3; round++) {
            LauncherIT.Result r = launch(dir, Map.of("BREAKWATER_JAVA_OPTS",
                    "-Xmx14m -Djava.util.concurrent.ForkJoinPool.common.parallelism=64"), args);
            assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.INTERNAL);
            assertThat(r.err().lines().filter(l -> !l.isBlank())).as(r.err()).hasSize(1);
            assertThat(r.err()).contains("internal error", "ran out of memory")
                    .doesNotContain("Exception", "UncaughtExceptionHandler", "\tat ");
            assertThat(r.out()).isEmpty();
        }
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

    /**
     * The time limits below hold on a machine that is not otherwise loaded; on one where even starting
     * the program takes more than 1.5 s (other builds running), wall-clock limits say nothing about the
     * program and the timing checks are skipped (the behaviour checks still run).
     */
    static boolean quietMachine(Path dir) throws Exception {
        long t0 = System.nanoTime();
        launch(dir, Map.of(), "--version");
        return (System.nanoTime() - t0) / 1e9 < 1.5;
    }

    /** The demo core rail with a generated 2,000-part catalog of invented parts (no existing bank). */
    static Path bigRail(Path dir) throws IOException {
        breakwater.bench.CatalogGenerator.write(dir.resolve("parts.csv"), 2000, 1);
        String toml = Files.readString(ROOT.resolve("scenarios/drone-core.toml"))
                .replace("../parts-catalog/general-purpose.csv", "parts.csv");
        toml = toml.substring(0, toml.indexOf("[existing]"));
        return Files.writeString(dir.resolve("rail.toml"), toml);
    }

    /**
     * A behaviour limit, not a speed benchmark: with 2,000 parts, a 4 s time limit (counted from the
     * program's start) ends the run, the best bank judged and written, within the limit plus 2 s.
     */
    @Test
    void aTwoThousandPartSolveKeepsItsTimeLimit(@TempDir Path dir) throws Exception {
        Path rail = bigRail(dir);
        boolean quiet = quietMachine(dir);
        long t0 = System.nanoTime();
        LauncherIT.Result r = launch(dir, Map.of(), "solve", rail.toString(), "--time-limit", "4s", "--out",
                dir.resolve("out").toString());
        double seconds = (System.nanoTime() - t0) / 1e9;
        assertThat(r.code()).as(r.err()).isIn(ExitCodes.OK, ExitCodes.SPEC_NOT_MET);
        assertThat(dir.resolve("out/summary.json")).isRegularFile();
        // progress never reads as stalled: the start phase says what it is doing
        assertThat(r.err()).doesNotContain(" 0 banks/s");
        org.junit.jupiter.api.Assumptions.assumeTrue(quiet, "machine too loaded to judge wall-clock time");
        assertThat(seconds).as("wall-clock seconds of a 4 s solve").isLessThanOrEqualTo(4 + 2);
    }

    /** SIGTERM (what timeout, CI and process managers send) stops the search and writes, like Ctrl-C. */
    @Test
    void sigtermStopsWithinTwoSecondsAndWritesTheBestBank(@TempDir Path dir) throws Exception {
        org.junit.jupiter.api.Assumptions.assumeFalse(System.getProperty("os.name").startsWith("Windows"));
        Path rail = bigRail(dir);
        boolean quiet = quietMachine(dir);
        Path out = dir.resolve("out");
        Path err = dir.resolve("stderr.txt");
        ProcessBuilder pb = new ProcessBuilder(ROOT.resolve("breakwater").toString(), "solve", rail.toString(),
                "--time-limit", "120s", "--out", out.toString()).directory(ROOT.toFile())
                .redirectOutput(dir.resolve("stdout.txt").toFile()).redirectError(err.toFile());
        Process p = pb.start();
        long waitUntil = System.nanoTime() + 60_000_000_000L;
        // the launcher execs java, so the process is the JVM; wait for the first progress line
        while (!Files.readString(err).contains(" s  ") && System.nanoTime() < waitUntil && p.isAlive()) {
            Thread.sleep(100);
        }
        assertThat(p.isAlive()).as(Files.readString(err)).isTrue();
        long t0 = System.nanoTime();
        p.destroy(); // SIGTERM on Unix
        boolean ended = p.waitFor(30, TimeUnit.SECONDS);
        double seconds = (System.nanoTime() - t0) / 1e9;
        if (!ended) {
            p.destroyForcibly();
        }
        String said = Files.readString(err);
        assertThat(ended).as(said).isTrue();
        assertThat(p.exitValue()).as(said).isIn(ExitCodes.OK, ExitCodes.SPEC_NOT_MET);
        assertThat(said).contains("SIGTERM: stopping the search");
        var summary = new com.fasterxml.jackson.databind.ObjectMapper().readTree(out.resolve("summary.json").toFile());
        assertThat(summary.path("solver").path("stopped_early").asBoolean()).isTrue();
        org.junit.jupiter.api.Assumptions.assumeTrue(quiet, "machine too loaded to judge wall-clock time");
        assertThat(seconds).as("seconds from SIGTERM to exit").isLessThanOrEqualTo(2);
    }
}
