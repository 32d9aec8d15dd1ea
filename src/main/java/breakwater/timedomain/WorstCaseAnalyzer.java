package breakwater.timedomain;

import java.util.Locale;

/**
 * The exact worst-case transient of a load node, per ampere of load step ΔI (Reverse Pulse Technique,
 * docs/worst-case.md#ideal-edges and #slew-limited-loads). The load current is i(t) = I_min + ΔI·u(t) with 0 &le; u &le; 1; the
 * voltage is v = V_nom − Z(0)·I_min − ΔI·(h ∗ u).
 *
 * <p>Ideal edges (t_e = 0): droop P = ∫max(h, 0) dt + max(D, 0), overshoot N = ∫max(−h, 0) dt +
 * max(−D, 0), integrated exactly between the zero crossings of h ({@link ImpulseMarch}); reached by
 * u(lag) = 1 where h(lag) &gt; 0 (droop) or h(lag) &lt; 0 (overshoot). P − N = Z(0) is checked.
 * Accuracy: relative 1e-10 (tail bound) plus about 1e-13 of Σ|r|/|Re p| from rounding.
 *
 * <p>Slew-limited edges (t_e &gt; 0, {@link #edgeLimited}): a chain linear program over u on a
 * {@link LagGrid}, with objective weights from {@link HatWeights}, solved exactly by {@link ChainDp}.
 */
public final class WorstCaseAnalyzer {

    /**
     * The ideal-edge march stops when the tail bound of h is below this fraction of the ∫|h| accumulated:
     * the figures are then exact to 1e-10 relative, far beyond what a design needs, and a decade more costs only
     * ln 10/|Re p| of march on the slowest mode.
     */
    static final double IDEAL_TAIL_TOLERANCE = 1e-10;

    /**
     * Tolerance of the identity droop − overshoot = Z(0), relative to droop + overshoot: a sum of many
     * sign intervals, each exact to about 1e-13 of S plus the 1e-10 tail, so 1e-7 fails only a real
     * error in the march or the model ({@code IdealEdgeWorstCaseTest.droopMinusOvershootIsDcResistance}
     * holds it to 1e-9).
     */
    private static final double IDENTITY_TOLERANCE = 1e-7;

    /** Absolute floor of the identity check, Ω: for a network whose figures are all zero. */
    private static final double IDENTITY_FLOOR_OHMS = 1e-15;

    /**
     * The pattern recovered by the forward pass must give the dynamic program's optimum to this fraction
     * of Σ|w|: two exact evaluations of one optimum that differ only in rounding; a larger gap means a
     * recovery error, and the pattern would not reach the figure reported.
     */
    private static final double RECOVERY_TOLERANCE = 1e-9;

    /**
     * Stated relative accuracy of the ideal-edge figures: the march stops at a tail of
     * {@value #IDEAL_TAIL_TOLERANCE} of the ∫|h| accumulated, the rest is rounding
     * ({@code LagGridBoundTest.idealEdgeMarchEqualsTheClosedFormOfOneResonance} holds it against the closed
     * form of one resonance).
     */
    static final double IDEAL_RELATIVE_ACCURACY = 1e-9;

    private WorstCaseAnalyzer() {
    }

    /**
     * The stated relative accuracy of the worst case for edge time {@code edgeTimeS}
     * (docs/worst-case.md#lag-grid-and-its-error-bound): the figures are reached by a load pattern, so they
     * never exceed the model's true worst case, and they fall short of it by less than this fraction.
     * {@value #IDEAL_RELATIVE_ACCURACY} with ideal edges, {@link LagGrid#RELATIVE_ACCURACY} with an edge time.
     */
    public static double relativeAccuracy(double edgeTimeS) {
        return edgeTimeS > 0 ? LagGrid.RELATIVE_ACCURACY : IDEAL_RELATIVE_ACCURACY;
    }

    /**
     * Worst case with ideal load edges (t_e = 0).
     *
     * @throws UnboundedWorstCaseException when Z(∞) is infinite (series inductance at the load node)
     */
    public static WorstCase idealEdges(PoleResidueModel model) throws UnboundedWorstCaseException {
        SignIntervals sink = idealMarch(model, true);
        double d = model.directTermOhms();
        LoadPattern droopPattern = sink.pattern(true, d > 0);
        LoadPattern overshootPattern = sink.pattern(false, d < 0);
        return new WorstCase(sink.droop, Math.max(sink.overshoot, 0), droopPattern, overshootPattern, 0.0);
    }

