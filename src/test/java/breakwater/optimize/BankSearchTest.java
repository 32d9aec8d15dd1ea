package breakwater.optimize;

import ai.timefold.solver.core.api.score.BendableScore;
import ai.timefold.solver.core.api.solver.SolverFactory;
import ai.timefold.solver.core.config.score.director.ScoreDirectorFactoryConfig;
import ai.timefold.solver.core.config.solver.EnvironmentMode;
import ai.timefold.solver.core.config.solver.SolverConfig;
import ai.timefold.solver.core.config.solver.termination.TerminationConfig;
import breakwater.Fixtures;
import breakwater.catalog.Part;
import breakwater.design.BankEvaluator;
import breakwater.design.CapacitorBank;
import breakwater.design.Judgement;
import breakwater.scenario.Die;
import breakwater.scenario.Rail;
import breakwater.scenario.Scenario;
import org.junit.jupiter.api.Test;

import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The search against an independent reference: exhaustive enumeration of every bank on a small catalog.
 * Move-limited runs only (no wall-clock dependence); a generous time limit is only a safety net.
 */
class BankSearchTest {

    /** Four invented parts spanning the band; counts 0..5 each (6^4 = 1296 banks). */
    static final List<Part> PARTS = List.of(
            Part.of("bulk-100u", 100e-6, 10e-3, 1.5e-9, 0.5e-9, 0.12),
            Part.of("mid-10u", 10e-6, 5e-3, 0.6e-9, 0.4e-9, 0.03),
            Part.of("small-1u", 1e-6, 15e-3, 0.4e-9, 0.35e-9, 0.008),
            Part.of("hf-100n", 100e-9, 30e-3, 0.3e-9, 0.3e-9, 0.004));
    static final int[] MAX = {5, 5, 5, 5};

    static Scenario scenario(double toleranceFraction) {
        return Fixtures.scenario()
                .rail(new Rail("small", 1.0, toleranceFraction, 4.0, 2.0, 0.0))
                .die(new Die(1e-6, 10e-3))
                .build();
    }

    /** Every bank on the small catalog, the best by the solver's own score order. */
    static int[] exhaustiveBest(JudgePool pool) {
        int[] best = null;
        BendableScore bestScore = null;
        int[] c = new int[PARTS.size()];
        int combos = 1;
        for (int m : MAX) {
            combos *= m + 1;
        }
        for (int code = 0; code < combos; code++) {
            int rest = code;
            for (int i = 0; i < c.length; i++) {
                c[i] = rest % (MAX[i] + 1);
                rest /= MAX[i] + 1;
            }
            BendableScore s = ScoreLevels.of(pool.judge(c));
            if (bestScore == null || s.compareTo(bestScore) > 0) {
                bestScore = s;
                best = c.clone();
            }
        }
        return best;
    }

    @Test
    void solverFindsTheExhaustiveOptimumCostExactly() throws Exception {
        // Reference: complete enumeration of the 1296 banks (independent of any search heuristic).
        BankEvaluator ev = new BankEvaluator(scenario(0.05), Optional.empty());
        JudgePool pool = new JudgePool(ev, PARTS);
        int[] best = exhaustiveBest(pool);
        Judgement ref = pool.judge(best);
        assertThat(ref.feasible()).as("the small scenario has a feasible bank").isTrue();
        assertThat(ref.totalParts()).as("and it needs more than one part").isGreaterThan(1);

        BankSearch search = new BankSearch(ev, PARTS, MAX);
        SearchSettings settings = new SearchSettings(Duration.ofMinutes(2), Duration.ofMinutes(2), 20_000, 1, 1);
        SearchResult r = search.run(settings, CapacitorBank.EMPTY);
        assertThat(r.judgement().feasible()).isTrue();
        assertThat(r.judgement().costTotal()).isEqualTo(ref.costTotal());
    }

    /**
     * The pool sums what the cheap bounds settled over its judges: over the 1296 banks of the small
     * catalog every memo miss is one judgement, and in a 15 % band some banks are clear passes by the
     * bound from the model alone, some (nearly empty ones) clear fails by |Z|.
     */
    @Test
    void poolCountsWhatTheBoundsSettled() throws Exception {
        BankEvaluator ev = new BankEvaluator(scenario(0.15), Optional.empty());
        JudgePool pool = new JudgePool(ev, PARTS);
        exhaustiveBest(pool);
        var settled = pool.boundsSettled();
        assertThat(settled.judgements()).isEqualTo(pool.computed()).isEqualTo(1296);
        assertThat(settled.passedByIdealEdges()).as("ideal edges: no slew-limited computation to skip").isZero();
        assertThat(settled.failedByImpedance()).isPositive();
        assertThat(settled.passedByModelSum()).isPositive();
    }

