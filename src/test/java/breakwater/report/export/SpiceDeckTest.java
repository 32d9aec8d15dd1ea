package breakwater.report.export;

import breakwater.Fixtures;
import breakwater.catalog.BankEntry;
import breakwater.catalog.Part;
import breakwater.design.BankEvaluator;
import breakwater.design.CapacitorBank;
import breakwater.design.Evaluation;
import breakwater.scenario.Footprint;
import breakwater.scenario.PackagePath;
import breakwater.scenario.Plane;
import breakwater.scenario.Rail;
import breakwater.scenario.Scenario;
import breakwater.timedomain.Waveform;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** The SPICE3 decks: node names, folded branches, PWL times, plain syntax. Parts and rails are invented. */
class SpiceDeckTest {
    static final Part BULK = new Part("bulk-220u", "", "D", "polymer", 220e-6, 12e-3, 2e-9, 0.8e-9, 0.22,
            Double.NaN, Double.NaN, 1, -1);
    static final Part MID = new Part("mid-22u", "", "0805", "X5R", 22e-6, 4e-3, 0.68e-9, 0.7e-9, 0.04,
            Double.NaN, Double.NaN, 0.6, -1);
    static final Part SMALL = new Part("small-1u", "", "0402", "X5R", 1e-6, 15e-3, 0.35e-9, 0.45e-9, 0.004,
            Double.NaN, Double.NaN, 0.8, -1);
    static final List<BankEntry> BANK = List.of(new BankEntry(BULK, 2), new BankEntry(MID, 8),
            new BankEntry(SMALL, 20));

    static ExportedRail rail(Scenario s, Optional<Footprint> footprint, String footprintName) throws Exception {
        BankEvaluator ev = new BankEvaluator(s, footprint);
        Evaluation e = ev.evaluate(new CapacitorBank(BANK));
        return new ExportedRail(s, footprintName, footprint, e, ev.droopWaveform(e), ev.overshootWaveform(e), "test");
    }

    /** With package, plane and die; 1 ns edges. */
    static Scenario withPackage() {
        return Fixtures.scenario().rail(new Rail("test rail", 1.0, 0.05, 4.0, 2.0, 1e-9))
                .plane(new Plane(5e-9, 0.4e-3)).packagePath(PackagePath.of(0.3e-3, 20e-12)).build();
    }

    /** No package (the die sits at the board node), ideal load edges: the patterns have jumps. */
    static Scenario idealEdgesNoPackage() {
        return Fixtures.scenario().build();
    }

    /** element name -> its line's fields. */
    static Map<String, String[]> elements(List<String> lines) {
        Map<String, String[]> m = new HashMap<>();
        for (String l : lines) {
            if (!l.isEmpty() && Character.isLetter(l.charAt(0))) {
                String[] f = l.split(" ");
                m.put(f[0], f);
            }
        }
        return m;
    }

    @Test
    void nodesAreNamedAfterTheModel() throws Exception {
        List<String> deck = SpiceDeck.lines(rail(withPackage(), Optional.empty(), ""), SpiceDeck.Kind.DROOP);
        Map<String, String[]> el = elements(deck);
        assertThat(deck).contains(".subckt rail load gnd", ".ends rail", "Xrail load 0 rail", ".end");
        assertThat(el.get("Vreg")).containsExactly("Vreg", "reg", "gnd", "DC", "1.0");
        assertThat(el.get("Rreg")).startsWith("Rreg", "reg", "reg_l");
        assertThat(el.get("Lreg")).startsWith("Lreg", "reg_l", "board");
        // the bank and the plane at the board node, the die behind the package at the load node
        assertThat(el.get("Rplane")).startsWith("Rplane", "board", "plane_c");
        assertThat(el.get("Cplane")).startsWith("Cplane", "plane_c", "gnd");
        for (String b : List.of("b1", "b2", "b3")) {
            assertThat(el.get("R" + b)).startsWith("R" + b, "board", b + "_l");
            assertThat(el.get("L" + b)).startsWith("L" + b, b + "_l", b + "_c");
            assertThat(el.get("C" + b)).startsWith("C" + b, b + "_c", "gnd");
        }
        assertThat(el.get("Rpkg")).startsWith("Rpkg", "board", "pkg_l");
        assertThat(el.get("Lpkg")).startsWith("Lpkg", "pkg_l", "load");
        assertThat(el.get("Rdie")).startsWith("Rdie", "load", "die_c");
        assertThat(el.get("Iload")).startsWith("Iload", "load", "0", "DC");
        assertThat(el.get("Iac")).containsExactly("Iac", "0", "load", "DC", "0", "AC", "1");

        // without a package the board node is the load node
        Map<String, String[]> flat = elements(SpiceDeck.lines(rail(idealEdgesNoPackage(), Optional.empty(), ""),
                SpiceDeck.Kind.DROOP));
        assertThat(flat.get("Lreg")).startsWith("Lreg", "reg_l", "load");
        assertThat(flat.get("Rb1")).startsWith("Rb1", "load", "b1_l");
        assertThat(flat.get("Rdie")).startsWith("Rdie", "load", "die_c");
        assertThat(flat).doesNotContainKeys("Rpkg", "Lpkg", "Rplane");
        assertThat(flat.values()).noneMatch(f -> List.of(f).contains("board"));
    }

