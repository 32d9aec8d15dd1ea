package breakwater.catalog;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;
import static org.assertj.core.api.Assertions.within;

import breakwater.diagnostic.Diagnostic;
import breakwater.diagnostic.InputException;
import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Reading parts catalogs. Expected values are the ones written in the fixture, converted with the SI
 * prefixes (BIPM SI Brochure, 9th ed., Table 7) and IEC 60062 letter codes (4u7 = 4.7 µ, from memory).
 * Comparisons use a relative tolerance of 1e-12: decimal × power of ten is not exact in binary, the
 * error is a few ulps. Columns in expected messages are counted by hand in the CSV text (1-based).
 */
class CatalogReaderTest {

    private static final double REL = 1e-12;
    private static final String HEADER = "part,capacitance,esr,esl,mount_inductance,cost\n";

    private static Catalog parse(String csv) throws InputException, IOException {
        return CatalogReader.parse(new StringReader(csv), "parts.csv");
    }

    private static List<String> problems(String csv) {
        InputException e = catchThrowableOfType(InputException.class, () -> parse(csv));
        assertThat(e).as("expected the catalog to be refused").isNotNull();
        return e.diagnostics().stream().map(Diagnostic::render).toList();
    }

    private static String onlyProblem(String csv) {
        List<String> found = problems(csv);
        assertThat(found).hasSize(1);
        return found.get(0);
    }

    @Test
    void readsEveryColumnOfTheFixtureFile() throws Exception {
        Path file = Path.of(getClass().getResource("small-catalog.csv").toURI());

        Catalog catalog = CatalogReader.read(file, "small-catalog.csv");

        assertThat(catalog.source()).isEqualTo("small-catalog.csv");
        assertThat(catalog.names()).containsExactly("T100N-0402", "T4U7-0603", "T100U-D");
        Part small = catalog.parts().get(0);
        assertThat(small.description()).isEqualTo("small ceramic, 100 nF");
        assertThat(small.caseCode()).isEqualTo("0402"); // EIA case codes keep their leading zero (common practice)
        assertThat(small.dielectric()).isEqualTo("X7R");
        assertThat(small.capacitanceF()).isCloseTo(100e-9, within(100e-9 * REL));
        assertThat(small.esrOhms()).isCloseTo(25e-3, within(25e-3 * REL));
        assertThat(small.eslH()).isCloseTo(0.35e-9, within(0.35e-9 * REL));
        assertThat(small.mountInductanceH()).isCloseTo(0.4e-9, within(0.4e-9 * REL));
        assertThat(small.unitCost()).isEqualTo(0.004);
        assertThat(small.voltageRatingV()).isEqualTo(6.3);
        assertThat(small.toleranceFraction()).isCloseTo(0.10, within(0.10 * REL));
        assertThat(small.dcBiasRetention()).isCloseTo(0.80, within(0.80 * REL));
        assertThat(small.maxCount()).isEqualTo(40);

        Part bulk = catalog.parts().get(1);
        assertThat(bulk.capacitanceF()).isCloseTo(4.7e-6, within(4.7e-6 * REL));
        assertThat(bulk.esrOhms()).isCloseTo(5e-3, within(5e-3 * REL));
        assertThat(bulk.dcBiasRetention()).isEqualTo(0.45);
        assertThat(bulk.maxCountLimit()).isEmpty();

        Part polymer = catalog.parts().get(2);
        assertThat(polymer.caseCode()).isEqualTo("D");
        assertThat(polymer.capacitanceF()).isCloseTo(100e-6, within(100e-6 * REL));
        assertThat(polymer.dcBiasRetention()).isEqualTo(1.0); // empty cell: no loss given
        assertThat(polymer.maxCount()).isEqualTo(8);
    }

    @Test
    void optionalColumnsMayBeLeftOut() throws Exception {
        Catalog catalog = parse(HEADER + "A,1u,10m,0.5n,0.3n,0.01\n");

        Part a = catalog.parts().get(0);
        assertThat(a.voltageRating()).isEmpty();
        assertThat(a.tolerance()).isEmpty();
        assertThat(a.dcBiasRetention()).isEqualTo(1.0);
        assertThat(a.maxCountLimit()).isEmpty();
        assertThat(a.caseCode()).isEmpty();
    }

