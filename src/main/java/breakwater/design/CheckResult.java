package breakwater.design;

import java.util.Objects;
import java.util.Optional;

/**
 * What {@code check} found: a given bank judged against the spec, with its part-to-part spread when asked.
 *
 * @param footprintName the footprint the bank was judged under ("" for the catalog's mounting inductance)
 * @param judge         the rail's own judge
 * @param evaluation    the bank's full evaluation
 * @param monteCarlo    the spread of the bank's parts, when samples were asked for
 * @param verdict       the verdict of the run
 */
public record CheckResult(String footprintName, BankEvaluator judge, Evaluation evaluation,
                          Optional<MonteCarlo.Result> monteCarlo, Verdict verdict) {
    public CheckResult {
        Objects.requireNonNull(footprintName, "footprintName");
        Objects.requireNonNull(monteCarlo, "monteCarlo");
    }

    /** Judges {@code bank}, then draws the Monte Carlo samples when {@code monteCarlo} is given. */
    public static CheckResult check(BankEvaluator judge, String footprintName, CapacitorBank bank,
                                    Optional<MonteCarlo.Settings> monteCarlo, RunListener listener) {
        Evaluation e = judge.evaluate(bank);
        Optional<MonteCarlo.Result> mc = MonteCarlo.runRequested(judge, e.bank(), monteCarlo, listener);
        return new CheckResult(footprintName, judge, e, mc, Verdict.of(e, judge.scenario().requireTarget(),
                java.util.List.of(), MonteCarlo.yieldOf(mc), false));
    }
}
