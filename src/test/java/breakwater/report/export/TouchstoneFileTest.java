package breakwater.report.export;

import breakwater.cli.Main;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * impedance.s1p read back by a reader written here from the Touchstone 1.1 specification (from memory):
 * '!' starts a comment anywhere on a line; one option line '# [unit] [parameter] [format] [R n]' with the
 * tokens in any order, case-insensitive, defaults GHz, S, MA, R 50; then data lines of a frequency and, for
 * a one-port, one value pair; in version 1.x Z-parameters are normalised to the reference resistance R.
 */
class TouchstoneFileTest {

    /** A one-port file as frequencies in Hz and complex Z in ohms. */
    record OnePort(List<Double> frequencyHz, List<double[]> z) {
    }

    static OnePort read(List<String> lines) {
        double unit = 1e9;
        String parameter = "S";
        String format = "MA";
        double reference = 50;
        boolean options = false;
        List<Double> f = new ArrayList<>();
        List<double[]> z = new ArrayList<>();
        for (String raw : lines) {
            int bang = raw.indexOf('!');
            String line = (bang >= 0 ? raw.substring(0, bang) : raw).strip();
            if (line.isEmpty()) {
                continue;
            }
            if (line.startsWith("#")) {
                assertThat(options).as("one option line only").isFalse();
                assertThat(f).as("option line before the data").isEmpty();
                options = true;
                String[] t = line.substring(1).strip().toUpperCase(Locale.ROOT).split("\\s+");
                for (int i = 0; i < t.length; i++) {
                    switch (t[i]) {
                        case "HZ" -> unit = 1;
                        case "KHZ" -> unit = 1e3;
                        case "MHZ" -> unit = 1e6;
                        case "GHZ" -> unit = 1e9;
                        case "S", "Y", "Z", "H", "G" -> parameter = t[i];
                        case "DB", "MA", "RI" -> format = t[i];
                        case "R" -> reference = Double.parseDouble(t[++i]);
                        default -> throw new AssertionError("unknown option " + t[i]);
                    }
                }
                continue;
            }
            String[] t = line.split("\\s+");
            assertThat(t).as("a one-port data line: frequency and one pair").hasSize(3);
            double a = Double.parseDouble(t[1]);
            double b = Double.parseDouble(t[2]);
            double re;
            double im;
            switch (format) {
                case "RI" -> {
                    re = a;
                    im = b;
                }
                case "MA" -> {
                    re = a * Math.cos(Math.toRadians(b));
                    im = a * Math.sin(Math.toRadians(b));
                }
                default -> {
                    double m = Math.pow(10, a / 20);
                    re = m * Math.cos(Math.toRadians(b));
                    im = m * Math.sin(Math.toRadians(b));
                }
            }
            f.add(Double.parseDouble(t[0]) * unit);
            z.add(new double[] {re * reference, im * reference});
        }
        assertThat(parameter).isEqualTo("Z");
        return new OnePort(f, z);
    }

    @Test
    void readsBackToTheValuesOfImpedanceCsv(@TempDir Path dir) throws Exception {
        Path root = Path.of("").toAbsolutePath();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = Main.run(new String[] {"check", root.resolve("scenarios/buoy-io.toml").toString(), "--bank",
            root.resolve("scenarios/buoy-io.bank.csv").toString(), "--out", dir.toString(), "--export", "touchstone",
            "--quiet"}, new PrintStream(new ByteArrayOutputStream(), true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        assertThat(code).as(err.toString(StandardCharsets.UTF_8)).isIn(0, 1);
        List<String> s1p = Files.readAllLines(dir.resolve("impedance.s1p"));
        assertThat(s1p).contains(TouchstoneFile.OPTIONS);
        assertThat(s1p.stream().filter(l -> l.startsWith("!")).toList()).anyMatch(l -> l.contains("Touchstone 1.1"))
                .anyMatch(l -> l.contains("buoy-io.toml")).anyMatch(l -> l.contains("Bank:"))
                .anyMatch(l -> l.contains("a model is not a measurement"));
        OnePort p = read(s1p);
        List<String> csv = Files.readAllLines(dir.resolve("impedance.csv"));
        assertThat(p.frequencyHz()).hasSize(csv.size() - 1);
        for (int i = 1; i < csv.size(); i++) {
            String[] c = csv.get(i).split(",");
            double f = Double.parseDouble(c[0]);
            double mag = Double.parseDouble(c[1]);
            double phase = Double.parseDouble(c[2]);
            double[] z = p.z().get(i - 1);
            assertThat(p.frequencyHz().get(i - 1)).isCloseTo(f, within(1e-9 * f));
            assertThat(Math.hypot(z[0], z[1])).isCloseTo(mag, within(1e-9 * mag));
            assertThat(Math.toDegrees(Math.atan2(z[1], z[0]))).isCloseTo(phase, within(1e-9 * 180));
        }
    }
}
