package breakwater.timedomain;

import breakwater.network.PowerNetwork;
import breakwater.network.SeriesBranch;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * {@link PoleResidueModel#near}: the solver's warm start from a neighbouring bank's poles. Reference: the
 * model from the eigenvalue search ({@link PoleResidueModel#of}), itself checked against the frequency
 * domain in {@link PoleResidueModelTest}. The warm start may only save time, never change a figure.
 */
class WarmStartTest {

    /** The same network with the count of one bank part changed from n to n' (R, L × n/n', C × n'/n). */
    static PowerNetwork recount(PowerNetwork net, int branch, double factor) {
        List<SeriesBranch> board = new ArrayList<>(net.boardBranches());
        SeriesBranch b = board.get(branch);
        board.set(branch, new SeriesBranch(b.label(), b.resistanceOhms() / factor, b.inductanceH() / factor,
                b.capacitanceF() * factor));
        return new PowerNetwork(net.regulatorResistanceOhms(), net.regulatorInductanceH(), board, net.hasPackage(),
                net.packageResistanceOhms(), net.packageInductanceH(), net.loadBranches());
    }

    @Test
    void equalsTheEigenvalueSearchOnNeighbouringBanks() {
        Random rnd = new Random(21);
        int warm = 0;
        int trials = 0;
        for (int net = 0; net < 150; net++) {
            PowerNetwork a = Networks.random(rnd);
            PoleResidueModel hint = PoleResidueModel.of(a);
            for (int step = 0; step < 6; step++) {
                int branch = rnd.nextInt(a.boardBranches().size());
                // one more or one fewer part of a type counted 2..20: factors from 1/2 to 3/2
                int n = 2 + rnd.nextInt(19);
                PowerNetwork b = recount(a, branch, (n + (rnd.nextBoolean() ? 1.0 : -1.0)) / n);
                PoleResidueModel cold = PoleResidueModel.of(b);
                PoleResidueModel m = hint.near(b);
                trials++;
                if (m.warmStarted()) {
                    warm++;
                }
                assertSameModel(m, cold);
                hint = m;
                a = b;
            }
        }
        // the point of the warm start: most neighbours are found from the hint (observed: 87 %, 783 of 900)
        assertThat(warm).isGreaterThan(trials * 7 / 10);
    }

    @Test
    void takesTheEigenvalueSearchWhenTheStructureDiffers() {
        PowerNetwork a = Networks.realistic();
        List<SeriesBranch> fewer = new ArrayList<>(a.boardBranches());
        fewer.remove(fewer.size() - 1);
        PowerNetwork b = new PowerNetwork(a.regulatorResistanceOhms(), a.regulatorInductanceH(), fewer, true,
                a.packageResistanceOhms(), a.packageInductanceH(), a.loadBranches());
        PoleResidueModel m = PoleResidueModel.of(a).near(b);
        assertThat(m.warmStarted()).isFalse();
        assertSameModel(m, PoleResidueModel.of(b));
    }

    /**
     * Two identical branches side by side hide one natural frequency (it exchanges current between them and
     * the load cannot see it; circuit theory). A hint with a hidden mode lacks a pole the neighbour has, so
     * it must not be used: the neighbour's model has every pole.
     */
    @Test
    void aHintWithAHiddenModeIsNotUsed() {
        SeriesBranch p = Networks.part("x", 1e-6, 10e-3, 0.3e-9, 0.4e-9, 1);
        PowerNetwork twins = new PowerNetwork(0.5e-3, 10e-9, List.of(p, p), false, 0, 0, List.of());
        PoleResidueModel hint = PoleResidueModel.of(twins);
        // the second twin's capacitance halved: its resonance moves, the hidden mode becomes visible
        SeriesBranch q = new SeriesBranch("y", p.resistanceOhms(), p.inductanceH(), p.capacitanceF() / 2);
        PowerNetwork apart = new PowerNetwork(0.5e-3, 10e-9, List.of(p, q), false, 0, 0, List.of());
        PoleResidueModel cold = PoleResidueModel.of(apart);
        PoleResidueModel m = hint.near(apart);
        assertThat(m.warmStarted()).isFalse();
        assertThat(weighted(cold)).isGreaterThan(weighted(hint));
        assertSameModel(m, cold);
    }

    /** A far neighbour (a count ten times larger) either warm-starts correctly or falls back: never differs. */
    @Test
    void farNeighboursNeverChangeTheModel() {
        Random rnd = new Random(22);
        for (int t = 0; t < 100; t++) {
            PowerNetwork a = Networks.random(rnd);
            PowerNetwork b = recount(a, rnd.nextInt(a.boardBranches().size()), rnd.nextBoolean() ? 10.0 : 0.1);
            assertSameModel(PoleResidueModel.of(a).near(b), PoleResidueModel.of(b));
        }
    }

    /**
     * A hint from a network of the same structure but unrelated values (every element scaled at random by
     * 0.1 … 10): most guesses fail, and the result is still the eigenvalue search's model.
     */
    @Test
    void anUnrelatedHintOfTheSameStructureNeverChangesTheModel() {
        Random rnd = new Random(23);
        for (int t = 0; t < 200; t++) {
            PowerNetwork a = Networks.random(rnd);
            PowerNetwork b = scaledAtRandom(a, rnd);
            assertSameModel(PoleResidueModel.of(a).near(b), PoleResidueModel.of(b));
        }
    }

    static PowerNetwork scaledAtRandom(PowerNetwork n, Random rnd) {
        List<SeriesBranch> board = new ArrayList<>();
        for (SeriesBranch b : n.boardBranches()) {
            board.add(scaled(b, rnd));
        }
        List<SeriesBranch> load = new ArrayList<>();
        for (SeriesBranch b : n.loadBranches()) {
            load.add(scaled(b, rnd));
        }
        return new PowerNetwork(n.regulatorResistanceOhms() * factor(rnd), n.regulatorInductanceH() * factor(rnd),
                board, n.hasPackage(), n.packageResistanceOhms() * factor(rnd), n.packageInductanceH() * factor(rnd),
                load);
    }

    static SeriesBranch scaled(SeriesBranch b, Random rnd) {
        return new SeriesBranch(b.label(), b.resistanceOhms() * factor(rnd), b.inductanceH() * factor(rnd),
                b.capacitanceF() * factor(rnd));
    }

    static double factor(Random rnd) {
        return Math.pow(10, 2 * rnd.nextDouble() - 1);
    }

    static int weighted(PoleResidueModel m) {
        int c = 0;
        for (int k = 0; k < m.modeCount(); k++) {
            c += (int) m.modeWeight(k);
        }
        return c;
    }

    /** Same poles and residues (each matched to the nearest, to 1e-9 relative) and the same direct terms. */
    static void assertSameModel(PoleResidueModel m, PoleResidueModel ref) {
        assertThat(m.modeCount()).isEqualTo(ref.modeCount());
        double[] pr = m.poleRe();
        double[] pi = m.poleIm();
        double[] rr = m.residueRe();
        double[] ri = m.residueIm();
        for (int k = 0; k < ref.modeCount(); k++) {
            double qr = ref.poleRe()[k];
            double qi = ref.poleIm()[k];
            int best = 0;
            for (int j = 1; j < pr.length; j++) {
                if (Math.hypot(pr[j] - qr, pi[j] - qi) < Math.hypot(pr[best] - qr, pi[best] - qi)) {
                    best = j;
                }
            }
            double size = Math.hypot(qr, qi);
            assertThat(Math.hypot(pr[best] - qr, pi[best] - qi)).isLessThanOrEqualTo(1e-9 * size);
            double rs = Math.hypot(ref.residueRe()[k], ref.residueIm()[k]);
            assertThat(Math.hypot(rr[best] - ref.residueRe()[k], ri[best] - ref.residueIm()[k]))
                    .isLessThanOrEqualTo(1e-9 * rs + 1e-300);
        }
        if (ref.hasFiniteDirectTerm()) {
            assertThat(m.directTermOhms()).isCloseTo(ref.directTermOhms(), within(1e-15));
        }
        assertThat(m.constantTermOhms()).isCloseTo(ref.constantTermOhms(), within(1e-15));
    }
}
