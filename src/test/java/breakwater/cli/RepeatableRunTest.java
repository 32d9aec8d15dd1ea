package breakwater.cli;

import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The same inputs, {@code --seed} and {@code --moves} give the same files, with two solver threads
 * racing each other: each mode that searches runs twice in-process, and summary.json and bom.csv of the
 * two runs must be equal byte for byte except the elapsed seconds. The count of banks evaluated is part
 * of what must be equal (it counts every judgement a solver asks for, memo hits included, so which
 * thread reaches a bank first does not change it).
 */
class RepeatableRunTest {
    static final Path ROOT = Path.of("").toAbsolutePath();

    /** Elapsed wall-clock seconds: the only figures two runs may differ in. */
    static final Pattern ELAPSED = Pattern.compile("(\"(?:time_s|search_time_s)\" : )[0-9.Ee+-]+");

    static Stream<List<String>> runs() {
        String scenario = ROOT.resolve("scenarios/buoy-io.toml").toString();
        return Stream.of(
                List.of("solve", scenario, "--seed", "1", "--moves", "3000", "--solvers", "2"),
                List.of("trim", scenario, "--seed", "1", "--moves", "800", "--solvers", "2"),
                List.of("compare", scenario, "--seed", "1", "--moves", "500", "--solvers", "2"),
                List.of("frontier", scenario, "--points", "2", "--seed", "1", "--moves", "400", "--solvers", "2"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("runs")
    void twoMoveLimitedRunsWriteTheSameFiles(List<String> args, @TempDir Path dir) throws IOException {
        Path first = run(args, dir.resolve("first"));
        Path second = run(args, dir.resolve("second"));
        String summary = withoutElapsed(Files.readString(first.resolve("summary.json")));
        if (!args.get(0).equals("frontier")) { // frontier's summary lists its banks, not a search count
            assertThat(summary).as("summary.json has a search count").contains("\"evaluations\" : ");
        }
        assertThat(withoutElapsed(Files.readString(second.resolve("summary.json")))).isEqualTo(summary);
        assertThat(Files.readString(second.resolve("bom.csv"))).isEqualTo(Files.readString(first.resolve("bom.csv")));
    }

    private static Path run(List<String> args, Path out) {
        List<String> all = new ArrayList<>(args);
        all.add("--quiet");
        all.add("--out");
        all.add(out.toString());
        CliTest.Run r = CliTest.run(all.toArray(String[]::new));
        assertThat(r.code()).as(r.err()).isIn(ExitCodes.OK, ExitCodes.SPEC_NOT_MET);
        return out;
    }

    static String withoutElapsed(String text) {
        return ELAPSED.matcher(text).replaceAll("$1<elapsed>");
    }
}
