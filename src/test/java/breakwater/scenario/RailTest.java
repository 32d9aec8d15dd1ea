package breakwater.scenario;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

class RailTest {

    @Test
    void targetImpedanceIsVoltageTimesToleranceOverCurrentStep() {
        // Common practice: Z_t = V_nom × tolerance / ΔI. Worked example (from memory, the usual textbook
        // shape): a 1.0 V rail, ±5 %, 10 A maximum with a 50 % step → ΔI = 5 A → Z_t = 0.05 V / 5 A = 10 mΩ.
        Rail r = new Rail("example", 1.0, 0.05, 10.0, 5.0, 0);
        assertThat(r.targetImpedanceOhms()).isCloseTo(10e-3, within(1e-15));
        assertThat(r.minCurrentA()).isEqualTo(5.0);
        assertThat(r.lowerLimitV()).isCloseTo(0.95, within(1e-15));
        assertThat(r.upperLimitV()).isCloseTo(1.05, within(1e-15));
        // and the same rule at 0.9 V, 3 %, ΔI 2.5 A: 27 mV / 2.5 A = 10.8 mΩ
        assertThat(new Rail("core", 0.9, 0.03, 5.0, 2.5, 1e-9).targetImpedanceOhms()).isCloseTo(10.8e-3, within(1e-15));
    }

    /**
     * The tolerance budget (common practice: a rail's tolerance is shared by the regulator's set-point
     * accuracy, its ripple and the load transient). Handbook arithmetic on a 1.0 V rail, ±5 %, ΔI = 5 A,
     * set point ±1 % (10 mV) and 20 mV of ripple peak-to-peak (±10 mV): the transient keeps
     * 50 − 10 − 10 = 30 mV either side, so the band narrows on each side by exactly the sum of the two
     * allowances, 20 mV (to 0.97 … 1.03 V), and the target impedance is 30 mV / 5 A = 6 mΩ instead of 10 mΩ.
     */
    @Test
    void setPointAndRippleNarrowTheBandByTheirSumAndTheTargetFollows() {
        Rail whole = new Rail("example", 1.0, 0.05, 10.0, 5.0, 0);
        Rail budget = new Rail("example", 1.0, 0.05, 10.0, 5.0, 0, 0.01, 20e-3);
        assertThat(budget.hasBudget()).isTrue();
        assertThat(whole.hasBudget()).isFalse();
        assertThat(budget.setPointV()).isCloseTo(10e-3, within(1e-15));
        assertThat(budget.transientAllowanceV()).isCloseTo(30e-3, within(1e-15));
        assertThat(budget.transientFraction()).isCloseTo(0.03, within(1e-15));
        assertThat(budget.lowerLimitV()).isCloseTo(0.97, within(1e-15));
        assertThat(budget.upperLimitV()).isCloseTo(1.03, within(1e-15));
        assertThat(budget.lowerLimitV() - whole.lowerLimitV()).isCloseTo(10e-3 + 20e-3 / 2, within(1e-15));
        assertThat(whole.upperLimitV() - budget.upperLimitV()).isCloseTo(10e-3 + 20e-3 / 2, within(1e-15));
        assertThat(budget.targetImpedanceOhms()).isCloseTo(6e-3, within(1e-15));
        // the rail's whole band is still known, for display
        assertThat(budget.toleranceLowerV()).isCloseTo(0.95, within(1e-15));
        assertThat(budget.toleranceUpperV()).isCloseTo(1.05, within(1e-15));
        // no budget: the same figures as before, to the bit
        Rail zero = new Rail("example", 1.0, 0.05, 10.0, 5.0, 0, 0, 0);
        assertThat(zero.lowerLimitV()).isEqualTo(whole.lowerLimitV());
        assertThat(zero.targetImpedanceOhms()).isEqualTo(1.0 * 0.05 / 5.0);
    }

    @Test
    void aBudgetThatLeavesNothingIsRefused() {
        // ±5 % of 1 V is 50 mV; ±2 % set point and 60 mV of ripple (±30 mV) take all of it
        assertThatThrownBy(() -> new Rail("x", 1.0, 0.05, 2.0, 1.0, 0, 0.02, 60e-3)).hasMessageContaining("leave nothing");
        assertThatThrownBy(() -> new Rail("x", 1.0, 0.05, 2.0, 1.0, 0, -0.01, 0)).hasMessageContaining("set-point");
        assertThatThrownBy(() -> new Rail("x", 1.0, 0.05, 2.0, 1.0, 0, 0, -1e-3)).hasMessageContaining("ripple");
    }

    @Test
    void impossibleRailsAreRefused() {
        assertThatThrownBy(() -> new Rail("x", 1.0, 0.05, 2.0, 3.0, 0)).hasMessageContaining("current step");
        assertThatThrownBy(() -> new Rail("x", 1.0, 0.0, 2.0, 1.0, 0)).hasMessageContaining("tolerance");
        assertThatThrownBy(() -> new Rail("x", 1.0, 0.05, 2.0, 1.0, -1e-9)).hasMessageContaining("edge time");
    }
}
