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
