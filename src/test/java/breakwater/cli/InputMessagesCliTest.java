package breakwater.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import static breakwater.cli.CliTest.DEMO_BANK;
import static breakwater.cli.CliTest.run;
import static breakwater.cli.CountLimitsCliTest.demoCopy;
import static org.assertj.core.api.Assertions.assertThat;

/**
 * Messages about malformed inputs, read as a user reads them: each names the file, line and column and
 * what to do, never a Java class, a library's own wording or a temporary file.
 */
class InputMessagesCliTest {

    /** Words that would betray the program's insides rather than talk about the user's file. */
    static void speaksPlainly(CliTest.Run r) {
        assertThat(r.err()).doesNotContain("Exception", "java.", "com.fasterxml", "jackson", "Jackson",
                "StreamReadConstraints", "org.apache", "\tat ", "/tmp/breakwater", ".staging");
    }

    @Test
    void aTableDefinedTwiceNamesBothLines(@TempDir Path dir) throws IOException {
        Path rail = demoCopy(dir, "[band]", "[band]");
        Files.writeString(rail, Files.readString(rail) + "\n[rail]\nname = \"again\"\n");
        int first = CliTest.lineOf(rail, "[rail]");
        int second = Files.readAllLines(rail).size() - 1;
        CliTest.Run r = run("check", rail.toString(), "--bank", DEMO_BANK.toString());
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.INVALID_INPUT);
        assertThat(r.err()).contains("rail.toml:" + second + ":1: [rail] is defined twice; first at line " + first
                + ". Merge the two tables");
        speaksPlainly(r);
    }

    @Test
    void aKeyGivenTwiceNamesBothLines(@TempDir Path dir) throws IOException {
        Path rail = demoCopy(dir, "max_current = \"5 A\"", "max_current = \"5 A\"\nmax_current = \"6 A\"");
        int first = CliTest.lineOf(rail, "max_current = \"5 A\"");
        CliTest.Run r = run("check", rail.toString(), "--bank", DEMO_BANK.toString());
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.INVALID_INPUT);
        assertThat(r.err()).contains("rail.toml:" + (first + 1) + ":1: rail.max_current is given twice; first at line "
                + first + ". Keep one of the two lines");
        speaksPlainly(r);
    }

    @Test
    void invisibleCharactersAreNamedByCodePointAndColumn(@TempDir Path dir) throws IOException {
        // a zero-width space inside a key: the parser alone would say "unknown token"
        Path rail = demoCopy(dir, "max_current = ", "max\u200B_current = ");
        int line = CliTest.lineOf(rail, "max\u200B_current");
        CliTest.Run r = run("check", rail.toString(), "--bank", DEMO_BANK.toString());
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.INVALID_INPUT);
        assertThat(r.err()).contains("rail.toml:" + line + ":4: U+200B (zero-width space) at column 4: an invisible "
                + "character, delete it");
        speaksPlainly(r);

        // a no-break space in a section header, and a byte-order mark inside a line
        Path header = demoCopy(Files.createDirectories(dir.resolve("h")), "[band]", "[band]\u00A0");
        CliTest.Run h = run("check", header.toString(), "--bank", DEMO_BANK.toString());
        assertThat(h.err()).contains(":7: U+00A0 (no-break space) at column 7: type a plain space");
        Path bom = demoCopy(Files.createDirectories(dir.resolve("b")), "voltage = \"0.90 V\"", "voltage = \uFEFF\"0.90 V\"");
        CliTest.Run b = run("check", bom.toString(), "--bank", DEMO_BANK.toString());
        assertThat(b.err()).contains(":11: U+FEFF (byte-order mark) at column 11");

        // in a catalog's part name: the bank's name no longer matches, and the catalog row is what is wrong
        Path cat = dir.resolve("h/parts.csv");
        Files.writeString(cat, Files.readString(cat).replace("C0402-X5R-1U0-10,", "C0402-X5R-1U0-10\u202F,"));
        int row = CliTest.lineOf(cat, "C0402-X5R-1U0-10\u202F");
        Path plain = demoCopy(Files.createDirectories(dir.resolve("c")), "[band]", "[band]");
        Files.copy(cat, dir.resolve("c/parts.csv"), java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        CliTest.Run c = run("check", plain.toString(), "--bank", DEMO_BANK.toString());
        assertThat(c.code()).as(c.err()).isEqualTo(ExitCodes.INVALID_INPUT);
        assertThat(c.err()).contains("parts.csv:" + row + ":17: U+202F (narrow no-break space) at column 17: type a "
                + "plain space");

        // a tab inside a bank row, and a no-break space in a bank's count (a bank has no units)
        Path bank = dir.resolve("bank.csv");
        Files.writeString(bank, "part,count\nC0402-X5R-1U0-10,\t20\nC0201-X5R-100N-10,2\u00A04\n");
        Path clean = demoCopy(Files.createDirectories(dir.resolve("t")), "[band]", "[band]");
        CliTest.Run t = run("check", clean.toString(), "--bank", bank.toString());
        assertThat(t.err()).contains("bank.csv:2:18: U+0009 (tab) at column 18", "bank.csv:3:20: U+00A0 (no-break "
                + "space) at column 20: type a plain space");
        speaksPlainly(t);
    }

    @Test
    void aNoBreakSpaceBetweenNumberAndUnitIsReadAsASpaceWithAWarning(@TempDir Path dir) throws IOException {
        Path rail = demoCopy(dir, "max_current = \"5 A\"", "max_current = \"5\u00A0A\"");
        int line = CliTest.lineOf(rail, "max_current");
        Path out = dir.resolve("out");
        CliTest.Run r = run("check", rail.toString(), "--bank", dir.resolve("drone-core.bank.csv").toString(),
                "--out", out.toString());
        assertThat(r.code()).as(r.err()).isIn(ExitCodes.OK, ExitCodes.SPEC_NOT_MET);
        String warning = "rail.toml:" + line + ":17: U+00A0 (no-break space) at column 17 between a number and its "
                + "unit, read as a plain space";
        assertThat(r.out()).contains("Warnings", warning);
        var summary = new ObjectMapper().readTree(out.resolve("summary.json").toFile());
        assertThat(summary.path("warnings").toString()).contains(warning);
        // and the same value judged as the plain-space file judges it
        CliTest.Run same = run("check", demoCopy(Files.createDirectories(dir.resolve("p")), "[band]", "[band]")
                .toString(), "--bank", DEMO_BANK.toString(), "--json");
        assertThat(new ObjectMapper().readTree(same.out()).path("worst_case"))
                .isEqualTo(summary.path("worst_case"));
    }

    @Test
    void parserLimitsAreSaidInOurWordsWithTheLine(@TempDir Path dir) throws IOException {
        Path deep = demoCopy(dir, "[band]", "nested = " + "[".repeat(3000) + "]".repeat(3000) + "\n[band]");
        int line = CliTest.lineOf(deep, "nested");
        CliTest.Run r = run("check", deep.toString(), "--bank", DEMO_BANK.toString());
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.INVALID_INPUT);
        assertThat(r.err()).contains("rail.toml:" + line + ": not valid TOML: arrays or inline tables nested too deeply");
        speaksPlainly(r);

        Path longNumber = demoCopy(Files.createDirectories(dir.resolve("n")), "max_current = \"5 A\"",
                "max_current = 1" + "0".repeat(1500));
        CliTest.Run n = run("check", longNumber.toString(), "--bank", DEMO_BANK.toString());
        assertThat(n.code()).as(n.err()).isEqualTo(ExitCodes.INVALID_INPUT);
        assertThat(n.err()).contains(":15: not valid TOML: a number too long to read");
        speaksPlainly(n);

        Path longValue = demoCopy(Files.createDirectories(dir.resolve("v")), "max_current = \"5 A\"",
                "max_current = \"" + "1".repeat(1500) + " A\"");
        CliTest.Run v = run("check", longValue.toString(), "--bank", DEMO_BANK.toString());
        assertThat(v.err()).contains(":15: rail.max_current: a value of 1502 characters", "(at most 64)");
        assertThat(v.err().length()).as("the value is not echoed whole").isLessThan(600);

        Path longLine = demoCopy(Files.createDirectories(dir.resolve("l")), "[band]", "# " + "x".repeat(20_000)
                + "\n[band]");
        int at = CliTest.lineOf(longLine, "# xxx");
        CliTest.Run l = run("check", longLine.toString(), "--bank", DEMO_BANK.toString());
        assertThat(l.err()).contains("rail.toml:" + at + ":1: line " + at + " is 20002 characters long, more than the "
                + "10000 an input line may have");
    }

    @Test
    void keysFoundWrongAfterReadingCarryTheirPlace(@TempDir Path dir) throws IOException {
        Path margin = demoCopy(dir, "seed = 1", "seed = 1\nmargin = \"60 mV\"");
        int line = CliTest.lineOf(margin, "margin");
        CliTest.Run m = run("solve", margin.toString(), "--moves", "10", "--solvers", "1");
        assertThat(m.code()).as(m.err()).isEqualTo(ExitCodes.INVALID_INPUT);
        assertThat(m.err()).contains("rail.toml:" + line + ":10: solver.margin 60 mV leaves no room");

        Path missing = demoCopy(Files.createDirectories(dir.resolve("e")), "file = \"drone-core.bank.csv\"",
                "file = \"elsewhere.csv\"");
        int existing = CliTest.lineOf(missing, "file = \"elsewhere.csv\"");
        CliTest.Run e = run("trim", missing.toString(), "--moves", "10", "--solvers", "1");
        assertThat(e.code()).as(e.err()).isEqualTo(ExitCodes.INVALID_INPUT);
        assertThat(e.err()).contains("rail.toml:" + existing + ":8: existing.file: bank file not found");

        Files.createDirectories(dir.resolve("f/banks"));
        Path folder = demoCopy(dir.resolve("f"), "file = \"drone-core.bank.csv\"", "file = \"banks\"");
        CliTest.Run f = run("trim", folder.toString(), "--moves", "10", "--solvers", "1");
        assertThat(f.err()).contains("rail.toml:" + existing + ":8: existing.file: names a folder");

        // ideal edges and nothing at the load node: the worst case is unbounded, said at the [rail] header
        String toml = Files.readString(CliTest.DEMO).replace("../parts-catalog/general-purpose.csv", "parts.csv")
                .replace("edge_time = \"1 ns\"", "");
        toml = toml.replaceAll("(?s)\\[plane\\].*?(?=\\[package\\])", "").replaceAll("(?s)\\[die\\].*?(?=\\[catalog\\])", "");
        Path unbounded = Files.writeString(dir.resolve("f/rail.toml"), toml);
        CliTest.Run u = run("check", unbounded.toString(), "--bank", DEMO_BANK.toString());
        assertThat(u.code()).as(u.err()).isEqualTo(ExitCodes.INVALID_INPUT);
        assertThat(u.err()).contains("rail.toml:" + CliTest.lineOf(unbounded, "[rail]") + ":2: rail.edge_time: with ideal load "
                + "edges");
        speaksPlainly(u);
    }

    @Test
    void aFolderWhereAFileBelongsIsNamedWithWhatWasExpected(@TempDir Path dir) throws IOException {
        Path folder = Files.createDirectories(dir.resolve("rail.toml.d"));
        CliTest.Run s = run("check", folder.toString(), "--bank", DEMO_BANK.toString());
        assertThat(s.code()).isEqualTo(ExitCodes.IO_ERROR);
        assertThat(s.err()).contains("rail.toml.d: is a folder, not a file; give a scenario file (TOML)");

        CliTest.Run b = run("check", CliTest.DEMO.toString(), "--bank", folder.toString());
        assertThat(b.err()).contains("rail.toml.d: is a folder, not a file; give a bank file (CSV: part,count)");

        Path rail = demoCopy(Files.createDirectories(dir.resolve("c")), "\"parts.csv\"", "\"parts\"");
        Files.createDirectories(dir.resolve("c/parts"));
        CliTest.Run c = run("check", rail.toString(), "--bank", DEMO_BANK.toString());
        assertThat(c.code()).isEqualTo(ExitCodes.INVALID_INPUT);
        assertThat(c.err()).contains(":8: catalog file \"parts\" is a folder", "catalog.file names the file itself");

        Path file = Files.writeString(dir.resolve("results"), "not a folder");
        CliTest.Run o = run("check", CliTest.DEMO.toString(), "--bank", DEMO_BANK.toString(), "--out", file.toString());
        assertThat(o.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(o.err()).contains("results' is a file, not a folder; give a folder for the results");
        for (CliTest.Run r : List.of(s, b, c, o)) {
            speaksPlainly(r);
        }
    }

    @Test
    void aMonteCarloToleranceProblemIsAnInputErrorAtTheCatalogRow(@TempDir Path dir) throws IOException {
        Path rail = demoCopy(dir, "[band]", "[band]");
        Path cat = dir.resolve("parts.csv");
        // the 0402 1 µF part's tolerance becomes 100 %: a draw could take its capacitance to nothing
        String text = Files.readString(cat);
        String row = text.lines().filter(l -> l.startsWith("C0402-X5R-1U0-10,")).findFirst().orElseThrow();
        Files.writeString(cat, text.replace(row, row.replaceFirst(",\\d+ %,", ",100 %,")));
        int line = CliTest.lineOf(cat, "C0402-X5R-1U0-10,");
        CliTest.Run r = run("check", rail.toString(), "--bank", dir.resolve("drone-core.bank.csv").toString(),
                "--monte-carlo", "10");
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.INVALID_INPUT);
        assertThat(r.err()).contains("parts.csv:" + line + ":", "tolerance '100 %' is outside 0..100 %");
        speaksPlainly(r);
    }

    @Test
    void moreMalformedInputsAreSaidInOurWords(@TempDir Path dir) throws IOException {
        // a key given a value, then used as a table: the parser's own words name its node types
        Path both = demoCopy(dir, "[board.max_per_case]", "[board.max_per_case]");
        Files.writeString(both, Files.readString(both).replace("max_distinct = 8", "max_distinct = 8\nmax_per_case = 3"));
        CliTest.Run b = run("check", both.toString(), "--bank", DEMO_BANK.toString());
        assertThat(b.code()).as(b.err()).isEqualTo(ExitCodes.INVALID_INPUT);
        assertThat(b.err()).contains(":" + CliTest.lineOf(both, "[board.max_per_case]") + ":1: [board.max_per_case] is defined "
                + "twice; first at line " + CliTest.lineOf(both, "max_per_case = 3")).doesNotContain("NUMBER", "non-object");

        // a multi-line string never closed
        Path open = demoCopy(Files.createDirectories(dir.resolve("o")), "[band]", "[band]");
        Files.writeString(open, Files.readString(open) + "note = \"\"\"never closed\n");
        CliTest.Run o = run("check", open.toString(), "--bank", DEMO_BANK.toString());
        assertThat(o.err()).contains("not valid TOML: the file ends inside a value: a closing quote");

        // command-line numbers: no Java type names
        CliTest.Run seed = run("solve", CliTest.DEMO.toString(), "--seed", "x");
        assertThat(seed.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(seed.err()).contains("'x' is not a whole number").doesNotContain("long");
        CliTest.Run samples = run("check", CliTest.DEMO.toString(), "--bank", DEMO_BANK.toString(), "--monte-carlo", "1e3");
        assertThat(samples.err()).contains("'1e3' is not a whole number").doesNotContain(" int");
        for (CliTest.Run r : List.of(b, o, seed, samples)) {
            speaksPlainly(r);
        }
    }
}
