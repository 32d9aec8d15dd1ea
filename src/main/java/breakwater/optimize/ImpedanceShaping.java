package breakwater.optimize;

import breakwater.design.Candidates;
import breakwater.catalog.Part;
import breakwater.design.BankEvaluator;
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
        return start(evaluator, candidates, maxCounts, from, meetsSpec, goOn, trials, Rule.PER_COST);
    }

    /** How a part to add is chosen. */
    enum Rule {
        /** the most area removed per unit of cost (cheap parts first: the cheapest bank's shape) */
        PER_COST,
        /**
         * the most area removed per part (the strongest part first): where the board's room, not the
         * price, is what runs out, a per-cost fill spends the room on small cheap parts and never reaches
         * the low frequencies that need bulk
         */
        PER_PART
    }

    /** As above, choosing each part to add by {@code rule}. */
    static int[] start(BankEvaluator evaluator, Candidates candidates, int[] maxCounts, int[] from,
                       Predicate<int[]> meetsSpec, BooleanSupplier goOn, LongAdder trials, Rule rule) {
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
        RoomCount room = new RoomCount(s, candidates);
        room.reset(counts);
        double alpha = 1.0;
        for (int round = 0; round < MAX_ROUNDS; round++) {
            double line = alpha * s.rail().targetImpedanceOhms();
            double area = area(engine, counts, re, im, mag, line);
            while (area > 0) {
                int best = -1;
                int bestBlock = 1;
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
                    // per part, a new type is tried as a block (a quarter of its largest count): one small
                    // part alone removes little, and the board's distinct-part limit is spent per type
                    int k = rule == Rule.PER_PART && counts[p] == 0 ? Math.max(1, (maxCounts[p] + 3) / 4) : 1;
                    if (!room.fits(p, k)) {
                        if (k == 1 || !room.fits(p, k = 1)) {
                            continue;
                        }
                    }
                    counts[p] += k;
                    double a = area(engine, counts, re, im, mag, line);
                    counts[p] -= k;
                    double addedCost = unitCost[p] + (counts[p] == 0 ? s.cost().perLineItem() : 0);
                    double gain = rule == Rule.PER_PART ? (area - a) / k : (area - a) / Math.max(addedCost, 1e-9);
                    if (a < area && gain > bestGain) {
                        bestGain = gain;
                        best = p;
                        bestArea = a;
                        bestBlock = k;
                    }
                }
                if (best < 0) {
                    break; // no single part lowers |Z| further within the board limits
                }
                counts[best] += bestBlock;
                for (int k = 0; k < bestBlock; k++) {
                    room.add(best);
                }
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
