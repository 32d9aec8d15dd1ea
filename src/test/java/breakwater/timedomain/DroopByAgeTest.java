package breakwater.timedomain;

import breakwater.network.PowerNetwork;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** How much of the worst droop comes from load activity older than given times ({@link DroopByAge}). */
class DroopByAgeTest {

    /** The pattern with u set to 0 on lags [0, a) (a jump at a), built here from the definition. */
    private static LoadPattern cut(LoadPattern p, double a) {
        java.util.List<double[]> rows = new java.util.ArrayList<>();
        rows.add(new double[]{0, 0});
        rows.add(new double[]{a, 0});
        rows.add(new double[]{a, p.u(a)}); // a slew-limited pattern is continuous, so u(a) is the value on either side
        for (int i = 0; i < p.size(); i++) {
            if (p.lagS(i) > a) {
                rows.add(new double[]{p.lagS(i), p.value(i)});
            }
        }
        double[] lags = rows.stream().mapToDouble(r -> r[0]).toArray();
        double[] vals = rows.stream().mapToDouble(r -> r[1]).toArray();
        return new LoadPattern(lags, vals);
    }

    /**
     * Reference: Commons Math Dormand–Prince 8(5,3) on the circuit's own Kirchhoff equations
     * ({@code CircuitOde}), driven by the worst-case droop pattern with the load held at I_min for the last
     * a before the worst instant: its response at the worst instant is the part of the droop due to the
     * older activity. Tolerance 1e-5 of the droop (the integrator runs at 1e-11; the tests of the worst case
     * hold the whole pattern to the same). Also: at age 0 it is the whole droop, and the shares fall to
     * what the pattern's far tail still holds.
     */
    @Test
    void theShareOfOlderActivityEqualsASimulationOfThePatternWithTheRecentPartRemoved() {
        PowerNetwork net = Networks.moderate();
        PoleResidueModel m = PoleResidueModel.of(net);
        WorstCase wc = WorstCaseAnalyzer.edgeLimited(m, 2e-9);
        LoadPattern p = wc.droopPattern();
        assertThat(DroopByAge.olderThan(m, p, 0)).isCloseTo(wc.droopOhms(), within(1e-9 * wc.droopOhms()));
        CircuitOde ode = new CircuitOde(net);
        for (double a : new double[]{5e-9, 30e-9, 200e-9}) {
            double older = DroopByAge.olderThan(m, p, a);
            double simulated = ode.responseAtWorstInstant(cut(p, a), 1e-11);
            assertThat(older).as("older than %s s", a).isCloseTo(simulated, within(1e-5 * wc.droopOhms()));
        }
        List<DroopByAge.Share> shares = DroopByAge.of(m, p);
        assertThat(shares).extracting(DroopByAge.Share::ageS).containsExactlyElementsOf(DroopByAge.AGES_S);
        // the pattern's own length is far below 100 µs here: nothing that old is left but the held value's tail
        assertThat(shares.get(shares.size() - 1).olderOhms()).isCloseTo(0.0, within(1e-6 * wc.droopOhms()));
    }
}
