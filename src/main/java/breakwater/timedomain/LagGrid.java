package breakwater.timedomain;

/**
 * The lag grid of the slew-limited worst case (docs/worst-case.md#lag-grid-and-its-error-bound).
 * Every mode k (period T_k = 2π/|p_k|, share s_k of S = Σ|w r|/|Re p|, the part of S it still holds
 * beyond lag τ being s_k·e^{Re(p_k)·τ}) allows at lag τ a step of at most T_k/F_k(τ), with
 * <pre>
 *   F_k(τ) = {@value #STEPS_PER_PERIOD}·√2·(s_k·e^{Re(p_k)·τ})^{1/4}·(Σ_j √s_j)^{1/2},  at most {@value #FINEST_FRACTION}.
 * </pre>
 * From 0 the step is min(max(t_e/8, T_min/{@value #FINEST_FRACTION}), min_k T_k/F_k(0)) over 24 periods of
 * the fastest mode (at least 16 t_e); then blocks of 16 steps, each block's step doubled when that stays
 * within T_k/F_k(τ) of every mode still alive; until every mode has decayed to
 * {@link #GRID_TAIL_TOLERANCE} of S. When the load node has series inductance and t_e/8 is finer than that
 * first step, the grid starts with 16 steps of t_e/8, so that τ₁ ≤ t_e and the term
 * L∞·(u₀ − u₁)/(τ₁ − τ₀) can reach L∞/t_e.
 *
 * <p>Error: the chain LP on this grid is exact for the piecewise-linear loads with kinks on its nodes,
 * so its optimum is a lower bound of the continuous one; it trails it by the cost of placing the
 * optimum's kinks on grid nodes. On a step δ a mode costs about C·(δ/T)² of the part of the worst case it
 * carries there, with C up to about 4.3 (measured: one resonance of Q 5 … 200, t_e from 1e-3 to 10
 * periods, gridded uniformly at T/128 gave at most 2.6e-4; the worst at t_e ≈ T/3 … T/10, where the
 * optimum is a trapezoid whose corners sit where h is large). The gap is then about
 * C·Σ_k ∫ (−ds_k(τ))/F_k(τ)², and with the F_k above each mode's integral is
 * 2√s_k/(2·{@value #STEPS_PER_PERIOD}²·Σ_j √s_j), so the sum is C/{@value #STEPS_PER_PERIOD}² ≈ 2.6e-4
 * whatever the shares: the allocation that spends the fewest nodes on that sum (steps that grow as a mode
 * decays, and coarser steps for modes that hold little of S). That is half of {@link #RELATIVE_ACCURACY},
 * which {@code LagGridBoundTest} holds against a grid eight times finer, against the closed-form
 * ideal-edge limit and, through the dynamic program it checks against a general LP solver, against a
 * linear program on the finer grid. Beyond the grid's end the load holds its last value, and the tail
 * beyond it is at most {@link #GRID_TAIL_TOLERANCE} of S.
 *
 * <p>Stored as runs of equal steps: run r holds {@code runCount[r]} steps of {@code runStep[r]}, from
 * τ_0 = 0; within a run the lags are τ_{j₀ + i} = τ_{j₀} + i·Δ (one rounding each, no drift), so the
 * nominal steps that the hat weights are computed with ({@link HatWeights}) match the lags to rounding,
 * and runs of equal steps let the hat weights reuse e^{pΔ}. One instance is reused by one thread.
 */
final class LagGrid {

    /**
     * The relative accuracy of the slew-limited worst case: the grid optimum is a lower bound of the
     * continuous one and trails it by less than this (docs/worst-case.md#lag-grid-and-its-error-bound).
     * The rule is built for about half of it (C/{@value #STEPS_PER_PERIOD}² ≈ 2.6e-4, see the class
     * comment), so that a rail whose error constant is somewhat larger than the measured ones still holds.
     */
    static final double RELATIVE_ACCURACY = 5e-4;

    /**
     * The error scale of the rule: the grid's gap is about C/128² ≈ 2.6e-4 (class comment), about half of
     * {@link #RELATIVE_ACCURACY}. A single resonance gets T/181 near lag 0, growing as it rings down.
     * Measured against a grid eight times finer: at most 2.0e-4 on single resonances and 1.3e-4 on random
     * rails (a uniform T/48, the earlier rule for the fine region, fell 2e-3 short).
     */
    static final double STEPS_PER_PERIOD = 128;

