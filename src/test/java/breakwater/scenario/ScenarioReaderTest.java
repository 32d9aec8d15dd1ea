package breakwater.scenario;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;
import static org.assertj.core.api.Assertions.within;

import breakwater.diagnostic.Diagnostic;
import breakwater.diagnostic.InputException;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Reading rail scenarios. Expected values are the ones written in the TOML, converted with the SI
 * prefixes (BIPM SI Brochure, 9th ed., Table 7); relative tolerance 1e-12 because decimal × power of ten
 * is not exact in binary (a few ulps). Lines and columns in expected messages are counted by hand in the
 * TOML text (1-based).
 */
class ScenarioReaderTest {

    private static final double REL = 1e-12;

    /** A valid scenario with only the required keys; 14 lines. */
    private static final String BASE = """
            [rail]
            voltage = "1.0 V"
            tolerance = "5 %"
            max_current = "2 A"

            [band]
            from = "1 kHz"
            to = "100 MHz"

            [regulator]
            resistance = "1 mOhm"

            [catalog]
            file = "parts.csv"
            """;

    @TempDir
    Path dir;

    @BeforeEach
    void catalogNextToTheScenario() throws IOException {
        Files.writeString(dir.resolve("parts.csv"), "part,capacitance,esr,esl,mount_inductance,cost\n");
    }

    private Scenario parse(String toml) throws InputException {
        return ScenarioReader.parse(toml, dir, "rail.toml");
    }

    private List<String> problems(String toml) {
        InputException e = catchThrowableOfType(InputException.class, () -> parse(toml));
        assertThat(e).as("expected the scenario to be refused").isNotNull();
        return e.diagnostics().stream().map(Diagnostic::render).toList();
    }

    private String onlyProblem(String toml) {
        List<String> found = problems(toml);
        assertThat(found).hasSize(1);
        return found.get(0);
    }

    private static void assertClose(double actual, double expected) {
        assertThat(actual).isCloseTo(expected, within(Math.abs(expected) * REL));
    }

    @Test
    void theDesignExampleReadsAsWritten() throws Exception {
        Path file = Path.of(getClass().getResource("example/scenarios/survey-drone-core.toml").toURI());

        Scenario s = ScenarioReader.read(file, "survey-drone-core.toml");

        assertThat(s.source()).isEqualTo("survey-drone-core.toml");
        assertThat(s.rail().name()).isEqualTo("survey-drone flight computer, 0.95 V core");
        assertClose(s.rail().voltageV(), 0.95);
        assertClose(s.rail().toleranceFraction(), 0.03);
        assertClose(s.rail().maxCurrentA(), 6.0);
        assertClose(s.rail().currentStepA(), 3.0); // step 50 % of 6 A
        assertClose(s.rail().edgeTimeS(), 0.5e-9);
        // target impedance V·tol/ΔI = 0.95 × 0.03 / 3 = 9.5 mΩ (common practice)
        assertClose(s.rail().targetImpedanceOhms(), 9.5e-3);
        assertClose(s.band().fromHz(), 10e3);
        assertClose(s.band().toHz(), 150e6);
        assertClose(s.regulator().resistanceOhms(), 0.3e-3);
        assertClose(s.regulator().inductanceH(), 18e-9);
        assertClose(s.plane().capacitanceF(), 6e-9);
        assertClose(s.plane().resistanceOhms(), 0.5e-3);
        assertThat(s.packagePath().present()).isTrue();
        assertClose(s.packagePath().resistanceOhms(), 0.4e-3);
        assertClose(s.packagePath().inductanceH(), 25e-12);
        assertClose(s.die().capacitanceF(), 150e-9);
        assertClose(s.die().resistanceOhms(), 0.3e-3);
        assertThat(s.catalogFile()).isEqualTo(file.getParent().resolve("../parts-catalog/general-purpose.csv").normalize());
        assertThat(s.catalogFile()).isRegularFile();
        assertThat(s.board().maxParts()).isEqualTo(60);
        assertThat(s.board().maxDistinct()).isEqualTo(5);
        // case codes stay strings with their leading zero (EIA case codes, common practice)
        assertThat(s.board().maxPerCase()).containsOnlyKeys("0402", "0805")
                .containsEntry("0402", 40).containsEntry("0805", 12);
        assertThat(s.footprints().keySet()).containsExactly("two-via", "via-in-pad");
        assertClose(s.footprints().get("two-via").mountInductanceByCaseH().get("0402"), 0.45e-9);
        assertClose(s.footprints().get("via-in-pad").mountInductanceByCaseH().get("0402"), 0.25e-9);
        assertThat(s.cost().placementPerPart()).isEqualTo(0.004);
        assertThat(s.cost().perLineItem()).isEqualTo(0.10);
        assertThat(s.cost().currency()).isEqualTo("USD");
        assertThat(s.solver().timeLimit()).isEqualTo(Duration.ofSeconds(30));
        assertThat(s.solver().seed()).isEqualTo(1L);
        assertThat(s.requireTarget()).isFalse();
        assertThat(s.existingBankFile()).isEmpty();
    }

