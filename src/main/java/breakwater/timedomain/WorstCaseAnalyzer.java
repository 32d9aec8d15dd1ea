package breakwater.timedomain;

import java.util.Locale;

/**
 * The exact worst-case transient of a load node, per ampere of load step ΔI (Reverse Pulse Technique,
 * worst-case-math.md §2–3). The load current is i(t) = I_min + ΔI·u(t) with 0 &le; u &le; 1; the
 * voltage is v = V_nom − Z(0)·I_min − ΔI·(h ∗ u).
 *
 * <p>Ideal edges (t_e = 0): droop P = ∫max(h, 0) dt + max(D, 0), overshoot N = ∫max(−h, 0) dt +
 * max(−D, 0), integrated exactly between the zero crossings of h ({@link ImpulseMarch}); reached by
 * u(lag) = 1 where h(lag) &gt; 0 (droop) or h(lag) &lt; 0 (overshoot). P − N = Z(0) is checked.
 * Accuracy: relative 1e-10 (tail bound) plus about 1e-13 of Σ|r|/|Re p| from rounding.
 */
public final class WorstCaseAnalyzer {

    /** Tail bound for the ideal-edge march, relative to the accumulated ∫|h|. */
    static final double IDEAL_TAIL_TOLERANCE = 1e-10;

    private WorstCaseAnalyzer() {
    }

    /**
     * Worst case with ideal load edges (t_e = 0).
     *
     * @throws UnboundedWorstCaseException when Z(∞) is infinite (series inductance at the load node)
     */
    public static WorstCase idealEdges(PoleResidueModel model) throws UnboundedWorstCaseException {
        IdealSink sink = idealMarch(model, true);
        double d = model.directTermOhms();
        LoadPattern droopPattern = sink.pattern(true, d > 0);
        LoadPattern overshootPattern = sink.pattern(false, d < 0);
        return new WorstCase(sink.droop, Math.max(sink.overshoot, 0), droopPattern, overshootPattern, 0.0);
    }

    /** The ideal-edge march with the identity check; {@code crossings}: keep the sign changes for patterns. */
    private static IdealSink idealMarch(PoleResidueModel model, boolean crossings) throws UnboundedWorstCaseException {
        if (!model.hasFiniteDirectTerm()) {
            throw new UnboundedWorstCaseException(String.format(Locale.ROOT,
                    "rail.edge_time: the worst case is unbounded with ideal load edges, because the load node "
                            + "shows %.4g H of series inductance at high frequency (an ideal current step "
                            + "gives an infinite L·di/dt). Maybe add die or plane capacitance at the load "
                            + "node, or set rail.edge_time to the load's fastest edge",
                    model.seriesInductanceH()));
        }
        double d = model.directTermOhms();
        IdealSink sink = new IdealSink(crossings);
        new ImpulseMarch(model).run(IDEAL_TAIL_TOLERANCE, sink);
        double droop = sink.positive + Math.max(d, 0);
        double overshoot = sink.negative + Math.max(-d, 0);
        double z0 = model.dcResistanceOhms();
        if (!(Math.abs(droop - overshoot - z0) <= 1e-7 * (droop + overshoot) + 1e-15)) {
            throw new ModelException(String.format(Locale.ROOT,
                    "worst-case integration fails the identity droop - overshoot = Z(0): %.12g - %.12g vs %.12g",
                    droop, overshoot, z0));
        }
        sink.droop = droop;
        sink.overshoot = overshoot;
        return sink;
    }

    /**
     * Worst case for load edges no faster than {@code edgeTimeS}: ideal edges when it is 0, else the
     * exact slew-limited optimum ({@link #edgeLimited}).
     *
     * @throws UnboundedWorstCaseException when t_e = 0 and Z(∞) is infinite
     */
    public static WorstCase analyze(PoleResidueModel model, double edgeTimeS) throws UnboundedWorstCaseException {
        if (!(edgeTimeS >= 0) || !Double.isFinite(edgeTimeS)) {
            throw new IllegalArgumentException("edge time must be finite and >= 0, got " + edgeTimeS);
        }
        return edgeTimeS == 0 ? idealEdges(model) : edgeLimited(model, edgeTimeS);
    }

