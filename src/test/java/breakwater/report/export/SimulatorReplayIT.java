package breakwater.report.export;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.fail;

/**
 * The exported decks of each demo rail run in ngspice, a general-purpose open-source SPICE simulator, in
 * batch mode. The simulator integrates the same lumped model numerically; its transient minimum (droop
 * deck) and maximum (overshoot deck) of v(load) must agree with summary.json's min_voltage_v and
 * max_voltage_v within 0.5 % of the droop (resp. overshoot), and its AC |Z| with impedance.csv within 0.5 %
 * at 20 frequencies spread across the band. The tolerance leaves room for the simulator's trapezoidal
 * steps (1/50 of the fastest mode's period: a frequency error of (ωh)²/12 ≈ 0.13 % for that mode) and for
 * the pattern's coarse lag grid far from the worst instant (under 5e-4 of the worst case, README).
 *
 * <p>The decks stay plain SPICE3; the ngspice-specific commands that measure and write the results are in
 * a separate control file that includes the deck. Without ngspice on the PATH the test is skipped, except
 * in CI ({@code BREAKWATER_CI} set by {@code .ci/run}, which installs it), where that is a failure.
 */
class SimulatorReplayIT {
    static final Path ROOT = Path.of(System.getProperty("breakwater.root", ".")).toAbsolutePath();
    static final Pattern EXTREME = Pattern.compile("^vext = (\\S+)\\s*$", Pattern.MULTILINE);
    static final Pattern WHEN = Pattern.compile("^vat\\s*=\\s*\\S+\\s+at=\\s*(\\S+)", Pattern.MULTILINE);

    record Rail(String name, String scenario, String bank, boolean idealEdges) {
        @Override
        public String toString() {
            return name;
        }
    }

    static Stream<Rail> rails() {
        return Stream.of(
                new Rail("buoy-io", "scenarios/buoy-io.toml", "scenarios/buoy-io.bank.csv", false),
                new Rail("spectrometer-ddr", "scenarios/spectrometer-ddr.toml", "scenarios/spectrometer-ddr.bank.csv", false),
                // the same rail with ideal load edges: its patterns have jumps, split in the decks' PWL sources
                new Rail("spectrometer-ddr-ideal-edges", "scenarios/spectrometer-ddr.toml",
                        "scenarios/spectrometer-ddr.bank.csv", true),
                new Rail("drone-core", "scenarios/drone-core.toml", "scenarios/drone-core.bank.csv", false));
    }

    static Optional<Path> simulator() {
        for (String dir : System.getenv().getOrDefault("PATH", "").split(File.pathSeparator)) {
            Path p = Path.of(dir.isEmpty() ? "." : dir, "ngspice");
            if (Files.isExecutable(p)) {
                return Optional.of(p);
            }
        }
        return Optional.empty();
    }

    static Path requireSimulator() {
        Optional<Path> sim = simulator();
        if (sim.isEmpty()) {
            String message = "SPICE simulator missing: ngspice is not on the PATH (install it with "
                    + "'apt-get install ngspice'), so the exported decks were not replayed";
            if (!System.getenv().getOrDefault("BREAKWATER_CI", "").isEmpty()) {
                fail(message + "; in CI (BREAKWATER_CI is set) that is a failure: .ci/run should have installed it");
            }
            Assumptions.assumeTrue(false, message);
        }
        return sim.get();
    }

    /** The scenario with ideal load edges, its relative file names made absolute, in {@code dir}. */
    static Path idealEdgeVariant(Path scenario, Path dir) throws IOException {
        Path folder = scenario.getParent();
        StringBuilder out = new StringBuilder("# the demo rail with ideal load edges, for the simulator check\n");
        for (String line : Files.readAllLines(scenario, StandardCharsets.UTF_8)) {
            if (line.startsWith("edge_time")) {
                continue;
            }
            Matcher m = Pattern.compile("^file = \"(.*)\"(.*)$").matcher(line);
            out.append(m.matches() ? "file = \"" + folder.resolve(m.group(1)).normalize().toString().replace("\\", "/")
                    + "\"" + m.group(2) : line).append('\n');
        }
        Path p = dir.resolve("ideal-edges.toml");
        Files.writeString(p, out, StandardCharsets.UTF_8);
        return p;
    }

