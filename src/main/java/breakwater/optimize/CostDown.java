package breakwater.optimize;

import breakwater.design.Candidates;
import breakwater.catalog.BankEntry;
import breakwater.catalog.Part;
import breakwater.design.BankEvaluator;
import breakwater.design.CapacitorBank;
import breakwater.design.Evaluation;
import breakwater.design.Limits;
import breakwater.design.Verdict;
import breakwater.scenario.Scenario;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/**
 * Cost-down of an existing bank: the cheapest bank that keeps what the existing one achieves. The search
 * starts from the existing bank; its result is taken only when a full evaluation finds it strictly
 * cheaper and inside the judge's limits, so a cost-down never returns a bank worse than the one it
 * started from by its own judge.
 */
public final class CostDown {
    private CostDown() {
    }

    /** What the cheaper bank must keep. */
    public enum Keep {
        /** Worst droop and worst overshoot no worse than the existing bank's (and inside the spec). */
        MARGIN,
        /** Merely inside the spec. */
        SPEC
    }

    /**
     * The rule a trim applies: the one asked for, except that an existing bank whose worst case misses the
     * spec has no margin to keep, so {@link Keep#MARGIN} becomes {@link Keep#SPEC} for it (the cheaper bank
     * must meet the spec). Every output states this one rule.
     */
    public static Keep applied(Keep asked, Evaluation existing) {
        return asked == Keep.MARGIN && !existing.figures().passes() ? Keep.SPEC : asked;
    }

    /**
     * A change of one part's count in one placement region ("" without regions); 0 for a part not placed
     * there. {@code moved}: some of the part's parts went to, or came from, another region (its count over
     * all regions changed less than here).
     */
    public record Change(String part, String region, int from, int to, boolean moved) {
        public Change(String part, int from, int to) {
            this(part, "", from, to, false);
        }
    }

    /**
     * The outcome.
     *
     * @param existing    the bank it started from
     * @param chosen      the bank returned: the search's, or the existing one unchanged
     * @param unchanged   whether the existing bank was kept
     * @param reason      why it was kept ("" when it was not)
     */
    public record Decision(CapacitorBank existing, CapacitorBank chosen, boolean unchanged, String reason) {
    }

    /**
     * The judge for {@code keep}: the rail's own for {@link Keep#SPEC}; for {@link Keep#MARGIN} the band
     * narrowed to the existing bank's worst droop below and worst overshoot above the operating point
     * (never wider than the spec).
     */
    public static BankEvaluator judge(BankEvaluator spec, Evaluation existing, Keep keep) {
        return switch (keep) {
            case SPEC -> spec;
            case MARGIN -> spec.withLimits(Limits.around(spec.operatingPointV(), existing.figures().droopV(),
                    existing.figures().overshootV()));
        };
    }

    /**
     * The parts a trim may use: every candidate, or with {@code existingPartsOnly} only the part numbers
     * already on the existing bank (a qualified BOM takes no new part number without requalification).
     */
    public static List<Part> candidates(List<Part> candidates, CapacitorBank existing, boolean existingPartsOnly) {
        if (!existingPartsOnly) {
            return candidates;
        }
        return candidates.stream().filter(p -> existing.count(p.name()) > 0).toList();
    }

    /** As {@link #candidates(List, CapacitorBank, boolean)} for candidates in placement regions. */
    public static Candidates candidates(Candidates candidates, CapacitorBank existing, boolean existingPartsOnly) {
        return existingPartsOnly ? candidates.filter(p -> existing.count(p.name()) > 0) : candidates;
    }

    /**
     * The search's largest counts: with {@code existingPartsOnly} each part's count on the existing bank
     * (a trim then only removes parts or lowers counts), otherwise {@link #maxCounts(List, Scenario, CapacitorBank)}.
     */
    public static int[] maxCounts(List<Part> candidates, Scenario scenario, CapacitorBank existing,
                                  boolean existingPartsOnly) {
        return maxCounts(Candidates.of(candidates), scenario, existing, existingPartsOnly);
    }

    /**
     * As {@link #maxCounts(List, Scenario, CapacitorBank, boolean)} for candidates in placement regions: with
     * {@code existingPartsOnly} each part's count in each region on the existing bank (so nothing moves
     * into a region either).
     */
    public static int[] maxCounts(Candidates candidates, Scenario scenario, CapacitorBank existing,
                                  boolean existingPartsOnly) {
        return existingPartsOnly ? candidates.counts(existing) : maxCounts(candidates, scenario, existing);
    }

    /** As {@link #maxCounts(Candidates, Scenario, CapacitorBank)} for the parts themselves, on the board node. */
    public static int[] maxCounts(List<Part> parts, Scenario scenario, CapacitorBank existing) {
        return maxCounts(Candidates.of(parts), scenario, existing);
    }

    /** The search's largest counts, raised where needed so the existing bank itself can be represented. */
    public static int[] maxCounts(Candidates candidates, Scenario scenario, CapacitorBank existing) {
        int[] max = MaxCounts.of(candidates, scenario);
        int[] have = candidates.counts(existing);
        for (int i = 0; i < max.length; i++) {
            max[i] = Math.max(max[i], have[i]);
        }
        return max;
    }

    /**
     * The keep rule, judged on full evaluations against the real limits: {@link Keep#SPEC} always holds
     * here (the verdict judges the spec); {@link Keep#MARGIN} holds when the result's worst droop and worst
     * overshoot are each no worse than the existing bank's.
     */
    public static boolean keeps(Keep keep, Evaluation existing, Evaluation result) {
        return keep == Keep.SPEC || (result.figures().droopV() <= existing.figures().droopV()
                && result.figures().overshootV() <= existing.figures().overshootV());
    }

    /** Takes {@code found} only when it is strictly cheaper than {@code existing} and meets {@code judge}. */
    public static Decision decide(BankEvaluator judge, CapacitorBank existing, CapacitorBank found) {
        Evaluation old = judge.evaluate(existing);
        Evaluation e = judge.evaluate(found);
        if (!meets(judge, e)) {
            return new Decision(existing, existing, true, "the search found no bank that keeps "
                    + (meets(judge, old) ? "what the existing bank achieves" : "the limits") + " for less");
        }
        if (!(e.cost().total() < old.cost().total())) {
            return new Decision(existing, existing, true, "the search found no strictly cheaper bank within the limits");
        }
        return new Decision(existing, found, false, "");
    }

    /** Inside the judge's limits, within the board limits, and under the target when the scenario asks. */
    public static boolean meets(BankEvaluator judge, Evaluation e) {
        return Verdict.meetsSpec(e, judge.scenario().requireTarget());
    }

    /**
     * Per part and region, old count to new count, for every one whose count differs (existing order, then
     * new ones); a part whose parts moved between regions is marked on each of its changes.
     */
    public static List<Change> changes(CapacitorBank from, CapacitorBank to) {
        Set<List<String>> keys = new LinkedHashSet<>();
        for (BankEntry e : from.entries()) {
            keys.add(List.of(e.part().name(), e.region()));
        }
        for (BankEntry e : to.entries()) {
            keys.add(List.of(e.part().name(), e.region()));
        }
        List<Change> out = new ArrayList<>();
        for (List<String> k : keys) {
            String n = k.get(0);
            String r = k.get(1);
            int a = from.count(n, r);
            int b = to.count(n, r);
            if (a != b) {
                // moved: this region's change is not all of the part's change over every region
                boolean moved = !r.isEmpty() && Math.abs(to.count(n) - from.count(n)) < Math.abs(b - a);
                out.add(new Change(n, r, a, b, moved));
            }
        }
        return out;
    }
}
