package breakwater.timedomain;

import breakwater.network.FrequencyGrid;
import breakwater.network.ImpedanceEngine;
import breakwater.network.PowerNetwork;
import breakwater.network.RegionPath;
import breakwater.network.SeriesBranch;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealVector;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Placement regions (docs/network-model.md#placement-regions): each region's parts sit behind a spreading
 * path R_r + sL_r from the board node. Checked against the single-node network, the series and parallel
 * combination rules of circuit theory, an independent nodal analysis, and a Commons Math ODE integration.
 */
class RegionNetworkTest {

    /** Invented regions, in the orders of magnitude of a core rail's layout (common practice). */
    static PowerNetwork realisticWithRegions(double scale) {
        List<SeriesBranch> bank = Networks.eightPartBank();
        List<RegionPath> regions = List.of(
                new RegionPath("under-package", scale * 0.05e-3, scale * 8e-12, bank.subList(4, 8)),
                new RegionPath("ring", scale * 0.1e-3, scale * 40e-12, bank.subList(1, 4)),
                new RegionPath("bulk", scale * 0.3e-3, scale * 250e-12, bank.subList(0, 1)));
        return new PowerNetwork(0.3e-3, 18e-9, List.of(new SeriesBranch("plane", 0.5e-3, 0, 6e-9)), true, 0.4e-3,
                25e-12, List.of(new SeriesBranch("die", 0.3e-3, 0, 150e-9)), regions);
    }

    /**
     * Regions whose paths are all shorts are the board node: the same impedance, poles and worst case as
     * {@link Networks#realistic()} (the same branches on the board node), to 1e-12 relative.
     */
    @Test
    void shortPathsEqualTheSingleNodeNetwork() throws Exception {
        PowerNetwork single = Networks.realistic();
        PowerNetwork placed = realisticWithRegions(0);
        double[] a = new double[2];
        double[] b = new double[2];
        for (double f = 1e3; f < 1e10; f *= 1.07) {
            single.impedance(f, a);
            placed.impedance(f, b);
            double m = Math.hypot(a[0], a[1]);
            assertThat(Math.hypot(a[0] - b[0], a[1] - b[1])).isLessThan(1e-12 * m);
        }
        PoleResidueModel ms = PoleResidueModel.of(single);
        PoleResidueModel mp = PoleResidueModel.of(placed);
        assertThat(mp.modeCount()).isEqualTo(ms.modeCount());
        WorstCase ws = WorstCaseAnalyzer.idealEdges(ms);
        WorstCase wp = WorstCaseAnalyzer.idealEdges(mp);
        assertThat(wp.droopOhms()).isCloseTo(ws.droopOhms(), within(1e-12 * ws.droopOhms()));
        assertThat(wp.overshootOhms()).isCloseTo(ws.overshootOhms(), within(1e-12 * ws.droopOhms()));
        WorstCasePerAmpere es = WorstCaseAnalyzer.figures(ms, 1e-9);
        WorstCasePerAmpere ep = WorstCaseAnalyzer.figures(mp, 1e-9);
        assertThat(ep.droopOhms()).isCloseTo(es.droopOhms(), within(1e-12 * es.droopOhms()));
        assertThat(ep.overshootOhms()).isCloseTo(es.overshootOhms(), within(1e-12 * es.droopOhms()));
    }

    /**
     * Reference: the series and parallel combination rules of circuit theory (any circuit-analysis
     * textbook: impedances in series add, admittances in parallel add; n equal branches in parallel are
     * one of Z/n), written with Commons Math {@link Complex}: Z = Z_reg ∥ (R_r + jωL_r + Z_part/n), with
     * Z_part = ESR + jω·ESL + 1/(jωC). At the part's series resonance 1/(2π√(ESL·C)) its reactances cancel
     * (the textbook series RLC at resonance is purely resistive), so the region branch is R_r + ESR/n + jω₀L_r.
     */
    @Test
    void oneRegionWithOnePartTypeFollowsSeriesAndParallelRules() {
        double rReg = 1e-3;
        double lReg = 10e-9;
        double esr = 5e-3;
        double esl = 0.6e-9;
        double c = 10e-6;
        int n = 4;
        double rPath = 0.2e-3;
        double lPath = 100e-12;
        PowerNetwork net = new PowerNetwork(rReg, lReg, List.of(), false, 0, 0, List.of(),
                List.of(new RegionPath("only", rPath, lPath, List.of(new SeriesBranch("p", esr, esl, c).parallel(n)))));
        double[] z = new double[2];
        for (double f = 1e3; f < 3e9; f *= 1.3) {
            double w = 2 * Math.PI * f;
            Complex part = new Complex(esr, w * esl - 1 / (w * c));
            Complex branch = new Complex(rPath, w * lPath).add(part.divide(n));
            Complex reg = new Complex(rReg, w * lReg);
            Complex expected = reg.multiply(branch).divide(reg.add(branch));
            net.impedance(f, z);
            assertThat(Math.hypot(z[0] - expected.getReal(), z[1] - expected.getImaginary()))
                    .isLessThan(1e-12 * expected.abs());
        }
        double f0 = 1 / (2 * Math.PI * Math.sqrt(esl * c));
        double w0 = 2 * Math.PI * f0;
        Complex branch = new Complex(rPath + esr / n, w0 * lPath);
        Complex reg = new Complex(rReg, w0 * lReg);
        Complex expected = reg.multiply(branch).divide(reg.add(branch));
        net.impedance(f0, z);
        assertThat(z[0]).isCloseTo(expected.getReal(), within(1e-9 * expected.abs()));
        assertThat(z[1]).isCloseTo(expected.getImaginary(), within(1e-9 * expected.abs()));
    }

    /**
     * Reference: an independent nodal analysis (node admittance matrix Y·V = I of every node — board, load,
     * each region's — solved as the equivalent real system [[G, −B], [B, G]] by Commons Math's
     * {@link LUDecomposition}, with 1 A injected at the load), not the closed-form ladder. The network's
     * impedance, the fast per-part engine and the pole–residue model all agree with it.
     */
    @Test
    void nodalAnalysisAgreesWithNetworkEngineAndModel() {
        Random rnd = new Random(20261202);
        for (int trial = 0; trial < 40; trial++) {
            PowerNetwork net = trial == 0 ? realisticWithRegions(1) : randomWithRegions(rnd);
            PoleResidueModel model = PoleResidueModel.of(net);
            double[] z = new double[2];
            double[] zm = new double[2];
            for (double f = 1e3; f < 1e10; f *= 2.3) {
                Complex ref = nodalImpedance(net, f);
                net.impedance(f, z);
                assertThat(Math.hypot(z[0] - ref.getReal(), z[1] - ref.getImaginary())).as("network at %s Hz", f)
                        .isLessThan(1e-10 * ref.abs());
                model.impedance(f, zm);
                assertThat(Math.hypot(zm[0] - ref.getReal(), zm[1] - ref.getImaginary())).as("model at %s Hz", f)
                        .isLessThan(1e-7 * ref.abs());
            }
            // the engine: every part as a unit branch in its region, counts 1
            List<SeriesBranch> units = new ArrayList<>();
            List<Integer> regionOf = new ArrayList<>();
            List<RegionPath> empty = new ArrayList<>();
            for (int r = 0; r < net.regions().size(); r++) {
                for (SeriesBranch b : net.regions().get(r).branches()) {
                    units.add(b);
                    regionOf.add(r);
                }
                empty.add(net.regions().get(r).withBranches(List.of()));
            }
            PowerNetwork fixed = new PowerNetwork(net.regulatorResistanceOhms(), net.regulatorInductanceH(),
                    net.boardBranches(), net.hasPackage(), net.packageResistanceOhms(), net.packageInductanceH(),
                    net.loadBranches(), empty);
            FrequencyGrid grid = FrequencyGrid.logarithmic(1e3, 1e10, 10);
            ImpedanceEngine engine = new ImpedanceEngine(fixed, units,
                    regionOf.stream().mapToInt(Integer::intValue).toArray(), grid);
            double[] re = new double[grid.size()];
            double[] im = new double[grid.size()];
            int[] counts = new int[units.size()];
            java.util.Arrays.fill(counts, 1);
            engine.sweep(counts, re, im);
            for (int k = 0; k < grid.size(); k++) {
                Complex ref = nodalImpedance(net, grid.at(k));
                assertThat(Math.hypot(re[k] - ref.getReal(), im[k] - ref.getImaginary())).as("engine")
                        .isLessThan(1e-10 * ref.abs());
            }
        }
    }

    /**
     * Reference: Commons Math DormandPrince853Integrator on the circuit's own state equations with the
     * regions ({@link CircuitOde}), driven by the reported worst-case patterns from rest: the response at the
     * worst instant is the reported droop and overshoot, with ideal edges and with a 1 ns edge time.
     */
    @Test
    void worstCasePatternsOfAPlacedBankReplayInAnOdeIntegration() throws Exception {
        PowerNetwork net = moderateWithRegions();
        PoleResidueModel m = PoleResidueModel.of(net);
        CircuitOde ode = new CircuitOde(net);
        WorstCase ideal = WorstCaseAnalyzer.idealEdges(m);
        assertThat(ode.responseAtWorstInstant(ideal.droopPattern(), 1e-11))
                .isCloseTo(ideal.droopOhms(), within(1e-5 * ideal.droopOhms()));
        assertThat(new CircuitOde(net).responseAtWorstInstant(ideal.overshootPattern(), 1e-11))
                .isCloseTo(-ideal.overshootOhms(), within(1e-5 * ideal.droopOhms()));
        WorstCase slow = WorstCaseAnalyzer.analyze(m, 1e-9);
        assertThat(new CircuitOde(net).responseAtWorstInstant(slow.droopPattern(), 1e-11))
                .isCloseTo(slow.droopOhms(), within(1e-5 * slow.droopOhms()));
        // the spreading paths cost droop: the same parts on the board node do better
        PowerNetwork flat = new PowerNetwork(net.regulatorResistanceOhms(), net.regulatorInductanceH(),
                net.boardNodeBranches().stream().toList(), net.hasPackage(), net.packageResistanceOhms(),
                net.packageInductanceH(), net.loadBranches(),
                net.regions().stream().map(r -> new RegionPath(r.name(), 0, 0, r.branches())).toList());
        assertThat(WorstCaseAnalyzer.idealEdges(PoleResidueModel.of(flat)).droopOhms())
                .isLessThan(ideal.droopOhms());
    }

    /**
     * The solver's warm start (a neighbour's poles as Newton's starting points) on regional networks gives
     * the eigenvalue search's model, as {@link WarmStartTest} holds for the single-node network.
     */
    @Test
    void warmStartOnNeighbouringPlacedBanksEqualsTheEigenvalueSearch() {
        Random rnd = new Random(77);
        int warm = 0;
        int trials = 0;
        for (int t = 0; t < 60; t++) {
            PowerNetwork a = randomWithRegions(rnd);
            PoleResidueModel hint = PoleResidueModel.of(a);
            int r = rnd.nextInt(a.regions().size());
            if (a.regions().get(r).branches().isEmpty()) {
                continue;
            }
            List<SeriesBranch> branches = new ArrayList<>(a.regions().get(r).branches());
            int k = rnd.nextInt(branches.size());
            SeriesBranch old = branches.get(k);
            double f = rnd.nextBoolean() ? 1.25 : 0.8; // one part more or fewer of five
            branches.set(k, new SeriesBranch(old.label(), old.resistanceOhms() / f, old.inductanceH() / f,
                    old.capacitanceF() * f));
            List<RegionPath> regions = new ArrayList<>(a.regions());
            regions.set(r, regions.get(r).withBranches(branches));
            PowerNetwork b = new PowerNetwork(a.regulatorResistanceOhms(), a.regulatorInductanceH(), a.boardBranches(),
                    a.hasPackage(), a.packageResistanceOhms(), a.packageInductanceH(), a.loadBranches(), regions);
            PoleResidueModel m = hint.near(b);
            trials++;
            if (m.warmStarted()) {
                warm++;
            }
            WarmStartTest.assertSameModel(m, PoleResidueModel.of(b));
        }
        assertThat(warm).isGreaterThan(trials / 2);
    }

    /** {@link Networks#moderate()} with its parts in two regions behind inductive paths. */
    static PowerNetwork moderateWithRegions() {
        PowerNetwork m = Networks.moderate();
        List<SeriesBranch> board = m.boardBranches();
        return new PowerNetwork(m.regulatorResistanceOhms(), m.regulatorInductanceH(), board.subList(0, 1), true,
                m.packageResistanceOhms(), m.packageInductanceH(), m.loadBranches(),
                List.of(new RegionPath("near", 0.1e-3, 30e-12, board.subList(2, 4)),
                        new RegionPath("far", 0.3e-3, 300e-12, board.subList(1, 2))));
    }

    /** A random network of {@link Networks#random} with its parts spread over 1–3 regions (some shorts). */
    static PowerNetwork randomWithRegions(Random rnd) {
        PowerNetwork base = Networks.random(rnd);
        List<SeriesBranch> plane = new ArrayList<>();
        List<SeriesBranch> parts = new ArrayList<>();
        for (SeriesBranch b : base.boardBranches()) {
            (b.label().equals("plane") ? plane : parts).add(b);
        }
        int regions = 1 + rnd.nextInt(3);
        List<List<SeriesBranch>> placed = new ArrayList<>();
        for (int r = 0; r < regions; r++) {
            placed.add(new ArrayList<>());
        }
        for (SeriesBranch p : parts) {
            placed.get(rnd.nextInt(regions)).add(p);
        }
        List<RegionPath> paths = new ArrayList<>();
        for (int r = 0; r < regions; r++) {
            boolean shortPath = rnd.nextInt(5) == 0;
            paths.add(new RegionPath("r" + r, shortPath ? 0 : Networks.logUniform(rnd, 0.02e-3, 0.5e-3),
                    shortPath ? 0 : Networks.logUniform(rnd, 3e-12, 400e-12), placed.get(r)));
        }
        return new PowerNetwork(base.regulatorResistanceOhms(), base.regulatorInductanceH(), plane,
                base.hasPackage(), base.packageResistanceOhms(), base.packageInductanceH(), base.loadBranches(), paths);
    }

    /** Z at the load node by nodal analysis: nodes board (0), load (1 with a package), then each region's. */
    static Complex nodalImpedance(PowerNetwork net, double f) {
        double w = 2 * Math.PI * f;
        boolean pkg = net.hasPackage();
        int load = pkg ? 1 : 0;
        int first = pkg ? 2 : 1;
        int n = first + net.regions().size();
        Complex[][] y = new Complex[n][n];
        for (Complex[] row : y) {
            java.util.Arrays.fill(row, Complex.ZERO);
        }
        addShunt(y, 0, new Complex(net.regulatorResistanceOhms(), w * net.regulatorInductanceH()));
        for (SeriesBranch b : net.boardBranches()) {
            addShunt(y, 0, branch(b, w));
        }
        if (pkg) {
            addSeries(y, 0, 1, new Complex(net.packageResistanceOhms(), w * net.packageInductanceH()));
            for (SeriesBranch b : net.loadBranches()) {
                addShunt(y, 1, branch(b, w));
            }
        }
        for (int r = 0; r < net.regions().size(); r++) {
            RegionPath p = net.regions().get(r);
            // a short path merges the region's node into the board node; an empty region's node is left
            // floating behind its path, so it is tied to the board node in the same way (no current flows)
            boolean merged = p.resistanceOhms() == 0 && p.inductanceH() == 0 || p.branches().isEmpty();
            int node = merged ? 0 : first + r;
            if (merged) {
                addShunt(y, first + r, new Complex(1, 0)); // the unused node, decoupled: V = 0
            } else {
                addSeries(y, 0, node, new Complex(p.resistanceOhms(), w * p.inductanceH()));
            }
            for (SeriesBranch b : p.branches()) {
                addShunt(y, node, branch(b, w));
            }
        }
        // the real equivalent of the complex system: [[G, −B], [B, G]] [Vr; Vi] = [Ir; Ii]
        double[][] a = new double[2 * n][2 * n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                a[i][j] = y[i][j].getReal();
                a[i][j + n] = -y[i][j].getImaginary();
                a[i + n][j] = y[i][j].getImaginary();
                a[i + n][j + n] = y[i][j].getReal();
            }
        }
        RealVector rhs = new ArrayRealVector(2 * n);
        rhs.setEntry(load, 1.0);
        RealVector v = new LUDecomposition(new Array2DRowRealMatrix(a, false)).getSolver().solve(rhs);
        return new Complex(v.getEntry(load), v.getEntry(load + n));
    }

    private static Complex branch(SeriesBranch b, double w) {
        return new Complex(b.resistanceOhms(), w * b.inductanceH() - 1 / (w * b.capacitanceF()));
    }

    private static void addShunt(Complex[][] y, int node, Complex z) {
        y[node][node] = y[node][node].add(z.reciprocal());
    }

    private static void addSeries(Complex[][] y, int i, int j, Complex z) {
        Complex g = z.reciprocal();
        y[i][i] = y[i][i].add(g);
        y[j][j] = y[j][j].add(g);
        y[i][j] = y[i][j].subtract(g);
        y[j][i] = y[j][i].subtract(g);
    }
}
