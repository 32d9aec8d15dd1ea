package breakwater.timedomain;

import breakwater.network.PowerNetwork;
import breakwater.network.SeriesBranch;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThatCode;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/**
 * The self-checks must pass a model of its own network and refuse one that is wrong. A wrong model is
 * made by checking a correct model against a slightly different network; the references are the
 * frequency-domain engine ({@link PowerNetwork#impedance}) and Z(0) = R_reg + R_pkg (every shunt branch
 * holds a capacitor; circuit theory).
 */
class ModelSelfCheckTest {

    /** {@code net} with the capacitance of board branch {@code k} times {@code factor}. */
    private static PowerNetwork withCapacitance(PowerNetwork net, int k, double factor) {
        List<SeriesBranch> board = new ArrayList<>(net.boardBranches());
        SeriesBranch b = board.get(k);
        board.set(k, new SeriesBranch(b.label(), b.resistanceOhms(), b.inductanceH(), b.capacitanceF() * factor));
        return new PowerNetwork(net.regulatorResistanceOhms(), net.regulatorInductanceH(), board, net.hasPackage(),
                net.packageResistanceOhms(), net.packageInductanceH(), net.loadBranches());
    }

    @Test
    void aModelPassesAgainstItsOwnNetwork() {
        for (PowerNetwork net : List.of(Networks.moderate(), Networks.realistic())) {
            PoleResidueModel m = PoleResidueModel.of(net);
            assertThatCode(() -> ModelSelfCheck.check(m, net)).doesNotThrowAnyException();
        }
    }

    /**
     * One capacitance 1 % off leaves Z(0) alone (no DC current flows in a shunt branch), so the identity
     * holds, but moves a resonance: the frequency-domain comparison must refuse the model.
     */
    @Test
    void aModelOfAnotherNetworkFailsTheFrequencyDomainCheck() {
        PowerNetwork net = Networks.realistic();
        PoleResidueModel m = PoleResidueModel.of(net);
        for (int k = 1; k < net.boardBranches().size(); k++) {
            PowerNetwork other = withCapacitance(net, k, 1.01);
            assertThatThrownBy(() -> ModelSelfCheck.check(m, other)).as("branch %d", k)
                    .isInstanceOf(ModelException.class).hasMessageContaining("disagrees with the network impedance");
        }
    }

    /** A different regulator resistance changes Z(0) = R_reg + R_pkg: the identity must refuse the model. */
    @Test
    void aModelWithAnotherDcResistanceFailsTheIdentity() {
        PowerNetwork net = Networks.moderate();
        PoleResidueModel m = PoleResidueModel.of(net);
        PowerNetwork other = new PowerNetwork(net.regulatorResistanceOhms() * 1.001, net.regulatorInductanceH(),
                net.boardBranches(), net.hasPackage(), net.packageResistanceOhms(), net.packageInductanceH(),
                net.loadBranches());
        assertThatThrownBy(() -> ModelSelfCheck.check(m, other)).isInstanceOf(ModelException.class)
                .hasMessageContaining("identity Z(0)");
    }

    /**
     * Every mode of a passive network with losses decays: a pole on or right of the imaginary axis, or
     * damped less than {@link ModelSelfCheck#MIN_DAMPING}, is refused; one damped a little more passes.
     */
    @Test
    void undampedAndGrowingModesAreRefused() {
        double w = 2 * Math.PI * 1e8;
        for (double re : new double[] {0.0, 1e3, -0.5 * ModelSelfCheck.MIN_DAMPING * w}) {
            assertThatThrownBy(() -> ModelSelfCheck.requireDecaying(new double[] {-1e6, re}, new double[] {0, w}, 2))
                    .as("Re p = %s", re).isInstanceOf(ModelException.class).hasMessageContaining("undamped or growing");
        }
        assertThatCode(() -> ModelSelfCheck.requireDecaying(new double[] {-1e6, -2 * ModelSelfCheck.MIN_DAMPING * w},
                new double[] {0, w}, 2)).doesNotThrowAnyException();
    }
}
