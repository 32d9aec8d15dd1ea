package breakwater.timedomain;

/**
 * An internal error of the time-domain engine: the pole–residue model of a network could not be built
 * to the required accuracy, or the network is not strictly stable (an undamped or growing mode).
 * Thrown instead of ever returning a number that failed a self-check.
 */
public final class ModelException extends RuntimeException {

    public ModelException(String message) {
        super(message);
    }
}
