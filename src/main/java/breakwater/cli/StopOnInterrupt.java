package breakwater.cli;

import breakwater.optimize.BankSearch;
import sun.misc.Signal;
import sun.misc.SignalHandler;

import java.io.PrintWriter;

/**
 * Ctrl-C during a search, or during several searches one after another (one per footprint, one per
 * limit): the first one stops the running search and skips the rest, and the command goes on to write
 * what it has; a second one ends the program at once. The signal is intercepted (rather than handled in
 * a shutdown hook) so that writing the results runs in a normal, living JVM.
 */
final class StopOnInterrupt implements AutoCloseable {
    private static final Signal INT = new Signal("INT");

    private final SignalHandler previous;
    private volatile boolean interrupted;
    private volatile BankSearch current;

    StopOnInterrupt(PrintWriter err) {
        SignalHandler installed;
        try {
            installed = Signal.handle(INT, sig -> {
                if (interrupted) {
                    err.println("breakwater: interrupted again; stopping without writing results.");
                    err.flush();
                    Runtime.getRuntime().halt(130);
                }
                interrupted = true;
                err.println("breakwater: stopping the search (Ctrl-C again to quit at once); "
                        + "writing the best bank found ...");
                err.flush();
                BankSearch s = current;
                if (s != null) {
                    s.stop();
                }
            });
        } catch (IllegalArgumentException unsupported) {
            installed = null; // no SIGINT on this platform: Ctrl-C keeps its default meaning
        }
        previous = installed;
    }

    /** The search now running; stopped at once if Ctrl-C came already. */
    void running(BankSearch search) {
        current = search;
        if (interrupted) {
            search.stop();
        }
    }

    boolean interrupted() {
        return interrupted;
    }

    @Override
    public void close() {
        if (previous != null) {
            Signal.handle(INT, previous);
        }
    }
}
