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

/**
 * trim, compare, frontier and --monte-carlo in-process on a small invented rail (four parts, at most five
 * of each), move-limited with one solver so every run is short and reproducible.
 */
class ModesCliTest {
    static final Path RAIL = CliTest.ROOT.resolve("src/test/resources/breakwater/cli/small-rail");
    static final Path SMALL = RAIL.resolve("small.toml");
    static final Path BARE = RAIL.resolve("nofootprint.toml");
    static final Path EXISTING = RAIL.resolve("existing.bank.csv");
    static final String[] FAST = {"--moves", "300", "--solvers", "1", "--seed", "3"};

    static JsonNode at(JsonNode root, String dotted) {
        JsonNode n = root;
        for (String part : dotted.split("\\.")) {
            n = n.path(part);
        }
        return n;
    }

    static void assertKeys(JsonNode root, String... keys) {
        for (String k : keys) {
            assertThat(at(root, k).isMissingNode()).as(k).isFalse();
        }
    }

    static String[] args(String... first) {
        String[] out = new String[first.length + FAST.length];
        System.arraycopy(first, 0, out, 0, first.length);
        System.arraycopy(FAST, 0, out, first.length, FAST.length);
        return out;
    }

    static JsonNode json(Path file) throws IOException {
        return new ObjectMapper().readTree(file.toFile());
    }

    static void assertFiles(Path out) {
        for (String f : new String[] {"bom.csv", "impedance.csv", "worst-case.csv", "summary.json", "report.html",
            "impedance.svg", "worst-case.svg"}) {
            assertThat(out.resolve(f)).isRegularFile();
        }
    }

    @Test
    void helpListsTheNewCommands() {
        CliTest.Run r = run("--help");
        assertThat(r.out()).contains("trim", "compare", "frontier");
        assertThat(run("check", "--help").out()).contains("--monte-carlo", "C0G 5 %", "X7R 10 %", "X5R 20 %",
                "--spread", "--mc-seed");
    }

    @Test
    void solveWithAMarginKeepsIt(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("margin");
        CliTest.Run r = run(args("solve", SMALL.toString(), "--margin", "10mV", "--out", out.toString()));
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
        assertThat(r.out()).contains("Margin     10.0 mV required inside the tolerance band (--margin)", ": met",
                "MEETS SPEC");
        JsonNode s = json(out.resolve("summary.json"));
        assertThat(at(s, "required_margin_v").asDouble()).isEqualTo(0.01);
        assertThat(at(s, "required_margin_met").asBoolean()).isTrue();
        assertThat(at(s, "worst_case.margin_v").asDouble()).isGreaterThanOrEqualTo(0.01 - 1e-9);
        assertThat(at(s, "meets_spec").asBoolean()).isTrue();
        assertThat(Files.readString(out.resolve("report.html"))).contains("Required margin");
    }

    /** The scenario's [solver] margin is the default of --margin, and an impossible one is an input error. */
    @Test
    void theScenarioCanHoldTheMargin(@TempDir Path dir) throws IOException {
        Path scenario = dir.resolve("with-margin.toml");
        String text = Files.readString(SMALL).replace("file = \"parts.csv\"",
                "file = \"" + RAIL.resolve("parts.csv").toString().replace("\\", "/") + "\"")
                .replace("file = \"existing.bank.csv\"", "file = \"" + EXISTING.toString().replace("\\", "/") + "\"");
        Files.writeString(scenario, text.replace("[solver]\n", "[solver]\nmargin = \"10 mV\"\n"));
        CliTest.Run r = run(args("solve", scenario.toString()));
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
        assertThat(r.out()).contains("10.0 mV required inside the tolerance band (solver.margin)");
        Files.writeString(scenario, text.replace("[solver]\n", "[solver]\nmargin = \"60 mV\"\n"));
        CliTest.Run bad = run(args("solve", scenario.toString()));
        assertThat(bad.code()).isEqualTo(ExitCodes.INVALID_INPUT);
        assertThat(bad.err()).contains("solver.margin 60 mV leaves no room");
        // --margin overrides it
        CliTest.Run over = run(args("solve", scenario.toString(), "--margin", "5mV"));
        assertThat(over.code()).as(over.err()).isEqualTo(ExitCodes.OK);
        assertThat(over.out()).contains("5.00 mV required inside the tolerance band (--margin)");
    }

