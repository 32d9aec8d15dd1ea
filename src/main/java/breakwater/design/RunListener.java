package breakwater.design;

/**
 * Told when a run starts a step that takes a while, so the caller can say so (progress on the console);
 * every method does nothing by default.
 */
public interface RunListener {
    /** A listener that is told nothing. */
    RunListener SILENT = new RunListener() {
    };

    /** The Monte Carlo samples are about to be drawn. */
    default void monteCarloStarting(MonteCarlo.Settings settings) {
    }
}
