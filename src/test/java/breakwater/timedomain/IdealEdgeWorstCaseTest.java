package breakwater.timedomain;

import breakwater.network.PowerNetwork;
import breakwater.network.SeriesBranch;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

class IdealEdgeWorstCaseTest {

    /**
     * Reference: Commons Math DormandPrince853Integrator on the circuit's own state equations
     * ({@link CircuitOde}, written from Kirchhoff's laws, not from the descriptor matrices), driven by the
     * reported droop pattern from rest. Tolerance 1e-5 relative (0.5 % is required): the integrator
     * runs at 1e-11 relative per step; the neglected tail before the pattern is below 1e-10.
     */
    @Test
    void odeSimulationOfDroopPatternReachesTheBound() throws Exception {
        PowerNetwork net = Networks.moderate();
        PoleResidueModel m = PoleResidueModel.of(net);
        WorstCase wc = WorstCaseAnalyzer.idealEdges(m);
        double simulated = new CircuitOde(net).responseAtWorstInstant(wc.droopPattern(), 1e-11);
        assertThat(simulated).isCloseTo(wc.droopOhms(), within(1e-5 * wc.droopOhms()));
        // and the droop exceeds the DC drop: the resonances add to Z(0)
        assertThat(wc.droopOhms()).isGreaterThan(net.dcResistanceOhms());
    }

    /** Same reference for the overshoot pattern: the response reaches −overshoot. */
    @Test
    void odeSimulationOfOvershootPatternReachesTheBound() throws Exception {
        PowerNetwork net = Networks.moderate();
        WorstCase wc = WorstCaseAnalyzer.idealEdges(PoleResidueModel.of(net));
        double simulated = new CircuitOde(net).responseAtWorstInstant(wc.overshootPattern(), 1e-11);
        assertThat(simulated).isCloseTo(-wc.overshootOhms(), within(1e-5 * wc.overshootOhms()));
    }

    /** Reference: docs/worst-case.md#ideal-edges, droop − overshoot = ∫h + D = Z(0) = R_reg + R_pkg. */
    @Test
    void droopMinusOvershootIsDcResistance() throws Exception {
        PowerNetwork net = Networks.realistic();
        WorstCase wc = WorstCaseAnalyzer.idealEdges(PoleResidueModel.of(net));
        assertThat(wc.droopOhms() - wc.overshootOhms()).isCloseTo(net.dcResistanceOhms(),
                within(1e-9 * wc.peakToPeakOhms()));
    }

    /**
     * Reference (circuit theory handbook): (R + sL) ∥ (R + 1/(sC)) with L/C = R² is a pure resistance R,
     * so the worst droop is exactly R per ampere and there is no overshoot.
     */
    @Test
    void constantResistanceNetworkGivesExactlyR() throws Exception {
        double r = 2e-3;
        double l = 5e-9;
        PowerNetwork net = new PowerNetwork(r, l, List.of(new SeriesBranch("c", r, 0, l / (r * r))), false, 0, 0,
                List.of());
        WorstCase wc = WorstCaseAnalyzer.idealEdges(PoleResidueModel.of(net));
        assertThat(wc.droopOhms()).isCloseTo(r, within(1e-12 * r));
        assertThat(wc.overshootOhms()).isCloseTo(0.0, within(1e-12 * r));
    }

    /** Ideal edges into series inductance: rejected with a message naming the remedies. */
    @Test
    void seriesInductanceWithIdealEdgesIsRejected() {
        PowerNetwork net = new PowerNetwork(1e-3, 2e-9, List.of(Networks.part("a", 1e-6, 5e-3, 0.3e-9, 0.3e-9, 4)),
                true, 0.5e-3, 0.1e-9, List.of());
        PoleResidueModel m = PoleResidueModel.of(net);
        assertThatThrownBy(() -> WorstCaseAnalyzer.idealEdges(m))
                .isInstanceOf(UnboundedWorstCaseException.class)
                .hasMessageContaining("edge_time")
                .hasMessageContaining("die or plane capacitance");
    }
}
