package breakwater.optimize;

import breakwater.design.Candidates;
import breakwater.catalog.Part;
import breakwater.design.BankEvaluator;
import breakwater.design.CandidateJudge;
import breakwater.design.Judgement;

import java.util.Arrays;
import java.util.List;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicLong;

/**
 * Shared by every solver thread of one search: the candidate parts, one {@link CandidateJudge} per
 * thread (judges keep scratch arrays and are not thread-safe), and a memo of judgements by count vector.
 * Local search re-evaluates the same neighbours many times (every move is done, scored and undone), and
 * the worst-case computation dominates the cost of a score, so the memo pays for itself quickly.
 *
 * <p>Two counts: {@link #requests()}, every judgement the search asked for (memo hits included), and
 * {@link #computed()}, the memo misses. With several solver threads the second depends on thread timing
 * (which thread asks first for a bank both meet); the first does not, because each solver's sequence of
 * requests is fixed by its seed and its move limit. The search reports the first, so a move-limited run
 * repeats it exactly; live progress looks up through {@link #peek}, which is not counted.
 */
public final class JudgePool {
    private static final int MEMO_LIMIT = 400_000;

    private final BankEvaluator evaluator;
    private final Candidates candidates;
    private final ThreadLocal<CandidateJudge> judges;
    private final ConcurrentHashMap<Key, Judgement> memo = new ConcurrentHashMap<>();
    private final AtomicLong computed = new AtomicLong();
    private final AtomicLong requests = new AtomicLong();
    /** Every thread's judge, for {@link #boundsSettled()}. */
    private final java.util.concurrent.ConcurrentLinkedQueue<CandidateJudge> allJudges =
            new java.util.concurrent.ConcurrentLinkedQueue<>();

    /** A pool over the parts themselves, on the board node (a scenario without placement regions). */
    public JudgePool(BankEvaluator evaluator, List<Part> parts) {
        this(evaluator, Candidates.of(parts));
    }

    public JudgePool(BankEvaluator evaluator, Candidates candidates) {
        this.evaluator = evaluator;
        this.candidates = candidates;
        this.judges = ThreadLocal.withInitial(() -> {
            CandidateJudge judge = new CandidateJudge(evaluator, this.candidates);
            allJudges.add(judge);
            return judge;
        });
    }

    public Candidates candidates() {
        return candidates;
    }

    public BankEvaluator evaluator() {
        return evaluator;
    }

    /**
     * Judges {@code counts} (aligned with {@link #candidates()}), from the memo when seen before; counted in
     * {@link #requests()}.
     */
    public Judgement judge(int[] counts) {
        requests.incrementAndGet();
        return lookUp(counts);
    }

    /** As {@link #judge}, but not counted: for looks from outside the search (live progress). */
    public Judgement peek(int[] counts) {
        return lookUp(counts);
    }

    private Judgement lookUp(int[] counts) {
        Key key = new Key(counts.clone());
        Judgement j = memo.get(key);
        if (j != null) {
            return j;
        }
        j = judges.get().judge(counts);
        computed.incrementAndGet();
        if (memo.size() > MEMO_LIMIT) {
            memo.clear();
        }
        memo.put(key, j);
        return j;
    }

    /** Above this many candidates, construction tries only a shortlist of them per step ({@link #shortlist}). */
    static final int SHORTLIST_ABOVE = Integer.getInteger("bw.shortlistAbove", 48);
    /** Candidates not yet in use that a shortlist holds, half ranked per cost and half per part. */
    static final int SHORTLIST_NEW = 24;
    private final ThreadLocal<Shortlister> shortlisters = ThreadLocal.withInitial(Shortlister::new);

    /**
     * The candidates worth a full judgement when parts are added to {@code counts}: those in use, and
     * the {@link #SHORTLIST_NEW} others whose single addition lowers the impedance peaks most, Σ (|Z|/Z_t)⁴
     * over the band (a cheap proxy on a coarse grid; half ranked per unit of added cost, half per part).
     * Every candidate when there are at most {@link #SHORTLIST_ABOVE}. Ascending candidate order. Safe from
     * any thread (one ranking engine per thread).
     */
    public int[] shortlist(int[] counts, int[] maxCounts) {
        int n = candidates.size();
        if (n <= SHORTLIST_ABOVE) {
            return java.util.stream.IntStream.range(0, n).toArray();
        }
        return shortlisters.get().shortlist(counts, maxCounts);
    }

    /** Whether {@link #shortlist} narrows the candidates (a large catalog). */
    public boolean shortlists() {
        return candidates.size() > SHORTLIST_ABOVE;
    }

