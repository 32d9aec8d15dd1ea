package breakwater.design;

import breakwater.Fixtures;
import breakwater.scenario.Die;
import breakwater.scenario.Plane;
import breakwater.scenario.Rail;
import breakwater.scenario.Regulator;
import org.junit.jupiter.api.Test;

import java.util.Optional;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

class WorstCaseVoltsTest {

    @Test
    void flatImpedanceAtTheTargetGivesAWorstCaseRatioOfOne() throws Exception {
        // Common practice: an impedance flat at the target keeps the excursion at ΔI·Z_t. Built as the
        // constant-resistance network (handbook): regulator Z_t + sL in parallel with a plane Z_t + 1/(sC)
        // with L/C = Z_t², which is exactly Z_t at every frequency.
        Rail rail = new Rail("flat", 1.0, 0.05, 4.0, 2.0, 0);
        double zt = rail.targetImpedanceOhms();
        double l = 10e-9;
        var scenario = Fixtures.scenario().rail(rail).regulator(new Regulator(zt, l))
                .plane(new Plane(l / (zt * zt), zt)).die(Die.NONE).build();
        Evaluation e = new BankEvaluator(scenario, Optional.empty()).evaluate(CapacitorBank.EMPTY);
        WorstCaseVolts f = e.figures();
        assertThat(f.droopV()).isCloseTo(rail.currentStepA() * zt, within(1e-9));
        assertThat(f.worstCaseRatio()).isCloseTo(1.0, within(1e-9));
        // docs/worst-case.md#notation: V_min = V_nom − Z(0)·I_min − droop, with Z(0) = R_reg here
        assertThat(f.minVoltageV()).isCloseTo(1.0 - zt * rail.minCurrentA() - f.droopV(), within(1e-12));
        // P − N = Z(0) (worst-case mathematics): droop − overshoot = ΔI·Z(0)
        assertThat(f.droopV() - f.overshootV()).isCloseTo(rail.currentStepA() * zt, within(1e-9));
        assertThat(f.marginV()).isCloseTo(Math.min(f.minVoltageV() - rail.lowerLimitV(),
                rail.upperLimitV() - f.maxVoltageV()), within(1e-15));
    }

    @Test
    void narrowerLimitsAreHonoured() throws Exception {
        var scenario = Fixtures.scenario().build();
        BankEvaluator ev = new BankEvaluator(scenario, Optional.empty());
        double op = ev.operatingPointV();
        BankEvaluator tight = ev.withLimits(Limits.around(op, 1e-3, 1e-3));
        assertThat(tight.limits().lowerV()).isCloseTo(op - 1e-3, within(1e-15));
        // never wider than the rail's own band
        BankEvaluator wide = ev.withLimits(Limits.around(op, 10, 10));
        assertThat(wide.limits()).isEqualTo(Limits.of(scenario.rail()));
    }
}
