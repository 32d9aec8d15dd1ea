package breakwater.timedomain;

import breakwater.network.PowerNetwork;
import breakwater.network.SeriesBranch;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.withinPercentage;

class OwnStepPeakTest {

    @Test
    void aSingleModeWithoutDirectTermHasTheNetworksOwnStepResponse() {
        // (R + sL) ∥ C: Z = (R + sL)/(1 + sRC + s²LC) has one pole pair, no direct term and no series
        // inductance, so the mode's own step response IS the network's step response. Two independent
        // routes must agree: the closed form at the extremes, and the exact step-response march.
        double l = 20e-9;
        double c = 10e-6;
        double r = Math.sqrt(l / c) / 6; // Q ≈ 6
        PowerNetwork net = new PowerNetwork(r, l, List.of(new SeriesBranch("c", 0, 0, c)), false, 0, 0, List.of());
        PoleResidueModel m = PoleResidueModel.of(net);
        double f0 = 1 / (2 * Math.PI * Math.sqrt(l * c));
        double own = ResonanceResponse.ownStepPeakOhms(m, f0);
        assertThat(own).isCloseTo(ResonanceResponse.of(m, f0).stepPeakOhms(), withinPercentage(1e-6));
        // and a brute-force scan of the step response (1/2000 of a period) can only find less, by rounding
        double best = 0;
        for (double t = 0; t < 20 / f0; t += 1 / (2000 * f0)) {
            best = Math.max(best, m.stepResponse(t));
        }
        assertThat(own).isGreaterThanOrEqualTo(best * (1 - 1e-9));
        assertThat(own).isCloseTo(best, withinPercentage(0.01));
    }
}
