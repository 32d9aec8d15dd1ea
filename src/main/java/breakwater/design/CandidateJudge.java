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
import breakwater.timedomain.WorstCaseBounds;

import java.util.ArrayList;
import java.util.List;

/**
 * The solver's fast path through {@link BankEvaluator}: judges a bank given as counts over a fixed list
 * of candidate parts. The worst case is the exact one (the same computation as
 * {@link BankEvaluator#evaluate}); flatness is read on a coarser grid over the band only
 * ({@value #POINTS_PER_DECADE} points per decade), with the two highest peaks refined by the full
 * analysis's Brent search when the target is required and near, which is enough to rank banks; the
 * final verdict always comes from a full evaluation. Cheap bounds settle clear cases first
 * (docs/search.md#bounds-in-the-judge): a bank whose upper bound stays inside the limits passes without
 * the exact computation, and its judgement's droop and overshoot are then upper bounds
 * ({@link Judgement#figuresExact()} false); a failing bank always gets its exact excess.
 * Not thread-safe: one per solver thread.
 */
public final class CandidateJudge {
    /** Grid density for the solver's flatness figures. */
    public static final int POINTS_PER_DECADE = 50;

    private final BankEvaluator evaluator;
    private final Candidates candidates;
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
    /** Per candidate, its region's index in the scenario (−1: the board node). */
    private final int[] regionOf;
    /** Per region, its max_parts (−1: none). */
    private final int[] regionMaxParts;
    private final int[] regionTotal;
    /** Per candidate, the index of (its region, its case) among the regions' max_per_case limits, or −1. */
    private final int[] regionCaseIndex;
    private final int[] regionCaseLimits;
    private final int[] regionPerCase;
    private final boolean[] partUsed;
    private long unjudged;
    /**
     * The last models built for each set of distinct parts in use (sets least recently used dropped): the
     * next bank with the same parts starts its pole search from the one whose counts are nearest
     * ({@link PoleResidueModel#near}).
     */
    private final java.util.LinkedHashMap<java.util.BitSet, RecentModels> recentModels =
            new java.util.LinkedHashMap<>(64, 0.75f, true) {
                @Override
                protected boolean removeEldestEntry(java.util.Map.Entry<java.util.BitSet, RecentModels> eldest) {
                    return size() > RECENT_MODELS;
                }
            };
    static final int RECENT_MODELS = 256;
    /**
     * Models kept per set of parts. A search walks back and forth among neighbours; the nearest of the last
     * few is a closer start than the last one alone after a longer jump (Newton's method from a start too
     * far away may miss a zero, and the warm start then falls back to the eigenvalue search).
     */
    static final int MODELS_PER_SET = 4;

    /** The last {@link #MODELS_PER_SET} models of one set of parts, with the counts they were built for. */
    private static final class RecentModels {
        final int[][] counts = new int[MODELS_PER_SET][];
        final PoleResidueModel[] models = new PoleResidueModel[MODELS_PER_SET];
        int next;

        /** The model whose counts are nearest to {@code c} (sum of count differences; the latest on ties). */
        PoleResidueModel nearest(int[] c) {
            PoleResidueModel best = null;
            long bestDistance = Long.MAX_VALUE;
            for (int age = 0; age < MODELS_PER_SET; age++) {
                int slot = Math.floorMod(next - 1 - age, MODELS_PER_SET);
                if (models[slot] == null) {
                    break;
                }
                long d = 0;
                for (int i = 0; i < c.length; i++) {
                    d += Math.abs(c[i] - counts[slot][i]);
                }
                if (d < bestDistance) {
                    bestDistance = d;
                    best = models[slot];
                }
            }
            return best;
        }

        void add(int[] c, PoleResidueModel model) {
            counts[next] = c.clone();
            models[next] = model;
            next = (next + 1) % MODELS_PER_SET;
        }
    }
    private final boolean warmStart;
    private long models;
    private long warmStarts;
    private long judgements;
    private long passedByModelSum;
    private long passedByIdealEdges;
    private long failedByImpedance;
    /** Longest pause, in judgements, of the ideal-edge bound after it failed to settle banks. */
    static final int IDEAL_SKIP_MAX = 15;
    private int idealSkip;
    private int idealWait;

