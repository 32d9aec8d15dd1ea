package breakwater.optimize;

import breakwater.design.Candidates;
import breakwater.catalog.Part;
import breakwater.design.BankEvaluator;
import breakwater.design.CapacitorBank;
import breakwater.design.Evaluation;
import breakwater.design.Verdict;
import breakwater.diagnostic.InputException;
import breakwater.scenario.Footprint;
import breakwater.scenario.Scenario;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * What {@code compare} found: under each footprint, the cheapest bank the search reached (or one given
 * bank judged under each), side by side.
 *
 * @param rows        one per footprint, in the order asked for
 * @param primary     the row the result files describe: the cheapest that meets the spec, else the first
 * @param givenBank   whether one given bank was judged under each footprint (no search)
 * @param all         the whole run's search settings
 * @param each        each footprint's share of them
 * @param interrupted whether the user stopped the run (later footprints were not searched)
 * @param verdict     the verdict of the run: every footprint's bank must meet the spec
 */
public record CompareResult(List<Row> rows, Row primary, boolean givenBank, SearchSettings all, SearchSettings each,
                            boolean interrupted, Verdict verdict) {
    /** Stands for the catalog's own mounting inductance, unless the scenario defines a footprint so named. */
    public static final String CATALOG = "catalog";

    public CompareResult {
        rows = List.copyOf(rows);
        if (rows.isEmpty()) {
            throw new IllegalArgumentException("a comparison needs at least one footprint");
        }
    }

    /** One footprint's outcome. */
    public record Row(String name, BankEvaluator judge, Evaluation evaluation, Optional<SearchResult> search,
                      boolean meets) {
    }

    /** The footprint a name stands for: the scenario's, or none (the catalog's column) for {@link #CATALOG}. */
    public static Optional<Footprint> footprint(Scenario s, String name) {
        return s.footprint(name);
    }

    /**
     * Under each footprint named (in this order), searches for the cheapest bank, or judges {@code given}.
     * Each search gets an equal share of {@code all}.
     *
     * @param bankName how the user knows the given bank (its file), for the announcement
     */
    public static CompareResult compare(Scenario scenario, List<String> names, Optional<CapacitorBank> given,
                                        Optional<String> bankName, List<Part> parts, SearchSettings all,
                                        SearchRunner runner) throws InputException {
        SearchSettings each = all.split(names.size());
        runner.announce(new SearchStage.Comparing(names, given.isPresent() ? bankName : Optional.empty(), all, each));
        List<Row> rows = new ArrayList<>();
        for (String name : names) {
            BankEvaluator ev = new BankEvaluator(scenario, footprint(scenario, name));
            Optional<SearchResult> result = Optional.empty();
            CapacitorBank bank;
            if (given.isPresent()) {
                bank = given.get();
            } else if (runner.stopRequested()) {
                bank = CapacitorBank.EMPTY;
            } else {
                runner.announce(new SearchStage.FootprintSearch(name));
                // screened per footprint: twins are told apart by their branch under that footprint
                SearchResult r = runner.run(BankSearch.forScenario(ev, parts), ev, each, CapacitorBank.EMPTY);
                result = Optional.of(r);
                bank = r.bank();
            }
            Evaluation e = ev.evaluate(bank);
            rows.add(new Row(name, ev, e, result, Verdict.meetsSpec(e, scenario.requireTarget())));
        }
        Row primary = rows.stream().filter(Row::meets)
                .min(Comparator.comparingDouble(r -> r.evaluation().cost().total())).orElse(rows.get(0));
        List<String> failing = rows.stream().filter(r -> !r.meets()).map(Row::name).toList();
        Verdict verdict = Verdict.of(primary.evaluation(), scenario.requireTarget(),
                failing.isEmpty() ? List.of() : List.of(new Verdict.FootprintsFailing(failing)), OptionalDouble.empty(),
                false);
        return new CompareResult(rows, primary, given.isPresent(), all, each, runner.stopRequested(), verdict);
    }
}
