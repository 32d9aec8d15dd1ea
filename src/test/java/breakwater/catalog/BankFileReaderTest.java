package breakwater.catalog;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

import breakwater.diagnostic.Diagnostic;
import breakwater.diagnostic.InputException;
import java.io.IOException;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Reading bank files against a catalog. Columns in expected messages are counted by hand (1-based). */
class BankFileReaderTest {

    private static final Catalog CATALOG = new Catalog("parts.csv", List.of(
            Part.of("T100N-0402", 100e-9, 25e-3, 0.35e-9, 0.4e-9, 0.004),
            Part.of("T4U7-0603", 4.7e-6, 5e-3, 0.45e-9, 0.45e-9, 0.012),
            Part.of("T100U-D", 100e-6, 9e-3, 1.2e-9, 0.6e-9, 0.21)));

    private static List<BankEntry> parse(String csv) throws InputException, IOException {
        return BankFileReader.parse(new StringReader(csv), "bank.csv", CATALOG);
    }

    private static List<String> problems(String csv) {
        InputException e = catchThrowableOfType(InputException.class, () -> parse(csv));
        assertThat(e).as("expected the bank to be refused").isNotNull();
        return e.diagnostics().stream().map(Diagnostic::render).toList();
    }

    @Test
    void readsPartsAndCountsInFileOrderDroppingZeroCounts(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("bank.csv");
        Files.writeString(file, "# an invented bank\nCount,Part\n12,T100N-0402\n0,T4U7-0603\n2,T100U-D\n");

        List<BankEntry> bank = BankFileReader.read(file, "bank.csv", CATALOG);

        assertThat(bank).extracting(e -> e.part().name(), BankEntry::count)
                .containsExactly(org.assertj.core.groups.Tuple.tuple("T100N-0402", 12),
                        org.assertj.core.groups.Tuple.tuple("T100U-D", 2));
    }

    @Test
    void headerOnlyIsAnEmptyBank() throws Exception {
        assertThat(parse("part,count\n")).isEmpty();
    }

    @Test
    void emptyFileIsRefused() {
        assertThat(problems("")).singleElement().asString().startsWith("bank.csv:1:1: ").contains("empty");
    }

    @Test
    void unknownPartSuggestsTheClosestCatalogName() {
        assertThat(problems("part,count\nT100N-0420,4\n")).singleElement().asString()
                .startsWith("bank.csv:2:1: ")
                .contains("unknown part 'T100N-0420'", "catalog parts.csv", "Maybe you meant 'T100N-0402'?");
    }

    @Test
    void badOrNegativeCountIsRefused() {
        assertThat(problems("part,count\nT100N-0402,-3\nT4U7-0603,two\nT100U-D,1.5\n")).satisfiesExactly(
                p -> assertThat(p).startsWith("bank.csv:2:12: ").contains("count '-3' is negative"),
                p -> assertThat(p).startsWith("bank.csv:3:11: ").contains("count 'two' is not a whole number"),
                p -> assertThat(p).startsWith("bank.csv:4:9: ").contains("count '1.5' is not a whole number"));
    }

    @Test
    void duplicatePartNamesTheFirstLine() {
        assertThat(problems("part,count\nT100U-D,1\nT100N-0402,3\nT100U-D,0\n")).singleElement().asString()
                .startsWith("bank.csv:4:1: ").contains("'T100U-D' is listed twice (first on line 2)");
    }

    @Test
    void unknownAndMissingColumnsAreNamed() {
        assertThat(problems("part,cnt\nT100U-D,1\n")).satisfiesExactly(
                p -> assertThat(p).startsWith("bank.csv:1:1: ").contains("missing required column 'count'"),
                p -> assertThat(p).startsWith("bank.csv:1:6: ").contains("unknown column 'cnt'",
                        "Maybe you meant 'count'?"));
    }

    @Test
    void reportsEveryProblemOfTheFileTogether() {
        String csv = """
                part,count
                T100N-0402,4
                T4U7-603,2
                T100U-D,-1
                T100N-0402,1
                T4U7-0603,3,extra
                """;
        assertThat(problems(csv)).satisfiesExactly(
                p -> assertThat(p).startsWith("bank.csv:3:1: ").contains("unknown part 'T4U7-603'"),
                p -> assertThat(p).startsWith("bank.csv:4:9: ").contains("negative"),
                p -> assertThat(p).startsWith("bank.csv:5:1: ").contains("listed twice"),
                p -> assertThat(p).startsWith("bank.csv:6:13: ").contains("3 fields"));
    }
}
