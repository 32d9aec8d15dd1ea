package breakwater.design;

import breakwater.Fixtures;
import breakwater.catalog.Part;
import breakwater.scenario.Board;
import breakwater.scenario.Die;
import breakwater.scenario.PackagePath;
import breakwater.scenario.Plane;
import breakwater.scenario.Rail;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Random;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** Two engines that must agree: the solver's fast judge against the full evaluation of the same bank. */
class CandidateJudgeTest {
    static final List<Part> PARTS = List.of(
            new Part("bulk", "", "D", "polymer", 220e-6, 12e-3, 2e-9, 0.8e-9, 0.22, Double.NaN, Double.NaN, 1, -1),
            new Part("mid", "", "0805", "X5R", 22e-6, 4e-3, 0.68e-9, 0.7e-9, 0.04, Double.NaN, Double.NaN, 0.6, -1),
            new Part("small", "", "0402", "X5R", 1e-6, 15e-3, 0.35e-9, 0.45e-9, 0.004, Double.NaN, Double.NaN, 0.8, -1),
            new Part("hf", "", "0402", "X7R", 100e-9, 35e-3, 0.35e-9, 0.45e-9, 0.002, Double.NaN, Double.NaN, 0.95, -1),
            new Part("tiny", "", "0201", "X5R", 100e-9, 55e-3, 0.18e-9, 0.35e-9, 0.003, Double.NaN, Double.NaN, 0.85, -1));

    /**
     * The judge's warm start (poles from the last bank with the same parts) against the judge that builds
     * every model by the eigenvalue search, over a walk of neighbouring banks as the solver makes them.
     */
    @Test
    void warmStartedJudgementsEqualColdOnes() throws Exception {
        var scenario = Fixtures.scenario()
                .rail(new Rail("r", 0.9, 0.03, 5, 2.5, 0))
                .plane(new Plane(5e-9, 0.4e-3))
                .packagePath(PackagePath.of(0.3e-3, 10e-12))
                .die(new Die(600e-9, 4e-3))
                .build();
        BankEvaluator ev = new BankEvaluator(scenario, Optional.empty());
        CandidateJudge warm = new CandidateJudge(ev, PARTS);
        CandidateJudge cold = new CandidateJudge(ev, PARTS, false);
        Random rnd = new Random(12);
        int[] counts = {2, 3, 8, 10, 6};
        for (int step = 0; step < 200; step++) {
            int i = rnd.nextInt(counts.length);
            counts[i] = Math.max(0, counts[i] + rnd.nextInt(5) - 2);
            Judgement a = warm.judge(counts);
            Judgement b = cold.judge(counts);
            if (a.figuresExact() && b.figuresExact()) {
                assertThat(a.droopV()).isCloseTo(b.droopV(), within(1e-12));
                assertThat(a.overshootV()).isCloseTo(b.overshootV(), within(1e-12));
            }
            assertThat(a.droopExcessV()).isCloseTo(b.droopExcessV(), within(1e-12));
            assertThat(a.overshootExcessV()).isCloseTo(b.overshootExcessV(), within(1e-12));
        }
        assertThat(cold.modelStarts().warmStarts()).isZero();
        assertThat(warm.modelStarts().models()).isEqualTo(200);
        // most steps keep the same part types, and those start warm
        assertThat(warm.modelStarts().warmStarts()).isGreaterThan(100);
    }

