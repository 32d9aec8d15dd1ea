package breakwater.design;

import breakwater.Fixtures;
import breakwater.catalog.Part;
import breakwater.network.NetworkBuilder;
import breakwater.network.PowerNetwork;
import breakwater.scenario.Board;
import breakwater.scenario.Die;
import breakwater.scenario.PackagePath;
import breakwater.scenario.Plane;
import breakwater.scenario.Rail;
import breakwater.scenario.Scenario;
import org.junit.jupiter.api.Test;

import java.util.Map;
import java.util.List;
import java.util.Optional;
import java.util.SplittableRandom;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The bound over every bank ({@link ReachBound}) against banks themselves: it must never claim more than
 * any bank shows, and it must rule out a rail that no bank can hold.
 */
class ReachBoundTest {
    static final List<Part> PARTS = List.of(
            Part.of("bulk-100u", 100e-6, 10e-3, 1.5e-9, 0.5e-9, 0.12),
            Part.of("mid-10u", 10e-6, 5e-3, 0.6e-9, 0.4e-9, 0.03),
            Part.of("small-1u", 1e-6, 15e-3, 0.4e-9, 0.35e-9, 0.008),
            Part.of("hf-100n", 100e-9, 30e-3, 0.3e-9, 0.3e-9, 0.004));
    static final int[] MAX = {4, 8, 12, 12};

    static Scenario rail(double tolerance, double edgeS, int maxParts) {
        return Fixtures.scenario().rail(new Rail("core", 0.9, tolerance, 5.0, 2.5, edgeS))
                .plane(new Plane(5e-9, 0.4e-3)).packagePath(new PackagePath(true, 0.3e-3, 20e-12))
                .die(new Die(300e-9, 4e-3)).board(new Board(maxParts, -1, Map.of())).build();
    }

    static int[] randomCounts(SplittableRandom r, int maxParts) {
        int[] c = new int[MAX.length];
        int total = 0;
        for (int i = 0; i < c.length; i++) {
            c[i] = r.nextInt(MAX[i] + 1);
            total += c[i];
        }
        while (maxParts >= 0 && total > maxParts) { // trim to the board's limit
            int i = r.nextInt(c.length);
            if (c[i] > 0) {
                c[i]--;
                total--;
            }
        }
        return c;
    }

    /**
     * At every frequency, no bank within the limits has a smaller |Z| at the load than the bound's least
     * impedance: random banks, the empty bank and every part at its maximum, with |Z| from the network's
     * own nodal formula (a separate computation from the bound's Möbius-map minimum).
     */
    @Test
    void noBankHasLessImpedanceThanTheBoundSays() throws Exception {
        for (int maxParts : new int[] {-1, 20}) {
            Scenario s = rail(0.03, 0, maxParts);
            BankEvaluator ev = new BankEvaluator(s, Optional.empty());
            Candidates c = Candidates.of(PARTS);
            PowerNetwork fixed = NetworkBuilder.build(s, List.of(), Optional.empty());
            SplittableRandom r = new SplittableRandom(5);
            for (double f : new double[] {3e3, 1e5, 1e6, 7e6, 3e7, 8e7, 2e8, 6e8}) {
                double zMin = leastImpedance(ev, c, maxParts, f);
                assertThat(zMin).as("a bound at %g Hz", f).isPositive();
                for (int k = 0; k < 400; k++) {
                    int[] counts = k == 0 ? new int[MAX.length] : k == 1 ? MAX.clone() : randomCounts(r, maxParts);
                    if (maxParts >= 0 && java.util.Arrays.stream(counts).sum() > maxParts) {
                        continue;
                    }
                    PowerNetwork net = NetworkBuilder.build(s, c.bank(counts).entries(), Optional.empty());
                    assertThat(net.magnitude(f)).as("bank %s at %g Hz", java.util.Arrays.toString(counts), f)
                            .isGreaterThanOrEqualTo(zMin * (1 - 1e-9));
                }
            }
            assertThat(fixed.hasPackage()).isTrue();
        }
    }

    /** The bound's least impedance at one frequency, from its polygon construction. */
    static double leastImpedance(BankEvaluator ev, Candidates c, int maxParts, double f) {
        PowerNetwork fixed = NetworkBuilder.build(ev.scenario(), List.of(), Optional.empty());
        breakwater.network.SeriesBranch[] unit = c.parts().stream()
                .map(p -> breakwater.network.PartBranches.single(p, Optional.empty()))
                .toArray(breakwater.network.SeriesBranch[]::new);
        return ReachBound.leastImpedanceAt(fixed, unit, MAX, maxParts < 0 ? Long.MAX_VALUE : maxParts, f);
    }

