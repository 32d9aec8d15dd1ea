package breakwater.cli;

import breakwater.design.BankEvaluator;
import breakwater.design.CapacitorBank;
import breakwater.design.MonteCarlo;
import breakwater.optimize.BankSearch;
import breakwater.optimize.SearchResult;
import breakwater.optimize.SearchRunner;
import breakwater.optimize.SearchSettings;
import breakwater.optimize.SearchStage;
import breakwater.report.ProgressText;

import java.io.PrintWriter;
import java.util.Optional;

/**
 * Runs a mode's searches for a person: each step announced and a live progress line once a second on the
 * error stream (unless quiet), and, when stoppable, Ctrl-C stopping the running search and skipping the
 * rest ({@link StopOnInterrupt}). The words come from {@link ProgressText}; this class runs the printer.
 */
final class Searches implements SearchRunner, AutoCloseable {
    private final PrintWriter err;
    private final boolean quiet;
    private final Optional<StopOnInterrupt> guard;
    /** The step last announced: a frontier's searches print their progress in the frontier's terms. */
    private volatile SearchStage stage;

    /** With Ctrl-C handling when {@code stoppable} (searches), without for a run that only judges. */
    Searches(PrintWriter err, boolean quiet, boolean stoppable) {
        this.err = err;
        this.quiet = quiet;
        this.guard = stoppable ? Optional.of(new StopOnInterrupt(err)) : Optional.empty();
    }

    @Override
    public SearchResult run(BankSearch search, BankEvaluator judge, SearchSettings settings, CapacitorBank start) {
        guard.ifPresent(g -> g.running(search));
        Thread printer = null;
        if (!quiet) {
            printer = new Thread(() -> {
                try {
                    while (!Thread.currentThread().isInterrupted()) {
                        Thread.sleep(1000);
                        search.progress().ifPresent(p -> say(line(p, judge)));
                    }
                } catch (InterruptedException e) {
                    // search finished
                }
            }, "breakwater-progress");
            printer.setDaemon(true);
            printer.start();
        }
        try {
            return search.run(settings, start);
        } finally {
            if (printer != null) {
                printer.interrupt();
            }
        }
    }

    private String line(breakwater.optimize.SearchProgress p, BankEvaluator judge) {
        return switch (stage) {
            case SearchStage.TightestSearch t -> ProgressText.frontierLine(p, judge, true);
            case SearchStage.LimitSearch l -> ProgressText.frontierLine(p, judge, false);
            case null, default -> ProgressText.line(p, judge);
        };
    }

    @Override
    public void announce(SearchStage stage) {
        this.stage = stage;
        if (!quiet) {
            say(ProgressText.stage(stage));
        }
    }

    @Override
    public void monteCarloStarting(MonteCarlo.Settings settings) {
        if (!quiet) {
            say(ProgressText.monteCarlo(settings));
        }
    }

    @Override
    public boolean stopRequested() {
        return guard.map(StopOnInterrupt::interrupted).orElse(false);
    }

    private void say(String line) {
        err.println(line);
        err.flush();
    }

    @Override
    public void close() {
        guard.ifPresent(StopOnInterrupt::close);
        err.flush();
    }
}