    @Test
    void zeroValuedElementsAreLeftOutAndAZeroPathIsAShort() {
        SpiceNetlist n = new SpiceNetlist();
        n.series("pkg", "board", "load", 0, 0, 0);
        n.series("plane", "board", "gnd", 0, 0, 5e-9);
        n.series("reg", "reg", "board", 0, 2e-9, 0);
        assertThat(n.lines()).containsExactly("Vpkg board load DC 0", "Cplane board gnd 5.0E-9",
                "Lreg reg board 2.0E-9");
    }

    /**
     * n identical series R–L–C branches in parallel are one branch of impedance Z/n, i.e. R/n, L/n and n·C
     * (circuit-theory handbook rule for identical impedances in parallel). Checked on the deck's element
     * values at frequencies around each branch's resonance, with the mounting inductance of a footprint.
     */
    @Test
    void eachPartTypeIsItsParallelCopiesFoldedIntoOneBranch() throws Exception {
        Footprint fp = new Footprint("tight", Map.of("0805", 0.3e-9, "0402", 0.2e-9));
        List<String> deck = SpiceDeck.lines(rail(withPackage(), Optional.of(fp), "tight"), SpiceDeck.Kind.OVERSHOOT);
        Map<String, String[]> el = elements(deck);
        String[] tags = {"b1", "b2", "b3"};
        for (int k = 0; k < BANK.size(); k++) {
            Part p = BANK.get(k).part();
            int n = BANK.get(k).count();
            double mount = fp.mountInductanceByCaseH().getOrDefault(p.caseCode(), p.mountInductanceH());
            double r = Double.parseDouble(el.get("R" + tags[k])[3]);
            double l = Double.parseDouble(el.get("L" + tags[k])[3]);
            double c = Double.parseDouble(el.get("C" + tags[k])[3]);
            assertThat(r).isCloseTo(p.esrOhms() / n, within(1e-15 * p.esrOhms()));
            assertThat(l).isCloseTo((p.eslH() + mount) / n, within(1e-15 * p.eslH()));
            assertThat(c).isCloseTo(n * p.capacitanceF() * p.dcBiasRetention(), within(1e-15 * n * p.capacitanceF()));
            double f0 = 1 / (2 * Math.PI * Math.sqrt((p.eslH() + mount) * p.effectiveCapacitanceF()));
            for (double f : new double[] {f0 / 30, f0 / 3, f0, 3 * f0, 30 * f0}) {
                double w = 2 * Math.PI * f;
                Complex single = new Complex(p.esrOhms(), w * (p.eslH() + mount) - 1 / (w * p.effectiveCapacitanceF()));
                Complex folded = new Complex(r, w * l - 1 / (w * c));
                Complex expected = single.divide(n);
                assertThat(folded.subtract(expected).abs()).as(p.name() + " at " + f + " Hz")
                        .isLessThan(1e-12 * single.abs());
            }
            // the comment beside the branch gives the per-part values and the count
            int at = deck.indexOf(String.join(" ", el.get("R" + tags[k])));
            String perPart = deck.get(at - 1);
            assertThat(perPart).contains("C_eff = " + p.effectiveCapacitanceF(), "ESR = " + p.esrOhms(),
                    "ESL = " + p.eslH(), "L_mount = " + mount, "count " + n)
                    .contains(fp.mountInductanceByCaseH().containsKey(p.caseCode()) ? "footprint tight" : "catalog value");
        }
        assertThat(deck).anyMatch(s -> s.contains("8 x mid-22u (case 0805) in parallel, folded into one branch: "
                + "R = ESR/8, L = (ESL + L_mount)/8, C = 8 * C_eff"));
    }

