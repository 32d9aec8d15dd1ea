package breakwater.cli;

import breakwater.optimize.BankSearch;

import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;

/**
 * Ctrl-C during a search: stop the solvers, let the command write the best bank found, then exit.
 * The shutdown hook waits (up to a minute) until {@link #close()} says the outputs are written.
 */
final class StopOnInterrupt implements AutoCloseable {
    private final CountDownLatch finished = new CountDownLatch(1);
    private final Thread hook;
    private volatile boolean interrupted;

    StopOnInterrupt(BankSearch search) {
        hook = new Thread(() -> {
            interrupted = true;
            search.stop();
            try {
                finished.await(60, TimeUnit.SECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }, "breakwater-interrupt");
        Runtime.getRuntime().addShutdownHook(hook);
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
