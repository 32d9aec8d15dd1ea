package breakwater.timedomain;

import breakwater.network.PowerNetwork;
import breakwater.network.SeriesBranch;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Random;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** The lag grid of the slew-limited worst case ({@link LagGrid}): where it ends and what its steps cost. */
class LagGridTest {

    /**
     * Discretisation: the grid optimum is a lower bound of the continuous one; halving every step moves it
     * by less than 3e-4 relative (measured: 6e-6 … 1.2e-4 on the realistic network), and it never exceeds
     * the ideal-edge bound, which it approaches as t_e → 0 (docs/worst-case.md#lag-grid-and-its-error-bound).
     */
    @Test
    void gridRefinementAndIdealLimit() throws Exception {
        PoleResidueModel m = PoleResidueModel.of(Networks.realistic());
        double ideal = WorstCaseAnalyzer.idealEdges(m).droopOhms();
        for (double te : new double[]{1e-12, 0.5e-9, 10e-9}) {
            double droop = WorstCaseAnalyzer.edgeLimited(m, te).droopOhms();
            double[] lags = LagGrid.lags(m, te);
            double[] fine = new double[2 * lags.length - 1];
            for (int i = 0; i < lags.length; i++) {
                fine[2 * i] = lags[i];
                if (i + 1 < lags.length) {
                    fine[2 * i + 1] = 0.5 * (lags[i] + lags[i + 1]);
                }
            }
            double refined = WorstCaseAnalyzer.edgeLimitedOnGrid(m, fine, te, true, new double[fine.length]);
            assertThat(refined).isGreaterThanOrEqualTo(droop * (1 - 1e-12));
            assertThat(refined).isCloseTo(droop, within(3e-4 * droop));
            assertThat(droop).isLessThanOrEqualTo(ideal * (1 + 1e-12));
        }
        assertThat(WorstCaseAnalyzer.edgeLimited(m, 1e-12).droopOhms()).isCloseTo(ideal, within(3e-4 * ideal));
    }

    /**
     * Reference: calculus, ∫_T^∞ |r e^{pt}| dt = |r| e^{Re(p)·T}/|Re p|. Beyond the grid's last lag T every
     * mode's share of ∫|h| is at most {@link LagGrid#GRID_TAIL_TOLERANCE} of S = Σ|w r|/|Re p| (slack 1e-9
     * relative for the rounding of the lags). The lags start at 0 and ascend.
     */
    @Property(tries = 40)
    void everyModeHasDecayedByTheGridsEnd(@ForAll long seed, @ForAll @DoubleRange(min = -12, max = -7) double logTe) {
        PoleResidueModel m = PoleResidueModel.of(Networks.random(new Random(seed)));
        double[] lags = LagGrid.lags(m, Math.pow(10, logTe));
        assertThat(lags[0]).isZero();
        for (int i = 1; i < lags.length; i++) {
            assertThat(lags[i]).isGreaterThan(lags[i - 1]);
        }
        double end = lags[lags.length - 1];
        double total = 0;
        for (int k = 0; k < m.modeCount(); k++) {
            total += m.modeWeight(k) * Math.hypot(m.rr[k], m.ri[k]) / -m.pr[k];
        }
        for (int k = 0; k < m.modeCount(); k++) {
            double tail = m.modeWeight(k) * Math.hypot(m.rr[k], m.ri[k]) * Math.exp(m.pr[k] * end) / -m.pr[k];
            assertThat(tail).as("mode %d", k).isLessThanOrEqualTo(LagGrid.GRID_TAIL_TOLERANCE * total * (1 + 1e-9));
        }
    }

    /**
     * Circuit theory: a load node with series inductance L∞ shows L∞·di/dt, so the worst case needs a full
     * ramp of one edge time to reach L∞/t_e; the grid's first step must be no longer than t_e (it is
     * t_e/8, {@link LagGrid#STEPS_PER_EDGE}), also when t_e is far shorter than the finest step the
     * network's own modes would ask for (1/{@value LagGrid#FINEST_FRACTION} of the fastest period).
     */
    @Test
    void seriesInductanceGetsAFirstStepWithinOneEdge() {
        List<SeriesBranch> board = List.of(Networks.part("a", 10e-6, 5e-3, 0.5e-9, 0.5e-9, 4));
        PowerNetwork net = new PowerNetwork(1e-3, 10e-9, board, true, 0.5e-3, 50e-12, List.of());
        PoleResidueModel m = PoleResidueModel.of(net);
        assertThat(m.seriesInductanceH()).isPositive();
        for (double te : new double[] {1e-12, 1e-10, 1e-9}) {
            double[] lags = LagGrid.lags(m, te);
            assertThat(lags[1]).as("t_e = %s", te).isLessThanOrEqualTo(te / LagGrid.STEPS_PER_EDGE * (1 + 1e-12));
        }
    }
}