    @Test
    void sameSeedAndMoveLimitGiveTheSameBank() throws Exception {
        BankEvaluator ev = new BankEvaluator(scenario(0.05), Optional.empty());
        SearchSettings settings = new SearchSettings(Duration.ofMinutes(2), Duration.ofMinutes(2), 1_500, 42, 2);
        SearchResult a = new BankSearch(ev, PARTS, MAX).run(settings, CapacitorBank.EMPTY);
        SearchResult b = new BankSearch(ev, PARTS, MAX).run(settings, CapacitorBank.EMPTY);
        assertThat(b.bank()).isEqualTo(a.bank());
    }

    @Test
    void infeasibleSpecStillReturnsTheClosestBank() throws Exception {
        // 2 % tolerance on this rail is out of reach with five of each part (exhaustive search says so).
        BankEvaluator ev = new BankEvaluator(scenario(0.02), Optional.empty());
        JudgePool pool = new JudgePool(ev, PARTS);
        int[] best = exhaustiveBest(pool);
        assertThat(pool.judge(best).feasible()).isFalse();
        SearchResult r = new BankSearch(ev, PARTS, MAX)
                .run(new SearchSettings(Duration.ofMinutes(2), Duration.ofMinutes(2), 20_000, 1, 1), CapacitorBank.EMPTY);
        assertThat(r.judgement().feasible()).isFalse();
        assertThat(r.bank().totalParts()).isPositive();
        // closest = the smallest excursion beyond the band (hard level), as the exhaustive reference says
        assertThat(ScoreLevels.of(r.judgement()).hardScore(0)).isEqualTo(ScoreLevels.of(pool.judge(best)).hardScore(0));
    }

    @Test
    void incrementalScoreMatchesFullRecomputeInAssertMode() throws Exception {
        // Two engines that must agree: the incremental calculator (memoised, counts as state) against the
        // easy calculator's full recompute, checked by the solver after every move (FULL_ASSERT).
        BankEvaluator ev = new BankEvaluator(scenario(0.05), Optional.empty());
        BankSearch search = new BankSearch(ev, PARTS, MAX);
        SolverConfig cfg = search.config(new SearchSettings(Duration.ofMinutes(2), Duration.ofMinutes(2), 400, 3, 1), 3)
                .withEnvironmentMode(EnvironmentMode.FULL_ASSERT)
                .withScoreDirectorFactory(new ScoreDirectorFactoryConfig()
                        .withIncrementalScoreCalculatorClass(BankScoreCalculator.class)
                        .withAssertionScoreDirectorFactory(new ScoreDirectorFactoryConfig()
                                .withEasyScoreCalculatorClass(BankEasyScoreCalculator.class)))
                .withTerminationConfig(new TerminationConfig().withMoveCountLimit(400L)
                        .withSpentLimit(Duration.ofMinutes(2)));
        List<PartCount> counts = new ArrayList<>();
        for (int i = 0; i < PARTS.size(); i++) {
            counts.add(new PartCount(i, PARTS.get(i), "", MAX[i], 0));
        }
        BankPlan solved = SolverFactory.<BankPlan>create(cfg).buildSolver()
                .solve(new BankPlan(new JudgePool(ev, PARTS), counts));
        assertThat(solved.getScore()).isNotNull();
    }

    /** The restart's perturbation: exactly one type in use goes to zero and one other is halved. */
    @Test
    void ruinRemovesOneTypeAndHalvesAnother() {
        java.util.Random rnd = new java.util.Random(5);
        int[] bank = {0, 7, 3, 0, 10, 1};
        for (int t = 0; t < 200; t++) {
            int[] r = BankSearch.ruin(bank, rnd);
            int zeroed = 0;
            int halved = 0;
            for (int i = 0; i < bank.length; i++) {
                if (bank[i] == 0) {
                    assertThat(r[i]).isZero();
                } else if (r[i] == 0) {
                    zeroed++; // a count of 1 halved also reaches 0
                } else if (r[i] != bank[i]) {
                    assertThat(r[i]).isEqualTo(bank[i] / 2);
                    halved++;
                }
            }
            assertThat(zeroed + halved).isBetween(1, 2);
            assertThat(zeroed).isGreaterThanOrEqualTo(1);
        }
        assertThat(BankSearch.ruin(new int[] {0, 0}, rnd)).containsExactly(0, 0);
        assertThat(BankSearch.ruin(new int[] {0, 4}, rnd)).containsExactly(0, 0);
    }
}