    @Test
    void onlyTheRequiredKeysGiveTheDefaults() throws Exception {
        Scenario s = parse(BASE);

        assertClose(s.rail().currentStepA(), 1.0); // default step 50 % of 2 A
        assertThat(s.rail().edgeTimeS()).isZero();
        assertThat(s.rail().name()).isEmpty();
        assertThat(s.regulator().inductanceH()).isZero();
        assertThat(s.plane()).isEqualTo(Plane.NONE);
        assertThat(s.packagePath()).isEqualTo(PackagePath.NONE);
        assertThat(s.die()).isEqualTo(Die.NONE);
        assertThat(s.board()).isEqualTo(Board.UNLIMITED);
        assertThat(s.footprints()).isEmpty();
        assertThat(s.cost()).isEqualTo(CostModel.DEFAULT);
        assertThat(s.solver()).isEqualTo(SolverSettings.DEFAULT);
        assertThat(s.catalogFile()).isEqualTo(dir.resolve("parts.csv"));
    }

    @Test
    void plainTomlNumbersAreSiUnits() throws Exception {
        Scenario s = parse("""
                [rail]
                voltage = 1.8
                tolerance = 0.05
                max_current = 4
                current_step = 2.5
                edge_time = 1e-9
                [band]
                from = 1000
                to = 1e8
                [regulator]
                inductance = 5e-9
                [catalog]
                file = "parts.csv"
                """);

        assertClose(s.rail().voltageV(), 1.8);
        assertClose(s.rail().toleranceFraction(), 0.05);
        assertClose(s.rail().currentStepA(), 2.5);
        assertClose(s.rail().edgeTimeS(), 1e-9);
        assertClose(s.band().toHz(), 1e8);
        assertClose(s.regulator().inductanceH(), 5e-9);
        assertThat(s.regulator().resistanceOhms()).isZero();
    }

    @Test
    void durationsTakeSecondsMinutesHoursAndMilliseconds() throws Exception {
        assertThat(parse(BASE + "[solver]\ntime_limit = \"2 min\"\n").solver().timeLimit()).isEqualTo(Duration.ofMinutes(2));
        assertThat(parse(BASE + "[solver]\ntime_limit = \"500 ms\"\n").solver().timeLimit()).isEqualTo(Duration.ofMillis(500));
        assertThat(parse(BASE + "[solver]\ntime_limit = \"1.5 h\"\n").solver().timeLimit()).isEqualTo(Duration.ofMinutes(90));
        assertThat(parse(BASE + "[solver]\ntime_limit = 45\nseed = -7\n").solver())
                .isEqualTo(new SolverSettings(Duration.ofSeconds(45), -7));
    }

    @Test
    void solverMarginIsAVoltageAndDefaultsToNone() throws Exception {
        assertThat(parse(BASE).designMarginV()).isZero();
        assertClose(parse(BASE + "[solver]\nmargin = \"1.5 mV\"\n").designMarginV(), 1.5e-3);
        assertThat(onlyProblem(BASE + "[solver]\nmargin = \"1 mA\"\n")).contains("solver.margin", "a current");
        assertThat(onlyProblem(BASE + "[solver]\nmargin = \"-1 mV\"\n")).contains("solver.margin", "negative");
    }

