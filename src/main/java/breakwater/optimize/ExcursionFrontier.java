package breakwater.optimize;

import breakwater.design.Candidates;
import breakwater.catalog.Part;
import breakwater.design.BankEvaluator;
import breakwater.design.CapacitorBank;
import breakwater.design.Evaluation;
import breakwater.design.Limits;
import breakwater.design.Verdict;
import breakwater.scenario.Rail;
import breakwater.units.EngineeringNotation;
import breakwater.units.Quantity;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.BooleanSupplier;

/**
 * The cost–excursion trade-off of a rail: for excursion limits from the smallest worst excursion the
 * search can reach up to the spec's, the cheapest bank whose worst droop and worst overshoot both stay
 * within the limit (and inside the spec, the board limits and the target when required).
 *
 * <p>First a search with an unreachable limit (1 nV) finds the bank closest to it; its worst excursion
 * max(droop, overshoot) is the tightest limit. Then one cost search per limit, tightest first, each
 * warm-started from the previous point's bank when that bank meets the next limit (it always does when it
 * met its own, tighter one). Last, each point takes the cheapest bank that any of the searches found and
 * that meets its limit ({@link #cheapestFound}): a bank that meets a tighter limit meets every looser
 * one, and a looser limit's bank may keep within a tighter limit too, so cheaper banks are carried both
 * ways and the point says where its bank came from.
 */
public final class ExcursionFrontier {
    /** The limit of the first, unreachable search. */
    static final double UNREACHABLE_V = 1e-9;
    /** Relative widening of the first limit over the smallest excursion found (see {@link #run}). */
    static final double LIMIT_ROUNDING = 1e-9;

    private ExcursionFrontier() {
    }

    /** Runs one search (lets the caller add progress output and Ctrl-C handling). */
    @FunctionalInterface
    public interface Runner {
        SearchResult run(BankSearch search, BankEvaluator judge, SearchSettings settings, CapacitorBank start);
    }

    /**
     * One limit of the frontier.
     *
     * @param limitV       the excursion limit: worst droop and worst overshoot each at most this
     * @param evaluation   the bank chosen for it, judged against the limit
     * @param meetsLimit   whether it meets the limit (and the spec, board limits, target when required)
     * @param searched     whether a search ran for this point (false after the user stopped the run)
     * @param evaluations  banks the search evaluated (0 when not searched)
     * @param seconds      time the search took
     * @param note         why the bank differs from the search's own result ("" when it does not)
     */
    public record Point(double limitV, Evaluation evaluation, boolean meetsLimit, boolean searched, long evaluations,
                        double seconds, String note) {
        public CapacitorBank bank() {
            return evaluation.bank();
        }

        public double costTotal() {
            return evaluation.cost().total();
        }

        /** max(worst droop, worst overshoot) of the bank. */
        public double excursionV() {
            return Math.max(evaluation.figures().droopV(), evaluation.figures().overshootV());
        }
    }

    /**
     * @param closest         the bank closest to an unreachable limit
     * @param tightestV       its worst excursion: the first limit
     * @param allowedV        the spec's allowed excursion (see {@link #allowedExcursion}): the last limit
     * @param tightSeconds    time of the first search
     * @param points          tightest first
     */
    public record Result(Evaluation closest, double tightestV, double allowedV, double tightSeconds,
                         List<Point> points) {
        public Result {
            points = List.copyOf(points);
        }

        /** The last point: the spec's own limit. */
        public Point specPoint() {
            return points.get(points.size() - 1);
        }

        /** What the spec allows on each side, from the first point's bank. */
        public Headroom headroom(Rail rail) {
            Evaluation first = points.get(0).evaluation();
            double op = first.figures().operatingV();
            return new Headroom(op, op - rail.lowerLimitV(), rail.upperLimitV() - op,
                    rail.currentStepA() * first.network().dcResistanceOhms());
        }
    }

    /**
     * What the spec allows from the operating point, and why the limits end where they do.
     *
     * @param operatingV        the I_min operating point
     * @param droopAllowedV     room below it, to the lower limit
     * @param overshootAllowedV room above it, to the upper limit
     * @param settleV           ΔI·Z(0): every worst overshoot is the worst droop less this
     */
    public record Headroom(double operatingV, double droopAllowedV, double overshootAllowedV, double settleV) {
        /** Whether the two sides differ (then the limits end before the larger side's room). */
        public boolean asymmetric() {
            return Math.abs(droopAllowedV - overshootAllowedV) > 1e-12;
        }
    }

