package breakwater.timedomain;

/**
 * The lag grid of the slew-limited worst case (docs/worst-case.md#lag-grid-and-its-error-bound;
 * the discretisation gap falls with the square of the step): from 0 a step of min(t_e/8, T_min/48)
 * (T = 2π/|p|; at least T_min/{@value #FINEST_FRACTION}) over 24 periods of the fastest mode (at least
 * 16 t_e); then blocks of 16 steps, each block's step doubled but never above 1/48 of the period of any
 * mode still alive (less for modes of Q above {@value #HIGH_Q}); until every mode has decayed to
 * {@link #GRID_TAIL_TOLERANCE} (tail bound |w r| e^{Re(p) τ}/|Re p| relative to Σ|w r|/|Re p|). When the
 * load node has series inductance and t_e/8 is finer than that first step, the grid starts with 16 steps
 * of t_e/8, so that τ₁ ≤ t_e and the term L∞·(u₀ − u₁)/(τ₁ − τ₀) can reach L∞/t_e.
 *
 * <p>Error: the chain LP on this grid is exact for the piecewise-linear loads with kinks on its nodes,
 * so its optimum is a lower bound of the continuous one; it trails it by the cost of placing the
 * optimum's kinks on grid nodes, which falls with the square of the step. Measured below 5e-4 relative
 * (halving every step gains at most 1.2e-4 on a realistic network; see {@code LagGridTest}).
 * Beyond the grid's end the load holds its last value, and the tail beyond it is at most
 * {@link #GRID_TAIL_TOLERANCE} of Σ|w r|/|Re p|.
 *
 * <p>Stored as runs of equal steps: run r holds {@code runCount[r]} steps of {@code runStep[r]}, from
 * τ_0 = 0; within a run the lags are τ_{j₀ + i} = τ_{j₀} + i·Δ (one rounding each, no drift), so the
 * nominal steps that the hat weights are computed with ({@link HatWeights}) match the lags to rounding,
 * and runs of equal steps let the hat weights reuse e^{pΔ}. One instance is reused by one thread.
 */
final class LagGrid {

    /**
     * The grid is never finer than 1/192 of the fastest period (except the first 2·t_e when the load node
     * has series inductance): once edges are that short against every mode, finer steps change the optimum
     * by less than 1e-5 relative (measured in the tests) but cost time in proportion.
     */
    static final double FINEST_FRACTION = 192;

    /**
     * Beyond the fine region the step never exceeds 1/COARSEST_FRACTION of a live mode's period, and for
     * a mode of Q above {@value #HIGH_Q} a further Q/{@value #HIGH_Q} times less (at most 4 times): a
     * high-Q mode rings for many periods after the fine region, and the cost of placing the pattern's
     * kinks on grid nodes grows with the square of the step.
     */
    static final double COARSEST_FRACTION = 48;

    /** Quality factor above which the coarse steps shrink (see {@link #COARSEST_FRACTION}). */
    static final double HIGH_Q = 25;

    /**
     * Relative level (of Σ|w r|/|Re p|) below which a mode counts as decayed for the lag grid: the part of
     * ∫|h| left beyond the grid's end is below this, far inside the 5e-4 accuracy of the result, and each
     * further decade would cost only ln 10/|Re p| of lag, a few coarse blocks.
     */
    static final double GRID_TAIL_TOLERANCE = 1e-10;

    /**
     * Steps per edge time near lag 0: a step of at most t_e/8 puts eight nodes on every full ramp of
     * slope 1/t_e, so the kinks of the optimum are placed to within t_e/8; the discretisation gap falls
     * with the square of the step ({@code LagGridTest.gridRefinementAndIdealLimit}: halving
     * every step gains less than 3e-4).
     */
    static final int STEPS_PER_EDGE = 8;

    /**
     * The fine region lasts at least this many periods of the fastest mode: by then a mode of
     * Q = {@value #HIGH_Q} has rung down to e^{−π·24/25} ≈ 5 % of its amplitude; longer ringing is left
     * to the coarse steps, whose size each live mode limits.
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
     * The coarse step of a high-Q mode shrinks by Q/{@value #HIGH_Q} at most this many times, which
     * at Q = 100 makes it 1/192 of the period, as fine as the finest step; the bound keeps the grid from
     * growing without limit with Q ({@code EdgeLimitedWorstCaseTest
     * .highQResonanceWithAShortEdgeApproachesTheIdealLimit}: Q from 20 to 200 within 5e-4 of the ideal-edge
     * limit).
     */
    static final int MAX_HIGH_Q_SHRINK = 4;

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
    /** Per mode, the largest step allowed while it is alive. */
    private double[] stepCap = new double[0];

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
        for (int k = 0; k < nm; k++) {
            double b0 = m.weight[k] * Math.hypot(m.rr[k], m.ri[k]) / -m.pr[k];
            period[k] = 2 * Math.PI / Math.hypot(m.pr[k], m.pi[k]);
            double q = Math.hypot(m.pr[k], m.pi[k]) / (-2 * m.pr[k]);
            capStep[k] = period[k] / (COARSEST_FRACTION * Math.min(Math.max(q / HIGH_Q, 1), MAX_HIGH_Q_SHRINK));
            double ratio = b0 / (GRID_TAIL_TOLERANCE * total);
            dead[k] = ratio > 1 ? Math.log(ratio) / -m.pr[k] : 0;
            end = Math.max(end, dead[k]);
            tMin = Math.min(tMin, period[k]);
        }
        double step = Math.max(Math.min(edgeTimeS / STEPS_PER_EDGE, tMin / COARSEST_FRACTION), tMin / FINEST_FRACTION);
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
                    cap = Math.min(cap, capStep[k]);
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

    private void clear(int modes) {
        runs = 0;
        nodes = 1;
        if (period.length < modes) {
            period = new double[modes];
            dead = new double[modes];
            stepCap = new double[modes];
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