    /**
     * The grid is never finer than 1/192 of the fastest period (except the first 2·t_e when the load node
     * has series inductance), and no mode asks for more than 192 steps per period: once edges are that
     * short against every mode, finer steps change the optimum by less than 1e-5 relative (measured in the
     * tests) but cost time in proportion.
     */
    static final double FINEST_FRACTION = 192;

    /**
     * Relative level (of Σ|w r|/|Re p|) below which a mode counts as decayed for the lag grid: the part of
     * ∫|h| left beyond the grid's end is below this, far inside {@link #RELATIVE_ACCURACY}, and each
     * further decade would cost only ln 10/|Re p| of lag, a few coarse blocks.
     */
    static final double GRID_TAIL_TOLERANCE = 1e-10;

    /**
     * Steps per edge time near lag 0: a step of at most t_e/8 puts eight nodes on every full ramp of
     * slope 1/t_e, so the kinks of the optimum are placed to within t_e/8; the discretisation gap falls
     * with the square of the step.
     */
    static final int STEPS_PER_EDGE = 8;

    /**
     * The first step is kept (not doubled) over at least this many periods of the fastest mode: the
     * ramps nearest the worst instant weigh most, and by then a mode of Q = 25 has rung down to
     * e^{−π·24/25} ≈ 5 % of its amplitude; longer ringing is left to the blocks, whose step each live
     * mode limits.
     */
    static final int FINE_PERIODS = 24;

    /**
     * The fine region lasts at least this many edge times, so that when t_e is long against the fastest
     * period the first ramps before the worst instant, which weigh most, are still on the fine step.
     */
    static final int FINE_EDGE_TIMES = 16;

    /**
     * Steps per block beyond the fine region; each block may double the step once, so every decade of
     * lag beyond it costs about 16/log10(2) ≈ 53 nodes: gentle growth, and a grid that spans the eight
     * decades between the fastest and slowest modes in well under a thousand coarse nodes.
     */
    static final int STEPS_PER_BLOCK = 16;

    /**
     * With series inductance at the load node the grid starts with this many steps of t_e/8 (two edge
     * times), so that τ₁ ≤ t_e and the term L∞·(u₀ − u₁)/(τ₁ − τ₀) can reach L∞/t_e
     * ({@code EdgeLimitedWorstCaseTest.seriesRlLoadNodeGivesRPlusLOverTe}: R + L/t_e exactly).
     */
    static final int INDUCTIVE_START_STEPS = 16;

    /** Step of each run. */
    double[] runStep = new double[16];
    /** Number of steps in each run. */
    int[] runCount = new int[16];
    /** Lag at the start of each run. */
    double[] runBase = new double[16];
    /** Number of runs. */
    int runs;
    /** Number of lags (nodes), steps + 1. */
    int nodes;
    private double[] period = new double[0];
    private double[] dead = new double[0];
    /** Per mode, the largest step allowed at lag 0 before the clamp (see {@link #cap}). */
    private double[] stepCap = new double[0];
    /** Per mode, the rate −Re(p)/4 at which its largest step grows with lag. */
    private double[] decay = new double[0];

    /** The lags of the grid for {@code m} and edge time {@code edgeTimeS} &gt; 0 (a new array). */
    static double[] lags(PoleResidueModel m, double edgeTimeS) {
        LagGrid grid = new LagGrid();
        grid.build(m, edgeTimeS);
        return grid.lags();
    }

