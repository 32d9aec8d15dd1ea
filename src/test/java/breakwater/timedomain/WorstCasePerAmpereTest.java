package breakwater.timedomain;

import breakwater.network.PowerNetwork;
import breakwater.network.SeriesBranch;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/**
 * The figures-only entry point used for scoring: it must give exactly what the full analysis reports
 * (its block-wise hat weights are held to the lag-by-lag sum in {@link HatWeightsTest}).
 */
class WorstCasePerAmpereTest {

    /** A random network; half of them get a plane at the load node so that ideal edges are bounded. */
    static PowerNetwork network(long seed) {
        Random r = new Random(seed);
        PowerNetwork n = Networks.random(r);
        if (n.hasFiniteHighFrequencyLimit() || r.nextBoolean()) {
            return n;
        }
        List<SeriesBranch> board = new ArrayList<>(n.boardBranches());
        board.add(new SeriesBranch("plane", 0.5e-3, 0, 5e-9));
        return new PowerNetwork(n.regulatorResistanceOhms(), n.regulatorInductanceH(), board, false, 0, 0,
                List.of());
    }

    /** Same computation on both paths (patterns are only added by analyze): equal bit for bit. */
    @Property(tries = 40)
    void figuresEqualTheFullAnalysisWithAnEdgeTime(@ForAll long seed,
                                                  @ForAll @DoubleRange(min = -12, max = -7) double logTe)
            throws Exception {
        PoleResidueModel m = PoleResidueModel.of(network(seed));
        double te = Math.pow(10, logTe);
        WorstCase full = WorstCaseAnalyzer.analyze(m, te);
        WorstCasePerAmpere fig = WorstCaseAnalyzer.figures(m, te);
        assertThat(fig.droopOhms()).isEqualTo(full.droopOhms());
        assertThat(fig.overshootOhms()).isEqualTo(full.overshootOhms());
        assertThat(fig.edgeTimeS()).isEqualTo(te);
        assertThat(full.figures()).isEqualTo(fig);
    }

    @Property(tries = 40)
    void figuresEqualTheFullAnalysisWithIdealEdges(@ForAll long seed) throws Exception {
        PoleResidueModel m = PoleResidueModel.of(network(seed));
        if (!m.hasFiniteDirectTerm()) {
            assertThatThrownBy(() -> WorstCaseAnalyzer.figures(m, 0.0)).isInstanceOf(UnboundedWorstCaseException.class);
            return;
        }
        WorstCase full = WorstCaseAnalyzer.analyze(m, 0.0);
        WorstCasePerAmpere fig = WorstCaseAnalyzer.figures(m, 0.0);
        assertThat(fig).isEqualTo(full.figures());
    }

    /** The realistic network: figures and full analysis agree for a range of edge times. */
    @Test
    void realisticNetworkAgreesAcrossEdgeTimes() throws Exception {
        PoleResidueModel m = PoleResidueModel.of(Networks.realistic());
        for (double te : new double[]{0, 1e-12, 0.5e-9, 1e-9, 10e-9, 1e-6}) {
            assertThat(WorstCaseAnalyzer.figures(m, te)).as("t_e = %s", te)
                    .isEqualTo(WorstCaseAnalyzer.analyze(m, te).figures());
        }
    }

    @Test
    void invalidInputsAreRejected() {
        PoleResidueModel m = PoleResidueModel.of(Networks.moderate());
        assertThatThrownBy(() -> WorstCaseAnalyzer.figures(m, -1e-9)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> WorstCaseAnalyzer.figures(m, Double.NaN)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new WorstCasePerAmpere(-1e-3, 0, 0)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new WorstCasePerAmpere(1e-3, Double.NaN, 0)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new WorstCasePerAmpere(1e-3, 0, -1)).isInstanceOf(IllegalArgumentException.class);
    }
}
