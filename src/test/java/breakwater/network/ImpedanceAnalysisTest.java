package breakwater.network;

import breakwater.scenario.Band;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.assertj.core.api.Assertions.withinPercentage;

class ImpedanceAnalysisTest {

    /** Regulator inductance L (R_reg tiny) across a capacitor C with series R: one parallel resonance. */
    private static PowerNetwork tank(double l, double c, double r) {
        return new PowerNetwork(1e-9, l, List.of(new SeriesBranch("c", r, 0, c)), false, 0, 0, List.of());
    }

    @Test
    void singleTankPeakMatchesHandbookApproximations() {
        // Handbook (series-to-parallel transformation, valid for Q >> 1): an inductance L across C + R_s
        // resonates near f0 = 1/(2π√(LC)), with Q ≈ Z0/R_s and |Z|peak ≈ Q·Z0 = Z0²/R_s, Z0 = √(L/C).
        // With Q = 20 the corrections are of order 1/Q² = 0.25 %, hence the 1 % tolerances.
        double l = 10e-9;
        double c = 1e-6;
        double z0 = Math.sqrt(l / c);
        double r = z0 / 20;
        PowerNetwork net = tank(l, c, r);
        Band band = new Band(1e5, 1e8);
        ImpedanceMetrics m = ImpedanceAnalysis.analyze(net, ImpedanceCurve.sweep(net, FrequencyGrid.aroundBand(band, 200)),
                band, 1.0);
        assertThat(m.antiResonances()).hasSize(1);
        AntiResonance a = m.antiResonances().get(0);
        double f0 = 1 / (2 * Math.PI * Math.sqrt(l * c));
        assertThat(a.frequencyHz()).isCloseTo(f0, withinPercentage(1));
        assertThat(a.q()).isCloseTo(20, withinPercentage(1));
        assertThat(a.impedanceOhms()).isCloseTo(z0 * z0 / r, withinPercentage(1));
        assertThat(m.peakOhms()).isEqualTo(a.impedanceOhms());
        assertThat(m.peakHz()).isEqualTo(a.frequencyHz());
    }

    @Test
    void refinedPeakFrequencyIsBetterThanATenthOfAPercent() {
        // Reference: brute-force scan of |Z| at 1e-6 relative steps around the grid maximum.
        PowerNetwork net = new PowerNetwork(0.3e-3, 18e-9, List.of(
                new SeriesBranch("bulk", 8e-3, 2.5e-9, 220e-6),
                new SeriesBranch("mid", 1e-3, 0.2e-9, 30e-6),
                new SeriesBranch("hf", 2e-3, 0.05e-9, 1e-6)), false, 0, 0, List.of());
        Band band = new Band(1e4, 1e9);
        ImpedanceMetrics m = ImpedanceAnalysis.analyze(net, ImpedanceCurve.sweep(net, FrequencyGrid.aroundBand(band, 20)),
                band, 1.0);
        assertThat(m.antiResonances()).isNotEmpty();
        for (AntiResonance a : m.antiResonances()) {
            double bestF = a.frequencyHz();
            double best = 0;
            for (double f = a.frequencyHz() * 0.98; f < a.frequencyHz() * 1.02; f *= 1 + 1e-6) {
                double v = net.magnitude(f);
                if (v > best) {
                    best = v;
                    bestF = f;
                }
            }
            assertThat(a.frequencyHz()).isCloseTo(bestF, withinPercentage(0.1));
            assertThat(a.impedanceOhms()).isCloseTo(best, withinPercentage(1e-4));
        }
    }

    @Test
    void flatNetworkHasZeroFlatnessAndNoAntiResonance() {
        // Constant-resistance network (handbook): |Z| = R everywhere, so flatness 0 dB, no local maximum.
        double r = 2e-3;
        double l = 20e-9;
        PowerNetwork net = new PowerNetwork(r, l, List.of(new SeriesBranch("c", r, 0, l / (r * r))), false, 0, 0, List.of());
        Band band = new Band(1e4, 1e8);
        ImpedanceMetrics m = ImpedanceAnalysis.analyze(net, ImpedanceCurve.sweep(net, FrequencyGrid.aroundBand(band, 200)),
                band, r);
        assertThat(m.flatnessDb()).isCloseTo(0, within(1e-6));
        assertThat(m.peakOverTarget()).isCloseTo(1, within(1e-9));
        assertThat(m.antiResonances()).isEmpty();
    }

    @Test
    void flatnessIsTwentyLogOfPeakOverMin() {
        PowerNetwork net = tank(10e-9, 1e-6, 5e-3);
        Band band = new Band(1e5, 1e8);
        ImpedanceMetrics m = ImpedanceAnalysis.analyze(net, ImpedanceCurve.sweep(net, FrequencyGrid.aroundBand(band, 200)),
                band, 1.0);
        assertThat(m.flatnessDb()).isCloseTo(20 * Math.log10(m.peakOhms() / m.minOhms()), within(1e-12));
        assertThat(m.minOhms()).isLessThanOrEqualTo(net.magnitude(band.fromHz()));
        assertThat(m.minOhms()).isLessThanOrEqualTo(net.magnitude(band.toHz()));
    }
}
