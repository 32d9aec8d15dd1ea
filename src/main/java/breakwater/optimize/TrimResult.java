package breakwater.optimize;

import breakwater.design.Candidates;
import breakwater.catalog.Part;
import breakwater.design.BankEvaluator;
import breakwater.design.CapacitorBank;
import breakwater.design.Evaluation;
import breakwater.design.MonteCarlo;
import breakwater.design.Verdict;

import java.math.BigDecimal;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * What {@code trim} found: the cheapest bank that keeps what the existing bank achieves, or the existing
 * bank unchanged when the search found nothing strictly cheaper within the limits.
 *
 * @param footprintName the footprint judged under ("" for the catalog's mounting inductance)
 * @param judge         the rail's own judge
 * @param existing      the bank it started from, fully evaluated
 * @param trimmed       the bank returned (the search's, or the existing one), fully evaluated
 * @param keep          the rule applied: what the cheaper bank had to keep ({@link CostDown#applied})
 * @param keepAsked     the rule asked for (--keep)
 * @param existingPartsOnly whether the trim could only remove parts or lower counts of the existing part numbers
 * @param keepRuleMet   whether the bank returned keeps it ({@link CostDown#keeps})
 * @param unchanged     whether the existing bank was returned
 * @param reason        why it was ("" when it was not)
 * @param changes       per part, old count to new count, for every part whose count differs
 * @param search        how the search went
 * @param monteCarlo    the spread of the returned bank's parts, when samples were asked for
 * @param verdict       the verdict of the run (a lost margin is its own condition)
 */
public record TrimResult(String footprintName, BankEvaluator judge, Evaluation existing, Evaluation trimmed,
                         CostDown.Keep keep, CostDown.Keep keepAsked, boolean existingPartsOnly, boolean keepRuleMet, boolean unchanged, String reason,
                         List<CostDown.Change> changes, SearchResult search, Optional<MonteCarlo.Result> monteCarlo,
                         Verdict verdict) {
    public TrimResult {
        Objects.requireNonNull(footprintName, "footprintName");
        Objects.requireNonNull(reason, "reason");
        changes = List.copyOf(changes);
        Objects.requireNonNull(monteCarlo, "monteCarlo");
    }

    /** Cost per board saved: existing less trimmed, in decimal like the costs themselves (0.062, not 0.0620000001). */
    public double savings() {
        return BigDecimal.valueOf(existing.cost().total()).subtract(BigDecimal.valueOf(trimmed.cost().total()))
                .doubleValue();
    }

    /** Saved on 1,000 boards, in decimal. */
    public double savingsPer1000() {
        return BigDecimal.valueOf(savings()).multiply(BigDecimal.valueOf(1000)).doubleValue();
    }

    /**
     * Searches, starting from {@code existing}, for the cheapest bank that keeps {@code keep}; takes it only
     * when it is strictly cheaper and inside the judge's limits ({@link CostDown#decide}).
     *
     * @param bankName how the user knows the existing bank (its file), for the announcement
     * @param existingPartsOnly only remove parts or lower counts of part numbers on the existing bank
     */
    public static TrimResult trim(BankEvaluator spec, String footprintName, String bankName, CapacitorBank existing,
                                  CostDown.Keep keep, boolean existingPartsOnly, List<Part> catalog,
                                  SearchSettings settings,
                                  Optional<MonteCarlo.Settings> monteCarlo, SearchRunner runner) {
        Evaluation old = spec.evaluate(existing);
        CostDown.Keep rule = CostDown.applied(keep, old);
        BankEvaluator judge = CostDown.judge(spec, old, rule);
        Candidates candidates = CostDown.candidates(Candidates.forScenario(catalog, spec.scenario()), existing,
                existingPartsOnly);
        BankSearch search = new BankSearch(judge, candidates,
                CostDown.maxCounts(candidates, spec.scenario(), existing, existingPartsOnly));
        runner.announce(new SearchStage.Trimming(bankName, old, rule, existingPartsOnly, candidates.size(), settings));
        SearchResult result = runner.run(search, judge, settings, existing);
        CostDown.Decision d = CostDown.decide(judge, existing, result.bank());
        Evaluation e = spec.evaluate(d.chosen());
        boolean kept = CostDown.keeps(rule, old, e);
        Optional<MonteCarlo.Result> mc = MonteCarlo.runRequested(spec, d.chosen(), monteCarlo, runner);
        Verdict verdict = Verdict.of(e, spec.scenario().requireTarget(),
                kept ? List.of() : List.of(new Verdict.TrimLostMargin()), MonteCarlo.yieldOf(mc), false);
        return new TrimResult(footprintName, spec, old, e, rule, keep, existingPartsOnly, kept, d.unchanged(), d.reason(),
                CostDown.changes(d.existing(), d.chosen()), result, mc, verdict);
    }
}