    /**
     * @param spec        the rail's own judge
     * @param each        settings for each of the {@code points + 1} searches
     * @param points      number of limits, &ge; 2
     * @param stopped     true once the user asked to stop: the remaining points are filled without a search
     */
    public static Result run(BankEvaluator spec, Candidates candidates, int[] maxCounts, SearchSettings each,
                             int points, Runner runner, BooleanSupplier stopped) {
        if (points < 2) {
            throw new IllegalArgumentException("a frontier needs at least 2 points, got " + points);
        }
        double op = spec.operatingPointV();
        BankEvaluator unreachable = judge(spec, UNREACHABLE_V);
        SearchResult tight = runner.run(new BankSearch(unreachable, candidates, maxCounts), unreachable, each,
                CapacitorBank.EMPTY);
        Evaluation closest = spec.evaluate(tight.bank());
        double allowed = allowedExcursion(spec, closest.network().dcResistanceOhms());
        double tightest = Math.max(closest.figures().droopV(), closest.figures().overshootV());
        // the first limit is the closest bank's own excursion, widened by a rounding allowance so that the
        // bank meets it: op − (op − L) need not equal L in floating point
        double lo = Math.min(tightest * (1 + LIMIT_ROUNDING), allowed);
        int k = lo < allowed ? points : 1;

        List<Point> out = new ArrayList<>();
        CapacitorBank previous = closest.bank();
        for (int i = 0; i < k; i++) {
            double limit = k == 1 ? allowed : i == k - 1 ? allowed : lo + (allowed - lo) * i / (k - 1);
            BankEvaluator judge = judge(spec, limit);
            CapacitorBank start = Verdict.meetsSpec(judge.evaluate(previous), spec.scenario().requireTarget()) ? previous : CapacitorBank.EMPTY;
            Evaluation found;
            boolean searched = !stopped.getAsBoolean();
            long evaluations = 0;
            double seconds = 0;
            if (searched) {
                SearchResult r = runner.run(new BankSearch(judge, candidates, maxCounts), judge, each, start);
                found = judge.evaluate(r.bank());
                evaluations = r.evaluations();
                seconds = r.seconds();
            } else {
                found = judge.evaluate(start);
            }
            boolean meets = Verdict.meetsSpec(found, spec.scenario().requireTarget());
            out.add(new Point(limit, found, meets, searched, evaluations, seconds,
                    searched ? "" : "not searched (stopped by the user)"));
            previous = found.bank();
        }
        out = cheapestFound(spec, closest, out);
        return new Result(closest, tightest, allowed, tight.seconds(), out);
    }

    /**
     * Each point's bank becomes the cheapest bank any search of the run found that meets its limit: a
     * bank found for a looser limit whose excursion happens to be within a tighter one serves the tighter
     * limit too, and a tighter limit's bank serves every looser one. Candidates are every point's bank
     * and the bank closest to the unreachable limit; a strictly cheaper one that meets the limit replaces
     * the search's own, and the point's note says which limit's search found it. So costs never rise as
     * the limit loosens, and no point keeps a bank that another point shows to be beaten.
     */
    static List<Point> cheapestFound(BankEvaluator spec, Evaluation closest, List<Point> points) {
        boolean requireTarget = spec.scenario().requireTarget();
        record Candidate(Evaluation evaluation, String foundFor) {
            double excursionV() {
                return Math.max(evaluation.figures().droopV(), evaluation.figures().overshootV());
            }
        }
        List<Candidate> candidates = new ArrayList<>();
        candidates.add(new Candidate(closest, "the search for the smallest excursion"));
        for (Point p : points) {
            candidates.add(new Candidate(p.evaluation(), "the search for the "
                    + EngineeringNotation.format(p.limitV(), Quantity.VOLTAGE) + " limit"));
        }
        List<Point> out = new ArrayList<>();
        for (Point p : points) {
            Point best = p;
            for (Candidate c : candidates) {
                boolean cheaper = !best.meetsLimit() || c.evaluation().cost().total() < best.costTotal() - 1e-12;
                if (!cheaper || c.evaluation().bank().equals(best.bank()) || c.excursionV() > p.limitV()) {
                    continue;
                }
                Evaluation e = judge(spec, p.limitV()).evaluate(c.evaluation().bank());
                if (!Verdict.meetsSpec(e, requireTarget)) {
                    continue;
                }
                String own = p.meetsLimit()
                        ? String.format(Locale.ROOT, "a dearer bank (cost %.4f)", p.costTotal())
                        : "no bank within this limit";
                String stopped = p.searched() ? "" : "not searched (stopped by the user); ";
                best = new Point(p.limitV(), e, true, p.searched(), p.evaluations(), p.seconds(),
                        stopped + (p.searched() ? "this limit's search returned " + own + "; " : "")
                                + "the bank shown was found by " + c.foundFor()
                                + ": it keeps within this limit too and is cheaper");
            }
            out.add(best);
        }
        return out;
    }

    /**
     * The largest limit that still means something: every bank's worst overshoot is its worst droop less
     * ΔI·Z(0) (a pattern u and its mirror 1 − u give droop and overshoot that differ by exactly that), so a
     * limit L on both is a limit on the droop alone, and the spec is met exactly when the droop is at most
     * min(V_op − V_low, V_high − V_op + ΔI·Z(0)). Limits above that change nothing.
     */
    static double allowedExcursion(BankEvaluator spec, double dcResistanceOhms) {
        double op = spec.operatingPointV();
        double deltaI = spec.scenario().rail().currentStepA();
        return Math.min(op - spec.limits().lowerV(), spec.limits().upperV() - op + deltaI * dcResistanceOhms);
    }

    /** The spec narrowed to at most {@code limitV} of droop and of overshoot around the operating point. */
    public static BankEvaluator judge(BankEvaluator spec, double limitV) {
        return spec.withLimits(Limits.around(spec.operatingPointV(), limitV, limitV));
    }
}
