package breakwater.optimize;

import breakwater.design.CapacitorBank;
import breakwater.design.Judgement;

/**
 * The best bank a search found.
 *
 * @param bank         best bank
 * @param judgement    its solver-grid judgement (the caller re-evaluates it fully for the verdict)
 * @param evaluations  banks evaluated (memo misses), over all solvers
 * @param seconds      wall-clock time spent
 * @param seed         seed of the first solver
 * @param solvers      solvers that ran
 * @param stoppedEarly whether the user stopped it (Ctrl-C)
 */
public record SearchResult(CapacitorBank bank, Judgement judgement, long evaluations, double seconds, long seed,
                           int solvers, boolean stoppedEarly) {
}
