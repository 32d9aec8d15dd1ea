package breakwater.cli;

import breakwater.optimize.BankSearch;

import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;

/**
 * Ctrl-C during a run of several searches one after another (one per footprint, one per limit): stop the
 * running search, skip the rest, let the command write what it has, then exit. Like
 * {@link StopOnInterrupt}, the shutdown hook waits (up to a minute) until {@link #close()}.
 */
final class SearchSequence implements AutoCloseable {
    private final CountDownLatch finished = new CountDownLatch(1);
    private final Thread hook;
    private volatile boolean interrupted;
    private volatile BankSearch current;

    SearchSequence() {
        hook = new Thread(() -> {
            interrupted = true;
            BankSearch s = current;
            if (s != null) {
                s.stop();
            }
            try {
                finished.await(60, TimeUnit.SECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }, "breakwater-interrupt");
        Runtime.getRuntime().addShutdownHook(hook);
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
        finished.countDown();
        try {
            Runtime.getRuntime().removeShutdownHook(hook);
        } catch (IllegalStateException shuttingDown) {
            // the JVM is already exiting because of Ctrl-C; the hook sees the latch and lets it go
        }
    }
}
