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
import breakwater.scenario.Scenario;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.SplittableRandom;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Screening against the exhaustive optimum (every bank of small invented catalogs enumerated, no search
 * heuristic): the parts it leaves out are never needed by a cheapest passing bank.
 */
class ScreeningTest {
    static final int MAX = 3;
    /** Every case may hold {@link #MAX} parts, so the exhaustive enumeration covers every count allowed. */
    static final Board BOARD = new Board(-1, -1, Map.of("0402", MAX, "0603", MAX, "1206", MAX, "0805", 0));

    static Part part(String name, String caseCode, double c, double esr, double esl, double cost, int maxCount) {
        return new Part(name, "", caseCode, "X5R", c, esr, esl, 0.4e-9, cost, Double.NaN, Double.NaN, 1.0, maxCount);
    }

    static Scenario scenario() {
        return Fixtures.scenario().rail(new Rail("small", 1.0, 0.05, 4.0, 2.0, 0.0)).die(new Die(1e-6, 10e-3))
                .board(BOARD).build();
    }

    /** The best bank over 0 … MAX of each candidate (the board's limits cap the same way), by score. */
    static int[] optimum(BankEvaluator ev, Candidates c) {
        JudgePool pool = new JudgePool(ev, c);
        int n = c.size();
        int[] counts = new int[n];
        int[] best = null;
        BendableScore bestScore = null;
        int combos = (int) Math.pow(MAX + 1, n);
        for (int code = 0; code < combos; code++) {
            int rest = code;
            for (int i = 0; i < n; i++) {
                counts[i] = rest % (MAX + 1);
                rest /= MAX + 1;
            }
            BendableScore sc = ScoreLevels.of(pool.judge(counts));
            if (bestScore == null || sc.compareTo(bestScore) > 0) {
                bestScore = sc;
                best = counts.clone();
            }
        }
        return best;
    }

    static double cost(BankEvaluator ev, Candidates c, int[] counts) {
        Judgement j = new JudgePool(ev, c).judge(counts);
        assertThat(j.feasible()).as("the small rail has a passing bank").isTrue();
        return j.costTotal();
    }

    @Test
    void twinsThatCostMoreAndPartsWithoutRoomAreLeftOutAndTheOptimumStays() throws Exception {
        List<Part> parts = List.of(
                part("bulk", "1206", 100e-6, 10e-3, 1.5e-9, 0.12, -1),
                part("mid", "0603", 10e-6, 5e-3, 0.6e-9, 0.03, -1),
                part("mid-dear", "0603", 10e-6, 5e-3, 0.6e-9, 0.05, -1), // twin of mid, dearer
                part("small", "0402", 1e-6, 15e-3, 0.4e-9, 0.009, -1),
                part("small-cheap", "0402", 1e-6, 15e-3, 0.4e-9, 0.008, -1), // cheaper twin, later in the list
                part("no-room", "0805", 4.7e-6, 6e-3, 0.5e-9, 0.001, -1));
        BankEvaluator ev = new BankEvaluator(scenario(), Optional.empty());
        Screening sc = Screening.of(ev, parts);
        assertThat(sc.kept().parts()).extracting(Part::name).containsExactly("bulk", "mid", "small-cheap");
        assertThat(sc.dropped()).extracting(Screening.Dropped::part, Screening.Dropped::reason, Screening.Dropped::keptAs)
                .containsExactlyInAnyOrder(
                        org.assertj.core.groups.Tuple.tuple("mid-dear", Screening.Reason.SAME_AS_CHEAPER, "mid"),
                        org.assertj.core.groups.Tuple.tuple("small", Screening.Reason.SAME_AS_CHEAPER, "small-cheap"),
                        org.assertj.core.groups.Tuple.tuple("no-room", Screening.Reason.NO_ROOM, ""));
        assertThat(sc.summary()).isEqualTo("6 candidates, 3 searched: 2 the same as a part that costs no more, "
                + "1 with no room for their case");

        Candidates all = Candidates.of(parts);
        int[] full = optimum(ev, all);
        for (Screening.Dropped d : sc.dropped()) {
            assertThat(full[parts.stream().map(Part::name).toList().indexOf(d.part())])
                    .as("the exhaustive optimum uses " + d.part()).isZero();
        }
        assertThat(cost(ev, sc.kept(), optimum(ev, sc.kept()))).isEqualTo(cost(ev, all, full));
    }

    /**
     * A cheaper twin whose own max_count is below the case's room cannot stand in for every count of the
     * dearer one (a bank may need both): both are kept.
     */
    @Test
    void aTwinLimitedByItsOwnMaxCountIsNotAStandIn() throws Exception {
        List<Part> parts = List.of(part("mid", "0603", 10e-6, 5e-3, 0.6e-9, 0.03, 1),
                part("mid-dear", "0603", 10e-6, 5e-3, 0.6e-9, 0.05, -1));
        BankEvaluator ev = new BankEvaluator(scenario(), Optional.empty());
        assertThat(Screening.of(ev, parts).dropped()).isEmpty();
    }

    /**
     * Random small catalogs with planted twins (some cheaper, some dearer, some limited by their own
     * max_count): screening never leaves out a part the exhaustive optimum needs — the optimum over the
     * screened candidates costs exactly what the optimum over the whole catalog costs.
     */
    @Test
    void onRandomCatalogsTheScreenedOptimumIsTheFullOptimum() throws Exception {
        String[] cases = {"0402", "0603", "1206"};
        double[] caps = {100e-6, 10e-6, 1e-6, 100e-9};
        int passing = 0;
        for (long seed = 1; seed <= 8; seed++) {
            SplittableRandom r = new SplittableRandom(seed);
            List<Part> parts = new ArrayList<>();
            for (int i = 0; i < 3; i++) {
                int k = r.nextInt(caps.length);
                String code = cases[Math.min(k, 2)];
                double esr = 5e-3 * (1 + 4 * r.nextDouble());
                double esl = 0.3e-9 * (1 + 3 * r.nextDouble());
                double cost = 0.005 + 0.1 * r.nextDouble();
                parts.add(part("p" + i, code, caps[k], esr, esl, cost, -1));
                if (r.nextBoolean()) { // its twin: same branch, another price, maybe its own max count
                    parts.add(part("p" + i + "-twin", code, caps[k], esr, esl, cost * (0.5 + r.nextDouble()),
                            r.nextInt(4) == 0 ? 1 : -1));
                }
            }
            Scenario s = Fixtures.scenario().rail(new Rail("small", 1.0, 0.05, 2.0, 1.0, 0.0)).die(new Die(1e-6, 10e-3))
                    .board(BOARD).build();
            BankEvaluator ev = new BankEvaluator(s, Optional.empty());
            Screening sc = Screening.of(ev, parts);
            Candidates all = Candidates.of(parts);
            JudgePool fullPool = new JudgePool(ev, all);
            Judgement full = fullPool.judge(optimum(ev, all));
            Judgement screened = new JudgePool(ev, sc.kept()).judge(optimum(ev, sc.kept()));
            // (when no bank passes, the score may trade a board excess for volts, and a bank beyond the board's
            // limits may use both twins: screening promises the cheapest passing bank, not the least-failing one)
            assertThat(screened.feasible()).as("seed " + seed).isEqualTo(full.feasible());
            if (full.feasible()) {
                passing++;
                assertThat(screened.costTotal()).as("seed " + seed + ", " + sc.summary()).isEqualTo(full.costTotal());
            }
        }
        assertThat(passing).as("rails with a passing bank among the random catalogs").isGreaterThanOrEqualTo(4);
    }
}
