package breakwater.timedomain;

/**
 * The worst-case transient has no finite bound: ideal load edges (t_e = 0) into a load node that shows
 * series inductance at high frequency (Z(∞) infinite) give an unbounded L·di/dt.
 */
public final class UnboundedWorstCaseException extends Exception {

    public UnboundedWorstCaseException(String message) {
        super(message);
    }
}
