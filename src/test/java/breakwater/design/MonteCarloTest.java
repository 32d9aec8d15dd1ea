package breakwater.design;

import breakwater.Fixtures;
import breakwater.catalog.BankEntry;
import breakwater.catalog.Part;
import breakwater.scenario.Die;
import breakwater.scenario.Rail;
import breakwater.scenario.Scenario;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Optional;
import java.util.concurrent.ForkJoinPool;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** Part-to-part spread: identities of the sampling, determinism, and the percentile method. */
class MonteCarloTest {

    /** The small invented catalog of the search tests: four parts spanning the band. */
    static final List<Part> PARTS = List.of(
            Part.of("bulk-100u", 100e-6, 10e-3, 1.5e-9, 0.5e-9, 0.12),
            Part.of("mid-10u", 10e-6, 5e-3, 0.6e-9, 0.4e-9, 0.03),
            Part.of("small-1u", 1e-6, 15e-3, 0.4e-9, 0.35e-9, 0.008),
            Part.of("hf-100n", 100e-9, 30e-3, 0.3e-9, 0.3e-9, 0.004));

    static Scenario scenario(double toleranceFraction) {
        return Fixtures.scenario()
                .rail(new Rail("small", 1.0, toleranceFraction, 4.0, 2.0, 0.0))
                .die(new Die(1e-6, 10e-3))
                .build();
    }

    static CapacitorBank bank(int... counts) {
        return CapacitorBank.of(PARTS, counts);
    }

    @Test
    void zeroToleranceAndZeroSpreadGiveTheNominalWorstCaseInEverySample() throws Exception {
        // Identity: a draw scaled by zero leaves every part value bit-for-bit unchanged, so every sample
        // is the nominal network and its worst case is the nominal one exactly (no tolerance needed).
        BankEvaluator ev = new BankEvaluator(scenario(0.05), Optional.empty());
        CapacitorBank b = bank(2, 3, 4, 5);
        MonteCarlo.Result r = MonteCarlo.run(ev, b, new MonteCarlo.Settings(40, 7, 0.0, p -> 0.0));
        WorstCaseVolts nominal = ev.evaluate(b).figures();
        assertThat(r.droopV()).containsOnly(nominal.droopV());
        assertThat(r.overshootV()).containsOnly(nominal.overshootV());
        assertThat(r.droop().max()).isEqualTo(r.droop().p50());
        assertThat(r.passing()).isEqualTo(nominal.passes() ? 40 : 0);
    }

    /** A rail with plane, package and die, and a band up to 1 GHz, so that every anti-resonance is seen. */
    static Scenario stackupScenario() {
        return Fixtures.scenario()
                .band(new breakwater.scenario.Band(1e4, 1e9))
                .plane(new breakwater.scenario.Plane(5e-9, 0.5e-3))
                .packagePath(breakwater.scenario.PackagePath.of(0.3e-3, 20e-12))
                .die(new Die(200e-9, 2e-3))
                .build();
    }

    @Test
    void zeroSpreadsEverywhereGiveTheNominalWorstCaseAlsoWithAFootprintAndAStackup() throws Exception {
        // Identity: every draw is scaled by zero, so each sample is the nominal network bit for bit, also when
        // the mounting inductance comes from a footprint and the plane, package and die are present.
        Scenario s = stackupScenario();
        var footprint = Optional.of(new breakwater.scenario.Footprint("tight", java.util.Map.of()));
        BankEvaluator ev = new BankEvaluator(s, footprint);
        CapacitorBank b = bank(2, 3, 4, 5);
        MonteCarlo.Settings zero = new MonteCarlo.Settings(30, 3, 0.0, 0.0, MonteCarlo.StackupSpread.NONE, p -> 0.0);
        MonteCarlo.Result r = MonteCarlo.run(ev, b, zero);
        WorstCaseVolts nominal = ev.evaluate(b).figures();
        assertThat(r.droopV()).containsOnly(nominal.droopV());
        assertThat(r.overshootV()).containsOnly(nominal.overshootV());
        // and a stack-up spread alone does move the worst case
        MonteCarlo.Result st = MonteCarlo.run(ev, b, new MonteCarlo.Settings(30, 3, 0.0, 0.0,
                new MonteCarlo.StackupSpread(0.2, 0.2, 0.2), p -> 0.0));
        assertThat(st.droop().max()).isGreaterThan(st.droop().p50());
    }

