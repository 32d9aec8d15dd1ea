package breakwater.optimize;

import breakwater.design.BankEvaluator;
import breakwater.design.CandidateJudge;
import breakwater.design.CapacitorBank;
import org.junit.jupiter.api.Test;

import java.time.Duration;
import java.util.List;
import java.util.Optional;

import static org.assertj.core.api.Assertions.assertThat;

/** The cost–excursion frontier on the small catalog, move-limited. */
class ExcursionFrontierTest {
    static final SearchSettings EACH = new SearchSettings(Duration.ofMinutes(2), Duration.ofMinutes(2), 400, 2, 1);

    static void assertMonotoneAndHonest(ExcursionFrontier.Result f) {
        double previousLimit = 0;
        double previousCost = Double.POSITIVE_INFINITY;
        for (ExcursionFrontier.Point p : f.points()) {
            assertThat(p.limitV()).isGreaterThan(previousLimit);
            if (p.meetsLimit()) {
                // a tighter limit never costs less: costs never rise as the limit loosens
                assertThat(p.costTotal()).isLessThanOrEqualTo(previousCost);
                previousCost = p.costTotal();
                assertThat(p.evaluation().figures().droopV()).isLessThanOrEqualTo(p.limitV());
                assertThat(p.evaluation().figures().overshootV()).isLessThanOrEqualTo(p.limitV());
            }
            previousLimit = p.limitV();
        }
    }

    static int[] counts(CapacitorBank bank) {
        return BankSearchTest.PARTS.stream().mapToInt(part -> bank.count(part.name())).toArray();
    }

    /** No point keeps a bank dearer than a bank of the run (any point's, or the closest) that meets its limit. */
    static void assertCheapestOfAllFound(BankEvaluator spec, ExcursionFrontier.Result f) {
        List<CapacitorBank> found = new java.util.ArrayList<>();
        found.add(f.closest().bank());
        f.points().forEach(p -> found.add(p.bank()));
        for (ExcursionFrontier.Point p : f.points()) {
            BankEvaluator limit = ExcursionFrontier.judge(spec, p.limitV());
            for (CapacitorBank b : found) {
                var e = limit.evaluate(b);
                if (breakwater.design.Verdict.meetsSpec(e, spec.scenario().requireTarget())) {
                    assertThat(p.meetsLimit()).as("limit %s V has a bank that meets it", p.limitV()).isTrue();
                    assertThat(p.costTotal()).as("limit %s V against a bank found in the run", p.limitV())
                            .isLessThanOrEqualTo(e.cost().total() + 1e-12);
                }
            }
        }
    }

    @Test
    void frontierRunsFromTheTightestExcursionToTheSpecAndIsMonotone() throws Exception {
        BankEvaluator spec = new BankEvaluator(BankSearchTest.scenario(0.05), Optional.empty());
        ExcursionFrontier.Result f = ExcursionFrontier.run(spec, breakwater.design.Candidates.of(BankSearchTest.PARTS), BankSearchTest.MAX, EACH, 5,
                (search, judge, s, start) -> search.run(s, start), () -> false);
        assertThat(f.points()).hasSize(5);
        // the closest bank's own excursion, widened by the rounding allowance only
        assertThat(f.points().get(0).limitV()).isCloseTo(f.tightestV(), org.assertj.core.api.Assertions.within(
                2 * ExcursionFrontier.LIMIT_ROUNDING * f.tightestV()));
        assertThat(f.points().get(0).limitV()).isGreaterThanOrEqualTo(f.tightestV());
        assertThat(f.points().get(4).limitV()).isEqualTo(f.allowedV());
        // the spec allows V_op - V_low below and V_high - V_op above; since every worst overshoot is the worst
        // droop less ΔI·Z(0) (u and its mirror 1 - u), the last useful limit is
        // min(V_op - V_low, V_high - V_op + ΔI·Z(0))
        double op = spec.operatingPointV();
        double z0 = f.points().get(0).evaluation().network().dcResistanceOhms();
        double deltaI = spec.scenario().rail().currentStepA();
        assertThat(f.allowedV()).isEqualTo(Math.min(op - spec.limits().lowerV(),
                spec.limits().upperV() - op + deltaI * z0));
        // and that identity holds on every bank of the frontier (docs/worst-case.md#ideal-edges: droop − overshoot = ΔI·Z(0))
        for (ExcursionFrontier.Point p : f.points()) {
            assertThat(p.evaluation().figures().droopV() - p.evaluation().figures().overshootV())
                    .isCloseTo(deltaI * z0, org.assertj.core.api.Assertions.within(1e-9));
        }
        assertThat(f.tightestV()).isLessThan(f.allowedV());
        assertThat(f.points()).allSatisfy(p -> assertThat(p.meetsLimit()).isTrue());
        assertMonotoneAndHonest(f);
        assertCheapestOfAllFound(spec, f);
        // the tightest limit costs strictly more than the spec's on this rail, or the frontier shows nothing
        assertThat(f.points().get(0).costTotal()).isGreaterThan(f.points().get(4).costTotal());
    }

