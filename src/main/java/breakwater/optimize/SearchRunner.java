package breakwater.optimize;

import breakwater.design.BankEvaluator;
import breakwater.design.CapacitorBank;
import breakwater.design.RunListener;

/**
 * Runs the searches of a mode for its caller, who adds what a person sees and does: live progress, and
 * stopping on request (Ctrl-C). The engines announce each step ({@link SearchStage}) before it starts.
 */
public interface SearchRunner extends RunListener {
    /** Runs {@code search} (judged by {@code judge}) from {@code start}. */
    SearchResult run(BankSearch search, BankEvaluator judge, SearchSettings settings, CapacitorBank start);

    /** A step of the run is about to start. */
    default void announce(SearchStage stage) {
    }

    /** Whether the user asked to stop: the remaining searches of a run are skipped. */
    default boolean stopRequested() {
        return false;
    }

    /** Runs each search as it is, silently. */
    SearchRunner PLAIN = (search, judge, settings, start) -> search.run(settings, start);
}
