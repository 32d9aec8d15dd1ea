package breakwater.optimize;

import breakwater.design.Candidates;
import breakwater.catalog.Part;
import breakwater.design.BankEvaluator;
import breakwater.design.CapacitorBank;
import breakwater.design.DesignMargin;
import breakwater.design.Evaluation;
import breakwater.design.MonteCarlo;
import breakwater.design.Verdict;
import breakwater.diagnostic.InputException;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * What {@code solve} found: the cheapest bank the search reached, judged against the real limits.
 *
 * @param footprintName the footprint searched under ("" for the catalog's mounting inductance)
 * @param judge         the rail's own judge
 * @param evaluation    the bank found, fully evaluated
 * @param search        how the search went
 * @param margin        the design margin asked for and what the bank keeps of it, when one was asked for
 * @param monteCarlo    the spread of the bank's parts, when samples were asked for
 * @param verdict       the verdict of the run (the margin kept is its own condition)
 */
public record SolveResult(String footprintName, BankEvaluator judge, Evaluation evaluation, SearchResult search,
                          Optional<DesignMargin.Kept> margin, Optional<MonteCarlo.Result> monteCarlo,
                          Verdict verdict, Optional<Reach> reach) {
    public SolveResult {
        Objects.requireNonNull(footprintName, "footprintName");
        Objects.requireNonNull(margin, "margin");
        Objects.requireNonNull(monteCarlo, "monteCarlo");
        Objects.requireNonNull(reach, "reach");
    }

    /**
     * When the search ended without a bank that meets the spec: whether that is proven (no bank of the
     * searched parts within the board's limits can meet it) or only not reached in the time given.
     *
     * @param bound the bound over every bank, empty where none is computed (placement regions)
     * @param seconds how long the search ran
     */
    public record Reach(Optional<breakwater.design.ReachBound> bound, double seconds) {
        /** Whether the spec is proven out of reach of every bank. */
        public boolean provenOutOfReach() {
            return bound.isPresent() && bound.get().outOfReach();
        }
    }

    /**
     * Searches for the cheapest bank that meets the spec (with {@code margin}, against the band narrowed
     * by it), then judges it against the real limits.
     *
     * @throws InputException when a margin from the scenario leaves no room (one from the command line is
     *                        a {@link breakwater.design.RequestRefused})
     */
    public static SolveResult solve(BankEvaluator spec, String footprintName, List<Part> parts,
                                    SearchSettings settings, Optional<DesignMargin> margin,
                                    Optional<MonteCarlo.Settings> monteCarlo, SearchRunner runner) throws InputException {
        BankEvaluator searchJudge = margin.isPresent() ? margin.get().narrow(spec) : spec;
        BankSearch search = BankSearch.forScenario(searchJudge, parts);
        runner.announce(new SearchStage.Solving(search.screening(), settings));
        // progress in the search's own terms: with a margin, "allowed" is the narrowed band
        SearchResult result = runner.run(search, searchJudge, settings, CapacitorBank.EMPTY);
        Evaluation e = spec.evaluate(result.bank());
        Optional<MonteCarlo.Result> mc = MonteCarlo.runRequested(spec, e.bank(), monteCarlo, runner);
        Optional<DesignMargin.Kept> kept = margin.map(m -> m.kept(e));
        Verdict verdict = Verdict.of(e, spec.scenario().requireTarget(),
                kept.flatMap(DesignMargin.Kept::failure).stream().toList(), MonteCarlo.yieldOf(mc), margin.isPresent());
        Optional<Reach> reach = Optional.empty();
        if (!result.judgement().feasible()) {
            reach = Optional.of(new Reach(breakwater.design.ReachBound.of(searchJudge, search.candidates(),
                    search.screening().maxCounts()), result.seconds()));
        }
        return new SolveResult(footprintName, spec, e, result, kept, mc, verdict, reach);
    }
}