    /** One thread's ranking engine for {@link #shortlist}. */
    private final class Shortlister {
        private final breakwater.network.ImpedanceEngine engine;
        private final double[] re;
        private final double[] im;

        Shortlister() {
            var s = evaluator.scenario();
            List<breakwater.network.SeriesBranch> units = new java.util.ArrayList<>();
            for (Part p : candidates.parts()) {
                units.add(breakwater.network.PartBranches.single(p, evaluator.footprint()));
            }
            var grid = breakwater.network.FrequencyGrid.logarithmic(s.band().fromHz(), s.band().toHz(), 20);
            int[] regionOf = candidates.regions().stream().mapToInt(r -> s.regionNames().indexOf(r)).toArray();
            engine = new breakwater.network.ImpedanceEngine(
                    breakwater.network.NetworkBuilder.build(s, List.of(), evaluator.footprint()), units, regionOf, grid);
            re = new double[grid.size()];
            im = new double[grid.size()];
        }

        int[] shortlist(int[] counts, int[] maxCounts) {
            var s = evaluator.scenario();
            int n = candidates.size();
            double zt = s.rail().targetImpedanceOhms();
            int[] c = counts.clone();
            double base = peaks(c, zt);
            double[] perCost = new double[n];
            double[] perPart = new double[n];
            java.util.Arrays.fill(perCost, Double.NEGATIVE_INFINITY);
            java.util.Arrays.fill(perPart, Double.NEGATIVE_INFINITY);
            boolean[] keep = new boolean[n];
            for (int i = 0; i < n; i++) {
                if (c[i] > 0) {
                    keep[i] = true;
                    continue;
                }
                if (maxCounts[i] <= 0) {
                    continue;
                }
                c[i] = 1;
                double gain = base - peaks(c, zt);
                c[i] = 0;
                double cost = candidates.part(i).unitCost() + s.cost().placementPerPart() + s.cost().perLineItem();
                perPart[i] = gain;
                perCost[i] = gain / Math.max(cost, 1e-9);
            }
            for (double[] rank : new double[][] {perCost, perPart}) {
                Integer[] order = new Integer[n];
                for (int i = 0; i < n; i++) {
                    order[i] = i;
                }
                java.util.Arrays.sort(order, (a, b) -> Double.compare(rank[b], rank[a]));
                for (int k = 0, taken = 0; k < n && taken < SHORTLIST_NEW / 2; k++) {
                    int i = order[k];
                    if (rank[i] == Double.NEGATIVE_INFINITY) {
                        break;
                    }
                    if (!keep[i]) {
                        keep[i] = true;
                        taken++;
                    }
                }
            }
            return java.util.stream.IntStream.range(0, n).filter(i -> keep[i]).toArray();
        }

        private double peaks(int[] counts, double zt) {
            engine.sweep(counts, re, im);
            double sum = 0;
            for (int k = 0; k < re.length; k++) {
                double m2 = (re[k] * re[k] + im[k] * im[k]) / (zt * zt);
                sum += m2 * m2;
            }
            return sum;
        }
    }

    /** Judges {@code counts} afresh, bypassing the memo (the reference for assert-mode checks). */
    public Judgement judgeFresh(int[] counts) {
        return new CandidateJudge(evaluator, candidates).judge(counts);
    }

    /**
     * Judgements asked for through {@link #judge}, memo hits included, summed over every thread: the same
     * on every run of a move-limited search with the same seed, however many solvers.
     */
    public long requests() {
        return requests.get();
    }

    /** Judgements computed afresh (memo misses, {@link #peek} included); depends on thread timing. */
    public long computed() {
        return computed.get();
    }

    /**
     * What the cheap bounds settled over every thread's judge (docs/search.md#bounds-in-the-judge): the
     * share of a whole search's judgements (memo misses) that a bound decided. Read it once the search's
     * threads have finished; while they run, the counts may lag.
     */
    public CandidateJudge.BoundsSettled boundsSettled() {
        long judgements = 0;
        long byModel = 0;
        long byIdeal = 0;
        long byImpedance = 0;
        for (CandidateJudge judge : allJudges) {
            CandidateJudge.BoundsSettled b = judge.boundsSettled();
            judgements += b.judgements();
            byModel += b.passedByModelSum();
            byIdeal += b.passedByIdealEdges();
            byImpedance += b.failedByImpedance();
        }
        return new CandidateJudge.BoundsSettled(judgements, byModel, byIdeal, byImpedance);
    }

    private record Key(int[] counts) {
        @Override
        public boolean equals(Object o) {
            return o instanceof Key k && Arrays.equals(counts, k.counts);
        }

        @Override
        public int hashCode() {
            return Arrays.hashCode(counts);
        }
    }
}