    @Test
    void decimalCommaIsNamedNotJustCounted() {
        // "4,7u" splits into two fields in a CSV; the message says why the row is too long
        String p = onlyProblem(HEADER + "A,4,7u,10m,0.5n,0.3n,0.01\n");
        assertThat(p).contains("has 7 fields", "'4,7u' looks like a number with a decimal comma", "(4.7u)");
        // an ordinary extra field gets no such hint
        assertThat(onlyProblem(HEADER + "A,1u,10m,0.5n,0.3n,0.01,extra\n")).doesNotContain("decimal comma");
    }

    @Test
    void semicolonSeparatedFileIsNamedAsSuch() {
        String p = onlyProblem("part;capacitance;esr;esl;mount_inductance;cost\nA;1u;10m;0.5n;0.3n;0,01\n");
        assertThat(p).startsWith("parts.csv:1:1: ").contains("split by ';'", "comma-separated");
    }

    @Test
    void emptyFileIsLocatedAtItsStart() {
        assertThat(onlyProblem("")).startsWith("parts.csv:1:1: ").contains("empty", "header row");
        assertThat(onlyProblem("# only a comment\n\n")).startsWith("parts.csv:1:1: ").contains("empty");
    }

    @Test
    void headerWithoutRowsIsRefused() {
        assertThat(onlyProblem("# c\n" + HEADER)).startsWith("parts.csv:2:1: ").contains("no parts");
    }

    @Test
    void missingRequiredColumnIsNamed() {
        String p = onlyProblem("part,capacitance,esr,mount_inductance,cost\nA,1u,1m,1n,1\n");

        assertThat(p).startsWith("parts.csv:1:1: ").contains("missing required column 'esl'");
    }

    @Test
    void unknownColumnSuggestsTheClosestKnownOne() {
        List<String> found = problems("part,capacitence,esr,esl,mount_inductance,cost\nA,1u,1m,1n,1n,1\n");

        // column 6: "part," is 5 characters, the misspelt name starts right after it
        assertThat(found).anySatisfy(p -> assertThat(p)
                .startsWith("parts.csv:1:6: ")
                .contains("unknown column 'capacitence'", "Maybe you meant 'capacitance'?"));
        assertThat(found).anySatisfy(p -> assertThat(p).contains("missing required column 'capacitance'"));
    }

    @Test
    void duplicateColumnIsRefused() {
        String p = onlyProblem("part,capacitance,esr,esl,mount_inductance,cost,esr\nA,1u,1m,1n,1n,1,2m\n");

        assertThat(p).startsWith("parts.csv:1:48: ").contains("'esr' appears twice");
    }

    @Test
    void badNumberIsLocatedAtItsField() {
        // fields of "A,1..2,..." start at columns 1, 3
        assertThat(onlyProblem(HEADER + "A,1..2,1m,1n,1n,1\n"))
                .startsWith("parts.csv:2:3: ").contains("capacitance", "'1..2'", "not a number");
    }

    @Test
    void unknownUnitIsLocatedAndExplained() {
        assertThat(onlyProblem(HEADER + "A,1u,1 mX,1n,1n,1\n"))
                .startsWith("parts.csv:2:6: ").contains("esr", "unknown unit or prefix 'X'", "Ohm");
    }

    @Test
    void unitOfAnotherQuantityIsRefused() {
        assertThat(onlyProblem(HEADER + "A,10nH,1m,1n,1n,1\n"))
                .startsWith("parts.csv:2:3: ")
                .contains("'10nH' is an inductance (H), but a capacitance is expected");
    }

    @Test
    void nonPositiveCapacitanceAndEslAreRefused() {
        assertThat(problems(HEADER + "A,0,1m,1n,1n,1\nB,1u,1m,0,1n,1\nC,-1u,1m,1n,1n,1\n"))
                .satisfiesExactly(
                        p -> assertThat(p).startsWith("parts.csv:2:3: ").contains("capacitance '0' is not positive"),
                        p -> assertThat(p).startsWith("parts.csv:3:9: ").contains("esl '0' is not positive"),
                        p -> assertThat(p).startsWith("parts.csv:4:3: ").contains("capacitance '-1u' is not positive"));
    }

