package breakwater.optimize;

import breakwater.design.CapacitorBank;
import breakwater.design.Judgement;

/**
 * The best bank a search found.
 *
 * @param bank         best bank
 * @param judgement    its solver-grid judgement (the caller re-evaluates it fully for the verdict)
 * @param evaluations  banks evaluated: every judgement the search asked for, memo hits included, summed
 *                     over all solvers (so a move-limited run with the same seed repeats it exactly)
 * @param seconds      wall-clock time spent
 * @param seed         seed of the first solver
 * @param solvers      solvers that ran
 * @param stoppedEarly whether the user stopped it (Ctrl-C)
 * @param improvements every new best bank over all solvers, in time order
 * @param screening    what was left out of the candidates before the search, when it was screened
 */
public record SearchResult(CapacitorBank bank, Judgement judgement, long evaluations, double seconds, long seed,
                           int solvers, boolean stoppedEarly, java.util.List<Improvement> improvements,
                           java.util.Optional<Screening> screening) {

    public SearchResult {
        improvements = java.util.List.copyOf(improvements);
        java.util.Objects.requireNonNull(screening, "screening");
    }

    /** A result of a search over candidates as given (not screened). */
    public SearchResult(CapacitorBank bank, Judgement judgement, long evaluations, double seconds, long seed,
                        int solvers, boolean stoppedEarly, java.util.List<Improvement> improvements) {
        this(bank, judgement, evaluations, seconds, seed, solvers, stoppedEarly, improvements, java.util.Optional.empty());
    }

    /** A new best: when (seconds since the start), whether it met the spec, its cost. */
    public record Improvement(double atSeconds, boolean feasible, double costTotal) {
    }

    /** Seconds until the first bank that meets the spec and costs at most {@code cost}, or NaN if never. */
    public double secondsToReach(double cost) {
        for (Improvement i : improvements) {
            if (i.feasible() && i.costTotal() <= cost) {
                return i.atSeconds();
            }
        }
        return Double.NaN;
    }
}