    /**
     * A walk that jumps back (30 … 37 parts of the smallest type, then 30 again) starts every model after the
     * first warm: the jump back starts from the nearest model kept for those parts (34), from which Newton's
     * method finds every pole, where the last one (37) is too far for it on this rail.
     */
    @Test
    void aJumpBackStartsFromTheNearestRecentModel() throws Exception {
        var scenario = Fixtures.scenario()
                .rail(new Rail("r", 0.9, 0.03, 5, 2.5, 0))
                .band(new breakwater.scenario.Band(1e4, 1.5e8))
                .regulator(new breakwater.scenario.Regulator(0.3e-3, 18e-9))
                .plane(new Plane(5e-9, 0.4e-3))
                .packagePath(PackagePath.of(0.3e-3, 10e-12))
                .die(new Die(600e-9, 4e-3))
                .build();
        List<Part> parts = List.of(
                Part.of("bulk-220u", 220e-6, 12e-3, 2.0e-9, 0.8e-9, 0.22),
                Part.of("bulk-100u", 100e-6, 25e-3, 1.5e-9, 0.7e-9, 0.16),
                Part.of("x5r-22u", 22e-6, 4e-3, 0.68e-9, 0.7e-9, 0.04),
                Part.of("x5r-10u", 10e-6, 6e-3, 0.5e-9, 0.6e-9, 0.02),
                Part.of("x5r-2u2", 2.2e-6, 12e-3, 0.36e-9, 0.45e-9, 0.008),
                Part.of("x5r-1u", 1e-6, 30e-3, 0.2e-9, 0.35e-9, 0.008),
                Part.of("x5r-100n", 100e-9, 55e-3, 0.18e-9, 0.35e-9, 0.003),
                Part.of("x7r-10n", 10e-9, 80e-3, 0.33e-9, 0.45e-9, 0.0015));
        BankEvaluator ev = new BankEvaluator(scenario, Optional.empty());
        CandidateJudge warm = new CandidateJudge(ev, parts);
        CandidateJudge cold = new CandidateJudge(ev, parts, false);
        int[] counts = {3, 2, 1, 8, 1, 12, 25, 30};
        for (int n : new int[] {30, 31, 32, 33, 34, 35, 36, 37, 30}) {
            counts[7] = n;
            Judgement a = warm.judge(counts);
            Judgement b = cold.judge(counts);
            assertThat(a.droopExcessV()).isEqualTo(b.droopExcessV());
            if (a.figuresExact() && b.figuresExact()) {
                assertThat(a.droopV()).isCloseTo(b.droopV(), within(1e-12));
            }
        }
        assertThat(warm.modelStarts()).isEqualTo(new CandidateJudge.ModelStarts(9, 8));
    }

    @Test
    void fastJudgeAgreesWithTheFullEvaluation() throws Exception {
        var scenario = Fixtures.scenario()
                .rail(new Rail("r", 0.9, 0.03, 5, 2.5, 1e-9))
                .plane(new Plane(5e-9, 0.4e-3))
                .packagePath(PackagePath.of(0.3e-3, 10e-12))
                .die(new Die(600e-9, 4e-3))
                .board(new Board(40, 3, Map.of("0402", 12, "0201", 5)))
                .requireTarget(true)
                .build();
        BankEvaluator ev = new BankEvaluator(scenario, Optional.empty());
        CandidateJudge judge = new CandidateJudge(ev, PARTS);
        Random rnd = new Random(11);
        for (int trial = 0; trial < 25; trial++) {
            int[] counts = new int[PARTS.size()];
            for (int i = 0; i < counts.length; i++) {
                counts[i] = rnd.nextInt(3) == 0 ? 0 : rnd.nextInt(15);
            }
            Judgement j = judge.judge(counts);
            Evaluation e = ev.evaluate(CapacitorBank.of(PARTS, counts));
            if (j.figuresExact()) {
                // the worst case is the same exact computation: equal to rounding
                assertThat(j.droopV()).isCloseTo(e.figures().droopV(), within(1e-12));
                assertThat(j.overshootV()).isCloseTo(e.figures().overshootV(), within(1e-12));
            } else {
                // settled by a bound: the bank passes, and the figures are upper bounds of the exact ones
                assertThat(e.figures().passes()).isTrue();
                assertThat(j.droopV()).isGreaterThanOrEqualTo(e.figures().droopV());
                assertThat(j.overshootV()).isGreaterThanOrEqualTo(e.figures().overshootV());
            }
            assertThat(j.droopExcessV()).isCloseTo(e.figures().droopExcessV(), within(1e-12));
            assertThat(j.overshootExcessV()).isCloseTo(e.figures().overshootExcessV(), within(1e-12));
            assertThat(j.costTotal()).isCloseTo(e.cost().total(), within(1e-12));
            assertThat(j.totalParts()).isEqualTo(e.bank().totalParts());
            int excess = e.board().stream().mapToInt(BoardCheck.Violation::excess).sum();
            assertThat(j.boardExcess()).isEqualTo(excess);
            double full = e.impedance().peakOverTarget();
            if (full > 1.0) {
                // near or over the target both refine with the same Brent search on the network (from different
                // grids); 1e-6 relative is the guard the solver adds to its target check
                assertThat(j.peakOverTarget()).isCloseTo(full, within(1e-6 * full));
                assertThat(j.targetExcess()).isPositive();
            } else {
                // far under it the solver's grid value may only fall short of the refined peak
                assertThat(j.peakOverTarget()).isLessThanOrEqualTo(full * (1 + 1e-6));
            }
        }
    }
}