    /**
     * Circuit theory: the anti-resonance between the regulator's inductance and the bulk capacitance is set
     * by L_reg and the total C (f ≈ 1/(2π√(L_reg·C)), 85 kHz here), where every capacitor branch is far
     * below its own series resonance and its inductance hardly matters; the anti-resonances between
     * capacitor types above 1 MHz (3.8, 14 and 43 MHz here) are each set by the inductance (ESL + mounting)
     * of the branch that is already inductive against the capacitance of the next, f ∝ 1/√L. (The one at
     * 610 MHz is the package inductance against the die, neither of them drawn.) So a spread on the
     * mounting inductance alone (±30 %, shared by all parts of a type) moves each of those high ones by
     * several percent over 20 samples (measured 3 … 4 %), and the lowest by well under one percent
     * (measured 0.2 %).
     */
    @Test
    void aSpreadOnlyOnMountingInductanceMovesTheHighAntiResonancesNotTheLowOnes() throws Exception {
        Scenario s = stackupScenario();
        BankEvaluator ev = new BankEvaluator(s, Optional.empty());
        CapacitorBank b = bank(2, 3, 4, 5);
        List<breakwater.network.AntiResonance> nominal = antiResonances(ev, breakwater.network.NetworkBuilder
                .build(s, b.entries(), Optional.empty()));
        assertThat(nominal).hasSize(6);
        MonteCarlo.Settings mountOnly = new MonteCarlo.Settings(20, 9, 0.0, 0.3, MonteCarlo.StackupSpread.NONE, p -> 0.0);
        double[] tol = new double[b.entries().size()];
        double[] shift = new double[nominal.size()];
        for (long seed = 0; seed < 20; seed++) {
            List<breakwater.network.AntiResonance> drawn = antiResonances(ev,
                    MonteCarlo.network(ev, b.entries(), tol, mountOnly, seed));
            assertThat(drawn).hasSameSizeAs(nominal);
            for (int i = 0; i < shift.length; i++) {
                shift[i] = Math.max(shift[i], Math.abs(drawn.get(i).frequencyHz() / nominal.get(i).frequencyHz() - 1));
            }
        }
        assertThat(shift[0]).as("regulator and bulk at %s Hz", nominal.get(0).frequencyHz()).isLessThan(0.005);
        for (int i = 0; i < shift.length; i++) {
            double f = nominal.get(i).frequencyHz();
            if (f > 1e6 && f < 1e8) {
                assertThat(shift[i]).as("anti-resonance at %s Hz", f).isGreaterThan(0.02);
            }
        }
    }

    private static List<breakwater.network.AntiResonance> antiResonances(BankEvaluator ev,
                                                                        breakwater.network.PowerNetwork net) {
        var curve = breakwater.network.ImpedanceCurve.sweep(net, ev.reportGrid());
        return breakwater.network.ImpedanceAnalysis.analyze(net, curve, ev.scenario().band(), ev.targetImpedanceOhms())
                .antiResonances();
    }

    @Test
    void mountingDrawsStayWithinTheirSpreadAndStartFromTheFootprint() {
        // one part of case 0402, which the footprint lists (0.15 nH instead of the catalog's 0.3 nH)
        Part cased = new Part("hf-100n-0402", "", "0402", "X7R", 100e-9, 30e-3, 0.3e-9, 0.3e-9, 0.004,
                Double.NaN, Double.NaN, 1.0, -1);
        List<BankEntry> entries = List.of(bank(2, 3, 4, 0).entries().get(0), bank(2, 3, 4, 0).entries().get(1),
                new BankEntry(cased, 5));
        double[] tol = {0.05, 0.1, 0.0};
        var footprint = Optional.of(new breakwater.scenario.Footprint("f", java.util.Map.of("0402", 0.15e-9)));
        assertThat(breakwater.network.PartBranches.mountInductanceH(cased, footprint)).isEqualTo(0.15e-9);
        for (long seed = 0; seed < 100; seed++) {
            List<BankEntry> drawn = MonteCarlo.sample(entries, tol, 0.2, 0.25, footprint,
                    new java.util.SplittableRandom(seed));
            for (int i = 0; i < entries.size(); i++) {
                double m = breakwater.network.PartBranches.mountInductanceH(entries.get(i).part(), footprint);
                assertThat(drawn.get(i).part().mountInductanceH()).isBetween(m * 0.75, m * 1.25);
            }
        }
    }

    @Test
    void drawsStayWithinTheirTolerancesAndMoveAllPartsOfATypeTogether() {
        List<BankEntry> entries = bank(2, 3, 4, 5).entries();
        double[] tol = {0.05, 0.1, 0.2, 0.0};
        for (long seed = 0; seed < 200; seed++) {
            List<BankEntry> drawn = MonteCarlo.sample(entries, tol, 0.3, seed);
            for (int i = 0; i < entries.size(); i++) {
                Part p = entries.get(i).part();
                Part d = drawn.get(i).part();
                // one drawn part per type carries the count of the type: all n parts share its values
                assertThat(drawn.get(i).count()).isEqualTo(entries.get(i).count());
                assertThat(d.capacitanceF()).isBetween(p.capacitanceF() * (1 - tol[i]), p.capacitanceF() * (1 + tol[i]));
                assertThat(d.esrOhms()).isBetween(p.esrOhms() * 0.7, p.esrOhms() * 1.3);
                assertThat(d.eslH()).isBetween(p.eslH() * 0.7, p.eslH() * 1.3);
                assertThat(d.mountInductanceH()).isEqualTo(p.mountInductanceH());
            }
        }
    }