    @Test
    void footprintsKeepFileOrderAndCaseCodesKeepTheirZero() throws Exception {
        Scenario s = parse(BASE + """
                [footprint.zeta]
                0402 = "0.5 nH"
                "0201" = 0.3e-9
                [footprint.alpha]
                0603 = "0.6n"
                [footprint.mid]
                [board]
                max_per_case = { "0201" = 0, 1206 = 4 }
                """);

        assertThat(s.footprints().keySet()).containsExactly("zeta", "alpha", "mid");
        assertThat(s.footprints().get("zeta").mountInductanceByCaseH()).containsOnlyKeys("0402", "0201");
        assertThat(s.footprints().get("mid").mountInductanceByCaseH()).isEmpty();
        assertThat(s.board().maxPerCase()).containsEntry("0201", 0).containsEntry("1206", 4);
    }

    /**
     * The per-case limits keep file order (not sorted, not hashed): the broken limits are listed in that
     * order, the same on every run. Twelve cases, none in sorted order, so a hashed map would differ.
     */
    @Test
    void perCaseLimitsKeepFileOrder() throws Exception {
        List<String> order = List.of("1206", "0201", "0805", "D", "2220", "0402", "1210", "0603", "1812",
                "0306", "2512", "1008");
        StringBuilder toml = new StringBuilder(BASE + "[board.max_per_case]\n");
        for (int i = 0; i < order.size(); i++) {
            toml.append('"').append(order.get(i)).append("\" = ").append(i).append('\n');
        }
        Scenario s = parse(toml.toString());
        assertThat(s.board().maxPerCase().keySet()).containsExactlyElementsOf(order);
        assertThat(s.board().maxPerCase().values()).containsExactly(0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11);
        // and the footprint's cases too
        Scenario f = parse(BASE + "[footprint.a]\n0603 = \"0.6n\"\n\"0201\" = \"0.3n\"\n0402 = \"0.4n\"\n"
                + "1206 = \"0.9n\"\n0805 = \"0.7n\"\n");
        assertThat(f.footprints().get("a").mountInductanceByCaseH().keySet())
                .containsExactly("0603", "0201", "0402", "1206", "0805");
    }

    @Test
    void objectiveAndExistingBank() throws Exception {
        Files.writeString(dir.resolve("old-bank.csv"), "part,count\n");

        Scenario s = parse(BASE + "[objective]\nrequire_target = true\n[existing]\nfile = \"old-bank.csv\"\n");

        assertThat(s.requireTarget()).isTrue();
        assertThat(s.existingBankFile()).isEqualTo(dir.resolve("old-bank.csv").toString());
        assertThat(s.existingBank()).contains(dir.resolve("old-bank.csv"));
    }

    // ---- each kind of bad input, located ----

    @Test
    void syntaxErrorIsOneLocatedDiagnostic() {
        // line 2: 'voltage = = 1', the second '=' is at column 11
        assertThat(onlyProblem("[rail]\nvoltage = = 1\n")).startsWith("rail.toml:2:11: ").contains("not valid TOML");
    }

    @Test
    void duplicateKeyIsLocatedAtTheSecondOne() {
        assertThat(onlyProblem("[rail]\nvoltage = 1\nvoltage = 2\n"))
                .isEqualTo("rail.toml:3:1: rail.voltage is given twice; first at line 2. Keep one of the two lines");
    }

    @Test
    void aTableDefinedTwiceOrAgainAfterADottedKeyNamesItsFirstLine() {
        assertThat(onlyProblem("[rail]\nvoltage = 1\n\n[band]\nfrom = 1\n[rail]\nname = \"x\"\n"))
                .isEqualTo("rail.toml:6:1: [rail] is defined twice; first at line 1. Merge the two tables");
        assertThat(onlyProblem("[board]\nmax_per_case = { 0402 = 3 }\n[board.max_per_case]\n0603 = 2\n"))
                .startsWith("rail.toml:3:1: [board.max_per_case] is defined twice; first at line 2");
    }