    /**
     * The worst droop is never below ΔI·Z(0) (the step response settles there; final value theorem): on the
     * small rail 2 A × 0.5 mΩ = 1 mV of the 49 mV below the operating point. So a margin of 48 mV or more
     * can never be kept and is refused up front; 47.9 mV would need a worst droop within 1.1 mV, which no
     * bank of this catalog reaches: the run fails and says so.
     */
    @Test
    void aMarginThatCannotBeKeptFailsTheRun() throws IOException {
        CliTest.Run r = run(args("solve", SMALL.toString(), "--margin", "47.9mV", "--json"));
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.SPEC_NOT_MET);
        JsonNode js = new ObjectMapper().readTree(r.out());
        assertThat(at(js, "required_margin_met").asBoolean()).isFalse();
        assertThat(at(js, "meets_spec").asBoolean()).isFalse();
        CliTest.Run text = run(args("solve", SMALL.toString(), "--margin", "47.9mV"));
        assertThat(text.out()).contains("NOT MET", "is less than the 47.9 mV required by --margin");
        CliTest.Run none = run(args("solve", SMALL.toString(), "--margin", "60mV"));
        assertThat(none.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(none.err()).contains("leaves no room", "ΔI·Z(0) = 1 mV", "choose a margin below 48 mV");
        // exactly the room is no room either
        CliTest.Run all = run(args("solve", SMALL.toString(), "--margin", "48mV"));
        assertThat(all.code()).isEqualTo(ExitCodes.USAGE);
        CliTest.Run unit = run(args("solve", SMALL.toString(), "--margin", "1mA"));
        assertThat(unit.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(unit.err()).contains("is a current");
    }

    @Test
    void trimWritesSavingsChangesAndNeverLosesMargin(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("trim");
        CliTest.Run r = run(args("trim", SMALL.toString(), "--out", out.toString()));
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
        assertThat(r.out()).contains("Savings", "per 1,000 boards", "->", "MEETS SPEC",
                "A model is not a measurement: verify the design on hardware.");
        assertFiles(out);
        JsonNode s = json(out.resolve("summary.json"));
        assertKeys(s, "trim.existing.cost_total", "trim.existing.worst_case.droop_v",
                "trim.existing.worst_case.overshoot_v", "trim.savings", "trim.savings_per_1000", "trim.keep",
                "trim.changes");
        assertThat(at(s, "trim.keep").asText()).isEqualTo("margin");
        assertThat(at(s, "trim.savings_per_1000").asDouble()).isEqualTo(1000 * at(s, "trim.savings").asDouble());
        // the result costs no more and keeps the existing bank's worst droop and overshoot
        assertThat(at(s, "cost_total").asDouble()).isLessThanOrEqualTo(at(s, "trim.existing.cost_total").asDouble());
        assertThat(at(s, "worst_case.droop_v").asDouble())
                .isLessThanOrEqualTo(at(s, "trim.existing.worst_case.droop_v").asDouble());
        assertThat(at(s, "worst_case.overshoot_v").asDouble())
                .isLessThanOrEqualTo(at(s, "trim.existing.worst_case.overshoot_v").asDouble());
        // savings = old cost - new cost, subtracted in decimal like the costs themselves
        assertThat(at(s, "trim.savings").asDouble()).isEqualTo(
                new java.math.BigDecimal(at(s, "trim.existing.cost_total").asText())
                        .subtract(new java.math.BigDecimal(at(s, "cost_total").asText())).doubleValue());
        for (JsonNode ch : at(s, "trim.changes")) {
            assertKeys(ch, "part", "from", "to");
            assertThat(ch.path("from").asInt()).isNotEqualTo(ch.path("to").asInt());
        }
        // the report overlays old and new banks
        String html = Files.readString(out.resolve("report.html"));
        assertThat(html).contains("existing bank", "Cost-down");
        assertThat(html.indexOf("Cost-down of the existing bank")).isLessThan(html.indexOf("Impedance at the load"));
    }

    @Test
    void trimWithKeepSpecAndAnExplicitBank() throws IOException {
        CliTest.Run r = run(args("trim", SMALL.toString(), "--bank", EXISTING.toString(), "--keep", "spec", "--json"));
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
        JsonNode s = new ObjectMapper().readTree(r.out());
        assertThat(at(s, "trim.keep").asText()).isEqualTo("spec");
        assertThat(at(s, "worst_case.passes").asBoolean()).isTrue();
        assertThat(at(s, "trim.savings").asDouble()).isGreaterThanOrEqualTo(0.0);
    }

    @Test
    void trimWithoutAnyBankIsAUsageError() {
        CliTest.Run r = run(args("trim", BARE.toString()));
        assertThat(r.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(r.err()).contains("--bank", "[existing]").doesNotContain("Exception");
    }

    @Test
    void trimOfABankThatAlreadyFailsKeepsItWhenNothingCheaperFits(@TempDir Path dir) throws IOException {
        // one 100 nF part cannot hold this rail and nothing cheaper than one part can: unchanged, exit 1
        Path bank = dir.resolve("one.csv");
        Files.writeString(bank, "part,count\nhf-100n,1\n");
        CliTest.Run r = run(args("trim", SMALL.toString(), "--bank", bank.toString(), "--json"));
        JsonNode s = new ObjectMapper().readTree(r.out());
        assertThat(at(s, "trim.unchanged").asBoolean()).isTrue();
        assertThat(at(s, "trim.savings").asDouble()).isEqualTo(0.0);
        assertThat(at(s, "trim.changes").size()).isZero();
        assertThat(r.code()).isEqualTo(ExitCodes.SPEC_NOT_MET);
    }

    @Test
    void trimOfAFailingBankDoesNotCallItsMarginWithinTheSpec(@TempDir Path dir) throws IOException {
        Path bank = dir.resolve("one.csv");
        Files.writeString(bank, "part,count\nhf-100n,1\n");
        CliTest.Run r = run(args("trim", SMALL.toString(), "--bank", bank.toString()));
        assertThat(r.err()).contains("keeping the spec (the existing bank itself misses it, so it has no margin to keep)")
                .doesNotContain("within the spec");
    }

    @Test
    void trimWithNoNewPartsOnlyRemovesPartsOrLowersCounts(@TempDir Path dir) throws IOException {
        // two part numbers on the qualified BOM; without the option the cheapest trim found adds a third
        Path bank = dir.resolve("qualified.csv");
        Files.writeString(bank, "part,count\nbulk-100u,5\nmid-10u,5\n");
        JsonNode free = new ObjectMapper().readTree(run(args("trim", SMALL.toString(), "--bank", bank.toString(),
                "--keep", "spec", "--json")).out());
        assertThat(at(free, "trim.changes").findValuesAsText("part")).as("the free trim adds a part number")
                .contains("small-1u");
        CliTest.Run r = run(args("trim", SMALL.toString(), "--bank", bank.toString(), "--keep", "spec",
                "--no-new-parts", "--json"));
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
        JsonNode s = new ObjectMapper().readTree(r.out());
        assertThat(at(s, "trim.existing_parts_only").asBoolean()).isTrue();
        assertThat(at(s, "trim.unchanged").asBoolean()).isFalse();
        for (JsonNode ch : at(s, "trim.changes")) {
            assertThat(ch.path("part").asText()).isIn("bulk-100u", "mid-10u");
            assertThat(ch.path("to").asInt()).isLessThan(ch.path("from").asInt());
        }
        for (JsonNode entry : at(s, "bank")) {
            assertThat(entry.path("part").asText()).as("no new part number").isIn("bulk-100u", "mid-10u");
        }
        assertThat(at(s, "cost_total").asDouble()).isLessThan(at(s, "trim.existing.cost_total").asDouble());
    }

    @Test
    void trimStatesTheOneRuleItAppliedInEveryOutput(@TempDir Path dir) throws IOException {
        // the default --keep margin on a bank that misses the spec: there is no margin to keep, so the rule
        // applied is the spec, and stderr, stdout, summary.json and the report all say that one rule
        String rule = "keeping the spec (the existing bank itself misses it, so it has no margin to keep)";
        Path bank = dir.resolve("one.csv");
        Files.writeString(bank, "part,count\nhf-100n,1\n");
        Path out = dir.resolve("t");
        CliTest.Run r = run(args("trim", SMALL.toString(), "--bank", bank.toString(), "--out", out.toString()));
        assertThat(r.err()).contains(rule).doesNotContain("keeping the existing");
        assertThat(r.out()).contains(rule).doesNotContain("keeping the existing");
        JsonNode s = json(out.resolve("summary.json"));
        assertThat(at(s, "trim.keep").asText()).isEqualTo("spec");
        assertThat(at(s, "trim.keep_asked").asText()).isEqualTo("margin");
        String html = Files.readString(out.resolve("report.html"));
        assertThat(html).contains("Keeping the spec (the existing bank itself misses it, so it has no margin to keep)")
                .doesNotContain("keeping the existing bank&#39;s worst droop");
        // and a bank that meets the spec keeps its own worst case, said the same way everywhere
        Path out2 = dir.resolve("t2");
        CliTest.Run kept = run(args("trim", SMALL.toString(), "--out", out2.toString()));
        JsonNode s2 = json(out2.resolve("summary.json"));
        assertThat(at(s2, "trim.keep").asText()).isEqualTo("margin");
        String margin = "keeping the existing bank's worst droop";
        assertThat(kept.err()).contains(margin);
        assertThat(kept.out()).contains(margin);
        assertThat(Files.readString(out2.resolve("report.html"))).contains("Keeping the existing bank&#39;s worst droop");
    }

    @Test
    void anOutThatIsAFileIsRefusedBeforeAnyWork(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("notes.txt");
        Files.writeString(file, "my own notes");
        CliTest.Run r = run(args("solve", SMALL.toString(), "--out", file.toString()));
        assertThat(r.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(r.err()).contains("is a file, not a folder");
        assertThat(r.out()).isEmpty();
        assertThat(Files.readString(file)).isEqualTo("my own notes");
    }

    /** check --bank needs neither the scenario's [existing] file nor anything else trim would read. */
    @Test
    void checkWithABankIgnoresAMissingExistingFile(@TempDir Path dir) throws IOException {
        Path scenario = dir.resolve("copied.toml");
        Files.writeString(scenario, Files.readString(SMALL).replace("file = \"parts.csv\"",
                "file = \"" + RAIL.resolve("parts.csv").toString().replace("\\", "/") + "\""));
        CliTest.Run r = run("check", scenario.toString(), "--bank", EXISTING.toString(), "--quiet");
        assertThat(r.code()).as(r.err()).isIn(ExitCodes.OK, ExitCodes.SPEC_NOT_MET);
        // trim does need it, and says which file it looked for
        CliTest.Run t = run(args("trim", scenario.toString()));
        assertThat(t.code()).isEqualTo(ExitCodes.INVALID_INPUT);
        assertThat(t.err()).contains("existing.file: bank file not found (looked for", "existing.bank.csv");
    }

    /** The caution reaches the report too (amber verdict), and after a Monte Carlo run it gives the yield. */
    @Test
    void aCautionIsShownInTheReportWithTheYield(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("thin");
        CliTest.Run r = run(args("solve", SMALL.toString(), "--out", out.toString(), "--monte-carlo", "50"));
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
        JsonNode s = json(out.resolve("summary.json"));
        String html = Files.readString(out.resolve("report.html"));
        if (at(s, "monte_carlo.yield").asDouble() < 0.95) {
            assertThat(r.out()).contains("Caution:", "of the samples meet the spec (see the Monte Carlo figures)");
            assertThat(html).contains("verdict pass thin", "with little to spare", "of the samples meet the spec");
        } else {
            assertThat(r.out()).doesNotContain("Caution:");
            assertThat(html).contains("verdict pass\"").doesNotContain("with little to spare");
        }
    }

    @Test
    void monteCarloOnCheckAddsTheDistributionAndIsReproducible(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("mc");
        CliTest.Run r = run("check", SMALL.toString(), "--bank", EXISTING.toString(), "--monte-carlo", "60",
                "--mc-seed", "5", "--spread", "15%", "--out", out.toString());
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
        assertThat(r.out()).contains("Yield", "p95", "each part type moves as one batch");
        JsonNode s = json(out.resolve("summary.json"));
        assertKeys(s, "monte_carlo.samples", "monte_carlo.seed", "monte_carlo.spread", "monte_carlo.yield",
                "monte_carlo.droop_v.p50", "monte_carlo.droop_v.p95", "monte_carlo.droop_v.p99",
                "monte_carlo.droop_v.max", "monte_carlo.overshoot_v.p50", "monte_carlo.overshoot_v.p95",
                "monte_carlo.overshoot_v.p99", "monte_carlo.overshoot_v.max");
        assertThat(at(s, "monte_carlo.samples").asInt()).isEqualTo(60);
        assertThat(at(s, "monte_carlo.seed").asLong()).isEqualTo(5);
        assertThat(at(s, "monte_carlo.spread").asDouble()).isEqualTo(0.15);
        assertThat(at(s, "monte_carlo.yield").asDouble()).isBetween(0.0, 1.0);
        double p50 = at(s, "monte_carlo.droop_v.p50").asDouble();
        assertThat(p50).isLessThanOrEqualTo(at(s, "monte_carlo.droop_v.p95").asDouble());
        assertThat(at(s, "monte_carlo.droop_v.p99").asDouble()).isLessThanOrEqualTo(at(s, "monte_carlo.droop_v.max").asDouble());
        assertThat(Files.readString(out.resolve("report.html"))).contains("Monte Carlo", "allowed droop");

        CliTest.Run again = run("check", SMALL.toString(), "--bank", EXISTING.toString(), "--monte-carlo", "60",
                "--mc-seed", "5", "--spread", "15", "--json");
        assertThat(at(new ObjectMapper().readTree(again.out()), "monte_carlo.droop_v.p50").asDouble()).isEqualTo(p50);
    }

    @Test
    void monteCarloOnSolveAndTrim() throws IOException {
        CliTest.Run solve = run(args("solve", SMALL.toString(), "--monte-carlo", "20", "--json"));
        assertThat(solve.code()).as(solve.err()).isEqualTo(ExitCodes.OK);
        assertThat(at(new ObjectMapper().readTree(solve.out()), "monte_carlo.samples").asInt()).isEqualTo(20);
        CliTest.Run trim = run(args("trim", SMALL.toString(), "--monte-carlo", "20", "--json"));
        JsonNode t = new ObjectMapper().readTree(trim.out());
        assertKeys(t, "monte_carlo.yield", "trim.savings");
    }

    @Test
    void badMonteCarloOptionsAreUsageErrors() {
        assertThat(run("check", SMALL.toString(), "--bank", EXISTING.toString(), "--monte-carlo", "-3").code())
                .isEqualTo(ExitCodes.USAGE);
        assertThat(run("check", SMALL.toString(), "--bank", EXISTING.toString(), "--monte-carlo", "10",
                "--spread", "150%").code()).isEqualTo(ExitCodes.USAGE);
    }

    @Test
    void compareSolvesEachFootprintAndListsThemAll(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("cmp");
        CliTest.Run r = run(args("compare", SMALL.toString(), "--out", out.toString()));
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
        assertThat(r.out()).contains("long-trace", "via-in-pad", "split");
        assertFiles(out);
        JsonNode s = json(out.resolve("summary.json"));
        assertThat(at(s, "footprints").size()).isEqualTo(2);
        assertThat(at(s, "footprints").get(0).path("name").asText()).isEqualTo("long-trace");
        assertThat(at(s, "footprints").get(1).path("name").asText()).isEqualTo("via-in-pad");
        for (JsonNode f : at(s, "footprints")) {
            assertKeys(f, "name", "cost_total", "total_parts", "bank", "worst_case.droop_v", "worst_case.overshoot_v",
                    "worst_case.passes", "impedance.peak_ohm", "impedance.flatness_db");
            assertKeys(f.path("bank").get(0), "part", "count");
        }
        String html = Files.readString(out.resolve("report.html"));
        assertThat(html).contains("Footprints compared", "long-trace", "via-in-pad");
        assertThat(html.indexOf("Footprints compared")).isLessThan(html.indexOf("Impedance at the load"));
    }

    @Test
    void compareWithABankAndChosenFootprints() throws IOException {
        CliTest.Run r = run("compare", SMALL.toString(), "--bank", EXISTING.toString(), "--footprints",
                "via-in-pad,catalog", "--json");
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
        JsonNode s = new ObjectMapper().readTree(r.out());
        assertThat(at(s, "footprints").get(1).path("name").asText()).isEqualTo("catalog");
        // the same bank under each: same cost, lower mounting inductance gives a different worst case
        assertThat(at(s, "footprints").get(0).path("cost_total").asDouble())
                .isEqualTo(at(s, "footprints").get(1).path("cost_total").asDouble());
        assertThat(at(s, "footprints").get(0).path("worst_case").path("droop_v").asDouble())
                .isNotEqualTo(at(s, "footprints").get(1).path("worst_case").path("droop_v").asDouble());
    }

    @Test
    void compareWithoutFootprintsOrWithAnUnknownOneIsAUsageError() {
        CliTest.Run none = run(args("compare", BARE.toString()));
        assertThat(none.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(none.err()).contains("defines none", "[footprint.NAME]");
        CliTest.Run typo = run(args("compare", SMALL.toString(), "--footprints", "via-in-pda"));
        assertThat(typo.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(typo.err()).contains("via-in-pad");
    }

    @Test
    void compareOffersOnlyThePluralFootprintOption() {
        CliTest.Run help = run("compare", "--help");
        assertThat(help.code()).isEqualTo(ExitCodes.OK);
        assertThat(help.out()).contains("--footprints=A,B").doesNotContain("--footprint=");
        CliTest.Run single = run("compare", SMALL.toString(), "--footprint", "via-in-pad");
        assertThat(single.code()).isEqualTo(ExitCodes.USAGE);
        assertThat(single.err()).contains("--footprints A,B,... (plural)");
        // the other commands still offer it
        assertThat(run("check", "--help").out()).contains("--footprint=NAME");
    }

    @Test
    void frontierIsMonotoneAndEndsAtTheSpec(@TempDir Path dir) throws IOException {
        Path out = dir.resolve("fr");
        CliTest.Run r = run(args("frontier", SMALL.toString(), "--points", "4", "--out", out.toString()));
        assertThat(r.code()).as(r.err()).isEqualTo(ExitCodes.OK);
        assertThat(r.out()).contains("Frontier", "split");
        assertFiles(out);
        JsonNode s = json(out.resolve("summary.json"));
        JsonNode f = at(s, "frontier");
        assertThat(f.size()).isEqualTo(4);
        double previousLimit = 0;
        double previousCost = Double.POSITIVE_INFINITY;
        for (JsonNode p : f) {
            assertKeys(p, "limit_v", "cost_total", "total_parts", "bank", "worst_case.droop_v",
                    "worst_case.overshoot_v", "meets_limit");
            assertThat(p.path("limit_v").asDouble()).isGreaterThan(previousLimit);
            if (p.path("meets_limit").asBoolean()) {
                assertThat(p.path("worst_case").path("droop_v").asDouble()).isLessThanOrEqualTo(p.path("limit_v").asDouble());
                assertThat(p.path("cost_total").asDouble()).isLessThanOrEqualTo(previousCost);
                previousCost = p.path("cost_total").asDouble();
            }
            previousLimit = p.path("limit_v").asDouble();
        }
        // no row keeps a bank that another row's bank beats: a bank keeping within a row's limit is never
        // cheaper than that row's (droop >= overshoot on every bank here, so the droop is the excursion)
        for (JsonNode p : f) {
            for (JsonNode q : f) {
                double qExcursion = Math.max(q.path("worst_case").path("droop_v").asDouble(),
                        q.path("worst_case").path("overshoot_v").asDouble());
                if (q.path("meets_limit").asBoolean() && qExcursion <= p.path("limit_v").asDouble()) {
                    assertThat(p.path("cost_total").asDouble()).isLessThanOrEqualTo(q.path("cost_total").asDouble());
                }
            }
        }
        // so the comparison with the spec's bank never reads as a tighter limit for less money
        assertThat(r.out().lines().filter(l -> l.contains(" mV less")).toList())
                .allSatisfy(l -> assertThat(l).contains("+").doesNotContain(" -0."));
        // the last limit is the spec's own; its bank is the one in the files
        assertThat(f.get(3).path("cost_total").asDouble()).isEqualTo(at(s, "cost_total").asDouble());
        String html = Files.readString(out.resolve("report.html"));
        // the frontier is what the mode exists for: it comes before the single bank's details
        assertThat(html).contains("Cost against worst excursion");
        assertThat(html.indexOf("Cost against worst excursion")).isLessThan(html.indexOf("Impedance at the load"));
    }

    @Test
    void frontierNeedsTwoPoints() {
        assertThat(run(args("frontier", SMALL.toString(), "--points", "1")).code()).isEqualTo(ExitCodes.USAGE);
    }
}
