package breakwater.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import static breakwater.cli.CliTest.run;
import static org.assertj.core.api.Assertions.assertThat;

/** Case codes the catalog does not have are warned about where they are written, in every output. */
class CaseWarningsCliTest {

    @Test
    void anUnknownCaseInAFootprintAndABoardLimitIsWarnedWithItsLine(@TempDir Path dir) throws IOException {
        // the demo's 7343 case becomes 0420, a case no catalog part has: a typing slip the run must point at
        Path rail = CountLimitsCliTest.demoCopy(dir, "7343 = 2\n", "0420 = 2\n");
        Files.writeString(rail, Files.readString(rail).replace("7343 = \"1.2 nH\"", "0420 = \"1.2 nH\""));
        int boardLine = lineOf(rail, "0420 = 2");
        int footprintLine = lineOf(rail, "0420 = \"1.2 nH\"");
        Path bank = dir.resolve("drone-core.bank.csv");
        Path out = dir.resolve("out");
        CliTest.Run r = run("check", rail.toString(), "--bank", bank.toString(), "--footprint", "two-via",
                "--out", out.toString());
        assertThat(r.code()).as(r.err()).isIn(ExitCodes.OK, ExitCodes.SPEC_NOT_MET);
        String board = "rail.toml:" + boardLine + ":8: board.max_per_case.0420: no part of the catalog has case 0420";
        String footprint = "rail.toml:" + footprintLine + ":8: footprint.two-via.0420: no part of the catalog has "
                + "case 0420";
        String left = "footprint two-via gives no mounting inductance for case 7343: those parts keep the catalog's "
                + "mount_inductance";
        assertThat(r.out()).contains("Warnings", board, footprint, left);
        JsonNode s = new ObjectMapper().readTree(out.resolve("summary.json").toFile());
        assertThat(s.path("warnings")).hasSize(3);
        assertThat(s.path("warnings").get(0).asText()).contains(board);
        assertThat(Files.readString(out.resolve("report.html"))).contains("Warning: ").contains("case 0420");
    }

    @Test
    void theDemoRailsHaveNoWarnings() throws IOException {
        CliTest.Run r = run("check", CliTest.DEMO.toString(), "--bank", CliTest.DEMO_BANK.toString(), "--json");
        assertThat(new ObjectMapper().readTree(r.out()).path("warnings").isArray()).isTrue();
        assertThat(new ObjectMapper().readTree(r.out()).path("warnings")).isEmpty();
        assertThat(r.out()).doesNotContain("Warning:");
    }

    private static int lineOf(Path file, String text) throws IOException {
        var lines = Files.readAllLines(file);
        for (int i = 0; i < lines.size(); i++) {
            if (lines.get(i).startsWith(text)) {
                return i + 1;
            }
        }
        throw new AssertionError(text + " not in " + file);
    }
}
