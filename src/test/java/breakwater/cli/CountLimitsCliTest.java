package breakwater.cli;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import static breakwater.cli.CliTest.DEMO;
import static breakwater.cli.CliTest.DEMO_BANK;
import static breakwater.cli.CliTest.run;
import static org.assertj.core.api.Assertions.assertThat;

/** Counts and sizes that would overflow or exhaust the machine are refused before any work, with the limit. */
class CountLimitsCliTest {

    /** The demo rail with its catalog and bank copied beside it, so that one line can be changed. */
    static Path demoCopy(Path dir, String from, String to) throws IOException {
        Path catalog = CliTest.ROOT.resolve("parts-catalog/general-purpose.csv");
        Files.copy(catalog, dir.resolve("parts.csv"));
        String toml = Files.readString(DEMO).replace("../parts-catalog/general-purpose.csv", "parts.csv");
        assertThat(toml).contains(from);
        Files.writeString(dir.resolve("rail.toml"), toml.replace(from, to));
        Files.copy(DEMO_BANK, dir.resolve("drone-core.bank.csv"));
        return dir.resolve("rail.toml");
    }

    @Test
    void aHugeCountInABankIsRefusedWithItsLineAndTheLimit(@TempDir Path dir) throws IOException {
        Path bank = dir.resolve("bank.csv");
        Files.writeString(bank, "part,count\nC0402-X5R-1U0-10,2147483647\n");
        CliTest.Run r = run("check", DEMO.toString(), "--bank", bank.toString());
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.INVALID_INPUT);
        assertThat(r.err()).contains("bank.csv:2:18: ", "is too large, a count is at most 100000")
                .doesNotContain("-2 parts");
        assertThat(r.out()).isEmpty();
    }

    @Test
    void aCountAtTheLimitIsExactInTheTotal(@TempDir Path dir) throws IOException {
        // 3 × 100000 parts: the total is their sum exactly, and the board limit it breaks is named
        Path bank = dir.resolve("bank.csv");
        Files.writeString(bank, "part,count\nC0402-X5R-1U0-10,100000\nC0402-X7R-100N-16,100000\n"
                + "C0603-C0G-10N-50,100000\n");
        CliTest.Run r = run("check", DEMO.toString(), "--bank", bank.toString(), "--json");
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.SPEC_NOT_MET);
        assertThat(r.out()).contains("\"total_parts\" : 300000", "board.max_parts");
    }

    @Test
    void maxPartsBeyondTheRealLimitSaysTheLimit(@TempDir Path dir) throws IOException {
        Path rail = demoCopy(dir, "max_parts = 120", "max_parts = 99999999999999");
        CliTest.Run r = run("check", rail.toString(), "--bank", dir.resolve("drone-core.bank.csv").toString());
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.INVALID_INPUT);
        assertThat(r.err()).contains("rail.toml:", "board.max_parts is 99999999999999, it must be a whole number "
                + "from 1 to 1000000");
    }

    @Test
    void aCatalogMaxCountBeyondTheLimitIsLocated(@TempDir Path dir) throws IOException {
        Path rail = demoCopy(dir, "max_parts = 120", "max_parts = 120");
        Path catalog = dir.resolve("parts.csv");
        String text = Files.readString(catalog);
        String row = text.lines().filter(l -> l.startsWith("C0402-X5R-1U0-10,")).findFirst().orElseThrow();
        Files.writeString(catalog, text.replace(row, row + "5000000000"));
        CliTest.Run r = run("check", rail.toString(), "--bank", dir.resolve("drone-core.bank.csv").toString());
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.INVALID_INPUT);
        assertThat(r.err()).contains("parts.csv:", "max_count '5000000000' is too large, it must be at most 100000");
    }

    @Test
    void monteCarloZeroAndHugeAreUsageErrors() {
        CliTest.Run zero = run("check", DEMO.toString(), "--bank", DEMO_BANK.toString(), "--monte-carlo", "0");
        assertThat(zero.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(zero.err()).contains("--monte-carlo is the number of samples, 1 to 1000000, got 0",
                "leave the option out");
        CliTest.Run huge = run("check", DEMO.toString(), "--bank", DEMO_BANK.toString(), "--monte-carlo",
                "2000000000");
        assertThat(huge.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(huge.err()).contains("1 to 1000000, got 2000000000").doesNotContain("at breakwater.");
    }

    @Test
    void solversAreCapped() {
        CliTest.Run r = run("solve", DEMO.toString(), "--solvers", "5000", "--moves", "10");
        assertThat(r.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(r.err()).contains("--solvers is 1 to 64", "got 5000");
    }

    @Test
    void frontierPointsAreBoundedAndFittedToTheTimeLimit() {
        CliTest.Run many = run("frontier", DEMO.toString(), "--points", "100000");
        assertThat(many.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(many.err()).contains("--points is 2", "to 50, got 100000");
        // 2 s over 21 searches is 95 ms each, under the 200 ms a search needs: 9 points fit (10 searches)
        CliTest.Run tight = run("frontier", DEMO.toString(), "--points", "20", "--time-limit", "2s");
        assertThat(tight.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(tight.err()).contains("leaves each of the 21 searches 95 ms", "at most 9 points fit",
                "at least 4.2 s");
    }

    @Test
    void anEmptyOutIsRefused() {
        CliTest.Run r = run("check", DEMO.toString(), "--bank", DEMO_BANK.toString(), "--out", "");
        assertThat(r.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(r.err()).contains("names no folder");
    }

    @Test
    void anOutUnderAFileSaysTheFolderCannotBeCreatedAndWhy(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("notes.txt");
        Files.writeString(file, "x");
        CliTest.Run r = run("check", DEMO.toString(), "--bank", DEMO_BANK.toString(), "--out",
                file.resolve("results").toString());
        assertThat(r.code()).isEqualTo(ExitCodes.IO_ERROR);
        assertThat(r.err()).contains("cannot create the folder", "notes.txt' is a file, not a folder")
                .doesNotContain("no such file");
        assertThat(r.out()).isEmpty();
    }

    @Test
    void anOutWhereTheSystemTakesNoFolderSaysSo() {
        Path proc = Path.of("/proc");
        org.junit.jupiter.api.Assumptions.assumeTrue(Files.isDirectory(proc.resolve("self")), "a Linux /proc");
        CliTest.Run r = run("check", DEMO.toString(), "--bank", DEMO_BANK.toString(), "--out", "/proc/x");
        assertThat(r.code()).isEqualTo(ExitCodes.IO_ERROR);
        assertThat(r.err()).contains("cannot create the folder '/proc/x' for the results: '/proc' does not let a "
                + "folder be made in it").doesNotContain("no such file:");
    }
}
