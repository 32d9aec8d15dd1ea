package breakwater.optimize;

import breakwater.design.BankEvaluator;
import breakwater.design.CapacitorBank;
import breakwater.design.Evaluation;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;

import java.time.Duration;
import java.util.Optional;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Cost-down on random existing banks of the small catalog (move-limited searches): whatever the search
 * does, the bank returned never loses margin and never costs more than the one it started from.
 */
class CostDownProperties {

    static SearchSettings moveLimited(long seed) {
        // the time limit is only a safety net; the move limit ends the run
        return new SearchSettings(Duration.ofMinutes(2), Duration.ofMinutes(2), 300, seed, 1);
    }

    @Property(tries = 10)
    void keepMarginNeverLosesMarginNorCostsMore(@ForAll @IntRange(min = 0, max = 5) int a,
                                                @ForAll @IntRange(min = 0, max = 5) int b,
                                                @ForAll @IntRange(min = 0, max = 5) int c,
                                                @ForAll @IntRange(min = 0, max = 5) int d) throws Exception {
        BankEvaluator spec = new BankEvaluator(BankSearchTest.scenario(0.05), Optional.empty());
        CapacitorBank existing = CapacitorBank.of(BankSearchTest.PARTS, new int[] {a, b, c, d});
        Evaluation old = spec.evaluate(existing);
        BankEvaluator judge = CostDown.judge(spec, old, CostDown.Keep.MARGIN);
        int[] max = CostDown.maxCounts(BankSearchTest.PARTS, spec.scenario(), existing);
        SearchResult r = new BankSearch(judge, BankSearchTest.PARTS, max).run(moveLimited(a + 7L * b), existing);
        CostDown.Decision dec = CostDown.decide(judge, existing, r.bank());
        Evaluation now = spec.evaluate(dec.chosen());

        assertThat(now.figures().droopV()).isLessThanOrEqualTo(old.figures().droopV());
        assertThat(now.figures().overshootV()).isLessThanOrEqualTo(old.figures().overshootV());
        assertThat(now.cost().total()).isLessThanOrEqualTo(old.cost().total());
        if (dec.unchanged()) {
            assertThat(dec.chosen()).isEqualTo(existing);
        } else {
            // a change is only made when it is strictly cheaper and inside the spec as well
            assertThat(now.cost().total()).isLessThan(old.cost().total());
            assertThat(now.figures().passes()).isTrue();
        }
    }

    @Property(tries = 6)
    void keepSpecReturnsABankInsideTheSpecOrTheExistingOne(@ForAll @IntRange(min = 0, max = 5) int a,
                                                           @ForAll @IntRange(min = 0, max = 5) int b,
                                                           @ForAll @IntRange(min = 0, max = 5) int c,
                                                           @ForAll @IntRange(min = 0, max = 5) int d) throws Exception {
        BankEvaluator spec = new BankEvaluator(BankSearchTest.scenario(0.05), Optional.empty());
        CapacitorBank existing = CapacitorBank.of(BankSearchTest.PARTS, new int[] {a, b, c, d});
        Evaluation old = spec.evaluate(existing);
        BankEvaluator judge = CostDown.judge(spec, old, CostDown.Keep.SPEC);
        int[] max = CostDown.maxCounts(BankSearchTest.PARTS, spec.scenario(), existing);
        SearchResult r = new BankSearch(judge, BankSearchTest.PARTS, max).run(moveLimited(3), existing);
        CostDown.Decision dec = CostDown.decide(judge, existing, r.bank());
        Evaluation now = spec.evaluate(dec.chosen());
        assertThat(now.cost().total()).isLessThanOrEqualTo(old.cost().total());
        assertThat(dec.unchanged() || now.figures().passes()).isTrue();
    }

    @Property(tries = 5)
    void changesListEveryPartWhoseCountDiffers(@ForAll @IntRange(min = 0, max = 3) int a,
                                               @ForAll @IntRange(min = 0, max = 3) int b) {
        CapacitorBank from = CapacitorBank.of(BankSearchTest.PARTS, new int[] {a, 2, 0, b});
        CapacitorBank to = CapacitorBank.of(BankSearchTest.PARTS, new int[] {b, 2, 1, a});
        var changes = CostDown.changes(from, to);
        long expected = (a != b ? 2 : 0) + 1; // parts 0 and 3 swap counts; part 2 is added
        assertThat(changes).hasSize((int) expected);
        assertThat(changes).allSatisfy(ch -> assertThat(ch.from()).isNotEqualTo(ch.to()));
    }
}