    static int launch(Path dir, List<String> args) throws IOException, InterruptedException {
        List<String> cmd = new ArrayList<>();
        cmd.add(ROOT.resolve("breakwater").toString());
        cmd.addAll(args);
        Process p = new ProcessBuilder(cmd).directory(ROOT.toFile())
                .redirectOutput(dir.resolve("breakwater.out").toFile())
                .redirectError(dir.resolve("breakwater.err").toFile()).start();
        assertThat(p.waitFor(10, TimeUnit.MINUTES)).as("breakwater finished").isTrue();
        return p.exitValue();
    }

    /** The control file: include the deck, run it, measure v(load)'s extreme and write the AC |Z|. */
    static Path control(Path dir, Path deck, boolean droop, Path acOut) throws IOException {
        String f = droop ? "vecmin" : "vecmax";
        String m = droop ? "MIN" : "MAX";
        String text = "* replay of " + deck.getFileName() + "\n"
                + ".include " + deck + "\n"
                + ".control\n"
                + "set numdgt=15\n"
                + "run\n"
                + "setplot tran1\n"
                + "let vext = " + f + "(v(load))\n"
                + "print vext\n"
                + "meas tran vat " + m + " v(load)\n"
                + "setplot ac1\n"
                + "wrdata " + acOut + " mag(v(load))\n"
                + "quit\n"
                + ".endc\n"
                + ".end\n";
        Path p = dir.resolve((droop ? "droop" : "overshoot") + "-control.cir");
        Files.writeString(p, text, StandardCharsets.US_ASCII);
        return p;
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("rails")
    void simulatorAgreesWithTheWorstCaseAndTheImpedance(Rail rail, @TempDir Path dir) throws Exception {
        Path ngspice = requireSimulator();
        Path scenario = rail.idealEdges() ? idealEdgeVariant(ROOT.resolve(rail.scenario()), dir)
                : ROOT.resolve(rail.scenario());
        Path out = dir.resolve("out");
        int code = launch(dir, List.of("check", scenario.toString(), "--bank", ROOT.resolve(rail.bank()).toString(),
                "--out", out.toString(), "--export", "spice,touchstone", "--quiet"));
        assertThat(code).as(Files.readString(dir.resolve("breakwater.err"))).isIn(0, 1);
        JsonNode summary = new ObjectMapper().readTree(out.resolve("summary.json").toFile());
        JsonNode wc = summary.path("worst_case");

        // both decks at once (one simulator process each)
        long start = System.nanoTime();
        Path acDroop = dir.resolve("droop-ac.txt");
        Path acOver = dir.resolve("overshoot-ac.txt");
        Process pd = new ProcessBuilder(ngspice.toString(), "-b", control(dir, out.resolve("rail-droop.cir"), true,
                acDroop).toString()).directory(dir.toFile()).redirectOutput(dir.resolve("droop.log").toFile())
                .redirectError(dir.resolve("droop.err").toFile()).start();
        Process po = new ProcessBuilder(ngspice.toString(), "-b", control(dir, out.resolve("rail-overshoot.cir"), false,
                acOver).toString()).directory(dir.toFile()).redirectOutput(dir.resolve("overshoot.log").toFile())
                .redirectError(dir.resolve("overshoot.err").toFile()).start();
        assertThat(pd.waitFor(40, TimeUnit.MINUTES) && po.waitFor(40, TimeUnit.MINUTES)).as("ngspice finished").isTrue();
        double seconds = (System.nanoTime() - start) / 1e9;
        assertThat(pd.exitValue()).as(Files.readString(dir.resolve("droop.err"))).isZero();
        assertThat(po.exitValue()).as(Files.readString(dir.resolve("overshoot.err"))).isZero();

        String droopLog = Files.readString(dir.resolve("droop.log"));
        String overLog = Files.readString(dir.resolve("overshoot.log"));
        double vmin = number(EXTREME, droopLog);
        double vmax = number(EXTREME, overLog);
        double droop = wc.path("droop_v").asDouble();
        double overshoot = wc.path("overshoot_v").asDouble();
        double droopError = Math.abs(vmin - wc.path("min_voltage_v").asDouble()) / droop;
        double overError = Math.abs(vmax - wc.path("max_voltage_v").asDouble()) / overshoot;
        double tMin = number(WHEN, droopLog);
        double tMax = number(WHEN, overLog);

        double acError = Math.max(acError(out, acDroop, summary), acError(out, acOver, summary));
        System.out.printf(Locale.ROOT, "simulator replay %s: droop %.6g V, ngspice minimum %.10f V (expected %.10f), "
                        + "error %.3g of the droop, at %.6g s; overshoot %.6g V, maximum %.10f V (expected %.10f), "
                        + "error %.3g of the overshoot, at %.6g s; AC |Z| worst relative error %.3g at 20 frequencies; "
                        + "ngspice took %.1f s for both decks at once%n", rail.name(), droop, vmin,
                wc.path("min_voltage_v").asDouble(), droopError, tMin, overshoot, vmax,
                wc.path("max_voltage_v").asDouble(), overError, tMax, acError, seconds);
        assertThat(droopError).as("ngspice minimum against min_voltage_v, share of the droop").isLessThan(0.005);
        assertThat(overError).as("ngspice maximum against max_voltage_v, share of the overshoot").isLessThan(0.005);
        assertThat(acError).as("ngspice AC |Z| against impedance.csv").isLessThan(0.005);
    }

    static double number(Pattern p, String log) {
        Matcher m = p.matcher(log);
        assertThat(m.find()).as("'" + p + "' in the simulator's output:\n" + log.lines().filter(l -> !l.contains(
                "Reference value")).limit(80).reduce("", (a, b) -> a + b + "\n")).isTrue();
        return Double.parseDouble(m.group(1));
    }

    /**
     * The worst relative error of the simulator's |Z| against impedance.csv at 20 of its frequencies spread
     * evenly (by index) across the band; the simulator's sweep lands on the same points.
     */
    static double acError(Path out, Path acFile, JsonNode summary) throws IOException {
        double from = summary.path("band").path("from_hz").asDouble();
        double to = summary.path("band").path("to_hz").asDouble();
        List<double[]> csv = new ArrayList<>();
        List<String> lines = Files.readAllLines(out.resolve("impedance.csv"));
        for (String line : lines.subList(1, lines.size())) {
            String[] c = line.split(",");
            double f = Double.parseDouble(c[0]);
            if (f >= from && f <= to) {
                csv.add(new double[] {f, Double.parseDouble(c[1])});
            }
        }
        List<double[]> sim = new ArrayList<>();
        for (String line : Files.readAllLines(acFile)) {
            String[] c = line.strip().split("\\s+");
            if (c.length >= 2) {
                sim.add(new double[] {Double.parseDouble(c[0]), Double.parseDouble(c[1])});
            }
        }
        assertThat(csv.size()).isGreaterThan(20);
        double worst = 0;
        for (int k = 0; k < 20; k++) {
            double[] row = csv.get((int) Math.round(k * (csv.size() - 1) / 19.0));
            double[] match = sim.stream().min((a, b) -> Double.compare(Math.abs(a[0] / row[0] - 1),
                    Math.abs(b[0] / row[0] - 1))).orElseThrow();
            // ngspice writes 13 significant digits here (numdgt); the next point of the sweep is 1.2 % away
            assertThat(Math.abs(match[0] / row[0] - 1)).as("simulator frequency near " + row[0] + " Hz").isLessThan(1e-9);
            worst = Math.max(worst, Math.abs(match[1] / row[1] - 1));
        }
        return worst;
    }
}
