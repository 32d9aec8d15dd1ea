package breakwater.timedomain;

import breakwater.network.PowerNetwork;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** The hat weights w_k = ∫ h φ_k of the slew-limited worst case ({@link HatWeights}). */
class HatWeightsTest {

    /**
     * The block-wise weights (tabulated powers e^{pmΔ}, amplitude advanced per block) against the
     * lag-by-lag sum of the same closed forms ({@link HatWeights#onLags}) on the same
     * lags, and the optimum against the dynamic program on those reference weights. Tolerance 1e-11 of
     * Σ|w|: both are products of up to 1e5 rounded factors (1e-16 each) in a different order; measured
     * below 4e-13 on random networks.
     */
    @Property(tries = 30)
    void blockWeightsEqualTheLagByLagSum(@ForAll long seed, @ForAll @DoubleRange(min = -12, max = -7) double logTe)
            throws Exception {
        PoleResidueModel m = PoleResidueModel.of(WorstCasePerAmpereTest.network(seed));
        double te = Math.pow(10, logTe);
        double[] lags = LagGrid.lags(m, te);
        double[] reference = HatWeights.onLags(m, lags);
        double[] fast = WorstCaseAnalyzer.gridObjectiveWeights(m, te);
        assertThat(fast).hasSameSizeAs(reference);
        double scale = 0;
        double worst = 0;
        for (int k = 0; k < lags.length; k++) {
            scale += Math.abs(reference[k]);
            worst = Math.max(worst, Math.abs(fast[k] - reference[k]));
        }
        assertThat(worst).isLessThanOrEqualTo(1e-11 * scale);
        double dp = WorstCaseAnalyzer.edgeLimitedOnGrid(m, lags, te, true, new double[lags.length]);
        assertThat(WorstCaseAnalyzer.figures(m, te).droopOhms()).isCloseTo(Math.max(dp, 0), within(1e-11 * scale));
    }

    /**
     * Reference: Commons Math's Gauss–Legendre quadrature (a general-purpose library) of h(τ)·φ_k(τ) with
     * h from {@link PoleResidueModel#impulseResponse} (the modes summed directly, not the hat closed forms),
     * on both segments of every inner hat of an uneven grid. Tolerance 1e-12 of Σ|w|: the quadrature
     * converges to 1e-13 relative on these smooth integrands (measured 3e-16).
     */
    @Test
    void innerWeightsEqualQuadrature() {
        PoleResidueModel m = PoleResidueModel.of(Networks.moderate());
        double[] lags = new double[40];
        for (int k = 1; k < lags.length; k++) {
            lags[k] = lags[k - 1] + 0.2e-9 * Math.pow(1.15, k);
        }
        double[] w = HatWeights.smoothOnLags(m, lags);
        double scale = 0;
        for (double v : w) {
            scale += Math.abs(v);
        }
        IterativeLegendreGaussIntegrator quad = new IterativeLegendreGaussIntegrator(16, 1e-13, 1e-30);
        for (int k = 1; k + 1 < lags.length; k++) {
            double a = lags[k - 1];
            double b = lags[k];
            double c = lags[k + 1];
            double rising = quad.integrate(100000, t -> m.impulseResponse(t) * (t - a) / (b - a), a, b);
            double falling = quad.integrate(100000, t -> m.impulseResponse(t) * (c - t) / (c - b), b, c);
            assertThat(w[k]).as("node %d", k).isCloseTo(rising + falling, within(1e-12 * scale));
        }
    }

    /**
     * Reference: the hat functions sum to 1 on [τ_0, τ_n] and the last node collects ∫_{τ_n}^∞ h, so the
     * weights sum to ∫₀^∞ h = Z(0) − D₀ (docs/worst-case.md#the-z0-identity; Z(0) = R_reg + R_pkg from the network). Also
     * the exact response to a constant load u ≡ 1 is Z(0) (DC steady state), on one lag and on several.
     * Tolerance 1e-12 of Σ|r|/|Re p|: sums of up to thousands of rounded terms (measured 3e-15).
     */
    @Property(tries = 40)
    void weightsSumToTheDcResistance(@ForAll long seed, @ForAll @DoubleRange(min = -12, max = -7) double logTe) {
        PowerNetwork net = WorstCasePerAmpereTest.network(seed);
        PoleResidueModel m = PoleResidueModel.of(net);
        double bound = 0;
        for (int k = 0; k < m.modeCount(); k++) {
            bound += m.modeWeight(k) * Math.hypot(m.rr[k], m.ri[k]) / -m.pr[k];
        }
        double z0 = net.dcResistanceOhms();
        double[] lags = LagGrid.lags(m, Math.pow(10, logTe));
        double sum = 0;
        for (double v : HatWeights.smoothOnLags(m, lags)) {
            sum += v;
        }
        assertThat(sum + m.constantTermOhms()).isCloseTo(z0, within(1e-12 * bound));
        if (m.seriesInductanceH() == 0) {
            LoadPattern one = new LoadPattern(new double[] {0}, new double[] {1});
            assertThat(HatWeights.response(m, one)).isCloseTo(z0, within(1e-12 * bound));
            double[] ones = new double[lags.length];
            java.util.Arrays.fill(ones, 1.0);
            assertThat(HatWeights.response(m, new LoadPattern(lags, ones))).isCloseTo(z0, within(1e-12 * bound));
        }
    }
}