    static final Pattern PWL_POINT = Pattern.compile("\\+ (\\S+) (\\S+)( \\))?");

    static List<double[]> pwl(List<String> deck) {
        List<double[]> pts = new ArrayList<>();
        int i = deck.indexOf(deck.stream().filter(s -> s.startsWith("Iload ")).findFirst().orElseThrow());
        for (int k = i + 1; k < deck.size() && deck.get(k).startsWith("+"); k++) {
            Matcher m = PWL_POINT.matcher(deck.get(k));
            assertThat(m.matches()).as(deck.get(k)).isTrue();
            pts.add(new double[] {Double.parseDouble(m.group(1)), Double.parseDouble(m.group(2))});
        }
        return pts;
    }

    @Test
    void pwlTimesIncreaseStrictlyAndJumpsAreSplitFarBelowTheFastestPeriod() throws Exception {
        ExportedRail r = rail(idealEdgesNoPackage(), Optional.empty(), "");
        for (SpiceDeck.Kind kind : SpiceDeck.Kind.values()) {
            Waveform wf = kind == SpiceDeck.Kind.DROOP ? r.droop() : r.overshoot();
            double[] t = wf.timeS();
            double[] i = wf.loadCurrentA();
            int jumps = 0;
            for (int k = 1; k < t.length; k++) {
                jumps += t[k] == t[k - 1] ? 1 : 0;
            }
            assertThat(jumps).as("ideal edges give jumps").isPositive();
            List<String> deck = SpiceDeck.lines(r, kind);
            List<double[]> pts = pwl(deck);
            assertThat(pts).hasSize(t.length);
            double delta = PwlSchedule.SEPARATION_PER_PERIOD * r.shortestPeriodS();
            for (int k = 0; k < pts.size(); k++) {
                if (k > 0) {
                    assertThat(pts.get(k)[0]).as("time %d", k).isGreaterThan(pts.get(k - 1)[0]);
                }
                assertThat(pts.get(k)[1]).isEqualTo(i[k]);
                assertThat(Math.abs(pts.get(k)[0] - t[k])).isLessThanOrEqualTo(delta);
            }
            String jumpCount = "has " + jumps + " ideal jumps";
            assertThat(deck).anyMatch(s -> s.contains(jumpCount));
            // DC value is the first breakpoint's, so the transient starts from that operating point
            assertThat(elements(deck).get("Iload")[4]).isEqualTo(Double.toString(i[0]));
        }
    }

    @Test
    void transientStepResolvesTheFastestModeAndTheEdgeAndSpansThePattern() throws Exception {
        ExportedRail r = rail(withPackage(), Optional.empty(), "");
        List<String> deck = SpiceDeck.lines(r, SpiceDeck.Kind.DROOP);
        String[] tran = deck.stream().filter(s -> s.startsWith(".tran ")).findFirst().orElseThrow().split(" ");
        double tmax = Double.parseDouble(tran[4]);
        assertThat(Double.parseDouble(tran[3])).isZero();
        assertThat(tmax).isLessThanOrEqualTo(r.shortestPeriodS() / 50).isLessThan(1e-9 / 4);
        double[] t = r.droop().timeS();
        assertThat(Double.parseDouble(tran[2])).isEqualTo(t[t.length - 1]);
        // the fastest mode's period from the poles: 2π/|p| is the shortest of them
        var m = r.evaluation().model();
        for (int k = 0; k < m.modeCount(); k++) {
            assertThat(2 * Math.PI / Math.hypot(m.poleRe()[k], m.poleIm()[k])).isGreaterThanOrEqualTo(r.shortestPeriodS());
        }
        String[] ac = deck.stream().filter(s -> s.startsWith(".ac ")).findFirst().orElseThrow().split(" ");
        assertThat(ac[1]).isEqualTo("dec");
        assertThat(ac[2]).isEqualTo("200");
        assertThat(Double.parseDouble(ac[3])).isEqualTo(r.evaluation().curve().frequencyHz(0));
    }