    @Test
    void resultDoesNotDependOnTheNumberOfThreads() throws Exception {
        BankEvaluator ev = new BankEvaluator(scenario(0.05), Optional.empty());
        CapacitorBank b = bank(1, 2, 3, 4);
        MonteCarlo.Settings s = new MonteCarlo.Settings(64, 11, 0.2, p -> 0.1);
        MonteCarlo.Result many = MonteCarlo.run(ev, b, s);
        ForkJoinPool one = new ForkJoinPool(1);
        try {
            MonteCarlo.Result single = one.submit(() -> MonteCarlo.run(ev, b, s)).get();
            assertThat(single).isEqualTo(many);
        } finally {
            one.shutdown();
        }
        assertThat(MonteCarlo.run(ev, b, new MonteCarlo.Settings(64, 12, 0.2, p -> 0.1))).isNotEqualTo(many);
    }

    @Test
    void yieldNeverRisesWhenTolerancesWiden() throws Exception {
        // Same seed, so the same draws u in [-1, 1] are multiplied by wider tolerances: every sample moves
        // further from nominal along the same direction. The cheapest passing bank on this rail sits close
        // to its limit, so the yield is below 1 already at small spreads.
        BankEvaluator ev = new BankEvaluator(scenario(0.05), Optional.empty());
        CapacitorBank b = cheapestPassing(ev);
        assertThat(ev.evaluate(b).figures().passes()).isTrue();
        double previous = 1.0;
        double[] yields = new double[6];
        int k = 0;
        for (double scale : new double[] {0.0, 0.1, 0.25, 0.5, 0.75, 0.95}) {
            MonteCarlo.Result r = MonteCarlo.run(ev, b, new MonteCarlo.Settings(200, 5, 0.3 * scale,
                    p -> scale * 0.5));
            yields[k++] = r.yieldFraction();
            assertThat(r.yieldFraction()).as("yield at scale %s (yields so far %s)", scale,
                    java.util.Arrays.toString(yields)).isLessThanOrEqualTo(previous);
            previous = r.yieldFraction();
        }
        assertThat(yields[0]).isEqualTo(1.0);
        assertThat(yields[5]).as("wide tolerances must cost some yield, or the test shows nothing").isLessThan(1.0);
    }

    /** Every bank with 0..4 of each part; the cheapest that passes. */
    static CapacitorBank cheapestPassing(BankEvaluator ev) {
        CandidateJudge judge = new CandidateJudge(ev, PARTS);
        int[] best = null;
        double bestCost = Double.POSITIVE_INFINITY;
        int[] c = new int[4];
        for (int code = 0; code < 625; code++) {
            int rest = code;
            for (int i = 0; i < 4; i++) {
                c[i] = rest % 5;
                rest /= 5;
            }
            Judgement j = judge.judge(c);
            if (j.feasible() && j.costTotal() < bestCost) {
                bestCost = j.costTotal();
                best = c.clone();
            }
        }
        return bank(best);
    }

    @Test
    void nearestRankPercentilesFollowTheTextbookExample() {
        // Worked example of the nearest-rank method (values 15, 20, 35, 40, 50; from memory of the common
        // textbook/encyclopedia example): P5 = 15, P30 = 20, P40 = 20, P50 = 35, P100 = 50.
        double[] v = {15, 20, 35, 40, 50};
        assertThat(MonteCarlo.nearestRank(v, 5)).isEqualTo(15);
        assertThat(MonteCarlo.nearestRank(v, 30)).isEqualTo(20);
        assertThat(MonteCarlo.nearestRank(v, 40)).isEqualTo(20);
        assertThat(MonteCarlo.nearestRank(v, 50)).isEqualTo(35);
        assertThat(MonteCarlo.nearestRank(v, 100)).isEqualTo(50);
        // p95 of 1..100 is the 95th value exactly (rank ceil(0.95 * 100) = 95)
        double[] hundred = new double[100];
        for (int i = 0; i < 100; i++) {
            hundred[i] = i + 1;
        }
        MonteCarlo.Distribution d = MonteCarlo.Distribution.of(hundred);
        assertThat(d.p50()).isEqualTo(50);
        assertThat(d.p95()).isEqualTo(95);
        assertThat(d.p99()).isEqualTo(99);
        assertThat(d.max()).isEqualTo(100);
    }

    @Test
    void dielectricDefaultsAndRejectedTolerances() throws Exception {
        // common practice: C0G ±5 %, X7R ±10 %, X5R ±20 %; polymer and tantalum parts are usually ±20 %
        assertThat(MonteCarlo.dielectricDefault("C0G")).isEqualTo(0.05);
        assertThat(MonteCarlo.dielectricDefault("x7r")).isEqualTo(0.10);
        assertThat(MonteCarlo.dielectricDefault("X5R")).isEqualTo(0.20);
        assertThat(MonteCarlo.dielectricDefault("polymer")).isEqualTo(0.20);
        assertThat(MonteCarlo.dielectricDefault("")).isEqualTo(0.20);
        BankEvaluator ev = new BankEvaluator(scenario(0.05), Optional.empty());
        assertThatThrownBy(() -> MonteCarlo.run(ev, bank(1, 0, 0, 0), new MonteCarlo.Settings(3, 1, 0.1, p -> 1.0)))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("bulk-100u");
    }
}