    /**
     * The exact worst case over every load current u(t) ∈ [0, 1] with |du/dt| ≤ 1/t_e
     * (worst-case-math.md §3): u piecewise linear on the lag grid of {@link #lagGrid}, objective
     * Σ w_k u_k with hat-function weights w_k = ∫ h φ_k in closed form per mode, D₀ on u₀, and for a load
     * node with series inductance L∞ the term L∞·(u₀ − u₁)/(τ₁ − τ₀); constraints 0 ≤ u_k ≤ 1,
     * |u_{k+1} − u_k| ≤ (τ_{k+1} − τ_k)/t_e; solved exactly by {@link ChainDp}, once for the droop
     * (maximise) and once for the overshoot (maximise the negative).
     *
     * <p>Accuracy: exact for the piecewise-linear loads on the grid, and the returned pattern reaches the
     * returned value exactly, so it is a true lower bound of the continuous optimum. The grid (steps of
     * min(t_e/8, T/48) near lag 0, never coarser than 1/48 of any live mode's period, finer still for
     * modes of Q above 25) trails the continuous optimum by the cost of placing its kinks on grid nodes:
     * measured below 5e-4 relative (halving every step gains at most 1.2e-4 on a realistic network; a
     * near-optimal ramped pattern beat the grid optimum by at most 4.3e-4 for one Q = 20 resonance at
     * t_e = T/2; one resonance of Q 20 … 200 at t_e = T/10⁴ stays within 1.6e-4 of the ideal-edge limit).
     *
     * @param edgeTimeS t_e &gt; 0
     */
    public static WorstCase edgeLimited(PoleResidueModel model, double edgeTimeS) {
        checkEdgeTime(edgeTimeS);
        Workspace ws = WORKSPACE.get();
        int n = prepare(model, edgeTimeS, ws);
        double[] lags = java.util.Arrays.copyOf(ws.lags, n);
        double[] uDroop = new double[n];
        double droop = ChainDp.solve(ws.w, 1.0, ws.c, n, uDroop, ws.dp);
        double[] uOver = new double[n];
        double overshoot = ChainDp.solve(ws.w, -1.0, ws.c, n, uOver, ws.dp);
        checkRecovered(ws.w, 1.0, n, uDroop, droop, "droop");
        checkRecovered(ws.w, -1.0, n, uOver, overshoot, "overshoot");
        return new WorstCase(Math.max(droop, 0), Math.max(overshoot, 0), new LoadPattern(lags, uDroop),
                new LoadPattern(lags, uOver), edgeTimeS);
    }

    /**
     * The worst-case figures alone, for scoring many candidates: the droop and overshoot that
     * {@link #analyze} returns for the same arguments (the same computation, bit for bit), without
     * building the load patterns. Reuses per-thread scratch buffers; safe to call from several threads.
     *
     * @throws UnboundedWorstCaseException when t_e = 0 and Z(∞) is infinite
     */
    public static WorstCasePerAmpere figures(PoleResidueModel model, double edgeTimeS)
            throws UnboundedWorstCaseException {
        if (!(edgeTimeS >= 0) || !Double.isFinite(edgeTimeS)) {
            throw new IllegalArgumentException("edge time must be finite and >= 0, got " + edgeTimeS);
        }
        if (edgeTimeS == 0) {
            IdealSink sink = idealMarch(model, false);
            return new WorstCasePerAmpere(sink.droop, Math.max(sink.overshoot, 0), 0.0);
        }
        Workspace ws = WORKSPACE.get();
        int n = prepare(model, edgeTimeS, ws);
        double droop = ChainDp.maximum(ws.w, 1.0, ws.c, n, ws.dp);
        double overshoot = ChainDp.maximum(ws.w, -1.0, ws.c, n, ws.dp);
        return new WorstCasePerAmpere(Math.max(droop, 0), Math.max(overshoot, 0), edgeTimeS);
    }

