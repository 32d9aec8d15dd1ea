package breakwater.timedomain;

/**
 * Cheap bounds on the worst case per ampere of ΔI, which settle the pass/fail verdict of clear cases
 * before the exact computation (docs/worst-case.md#cheap-bounds). Every bound holds for the exact
 * figures of {@link WorstCaseAnalyzer} (ideal edges or the slew-limited optimum on its lag grid) after
 * the guards below; the solver's judge uses them, the full evaluation never does.
 *
 * <p>Upper bound from the model alone, no integral ({@link #upper}): with S = Σ w|r|/|Re p| &ge; ∫|h| and
 * I = Σ w·Re(r/(−p)) = ∫h, the positive part ∫h⁺ = (∫|h| + ∫h)/2 &le; (S + I)/2 and ∫h⁻ &le; (S − I)/2; any
 * load 0 &le; u &le; 1 with |du/dt| &le; 1/t_e gives at most ∫h⁺ + max(D₀, 0) + L∞/t_e of droop and
 * ∫h⁻ + max(−D₀, 0) + L∞/t_e of overshoot.
 *
 * <p>Lower bound from |Z| on a frequency grid ({@link #lower}): the load u(t) = 1/2 + (a/2)·sin(ωt), with
 * a = min(1, 1/(π f t_e)) so that |du/dt| = aω/2 &le; 1/t_e, is an allowed pattern; in steady state the
 * response ΔI·(h ∗ u) is Z(0)/2 + (a/2)|Z(jω)|·sin(ωt + φ), so droop &ge; (a|Z(jω)| + Z(0))/2 and
 * overshoot &ge; (a|Z(jω)| − Z(0))/2; the constant load u = 1 gives droop &ge; Z(0).
 */
public final class WorstCaseBounds {

    /**
     * Relative guard added to the upper bounds: the exact figures carry rounding of about 1e-13 of S per
     * sign interval plus the ideal march's 1e-10 tail, and the dynamic program's sums about 1e-12; 1e-8 of
     * S (and of the direct terms) lies far above both, and costs nothing in practice.
     */
    static final double UPPER_GUARD = 1e-8;

    /**
     * Relative guard taken off the lower bounds with ideal edges: the march is exact to 1e-9
     * ({@link WorstCaseAnalyzer#relativeAccuracy}), the fast impedance engine to rounding.
     */
    static final double LOWER_GUARD_IDEAL = 1e-8;

    /**
     * Relative guard taken off the lower bounds with an edge time: the sine load is not piecewise linear
     * on the lag grid, and the grid optimum trails the continuous one by up to
     * {@link LagGrid#RELATIVE_ACCURACY}; twice that.
     */
    static final double LOWER_GUARD_EDGE = 2 * LagGrid.RELATIVE_ACCURACY;

    private WorstCaseBounds() {
    }

    /**
     * Upper bounds on the exact worst case of {@code model} for edge time {@code edgeTimeS} (0: ideal
     * edges), from the poles and residues alone; the guard {@value #UPPER_GUARD} included.
     *
     * @return droop and overshoot bounds per ampere; both +∞ with ideal edges into a load node with series
     * inductance (the worst case is unbounded there)
     */
    public static Bounds upper(PoleResidueModel model, double edgeTimeS) {
        if (!(edgeTimeS >= 0) || !Double.isFinite(edgeTimeS)) {
            throw new IllegalArgumentException("edge time must be finite and >= 0, got " + edgeTimeS);
        }
        double l = model.seriesInductanceH();
        if (edgeTimeS == 0 && l > 0) {
            return new Bounds(Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY);
        }
        double s = 0;
        double integral = 0;
        for (int k = 0; k < model.modes; k++) {
            double a = model.pr[k];
            double b = model.pi[k];
            double w = model.weight[k];
            double rr = model.rr[k];
            double ri = model.ri[k];
            s += w * Math.sqrt(rr * rr + ri * ri) / -a;
            // Re(r/(−p)) = −(rr·a + ri·b)/|p|²
            integral += -w * (rr * a + ri * b) / (a * a + b * b);
        }
        double d0 = model.constantTermOhms();
        double inductive = edgeTimeS > 0 ? l / edgeTimeS : 0;
        double positive = Math.max(0, 0.5 * (s + integral));
        double negative = Math.max(0, 0.5 * (s - integral));
        double guard = UPPER_GUARD * (s + Math.abs(d0) + inductive);
        return new Bounds(positive + Math.max(d0, 0) + inductive + guard,
                negative + Math.max(-d0, 0) + inductive + guard);
    }

    /**
     * The ideal-edge worst case of {@code model} as an upper bound of its slew-limited worst case for any
     * edge time: every load whose slope is limited is also a load with values in [0, 1], so its excursion
     * cannot exceed the largest of those, and the slew-limited optimum on the lag grid is reached by such a
     * load. The guard {@value #UPPER_GUARD} of S is added.
     *
     * @throws UnboundedWorstCaseException when the load node has series inductance (no ideal-edge bound)
     */
    public static Bounds idealEdges(PoleResidueModel model) throws UnboundedWorstCaseException {
        WorstCasePerAmpere ideal = WorstCaseAnalyzer.figures(model, 0);
        double s = 0;
        for (int k = 0; k < model.modes; k++) {
            s += model.weight[k] * Math.sqrt(model.rr[k] * model.rr[k] + model.ri[k] * model.ri[k]) / -model.pr[k];
        }
        double guard = UPPER_GUARD * (s + Math.abs(model.constantTermOhms()));
        return new Bounds(ideal.droopOhms() + guard, ideal.overshootOhms() + guard);
    }

    /**
     * Lower bounds on the exact worst case from |Z| at the given frequencies (any grid: each point gives
     * its own bound, the largest is returned); the guard for {@code edgeTimeS} taken off.
     *
     * @param frequenciesHz    grid frequencies, &gt; 0
     * @param magnitudesOhms   |Z(j2πf)| at each
     * @param count            how many grid points to use (from the first)
     * @param dcResistanceOhms Z(0)
     * @param edgeTimeS        t_e, 0 for ideal edges
     */
    public static Bounds lower(double[] frequenciesHz, double[] magnitudesOhms, int count, double dcResistanceOhms,
                               double edgeTimeS) {
        double best = 0;
        for (int k = 0; k < count; k++) {
            best = Math.max(best, sineScale(frequenciesHz[k], edgeTimeS) * magnitudesOhms[k]);
        }
        double keep = 1 - (edgeTimeS > 0 ? LOWER_GUARD_EDGE : LOWER_GUARD_IDEAL);
        double droop = Math.max(dcResistanceOhms, 0.5 * (best + dcResistanceOhms));
        double overshoot = Math.max(0, 0.5 * (best - dcResistanceOhms));
        return new Bounds(keep * droop, keep * overshoot);
    }

    /**
     * The largest relative swing a = min(1, 1/(π f t_e)) of a sine load 1/2 + (a/2)·sin(2πft) whose slope
     * stays within 1/t_e (1 with ideal edges).
     */
    public static double sineScale(double frequencyHz, double edgeTimeS) {
        if (edgeTimeS <= 0) {
            return 1.0;
        }
        return Math.min(1.0, 1.0 / (Math.PI * frequencyHz * edgeTimeS));
    }

    /**
     * A pair of bounds per ampere of ΔI.
     *
     * @param droopOhms     on the worst droop
     * @param overshootOhms on the worst overshoot
     */
    public record Bounds(double droopOhms, double overshootOhms) {
    }
}