    @Test
    void negativeEsrMountingInductanceAndCostAreRefused() {
        assertThat(problems(HEADER + "A,1u,-1m,1n,-1n,-0.5\n"))
                .satisfiesExactly(
                        p -> assertThat(p).startsWith("parts.csv:2:6: ").contains("esr '-1m' is negative"),
                        p -> assertThat(p).startsWith("parts.csv:2:13: ").contains("mount_inductance '-1n' is negative"),
                        p -> assertThat(p).startsWith("parts.csv:2:17: ").contains("cost '-0.5' is negative"));
    }

    @Test
    void zeroEsrZeroMountingInductanceAndZeroCostAreAllowed() throws Exception {
        // ESR >= 0, mounting inductance >= 0, cost >= 0: zero is at the edge of each rule, still allowed
        Part a = parse(HEADER + "A,1u,0,1n,0,0\n").parts().get(0);
        assertThat(a.esrOhms()).isZero();
        assertThat(a.mountInductanceH()).isZero();
        assertThat(a.unitCost()).isZero();
    }

    @Test
    void duplicatePartNamesTheFirstLine() {
        assertThat(onlyProblem(HEADER + "A,1u,1m,1n,1n,1\nB,1u,1m,1n,1n,1\nA,2u,1m,1n,1n,1\n"))
                .startsWith("parts.csv:4:1: ").contains("duplicate part 'A'", "first defined on line 2");
    }

    @Test
    void toleranceOutsideZeroToHundredPercentIsRefused() throws Exception {
        String header = "part,capacitance,esr,esl,mount_inductance,cost,tolerance\n";
        assertThat(problems(header + "A,1u,1m,1n,1n,1,150 %\nB,1u,1m,1n,1n,1,10\nC,1u,1m,1n,1n,1,-5%\n"))
                .satisfiesExactly(
                        p -> assertThat(p).startsWith("parts.csv:2:17: ").contains("tolerance '150 %'", "0..100 %"),
                        p -> assertThat(p).startsWith("parts.csv:3:17: ").contains("tolerance '10'",
                                "Maybe write '10 %' for percent"),
                        p -> assertThat(p).startsWith("parts.csv:4:17: ").contains("tolerance '-5%'"));
        // the edge 0 % is inside the rule; 100 % is not: a Monte Carlo draw could take the capacitance to 0
        assertThat(parse(header + "A,1u,1m,1n,1n,1,0 %\nB,1u,1m,1n,1n,1,99.9 %\n").parts()).hasSize(2);
        assertThat(problems(header + "A,1u,1m,1n,1n,1,100 %\n")).singleElement().asString()
                .startsWith("parts.csv:2:17: ").contains("tolerance '100 %'", "100 % itself excluded");
    }

    @Test
    void dcBiasRetentionOutsideZeroToOneIsRefused() {
        String header = "part,capacitance,esr,esl,mount_inductance,cost,dc_bias_retention\n";
        assertThat(problems(header + "A,1u,1m,1n,1n,1,0\nB,1u,1m,1n,1n,1,120 %\n"))
                .satisfiesExactly(
                        p -> assertThat(p).startsWith("parts.csv:2:17: ").contains("dc_bias_retention '0'", "(0, 1]"),
                        p -> assertThat(p).startsWith("parts.csv:3:17: ").contains("dc_bias_retention '120 %'"));
    }

    @Test
    void caseCodesFollowTheEiaOrLetterForm() throws Exception {
        String header = "part,case,capacitance,esr,esl,mount_inductance,cost\n";
        // EIA 4-digit codes and moulded-case letters (common practice) are accepted as written
        Catalog ok = parse(header
                + "A,0201,1u,1m,1n,1n,1\nB,1210,1u,1m,1n,1n,1\nC,V,1u,1m,1n,1n,1\nD,\"0402\",1u,1m,1n,1n,1\n");
        assertThat(ok.parts()).extracting(Part::caseCode).containsExactly("0201", "1210", "V", "0402");

        assertThat(problems(header + "A,402,1u,1m,1n,1n,1\nB,0402A,1u,1m,1n,1n,1\nC,abc,1u,1m,1n,1n,1\n"))
                .satisfiesExactly(
                        p -> assertThat(p).startsWith("parts.csv:2:3: ").contains("case '402'", "4 digits"),
                        p -> assertThat(p).startsWith("parts.csv:3:3: ").contains("case '0402A'"),
                        p -> assertThat(p).startsWith("parts.csv:4:3: ").contains("case 'abc'", "capital letters"));
    }

