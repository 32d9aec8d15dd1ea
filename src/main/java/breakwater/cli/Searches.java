package breakwater.cli;

import breakwater.design.BankEvaluator;
import breakwater.design.CapacitorBank;
import breakwater.design.Judgement;
import breakwater.optimize.BankSearch;
import breakwater.optimize.SearchProgress;
import breakwater.optimize.SearchResult;
import breakwater.optimize.SearchSettings;
import breakwater.scenario.Scenario;

import java.io.PrintWriter;
import java.util.Locale;

import static breakwater.units.EngineeringNotation.format;
import static breakwater.units.Quantity.VOLTAGE;

/** Runs a search with a live progress line on stderr (once a second) unless quiet. */
final class Searches {
    private Searches() {
    }

    static SearchResult runWithProgress(BankSearch search, SearchSettings settings, CapacitorBank start,
                                        PrintWriter err, boolean quiet, BankEvaluator evaluator) {
        Thread printer = null;
        if (!quiet) {
            printer = new Thread(() -> {
                try {
                    while (!Thread.currentThread().isInterrupted()) {
                        Thread.sleep(1000);
                        search.progress().ifPresent(p -> {
                            err.println(describe(p, evaluator));
                            err.flush();
                        });
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

    /** One progress line: elapsed, the best bank's verdict in words, cost, worst droop, speed. */
    static String describe(SearchProgress p, BankEvaluator evaluator) {
        Scenario scenario = evaluator.scenario();
        Judgement j = p.best();
        return String.format(Locale.ROOT, "  %6.1f s  %s; cost %.4f%s; worst droop %s of %s allowed; %d parts; %.0f banks/s",
                p.elapsedS(), inWords(j, scenario), j.costTotal(),
                scenario.cost().currency().isEmpty() ? "" : " " + scenario.cost().currency(),
                format(j.droopV(), VOLTAGE), format(evaluator.operatingPointV() - evaluator.limits().lowerV(), VOLTAGE), j.totalParts(),
                p.evaluationsPerSecond());
    }

    /** "meets spec" or what is still missing, e.g. "misses by 3.2 mV (droop)". */
    static String inWords(Judgement j, Scenario s) {
        if (j.feasible()) {
            return "meets spec";
        }
        StringBuilder b = new StringBuilder("misses");
        String sep = " ";
        if (j.droopExcessV() > 0) {
            b.append(sep).append("by ").append(format(j.droopExcessV(), VOLTAGE)).append(" (droop)");
            sep = ", ";
        }
        if (j.overshootExcessV() > 0) {
            b.append(sep).append("by ").append(format(j.overshootExcessV(), VOLTAGE)).append(" (overshoot)");
            sep = ", ";
        }
        if (j.boardExcess() > 0) {
            b.append(sep).append(j.boardExcess()).append(" over board limits");
            sep = ", ";
        }
        if (j.targetExcess() > 0) {
            b.append(sep).append(String.format(Locale.ROOT, "|Z| %.1f %% over target", 100 * j.targetExcess()));
        }
        return b.toString();
    }
}
