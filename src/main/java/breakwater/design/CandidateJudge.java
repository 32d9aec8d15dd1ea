package breakwater.design;

import breakwater.catalog.Part;
import breakwater.network.FrequencyGrid;
import breakwater.network.ImpedanceAnalysis;
import breakwater.network.ImpedanceEngine;
import breakwater.network.NetworkBuilder;
import breakwater.network.PartBranches;
import breakwater.network.PowerNetwork;
import breakwater.network.SeriesBranch;
import breakwater.scenario.Rail;
import breakwater.scenario.Scenario;
import breakwater.timedomain.PoleResidueModel;

import java.util.ArrayList;
import java.util.List;

/**
 * The solver's fast path through {@link BankEvaluator}: judges a bank given as counts over a fixed list
 * of candidate parts. The worst case is the exact one (the same computation as
 * {@link BankEvaluator#evaluate}); flatness is read on a coarser grid over the band only
 * ({@value #POINTS_PER_DECADE} points per decade), with the two highest peaks refined by the full
 * analysis's Brent search when the target is required and near, which is enough to rank banks; the
 * final verdict always comes from a full evaluation. Not thread-safe: one per solver thread.
 */
public final class CandidateJudge {
    /** Grid density for the solver's flatness figures. */
    public static final int POINTS_PER_DECADE = 50;

    private final BankEvaluator evaluator;
    private final List<Part> candidates;
    private final ImpedanceEngine engine;
    private final double[] re;
    private final double[] im;
    private final double[] mag;
    /** Relative guard on the required-target check; see {@link #judge}. */
    static final double TARGET_GUARD = 1e-6;
    /** Peaks above this share of the target are refined when the target is required. */
    static final double REFINE_ABOVE = 0.8;
    private final double[] unitCost;
    private final PowerNetwork fixed;
    private final List<SeriesBranch> units;
    /** Per candidate, the index of its case among the board's max_per_case limits, or −1. */
    private final int[] caseLimitIndex;
    private final int[] caseLimits;
    private final int[] perCase;
    private long unjudged;
    /**
     * The last model built for each set of distinct parts in use (least recently used dropped): the next
     * bank with the same parts starts its pole search there ({@link PoleResidueModel#near}).
     */
    private final java.util.LinkedHashMap<java.util.BitSet, PoleResidueModel> recentModels =
            new java.util.LinkedHashMap<>(64, 0.75f, true) {
                @Override
                protected boolean removeEldestEntry(java.util.Map.Entry<java.util.BitSet, PoleResidueModel> eldest) {
                    return size() > RECENT_MODELS;
                }
            };
    static final int RECENT_MODELS = 256;
    private final boolean warmStart;
    private long models;
    private long warmStarts;

    public CandidateJudge(BankEvaluator evaluator, List<Part> candidates) {
        this(evaluator, candidates, true);
    }

    /**
     * @param warmStart whether a bank's poles may start from those of the last bank with the same parts
     *                  ({@link PoleResidueModel#near}); false builds every model by the eigenvalue search
     *                  (the same figures to rounding, slower: for benchmarks and cross-checks)
     */
    public CandidateJudge(BankEvaluator evaluator, List<Part> candidates, boolean warmStart) {
        this.warmStart = warmStart;
        this.evaluator = evaluator;
        this.candidates = List.copyOf(candidates);
        Scenario s = evaluator.scenario();
        this.fixed = NetworkBuilder.build(s, List.of(), evaluator.footprint());
        List<SeriesBranch> unitList = new ArrayList<>();
        for (Part p : this.candidates) {
            unitList.add(PartBranches.single(p, evaluator.footprint()));
        }
        this.units = List.copyOf(unitList);
        List<String> limitedCases = new ArrayList<>(s.board().maxPerCase().keySet());
        this.caseLimits = limitedCases.stream().mapToInt(c -> s.board().maxPerCase().get(c)).toArray();
        this.perCase = new int[caseLimits.length];
        this.caseLimitIndex = this.candidates.stream().mapToInt(p -> limitedCases.indexOf(p.caseCode())).toArray();
        FrequencyGrid grid = FrequencyGrid.logarithmic(s.band().fromHz(), s.band().toHz(), POINTS_PER_DECADE);
        this.engine = new ImpedanceEngine(fixed, this.units, grid);
        this.re = new double[grid.size()];
        this.im = new double[grid.size()];
        this.mag = new double[grid.size()];
        this.unitCost = this.candidates.stream().mapToDouble(Part::unitCost).toArray();
    }

    public List<Part> candidates() {
        return candidates;
    }

    /** Candidates whose model failed its self-checks (scored as far outside the limits). */
    public long unjudged() {
        return unjudged;
    }

    /**
     * How this judge's models started so far.
     *
     * @param models     models built
     * @param warmStarts how many of them started from a neighbour's poles ({@link PoleResidueModel#near})
     */
    public record ModelStarts(long models, long warmStarts) {
    }