    /** The objective weights of the edge-limited path on {@link #lagGrid}'s lags (a copy, for cross-checks). */
    static double[] gridObjectiveWeights(PoleResidueModel model, double edgeTimeS) {
        Workspace ws = new Workspace();
        int n = prepare(model, edgeTimeS, ws);
        return java.util.Arrays.copyOf(ws.w, n);
    }

    private static void checkEdgeTime(double edgeTimeS) {
        if (!(edgeTimeS > 0) || !Double.isFinite(edgeTimeS)) {
            throw new IllegalArgumentException("edge-limited worst case needs an edge time > 0, got " + edgeTimeS);
        }
    }

    /**
     * Lag grid, objective weights and step limits of the chain LP into {@code ws}; returns the number of
     * nodes. Step limits c_k = (τ_{k+1} − τ_k)/t_e from the lags as stored, so the pattern of
     * {@link #edgeLimited} keeps its slope limit to rounding.
     */
    private static int prepare(PoleResidueModel model, double edgeTimeS, Workspace ws) {
        Grid grid = ws.grid;
        buildGrid(model, edgeTimeS, grid);
        int n = grid.nodes;
        ws.ensure(n);
        gridWeights(model, grid, ws);
        double[] c = ws.c;
        grid.fillLags(ws.lags);
        double[] lags = ws.lags;
        for (int k = 0; k + 1 < n; k++) {
            c[k] = (lags[k + 1] - lags[k]) / edgeTimeS;
        }
        return n;
    }

    /** Optimum of the chain LP on a given lag grid (for cross-checks); u receives the optimal pattern. */
    static double edgeLimitedOnGrid(PoleResidueModel model, double[] lags, double edgeTimeS, boolean droop,
                                    double[] u) {
        double[] w = objectiveWeights(model, lags);
        if (!droop) {
            for (int k = 0; k < w.length; k++) {
                w[k] = -w[k];
            }
        }
        return ChainDp.solve(w, stepLimits(lags, edgeTimeS), u);
    }

    /**
     * (h ∗ u)(T) + D₀·u(0) + L∞·u'(T) for a piecewise-linear pattern, exactly (hat weights on the
     * pattern's own lags; a jump is a segment of zero length). The pattern holds its last value beyond
     * its last lag, for ever back.
     */
    static double response(PoleResidueModel model, LoadPattern pattern) {
        double[] lags = pattern.lagsS();
        if (lags.length < 2) {
            double[] two = {0, 1e-9};
            double[] w = objectiveWeightsSmooth(model, two);
            return (w[0] + w[1]) * pattern.value(0) + model.constantTermOhms() * pattern.value(0);
        }
        if (model.seriesInductanceH() > 0 && !(lags[1] > lags[0])) {
            throw new IllegalArgumentException("a jump at the worst instant into series inductance is unbounded");
        }
        double[] w = objectiveWeights(model, lags);
        double sum = 0;
        for (int k = 0; k < lags.length; k++) {
            sum += w[k] * pattern.value(k);
        }
        return sum;
    }

    private static void checkRecovered(double[] w, double sign, int n, double[] u, double value, String what) {
        double sum = 0;
        double scale = 0;
        for (int k = 0; k < n; k++) {
            sum += sign * w[k] * u[k];
            scale += Math.abs(w[k]);
        }
        if (!(Math.abs(sum - value) <= 1e-9 * scale)) {
            throw new ModelException(String.format(Locale.ROOT,
                    "edge-limited %s: the recovered pattern gives %.12g, the dynamic program %.12g", what, sum, value));
        }
    }

    static double[] stepLimits(double[] lags, double edgeTimeS) {
        double[] c = new double[Math.max(lags.length - 1, 0)];
        for (int k = 0; k < c.length; k++) {
            c[k] = (lags[k + 1] - lags[k]) / edgeTimeS;
        }
        return c;
    }

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

