package breakwater.optimize;

import breakwater.design.CapacitorBank;
import breakwater.design.Judgement;

/** A snapshot of a running search, for live progress; {@code evaluations} counts as {@link SearchResult#evaluations()}. */
public record SearchProgress(double elapsedS, CapacitorBank bestBank, Judgement best, long evaluations) {
    public double evaluationsPerSecond() {
        return elapsedS > 0 ? evaluations / elapsedS : 0;
    }
}