    /** SPICE3 element and control-line syntax (Berkeley SPICE3 user's guide, from memory). */
    static final List<Pattern> SPICE3_LINES = List.of(
            Pattern.compile("\\*.*"),                                                   // comment
            Pattern.compile("\\+ \\S+( \\S+)*"),                                        // continuation
            Pattern.compile("[RLC][A-Za-z0-9_]* [A-Za-z0-9_]+ [A-Za-z0-9_]+ " + num()),  // R, L, C
            Pattern.compile("V[A-Za-z0-9_]* [A-Za-z0-9_]+ [A-Za-z0-9_]+ DC " + num()),  // DC voltage source
            Pattern.compile("I[A-Za-z0-9_]* [A-Za-z0-9_]+ [A-Za-z0-9_]+ DC " + num() + "( AC 1| PWL\\()"),
            Pattern.compile("X[A-Za-z0-9_]* load 0 rail"),
            Pattern.compile("\\.subckt rail load gnd"),
            Pattern.compile("\\.ends rail"),
            Pattern.compile("\\.options method=gear maxord=2"),                       // SPICE3 integration method
            Pattern.compile("\\.tran " + num() + " " + num() + " 0 " + num()),
            Pattern.compile("\\.ac dec [0-9]+ " + num() + " " + num()),
            Pattern.compile("\\.save v\\(load\\)"),
            Pattern.compile("\\.end"));

    private static String num() {
        return "-?[0-9]+(\\.[0-9]+)?(E-?[0-9]+)?";
    }

    @Test
    void everyLineIsPlainSpice3() throws Exception {
        for (Scenario s : List.of(withPackage(), idealEdgesNoPackage())) {
            for (SpiceDeck.Kind kind : SpiceDeck.Kind.values()) {
                List<String> deck = SpiceDeck.lines(rail(s, Optional.empty(), ""), kind);
                assertThat(deck.get(0)).startsWith("* Breakwater worst-case " + kind.word);
                assertThat(deck.get(deck.size() - 1)).isEqualTo(".end");
                for (String line : deck) {
                    assertThat(SPICE3_LINES).as(line).anyMatch(p -> p.matcher(line).matches());
                    assertThat(line.chars().allMatch(ch -> ch >= 0x20 && ch < 0x7f)).as("ASCII: " + line).isTrue();
                }
                String text = String.join("\n", deck).toLowerCase(java.util.Locale.ROOT);
                assertThat(text.lines().filter(l -> !l.startsWith("*")))
                        .noneMatch(l -> l.startsWith(".control") || l.startsWith(".meas") || l.startsWith(".param")
                                || l.startsWith("b") || l.contains("{"));
                assertThat(text).contains("a model is not a measurement", "verify the design on hardware",
                        "breakwater test", "scenario test.toml");
            }
        }
    }

    @Test
    void commentsGiveTheExpectedExtremeAndWhen() throws Exception {
        ExportedRail r = rail(withPackage(), Optional.empty(), "");
        var f = r.evaluation().figures();
        assertThat(SpiceDeck.lines(r, SpiceDeck.Kind.DROOP)).anyMatch(s -> s.contains("the MINIMUM of v(load) is "
                + f.minVoltageV() + " V at t = " + r.droop().worstInstantS() + " s"));
        assertThat(SpiceDeck.lines(r, SpiceDeck.Kind.OVERSHOOT)).anyMatch(s -> s.contains("the MAXIMUM of v(load) is "
                + f.maxVoltageV() + " V at t = " + r.overshoot().worstInstantS() + " s"));
    }
}
