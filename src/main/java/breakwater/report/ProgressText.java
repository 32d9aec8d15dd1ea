package breakwater.report;

import breakwater.design.BankEvaluator;
import breakwater.design.Judgement;
import breakwater.design.MonteCarlo;
import breakwater.optimize.SearchProgress;
import breakwater.optimize.SearchSettings;
import breakwater.optimize.SearchStage;
import breakwater.scenario.Scenario;

import java.util.Locale;

import static breakwater.units.EngineeringNotation.format;
import static breakwater.units.Quantity.VOLTAGE;

/** The words of the live progress on the error stream: what a run starts, and the search's progress line. */
public final class ProgressText {
    private ProgressText() {
    }

    /** The line announcing a step of a run. */
    public static String stage(SearchStage stage) {
        return switch (stage) {
            case SearchStage.Solving s -> String.format(Locale.ROOT, "breakwater: searching %d parts%s for up to %s",
                    s.parts(), s.screening().dropped().isEmpty() ? "" : " (" + s.screening().summary() + ")",
                    Texts.duration(s.settings().timeLimit())) + solvers(s.settings());
            case SearchStage.Trimming t -> String.format(Locale.ROOT, "breakwater: trimming %s (%d parts, cost %s) "
                            + "keeping %s; searching %d parts for up to %s", t.bankName(), t.existing().bank().totalParts(),
                    Texts.money(t.existing().cost().total()), keeping(t), t.parts(),
                    Texts.duration(t.settings().timeLimit())) + solvers(t.settings());
            case SearchStage.Comparing c -> String.format(Locale.ROOT, "breakwater: comparing %d footprint%s (%s)%s",
                    c.footprints().size(), Texts.plural(c.footprints().size()), String.join(", ", c.footprints()),
                    c.bankName().map(b -> " with the bank " + b).orElseGet(() -> String.format(Locale.ROOT,
                            "; the %s time limit is split: %s per footprint, seed %d", Texts.duration(c.all().timeLimit()),
                            Texts.duration(c.each().timeLimit()), c.each().seed())));
            case SearchStage.FootprintSearch f -> "breakwater: footprint " + f.name();
            case SearchStage.Frontier f -> String.format(Locale.ROOT, "breakwater: frontier of %d limits; the %s time "
                            + "limit is split over %d searches, %s each, seed %d", f.points(),
                    Texts.duration(f.all().timeLimit()), f.points() + 1, Texts.duration(f.each().timeLimit()),
                    f.each().seed());
            case SearchStage.TightestSearch t -> "breakwater: the smallest worst excursion within reach";
            case SearchStage.LimitSearch l -> "breakwater: limit " + l.index() + " of " + l.of();
        };
    }

    private static String solvers(SearchSettings s) {
        return String.format(Locale.ROOT, " with %d solver%s, seed %d%s", s.solvers(), Texts.plural(s.solvers()),
                s.seed(), s.moveLimit() > 0 ? ", move limit " + s.moveLimit() : "");
    }

    private static String keeping(SearchStage.Trimming t) {
        return Texts.keepRule(t.keep(), t.existing().figures())
                + (t.existingPartsOnly() ? " and only the existing part numbers" : "");
    }

    /** The line announcing the Monte Carlo samples. */
    public static String monteCarlo(MonteCarlo.Settings s) {
        return String.format(Locale.ROOT, "breakwater: Monte Carlo, %d samples on %d cores, seed %d", s.samples(),
                Runtime.getRuntime().availableProcessors(), s.seed());
    }

    /**
     * One progress line: elapsed, the best bank's verdict in words, cost, worst droop against what
     * {@code judge} allows (the narrowed band when the search has one), parts, speed.
     */
    public static String line(SearchProgress p, BankEvaluator judge) {
        Scenario scenario = judge.scenario();
        Judgement j = p.best();
        return String.format(Locale.ROOT, "  %6.1f s  %s; cost %.4f%s; worst droop %s%s of %s allowed; %d parts; %s",
                p.elapsedS(), inWords(j), j.costTotal(), Texts.currency(scenario.cost().currency()),
                atMost(j), format(j.droopV(), VOLTAGE), format(judge.operatingPointV() - judge.limits().lowerV(), VOLTAGE),
                j.totalParts(), speed(p));
    }

    /** "1234 banks/s", "1 bank/s"; in the start phase, what it has done instead (it judges few banks). */
    static String speed(SearchProgress p) {
        if (p.starting()) {
            return "building the start bank: " + p.startTrials() + " trial bank" + Texts.plural(p.startTrials())
                    + " sized on impedance";
        }
        long rate = Math.round(p.evaluationsPerSecond());
        return rate + (rate == 1 ? " bank/s" : " banks/s");
    }

    /**
     * One progress line of a frontier search, in the terms of the frontier: the worst excursion of the
     * best bank so far, against the limit being searched; during the search for the smallest excursion
     * there is no limit to show (that search runs against an unreachable one).
     */
    public static String frontierLine(SearchProgress p, BankEvaluator judge, boolean smallestExcursion) {
        Judgement j = p.best();
        String currency = Texts.currency(judge.scenario().cost().currency());
        double excursion = Math.max(j.droopV(), j.overshootV());
        String what = smallestExcursion
                ? "smallest worst excursion so far " + format(excursion, VOLTAGE)
                : (j.feasible() ? "within the limit" : "not yet within the limit") + "; worst excursion "
                + atMost(j) + format(excursion, VOLTAGE) + " (limit " + format(judge.operatingPointV() - judge.limits().lowerV(),
                VOLTAGE) + ")";
        return String.format(Locale.ROOT, "  %6.1f s  %s; cost %.4f%s; %d parts; %.0f banks/s", p.elapsedS(), what,
                j.costTotal(), currency, j.totalParts(), p.evaluationsPerSecond());
    }

    /**
     * "at most " when the judge settled the bank by a bound (the bank passes, and the figure shown is an
     * upper bound of its worst case, not the worst case itself); "" for exact figures.
     */
    static String atMost(Judgement j) {
        return j.figuresExact() ? "" : "at most ";
    }

    /** "meets spec" or what is still missing, e.g. "misses by 3.2 mV (droop)". */
    static String inWords(Judgement j) {
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
