package breakwater.network;

import breakwater.scenario.Band;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.assertj.core.api.Assertions.withinPercentage;

/**
 * The impedance model against circuit-theory handbook identities. Tolerances are rounding-level (1e-9
 * relative) where the identity is exact, and stated beside each check where it is an approximation.
 */
class NetworkIdentitiesTest {

    /** An impedance R + jX. */
    private record Impedance(double resistanceOhms, double reactanceOhms) {
        double magnitudeOhms() {
            return Math.hypot(resistanceOhms, reactanceOhms);
        }
    }

    /** The branch's impedance at {@code fHz}, as 1/Y from its admittance. */
    private static Impedance z(SeriesBranch b, double fHz) {
        double[] y = new double[2];
        b.admittance(2 * Math.PI * fHz, y);
        double m = y[0] * y[0] + y[1] * y[1];
        return new Impedance(y[0] / m, -y[1] / m);
    }

    @Test
    void seriesRlcIsPurelyResistiveAtResonanceCapacitiveBelowInductiveAbove() {
        // Handbook: series R-L-C has |Z| = R at f0 = 1/(2π√(LC)), X < 0 below f0, X > 0 above.
        SeriesBranch b = new SeriesBranch("c", 5e-3, 1.2e-9, 1e-6);
        double f0 = 1 / (2 * Math.PI * Math.sqrt(1.2e-9 * 1e-6));
        assertThat(b.seriesResonanceHz()).isCloseTo(f0, withinPercentage(1e-10));
        assertThat(z(b, f0).magnitudeOhms()).isCloseTo(5e-3, withinPercentage(1e-6));
        assertThat(z(b, f0 / 3).reactanceOhms()).isNegative();
        assertThat(z(b, f0 * 3).reactanceOhms()).isPositive();
        // and the reactance itself: X = ωL − 1/(ωC)
        double w = 2 * Math.PI * f0 * 3;
        assertThat(z(b, f0 * 3).reactanceOhms()).isCloseTo(w * 1.2e-9 - 1 / (w * 1e-6), withinPercentage(1e-9));
    }

    @Test
    void nIdenticalBranchesInParallelEqualOneBranchWithRoverNLoverNnC() {
        // Handbook: n equal impedances in parallel = Z/n; for R + sL + 1/(sC) that is R/n, L/n, nC.
        SeriesBranch one = new SeriesBranch("c", 8e-3, 0.9e-9, 4.7e-6);
        int n = 7;
        List<SeriesBranch> separate = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            separate.add(one);
        }
        PowerNetwork a = new PowerNetwork(0.3e-3, 18e-9, separate, false, 0, 0, List.of());
        PowerNetwork b = new PowerNetwork(0.3e-3, 18e-9, List.of(one.parallel(n)), false, 0, 0, List.of());
        double[] za = new double[2];
        double[] zb = new double[2];
        for (double f = 1e3; f < 1e10; f *= 1.37) {
            a.impedance(f, za);
            b.impedance(f, zb);
            assertThat(zb[0]).as("Re Z at %s Hz", f).isCloseTo(za[0], within(1e-9 * Math.hypot(za[0], za[1])));
            assertThat(zb[1]).as("Im Z at %s Hz", f).isCloseTo(za[1], within(1e-9 * Math.hypot(za[0], za[1])));
        }
    }

    @Test
    void constantResistanceNetworkIsFlatAtEveryFrequency() {
        // Handbook (constant-resistance network): (R + sL) ∥ (R + 1/(sC)) with L/C = R² equals R for all s.
        double r = 2e-3;
        double l = 20e-9;
        double c = l / (r * r);
        PowerNetwork net = new PowerNetwork(r, l, List.of(new SeriesBranch("c", r, 0, c)), false, 0, 0, List.of());
        double[] zz = new double[2];
        for (double f = 1; f < 1e11; f *= 1.9) {
            net.impedance(f, zz);
            assertThat(zz[0]).isCloseTo(r, within(1e-12));
            assertThat(zz[1]).isCloseTo(0, within(1e-12));
        }
    }

    @Test
    void dcResistanceIsRegulatorPlusPackage() {
        // Every shunt branch holds a capacitor, so no DC current flows in it: Z(0) = R_reg + R_pkg.
        PowerNetwork net = new PowerNetwork(0.3e-3, 18e-9, List.of(new SeriesBranch("b", 5e-3, 1e-9, 100e-6)),
                true, 0.4e-3, 25e-12, List.of(new SeriesBranch("die", 0.3e-3, 0, 150e-9)));
        double[] zz = new double[2];
        net.impedance(0.0, zz);
        assertThat(zz[0]).isEqualTo(0.7e-3);
        assertThat(zz[1]).isEqualTo(0.0);
        net.impedance(1e-3, zz); // 1 mHz: the capacitors are open, the regulator inductance negligible
        assertThat(zz[0]).isCloseTo(0.7e-3, withinPercentage(1e-6));
        assertThat(net.dcResistanceOhms()).isEqualTo(0.7e-3);
    }

    @Test
    void fastEngineAgreesWithReferenceSweep() {
        // Two engines that must agree: cached per-part admittances × counts vs the full network.
        Random rnd = new Random(7);
        List<SeriesBranch> units = List.of(
                new SeriesBranch("p1", 10e-3, 2e-9, 220e-6),
                new SeriesBranch("p2", 3e-3, 1.1e-9, 22e-6),
                new SeriesBranch("p3", 6e-3, 0.8e-9, 2.2e-6),
                new SeriesBranch("p4", 25e-3, 0.6e-9, 100e-9));
        PowerNetwork fixed = new PowerNetwork(0.3e-3, 18e-9, List.of(new SeriesBranch("plane", 0.5e-3, 0, 6e-9)),
                true, 0.4e-3, 25e-12, List.of(new SeriesBranch("die", 0.3e-3, 0, 150e-9)));
        FrequencyGrid grid = FrequencyGrid.aroundBand(new Band(1e4, 1.5e8), 50);
        ImpedanceEngine engine = new ImpedanceEngine(fixed, units, grid);
        double[] re = new double[grid.size()];
        double[] im = new double[grid.size()];
        for (int trial = 0; trial < 20; trial++) {
            int[] counts = new int[units.size()];
            List<SeriesBranch> board = new ArrayList<>(fixed.boardBranches());
            for (int p = 0; p < counts.length; p++) {
                counts[p] = rnd.nextInt(6);
                if (counts[p] > 0) {
                    board.add(units.get(p).parallel(counts[p]));
                }
            }
            PowerNetwork full = new PowerNetwork(0.3e-3, 18e-9, board, true, 0.4e-3, 25e-12, fixed.loadBranches());
            engine.sweep(counts, re, im);
            ImpedanceCurve ref = ImpedanceCurve.sweep(full, grid);
            for (int k = 0; k < grid.size(); k++) {
                double mag = ref.magnitudeOhms(k);
                assertThat(re[k]).isCloseTo(ref.realOhms()[k], within(1e-10 * mag));
                assertThat(im[k]).isCloseTo(ref.imagOhms()[k], within(1e-10 * mag));
            }
        }
    }

    @Test
    void gridHasTheRequestedDensityAndEnds() {
        FrequencyGrid g = FrequencyGrid.logarithmic(1e3, 1e9, 200);
        assertThat(g.size()).isEqualTo(6 * 200 + 1);
        assertThat(g.at(0)).isEqualTo(1e3);
        assertThat(g.at(g.size() - 1)).isEqualTo(1e9);
        assertThat(g.at(200)).isCloseTo(1e4, withinPercentage(1e-9));
    }
}
