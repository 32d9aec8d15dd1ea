package breakwater.design;

import breakwater.catalog.BankEntry;
import breakwater.catalog.Part;
import breakwater.network.FrequencyGrid;
import breakwater.network.ImpedanceEngine;
import breakwater.network.NetworkBuilder;
import breakwater.network.PartBranches;
import breakwater.network.PowerNetwork;
import breakwater.network.SeriesBranch;
import breakwater.scenario.Rail;
import breakwater.scenario.Scenario;

import java.util.ArrayList;
import java.util.List;

/**
 * The solver's fast path through {@link BankEvaluator}: judges a bank given as counts over a fixed list
 * of candidate parts. The worst case is the exact one (the same computation as
 * {@link BankEvaluator#evaluate}); flatness is read on a coarser grid over the band only
 * ({@value #POINTS_PER_DECADE} points per decade, no refinement), which is enough to rank banks; the
 * final verdict always comes from a full evaluation. Not thread-safe: one per solver thread.
 */
public final class CandidateJudge {
    /** Grid density for the solver's flatness figures. */
    public static final int POINTS_PER_DECADE = 40;

    private final BankEvaluator evaluator;
    private final List<Part> candidates;
    private final ImpedanceEngine engine;
    private final double[] re;
    private final double[] im;
    private final double[] unitCost;

    public CandidateJudge(BankEvaluator evaluator, List<Part> candidates) {
        this.evaluator = evaluator;
        this.candidates = List.copyOf(candidates);
        Scenario s = evaluator.scenario();
        PowerNetwork fixed = NetworkBuilder.build(s, List.of(), evaluator.footprint());
        List<SeriesBranch> units = new ArrayList<>();
        for (Part p : this.candidates) {
            units.add(PartBranches.single(p, evaluator.footprint()));
        }
        FrequencyGrid grid = FrequencyGrid.logarithmic(s.band().fromHz(), s.band().toHz(), POINTS_PER_DECADE);
        this.engine = new ImpedanceEngine(fixed, units, grid);
        this.re = new double[grid.size()];
        this.im = new double[grid.size()];
        this.unitCost = this.candidates.stream().mapToDouble(Part::unitCost).toArray();
    }

    public List<Part> candidates() {
        return candidates;
    }

    /** Judges the bank with {@code counts[i]} parts of candidate i. */
    public Judgement judge(int[] counts) {
        Scenario s = evaluator.scenario();
        Rail rail = s.rail();
        engine.sweep(counts, re, im);
        double peak = 0;
        double min = Double.POSITIVE_INFINITY;
        for (int k = 0; k < re.length; k++) {
            double m = Math.sqrt(re[k] * re[k] + im[k] * im[k]);
            peak = Math.max(peak, m);
            min = Math.min(min, m);
        }
        double target = rail.targetImpedanceOhms();
        double ripple = 20 * Math.log10(peak / min);

        List<BankEntry> entries = new ArrayList<>();
        int total = 0;
        double partsCost = 0;
        for (int i = 0; i < counts.length; i++) {
            if (counts[i] > 0) {
                entries.add(new BankEntry(candidates.get(i), counts[i]));
                total += counts[i];
                partsCost += unitCost[i] * counts[i];
            }
        }
        CapacitorBank bank = new CapacitorBank(entries);
        double cost = partsCost + s.cost().placementPerPart() * total + s.cost().perLineItem() * entries.size();
        int boardExcess = 0;
        for (BoardCheck.Violation v : BoardCheck.violations(bank, s.board())) {
            boardExcess += v.excess();
        }
        WorstCaseFigures wc = evaluator.worstCaseFigures(NetworkBuilder.build(s, entries, evaluator.footprint()));
        double targetExcess = s.requireTarget() ? Math.max(0, peak / target - 1) : 0;
        return new Judgement(wc.droopV(), wc.overshootV(), wc.droopExcessV(), wc.overshootExcessV(), boardExcess,
                targetExcess, cost, ripple, peak / target, total);
    }
}
