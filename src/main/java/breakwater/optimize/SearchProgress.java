package breakwater.optimize;

import breakwater.design.CapacitorBank;
import breakwater.design.Judgement;

/**
 * A snapshot of a running search, for live progress; {@code evaluations} counts as
 * {@link SearchResult#evaluations()}.
 *
 * @param starting    the start phase is still building the first bank (on impedance alone, so few banks
 *                    are judged yet)
 * @param startTrials trial banks the start phase has sized so far
 */
public record SearchProgress(double elapsedS, CapacitorBank bestBank, Judgement best, long evaluations,
                             boolean starting, long startTrials) {
    /** A snapshot of the search proper (past its start phase). */
    public SearchProgress(double elapsedS, CapacitorBank bestBank, Judgement best, long evaluations) {
        this(elapsedS, bestBank, best, evaluations, false, 0);
    }

    public double evaluationsPerSecond() {
        return elapsedS > 0 ? evaluations / elapsedS : 0;
    }
}