    /** Builds the grid of the class comment for {@code m} and edge time {@code edgeTimeS} &gt; 0, as runs. */
    void build(PoleResidueModel m, double edgeTimeS) {
        int nm = m.modes;
        clear(nm);
        if (nm == 0) {
            add(edgeTimeS / STEPS_PER_EDGE, 1);
            return;
        }
        double[] period = this.period;
        double[] dead = this.dead;
        double[] capStep = this.stepCap;
        double total = 0;
        for (int k = 0; k < nm; k++) {
            total += m.weight[k] * Math.hypot(m.rr[k], m.ri[k]) / -m.pr[k];
        }
        double tMin = Double.POSITIVE_INFINITY;
        double end = 0;
        double rootShares = 0;
        for (int k = 0; k < nm; k++) {
            double b0 = m.weight[k] * Math.hypot(m.rr[k], m.ri[k]) / -m.pr[k];
            period[k] = 2 * Math.PI / Math.hypot(m.pr[k], m.pi[k]);
            rootShares += Math.sqrt(share(b0, total));
            double ratio = b0 / (GRID_TAIL_TOLERANCE * total);
            dead[k] = ratio > 1 ? Math.log(ratio) / -m.pr[k] : 0;
            end = Math.max(end, dead[k]);
            tMin = Math.min(tMin, period[k]);
        }
        double firstCap = Double.POSITIVE_INFINITY;
        for (int k = 0; k < nm; k++) {
            double share = share(m.weight[k] * Math.hypot(m.rr[k], m.ri[k]) / -m.pr[k], total);
            capStep[k] = period[k] / (STEPS_PER_PERIOD * Math.sqrt(2 * Math.sqrt(share) * rootShares));
            decay[k] = -m.pr[k] / 4;
            if (dead[k] > 0) {
                firstCap = Math.min(firstCap, cap(k, 0));
            }
        }
        double step = Math.min(Math.max(edgeTimeS / STEPS_PER_EDGE, tMin / FINEST_FRACTION), firstCap);
        double fineEnd = Math.min(Math.max(FINE_PERIODS * tMin, FINE_EDGE_TIMES * edgeTimeS), Math.max(end, step));
        double tau = 0;
        if (m.seriesInductanceH() > 0 && edgeTimeS / STEPS_PER_EDGE < step) {
            // the series-inductance term L·(u₀ − u₁)/(τ₁ − τ₀) reaches L/t_e only with τ₁ ≤ t_e
            for (int i = 0; i < INDUCTIVE_START_STEPS; i++) {
                tau += edgeTimeS / STEPS_PER_EDGE;
            }
            add(edgeTimeS / STEPS_PER_EDGE, INDUCTIVE_START_STEPS);
        }
        // tau accumulates step by step: the loop decisions (and so the grid) are those of a running sum
        int q = 0;
        while (tau < fineEnd) {
            tau += step;
            q++;
        }
        add(step, q);
        while (tau < end) {
            double cap = Double.POSITIVE_INFINITY;
            for (int k = 0; k < nm; k++) {
                if (dead[k] > tau) {
                    cap = Math.min(cap, cap(k, tau));
                }
            }
            if (2 * step <= cap) {
                step *= 2;
            }
            q = 0;
            for (int i = 0; i < STEPS_PER_BLOCK && tau < end; i++) {
                tau += step;
                q++;
            }
            add(step, q);
        }
        if (nodes < 2) {
            add(step, 1);
        }
    }

    /**
     * The largest step mode k allows at lag τ: T_k/F_k(τ) with F_k(τ) of the class comment, never finer
     * than T_k/{@value #FINEST_FRACTION}.
     */
    private double cap(int k, double tau) {
        return Math.max(stepCap[k] * Math.exp(decay[k] * tau), period[k] / FINEST_FRACTION);
    }

    /** A mode's share b/total of Σ|w r|/|Re p| (1 when every mode is silent). */
    private static double share(double b, double total) {
        return total > 0 ? b / total : 1;
    }

    private void clear(int modes) {
        runs = 0;
        nodes = 1;
        if (period.length < modes) {
            period = new double[modes];
            dead = new double[modes];
            stepCap = new double[modes];
            decay = new double[modes];
        }
    }

    /** Appends {@code q} steps of {@code s}; returns the last lag. */
    double add(double s, int q) {
        if (q > 0) {
            nodes += q;
            if (runs > 0 && runStep[runs - 1] == s) {
                runCount[runs - 1] += q;
            } else {
                if (runs == runStep.length) {
                    runStep = java.util.Arrays.copyOf(runStep, 2 * runs);
                    runCount = java.util.Arrays.copyOf(runCount, 2 * runs);
                    runBase = java.util.Arrays.copyOf(runBase, 2 * runs);
                }
                runBase[runs] = lastLag();
                runStep[runs] = s;
                runCount[runs] = q;
                runs++;
            }
        }
        return lastLag();
    }

    /** The last lag, base + count·step of the last run (0 without runs). */
    double lastLag() {
        return runs == 0 ? 0.0 : runBase[runs - 1] + runCount[runs - 1] * runStep[runs - 1];
    }

    /** The lags, a new array of {@link #nodes} entries. */
    double[] lags() {
        double[] lags = new double[nodes];
        fillLags(lags);
        return lags;
    }

    /** Writes the lags into {@code lags[0 .. nodes − 1]}. */
    void fillLags(double[] lags) {
        lags[0] = 0;
        int k = 1;
        for (int r = 0; r < runs; r++) {
            double s = runStep[r];
            double b = runBase[r];
            int q = runCount[r];
            for (int i = 1; i <= q; i++) {
                lags[k++] = b + i * s;
            }
        }
    }
}
