package breakwater.optimize;

import breakwater.design.Candidates;
import ai.timefold.solver.core.api.score.BendableScore;
import ai.timefold.solver.core.api.solver.Solver;
import ai.timefold.solver.core.api.solver.SolverFactory;
import ai.timefold.solver.core.config.heuristic.selector.move.composite.UnionMoveSelectorConfig;
import ai.timefold.solver.core.config.heuristic.selector.move.factory.MoveListFactoryConfig;
import ai.timefold.solver.core.config.heuristic.selector.move.generic.ChangeMoveSelectorConfig;
import ai.timefold.solver.core.config.heuristic.selector.common.SelectionCacheType;
import ai.timefold.solver.core.config.heuristic.selector.move.generic.SwapMoveSelectorConfig;
import ai.timefold.solver.core.config.localsearch.LocalSearchPhaseConfig;
import ai.timefold.solver.core.config.phase.custom.CustomPhaseConfig;
import ai.timefold.solver.core.config.localsearch.decider.acceptor.LocalSearchAcceptorConfig;
import ai.timefold.solver.core.config.localsearch.decider.forager.LocalSearchForagerConfig;
import ai.timefold.solver.core.config.score.director.ScoreDirectorFactoryConfig;
import ai.timefold.solver.core.config.solver.EnvironmentMode;
import ai.timefold.solver.core.config.solver.SolverConfig;
import ai.timefold.solver.core.config.solver.monitoring.MonitoringConfig;
import ai.timefold.solver.core.config.solver.termination.TerminationConfig;
import breakwater.catalog.Part;
import breakwater.design.BankEvaluator;
import breakwater.design.CapacitorBank;
import breakwater.design.Judgement;

import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.LongAdder;
import java.util.function.BooleanSupplier;

/**
 * Searches part counts for the cheapest bank that meets the rail's spec, with Timefold local search.
 *
 * <p>Each solver starts from the given bank (or the impedance-shaped start), fills it greedily while it
 * fails ({@link GreedyFill}), then runs tabu search over the solver's change (any count in range) and
 * swap (two types exchange counts) moves and {@link CountMoves} (nudge a count by ±1/±3, drop a type,
 * move one part between types, replace a type by its neighbouring value). Several solvers with seeds
 * seed, seed+1, … run in parallel and the best is kept (ties go to the lowest seed, so a move-limited
 * run is reproducible). Without a move limit each thread restarts whenever its solver stops improving,
 * until the time limit: alternately from its own best bank so far, and from that bank partly taken apart
 * (one part type removed, another halved) for the greedy fill to rebuild, which lets the search leave a
 * basin that single moves cannot (ruin and recreate). Threads keep to their own best so that they
 * explore different basins; the best over all threads is returned.
 *
 * <p>No Timefold type appears in this class's public API.
 */
public final class BankSearch {
    /** Tabu search evaluates this many acceptable moves per step and takes the best of them. */
    static final int ACCEPTED_PER_STEP = Integer.getInteger("bw.accepted", 16);
    private final JudgePool pool;
    private final Candidates candidates;
    private final int[] maxCounts;
    private final AtomicBoolean stopRequested = new AtomicBoolean();
    private final List<Solver<BankPlan>> running = new ArrayList<>();
    private volatile long startNanos;
    private volatile BendableScore bestScore;
    private volatile int[] bestCounts;
    private final List<SearchResult.Improvement> history = new ArrayList<>();
    /** Trial banks the start phase sized on impedance, and whether it is still running (for progress). */
    private final LongAdder startTrials = new LongAdder();
    private volatile boolean starting = true;

    /**
     * @param evaluator  the judge
     * @param candidates parts the search may use
     * @param maxCounts  largest count per candidate (aligned with {@code candidates})
     */
    /** A search over the parts themselves, on the board node (a scenario without placement regions). */
    public BankSearch(BankEvaluator evaluator, List<Part> parts, int[] maxCounts) {
        this(evaluator, Candidates.of(parts), maxCounts);
    }

