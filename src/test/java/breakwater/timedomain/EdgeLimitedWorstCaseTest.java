package breakwater.timedomain;

import breakwater.network.PowerNetwork;
import breakwater.network.SeriesBranch;
import org.apache.commons.math3.optim.MaxIter;
import org.apache.commons.math3.optim.PointValuePair;
import org.apache.commons.math3.optim.linear.LinearConstraint;
import org.apache.commons.math3.optim.linear.LinearConstraintSet;
import org.apache.commons.math3.optim.linear.LinearObjectiveFunction;
import org.apache.commons.math3.optim.linear.NonNegativeConstraint;
import org.apache.commons.math3.optim.linear.Relationship;
import org.apache.commons.math3.optim.linear.SimplexSolver;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

class EdgeLimitedWorstCaseTest {

    /**
     * Reference: Commons Math SimplexSolver (a general LP solver) on the same chain LP over a coarse grid
     * of 60 lags (docs/worst-case.md#cross-checks). Tolerance 1e-9 relative: both are exact LP
     * optima; the simplex works to about 1e-10 in its pivoting.
     */
    @Test
    void dynamicProgramAgreesWithSimplexOnACoarseGrid() {
        PoleResidueModel m = PoleResidueModel.of(Networks.moderate());
        for (double te : new double[]{0.3e-9, 3e-9, 30e-9}) {
            double[] lags = new double[60];
            for (int k = 1; k < lags.length; k++) {
                lags[k] = lags[k - 1] + 0.4e-9 * Math.pow(1.06, k); // fine near 0, coarser further back
            }
            for (boolean droop : new boolean[]{true, false}) {
                double[] u = new double[lags.length];
                double dp = WorstCaseAnalyzer.edgeLimitedOnGrid(m, lags, te, droop, u);
                double[] w = HatWeights.onLags(m, lags);
                if (!droop) {
                    for (int k = 0; k < w.length; k++) {
                        w[k] = -w[k];
                    }
                }
                double lp = simplexChain(w, WorstCaseAnalyzer.stepLimits(lags, te));
                assertThat(dp).as("t_e = %s, droop = %s", te, droop).isCloseTo(lp, within(1e-9 * Math.abs(lp) + 1e-15));
            }
        }
    }

    /**
     * Reference: circuit theory. A load node that is R + sL (regulator and package in series, no shunt
     * branch) with load edges t_e: v = R·i + L·di/dt, so the worst droop is exactly R + L/t_e per ampere
     * (a ramp of slope 1/t_e ending at full load) and the worst overshoot L/t_e.
     */
    @Test
    void seriesRlLoadNodeGivesRPlusLOverTe() {
        double r = 1.2e-3;
        double l = 0.8e-9;
        PowerNetwork net = new PowerNetwork(0.7e-3, 0.6e-9, List.of(), true, 0.5e-3, 0.2e-9, List.of());
        PoleResidueModel m = PoleResidueModel.of(net);
        double te = 1e-9;
        WorstCase wc = WorstCaseAnalyzer.edgeLimited(m, te);
        assertThat(wc.droopOhms()).isCloseTo(r + l / te, within(1e-12 * (r + l / te)));
        assertThat(wc.overshootOhms()).isCloseTo(l / te, within(1e-12 * l / te));
        assertThat(wc.droopPattern().maxSlopePerS()).isLessThanOrEqualTo(1 / te * (1 + 1e-12));
    }

    /** Reference (circuit theory handbook): the constant-resistance network stays exactly R with an edge time. */
    @Test
    void constantResistanceNetworkGivesExactlyRWithEdgeTime() {
        double r = 2e-3;
        double l = 5e-9;
        PowerNetwork net = new PowerNetwork(r, l, List.of(new SeriesBranch("c", r, 0, l / (r * r))), false, 0, 0,
                List.of());
        WorstCase wc = WorstCaseAnalyzer.edgeLimited(PoleResidueModel.of(net), 1e-9);
        assertThat(wc.droopOhms()).isCloseTo(r, within(1e-12 * r));
        assertThat(wc.overshootOhms()).isCloseTo(0.0, within(1e-12 * r));
    }

