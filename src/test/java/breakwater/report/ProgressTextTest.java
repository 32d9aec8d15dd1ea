package breakwater.report;

import breakwater.Fixtures;
import breakwater.design.BankEvaluator;
import breakwater.design.CapacitorBank;
import breakwater.design.Judgement;
import breakwater.design.Limits;
import breakwater.optimize.SearchProgress;
import org.junit.jupiter.api.Test;

import java.util.Optional;

import static org.assertj.core.api.Assertions.assertThat;

/** The live progress lines: what a person reads while a search runs. */
class ProgressTextTest {

    @Test
    void frontierLinesShowTheExcursionAgainstTheLimitAndNoInternalFigures() throws Exception {
        BankEvaluator spec = new BankEvaluator(Fixtures.scenario().build(), Optional.empty());
        double op = spec.operatingPointV();
        // the search for the smallest excursion runs against an unreachable 1 nV limit: a bank 23.8 mV out
        BankEvaluator unreachable = spec.withLimits(Limits.around(op, 1e-9, 1e-9));
        Judgement far = new Judgement(0.0238, 0.0218, 0.0238, 0.0218, 0, 0, 2.2995, 10, 0.8, 40);
        String tight = ProgressText.frontierLine(new SearchProgress(3.0, CapacitorBank.EMPTY, far, 3000),
                unreachable, true);
        assertThat(tight).contains("smallest worst excursion so far 23.8 mV").contains("2.2995")
                .doesNotContain("nV").doesNotContain("misses").doesNotContain("allowed");
        // a limit search: the limit the table will show, and whether the best bank keeps within it
        BankEvaluator limit = spec.withLimits(Limits.around(op, 0.0244, 0.0244));
        Judgement within = new Judgement(0.0237, 0.0217, 0, 0, 0, 0, 2.1220, 10, 0.8, 38);
        String line = ProgressText.frontierLine(new SearchProgress(2.0, CapacitorBank.EMPTY, within, 2000), limit, false);
        assertThat(line).contains("within the limit; worst excursion 23.7 mV (limit 24.4 mV)")
                .doesNotContain("misses").doesNotContain("not yet");
        Judgement out = new Judgement(0.0250, 0.0230, 0.0006, 0, 0, 0, 1.9, 10, 0.8, 30);
        assertThat(ProgressText.frontierLine(new SearchProgress(1.0, CapacitorBank.EMPTY, out, 1000), limit, false))
                .contains("not yet within the limit; worst excursion 25 mV (limit 24.4 mV)").doesNotContain("misses");
        // a bank the judge settled by an upper bound: the figure is shown as the bound it is
        Judgement bounded = new Judgement(0.0240, 0.0220, 0, 0, 0, 0, 2.1, 10, 0.8, 38, false);
        assertThat(ProgressText.frontierLine(new SearchProgress(2.0, CapacitorBank.EMPTY, bounded, 2000), limit, false))
                .contains("within the limit; worst excursion at most 24 mV (limit 24.4 mV)");
        assertThat(ProgressText.line(new SearchProgress(2.0, CapacitorBank.EMPTY, bounded, 2000), spec))
                .contains("meets spec").contains("worst droop at most 24 mV of");
        assertThat(ProgressText.line(new SearchProgress(2.0, CapacitorBank.EMPTY, within, 2000), spec))
                .contains("worst droop 23.7 mV of");
    }
}
