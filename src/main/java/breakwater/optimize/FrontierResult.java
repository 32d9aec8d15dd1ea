package breakwater.optimize;

import breakwater.design.Candidates;
import breakwater.catalog.Part;
import breakwater.design.BankEvaluator;
import breakwater.design.Evaluation;
import breakwater.design.Verdict;

import java.util.List;

/**
 * What {@code frontier} found: the cheapest bank for each excursion limit, and the spec limit's bank as
 * the one the result files describe.
 *
 * @param footprintName the footprint searched under ("" for the catalog's mounting inductance)
 * @param judge       the rail's own judge
 * @param evaluation  the spec limit's bank, judged against the spec
 * @param frontier    the points, tightest first
 * @param headroom    what the spec allows on each side, and where the limits end
 * @param all         the whole run's search settings
 * @param each        each of the searches' share of them
 * @param interrupted whether the user stopped the run (later limits were not searched)
 * @param verdict     the verdict of the spec limit's bank
 */
public record FrontierResult(String footprintName, BankEvaluator judge, Evaluation evaluation, ExcursionFrontier.Result frontier,
                             ExcursionFrontier.Headroom headroom, SearchSettings all, SearchSettings each,
                             boolean interrupted, Verdict verdict) {

    /** The frontier of {@code points} limits; the time of {@code all} is shared by its points + 1 searches. */
    public static FrontierResult frontier(BankEvaluator spec, String footprintName, List<Part> parts, SearchSettings all, int points,
                                          SearchRunner runner) {
        SearchSettings each = all.split(points + 1);
        Screening screening = Screening.of(spec, parts);
        runner.announce(new SearchStage.Frontier(points, all, each));
        int[] step = {0};
        ExcursionFrontier.Result f = ExcursionFrontier.run(spec, screening.kept(), screening.maxCounts(),
                each, points, (search, judge, settings, start) -> {
                    runner.announce(step[0] == 0 ? new SearchStage.TightestSearch()
                            : new SearchStage.LimitSearch(step[0], points));
                    step[0]++;
                    return runner.run(search, judge, settings, start);
                }, runner::stopRequested);
        Evaluation e = spec.evaluate(f.specPoint().bank());
        return new FrontierResult(footprintName, spec, e, f, f.headroom(spec.scenario().rail()), all, each, runner.stopRequested(),
                Verdict.of(e, spec.scenario().requireTarget()));
    }
}
