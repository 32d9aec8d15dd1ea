package breakwater.optimize;

import ai.timefold.solver.core.api.score.BendableScore;
import breakwater.Fixtures;
import breakwater.catalog.Part;
import breakwater.design.BankEvaluator;
import breakwater.design.Candidates;
import breakwater.design.Judgement;
import breakwater.scenario.Board;
import breakwater.scenario.Die;
import breakwater.scenario.Rail;
import breakwater.scenario.Region;
import breakwater.scenario.Scenario;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Map;
import java.util.Optional;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The exhaustive optimum over parts, counts and regions on a small invented catalog (every bank
 * enumerated, no search heuristic): what placement regions may and may not do to it.
 */
class RegionOptimumTest {
    static final List<Part> PARTS = List.of(BankSearchTest.PARTS.get(0), BankSearchTest.PARTS.get(1),
            BankSearchTest.PARTS.get(3));
    static final int MAX = 3;

    static Region region(String name, double r, double l) {
        return new Region(name, r, l, new Board(-1, -1, Map.of()));
    }

    static Scenario scenario(List<Region> regions) {
        return Fixtures.scenario().rail(new Rail("small", 1.0, 0.05, 4.0, 2.0, 0.0)).die(new Die(1e-6, 10e-3))
                .regions(regions).build();
    }

    /** The best judgement of every bank with 0 … {@link #MAX} of each candidate, by the solver's score order. */
    static Judgement optimum(Scenario s) throws Exception {
        BankEvaluator ev = new BankEvaluator(s, Optional.empty());
        Candidates c = Candidates.forScenario(PARTS, s);
        JudgePool pool = new JudgePool(ev, c);
        int n = c.size();
        int[] counts = new int[n];
        int combos = (int) Math.pow(MAX + 1, n);
        Judgement best = null;
        BendableScore bestScore = null;
        for (int code = 0; code < combos; code++) {
            int rest = code;
            for (int i = 0; i < n; i++) {
                counts[i] = rest % (MAX + 1);
                rest /= MAX + 1;
            }
            Judgement j = pool.judge(counts);
            BendableScore sc = ScoreLevels.of(j);
            if (bestScore == null || sc.compareTo(bestScore) > 0) {
                bestScore = sc;
                best = j;
            }
        }
        return best;
    }

    /**
     * A second region adds choices and takes none away (with its parts at 0 the network is the one-region
     * network), so the optimum can only get cheaper or stay.
     */
    @Test
    void addingARegionNeverRaisesTheOptimumCost() throws Exception {
        Judgement one = optimum(scenario(List.of(region("near", 0.05e-3, 20e-12))));
        Judgement two = optimum(scenario(List.of(region("near", 0.05e-3, 20e-12), region("far", 0.3e-3, 300e-12))));
        assertThat(one.feasible()).as("the small rail has a passing placed bank").isTrue();
        assertThat(two.feasible()).isTrue();
        assertThat(two.costTotal()).isLessThanOrEqualTo(one.costTotal());
    }

    /**
     * Spreading inductance in series with every part of a region only adds to each branch's impedance
     * above its series resonance, where the high-frequency peaks are set (common practice): on this rail
     * the same parts behind a longer path never come out cheaper, and with a short path the optimum is
     * the single-node one.
     */
    @Test
    void aLongerSpreadingPathNeverLowersTheOptimumCost() throws Exception {
        Judgement flat = optimum(scenario(List.of()));
        Judgement shortPath = optimum(scenario(List.of(region("only", 0, 0))));
        Judgement near = optimum(scenario(List.of(region("only", 0.05e-3, 20e-12))));
        Judgement far = optimum(scenario(List.of(region("only", 0.05e-3, 200e-12))));
        assertThat(shortPath.costTotal()).isEqualTo(flat.costTotal());
        assertThat(shortPath.droopV()).isEqualTo(flat.droopV());
        assertThat(near.costTotal()).isGreaterThanOrEqualTo(flat.costTotal());
        assertThat(far.costTotal()).isGreaterThanOrEqualTo(near.costTotal());
    }
}
