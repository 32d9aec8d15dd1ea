package breakwater.optimize;

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
 */
public final class JudgePool {
    private static final int MEMO_LIMIT = 400_000;

    private final BankEvaluator evaluator;
    private final List<Part> candidates;
    private final ThreadLocal<CandidateJudge> judges;
    private final ConcurrentHashMap<Key, Judgement> memo = new ConcurrentHashMap<>();
    private final AtomicLong evaluations = new AtomicLong();
    private final AtomicLong lookups = new AtomicLong();

    public JudgePool(BankEvaluator evaluator, List<Part> candidates) {
        this.evaluator = evaluator;
        this.candidates = List.copyOf(candidates);
        this.judges = ThreadLocal.withInitial(() -> new CandidateJudge(evaluator, this.candidates));
    }

    public List<Part> candidates() {
        return candidates;
    }

    public BankEvaluator evaluator() {
        return evaluator;
    }

    /** Judges {@code counts} (aligned with {@link #candidates()}), from the memo when seen before. */
    public Judgement judge(int[] counts) {
        lookups.incrementAndGet();
        Key key = new Key(counts.clone());
        Judgement j = memo.get(key);
        if (j != null) {
            return j;
        }
        j = judges.get().judge(counts);
        evaluations.incrementAndGet();
        if (memo.size() > MEMO_LIMIT) {
            memo.clear();
        }
        memo.put(key, j);
        return j;
    }

    /** Judges {@code counts} afresh, bypassing the memo (the reference for assert-mode checks). */
    public Judgement judgeFresh(int[] counts) {
        return new CandidateJudge(evaluator, candidates).judge(counts);
    }

    /** Banks actually evaluated (memo misses). */
    public long evaluations() {
        return evaluations.get();
    }

    /** Score requests, including memo hits. */
    public long lookups() {
        return lookups.get();
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