    /**
     * Reference: Commons Math DormandPrince853Integrator on the circuit's own equations, driven by the
     * edge-limited droop pattern; it reaches the bound (tolerance 1e-5, integrator at 1e-11). The pattern
     * respects 0 ≤ u ≤ 1 and the slew limit.
     */
    @Test
    void odeSimulationOfEdgeLimitedPatternReachesTheBound() {
        PowerNetwork net = Networks.moderate();
        PoleResidueModel m = PoleResidueModel.of(net);
        double te = 2e-9;
        WorstCase wc = WorstCaseAnalyzer.edgeLimited(m, te);
        assertThat(wc.droopPattern().maxSlopePerS()).isLessThanOrEqualTo(1 / te * (1 + 1e-9));
        double simulated = new CircuitOde(net).responseAtWorstInstant(wc.droopPattern(), 1e-11);
        assertThat(simulated).isCloseTo(wc.droopOhms(), within(1e-5 * wc.droopOhms()));
        double simOver = new CircuitOde(net).responseAtWorstInstant(wc.overshootPattern(), 1e-11);
        assertThat(simOver).isCloseTo(-wc.overshootOhms(), within(1e-5 * wc.overshootOhms()));
    }

    /**
     * A high-Q resonance rings for many periods, so most of its worst case is collected on the coarser part
     * of the grid. Reference: the ideal-edge worst case, the t_e → 0 limit and an upper bound of every
     * slew-limited one (docs/worst-case.md#lag-grid-and-its-error-bound). One resonance (regulator inductance and a capacitor, Q from
     * 20 to 200) with t_e = 1e-4 of its period: the grid optimum stays within the stated accuracy
     * {@link LagGrid#RELATIVE_ACCURACY} of that limit (with a uniform T/48 over the ringing it fell 1.3e-3
     * short at Q = 100 and 2e-3 at Q = 200).
     */
    @Test
    void highQResonanceWithAShortEdgeApproachesTheIdealLimit() throws Exception {
        for (double q : new double[]{20, 50, 100, 200}) {
            double l = 1e-9;
            double c = 1e-6;
            double r = Math.sqrt(l / c) / q;
            PowerNetwork net = new PowerNetwork(r / 2, l, List.of(new SeriesBranch("c", r / 2, 0, c)), false, 0, 0,
                    List.of());
            PoleResidueModel m = PoleResidueModel.of(net);
            double period = 2 * Math.PI * Math.sqrt(l * c);
            double ideal = WorstCaseAnalyzer.idealEdges(m).droopOhms();
            double droop = WorstCaseAnalyzer.edgeLimited(m, 1e-4 * period).droopOhms();
            assertThat(droop).as("Q = %s", q).isLessThanOrEqualTo(ideal * (1 + 1e-12));
            assertThat(droop).as("Q = %s", q).isGreaterThanOrEqualTo(ideal * (1 - LagGrid.RELATIVE_ACCURACY));
        }
    }

    /**
     * docs/worst-case.md#slew-limited-loads: ramped versions of the ideal-edge pattern are only a lower bound; when a resonance is
     * faster than t_e the exact optimum drives it with partial swings. One anti-resonance at 100 MHz
     * (period 10 ns, Q = 20) and t_e = 10 ns: the ramped ideal pattern (edges become centred ramps of
     * t_e) averages each period to a constant and nearly stops driving the resonance, while the optimum
     * swings by half the range each half period. Ratios found: 26 at t_e = 10 ns (551 at 20 ns, 1.000 at
     * 5 ns and 1 ns); on the realistic network 3.6 at t_e = 20 ns, 1.0006 at 5 ns.
     */
    @Test
    void slewLimitedOptimumBeatsRampedIdealPattern() throws Exception {
        double l = 1e-9;
        double c = 1 / (Math.pow(2 * Math.PI * 100e6, 2) * l);
        double r = Math.sqrt(l / c) / 20;
        PowerNetwork net = new PowerNetwork(0, l, List.of(new SeriesBranch("c", r, 0, c)), false, 0, 0, List.of());
        PoleResidueModel m = PoleResidueModel.of(net);
        double te = 10e-9;
        LoadPattern ramped = movingAverage(WorstCaseAnalyzer.idealEdges(m).droopPattern(), te);
        assertThat(ramped.maxSlopePerS()).isLessThanOrEqualTo(1 / te * (1 + 1e-9));
        assertThat(WorstCaseAnalyzer.edgeLimited(m, te).droopOhms()).isGreaterThan(10 * HatWeights.response(m, ramped));

        PoleResidueModel m2 = PoleResidueModel.of(Networks.realistic());
        LoadPattern ideal2 = WorstCaseAnalyzer.idealEdges(m2).droopPattern();
        double te2 = 20e-9;
        assertThat(WorstCaseAnalyzer.edgeLimited(m2, te2).droopOhms())
                .isGreaterThan(2 * HatWeights.response(m2, movingAverage(ideal2, te2)));
    }