    @Test
    void maxCountMustBeAWholeNumberNotBelowZero() {
        String header = "part,capacitance,esr,esl,mount_inductance,cost,max_count\n";
        assertThat(problems(header + "A,1u,1m,1n,1n,1,-1\nB,1u,1m,1n,1n,1,2.5\n"))
                .satisfiesExactly(
                        p -> assertThat(p).startsWith("parts.csv:2:17: ").contains("max_count '-1' is negative"),
                        p -> assertThat(p).startsWith("parts.csv:3:17: ").contains("max_count '2.5' is not a whole number"));
    }

    @Test
    void rowWithTheWrongNumberOfFieldsIsRefused() {
        assertThat(problems(HEADER + "A,1u,1m,1n,1n,1,extra\nB,1u,1m\n"))
                .satisfiesExactly(
                        // the first extra field starts at column 17
                        p -> assertThat(p).startsWith("parts.csv:2:17: ").contains("7 fields", "6 columns"),
                        // a short row is located at its end, just after "B,1u,1m"
                        p -> assertThat(p).startsWith("parts.csv:3:8: ").contains("3 fields", "6 columns"));
    }

    @Test
    void columnsCountCharactersIncludingSpacesAndQuotes() {
        // "  A , "1 x" ...": the second field's opening quote is at column 7
        assertThat(onlyProblem(HEADER + "  A , \"1 x\",1m,1n,1n,1\n"))
                .startsWith("parts.csv:2:7: ").contains("capacitance");
    }

    @Test
    void malformedQuotingIsOneLocatedProblem() {
        // RFC 4180 §2: a quoted field ends with a quote followed by a comma or line end
        assertThat(onlyProblem(HEADER + "A,1u,1m,1n,1n,1\n\"B\"x,1u,1m,1n,1n,1\n"))
                .startsWith("parts.csv:3:").contains("malformed CSV");
    }

    @Test
    void reportsEveryProblemOfTheFileTogether() {
        String csv = """
                # invented parts
                part,capacitance,esr,esl,mount_inductance,cost,case,colour
                A,1u,1m,1n,1n,1,0402,red
                B,10nH,1m,1n,1n,1,0402,blue
                C,1u,-2m,1n,1n,1,04O2,green
                A,1u,1m,1n,1n,1,0603,grey
                """;
        List<String> found = problems(csv);

        assertThat(found).satisfiesExactly(
                p -> assertThat(p).startsWith("parts.csv:2:53: ").contains("unknown column 'colour'"),
                p -> assertThat(p).startsWith("parts.csv:4:3: ").contains("inductance"),
                p -> assertThat(p).startsWith("parts.csv:5:6: ").contains("esr '-2m' is negative"),
                p -> assertThat(p).startsWith("parts.csv:5:18: ").contains("case '04O2'"),
                p -> assertThat(p).startsWith("parts.csv:6:1: ").contains("duplicate part 'A'"));
    }

    @Test
    void windowsLineEndsDoNotShiftColumns() {
        // RFC 4180 §2 ends records with CRLF; the CR must not count as a character of the next line
        assertThat(onlyProblem(HEADER.replace("\n", "\r\n") + "A,1u,1m,1n,1n,1\r\nB,10nH,1m,1n,1n,1\r\n"))
                .startsWith("parts.csv:3:3: ").contains("inductance");
    }

    @Test
    void nonUtf8FileIsAnInputProblem(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("latin1.csv");
        byte[] head = HEADER.getBytes(StandardCharsets.UTF_8);
        byte[] row = "A,1\u00b5,1m,1n,1n,1\n".getBytes(StandardCharsets.ISO_8859_1);
        byte[] all = new byte[head.length + row.length];
        System.arraycopy(head, 0, all, 0, head.length);
        System.arraycopy(row, 0, all, head.length, row.length);
        Files.write(file, all);

        InputException e = catchThrowableOfType(InputException.class, () -> CatalogReader.read(file, "latin1.csv"));

        // Latin-1 µ (0xB5) is not a valid UTF-8 start byte (RFC 3629 §3); it sits at line 2, column 4
        assertThat(e.diagnostics()).singleElement().extracting(Diagnostic::render).asString()
                .startsWith("latin1.csv:2:4: ").contains("not UTF-8");
    }
}