    public CandidateJudge(BankEvaluator evaluator, List<Part> candidates) {
        this(evaluator, Candidates.of(candidates), true);
    }

    public CandidateJudge(BankEvaluator evaluator, Candidates candidates) {
        this(evaluator, candidates, true);
    }

    /** As {@link #CandidateJudge(BankEvaluator, Candidates, boolean)} for the parts on the board node. */
    public CandidateJudge(BankEvaluator evaluator, List<Part> candidates, boolean warmStart) {
        this(evaluator, Candidates.of(candidates), warmStart);
    }

    /**
     * @param warmStart whether a bank's poles may start from those of the last bank with the same parts
     *                  ({@link PoleResidueModel#near}); false builds every model by the eigenvalue search
     *                  (the same figures to rounding, slower: for benchmarks and cross-checks)
     */
    public CandidateJudge(BankEvaluator evaluator, Candidates candidates, boolean warmStart) {
        this.warmStart = warmStart;
        this.evaluator = evaluator;
        this.candidates = candidates;
        Scenario s = evaluator.scenario();
        this.fixed = NetworkBuilder.build(s, List.of(), evaluator.footprint());
        List<SeriesBranch> unitList = new ArrayList<>();
        for (Part p : candidates.parts()) {
            unitList.add(PartBranches.single(p, evaluator.footprint()));
        }
        this.units = List.copyOf(unitList);
        List<String> limitedCases = new ArrayList<>(s.board().maxPerCase().keySet());
        this.caseLimits = limitedCases.stream().mapToInt(c -> s.board().maxPerCase().get(c)).toArray();
        this.perCase = new int[caseLimits.length];
        this.caseLimitIndex = candidates.parts().stream().mapToInt(p -> limitedCases.indexOf(p.caseCode())).toArray();
        List<String> regionNames = s.regionNames();
        int n = candidates.size();
        this.regionOf = new int[n];
        this.regionCaseIndex = new int[n];
        List<String> regionCases = new ArrayList<>();
        List<Integer> regionCaseMax = new ArrayList<>();
        for (breakwater.scenario.Region r : s.regions()) {
            for (var limit : r.room().maxPerCase().entrySet()) {
                regionCases.add(r.name() + '\u0000' + limit.getKey());
                regionCaseMax.add(limit.getValue());
            }
        }
        for (int i = 0; i < n; i++) {
            String region = candidates.region(i);
            regionOf[i] = region.isEmpty() ? -1 : regionNames.indexOf(region);
            if (regionOf[i] < 0 && (!region.isEmpty() || !regionNames.isEmpty())) {
                throw new IllegalArgumentException("candidate " + candidates.part(i).name() + " in region '" + region
                        + "', the scenario's regions are " + regionNames);
            }
            regionCaseIndex[i] = regionCases.indexOf(region + '\u0000' + candidates.part(i).caseCode());
        }
        this.regionMaxParts = s.regions().stream().mapToInt(r -> r.room().maxParts()).toArray();
        this.regionTotal = new int[regionMaxParts.length];
        this.regionCaseLimits = regionCaseMax.stream().mapToInt(Integer::intValue).toArray();
        this.regionPerCase = new int[regionCaseLimits.length];
        this.partUsed = new boolean[candidates.distinctParts()];
        FrequencyGrid grid = FrequencyGrid.logarithmic(s.band().fromHz(), s.band().toHz(), POINTS_PER_DECADE);
        this.engine = regionNames.isEmpty() ? new ImpedanceEngine(fixed, this.units, grid)
                : new ImpedanceEngine(fixed, this.units, regionOf, grid);
        this.re = new double[grid.size()];
        this.im = new double[grid.size()];
        this.mag = new double[grid.size()];
        this.unitCost = candidates.parts().stream().mapToDouble(Part::unitCost).toArray();
    }

