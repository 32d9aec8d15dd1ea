package breakwater.timedomain;

import breakwater.network.PowerNetwork;
import breakwater.network.SeriesBranch;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Random;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

class PoleResidueModelTest {

    /**
     * Reference: PowerNetwork.impedance, the frequency-domain engine (admittances summed directly).
     * Checked on a dense sweep 100 Hz … 30 GHz, not just at the self-check points. Tolerance 1e-6
     * relative: both sides are exact rational-function evaluations, the difference is rounding amplified
     * by cancellation between modes.
     */
    @Test
    void agreesWithFrequencyDomainOnRandomNetworks() {
        Random rnd = new Random(11);
        double worst = 0;
        for (int trial = 0; trial < 300; trial++) {
            PowerNetwork net = Networks.random(rnd);
            PoleResidueModel m = PoleResidueModel.of(net);
            worst = Math.max(worst, maxRelativeError(net, m));
        }
        assertThat(worst).isLessThan(1e-6);
    }

    @Test
    void realisticNetworkAgreesAndHasExpectedStructure() {
        PowerNetwork net = Networks.realistic();
        PoleResidueModel m = PoleResidueModel.of(net);
        assertThat(maxRelativeError(net, m)).isLessThan(1e-6);
        // die capacitance at the load node: Z(∞) is finite and equals the die resistance (circuit theory:
        // every inductive path is an open circuit at infinite frequency)
        assertThat(m.hasFiniteDirectTerm()).isTrue();
        assertThat(m.directTermOhms()).isCloseTo(0.3e-3, within(1e-15));
        // states: 1 regulator + 1 plane + 8×2 bank + 1 package + 1 die = 20 natural frequencies
        int order = 0;
        for (int k = 0; k < m.modeCount(); k++) {
            order += (int) m.modeWeight(k);
        }
        assertThat(order).isEqualTo(20);
    }

    /** Reference: docs/worst-case.md#the-z0-identity, ∫h = Z(0) = D + Σ r/(−p); Z(0) = R_reg + R_pkg (docs/network-model.md#dc-and-summing-admittances). */
    @Test
    void dcIdentityHoldsOnRandomNetworks() {
        Random rnd = new Random(12);
        for (int trial = 0; trial < 200; trial++) {
            PowerNetwork net = Networks.random(rnd);
            PoleResidueModel m = PoleResidueModel.of(net);
            double z0 = m.constantTermOhms();
            for (int k = 0; k < m.modeCount(); k++) {
                double pr = m.poleRe()[k];
                double pi = m.poleIm()[k];
                double rr = m.residueRe()[k];
                double ri = m.residueIm()[k];
                z0 += m.modeWeight(k) * -(rr * pr + ri * pi) / (pr * pr + pi * pi);
            }
            // 1e-6 relative: the self-check's own tolerance
            assertThat(z0).isCloseTo(net.dcResistanceOhms(), within(1e-6 * net.dcResistanceOhms()));
            // the step response settles at Z(0) (final value theorem)
            assertThat(m.stepResponse(1.0)).isCloseTo(net.dcResistanceOhms(), within(1e-6 * net.dcResistanceOhms()));
        }
    }

    /**
     * Reference: a load node that is only R + sL (regulator and package, no shunt branch) has no poles;
     * Z(s) = (R_reg + R_pkg) + s(L_reg + L_pkg) (series connection).
     */
    @Test
    void seriesInductiveLoadNodeHasPolynomialPartOnly() {
        PowerNetwork net = new PowerNetwork(1e-3, 2e-9, List.of(), true, 0.5e-3, 0.1e-9, List.of());
        PoleResidueModel m = PoleResidueModel.of(net);
        assertThat(m.modeCount()).isZero();
        assertThat(m.hasFiniteDirectTerm()).isFalse();
        assertThat(m.constantTermOhms()).isCloseTo(1.5e-3, within(1e-15));
        assertThat(m.seriesInductanceH()).isCloseTo(2.1e-9, within(1e-21));
    }

    /** Reference: improper Z with poles (no die): agreement with the frequency-domain engine. */
    @Test
    void improperImpedanceWithPolesAgrees() {
        List<SeriesBranch> board = List.of(Networks.part("a", 10e-6, 5e-3, 0.5e-9, 0.5e-9, 4),
                Networks.part("b", 100e-9, 20e-3, 0.3e-9, 0.3e-9, 8));
        PowerNetwork net = new PowerNetwork(1e-3, 10e-9, board, true, 0.5e-3, 50e-12, List.of());
        PoleResidueModel m = PoleResidueModel.of(net);
        assertThat(m.hasFiniteDirectTerm()).isFalse();
        // L∞ = L_pkg + (L_reg ∥ L_a ∥ L_b): every capacitor is a short at high frequency (circuit theory)
        double la = 1.0e-9 / 4;
        double lb = 0.6e-9 / 8;
        double lpar = 1 / (1 / 10e-9 + 1 / la + 1 / lb);
        assertThat(m.seriesInductanceH()).isCloseTo(50e-12 + lpar, within(1e-9 * lpar));
        assertThat(maxRelativeError(net, m)).isLessThan(1e-6);
    }

    /**
     * Reference (circuit theory handbook): (R + sL) ∥ (R + 1/(sC)) with L/C = R² is exactly R at every
     * frequency; the circuit's two natural frequencies cancel against zeros and must not appear.
     */
    @Test
    void constantResistanceNetworkIsExactlyResistive() {
        double r = 1e-3;
        double l = 1e-9;
        PowerNetwork net = new PowerNetwork(r, l, List.of(new SeriesBranch("c", r, 0, l / (r * r))), false, 0, 0,
                List.of());
        PoleResidueModel m = PoleResidueModel.of(net);
        assertThat(m.modeCount()).isZero();
        assertThat(m.directTermOhms()).isCloseTo(r, within(1e-15));
    }

    /** A lossless network (every resistance zero) has undamped modes: never a number. */
    @Test
    void losslessNetworkIsRejected() {
        PowerNetwork net = new PowerNetwork(0, 1e-9, List.of(new SeriesBranch("c", 0, 0.5e-9, 1e-6)), false, 0, 0,
                List.of());
        assertThatThrownBy(() -> PoleResidueModel.of(net)).isInstanceOf(ModelException.class)
                .hasMessageContaining("undamped");
    }

    static double maxRelativeError(PowerNetwork net, PoleResidueModel m) {
        double[] a = new double[2];
        double[] b = new double[2];
        double worst = 0;
        for (double lf = 2; lf <= 10.5; lf += 0.01) {
            double f = Math.pow(10, lf);
            m.impedance(f, a);
            net.impedance(f, b);
            worst = Math.max(worst, Math.hypot(a[0] - b[0], a[1] - b[1]) / Math.hypot(b[0], b[1]));
        }
        return worst;
    }
}
