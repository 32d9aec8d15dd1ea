package breakwater.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/** The command line in-process: exit codes, messages, files. */
class CliTest {
    static final Path ROOT = Path.of("").toAbsolutePath();
    static final Path DEMO = ROOT.resolve("scenarios/drone-core.toml");
    static final Path DEMO_BANK = ROOT.resolve("scenarios/drone-core.bank.csv");

    record Run(int code, String out, String err) {
    }

    /** The 1-based line of {@code file} that starts with {@code start} (the first such). */
    static int lineOf(java.nio.file.Path file, String start) throws java.io.IOException {
        java.util.List<String> lines = java.nio.file.Files.readAllLines(file);
        for (int i = 0; i < lines.size(); i++) {
            if (lines.get(i).startsWith(start)) {
                return i + 1;
            }
        }
        throw new AssertionError(start + " not in " + file);
    }

    static Run run(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = Main.run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        return new Run(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    @Test
    void helpListsTheExitCodes() {
        Run r = run("--help");
        assertThat(r.code()).isZero();
        assertThat(r.out()).contains("Exit codes:", "0", "success", "3", "invalid input", "70", "internal error")
                .contains("solve", "check");
    }

    @Test
    void unknownOptionIsAUsageError() {
        Run r = run("check", DEMO.toString(), "--bank", DEMO_BANK.toString(), "--frobnicate");
        assertThat(r.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(r.err()).contains("--frobnicate");
        assertThat(r.err()).doesNotContain("at breakwater.");
    }

    @Test
    void everyCommandThatAdvertisesVersionPrintsIt() {
        Run top = run("--version");
        assertThat(top.code()).isZero();
        assertThat(top.out()).startsWith("breakwater ");
        for (String command : new String[] {"solve", "check", "trim", "compare", "frontier"}) {
            Run help = run(command, "--help");
            assertThat(help.out()).as(command + " --help").contains("-V, --version");
            Run r = run(command, "--version");
            assertThat(r.code()).as(command + " --version").isZero();
            assertThat(r.out()).as(command + " --version").isEqualTo(top.out());
        }
    }

    @Test
    void anUnknownCommandIsNamedWithTheClosestOne() {
        Run r = run("slove", DEMO.toString());
        assertThat(r.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(r.err()).contains("unknown command 'slove'").contains("Did you mean 'solve'?")
                .contains("check").doesNotContain("Unmatched").doesNotContain("index");
        Run far = run("xyzzy");
        assertThat(far.err()).contains("unknown command 'xyzzy'").doesNotContain("Did you mean");
    }

    @Test
    void aBadKeepRuleNamesTheRulesAsTheHelpWritesThem() {
        Run r = run("trim", DEMO.toString(), "--keep", "margn");
        assertThat(r.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(r.err()).contains("'margn' is not a keep rule; use margin or spec").doesNotContain("MARGIN");
        assertThat(run("trim", "--help").out()).contains("--keep=RULE").contains("margin").contains("spec");
    }

    @Test
    void monteCarloHelpSaysSamplesOfTheBankJudged() {
        String help = run("check", "--help").out();
        assertThat(help).contains("Monte Carlo samples").doesNotContain("After the bank is chosen")
                .doesNotContain("variants");
    }

    @Test
    void theReportTurnsOnlyTheFailingLimitRedAndShowsTheYield(@TempDir Path dir) throws IOException {
        // the demo bank sags 2.25 mV below the lower limit and stays 2.3 mV under the upper one
        Path out = dir.resolve("r");
        Run r = run("check", DEMO.toString(), "--bank", DEMO_BANK.toString(), "--monte-carlo", "40", "--out",
                out.toString(), "--quiet");
        assertThat(r.code()).isEqualTo(ExitCodes.SPEC_NOT_MET);
        String html = Files.readString(out.resolve("report.html"));
        assertThat(html).contains("<div class=\"bad\"><dt>V_min (limit 0.8730 V)</dt>")
                .contains("<div class=\"good\"><dt>V_max (limit 0.9270 V)</dt>");
        // after --monte-carlo: a yield card (red, under 95 %) and the failing samples shaded in the histograms
        assertThat(html).containsPattern("<div class=\"bad\"><dt>Yield \\(Monte Carlo\\)</dt><dd>[0-9.]+ % \\([0-9]+ of 40 samples\\)");
        assertThat(html).contains("beyond the allowance: failing samples");
    }

    @Test
    void missingScenarioFileIsAnIoError() {
        Run r = run("check", "no/such/scenario.toml", "--bank", DEMO_BANK.toString());
        assertThat(r.code()).isEqualTo(ExitCodes.IO_ERROR);
        assertThat(r.err()).contains("no such file").contains("scenario.toml").doesNotContain("Exception");
    }

    @Test
    void unknownFootprintIsAUsageErrorWithAHint() {
        Run r = run("check", DEMO.toString(), "--bank", DEMO_BANK.toString(), "--footprint", "via-in-pda");
        assertThat(r.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(r.err()).contains("unknown footprint 'via-in-pda'").contains("via-in-pad");
    }

    @Test
    void badCatalogGivesExit3WithEveryProblemLocatedAndWritesNothing(@TempDir Path dir) throws IOException {
        Path catalog = dir.resolve("parts.csv");
        Files.writeString(catalog, """
                part,capacitance,esr,esl,mount_inductance,cost
                A,10nH,5m,0.4n,0.3n,0.01
                B,1u,-5m,0.4n,0.3n,0.01
                """);
        Path scenario = dir.resolve("rail.toml");
        Files.writeString(scenario, """
                [rail]
                voltage = "1 V"
                tolerance = "5 %"
                max_current = "2 A"
                [band]
                from = "10 kHz"
                to = "100 MHz"
                [regulator]
                inductance = "10 nH"
                [die]
                capacitance = "100 nF"
                [catalog]
                file = "parts.csv"
                """);
        Path bank = dir.resolve("bank.csv");
        Files.writeString(bank, "part,count\nA,1\n");
        Path out = dir.resolve("out");
        Run r = run("check", scenario.toString(), "--bank", bank.toString(), "--out", out.toString());
        assertThat(r.code()).isEqualTo(ExitCodes.INVALID_INPUT);
        assertThat(r.err()).contains("parts.csv:2:").contains("parts.csv:3:").contains("2 problems");
        assertThat(r.err()).doesNotContain("Exception");
        assertThat(out).doesNotExist();
    }

    @Test
    void badScenarioValueIsLocated(@TempDir Path dir) throws IOException {
        Files.copy(ROOT.resolve("parts-catalog/compact-mlcc.csv"), dir.resolve("parts.csv"));
        Path scenario = dir.resolve("rail.toml");
        Files.writeString(scenario, """
                [rail]
                voltage = "1 V"
                tolerance = "5 %"
                max_curent = "2 A"
                [band]
                from = "10 kHz"
                to = "100 MHz"
                [regulator]
                inductance = "-10 nH"
                [die]
                capacitance = "100 nF"
                [catalog]
                file = "parts.csv"
                """);
        Path bank = dir.resolve("bank.csv");
        Files.writeString(bank, "part,count\n");
        Run r = run("check", scenario.toString(), "--bank", bank.toString());
        assertThat(r.code()).isEqualTo(ExitCodes.INVALID_INPUT);
        assertThat(r.err()).contains("rail.toml:4:").contains("max_current"); // did-you-mean for the typo
        assertThat(r.err()).contains("rail.toml:9:");                         // the negative inductance
    }

    @Test
    void checkWritesTheResultFilesAndTheSummaryKeys(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("result");
        Run r = run("check", DEMO.toString(), "--bank", DEMO_BANK.toString(), "--out", out.toString(), "--quiet");
        assertThat(r.code()).isIn(ExitCodes.OK, ExitCodes.SPEC_NOT_MET);
        assertThat(r.out()).isEmpty();
        for (String f : new String[] {"bom.csv", "impedance.csv", "worst-case.csv", "summary.json", "report.html",
            "impedance.svg", "worst-case.svg"}) {
            assertThat(out.resolve(f)).isRegularFile();
        }
        JsonNode s = new ObjectMapper().readTree(out.resolve("summary.json").toFile());
        for (String key : new String[] {"rail.target_impedance_ohm", "rail.current_step_a", "worst_case.droop_v",
            "worst_case.overshoot_v", "worst_case.min_voltage_v", "worst_case.max_voltage_v", "worst_case.passes",
            "impedance.peak_ohm", "impedance.peak_hz", "impedance.flatness_db", "cost_total", "total_parts",
            "distinct_parts", "worst_case_ratio"}) {
            JsonNode n = s;
            for (String part : key.split("\\.")) {
                n = n.path(part);
            }
            assertThat(n.isMissingNode()).as(key).isFalse();
        }
        assertThat(s.path("anti_resonances").isArray()).isTrue();
        assertThat(s.path("bank").size()).isEqualTo(5);
        assertThat(s.path("worst_case").path("passes").asBoolean()).isEqualTo(r.code() == ExitCodes.OK);
        // the exit code follows the verdict
        assertThat(s.path("meets_spec").asBoolean()).isEqualTo(r.code() == ExitCodes.OK);
        // no temporary files left behind
        try (var files = Files.list(out)) {
            assertThat(files.map(p -> p.getFileName().toString())).noneMatch(n -> n.endsWith(".tmp"));
        }
        // BOM total equals cost_total
        String bom = Files.readString(out.resolve("bom.csv"));
        String total = bom.lines().filter(l -> l.startsWith("TOTAL,")).findFirst().orElseThrow();
        double bomTotal = Double.parseDouble(total.substring(total.lastIndexOf(',') + 1));
        assertThat(bomTotal).isEqualTo(s.path("cost_total").asDouble());
    }

    @Test
    void aBomWrittenByCheckReadsBackAsTheSameBank(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("first");
        run("check", DEMO.toString(), "--bank", DEMO_BANK.toString(), "--out", out.toString(), "--quiet");
        Run again = run("check", DEMO.toString(), "--bank", out.resolve("bom.csv").toString(), "--json");
        assertThat(again.code()).as(again.err()).isIn(ExitCodes.OK, ExitCodes.SPEC_NOT_MET);
        JsonNode first = new ObjectMapper().readTree(out.resolve("summary.json").toFile());
        JsonNode second = new ObjectMapper().readTree(again.out());
        assertThat(second.path("bank")).isEqualTo(first.path("bank"));
        assertThat(second.path("cost_total").asDouble()).isEqualTo(first.path("cost_total").asDouble());
    }

    @Test
    void jsonGoesToStandardOutput() throws IOException {
        Run r = run("check", DEMO.toString(), "--bank", DEMO_BANK.toString(), "--json");
        JsonNode s = new ObjectMapper().readTree(r.out());
        assertThat(s.path("mode").asText()).isEqualTo("check");
        // Z_t = V x tolerance / dI (common practice); the demo rail: 0.9 V, 3 %, dI = 50 % of 5 A = 2.5 A.
        // Within 1e-15 ohm: the product and quotient may round differently in the last bit.
        assertThat(s.path("rail").path("target_impedance_ohm").asDouble())
                .isCloseTo(0.9 * 0.03 / 2.5, org.assertj.core.api.Assertions.within(1e-15));
    }
}
