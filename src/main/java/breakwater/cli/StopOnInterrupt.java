package breakwater.cli;

import breakwater.optimize.BankSearch;
import sun.misc.Signal;
import sun.misc.SignalHandler;

import java.io.PrintWriter;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Ctrl-C (SIGINT) or SIGTERM (sent by {@code timeout}, CI time limits, process managers) during a search,
 * or during several searches one after another (one per footprint, one per limit): the first one stops
 * the running search and skips the rest, and the command goes on to write what it has; a second one ends
 * the program at once (exit 130 after SIGINT, 143 after SIGTERM, as shells report them). The signals are
 * intercepted (rather than handled in a shutdown hook) so that writing the results runs in a normal,
 * living JVM.
 */
final class StopOnInterrupt implements AutoCloseable {
    /** The signals handled, with the exit code of a second one (128 + the signal's number). */
    private static final Map<String, Integer> SIGNALS = new LinkedHashMap<>();

    static {
        SIGNALS.put("INT", 130);
        SIGNALS.put("TERM", 143);
    }

    private final Map<Signal, SignalHandler> previous = new LinkedHashMap<>();
    private volatile boolean interrupted;
    private volatile BankSearch current;

    StopOnInterrupt(PrintWriter err) {
        for (Map.Entry<String, Integer> e : SIGNALS.entrySet()) {
            Signal signal = new Signal(e.getKey());
            int secondExit = e.getValue();
            String what = e.getKey().equals("INT") ? "Ctrl-C" : "SIGTERM";
            try {
                previous.put(signal, Signal.handle(signal, sig -> {
                    if (interrupted) {
                        err.println("breakwater: " + what + " again; stopping without writing results.");
                        err.flush();
                        Runtime.getRuntime().halt(secondExit);
                    }
                    interrupted = true;
                    err.println("breakwater: " + what + ": stopping the search (again to quit at once); "
                            + "writing the best bank found ...");
                    err.flush();
                    BankSearch s = current;
                    if (s != null) {
                        s.stop();
                    }
                }));
            } catch (IllegalArgumentException unsupported) {
                // no such signal on this platform (or the JVM keeps it): it keeps its default meaning
            }
        }
    }

    /** The search now running; stopped at once if a signal came already. */
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
        previous.forEach(Signal::handle);
    }
}