    public Candidates candidates() {
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

    /**
     * What the cheap bounds settled so far (docs/search.md#bounds-in-the-judge).
     *
     * @param judgements         judgements made
     * @param passedByModelSum   banks settled as passing by the bound from the poles and residues alone
     *                           (no exact worst case computed)
     * @param passedByIdealEdges banks with an edge time settled as passing by their ideal-edge worst case
     *                           (the slew-limited dynamic program skipped)
     * @param failedByImpedance  banks whose |Z| lower bound already lies beyond a limit: their verdict is
     *                           settled (fail), but their exact excess is still computed for the score
     */
    public record BoundsSettled(long judgements, long passedByModelSum, long passedByIdealEdges,
                                long failedByImpedance) {

        /** Judgements whose worst-case figures are upper bounds rather than the exact values. */
        public long bounded() {
            return passedByModelSum + passedByIdealEdges;
        }
    }

    /** How many judgements each bound settled so far. */
    public BoundsSettled boundsSettled() {
        return new BoundsSettled(judgements, passedByModelSum, passedByIdealEdges, failedByImpedance);
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
        double[] fHz = engine.grid().frequenciesHz();
        double flatness = 20 * Math.log10(peak / min);

        // the bank's network and board figures straight from the counts (same rules as NetworkBuilder and
        // BoardCheck, which the full evaluation uses; a test holds the two paths together)
        List<SeriesBranch> board = new ArrayList<>(fixed.boardBranches());
        List<List<SeriesBranch>> inRegion = new ArrayList<>();
        for (int r = 0; r < regionMaxParts.length; r++) {
            inRegion.add(new ArrayList<>());
        }
        int total = 0;
        int distinct = 0;
        java.util.BitSet used = new java.util.BitSet(counts.length);
        double partsCost = 0;
        java.util.Arrays.fill(perCase, 0);
        java.util.Arrays.fill(regionTotal, 0);
        java.util.Arrays.fill(regionPerCase, 0);
        java.util.Arrays.fill(partUsed, false);
        for (int i = 0; i < counts.length; i++) {
            int n = counts[i];
            if (n > 0) {
                SeriesBranch b = units.get(i).parallel(n);
                if (regionOf[i] < 0) {
                    board.add(b);
                } else {
                    inRegion.get(regionOf[i]).add(b);
                    regionTotal[regionOf[i]] += n;
                    if (regionCaseIndex[i] >= 0) {
                        regionPerCase[regionCaseIndex[i]] += n;
                    }
                }
                total += n;
                int part = candidates.partIndex(i);
                if (!partUsed[part]) {
                    partUsed[part] = true;
                    distinct++;
                }
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
        for (int r = 0; r < regionTotal.length; r++) {
            if (regionMaxParts[r] >= 0 && regionTotal[r] > regionMaxParts[r]) {
                boardExcess += regionTotal[r] - regionMaxParts[r];
            }
        }
        for (int c = 0; c < regionPerCase.length; c++) {
            if (regionPerCase[c] > regionCaseLimits[c]) {
                boardExcess += regionPerCase[c] - regionCaseLimits[c];
            }
        }
        List<breakwater.network.RegionPath> regions = new ArrayList<>(regionTotal.length);
        for (int r = 0; r < regionTotal.length; r++) {
            regions.add(fixed.regions().get(r).withBranches(inRegion.get(r)));
        }
        PowerNetwork network = new PowerNetwork(fixed.regulatorResistanceOhms(), fixed.regulatorInductanceH(), board,
                fixed.hasPackage(), fixed.packageResistanceOhms(), fixed.packageInductanceH(), fixed.loadBranches(),
                regions);
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
        for (int k : new int[] {at, second}) {
            if (refine && k > 0 && k < mag.length - 1) {
                peak = Math.max(peak, ImpedanceAnalysis.refineExtremum(network::magnitude, fHz[k - 1], fHz[k + 1], true).magnitudeOhms());
            }
        }
        double targetExcess = s.requireTarget() ? Math.max(0, peak * (1 + TARGET_GUARD) / target - 1) : 0;
        judgements++;
        double edgeTimeS = rail.edgeTimeS();
        double dcOhms = network.dcResistanceOhms();
        // a lower bound from |Z| on the sweep at hand: when it already lies beyond a limit the bank fails;
        // the exact excess is still computed, since the hard level ranks failing banks by it
        WorstCaseBounds.Bounds low = WorstCaseBounds.lower(fHz, mag, mag.length, dcOhms, edgeTimeS);
        boolean failsByBound = !volts(dcOhms, low).passes();
        if (failsByBound) {
            failedByImpedance++;
        }
        WorstCaseVolts wc;
        boolean exact = true;
        try {
            RecentModels recent = recentModels.get(used);
            PoleResidueModel near = warmStart && recent != null ? recent.nearest(counts) : null;
            PoleResidueModel model = near != null ? near.near(network) : PoleResidueModel.of(network);
            if (recent == null) {
                recent = new RecentModels();
                recentModels.put(used, recent);
            }
            recent.add(counts, model);
            models++;
            if (model.warmStarted()) {
                warmStarts++;
            }
            wc = failsByBound ? null : passingBound(model, dcOhms, edgeTimeS);
            if (wc != null) {
                exact = false;
            } else {
                wc = evaluator.worstCaseVolts(network, model);
                assert !(failsByBound && wc.passes()) : "the impedance lower bound contradicts the exact worst case";
            }
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
                targetExcess, cost, flatness, peak / target, total, exact);
    }

    /**
     * The bank's worst case as upper bounds when they already keep it inside the limits, else null: first
     * the bound from the poles and residues alone, then, with an edge time, the ideal-edge worst case
     * (docs/worst-case.md#cheap-bounds). The ideal-edge march costs a fraction of the slew-limited dynamic
     * program; after it fails to settle a bank it is skipped for the next 1, 3, 7, 15 judgements (doubling
     * while it keeps failing, back to every bank once it settles one), so a stretch of banks near their
     * limit pays at most a sixteenth of it. Which banks are settled this way changes no score: a passing
     * bank's hard level is 0 either way and no soft level reads the droop or overshoot.
     */
    private WorstCaseVolts passingBound(PoleResidueModel model, double dcOhms, double edgeTimeS) {
        WorstCaseVolts byModel = volts(dcOhms, WorstCaseBounds.upper(model, edgeTimeS));
        if (byModel.passes()) {
            passedByModelSum++;
            return byModel;
        }
        if (edgeTimeS == 0 || !model.hasFiniteDirectTerm()) {
            return null;
        }
        if (idealWait > 0) {
            idealWait--;
            return null;
        }
        WorstCaseVolts byIdeal;
        try {
            byIdeal = volts(dcOhms, WorstCaseBounds.idealEdges(model));
        } catch (breakwater.timedomain.UnboundedWorstCaseException e) {
            throw new IllegalStateException("finite direct term checked above", e);
        } catch (breakwater.timedomain.ModelException e) {
            // the march's own identity check failed: no bound, and the exact slew-limited computation,
            // which does not use the march, decides as it would without bounds
            byIdeal = null;
        }
        if (byIdeal != null && byIdeal.passes()) {
            passedByIdealEdges++;
            idealSkip = 0;
            return byIdeal;
        }
        idealSkip = Math.min(2 * idealSkip + 1, IDEAL_SKIP_MAX);
        idealWait = idealSkip;
        return null;
    }

    private WorstCaseVolts volts(double dcOhms, WorstCaseBounds.Bounds perAmpere) {
        return WorstCaseVolts.of(evaluator.scenario().rail(), dcOhms, perAmpere.droopOhms(), perAmpere.overshootOhms(),
                evaluator.limits().lowerV(), evaluator.limits().upperV());
    }
}