    /** Relative level (of Σ|w r|/|Re p|) below which a mode counts as decayed for the lag grid. */
    static final double GRID_TAIL_TOLERANCE = 1e-10;

    /**
     * The lag grid of worst-case-math.md §3, with 1/48 where §3 says 1/24 (the discretisation gap falls
     * with the square of the step): from 0 a step of min(t_e/8, T_min/48) (T = 2π/|p|; at least
     * T_min/{@value #FINEST_FRACTION}) over 24 periods of the fastest mode (at least 16 t_e); then blocks
     * of 16 steps, each block's step doubled but never above 1/48 of the period of any mode still alive;
     * until every mode has decayed to {@link #GRID_TAIL_TOLERANCE} (tail bound |w r| e^{Re(p) τ}/|Re p|
     * relative to Σ|w r|/|Re p|). Runs of equal steps let the hat weights reuse e^{pΔ}. Within a run
     * the lags are τ_{j₀} + i·Δ (one rounding each, no drift), so the nominal steps that the hat weights
     * are computed with match the lags to rounding.
     */
    static double[] lagGrid(PoleResidueModel m, double edgeTimeS) {
        Grid grid = new Grid();
        buildGrid(m, edgeTimeS, grid);
        return grid.lags();
    }

    /**
     * A lag grid as runs of equal steps: run r holds count[r] steps of step[r], from τ_0 = 0; within a
     * run τ_{j₀ + i} = τ_{j₀} + i·step ({@link #lags()}).
     */
    static final class Grid {
        double[] step = new double[16];
        int[] count = new int[16];
        /** Lag at the start of each run. */
        double[] base = new double[16];
        int runs;
        /** Number of lags (nodes), steps + 1. */
        int nodes;
        double[] period = new double[0];
        double[] dead = new double[0];
        /** Per mode, the largest step allowed while it is alive. */
        double[] cap = new double[0];

        void clear(int modes) {
            runs = 0;
            nodes = 1;
            if (period.length < modes) {
                period = new double[modes];
                dead = new double[modes];
                cap = new double[modes];
            }
        }

        /** Appends {@code q} steps of {@code s}; returns the last lag. */
        double add(double s, int q) {
            if (q > 0) {
                nodes += q;
                if (runs > 0 && step[runs - 1] == s) {
                    count[runs - 1] += q;
                } else {
                    if (runs == step.length) {
                        step = java.util.Arrays.copyOf(step, 2 * runs);
                        count = java.util.Arrays.copyOf(count, 2 * runs);
                        base = java.util.Arrays.copyOf(base, 2 * runs);
                    }
                    base[runs] = lastLag();
                    step[runs] = s;
                    count[runs] = q;
                    runs++;
                }
            }
            return lastLag();
        }

        /** The last lag, base + count·step of the last run (0 without runs). */
        double lastLag() {
            return runs == 0 ? 0.0 : base[runs - 1] + count[runs - 1] * step[runs - 1];
        }

        double[] lags() {
            double[] lags = new double[nodes];
            fillLags(lags);
            return lags;
        }

        void fillLags(double[] lags) {
            lags[0] = 0;
            int k = 1;
            for (int r = 0; r < runs; r++) {
                double s = step[r];
                double b = base[r];
                int q = count[r];
                for (int i = 1; i <= q; i++) {
                    lags[k++] = b + i * s;
                }
            }
        }
    }

