package breakwater.design;

import breakwater.network.AntiResonance;
import breakwater.network.ImpedanceMetrics;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.OptionalDouble;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The one verdict rule. The band and the spec are the rail's tolerance (V_nom·(1 ± tolerance), common
 * practice); the caution thresholds, a margin under 5 % of the allowance and a Monte Carlo yield under
 * 95 %, are this project's own policy (no published source), so they are checked at their edges.
 */
class VerdictTest {
    /** A 1 V ± 5 % rail: limits 0.95 V and 1.05 V; operating point 0.99 V, so 40 mV below, 60 mV above. */
    static final double LOWER = 0.95;
    static final double UPPER = 1.05;
    static final double OP = 0.99;
    static final double ALLOWANCE = 0.04;
    static final ImpedanceMetrics FLAT = new ImpedanceMetrics(0.01, 0.008, 1e6, 0.004, 1e4, 6.0, List.of(
            new AntiResonance(2e5, 0.006, 1.2), new AntiResonance(4e7, 0.008, 2.5), new AntiResonance(9e7, 0.007, 1.1)));
    static final OptionalDouble NO_YIELD = OptionalDouble.empty();

    static WorstCaseVolts wc(double droopV, double overshootV) {
        return new WorstCaseVolts(droopV, overshootV, OP, OP - droopV, OP + overshootV, LOWER, UPPER, 1.0);
    }

    static Verdict verdict(WorstCaseVolts wc, List<BoardCheck.Violation> board, ImpedanceMetrics z,
                           boolean requireTarget) {
        return Verdict.of(wc, board, z, requireTarget, List.of(), NO_YIELD, false);
    }

    @Test
    void aWorstCaseInsideTheBandMeetsTheSpecWithItsMargin() {
        Verdict v = verdict(wc(0.030, 0.020), List.of(), FLAT, false);
        assertThat(v.bankMeetsSpec()).isTrue();
        assertThat(v.meetsSpec()).isTrue();
        assertThat(v.reasons()).isEmpty();
        // margin = min(V_min − lower, upper − V_max) = min(0.96 − 0.95, 1.05 − 1.01) = 10 mV
        assertThat(v.marginV()).isCloseTo(0.010, within(1e-12));
        assertThat(v.caution()).isEmpty(); // 10 mV is 25 % of the 40 mV allowance
    }

    @Test
    void droopBelowTheLowerLimitNamesTheExcessAndTheLargestAntiResonance() {
        Verdict v = verdict(wc(0.043, 0.020), List.of(), FLAT, false);
        assertThat(v.meetsSpec()).isFalse();
        assertThat(v.reasons()).hasSize(1);
        Verdict.DroopBelowLimit d = (Verdict.DroopBelowLimit) v.reasons().get(0);
        // V_min = 0.99 − 0.043 = 0.947 V, 3 mV below 0.95 V
        assertThat(d.excessV()).isCloseTo(0.003, within(1e-12));
        assertThat(d.largestAntiResonance()).isPresent();
        assertThat(d.largestAntiResonance().get().frequencyHz()).isEqualTo(4e7); // 8 mΩ, the highest |Z|
        assertThat(d.targetOhms()).isEqualTo(0.01);
        assertThat(v.caution()).isEmpty(); // a failure has its reasons, not a caution
    }

    @Test
    void overshootAboveTheUpperLimitIsItsOwnReason() {
        Verdict v = verdict(wc(0.030, 0.065), List.of(), FLAT, false);
        assertThat(v.meetsSpec()).isFalse();
        assertThat(v.reasons()).singleElement().isInstanceOfSatisfying(Verdict.OvershootAboveLimit.class,
                o -> assertThat(o.excessV()).isCloseTo(0.005, within(1e-12))); // 1.055 V against 1.05 V
    }

    @Test
    void everyBrokenBoardLimitIsAReasonInOrder() {
        var parts = new BoardCheck.Violation("board.max_parts", 40, 44);
        var perCase = new BoardCheck.Violation("board.max_per_case.0402", 10, 12);
        Verdict v = verdict(wc(0.030, 0.020), List.of(parts, perCase), FLAT, false);
        assertThat(v.bankMeetsSpec()).isFalse();
        assertThat(v.reasons()).containsExactly(new Verdict.BoardLimitBroken(parts), new Verdict.BoardLimitBroken(perCase));
    }

    @Test
    void impedanceOverTheTargetCountsOnlyWhenRequired() {
        ImpedanceMetrics over = new ImpedanceMetrics(0.01, 0.012, 1e6, 0.004, 1e4, 9.5, List.of());
        assertThat(verdict(wc(0.030, 0.020), List.of(), over, false).meetsSpec()).isTrue();
        Verdict required = verdict(wc(0.030, 0.020), List.of(), over, true);
        assertThat(required.meetsSpec()).isFalse();
        assertThat(required.reasons()).singleElement().isInstanceOfSatisfying(Verdict.OverTarget.class,
                t -> assertThat(t.peakOverTarget()).isCloseTo(1.2, within(1e-12)));
        // touching the target is under it (|Z| ≤ Z_t)
        ImpedanceMetrics touching = new ImpedanceMetrics(0.01, 0.01, 1e6, 0.004, 1e4, 7.9, List.of());
        assertThat(verdict(wc(0.030, 0.020), List.of(), touching, true).meetsSpec()).isTrue();
    }