    @Test
    void aDearerResultForALooserLimitIsReplacedByTheTighterLimitsBank() throws Exception {
        // an adversarial search: from the third search on it returns the dearest bank of the catalog
        BankEvaluator spec = new BankEvaluator(BankSearchTest.scenario(0.05), Optional.empty());
        CandidateJudge judge = new CandidateJudge(spec, BankSearchTest.PARTS);
        int[] step = {0};
        ExcursionFrontier.Result f = ExcursionFrontier.run(spec, breakwater.design.Candidates.of(BankSearchTest.PARTS), BankSearchTest.MAX, EACH, 4,
                (search, j, s, start) -> {
                    if (step[0]++ < 2) {
                        return search.run(s, start);
                    }
                    int[] all = BankSearchTest.MAX.clone();
                    return new SearchResult(CapacitorBank.of(BankSearchTest.PARTS, all), judge.judge(all), 1, 0, 1, 1,
                            false, List.of());
                }, () -> false);
        assertMonotoneAndHonest(f);
        List<ExcursionFrontier.Point> p = f.points();
        for (int i = 1; i < p.size(); i++) {
            assertThat(p.get(i).bank()).isEqualTo(p.get(0).bank());
            assertThat(p.get(i).note()).contains("dearer").contains("found by the search for the");
        }
        assertCheapestOfAllFound(spec, f);
    }

    @Test
    void aCheaperBankFoundForALooserLimitServesTheTighterLimitItKeepsWithin() throws Exception {
        // first a plain frontier; then a run whose search for the second limit returns the dearest bank of
        // the catalog while the search for the third returns the plain run's bank of the second limit.
        // That bank keeps within the second limit, so the second point must show it, not the dear one.
        BankEvaluator spec = new BankEvaluator(BankSearchTest.scenario(0.05), Optional.empty());
        ExcursionFrontier.Result plain = ExcursionFrontier.run(spec, breakwater.design.Candidates.of(BankSearchTest.PARTS), BankSearchTest.MAX, EACH, 4,
                (search, j, s, start) -> search.run(s, start), () -> false);
        CapacitorBank second = plain.points().get(1).bank();
        CandidateJudge judge = new CandidateJudge(spec, BankSearchTest.PARTS);
        int[] all = BankSearchTest.MAX.clone();
        CapacitorBank dearest = CapacitorBank.of(BankSearchTest.PARTS, all);
        int[] step = {0};
        ExcursionFrontier.Result f = ExcursionFrontier.run(spec, breakwater.design.Candidates.of(BankSearchTest.PARTS), BankSearchTest.MAX, EACH, 4,
                (search, j, s, start) -> {
                    int k = step[0]++;
                    if (k == 2) {
                        return new SearchResult(dearest, judge.judge(all), 1, 0, 1, 1, false, List.of());
                    }
                    if (k == 3) {
                        return new SearchResult(second, judge.judge(counts(second)), 1, 0, 1, 1,
                                false, List.of());
                    }
                    return search.run(s, start);
                }, () -> false);
        assertThat(plain.points().get(1).costTotal()).isLessThan(spec.evaluate(dearest).cost().total());
        ExcursionFrontier.Point p1 = f.points().get(1);
        assertThat(p1.bank()).isNotEqualTo(dearest);
        assertThat(p1.costTotal()).isLessThanOrEqualTo(plain.points().get(1).costTotal());
        assertThat(p1.note()).contains("found by the search for the");
        assertMonotoneAndHonest(f);
        assertCheapestOfAllFound(spec, f);
    }

    @Test
    void stoppedRunFillsTheRestWithoutSearching() throws Exception {
        BankEvaluator spec = new BankEvaluator(BankSearchTest.scenario(0.05), Optional.empty());
        int[] step = {0};
        ExcursionFrontier.Result f = ExcursionFrontier.run(spec, breakwater.design.Candidates.of(BankSearchTest.PARTS), BankSearchTest.MAX, EACH, 3,
                (search, j, s, start) -> {
                    step[0]++;
                    return search.run(s, start);
                }, () -> step[0] >= 2);
        assertThat(step[0]).isEqualTo(2);
        assertThat(f.points().get(0).searched()).isTrue();
        assertThat(f.points().get(2).searched()).isFalse();
        assertMonotoneAndHonest(f);
    }
}