    /** Models built so far, and how many of them started from a neighbour's poles. */
    public ModelStarts modelStarts() {
        return new ModelStarts(models, warmStarts);
    }

    /** Judges the bank with {@code counts[i]} parts of candidate i. */
    public Judgement judge(int[] counts) {
        Scenario s = evaluator.scenario();
        Rail rail = s.rail();
        engine.sweep(counts, re, im);
        double peak = 0;
        double min = Double.POSITIVE_INFINITY;
        int at = 0;
        for (int k = 0; k < re.length; k++) {
            double m = Math.sqrt(re[k] * re[k] + im[k] * im[k]);
            mag[k] = m;
            if (m > peak) {
                peak = m;
                at = k;
            }
            min = Math.min(min, m);
        }
        double target = rail.targetImpedanceOhms();
        double flatness = 20 * Math.log10(peak / min);

        // the bank's network and board figures straight from the counts (same rules as NetworkBuilder and
        // BoardCheck, which the full evaluation uses; a test holds the two paths together)
        List<SeriesBranch> board = new ArrayList<>(fixed.boardBranches());
        int total = 0;
        int distinct = 0;
        java.util.BitSet used = new java.util.BitSet(counts.length);
        double partsCost = 0;
        java.util.Arrays.fill(perCase, 0);
        for (int i = 0; i < counts.length; i++) {
            int n = counts[i];
            if (n > 0) {
                board.add(units.get(i).parallel(n));
                total += n;
                distinct++;
                used.set(i);
                partsCost += unitCost[i] * n;
                if (caseLimitIndex[i] >= 0) {
                    perCase[caseLimitIndex[i]] += n;
                }
            }
        }
        double cost = partsCost + s.cost().placementPerPart() * total + s.cost().perLineItem() * distinct;
        int boardExcess = 0;
        if (s.board().maxParts() >= 0 && total > s.board().maxParts()) {
            boardExcess += total - s.board().maxParts();
        }
        if (s.board().maxDistinct() >= 0 && distinct > s.board().maxDistinct()) {
            boardExcess += distinct - s.board().maxDistinct();
        }
        for (int c = 0; c < perCase.length; c++) {
            if (perCase[c] > caseLimits[c]) {
                boardExcess += perCase[c] - caseLimits[c];
            }
        }
        PowerNetwork network = new PowerNetwork(fixed.regulatorResistanceOhms(), fixed.regulatorInductanceH(), board,
                fixed.hasPackage(), fixed.packageResistanceOhms(), fixed.packageInductanceH(), fixed.loadBranches());
        // where the target is required and the peak comes near it, refine the two highest local maxima of the
        // grid on the network itself with the full analysis's own Brent search, so the solver's target
        // check agrees with the final verdict (elsewhere the grid value ranks banks well enough)
        boolean refine = s.requireTarget() && peak > REFINE_ABOVE * rail.targetImpedanceOhms();
        int second = -1;
        for (int k = 1; k < mag.length - 1; k++) {
            if (k != at && mag[k] > mag[k - 1] && mag[k] >= mag[k + 1] && (second < 0 || mag[k] > mag[second])) {
                second = k;
            }
        }
        double[] fHz = engine.grid().frequenciesHz();
        for (int k : new int[] {at, second}) {
            if (refine && k > 0 && k < mag.length - 1) {
                peak = Math.max(peak, ImpedanceAnalysis.refineExtremum(network::magnitude, fHz[k - 1], fHz[k + 1], true).magnitudeOhms());
            }
        }
        double targetExcess = s.requireTarget() ? Math.max(0, peak * (1 + TARGET_GUARD) / target - 1) : 0;
        WorstCaseVolts wc;
        try {
            PoleResidueModel near = warmStart ? recentModels.get(used) : null;
            PoleResidueModel model = near != null ? near.near(network) : PoleResidueModel.of(network);
            recentModels.put(used, model);
            models++;
            if (model.warmStarted()) {
                warmStarts++;
            }
            wc = evaluator.worstCaseVolts(network, model);
        } catch (breakwater.timedomain.ModelException unsolvable) {
            // The model of this one candidate failed its self-checks: it cannot be judged, so the search
            // must not pick it. It scores as a volt beyond both limits; the final verdict always comes
            // from a full evaluation, which would report the failure as an internal error.
            unjudged++;
            double lower = evaluator.limits().lowerV();
            double upper = evaluator.limits().upperV();
            wc = new WorstCaseVolts(1, 1, evaluator.operatingPointV(), lower - 1, upper + 1, lower, upper,
                    Double.POSITIVE_INFINITY);
        }
        return new Judgement(wc.droopV(), wc.overshootV(), wc.droopExcessV(), wc.overshootExcessV(), boardExcess,
                targetExcess, cost, flatness, peak / target, total);
    }
}