    /** The grid of {@link #lagGrid}, as runs. */
    static void buildGrid(PoleResidueModel m, double edgeTimeS, Grid grid) {
        int nm = m.modes;
        grid.clear(nm);
        if (nm == 0) {
            grid.add(edgeTimeS / 8, 1);
            return;
        }
        double[] period = grid.period;
        double[] dead = grid.dead;
        double[] capStep = grid.cap;
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
            capStep[k] = period[k] / (COARSEST_FRACTION * Math.min(Math.max(q / HIGH_Q, 1), 4));
            double ratio = b0 / (GRID_TAIL_TOLERANCE * total);
            dead[k] = ratio > 1 ? Math.log(ratio) / -m.pr[k] : 0;
            end = Math.max(end, dead[k]);
            tMin = Math.min(tMin, period[k]);
        }
        double step = Math.max(Math.min(edgeTimeS / 8, tMin / COARSEST_FRACTION), tMin / FINEST_FRACTION);
        double fineEnd = Math.min(Math.max(24 * tMin, 16 * edgeTimeS), Math.max(end, step));
        double tau = 0;
        if (m.seriesInductanceH() > 0 && edgeTimeS / 8 < step) {
            // the series-inductance term L·(u₀ − u₁)/(τ₁ − τ₀) reaches L/t_e only with τ₁ ≤ t_e
            for (int i = 0; i < 16; i++) {
                tau += edgeTimeS / 8;
            }
            grid.add(edgeTimeS / 8, 16);
        }
        // tau accumulates step by step: the loop decisions (and so the grid) are those of a running sum
        int q = 0;
        while (tau < fineEnd) {
            tau += step;
            q++;
        }
        grid.add(step, q);
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
            for (int i = 0; i < 16 && tau < end; i++) {
                tau += step;
                q++;
            }
            grid.add(step, q);
        }
        if (grid.nodes < 2) {
            grid.add(step, 1);
        }
    }

    /** Nodes per block of the weight computation: powers e^{pmΔ}, m &le; BLOCK, are tabulated per run. */
    private static final int BLOCK = 128;

    /** Reusable buffers of one thread: grid, weights, step limits, dynamic-program scratch, mode tables. */
    private static final class Workspace {
        final Grid grid = new Grid();
        final ChainDp.Scratch dp = new ChainDp.Scratch();
        double[] w = new double[0];
        double[] c = new double[0];
        double[] lags = new double[0];
        final double[] tmp = new double[BLOCK];
        final double[] f = new double[4];
        // per active mode: amplitude, block amplitude, e^{pΔ}, F_R, negligible level, model index, tables
        double[] ar = new double[0];
        double[] ai = new double[0];
        double[] cr = new double[0];
        double[] ci = new double[0];
        double[] er = new double[0];
        double[] ei = new double[0];
        double[] frr = new double[0];
        double[] fri = new double[0];
        double[] neg = new double[0];
        int[] idx = new int[0];
        double[][] qr = new double[0][];
        double[][] qi = new double[0][];
        double[][] gr = new double[0][];
        double[][] gi = new double[0][];

        void ensure(int nodes) {
            if (w.length < nodes) {
                int n = Math.max(nodes, 2 * w.length);
                w = new double[n];
                c = new double[n];
                lags = new double[n];
            }
        }

        void ensureModes(int m) {
            if (ar.length < m) {
                ar = new double[m];
                ai = new double[m];
                cr = new double[m];
                ci = new double[m];
                er = new double[m];
                ei = new double[m];
                frr = new double[m];
                fri = new double[m];
                neg = new double[m];
                idx = new int[m];
                qr = new double[m][BLOCK + 1];
                qi = new double[m][BLOCK + 1];
                gr = new double[m][BLOCK];
                gi = new double[m][BLOCK];
            }
        }

        /** Moves active mode slot {@code from} into slot {@code to} (tables by reference). */
        void move(int from, int to) {
            ar[to] = ar[from];
            ai[to] = ai[from];
            cr[to] = cr[from];
            ci[to] = ci[from];
            er[to] = er[from];
            ei[to] = ei[from];
            frr[to] = frr[from];
            fri[to] = fri[from];
            neg[to] = neg[from];
            idx[to] = idx[from];
            double[] t = qr[to];
            qr[to] = qr[from];
            qr[from] = t;
            t = qi[to];
            qi[to] = qi[from];
            qi[from] = t;
            t = gr[to];
            gr[to] = gr[from];
            gr[from] = t;
            t = gi[to];
            gi[to] = gi[from];
            gi[from] = t;
        }
    }

    private static final ThreadLocal<Workspace> WORKSPACE = ThreadLocal.withInitial(Workspace::new);

    /**
     * {@link #objectiveWeights} on a grid of runs, into {@code ws.w[0 .. nodes − 1]}. Within a run of q
     * steps Δ from node j₀ the hat weights of one mode (amplitude a = w r e^{pτ_{j₀}}) are
     * Re(a·F_L) to node j₀, Re(a·e^{pmΔ}·G) with G = e^{pΔ}F_L + F_R to the inner node j₀ + 1 + m, and
     * Re(a·e^{p(q−1)Δ}·F_R) to node j₀ + q (F_L = Δ f_L(pΔ), F_R = Δ f_R(pΔ), {@link Waveform#hatIntegrals}).
     * The powers e^{pmΔ}, m ≤ {@value #BLOCK}, are tabulated per mode and run by repeated squaring; the
     * inner nodes are filled block by block, every mode adding its tabulated G·e^{pmΔ} times its block
     * amplitude (an element-wise loop), which then advances by e^{p·BLOCK·Δ}. The same closed forms as
     * the lag-by-lag sum, up to rounding (measured below 4e-13 of Σ|w|). A mode is dropped once its
     * amplitude is below 1e-18 of Σ|w r|/|Re p| times |Re p| (its whole remaining integral).
     */
    private static void gridWeights(PoleResidueModel m, Grid grid, Workspace ws) {
        int n = grid.nodes;
        double[] w = ws.w;
        java.util.Arrays.fill(w, 0, n, 0.0);
        int nm = m.modes;
        ws.ensureModes(nm);
        double[] f = ws.f;
        double[] tmp = ws.tmp;
        double[] ar = ws.ar;
        double[] ai = ws.ai;
        double[] cr = ws.cr;
        double[] ci = ws.ci;
        double[] er = ws.er;
        double[] ei = ws.ei;
        double[] frr = ws.frr;
        double[] fri = ws.fri;
        double[] neg = ws.neg;
        int[] idx = ws.idx;
        double total = 0;
        for (int k = 0; k < nm; k++) {
            total += m.weight[k] * Math.hypot(m.rr[k], m.ri[k]) / -m.pr[k];
        }
        for (int k = 0; k < nm; k++) {
            ar[k] = m.weight[k] * m.rr[k];
            ai[k] = m.weight[k] * m.ri[k];
            neg[k] = 1e-18 * total * -m.pr[k];
            idx[k] = k;
        }
        int na = nm;
        int j0 = 0;
        for (int r = 0; r < grid.runs && na > 0; r++) {
            double dt = grid.step[r];
            int q = grid.count[r];
            int b = Math.min(BLOCK, q - 1);
            double first = 0;
            for (int a = 0; a < na; a++) {
                int k = idx[a];
                double zr = m.pr[k] * dt;
                double zi = m.pi[k] * dt;
                double e = Math.exp(zr);
                double xr = e * Math.cos(zi);
                double xi = e * Math.sin(zi);
                Waveform.hatIntegrals(zr, zi, xr, xi, f);
                double flr = f[2] * dt;
                double fli = f[3] * dt;
                er[a] = xr;
                ei[a] = xi;
                frr[a] = f[0] * dt;
                fri[a] = f[1] * dt;
                // node j0: the left half-hat of the run's first segment
                first += ar[a] * flr - ai[a] * fli;
                // powers e^{pmΔ}, m = 0 … b, by doubling; G·e^{pmΔ}, m < b
                double[] pr = ws.qr[a];
                double[] pi = ws.qi[a];
                pr[0] = 1;
                pi[0] = 0;
                int have = 1;
                double pwr = xr;
                double pwi = xi;
                while (have <= b) {
                    int add = Math.min(have, b + 1 - have);
                    for (int i = 0; i < add; i++) {
                        pr[have + i] = pr[i] * pwr - pi[i] * pwi;
                        pi[have + i] = pr[i] * pwi + pi[i] * pwr;
                    }
                    have += add;
                    double t = pwr * pwr - pwi * pwi;
                    pwi = 2 * pwr * pwi;
                    pwr = t;
                }
                double glr = xr * flr - xi * fli + frr[a];
                double gli = xr * fli + xi * flr + fri[a];
                double[] g1 = ws.gr[a];
                double[] g2 = ws.gi[a];
                for (int i = 0; i < b; i++) {
                    g1[i] = glr * pr[i] - gli * pi[i];
                    g2[i] = glr * pi[i] + gli * pr[i];
                }
                cr[a] = ar[a];
                ci[a] = ai[a];
            }
            w[j0] += first;
            // inner nodes j0 + 1 + i, i = 0 … q − 2, in blocks of at most b
            int inner = q - 1;
            for (int i0 = 0; i0 < inner; ) {
                int len = Math.min(b, inner - i0);
                java.util.Arrays.fill(tmp, 0, len, 0.0);
                for (int a = 0; a < na; a++) {
                    double xr = cr[a];
                    double xi = ci[a];
                    double[] g1 = ws.gr[a];
                    double[] g2 = ws.gi[a];
                    for (int i = 0; i < len; i++) {
                        tmp[i] += xr * g1[i] - xi * g2[i];
                    }
                    double pr = ws.qr[a][len];
                    double pi = ws.qi[a][len];
                    cr[a] = xr * pr - xi * pi;
                    ci[a] = xr * pi + xi * pr;
                }
                System.arraycopy(tmp, 0, w, j0 + 1 + i0, len);
                i0 += len;
                na = dropNegligible(ws, na, cr, ci);
            }
            // cr, ci: amplitude at node j0 + q − 1; its right half-hat goes to node j0 + q
            double last = 0;
            for (int a = 0; a < na; a++) {
                double lr = cr[a];
                double li = ci[a];
                last += lr * frr[a] - li * fri[a];
                ar[a] = lr * er[a] - li * ei[a];
                ai[a] = lr * ei[a] + li * er[a];
            }
            w[j0 + q] += last;
            j0 += q;
            na = dropNegligible(ws, na, ar, ai);
        }
        for (int a = 0; a < na; a++) {
            // ∫_{τ_n}^∞ e^{pτ} dτ = −e^{pτ_n}/p
            int k = idx[a];
            double pr = m.pr[k];
            double pi = m.pi[k];
            w[n - 1] += -(ar[a] * pr + ai[a] * pi) / (pr * pr + pi * pi);
        }
        w[0] += m.constantTermOhms();
        if (m.seriesInductanceH() > 0) {
            double g = m.seriesInductanceH() / grid.step[0];
            w[0] += g;
            w[1] -= g;
        }
    }

    /** Drops the active modes whose amplitude (xr, xi) is negligible; returns the new count. */
    private static int dropNegligible(Workspace ws, int na, double[] xr, double[] xi) {
        for (int a = na - 1; a >= 0; a--) {
            if (Math.abs(xr[a]) + Math.abs(xi[a]) < ws.neg[a]) {
                na--;
                if (a != na) {
                    ws.move(na, a);
                }
            }
        }
        return na;
    }

    /**
     * Objective weights on a lag grid: hat weights w_k = ∫ h(τ) φ_k(τ) dτ (smooth part), the last node
     * also collecting ∫_{τ_n}^∞ h (u holds beyond the grid), plus D₀ on u₀ and L∞/(τ₁ − τ₀) on u₀, −that
     * on u₁. Per mode and segment [a, a + Δ]: ∫ e^{pτ}(a + Δ − τ)/Δ dτ = e^{pa}Δ·f_L(pΔ) to node a,
     * ∫ e^{pτ}(τ − a)/Δ dτ = e^{pa}Δ·f_R(pΔ) to node a + Δ ({@link Waveform#hatIntegrals}).
     */
    static double[] objectiveWeights(PoleResidueModel m, double[] lags) {
        double[] w = objectiveWeightsSmooth(m, lags);
        w[0] += m.constantTermOhms();
        if (m.seriesInductanceH() > 0) {
            double g = m.seriesInductanceH() / (lags[1] - lags[0]);
            w[0] += g;
            w[1] -= g;
        }
        return w;
    }

    /** The smooth part of {@link #objectiveWeights}: hat weights of h only. */
    static double[] objectiveWeightsSmooth(PoleResidueModel m, double[] lags) {
        int n = lags.length;
        double[] w = new double[n];
        double[] f = new double[4];
        double total = 0;
        for (int k = 0; k < m.modes; k++) {
            total += m.weight[k] * Math.hypot(m.rr[k], m.ri[k]) / -m.pr[k];
        }
        for (int k = 0; k < m.modes; k++) {
            double pr = m.pr[k];
            double pi = m.pi[k];
            double ar = m.weight[k] * m.rr[k];
            double ai = m.weight[k] * m.ri[k];
            double prevDt = Double.NaN;
            double er = 0;
            double ei = 0;
            double lr = 0;
            double li = 0;
            double rr = 0;
            double ri = 0;
            double negligible = 1e-18 * total * -pr;
            int j = 0;
            for (; j < n - 1; j++) {
                double dt = lags[j + 1] - lags[j];
                if (dt != prevDt) {
                    prevDt = dt;
                    double zr = pr * dt;
                    double zi = pi * dt;
                    double e = Math.exp(zr);
                    er = e * Math.cos(zi);
                    ei = e * Math.sin(zi);
                    Waveform.hatIntegrals(zr, zi, er, ei, f);
                    rr = f[0] * dt;
                    ri = f[1] * dt;
                    lr = f[2] * dt;
                    li = f[3] * dt;
                }
                w[j] += ar * lr - ai * li;
                w[j + 1] += ar * rr - ai * ri;
                double nr = ar * er - ai * ei;
                ai = ar * ei + ai * er;
                ar = nr;
                if (Math.abs(ar) + Math.abs(ai) < negligible) {
                    ar = 0;
                    ai = 0;
                    break;
                }
            }
            if (j == n - 1) {
                // ∫_{τ_n}^∞ e^{pτ} dτ = −e^{pτ_n}/p
                double p2 = pr * pr + pi * pi;
                w[n - 1] += -(ar * pr + ai * pi) / p2;
            }
        }
        return w;
    }

    /** Collects the sign intervals of h: their integrals and the crossing times. */
    private static final class IdealSink implements ImpulseMarch.Sink {
        double positive;
        double negative;
        double droop;
        double overshoot;
        boolean firstPositive;
        boolean any;
        final boolean keepEnds;
        final DoubleList ends;

        IdealSink(boolean keepEnds) {
            this.keepEnds = keepEnds;
            this.ends = new DoubleList(keepEnds ? 64 : 0);
        }

        @Override
        public void interval(double startS, double endS, double integral, boolean pos) {
            if (!any) {
                firstPositive = pos;
                any = true;
            }
            if (pos) {
                positive += integral;
            } else {
                negative -= integral;
            }
            if (keepEnds) {
                ends.add(endS);
            }
        }

        /** u = 1 on the intervals of the wanted sign; {@code spike}: u(0) = 1 to collect D·δ. */
        LoadPattern pattern(boolean wantPositive, boolean spike) {
            DoubleList lags = new DoubleList(2 * ends.size() + 4);
            DoubleList vals = new DoubleList(2 * ends.size() + 4);
            if (!any) {
                lags.add(0);
                vals.add(spike ? 1 : 0);
                return new LoadPattern(lags.toArray(), vals.toArray());
            }
            boolean on = firstPositive == wantPositive;
            if (spike && !on) {
                lags.add(0);
                vals.add(1);
            }
            lags.add(0);
            vals.add(on ? 1 : 0);
            for (int i = 0; i < ends.size(); i++) {
                double t = ends.get(i);
                lags.add(t);
                vals.add(on ? 1 : 0);
                if (i < ends.size() - 1) {
                    on = !on;
                    lags.add(t);
                    vals.add(on ? 1 : 0);
                }
            }
            return new LoadPattern(lags.toArray(), vals.toArray());
        }
    }
}
