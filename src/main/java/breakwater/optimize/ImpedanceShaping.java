package breakwater.optimize;

import breakwater.design.Candidates;
import breakwater.catalog.Part;
import breakwater.design.BankEvaluator;
import breakwater.design.BoardCheck;
import breakwater.design.CapacitorBank;
import breakwater.network.FrequencyGrid;
import breakwater.network.ImpedanceEngine;
import breakwater.network.NetworkBuilder;
import breakwater.network.PartBranches;
import breakwater.network.SeriesBranch;
import breakwater.scenario.Scenario;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.LongAdder;
import java.util.function.BooleanSupplier;
import java.util.function.Predicate;

/**
 * A fast first bank for the search, built on impedance alone (no worst-case computation in its inner
 * loop): push |Z| under a line α·Z_t across the band by adding, one at a time, the part that removes the
 * most "area above the line" per unit of cost, within the board limits; then check the exact worst case
 * and, if it still fails, lower α by 10 % and continue from there. A flat impedance at α·Z_t gives a
 * worst case of about α·ΔI·Z_t (common practice: a flat impedance equal to the target keeps the excursion
 * at ΔI·Z_t), so a few rounds usually reach a bank that meets the spec; the local search then makes it
 * cheaper.
 */
final class ImpedanceShaping {
    private static final int POINTS_PER_DECADE = 20;
    private static final int MAX_ROUNDS = 12;

    private ImpedanceShaping() {
    }

    /**
     * @param meetsSpec the exact judge's verdict on a bank (counts aligned with {@code candidates})
     */
    static int[] start(BankEvaluator evaluator, Candidates candidates, int[] maxCounts, int[] from,
                       Predicate<int[]> meetsSpec) {
        return start(evaluator, candidates, maxCounts, from, meetsSpec, () -> true, new LongAdder());
    }

    /**
     * As {@link #start(BankEvaluator, Candidates, int[], int[], Predicate)}, stopping with the bank built so far
     * as soon as {@code goOn} says no (the time limit, a stop request): it is asked before every trial.
     *
     * @param trials counts the trial banks sized (one impedance sweep each), for progress
     */
    static int[] start(BankEvaluator evaluator, Candidates candidates, int[] maxCounts, int[] from,
                       Predicate<int[]> meetsSpec, BooleanSupplier goOn, LongAdder trials) {
        Scenario s = evaluator.scenario();
        List<SeriesBranch> units = new ArrayList<>();
        for (Part p : candidates.parts()) {
            units.add(PartBranches.single(p, evaluator.footprint()));
        }
        FrequencyGrid grid = FrequencyGrid.logarithmic(s.band().fromHz(), s.band().toHz(), POINTS_PER_DECADE);
        int[] regionOf = candidates.regions().stream().mapToInt(r -> s.regionNames().indexOf(r)).toArray();
        ImpedanceEngine engine = new ImpedanceEngine(NetworkBuilder.build(s, List.of(), evaluator.footprint()), units,
                regionOf, grid);
        double[] re = new double[grid.size()];
        double[] im = new double[grid.size()];
        double[] mag = new double[grid.size()];
        double[] unitCost = new double[candidates.size()];
        for (int i = 0; i < unitCost.length; i++) {
            unitCost[i] = candidates.part(i).unitCost() + s.cost().placementPerPart();
        }
        int[] counts = from.clone();
        double alpha = 1.0;
        for (int round = 0; round < MAX_ROUNDS; round++) {
            double line = alpha * s.rail().targetImpedanceOhms();
            double area = area(engine, counts, re, im, mag, line);
            while (area > 0) {
                int best = -1;
                double bestGain = 0;
                double bestArea = area;
                for (int p = 0; p < counts.length; p++) {
                    if (counts[p] >= maxCounts[p]) {
                        continue;
                    }
                    if (!goOn.getAsBoolean()) {
                        return counts;
                    }
                    trials.increment();
                    counts[p]++;
                    boolean fits = BoardCheck.violations(candidates.bank(counts), s.board(), s.regions()).isEmpty();
                    double a = fits ? area(engine, counts, re, im, mag, line) : area;
                    counts[p]--;
                    double addedCost = unitCost[p] + (counts[p] == 0 ? s.cost().perLineItem() : 0);
                    double gain = (area - a) / Math.max(addedCost, 1e-9);
                    if (a < area && gain > bestGain) {
                        bestGain = gain;
                        best = p;
                        bestArea = a;
                    }
                }
                if (best < 0) {
                    break; // no single part lowers |Z| further within the board limits
                }
                counts[best]++;
                area = bestArea;
            }
            if (!goOn.getAsBoolean() || meetsSpec.test(counts)) {
                return counts;
            }
            alpha *= 0.9;
        }
        return counts;
    }

    /** Σ over the band grid of max(0, |Z| − line)/line: how far, and how widely, |Z| stands above the line. */
    private static double area(ImpedanceEngine engine, int[] counts, double[] re, double[] im, double[] mag, double line) {
        engine.magnitudes(counts, re, im, mag);
        double a = 0;
        for (double m : mag) {
            if (m > line) {
                a += (m - line) / line;
            }
        }
        return a;
    }
}