    @Test
    void aModeConditionFailsTheRunButNotTheBank() {
        Verdict v = Verdict.of(wc(0.030, 0.020), List.of(), FLAT, false,
                List.of(new Verdict.MarginNotKept(0.010, 0.012, "--margin")), NO_YIELD, true);
        assertThat(v.bankMeetsSpec()).isTrue();
        assertThat(v.meetsSpec()).isFalse();
        assertThat(v.onlyTheRunFails()).isTrue();
        assertThat(v.reasons()).isEmpty();
        assertThat(v.modeFailures()).containsExactly(new Verdict.MarginNotKept(0.010, 0.012, "--margin"));
        // with a failing bank too, both are kept
        Verdict both = Verdict.of(wc(0.043, 0.020), List.of(), FLAT, false, List.of(new Verdict.TrimLostMargin()),
                NO_YIELD, false);
        assertThat(both.onlyTheRunFails()).isFalse();
        assertThat(both.reasons()).hasSize(1);
        assertThat(both.modeFailures()).containsExactly(new Verdict.TrimLostMargin());
    }

    @Test
    void aMarginUnderFivePercentOfTheAllowanceIsCautioned() {
        // 5 % of the 40 mV allowance (the smaller side: 40 mV below, 60 mV above) is 2 mV
        Verdict thin = verdict(wc(0.0381, 0.020), List.of(), FLAT, false); // margin 1.9 mV
        assertThat(thin.meetsSpec()).isTrue();
        assertThat(thin.caution()).get().isInstanceOfSatisfying(Verdict.ThinMargin.class, t -> {
            assertThat(t.marginV()).isCloseTo(0.0019, within(1e-12));
            assertThat(t.allowanceV()).isCloseTo(ALLOWANCE, within(1e-12));
            assertThat(t.marginAsked()).isFalse();
        });
        assertThat(verdict(wc(0.0379, 0.020), List.of(), FLAT, false).caution()).isEmpty(); // 2.1 mV
        // a run that asked for a margin is told so
        assertThat(Verdict.caution(wc(0.0381, 0.020), NO_YIELD, true)).get()
                .extracting(Verdict.Caution::marginAsked).isEqualTo(true);
    }

    @Test
    void afterMonteCarloTheYieldDecidesWhateverTheNominalMargin() {
        // a comfortable 10 mV with a poor yield is cautioned ...
        assertThat(Verdict.caution(wc(0.030, 0.020), OptionalDouble.of(0.727), false)).get()
                .isInstanceOfSatisfying(Verdict.LowYield.class, y -> assertThat(y.yieldFraction()).isEqualTo(0.727));
        // ... a thin 1.9 mV with a good yield is not; the threshold is "under 95 %"
        assertThat(Verdict.caution(wc(0.0381, 0.020), OptionalDouble.of(0.99), false)).isEmpty();
        assertThat(Verdict.caution(wc(0.030, 0.020), OptionalDouble.of(0.95), false)).isEmpty();
        assertThat(Verdict.caution(wc(0.030, 0.020), OptionalDouble.of(0.949), false)).isPresent();
        // a worst case outside the band has its reasons instead of a caution
        assertThat(Verdict.caution(wc(0.043, 0.020), OptionalDouble.of(0.2), false)).isEmpty();
    }

    @Test
    void theSolversJudgementGoesThroughTheSameRule() {
        // Judgement(droop, overshoot, droopExcess, overshootExcess, boardExcess, targetExcess, cost, flatness, peak/Zt, parts)
        assertThat(new Judgement(0.03, 0.02, 0, 0, 0, 0, 1, 6, 0.8, 10).feasible())
                .isEqualTo(Verdict.meetsSpec(0, 0, 0, false)).isTrue();
        assertThat(new Judgement(0.03, 0.02, 1e-6, 0, 0, 0, 1, 6, 0.8, 10).feasible()).isFalse();
        assertThat(new Judgement(0.03, 0.02, 0, 1e-6, 0, 0, 1, 6, 0.8, 10).feasible()).isFalse();
        assertThat(new Judgement(0.03, 0.02, 0, 0, 1, 0, 1, 6, 0.8, 10).feasible()).isFalse();
        assertThat(new Judgement(0.03, 0.02, 0, 0, 0, 0.01, 1, 6, 1.01, 10).feasible()).isFalse();
        // a worst case that cannot be computed is never a pass
        assertThat(new Judgement(0.03, 0.02, Double.NaN, 0, 0, 0, 1, 6, 0.8, 10).feasible()).isFalse();
        assertThat(Verdict.insideBand(Double.NaN, 0)).isFalse();
    }
}