    /** The ideal-edge march with the identity check; {@code crossings}: keep the sign changes for patterns. */
    private static SignIntervals idealMarch(PoleResidueModel model, boolean crossings) throws UnboundedWorstCaseException {
        if (!model.hasFiniteDirectTerm()) {
            throw new UnboundedWorstCaseException(String.format(Locale.ROOT,
                    "rail.edge_time: the worst case is unbounded with ideal load edges, because the load node "
                            + "shows %.4g H of series inductance at high frequency (an ideal current step "
                            + "gives an infinite L·di/dt). Maybe add die or plane capacitance at the load "
                            + "node, or set rail.edge_time to the load's fastest edge",
                    model.seriesInductanceH()));
        }
        double d = model.directTermOhms();
        SignIntervals sink = new SignIntervals(crossings);
        new ImpulseMarch(model).run(IDEAL_TAIL_TOLERANCE, sink);
        double droop = sink.positive + Math.max(d, 0);
        double overshoot = sink.negative + Math.max(-d, 0);
        double z0 = model.dcResistanceOhms();
        if (!(Math.abs(droop - overshoot - z0) <= IDENTITY_TOLERANCE * (droop + overshoot) + IDENTITY_FLOOR_OHMS)) {
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
     * (docs/worst-case.md#the-chain-lp): u piecewise linear on the lag grid of {@link LagGrid}, objective
     * Σ w_k u_k with hat-function weights w_k = ∫ h φ_k in closed form per mode, D₀ on u₀, and for a load
     * node with series inductance L∞ the term L∞·(u₀ − u₁)/(τ₁ − τ₀); constraints 0 ≤ u_k ≤ 1,
     * |u_{k+1} − u_k| ≤ (τ_{k+1} − τ_k)/t_e; solved exactly by {@link ChainDp}, once for the droop
     * (maximise) and once for the overshoot (maximise the negative).
     *
     * <p>Accuracy: exact for the piecewise-linear loads on the grid, and the returned pattern reaches the
     * returned value exactly, so it is a true lower bound of the continuous optimum. The grid
     * ({@link LagGrid}: every mode's step limited by its period and by its share of the response) trails
     * the continuous optimum by the cost of placing its kinks on grid nodes, less than
     * {@link LagGrid#RELATIVE_ACCURACY} ({@link #relativeAccuracy}); measured against a grid eight times
     * finer at most 2.0e-4 on single resonances of Q 5 … 200 with t_e from 1e-3 to 10 periods and 1.3e-4
     * on random rails.
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
            SignIntervals sink = idealMarch(model, false);
            return new WorstCasePerAmpere(sink.droop, Math.max(sink.overshoot, 0), 0.0);
        }
        Workspace ws = WORKSPACE.get();
        int n = prepare(model, edgeTimeS, ws);
        double droop = ChainDp.maximum(ws.w, 1.0, ws.c, n, ws.dp);
        double overshoot = ChainDp.maximum(ws.w, -1.0, ws.c, n, ws.dp);
        return new WorstCasePerAmpere(Math.max(droop, 0), Math.max(overshoot, 0), edgeTimeS);
    }

    /** The objective weights of the edge-limited path on {@link LagGrid}'s lags (a copy, for cross-checks). */
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
        LagGrid grid = ws.grid;
        grid.build(model, edgeTimeS);
        int n = grid.nodes;
        ws.ensure(n);
        ws.hat.onGrid(model, grid, ws.w);
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
        double[] w = HatWeights.onLags(model, lags);
        if (!droop) {
            for (int k = 0; k < w.length; k++) {
                w[k] = -w[k];
            }
        }
        return ChainDp.solve(w, stepLimits(lags, edgeTimeS), u);
    }

    /**
     * Throws unless the pattern {@code u} recovered by the forward pass gives the dynamic program's
     * optimum {@code value} on the weights sign·w, to {@value #RECOVERY_TOLERANCE} of Σ|w|.
     */
    private static void checkRecovered(double[] w, double sign, int n, double[] u, double value, String what) {
        double sum = 0;
        double scale = 0;
        for (int k = 0; k < n; k++) {
            sum += sign * w[k] * u[k];
            scale += Math.abs(w[k]);
        }
        if (!(Math.abs(sum - value) <= RECOVERY_TOLERANCE * scale)) {
            throw new ModelException(String.format(Locale.ROOT,
                    "edge-limited %s: the recovered pattern gives %.12g, the dynamic program %.12g", what, sum, value));
        }
    }

    /** Step limits c_k = (τ_{k+1} − τ_k)/t_e of the chain LP on {@code lags}. */
    static double[] stepLimits(double[] lags, double edgeTimeS) {
        double[] c = new double[Math.max(lags.length - 1, 0)];
        for (int k = 0; k < c.length; k++) {
            c[k] = (lags[k + 1] - lags[k]) / edgeTimeS;
        }
        return c;
    }

    /** Reusable buffers of one thread: grid, hat weights, weights, step limits, dynamic-program scratch. */
    private static final class Workspace {
        final LagGrid grid = new LagGrid();
        final HatWeights hat = new HatWeights();
        final ChainDp.Scratch dp = new ChainDp.Scratch();
        double[] w = new double[0];
        double[] c = new double[0];
        double[] lags = new double[0];

        void ensure(int nodes) {
            if (w.length < nodes) {
                int n = Math.max(nodes, 2 * w.length);
                w = new double[n];
                c = new double[n];
                lags = new double[n];
            }
        }
    }

    private static final ThreadLocal<Workspace> WORKSPACE = ThreadLocal.withInitial(Workspace::new);
}