    public BankSearch(BankEvaluator evaluator, Candidates candidates, int[] maxCounts) {
        if (candidates.size() != maxCounts.length || candidates.size() == 0) {
            throw new IllegalArgumentException("need one max count per candidate, and at least one candidate");
        }
        this.candidates = candidates;
        this.maxCounts = maxCounts.clone();
        this.pool = new JudgePool(evaluator, this.candidates);
    }

    public Candidates candidates() {
        return candidates;
    }

    /**
     * The search {@code solve} runs: the scenario's candidates for {@code parts}, screened
     * ({@link Screening}), with their largest counts.
     */
    public static BankSearch forScenario(BankEvaluator evaluator, List<Part> parts) {
        Screening screening = Screening.of(evaluator, parts);
        BankSearch search = new BankSearch(evaluator, screening.kept(), screening.maxCounts());
        search.screening = screening;
        return search;
    }

    /** What the judges' cheap bounds settled so far, over every solver thread (docs/search.md#bounds-in-the-judge). */
    public breakwater.design.CandidateJudge.BoundsSettled boundsSettled() {
        return pool.boundsSettled();
    }

    /** What screening left out before this search ({@link #forScenario}); nothing for a search built directly. */
    public Screening screening() {
        return screening != null ? screening : Screening.none(candidates, maxCounts);
    }

    private Screening screening;

    /** Asks every solver to stop; {@link #run} then returns the best bank found so far. */
    public void stop() {
        stopRequested.set(true);
        synchronized (running) {
            for (Solver<BankPlan> s : running) {
                s.terminateEarly();
            }
        }
    }

    /** Live view of the search; safe to call from any thread. Empty best before the first score. */
    public java.util.Optional<SearchProgress> progress() {
        int[] counts = bestCounts;
        if (counts == null) {
            return java.util.Optional.empty();
        }
        double elapsed = (System.nanoTime() - startNanos) / 1e9;
        return java.util.Optional.of(new SearchProgress(elapsed, candidates.bank(counts),
                pool.peek(counts), pool.requests(), starting, startTrials.sum()));
    }