    /**
     * Every bank's exact worst case (the full evaluation: pole–residue model, ideal-edge integral or
     * slew-limited dynamic program) is at least the bound's droop and overshoot, with ideal and finite edges.
     */
    @Test
    void noBankWorstCaseFallsBelowTheBound() throws Exception {
        SplittableRandom r = new SplittableRandom(11);
        for (double edge : new double[] {0, 1e-9, 20e-9}) {
            Scenario s = rail(0.03, edge, -1);
            BankEvaluator ev = new BankEvaluator(s, Optional.empty());
            Candidates c = Candidates.of(PARTS);
            ReachBound b = ReachBound.of(ev, c, MAX).orElseThrow();
            assertThat(b.droopAtLeastV()).isPositive();
            for (int k = 0; k < 12; k++) {
                int[] counts = k == 0 ? MAX.clone() : randomCounts(r, -1);
                Evaluation e = ev.evaluate(c.bank(counts));
                assertThat(e.figures().droopV()).as("droop of %s, edge %g s", java.util.Arrays.toString(counts), edge)
                        .isGreaterThanOrEqualTo(b.droopAtLeastV() * (1 - 1e-6));
                assertThat(e.figures().overshootV()).as("overshoot of %s", java.util.Arrays.toString(counts))
                        .isGreaterThanOrEqualTo(b.overshootAtLeastV() * (1 - 1e-6));
            }
        }
    }

    /**
     * The pattern behind the bound, checked on its own: the periodic steady state of a bank driven by a
     * 0…ΔI trapezoidal square wave at f, summed from its Fourier series (the textbook series of a
     * trapezoidal wave: odd harmonics k with amplitude (2ΔI/(kπ))·sinc(k π f t_e)) through |Z(kf)| and its
     * phase, peaks at least ΔI/2·sinc(π f t_e)·|Z(f)| either side of its mean.
     */
    @Test
    void theTrapezoidalSquareWaveSwingsAtLeastWhatTheBoundUses() throws Exception {
        Scenario s = rail(0.03, 1e-9, -1);
        PowerNetwork net = NetworkBuilder.build(s, Candidates.of(PARTS).bank(new int[] {1, 3, 6, 10}).entries(),
                Optional.empty());
        double dI = 2.5;
        double te = 1e-9;
        double[] z = new double[2];
        for (double f : new double[] {2e5, 3e6, 2.5e7, 9e7}) {
            int samples = 2000;
            double max = Double.NEGATIVE_INFINITY;
            double min = Double.POSITIVE_INFINITY;
            for (int n = 0; n < samples; n++) {
                double t = n / (samples * f);
                double v = 0;
                for (int k = 1; k <= 4001; k += 2) {
                    double x = Math.PI * k * f * te;
                    double amp = 2 * dI / (k * Math.PI) * (x == 0 ? 1 : Math.sin(x) / x);
                    net.impedance(k * f, z);
                    // current harmonic amp·sin(kωt − kω t_e/2) (the ramps' delay); voltage drop = Z·I
                    double ph = 2 * Math.PI * k * f * t - Math.PI * k * f * te;
                    v += amp * (z[0] * Math.sin(ph) + z[1] * Math.cos(ph));
                }
                max = Math.max(max, v);
                min = Math.min(min, v);
            }
            double bound = dI / 2 * Math.abs(Math.sin(Math.PI * f * te) / (Math.PI * f * te)) * net.magnitude(f);
            assertThat(max).as("peak above the mean at %g Hz", f).isGreaterThanOrEqualTo(bound * (1 - 1e-3));
            assertThat(-min).as("peak below the mean at %g Hz", f).isGreaterThanOrEqualTo(bound * (1 - 1e-3));
        }
    }

    /**
     * A rail whose tolerance no bank of these parts can hold (the package and die alone ring too hard) is
     * ruled out, and the exhaustive search agrees: no bank passes. The demo-like rail at 3 % is not.
     */
    @Test
    void aRailNoBankCanHoldIsRuledOutAndAnEasyOneIsNot() throws Exception {
        Candidates c = Candidates.of(PARTS);
        int[] small = {2, 2, 2, 2};
        Scenario tight = rail(0.004, 0, -1);
        BankEvaluator ev = new BankEvaluator(tight, Optional.empty());
        ReachBound b = ReachBound.of(ev, c, small).orElseThrow();
        assertThat(b.outOfReach()).as(b.toString()).isTrue();
        assertThat(b.droopAtLeastV()).isGreaterThan(b.allowedDroopV());
        int combos = 81;
        for (int code = 0; code < combos; code++) {
            int[] counts = {code % 3, code / 3 % 3, code / 9 % 3, code / 27 % 3};
            assertThat(ev.evaluate(c.bank(counts)).figures().droopV()).isGreaterThan(b.allowedDroopV());
        }
        ReachBound easy = ReachBound.of(new BankEvaluator(rail(0.03, 0, -1), Optional.empty()), c, MAX).orElseThrow();
        assertThat(easy.outOfReach()).isFalse();
    }

    /** With placement regions no bound is claimed. */
    @Test
    void noBoundWithPlacementRegions() throws Exception {
        Scenario s = Fixtures.scenario().regions(List.of(new breakwater.scenario.Region("near", 0.1e-3, 20e-12,
                Board.UNLIMITED))).build();
        assertThat(ReachBound.of(new BankEvaluator(s, Optional.empty()), Candidates.forScenario(PARTS, s),
                new int[] {2, 2, 2, 2})).isEmpty();
    }
}
