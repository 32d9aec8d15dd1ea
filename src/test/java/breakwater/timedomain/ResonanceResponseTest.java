package breakwater.timedomain;

import breakwater.network.PowerNetwork;
import breakwater.network.SeriesBranch;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

class ResonanceResponseTest {

    /** One parallel resonance: regulator inductance L to ground (R_reg = 0) ∥ capacitor C with series R. */
    private static PowerNetwork singleResonance(double q) {
        double l = 1e-9;
        double c = 1e-6;
        return new PowerNetwork(0, l, List.of(new SeriesBranch("c", Math.sqrt(l / c) / q, 0, c)), false, 0, 0,
                List.of());
    }

    /** The anti-resonance: peak of |Z| found by Commons Math's Brent optimiser on PowerNetwork.magnitude. */
    private static double peakFrequency(PowerNetwork net, double guessHz) {
        return new BrentOptimizer(1e-12, 1e-30).optimize(new MaxEval(2000),
                new UnivariateObjectiveFunction(net::magnitude), GoalType.MAXIMIZE,
                new SearchInterval(0.5 * guessHz, 2 * guessHz)).getPoint();
    }

    private static ResonanceResponse analyse(double q) {
        PowerNetwork net = singleResonance(q);
        double f0 = peakFrequency(net, 1 / (2 * Math.PI * Math.sqrt(1e-9 * 1e-6)));
        return ResonanceResponse.of(PoleResidueModel.of(net), f0);
    }

    /**
     * Common practice (resonance facts of the trade, docs/worst-case.md#resonance-figures, values from memory, no published
     * source): at Q ≈ 5.6 the resonant sine steady state is about 3.2 × the step-response peak and a 50 %
     * square wave about 4.1 ×; ±3 % because the rule of thumb is quoted to two digits.
     */
    @Test
    void sineAndSquareVersusStepAtQ56() {
        ResonanceResponse r = analyse(5.6);
        assertThat(r.sineAmplitudeOhms() / r.stepPeakOhms()).isCloseTo(3.2, within(0.03 * 3.2));
        assertThat(r.squareAmplitudeOhms() / r.stepPeakOhms()).isCloseTo(4.1, within(0.03 * 4.1));
        // Q of the pole pair equals √(L/C)/R for this circuit (circuit theory: s²LC + sRC + 1 = 0)
        assertThat(r.q()).isCloseTo(5.6, within(1e-9));
    }

    /**
     * Handbook identity (Fourier series of a square wave): the fundamental of a 0..1 square wave has
     * amplitude 2/π against 1/2 for the 0..1 sine, so square/sine = 4/π when the resonance filters out
     * the harmonics; ±0.5 % covers the residual harmonics at Q ≥ 5.6.
     */
    @Test
    void squareOverSineIsFourOverPi() {
        for (double q : new double[]{5.6, 10, 20}) {
            ResonanceResponse r = analyse(q);
            assertThat(r.squareAmplitudeOhms() / r.sineAmplitudeOhms()).isCloseTo(4 / Math.PI, within(0.005 * 4 / Math.PI));
        }
    }

    /** Steady-state sine amplitude = |Z(f0)|/2 (definition), against the frequency-domain engine. */
    @Test
    void sineAmplitudeIsHalfTheImpedanceMagnitude() {
        PowerNetwork net = Networks.realistic();
        double f0 = peakFrequency(net, 75e6);
        ResonanceResponse r = ResonanceResponse.of(PoleResidueModel.of(net), f0);
        assertThat(r.sineAmplitudeOhms()).isCloseTo(net.magnitude(f0) / 2, within(1e-6 * net.magnitude(f0)));
        assertThat(r.q()).isGreaterThan(1);
    }

    /**
     * Common practice (rule of thumb, from memory): about Q + 0.5 cycles of resonant drive reach 95 % of
     * the steady state; held within ±1 cycle for Q from 3 to 10 (the rule is quoted to the cycle).
     */
    @Test
    void cyclesToNinetyFivePercentFollowTheRuleOfThumb() {
        for (int q = 3; q <= 10; q++) {
            ResonanceResponse r = analyse(q);
            assertThat((double) r.cyclesTo95Percent()).as("Q = %d", q).isCloseTo(q + 0.5, within(1.0));
        }
    }

    /**
     * Common practice: a flat impedance equal to the target keeps the excursion at ΔI·Z_t (the
     * constant-resistance network (R + sL) ∥ (R + 1/(sC)), L/C = R², is exactly R: circuit theory), while
     * three anti-resonances each at the target add up. Found: each well-separated high-Q anti-resonance
     * contributes about (2/π)·Z_t, so three give about 1.8·Z_t (held here at more than 1.5·Z_t).
     */
    @Test
    void threeAntiResonancesAtTheTargetExceedAFlatTarget() throws Exception {
        double zt = 10e-3;
        double l = 5e-9;
        PowerNetwork flat = new PowerNetwork(zt, l, List.of(new SeriesBranch("c", zt, 0, l / (zt * zt))), false, 0, 0,
                List.of());
        assertThat(WorstCaseAnalyzer.idealEdges(PoleResidueModel.of(flat)).droopOhms()).isCloseTo(zt, within(1e-12 * zt));

        double q = 8;
        double z0 = zt / q;
        double r = z0 / q / 2;
        double l1 = 10e-9;
        double l2 = l1 / 100;
        double l3 = l2 / 100;
        PowerNetwork three = new PowerNetwork(r, l1, List.of(
                new SeriesBranch("a", r, l2, l1 / (z0 * z0)),
                new SeriesBranch("b", r, l3, l2 / (z0 * z0)),
                new SeriesBranch("c", r, 0, l3 / (z0 * z0))), false, 0, 0, List.of());
        double peak = 0;
        int peaks = 0;
        double prev = 0;
        double prev2 = 0;
        for (double lf = 3; lf <= 9; lf += 0.001) {
            double m = three.magnitude(Math.pow(10, lf));
            if (prev > prev2 && prev > m) {
                peaks++;
                assertThat(prev).as("each anti-resonance near the target").isBetween(0.75 * zt, zt);
            }
            peak = Math.max(peak, m);
            prev2 = prev;
            prev = m;
        }
        assertThat(peaks).isEqualTo(3);
        double droop = WorstCaseAnalyzer.idealEdges(PoleResidueModel.of(three)).droopOhms();
        assertThat(droop).isGreaterThan(1.5 * zt);
    }
}