    @Test
    void theParsersLimitsAreSaidWithoutItsSettingNames() {
        // Jackson's own text names its setting in backquotes; the message keeps what it means only
        assertThat(ScenarioReader.ownWords("Number value length (1500) exceeds the maximum allowed (1000, from "
                + "`StreamReadConstraints.getMaxNumberLength()`)")).isEqualTo("a number too long to read (a scenario's "
                + "keys and values are a few words)");
        assertThat(ScenarioReader.ownWords("Document nesting depth (1001) exceeds the maximum allowed (1000, from "
                + "`StreamReadConstraints.getMaxNestingDepth()`)")).startsWith("arrays or inline tables nested too deeply");
        assertThat(ScenarioReader.ownWords("Unknown token")).isEqualTo("unknown token");
        assertThat(ScenarioReader.deepestLine("[rail]\nx = 1\ny = [[[1]]] # [[[[[[\nz = \"[[[[[[\"\n")).isEqualTo(3);
    }

    @Test
    void unknownSectionSuggestsTheClosestOne() {
        assertThat(onlyProblem(BASE + "[solvr]\nseed = 3\n"))
                .startsWith("rail.toml:15:2: ").contains("unknown section [solvr]", "Maybe you meant [solver]?");
    }

    @Test
    void unknownKeySuggestsTheClosestOneOrItsSection() {
        assertThat(problems(BASE.replace("[band]\n", "[band]\nfrm = 3\nseed = 4\n"))).satisfiesExactly(
                p -> assertThat(p).startsWith("rail.toml:7:1: ").contains("unknown key 'frm' in [band]",
                        "Maybe you meant 'from'?"),
                p -> assertThat(p).startsWith("rail.toml:8:1: ").contains("unknown key 'seed' in [band]",
                        "Maybe 'seed' belongs in [solver]?"));
    }

    @Test
    void keyOutsideAnySectionIsRefused() {
        assertThat(onlyProblem("voltage = 1\n" + BASE))
                .startsWith("rail.toml:1:1: ").contains("key 'voltage' outside any section", "belongs in [rail]");
    }

    @Test
    void missingRequiredKeysAreNamed() {
        String toml = """
                [rail]
                tolerance = "5 %"

                [band]
                to = "100 MHz"

                [regulator]
                """;
        // listed in file order, like a compiler: line, then column
        assertThat(problems(toml)).satisfiesExactly(
                p -> assertThat(p).startsWith("rail.toml:1:1: ").contains("missing section [catalog]"),
                p -> assertThat(p).startsWith("rail.toml:1:2: ").contains("missing required key rail.voltage"),
                p -> assertThat(p).startsWith("rail.toml:1:2: ").contains("missing required key rail.max_current"),
                p -> assertThat(p).startsWith("rail.toml:4:2: ").contains("missing required key band.from"),
                p -> assertThat(p).startsWith("rail.toml:7:2: ").contains("regulator.resistance",
                        "resistance or an inductance"));
    }

    @Test
    void catalogFileMustExist() {
        assertThat(onlyProblem(BASE.replace("parts.csv", "nowhere/parts.csv")))
                .startsWith("rail.toml:14:8: ").contains("catalog file \"nowhere/parts.csv\" not found",
                        "relative to the scenario's folder");
    }

    @Test
    void negativeResistanceInductanceAndCapacitanceAreRefused() {
        String toml = BASE + """
                [plane]
                capacitance = "-6 nF"
                [package]
                inductance = "-25 pH"
                [die]
                capacitance = "150 nF"
                resistance = -0.001
                """;
        assertThat(problems(toml)).satisfiesExactly(
                p -> assertThat(p).startsWith("rail.toml:16:15: ").contains("plane.capacitance \"-6 nF\" is negative"),
                p -> assertThat(p).startsWith("rail.toml:18:14: ").contains("package.inductance \"-25 pH\" is negative"),
                p -> assertThat(p).startsWith("rail.toml:21:14: ").contains("die.resistance -0.001 is negative"));
    }

    @Test
    void bandFromMustBeBelowTo() {
        assertThat(onlyProblem(BASE.replace("to = \"100 MHz\"", "to = \"1 kHz\"")))
                .startsWith("rail.toml:8:6: ").contains("band.to \"1 kHz\" is not above band.from \"1 kHz\"", "from < to");
    }

