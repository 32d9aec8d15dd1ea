package breakwater.cli;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/** --export on the command line: formats, repetition, and the need for --out. */
class ExportOptionsTest {
    static final String SCENARIO = CliTest.ROOT.resolve("scenarios/buoy-io.toml").toString();
    static final String BANK = CliTest.ROOT.resolve("scenarios/buoy-io.bank.csv").toString();

    @Test
    void exportWithoutOutIsAUsageErrorBeforeAnyWork() {
        for (String command : new String[] {"check", "solve", "trim"}) {
            CliTest.Run r = command.equals("check") ? CliTest.run(command, SCENARIO, "--bank", BANK, "--export", "spice")
                    : CliTest.run(command, SCENARIO, "--export", "spice", "--moves", "10");
            assertThat(r.code()).as(command).isEqualTo(ExitCodes.USAGE);
            assertThat(r.err()).contains("--export", "needs --out DIR").doesNotContain("Exception");
        }
    }

    @Test
    void unknownFormatIsAUsageErrorNamingTheFormats() {
        CliTest.Run r = CliTest.run("check", SCENARIO, "--bank", BANK, "--out", "x", "--export", "spice,gerber");
        assertThat(r.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(r.err()).contains("'gerber' is not an export format", "spice", "touchstone");
    }

    @Test
    void commaListAndRepeatedOptionWriteTheSameFiles(@TempDir Path dir) {
        Path a = dir.resolve("a");
        Path b = dir.resolve("b");
        Path c = dir.resolve("c");
        CliTest.Run ra = CliTest.run("check", SCENARIO, "--bank", BANK, "--out", a.toString(), "--export",
                "spice,touchstone");
        CliTest.Run rb = CliTest.run("check", SCENARIO, "--bank", BANK, "--out", b.toString(), "--export", "Spice",
                "--export", "TOUCHSTONE");
        CliTest.Run rc = CliTest.run("check", SCENARIO, "--bank", BANK, "--out", c.toString(), "--export", "spice");
        assertThat(ra.code()).as(ra.err()).isIn(0, 1);
        assertThat(rb.code()).isEqualTo(ra.code());
        for (Path p : new Path[] {a, b}) {
            assertThat(p.resolve("rail-droop.cir")).isRegularFile();
            assertThat(p.resolve("rail-overshoot.cir")).isRegularFile();
            assertThat(p.resolve("impedance.s1p")).isRegularFile();
        }
        assertThat(a.resolve("rail-droop.cir")).hasSameTextualContentAs(b.resolve("rail-droop.cir"));
        assertThat(c.resolve("rail-droop.cir")).isRegularFile();
        assertThat(c.resolve("impedance.s1p")).doesNotExist();
        assertThat(ra.out()).contains("rail-droop.cir, rail-overshoot.cir, impedance.s1p");
    }
}
