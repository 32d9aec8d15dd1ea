package breakwater.report.export;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/** Jumps of a load pattern made strictly increasing for a SPICE PWL source. */
class PwlScheduleTest {

    @Test
    void withoutJumpsTheTimesAreKept() {
        double[] t = {0, 1e-9, 3e-9};
        PwlSchedule s = PwlSchedule.of(t, new double[] {1, 2, 3}, 1e-9);
        assertThat(s.timesS()).containsExactly(t);
        assertThat(s.jumps()).isZero();
    }

    @Test
    void aJumpIsSplitAroundItsTimeAndAJumpAtTheStartAfterIt() {
        double period = 1e-9;
        double[] t = {0, 0, 2e-9, 2e-9, 3e-9, 5e-9, 5e-9, 5e-9};
        double[] v = {1, 2, 2, 1, 1, 1, 2, 1.5};
        PwlSchedule s = PwlSchedule.of(t, v, period);
        double d = 1e-4 * period;
        assertThat(s.separationS()).isEqualTo(d);
        assertThat(s.jumps()).isEqualTo(3);
        assertThat(s.timesS()[0]).isZero();
        assertThat(s.timesS()[1]).isCloseTo(d, within(1e-24));
        assertThat(s.timesS()[2]).isCloseTo(2e-9 - d / 2, within(1e-24));
        assertThat(s.timesS()[3]).isCloseTo(2e-9 + d / 2, within(1e-24));
        assertThat(s.timesS()[4]).isEqualTo(3e-9);
        assertThat(s.timesS()[5]).isCloseTo(5e-9 - d, within(1e-24));
        assertThat(s.timesS()[6]).isCloseTo(5e-9, within(1e-24));
        assertThat(s.timesS()[7]).isCloseTo(5e-9 + d, within(1e-24));
        assertThat(s.valuesA()).containsExactly(v);
        for (int i = 1; i < t.length; i++) {
            assertThat(s.timesS()[i]).isGreaterThan(s.timesS()[i - 1]);
        }
    }

    @Test
    void breakpointsCloserThanTheSeparationAreOneInstantSoNoStepIsTiny() {
        // a rounding apart (1e-21 s) and 1e-15 s apart with a 1 ns fastest period (δ₀ = 1e-13 s): one instant,
        // spread by δ₀ in their order; a simulator would otherwise have to step by 1e-21 s
        double[] t = {0, 5e-9, 5e-9 + 1e-21, 5e-9 + 1e-15, 8e-9};
        PwlSchedule s = PwlSchedule.of(t, new double[] {0, 0, 1, 1, 1}, 1e-9);
        assertThat(s.separationS()).isCloseTo(1e-13, org.assertj.core.api.Assertions.within(1e-25));
        for (int i = 1; i < s.size(); i++) {
            assertThat(s.time(i) - s.time(i - 1)).isGreaterThanOrEqualTo(0.999e-13);
        }
        assertThat(s.time(2)).isCloseTo(5e-9, org.assertj.core.api.Assertions.within(1e-15));
        assertThat(s.valuesA()).containsExactly(0, 0, 1, 1, 1);
        assertThat(s.jumps()).isEqualTo(1);
    }

    @Test
    void separationStaysBelowTheGapsBetweenInstants() {
        // instants 3e-13 apart (above δ₀ = 1e-13 s), each a jump: δ shrinks to keep the order
        double[] t = {0, 3e-13, 3e-13, 6e-13, 6e-13};
        PwlSchedule s = PwlSchedule.of(t, new double[] {0, 0, 1, 1, 0}, 1e-9);
        assertThat(s.separationS()).isLessThanOrEqualTo(0.75e-13);
        for (int i = 1; i < s.size(); i++) {
            assertThat(s.time(i)).isGreaterThan(s.time(i - 1));
        }
    }

    @Test
    void decreasingTimesAreRefused() {
        assertThatThrownBy(() -> PwlSchedule.of(new double[] {0, 2, 1}, new double[] {0, 0, 0}, 1))
                .isInstanceOf(IllegalArgumentException.class);
    }
}