    /** Runs the search from {@code start} (may be empty) and returns the best bank. */
    public SearchResult run(SearchSettings settings, CapacitorBank start) {
        startNanos = System.nanoTime();
        int[] given = candidates.counts(start);
        for (int i = 0; i < given.length; i++) {
            given[i] = Math.min(given[i], maxCounts[i]);
        }
        offer(given);
        int[] shaped = given;
        if (!pool.judge(given).feasible()) {
            // shape from the given bank and from scratch; start from the better of the two (a failing
            // existing bank can be a poor place to grow from)
            // the start phase keeps the time limit and the stop request too, ending with what it has
            long deadline = startNanos + settings.timeLimit().toNanos();
            BooleanSupplier goOn = () -> !stopRequested.get() && System.nanoTime() < deadline;
            // three shapes: grown from the given bank (when there is one), and from scratch by each rule
            List<int[]> shapes = new ArrayList<>();
            boolean givenEmpty = java.util.Arrays.stream(given).allMatch(c -> c == 0);
            if (!givenEmpty) {
                shapes.add(ImpedanceShaping.start(pool.evaluator(), candidates, maxCounts, given,
                        c -> pool.judge(c).feasible(), goOn, startTrials));
            }
            for (ImpedanceShaping.Rule rule : ImpedanceShaping.Rule.values()) {
                int[] fresh = ImpedanceShaping.start(pool.evaluator(), candidates, maxCounts, new int[given.length],
                        c -> pool.judge(c).feasible(), goOn, startTrials, rule);
                shapes.add(fresh);
                if (pool.judge(fresh).feasible()) {
                    break; // a passing start: the search makes it cheaper
                }
            }
            for (int[] c : shapes) {
                if (shaped == given || ScoreLevels.of(pool.judge(c)).compareTo(ScoreLevels.of(pool.judge(shaped))) > 0) {
                    shaped = c;
                }
            }
        }
        int[] startCounts = shaped;
        offer(startCounts);
        starting = false;
        ExecutorService exec = Executors.newFixedThreadPool(settings.solvers(), r -> {
            Thread t = new Thread(r, "breakwater-solver");
            t.setDaemon(true);
            return t;
        });
        List<Future<BankPlan>> futures = new ArrayList<>();
        try {
            for (int k = 0; k < settings.solvers(); k++) {
                int worker = k;
                futures.add(exec.submit(() -> {
                    try {
                        return worker(worker, settings, startCounts);
                    } catch (Error e) { // out of memory, say: the other solvers stop, the error reaches the caller
                        stop();
                        throw e;
                    }
                }));
            }
            int[] best = null;
            BendableScore bestOfAll = null;
            for (Future<BankPlan> f : futures) {
                BankPlan plan = f.get();
                int[] c = plan.countVector();
                BendableScore s = ScoreLevels.of(pool.judge(c));
                if (bestOfAll == null || s.compareTo(bestOfAll) > 0) {
                    bestOfAll = s;
                    best = c;
                }
            }
            // the starts themselves compete too (a search can only improve on them)
            for (int[] c : new int[][] {given, startCounts}) {
                if (ScoreLevels.of(pool.judge(c)).compareTo(bestOfAll) > 0) {
                    bestOfAll = ScoreLevels.of(pool.judge(c));
                    best = c;
                }
            }
            double seconds = (System.nanoTime() - startNanos) / 1e9;
            List<SearchResult.Improvement> improvements;
            synchronized (this) {
                improvements = List.copyOf(history);
            }
            return new SearchResult(candidates.bank(best), pool.judge(best), pool.requests(),
                    seconds, settings.seed(), settings.solvers(), stopRequested.get(), improvements,
                    java.util.Optional.ofNullable(screening));
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("search interrupted", e);
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof RuntimeException re) {
                throw re;
            }
            if (cause instanceof Error err) {
                throw err;
            }
            throw new IllegalStateException("solver failed", cause);
        } finally {
            exec.shutdownNow();
            synchronized (running) {
                running.clear();
            }
        }
    }

    /**
     * One solver thread: a first solve from the start; then, without a move limit and while time is left,
     * restarts with a fresh seed from this thread's best bank, on every other round partly taken apart
     * ({@link #ruin}), each ending when it has not improved for the unimproved limit. Restarts diversify
     * where one long tabu walk would circle.
     */
    private BankPlan worker(int k, SearchSettings settings, int[] start) {
        long deadline = startNanos + settings.timeLimit().toNanos();
        BankPlan bestPlan = null;
        BendableScore bestScore = null;
        int[] from = start;
        for (int round = 0; ; round++) {
            long remaining = deadline - System.nanoTime();
            // no solve starts after the time limit (the start phase may have used it all) or a stop
            if (stopRequested.get() || remaining <= 0 || (round > 0 && remaining < 200_000_000L)) {
                break;
            }
            long seed = settings.seed() + k + (long) round * settings.solvers();
            Duration budget = Duration.ofNanos(Math.max(remaining, 1_000_000L));
            Solver<BankPlan> solver = SolverFactory.<BankPlan>create(config(settings, seed, budget)).buildSolver();
            solver.addEventListener(ev -> offer(ev.getNewBestSolution().countVector()));
            synchronized (running) {
                running.add(solver);
            }
            BankPlan plan;
            try {
                if (stopRequested.get()) {
                    break;
                }
                plan = solver.solve(problem(from));
            } finally {
                synchronized (running) {
                    running.remove(solver);
                }
            }
            BendableScore score = ScoreLevels.of(pool.judge(plan.countVector()));
            if (bestScore == null || score.compareTo(bestScore) > 0) {
                bestScore = score;
                bestPlan = plan;
            }
            if (settings.moveLimit() > 0) {
                break; // a move-limited run is one solve per thread, so it stays reproducible
            }
            from = bestPlan.countVector();
            if (round % 2 == 0) {
                from = ruin(from, new java.util.Random(seed));
            }
        }
        return bestPlan != null ? bestPlan : problem(start);
    }

    /**
     * The bank partly taken apart: one part type in use removed and, when another remains, that one
     * halved (rounded down). Unchanged when no part is in use.
     */
    static int[] ruin(int[] counts, java.util.Random rnd) {
        int[] c = counts.clone();
        List<Integer> used = new ArrayList<>();
        for (int i = 0; i < c.length; i++) {
            if (c[i] > 0) {
                used.add(i);
            }
        }
        if (used.isEmpty()) {
            return c;
        }
        int drop = used.remove(rnd.nextInt(used.size()));
        c[drop] = 0;
        if (!used.isEmpty()) {
            int halve = used.get(rnd.nextInt(used.size()));
            c[halve] /= 2;
        }
        return c;
    }

    private synchronized void offer(int[] counts) {
        Judgement j = pool.judge(counts);
        BendableScore s = ScoreLevels.of(j);
        if (bestScore == null || s.compareTo(bestScore) > 0) {
            bestScore = s;
            bestCounts = counts.clone();
            history.add(new SearchResult.Improvement((System.nanoTime() - startNanos) / 1e9, j.feasible(), j.costTotal()));
        }
    }

    private BankPlan problem(int[] startCounts) {
        List<PartCount> list = new ArrayList<>();
        for (int i = 0; i < candidates.size(); i++) {
            list.add(new PartCount(i, candidates.part(i), candidates.region(i), maxCounts[i], startCounts[i]));
        }
        return new BankPlan(pool, list);
    }

    SolverConfig config(SearchSettings settings, long seed) {
        return config(settings, seed, settings.timeLimit());
    }

    SolverConfig config(SearchSettings settings, long seed, Duration timeLimit) {
        TerminationConfig termination = new TerminationConfig()
                .withSpentLimit(Duration.ofMillis(Math.max(1, timeLimit.toMillis())));
        if (settings.moveLimit() > 0) {
            // a move-limited run stops on its move count alone (the time limit only guards against a
            // hang): a stop after some wall-clock time without improvement would end it after a number of
            // moves that depends on the machine's speed, and so would the count of banks it judged
            termination.setMoveCountLimit(settings.moveLimit());
        } else {
            termination.setUnimprovedSpentLimit(settings.unimprovedLimit());
        }
        List<ai.timefold.solver.core.config.heuristic.selector.move.MoveSelectorConfig<?>> selectors = new ArrayList<>();
        selectors.add(new ChangeMoveSelectorConfig().withFixedProbabilityWeight(1.0));
        if (candidates.size() <= JudgePool.SHORTLIST_ABOVE) {
            // Timefold's swap works out, per phase, which counts each pair of candidates can exchange: work
            // that grows with the square of the candidates (seconds for a catalog of thousands); the
            // "move parts between types" moves of CountMoves cover the same ground there
            selectors.add(new SwapMoveSelectorConfig().withFixedProbabilityWeight(1.0));
        }
        selectors.add(new MoveListFactoryConfig().withMoveListFactoryClass(CountMoves.class)
                .withCacheType(SelectionCacheType.STEP).withFixedProbabilityWeight(8.0));
        UnionMoveSelectorConfig moves = new UnionMoveSelectorConfig().withMoveSelectors(
                selectors.toArray(new ai.timefold.solver.core.config.heuristic.selector.move.MoveSelectorConfig<?>[0]));
        return new SolverConfig()
                .withSolutionClass(BankPlan.class)
                .withEntityClasses(PartCount.class)
                .withScoreDirectorFactory(new ScoreDirectorFactoryConfig()
                        .withIncrementalScoreCalculatorClass(BankScoreCalculator.class))
                .withEnvironmentMode(EnvironmentMode.NO_ASSERT)
                .withRandomSeed(seed)
                .withMonitoringConfig(new MonitoringConfig().withSolverMetricList(List.of()))
                .withTerminationConfig(termination)
                .withPhases(new CustomPhaseConfig().withCustomPhaseCommands(
                                new GreedyFill(seed % 2 == 0 ? GreedyFill.Rule.PER_COST : GreedyFill.Rule.STEEPEST)),
                        new LocalSearchPhaseConfig()
                        .withAcceptorConfig(new LocalSearchAcceptorConfig()
                                .withEntityTabuSize(Math.max(1, Math.min(7, candidates.size() / 4))))
                        .withForagerConfig(new LocalSearchForagerConfig().withAcceptedCountLimit(ACCEPTED_PER_STEP))
                        .withMoveSelectorConfig(moves));
    }

    static Duration seconds(double s) {
        return Duration.ofNanos((long) (s * 1e9));
    }
}
