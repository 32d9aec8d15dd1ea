package breakwater.optimize;

import breakwater.design.Candidates;
import breakwater.catalog.Part;
import breakwater.design.BankEvaluator;
import breakwater.design.CapacitorBank;
import breakwater.design.Evaluation;
import breakwater.design.Limits;
import breakwater.design.Verdict;
import breakwater.scenario.Rail;

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
 * met its own, tighter one). Monotone by construction and checked: a bank that meets a tighter limit
 * meets every looser one, so when a looser limit's search returns a dearer bank than a tighter limit's
 * (or none that meets it), the tighter limit's bank is used instead and the point says so.
 */
public final class ExcursionFrontier {
    /** The limit of the first, unreachable search. */
    static final double UNREACHABLE_V = 1e-9;

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
        double lo = Math.min(tightest, allowed);
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
            String note = searched ? "" : "not searched (stopped by the user)";
            // the cheapest bank of a tighter limit that met it meets this limit too
            Point cheaperTighter = null;
            for (Point p : out) {
                if (p.meetsLimit() && (cheaperTighter == null || p.costTotal() < cheaperTighter.costTotal())) {
                    cheaperTighter = p;
                }
            }
            if (cheaperTighter != null && (!meets || cheaperTighter.costTotal() < found.cost().total())) {
                note = String.format(Locale.ROOT, "%s the search returned %s (cost %.4f); the bank of the tighter "
                                + "limit %.6g V is used: it meets this limit too and is cheaper",
                        note.isEmpty() ? "" : note + ";", meets ? "a dearer bank" : "no bank meeting this limit",
                        found.cost().total(), cheaperTighter.limitV()).strip();
                found = judge.evaluate(cheaperTighter.bank());
                meets = true;
            }
            out.add(new Point(limit, found, meets, searched, evaluations, seconds, note));
            previous = found.bank();
        }
        return new Result(closest, tightest, allowed, tight.seconds(), out);
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
