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
        if (!model.hasFiniteDirectTerm()) {
            throw new UnboundedWorstCaseException(String.format(Locale.ROOT,
                    "rail.edge_time: the worst case is unbounded with ideal load edges, because the load node "
                            + "shows %.4g H of series inductance at high frequency (an ideal current step "
                            + "gives an infinite L·di/dt). Maybe add die or plane capacitance at the load "
                            + "node, or set rail.edge_time to the load's fastest edge",
                    model.seriesInductanceH()));
        }
        double d = model.directTermOhms();
        IdealSink sink = new IdealSink();
        new ImpulseMarch(model).run(IDEAL_TAIL_TOLERANCE, sink);
        double droop = sink.positive + Math.max(d, 0);
        double overshoot = sink.negative + Math.max(-d, 0);
        double z0 = model.dcResistanceOhms();
        if (!(Math.abs(droop - overshoot - z0) <= 1e-7 * (droop + overshoot) + 1e-15)) {
            throw new ModelException(String.format(Locale.ROOT,
                    "worst-case integration fails the identity droop - overshoot = Z(0): %.12g - %.12g vs %.12g",
                    droop, overshoot, z0));
        }
        LoadPattern droopPattern = sink.pattern(true, d > 0);
        LoadPattern overshootPattern = sink.pattern(false, d < 0);
        return new WorstCase(droop, Math.max(overshoot, 0), droopPattern, overshootPattern, 0.0);
    }

    /** Collects the sign intervals of h: their integrals and the crossing times. */
    private static final class IdealSink implements ImpulseMarch.Sink {
        double positive;
        double negative;
        boolean firstPositive;
        boolean any;
        final DoubleList ends = new DoubleList(64);

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
            ends.add(endS);
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
