package breakwater.cli;

import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Golden outputs: every result file of a fixed set of runs on the demo rails, byte for byte, against
 * the copies in {@code src/test/resources/golden/}. A change that moves code without meaning to change
 * an output keeps this test green; a change that means to change an output regenerates the copies
 * ({@code ./mvnw -B test -Dtest=GoldenOutputTest -Dgolden.update=true}), and the diff of the copies
 * shows what changed for review.
 *
 * <p>Runs with a search are reproducible: one solver ({@code --solvers 1}), a fixed seed and a move
 * limit. The only values masked are wall-clock figures ({@link #WALL_CLOCK}), which no two runs share.
 */
class GoldenOutputTest {
    static final Path ROOT = Path.of("").toAbsolutePath();
    static final Path GOLDEN = ROOT.resolve("src/test/resources/golden");
    /** Kept as text, so that a meant change shows as a readable diff. */
    static final List<String> TEXT_FILES = List.of("console.txt", "bom.csv", "impedance.csv", "summary.json");
    /** Large files, kept as SHA-256 digests (of the masked text) in {@code digests.txt}. */
    static final List<String> DIGEST_FILES = List.of("worst-case.csv", "report.html", "impedance.svg",
            "worst-case.svg");

    /**
     * Wall-clock figures: elapsed seconds of a search or a Monte Carlo run. (The count of banks a
     * move-limited search evaluated is not one of them: it is the same on every run.)
     */
    static final List<Pattern> WALL_CLOCK = List.of(
            Pattern.compile("(\"(?:time_s|search_time_s)\" : )[0-9.Ee+-]+"),
            Pattern.compile("(<tr><td>search time</td><td>)[^<]*"),
            Pattern.compile("(Search +[0-9]+ banks evaluated in )[0-9.]+ s"),
            Pattern.compile("(Spread +[0-9]+ samples, .*, in )[0-9.]+ s"),
            Pattern.compile("(samples were judged \\(seed [0-9]+, )[0-9.]+ s"));

    record Case(String name, List<String> args) {
        @Override
        public String toString() {
            return name;
        }
    }

    static Stream<Case> cases() {
        return Stream.of(
                new Case("check-drone-core", List.of("check", "scenarios/drone-core.toml",
                        "--bank", "scenarios/drone-core.bank.csv")),
                new Case("check-buoy-io", List.of("check", "scenarios/buoy-io.toml",
                        "--bank", "scenarios/buoy-io.bank.csv")),
                new Case("check-spectrometer-ddr", List.of("check", "scenarios/spectrometer-ddr.toml",
                        "--bank", "scenarios/spectrometer-ddr.bank.csv")),
                new Case("check-drone-core-via-in-pad-monte-carlo", List.of("check", "scenarios/drone-core.toml",
                        "--bank", "scenarios/drone-core.bank.csv", "--footprint", "via-in-pad",
                        "--monte-carlo", "200", "--mc-seed", "7")),
                new Case("compare-drone-core-bank", List.of("compare", "scenarios/drone-core.toml",
                        "--bank", "scenarios/drone-core.bank.csv")),
                new Case("solve-buoy-io", List.of("solve", "scenarios/buoy-io.toml",
                        "--seed", "1", "--moves", "3000", "--solvers", "1")),
                new Case("trim-drone-core", List.of("trim", "scenarios/drone-core.toml",
                        "--seed", "1", "--moves", "1500", "--solvers", "1")),
                new Case("frontier-buoy-io", List.of("frontier", "scenarios/buoy-io.toml", "--points", "2",
                        "--seed", "1", "--moves", "1000", "--solvers", "1")));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void outputsEqualTheGoldenCopies(Case c, @TempDir Path dir) throws IOException {
        Path out = dir.resolve("out");
        List<String> args = new ArrayList<>(c.args());
        args.add("--out");
        args.add(out.toString());
        ByteArrayOutputStream stdout = new ByteArrayOutputStream();
        ByteArrayOutputStream stderr = new ByteArrayOutputStream();
        int code = Main.run(args.toArray(String[]::new), new PrintStream(stdout, true, StandardCharsets.UTF_8),
                new PrintStream(stderr, true, StandardCharsets.UTF_8));
        assertThat(code).as(stderr.toString(StandardCharsets.UTF_8)).isIn(ExitCodes.OK, ExitCodes.SPEC_NOT_MET);
        // the console text names the temporary folder on its last line
        String console = stdout.toString(StandardCharsets.UTF_8).replace(out.toString(), "OUT");
        Files.writeString(out.resolve("console.txt"), "exit " + code + "\n" + console);

        Path golden = GOLDEN.resolve(c.name());
        boolean update = Boolean.getBoolean("golden.update");
        if (update) {
            Files.createDirectories(golden);
        }
        StringBuilder digests = new StringBuilder();
        for (String f : DIGEST_FILES) {
            digests.append(sha256(masked(Files.readString(out.resolve(f))))).append("  ").append(f).append('\n');
        }
        Files.writeString(out.resolve("digests.txt"), digests);
        List<String> compared = new ArrayList<>(TEXT_FILES);
        compared.add("digests.txt");
        for (String f : compared) {
            String actual = masked(Files.readString(out.resolve(f)));
            if (update) {
                Files.writeString(golden.resolve(f), actual);
                continue;
            }
            String expected = Files.readString(golden.resolve(f));
            assertThat(actual).as(c.name() + "/" + f + " (regenerate with -Dgolden.update=true when an output "
                    + "change is meant)").isEqualTo(expected);
        }
    }

    static String sha256(String text) {
        try {
            return java.util.HexFormat.of().formatHex(java.security.MessageDigest.getInstance("SHA-256")
                    .digest(text.getBytes(StandardCharsets.UTF_8)));
        } catch (java.security.NoSuchAlgorithmException e) {
            throw new AssertionError("SHA-256 is required of every JVM", e);
        }
    }

    static String masked(String text) {
        String s = text;
        for (Pattern p : WALL_CLOCK) {
            s = p.matcher(s).replaceAll("$1<wall-clock>");
        }
        return s;
    }
}
