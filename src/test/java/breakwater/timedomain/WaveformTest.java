package breakwater.timedomain;

import breakwater.network.PowerNetwork;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

class WaveformTest {

    private static final double DELTA_I = 3.0;
    private static final double I_MIN = 0.5;
    private static final double V_NOM = 0.95;

    /** The waveform's lowest voltage is the worst-case droop: V_nom − Z(0)·I_min − ΔI·droop (docs/worst-case.md#notation). */
    @Test
    void droopWaveformReachesTheBoundAtTheWorstInstant() throws Exception {
        PowerNetwork net = Networks.realistic();
        PoleResidueModel m = PoleResidueModel.of(net);
        WorstCase wc = WorstCaseAnalyzer.idealEdges(m);
        double z0 = net.dcResistanceOhms();
        Waveform w = Waveform.of(m, wc.droopPattern(), DELTA_I, I_MIN, V_NOM, z0);
        double expected = V_NOM - z0 * I_MIN - DELTA_I * wc.droopOhms();
        // 1e-9 relative to the droop: both sides are exact closed forms; the tail beyond the pattern is < 1e-10
        assertThat(w.minVoltageV()).isCloseTo(expected, within(1e-9 * DELTA_I * wc.droopOhms()));
        int worst = indexOfMin(w.voltageV());
        assertThat(w.timeS()[worst]).isCloseTo(w.worstInstantS(), within(1e-15));
        for (double i : w.loadCurrentA()) {
            assertThat(i).isBetween(I_MIN, I_MIN + DELTA_I);
        }
        double[] t = w.timeS();
        for (int k = 1; k < t.length; k++) {
            assertThat(t[k]).isGreaterThanOrEqualTo(t[k - 1]);
        }
        assertThat(t[t.length - 1]).isGreaterThan(w.worstInstantS());
    }

    /** The overshoot waveform's highest voltage is V_nom − Z(0)·I_min + ΔI·overshoot. */
    @Test
    void overshootWaveformReachesTheBound() throws Exception {
        PowerNetwork net = Networks.moderate();
        PoleResidueModel m = PoleResidueModel.of(net);
        WorstCase wc = WorstCaseAnalyzer.idealEdges(m);
        double z0 = net.dcResistanceOhms();
        Waveform w = Waveform.of(m, wc.overshootPattern(), DELTA_I, I_MIN, V_NOM, z0);
        assertThat(w.maxVoltageV()).isCloseTo(V_NOM - z0 * I_MIN + DELTA_I * wc.overshootOhms(),
                within(1e-9 * DELTA_I * wc.overshootOhms()));
    }

    /**
     * Reference: Commons Math DormandPrince853Integrator on the circuit's own equations ({@link CircuitOde}),
     * driven by the waveform's own samples (time, current) as a piecewise-linear current: it reproduces the
     * waveform's voltage at the worst instant. The required agreement is 0.5 %; we hold 1e-5 (integrator at 1e-11).
     */
    @Test
    void resimulatingTheSampledCurrentReproducesTheDroop() throws Exception {
        PowerNetwork net = Networks.moderate();
        PoleResidueModel m = PoleResidueModel.of(net);
        WorstCase wc = WorstCaseAnalyzer.idealEdges(m);
        double z0 = net.dcResistanceOhms();
        Waveform w = Waveform.of(m, wc.droopPattern(), DELTA_I, I_MIN, V_NOM, z0);
        double[] t = w.timeS();
        double[] i = w.loadCurrentA();
        double[] v = w.voltageV();
        double tw = w.worstInstantS();
        List<double[]> back = new ArrayList<>();
        int atWorst = -1;
        for (int k = 0; k < t.length && t[k] <= tw; k++) {
            back.add(new double[]{tw - t[k], (i[k] - I_MIN) / DELTA_I});
            atWorst = k;
        }
        Collections.reverse(back);
        double[] lags = back.stream().mapToDouble(x -> x[0]).toArray();
        double[] vals = back.stream().mapToDouble(x -> x[1]).toArray();
        lags[0] = 0.0;
        double simulated = new CircuitOde(net).responseAtWorstInstant(new LoadPattern(lags, vals), 1e-11);
        double fromWaveform = (V_NOM - z0 * I_MIN - v[atWorst]) / DELTA_I;
        assertThat(simulated).isCloseTo(fromWaveform, within(1e-5 * fromWaveform));
    }

    /**
     * Reference: Commons Math Gauss–Legendre quadrature of f_R(z) = ∫₀¹ e^{zv} v dv and
     * f_L(z) = ∫₀¹ e^{zv}(1 − v) dv, against both branches (series below |z| = 0.5, closed form above)
     * and the two branches against each other at the switch-over. Tolerance 1e-13: smooth integrands,
     * quadrature converged to 1e-15.
     */
    @Test
    void hatIntegralsMatchQuadrature() {
        double[][] zs = {{-1e-6, 2e-6}, {-0.01, 0.3}, {-0.2, -0.45}, {-0.49, 0.0}, {-0.6, 2.0}, {-3.0, 0.7}, {-0.05, 5.0}};
        double[] got = new double[4];
        for (double[] z : zs) {
            double zr = z[0];
            double zi = z[1];
            double e = Math.exp(zr);
            Waveform.hatIntegrals(zr, zi, e * Math.cos(zi), e * Math.sin(zi), got);
            double[] want = {
                    quad(v -> Math.exp(zr * v) * Math.cos(zi * v) * v),
                    quad(v -> Math.exp(zr * v) * Math.sin(zi * v) * v),
                    quad(v -> Math.exp(zr * v) * Math.cos(zi * v) * (1 - v)),
                    quad(v -> Math.exp(zr * v) * Math.sin(zi * v) * (1 - v))};
            for (int k = 0; k < 4; k++) {
                assertThat(got[k]).as("z = %s%+sj, part %d", zr, zi, k).isCloseTo(want[k], within(1e-13));
            }
        }
        // both branches at the switch-over point |z| = 0.5
        double zr = -0.3;
        double zi = 0.4;
        double e = Math.exp(zr);
        double[] a = new double[4];
        double[] b = new double[4];
        Waveform.hatIntegralsSeries(zr, zi, a);
        Waveform.hatIntegralsClosed(zr, zi, e * Math.cos(zi), e * Math.sin(zi), b);
        for (int k = 0; k < 4; k++) {
            assertThat(a[k]).isCloseTo(b[k], within(1e-15));
        }
    }

    private static double quad(org.apache.commons.math3.analysis.UnivariateFunction f) {
        return new org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator(16, 1e-15, 1e-15)
                .integrate(100000, f, 0, 1);
    }

    private static int indexOfMin(double[] v) {
        int k = 0;
        for (int i = 1; i < v.length; i++) {
            if (v[i] < v[k]) {
                k = i;
            }
        }
        return k;
    }
}
