package breakwater.cli;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.IntRange;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Any finite number in any numeric field of the inputs ends as a judged bank (exit 0 or 1) or a located
 * refusal (exit 3, {@code file:line:column:}), never as an internal error (exit 70) or a trace. The values
 * are drawn log-uniformly over the whole range of doubles (10^-300 … 10^300, either sign, and 0), so
 * most of them fall outside the plausible ranges and the rest inside.
 */
class PlausibleInputProperties {

    static final List<String> CATALOG_FIELDS = List.of("capacitance", "esr", "esl", "mount_inductance", "cost",
            "voltage_rating", "tolerance", "dc_bias_retention");
    /** Scenario keys with the line that holds them in {@link #scenario}. */
    static final List<String> SCENARIO_KEYS = List.of("rail.voltage", "rail.tolerance", "rail.max_current",
            "rail.step", "rail.edge_time", "band.from", "band.to", "regulator.resistance", "regulator.inductance",
            "plane.capacitance", "plane.resistance", "package.resistance", "package.inductance", "die.capacitance",
            "die.resistance", "cost.placement", "cost.line_item", "footprint.pads.0402");

    @Provide
    Arbitrary<Double> anyFinite() {
        Arbitrary<Double> magnitude = Arbitraries.doubles().between(-300, 300).ofScale(3).map(e -> Math.pow(10, e));
        return Arbitraries.oneOf(magnitude, magnitude.map(v -> -v), Arbitraries.just(0.0),
                Arbitraries.doubles().between(0.001, 10).ofScale(4));
    }

    static String scenario(String catalog, String key, String value) {
        String[][] values = {
            {"rail.voltage", "1.0"}, {"rail.tolerance", "0.05"}, {"rail.max_current", "2.0"}, {"rail.step", "0.5"},
            {"rail.edge_time", "1e-9"}, {"band.from", "1e4"}, {"band.to", "1e8"}, {"regulator.resistance", "1e-3"},
            {"regulator.inductance", "10e-9"}, {"plane.capacitance", "2e-9"}, {"plane.resistance", "1e-3"},
            {"package.resistance", "1e-3"}, {"package.inductance", "20e-12"}, {"die.capacitance", "100e-9"},
            {"die.resistance", "5e-3"}, {"cost.placement", "0.004"}, {"cost.line_item", "0.1"},
            {"footprint.pads.0402", "0.4e-9"}};
        StringBuilder b = new StringBuilder();
        String table = "";
        for (String[] kv : values) {
            String k = kv[0];
            String section = k.substring(0, k.lastIndexOf('.'));
            if (!section.equals(table)) {
                b.append('[').append(section).append("]\n");
                if (section.equals("cost")) {
                    b.append("currency = \"EUR\"\n");
                }
                table = section;
            }
            b.append(k.substring(k.lastIndexOf('.') + 1)).append(" = ").append(k.equals(key) ? value : kv[1]).append('\n');
        }
        b.append("[catalog]\nfile = \"").append(catalog).append("\"\n");
        return b.toString();
    }

    static final String HEADER = "part,case,capacitance,esr,esl,mount_inductance,cost,voltage_rating,tolerance,"
            + "dc_bias_retention\n";
    static final String[] GOOD = {"1e-6", "10e-3", "0.4e-9", "0.4e-9", "0.01", "10", "0.1", "0.8"};

    static void judgedOrLocated(CliTest.Run r, String where) {
        assertThat(r.code()).as(where + "\n" + r.err()).isIn(ExitCodes.OK, ExitCodes.SPEC_NOT_MET, ExitCodes.INVALID_INPUT);
        assertThat(r.err()).as(where).doesNotContain("internal error", "\tat ", "Exception");
        if (r.code() == ExitCodes.INVALID_INPUT) {
            assertThat(r.err()).as(where).containsPattern("\\.(csv|toml):\\d+:\\d+: ");
        }
    }

    @Property(tries = 40)
    void anyFiniteCatalogValueIsJudgedOrRefusedWhereItIsWritten(@ForAll @IntRange(min = 0, max = 7) int field,
                                                                 @ForAll("anyFinite") double value) throws IOException {
        Path dir = Files.createTempDirectory("bw-prop");
        String[] row = GOOD.clone();
        row[field] = String.format(Locale.ROOT, "%s", value);
        Files.writeString(dir.resolve("parts.csv"), HEADER + "P1,0402," + String.join(",", row) + "\n"
                + "P2,0402,100e-9,30e-3,0.3e-9,0.4e-9,0.005,16,0.1,0.9\n");
        Files.writeString(dir.resolve("rail.toml"), scenario("parts.csv", "", ""));
        Files.writeString(dir.resolve("bank.csv"), "part,count\nP1,4\nP2,4\n");
        judgedOrLocated(CliTest.run("check", dir.resolve("rail.toml").toString(), "--bank",
                dir.resolve("bank.csv").toString(), "--quiet"), CATALOG_FIELDS.get(field) + " = " + value);
    }

    @Property(tries = 60)
    void anyFiniteScenarioValueIsJudgedOrRefusedWhereItIsWritten(@ForAll @IntRange(min = 0, max = 17) int key,
                                                                  @ForAll("anyFinite") double value) throws IOException {
        Path dir = Files.createTempDirectory("bw-prop");
        Files.writeString(dir.resolve("parts.csv"), HEADER + "P1,0402," + String.join(",", GOOD) + "\n");
        String k = SCENARIO_KEYS.get(key);
        Files.writeString(dir.resolve("rail.toml"), scenario("parts.csv", k, String.format(Locale.ROOT, "%s", value)));
        Files.writeString(dir.resolve("bank.csv"), "part,count\nP1,8\n");
        judgedOrLocated(CliTest.run("check", dir.resolve("rail.toml").toString(), "--bank",
                dir.resolve("bank.csv").toString(), "--quiet"), k + " = " + value);
    }
}