    /**
     * A ramped pattern is feasible, so it never beats the continuous optimum; the grid optimum may trail
     * a near-optimal ramped pattern by the discretisation gap (kinks of the optimum fall between grid
     * nodes). Measured gap: at most 4.3e-4 (single resonance, t_e = T/2); held here at 1e-3.
     */
    @Test
    void rampedPatternsStayBelowTheOptimumUpToTheGridGap() throws Exception {
        double l = 1e-9;
        double c = 1 / (Math.pow(2 * Math.PI * 100e6, 2) * l);
        double r = Math.sqrt(l / c) / 20;
        PowerNetwork one = new PowerNetwork(0, l, List.of(new SeriesBranch("c", r, 0, c)), false, 0, 0, List.of());
        for (PowerNetwork net : List.of(one, Networks.realistic())) {
            PoleResidueModel m = PoleResidueModel.of(net);
            LoadPattern ideal = WorstCaseAnalyzer.idealEdges(m).droopPattern();
            for (double te : new double[]{0.5e-9, 1e-9, 5e-9, 20e-9}) {
                double ramped = HatWeights.response(m, movingAverage(ideal, te));
                assertThat(WorstCaseAnalyzer.edgeLimited(m, te).droopOhms()).isGreaterThan(ramped * (1 - 1e-3));
            }
        }
    }

    /**
     * The ramped version of a 0/1 pattern: every ideal edge becomes a ramp of duration t_e centred on it,
     * i.e. the centred moving average u_r(τ) = (1/t_e)∫_{τ−t_e/2}^{τ+t_e/2} u(λ) dλ (u(λ) = u(0) for
     * λ &lt; 0, after the worst instant). Exact and piecewise linear; slope ≤ 1/t_e, values in [0, 1].
     */
    static LoadPattern movingAverage(LoadPattern ideal, double te) {
        double len = ideal.lengthS();
        List<Double> pts = new ArrayList<>();
        pts.add(0.0);
        pts.add(len);
        for (int i = 0; i < ideal.size(); i++) {
            double x = ideal.lagS(i);
            pts.add(x - te / 2);
            pts.add(x + te / 2);
        }
        double[] lags = pts.stream().mapToDouble(Double::doubleValue).filter(x -> x >= 0 && x <= len).sorted()
                .distinct().toArray();
        double[] vals = new double[lags.length];
        for (int i = 0; i < lags.length; i++) {
            vals[i] = Math.min(1, Math.max(0, (integral(ideal, lags[i] + te / 2) - integral(ideal, lags[i] - te / 2)) / te));
        }
        return new LoadPattern(lags, vals);
    }

    /** ∫_0^x u for a piecewise-constant pattern (jumps as duplicate lags), held beyond its end and before 0. */
    private static double integral(LoadPattern p, double x) {
        if (x < 0) {
            return p.value(0) * x;
        }
        double sum = 0;
        for (int i = 0; i + 1 < p.size(); i++) {
            double a = p.lagS(i);
            double b = Math.min(p.lagS(i + 1), x);
            if (b > a) {
                sum += 0.5 * (p.value(i) + p.value(i + 1)) * (b - a);
            }
        }
        if (x > p.lengthS()) {
            sum += p.value(p.size() - 1) * (x - p.lengthS());
        }
        return sum;
    }

    /** max w·u s.t. 0 ≤ u ≤ 1, |u_{k+1} − u_k| ≤ c_k, by Commons Math's simplex. */
    static double simplexChain(double[] w, double[] c) {
        int n = w.length;
        List<LinearConstraint> cons = new ArrayList<>();
        for (int k = 0; k < n; k++) {
            double[] a = new double[n];
            a[k] = 1;
            cons.add(new LinearConstraint(a, Relationship.LEQ, 1));
        }
        for (int k = 0; k + 1 < n; k++) {
            double[] a = new double[n];
            a[k + 1] = 1;
            a[k] = -1;
            cons.add(new LinearConstraint(a, Relationship.LEQ, c[k]));
            double[] b = new double[n];
            b[k + 1] = -1;
            b[k] = 1;
            cons.add(new LinearConstraint(b, Relationship.LEQ, c[k]));
        }
        PointValuePair p = new SimplexSolver(1e-12, 10, 1e-14).optimize(new MaxIter(1_000_000),
                new LinearObjectiveFunction(w, 0), new LinearConstraintSet(cons), GoalType.MAXIMIZE,
                new NonNegativeConstraint(true));
        return p.getValue();
    }
}
