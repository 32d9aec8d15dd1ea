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

    @Test
    void impossibleRailsAreRefused() {
        assertThatThrownBy(() -> new Rail("x", 1.0, 0.05, 2.0, 3.0, 0)).hasMessageContaining("current step");
        assertThatThrownBy(() -> new Rail("x", 1.0, 0.0, 2.0, 1.0, 0)).hasMessageContaining("tolerance");
        assertThatThrownBy(() -> new Rail("x", 1.0, 0.05, 2.0, 1.0, -1e-9)).hasMessageContaining("edge time");
    }
}