    @Test
    void stepMustBeAboveZeroAndAtMostAllOfTheCurrent() throws Exception {
        String prefix = BASE.replace("max_current = \"2 A\"\n", "max_current = \"2 A\"\nstep = ");
        assertThat(onlyProblem(prefix.replace("step = ", "step = 0\n")))
                .startsWith("rail.toml:5:8: ").contains("rail.step 0 is outside (0, 100 %]");
        assertThat(onlyProblem(prefix.replace("step = ", "step = \"150 %\"\n")))
                .startsWith("rail.toml:5:8: ").contains("rail.step \"150 %\" is outside (0, 100 %]");
        assertThat(onlyProblem(prefix.replace("step = ", "step = 50\n")))
                .startsWith("rail.toml:5:8: ").contains("Maybe write \"50 %\"");
        // 100 % is the edge of the rule and allowed: the load steps from zero to its maximum
        assertClose(parse(prefix.replace("step = ", "step = \"100 %\"\n")).rail().currentStepA(), 2.0);
    }

    @Test
    void toleranceMustBeStrictlyBetweenZeroAndHundredPercent() {
        assertThat(onlyProblem(BASE.replace("\"5 %\"", "\"100 %\"")))
                .startsWith("rail.toml:3:13: ").contains("rail.tolerance \"100 %\" is outside (0, 100 %)");
        assertThat(onlyProblem(BASE.replace("\"5 %\"", "0")))
                .startsWith("rail.toml:3:13: ").contains("rail.tolerance 0 is outside");
        assertThat(onlyProblem(BASE.replace("\"5 %\"", "3")))
                .startsWith("rail.toml:3:13: ").contains("Maybe write \"3 %\"");
    }

    @Test
    void currentStepMayNotExceedMaxCurrentNorComeWithStep() {
        assertThat(onlyProblem(BASE.replace("max_current = \"2 A\"\n", "max_current = \"2 A\"\ncurrent_step = \"3 A\"\n")))
                .startsWith("rail.toml:5:16: ").contains("rail.current_step \"3 A\" exceeds max_current \"2 A\"");
        assertThat(onlyProblem(BASE.replace("max_current = \"2 A\"\n",
                "max_current = \"2 A\"\nstep = \"50 %\"\ncurrent_step = \"1 A\"\n")))
                .startsWith("rail.toml:6:16: ").contains("both step and current_step");
    }

    @Test
    void setPointAccuracyAndRippleDefaultToZeroAndReadAsVoltsOrPercent() throws Exception {
        Rail none = parse(BASE).rail();
        assertThat(none.setPointFraction()).isZero();
        assertThat(none.rippleVpp()).isZero();
        Rail volts = parse(BASE.replace("max_current = \"2 A\"\n",
                "max_current = \"2 A\"\nset_point_accuracy = \"1 %\"\nripple = \"12 mV\"\n")).rail();
        assertClose(volts.setPointFraction(), 0.01);
        assertClose(volts.rippleVpp(), 12e-3);
        // 50 mV − 10 mV − 6 mV
        assertClose(volts.transientAllowanceV(), 34e-3);
        Rail percent = parse(BASE.replace("max_current = \"2 A\"\n", "max_current = \"2 A\"\nripple = \"0.5 %\"\n")).rail();
        assertClose(percent.rippleVpp(), 5e-3);
        Rail plain = parse(BASE.replace("max_current = \"2 A\"\n", "max_current = \"2 A\"\nripple = 0.004\n")).rail();
        assertClose(plain.rippleVpp(), 4e-3);
    }

    @Test
    void aToleranceBudgetThatLeavesNothingForTheTransientIsRefusedAtTheRipple() {
        // 5 % of 1.0 V = 50 mV; 3 % set point (30 mV) and 40 mV of ripple (±20 mV) use all of it
        assertThat(onlyProblem(BASE.replace("max_current = \"2 A\"\n",
                "max_current = \"2 A\"\nset_point_accuracy = \"3 %\"\nripple = \"40 mV\"\n")))
                .startsWith("rail.toml:6:10: ").contains("leaves nothing for the load transient")
                .contains("rail.set_point_accuracy \"3 %\"").contains("lower the set-point");
        assertThat(onlyProblem(BASE.replace("max_current = \"2 A\"\n", "max_current = \"2 A\"\nset_point_accuracy = \"5 %\"\n")))
                .startsWith("rail.toml:5:22: ").contains("leaves nothing");
        assertThat(onlyProblem(BASE.replace("max_current = \"2 A\"\n", "max_current = \"2 A\"\nripple = \"-1 mV\"\n")))
                .startsWith("rail.toml:5:10: ").contains("rail.ripple \"-1 mV\" is negative");
    }

