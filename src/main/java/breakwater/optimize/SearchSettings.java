package breakwater.optimize;

import java.time.Duration;
import java.util.Objects;

/**
 * How long and how widely to search.
 *
 * @param timeLimit        wall-clock budget for the whole search
 * @param unimprovedLimit  stop a solver that has not improved its best for this long (and restart it);
 *                         not used with a move limit, whose runs must not depend on the machine's speed
 * @param moveLimit        stop each solver after this many evaluated moves (0 = no limit); with a seed
 *                         this makes a run reproducible: the same bank, files and count of banks
 *                         evaluated (the time limit then only guards against a solver that never ends)
 * @param seed             seed of the first solver; solver k uses seed + k
 * @param solvers          independent solvers run in parallel (the free solver edition has no
 *                         multithreaded solving, so we run several seeded ones and keep the best)
 */
public record SearchSettings(Duration timeLimit, Duration unimprovedLimit, long moveLimit, long seed, int solvers) {
    /**
     * The most solvers one search runs: each holds its own working copy of the bank and scores, and on a
     * machine with fewer cores the extra ones only share them.
     */
    public static final int MAX_SOLVERS = 64;

    public SearchSettings {
        Objects.requireNonNull(timeLimit, "timeLimit");
        Objects.requireNonNull(unimprovedLimit, "unimprovedLimit");
        if (timeLimit.isZero() || timeLimit.isNegative()) {
            throw new IllegalArgumentException("time limit must be > 0");
        }
        // the solver's time terminations work in whole milliseconds
        timeLimit = Duration.ofMillis(Math.max(1, timeLimit.toMillis()));
        unimprovedLimit = Duration.ofMillis(Math.max(1, unimprovedLimit.toMillis()));
        if (moveLimit < 0 || solvers < 1 || solvers > MAX_SOLVERS) {
            throw new IllegalArgumentException("move limit >= 0 and solvers in 1 .. " + MAX_SOLVERS + " required");
        }
    }

    /**
     * One solver per core (at most 4); a solver that has not improved for a sixteenth of the time limit
     * (at least 1 s, at most the limit) gives way to a restart (see {@link BankSearch}): on the demo rails
     * these shorter rounds, more of them taken apart and rebuilt, ended six 30 s runs 1 % cheaper on
     * average than rounds of an eighth (at least 2 s), and the dearest run 2 % cheaper.
     */
    public static SearchSettings defaults(Duration timeLimit, long seed) {
        int cores = Math.max(1, Math.min(4, Runtime.getRuntime().availableProcessors()));
        Duration unimproved = timeLimit.dividedBy(16);
        if (unimproved.compareTo(Duration.ofSeconds(1)) < 0) {
            unimproved = timeLimit.compareTo(Duration.ofSeconds(1)) < 0 ? timeLimit : Duration.ofSeconds(1);
        }
        return new SearchSettings(timeLimit, unimproved, 0, seed, cores);
    }

    public SearchSettings withMoveLimit(long moves) {
        return new SearchSettings(timeLimit, unimprovedLimit, moves, seed, solvers);
    }

    public SearchSettings withSolvers(int n) {
        return new SearchSettings(timeLimit, unimprovedLimit, moveLimit, seed, n);
    }

    /** An equal share of the time limit for each of {@code parts} searches; moves, seed, solvers unchanged. */
    public SearchSettings split(int parts) {
        Duration t = timeLimit.dividedBy(Math.max(1, parts));
        Duration unimproved = unimprovedLimit.compareTo(t) < 0 ? unimprovedLimit : t;
        return new SearchSettings(t, unimproved, moveLimit, seed, solvers);
    }
}