    @Test
    void negativeEdgeTimeIsRefused() {
        assertThat(onlyProblem(BASE.replace("max_current = \"2 A\"\n", "max_current = \"2 A\"\nedge_time = \"-1 ns\"\n")))
                .startsWith("rail.toml:5:13: ").contains("rail.edge_time must be >= 0");
    }

    @Test
    void unitOfAnotherQuantityAndWrongTypesAreRefused() {
        assertThat(problems(BASE.replace("\"1.0 V\"", "\"1.0 A\"").replace("\"1 mOhm\"", "true"))).satisfiesExactly(
                p -> assertThat(p).startsWith("rail.toml:2:11: ").contains("rail.voltage: '1.0 A' is a current (A),"
                        + " but a voltage is expected"),
                p -> assertThat(p).startsWith("rail.toml:11:14: ").contains("regulator.resistance must be a number",
                        "\"0.3 mOhm\"", "not boolean"));
    }

    @Test
    void badCaseCodesAndCountsInBoardAndFootprintsAreLocatedAtTheKey() {
        String toml = BASE + """
                [board]
                max_parts = 0
                [board.max_per_case]
                402 = 10
                0805 = 2.5
                [footprint.two-via]
                0402x = "0.45 nH"
                0603 = "-1 nH"
                """;
        assertThat(problems(toml)).satisfiesExactly(
                p -> assertThat(p).startsWith("rail.toml:16:13: ").contains("board.max_parts is 0, it must be a whole number from 1 to 1000000"),
                p -> assertThat(p).startsWith("rail.toml:18:1: ").contains("'402' in [board.max_per_case] is not a case code"),
                p -> assertThat(p).startsWith("rail.toml:19:8: ").contains("board.max_per_case.0805 must be a whole number"),
                p -> assertThat(p).startsWith("rail.toml:21:1: ").contains("'0402x' in [footprint.two-via] is not a case code"),
                p -> assertThat(p).startsWith("rail.toml:22:8: ").contains("footprint.two-via.0603 is negative"));
    }

    @Test
    void badDurationSeedAndFlagAreRefused() {
        String toml = BASE + """
                [solver]
                time_limit = "fast"
                seed = 1.5
                [objective]
                require_target = "yes"
                """;
        assertThat(problems(toml)).satisfiesExactly(
                p -> assertThat(p).startsWith("rail.toml:16:14: ").contains("solver.time_limit", "\"2 min\""),
                p -> assertThat(p).startsWith("rail.toml:17:8: ").contains("solver.seed must be a whole number"),
                p -> assertThat(p).startsWith("rail.toml:19:18: ").contains("require_target must be true or false"));
        assertThat(onlyProblem(BASE + "[solver]\ntime_limit = \"0 s\"\n"))
                .startsWith("rail.toml:16:14: ").contains("positive duration");
    }

    @Test
    void reportsEveryProblemOfTheFileTogether() {
        String toml = """
                [rail]
                voltage = "0.95 V"
                tolerence = "3 %"
                max_current = "6 A"
                current_step = "8 A"

                [band]
                from = "150 MHz"
                to = "10 kHz"

                [regulator]
                resistance = "-0.3 mOhm"

                [catalog]
                file = "missing.csv"
                """;
        assertThat(problems(toml)).satisfiesExactly(
                p -> assertThat(p).startsWith("rail.toml:1:2: ").contains("missing required key rail.tolerance"),
                p -> assertThat(p).startsWith("rail.toml:3:1: ").contains("unknown key 'tolerence'", "Maybe you meant 'tolerance'?"),
                p -> assertThat(p).startsWith("rail.toml:5:16: ").contains("exceeds max_current"),
                p -> assertThat(p).startsWith("rail.toml:9:6: ").contains("from < to"),
                p -> assertThat(p).startsWith("rail.toml:12:14: ").contains("regulator.resistance", "negative"),
                p -> assertThat(p).startsWith("rail.toml:15:8: ").contains("not found"));
    }
}
