package breakwater.timedomain;

import breakwater.network.PowerNetwork;
import breakwater.network.SeriesBranch;
import net.jqwik.api.Assume;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Properties of the worst case (docs/worst-case.md#cross-checks): no load pattern inside the constraints exceeds
 * it, and it scales with the impedance. Patterns are evaluated by the exact convolution of
 * {@link Waveform} (mode states advanced segment by segment, a different formulation from the hat-weight
 * sums of the analyser) and, for a few, by Commons Math's DormandPrince853Integrator on the circuit.
 */
class WorstCaseProperties {

    /** Slack for rounding: both sides are exact closed forms in double precision. */
    private static final double ROUNDING = 1e-9;

    private static PowerNetwork networkWithFiniteD(long seed) {
        PowerNetwork n = Networks.random(new Random(seed));
        List<SeriesBranch> board = new ArrayList<>(n.boardBranches());
        if (!n.hasPackage() && board.stream().noneMatch(b -> b.inductanceH() == 0)) {
            board.add(new SeriesBranch("plane", 0.5e-3, 0, 5e-9));
        }
        return new PowerNetwork(n.regulatorResistanceOhms(), n.regulatorInductanceH(), board, n.hasPackage(),
                n.packageResistanceOhms(), n.packageInductanceH(), n.loadBranches());
    }

    /** (h ∗ u)(T) + D₀·u(0) + L∞·u'(T) of a pattern, by the waveform's mode-state recursion. */
    private static double convolve(PoleResidueModel m, LoadPattern p) {
        double total = p.lengthS();
        int n = p.size();
        double[] t = new double[n];
        double[] u = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = total - p.lagS(n - 1 - i);
            u[i] = p.value(n - 1 - i);
        }
        double[] y = Waveform.response(m, t, u);
        // y is relative to the earliest value, held for ever before: add its steady response Z(0)·u_far
        return y[n - 1] + m.dcResistanceOhms() * u[0];
    }

    /** Random 0/1 pattern with ideal jumps, switching times log-spread over the worst pattern's length. */
    private static LoadPattern binaryPattern(Random r, double length, int switches, double minGap) {
        double[] times = new double[switches];
        for (int i = 0; i < switches; i++) {
            times[i] = length * Math.pow(10, -6 * r.nextDouble());
        }
        Arrays.sort(times);
        List<double[]> pts = new ArrayList<>();
        double value = r.nextBoolean() ? 1 : 0;
        pts.add(new double[]{0, value});
        double last = 0;
        for (double x : times) {
            if (x - last < minGap + 1e-18) {
                continue;
            }
            pts.add(new double[]{x, value});
            value = 1 - value;
            pts.add(new double[]{x + minGap, value});
            last = x + minGap;
        }
        return new LoadPattern(pts.stream().mapToDouble(a -> a[0]).toArray(), pts.stream().mapToDouble(a -> a[1]).toArray());
    }

    @Property(tries = 60)
    void noIdealEdgePatternExceedsTheBound(@ForAll long seed, @ForAll @IntRange(min = 1, max = 300) int switches) throws Exception {
        PoleResidueModel m = PoleResidueModel.of(networkWithFiniteD(seed));
        WorstCase wc = WorstCaseAnalyzer.idealEdges(m);
        Random r = new Random(seed ^ switches);
        for (int trial = 0; trial < 5; trial++) {
            double v = convolve(m, binaryPattern(r, 1.2 * wc.droopPattern().lengthS() + 1e-9, switches, 0));
            assertThat(v).isLessThanOrEqualTo(wc.droopOhms() + ROUNDING * wc.peakToPeakOhms());
            assertThat(v).isGreaterThanOrEqualTo(-wc.overshootOhms() - ROUNDING * wc.peakToPeakOhms());
        }
        // the returned patterns reach the bounds under the same independent evaluation
        assertThat(convolve(m, wc.droopPattern())).isCloseTo(wc.droopOhms(), within(1e-8 * wc.peakToPeakOhms()));
        assertThat(convolve(m, wc.overshootPattern())).isCloseTo(-wc.overshootOhms(), within(1e-8 * wc.peakToPeakOhms()));
    }

    @Property(tries = 30)
    void noSlewLimitedPatternExceedsTheEdgeLimitedBound(@ForAll long seed,
                                                        @ForAll @DoubleRange(min = -11, max = -8) double logTe,
                                                        @ForAll @IntRange(min = 1, max = 200) int switches) {
        PoleResidueModel m = PoleResidueModel.of(Networks.random(new Random(seed)));
        double te = Math.pow(10, logTe);
        WorstCase wc = WorstCaseAnalyzer.edgeLimited(m, te);
        double length = Math.max(wc.droopPattern().lengthS(), 16 * te);
        Random r = new Random(seed * 31 + switches);
        double slack = ROUNDING * wc.peakToPeakOhms() + 1e-15;
        for (int trial = 0; trial < 4; trial++) {
            // random edges: a 0/1 pattern whose edges are ramps of a random duration ≥ t_e
            double ramp = te * (1 + 3 * r.nextDouble());
            LoadPattern edges = binaryPattern(r, length, switches, ramp);
            assertThat(edges.maxSlopePerS()).isLessThanOrEqualTo(1 / te * (1 + 1e-9));
            double v = convolve(m, edges);
            assertThat(v).isLessThanOrEqualTo(wc.droopOhms() + slack);
            assertThat(v).isGreaterThanOrEqualTo(-wc.overshootOhms() - slack);
            // random slew-limited walk on a random grid
            LoadPattern walk = randomWalk(r, length, te, 400);
            double vw = convolve(m, walk);
            assertThat(vw).isLessThanOrEqualTo(wc.droopOhms() + slack);
            assertThat(vw).isGreaterThanOrEqualTo(-wc.overshootOhms() - slack);
        }
        assertThat(convolve(m, wc.droopPattern())).isCloseTo(wc.droopOhms(), within(1e-8 * wc.peakToPeakOhms()));
    }

    private static LoadPattern randomWalk(Random r, double length, double te, int points) {
        double[] lags = new double[points];
        double[] vals = new double[points];
        vals[0] = r.nextDouble();
        for (int i = 1; i < points; i++) {
            // dense near the worst instant
            lags[i] = Math.max(lags[i - 1] + 1e-15, length * Math.pow((double) i / (points - 1), 3));
            double c = (lags[i] - lags[i - 1]) / te;
            double step = (2 * r.nextDouble() - 1) * c;
            vals[i] = Math.min(1, Math.max(0, vals[i - 1] + step));
        }
        return new LoadPattern(lags, vals);
    }

    /**
     * Scaling every impedance by k (R·k, L·k, C/k) leaves the poles and multiplies every residue and D by
     * k, so the worst case scales by k exactly (circuit theory: impedance scaling), to rounding.
     */
    @Property(tries = 40)
    void worstCaseScalesWithImpedance(@ForAll long seed, @ForAll @DoubleRange(min = 0.01, max = 100) double k,
                                      @ForAll @DoubleRange(min = -11, max = -8) double logTe) throws Exception {
        PowerNetwork n = networkWithFiniteD(seed);
        PowerNetwork s = scaled(n, k);
        PoleResidueModel a = PoleResidueModel.of(n);
        PoleResidueModel b = PoleResidueModel.of(s);
        WorstCase ia = WorstCaseAnalyzer.idealEdges(a);
        WorstCase ib = WorstCaseAnalyzer.idealEdges(b);
        assertThat(ib.droopOhms()).isCloseTo(k * ia.droopOhms(), within(1e-9 * k * ia.droopOhms()));
        assertThat(ib.overshootOhms()).isCloseTo(k * ia.overshootOhms(), within(1e-9 * k * ia.peakToPeakOhms()));
        double te = Math.pow(10, logTe);
        WorstCase ea = WorstCaseAnalyzer.edgeLimited(a, te);
        WorstCase eb = WorstCaseAnalyzer.edgeLimited(b, te);
        assertThat(eb.droopOhms()).isCloseTo(k * ea.droopOhms(), within(1e-9 * k * ea.droopOhms()));
    }

    /** The ODE reference on a few random networks with plane and die (slower; few tries). */
    @Property(tries = 4)
    void odeReachesTheIdealBoundOnRandomNetworks(@ForAll long seed) throws Exception {
        // plane and die (the reference ODE needs an inductance-free branch at both nodes), values kept
        // within about three decades of natural frequency so an explicit integrator finishes quickly
        Random r = new Random(seed);
        List<SeriesBranch> board = new ArrayList<>();
        board.add(new SeriesBranch("plane", Networks.logUniform(r, 1e-3, 3e-3), 0, Networks.logUniform(r, 2e-9, 10e-9)));
        for (int k = 0; k < 1 + r.nextInt(3); k++) {
            board.add(Networks.part("p" + k, Networks.logUniform(r, 0.1e-6, 10e-6), Networks.logUniform(r, 5e-3, 30e-3),
                    Networks.logUniform(r, 0.2e-9, 0.6e-9), 0.3e-9, 1 + r.nextInt(4)));
        }
        PowerNetwork n = new PowerNetwork(Networks.logUniform(r, 1e-3, 5e-3), Networks.logUniform(r, 1e-9, 5e-9), board,
                true, Networks.logUniform(r, 0.5e-3, 2e-3), Networks.logUniform(r, 20e-12, 100e-12),
                List.of(new SeriesBranch("die", Networks.logUniform(r, 0.5e-3, 2e-3), 0, Networks.logUniform(r, 20e-9, 100e-9))));
        WorstCase wc = WorstCaseAnalyzer.idealEdges(PoleResidueModel.of(n));
        Assume.that(wc.droopPattern().lengthS() < 50e-6);
        double sim = new CircuitOde(n).responseAtWorstInstant(wc.droopPattern(), 1e-10);
        // 1e-4: integrator at 1e-10 per step over many steps
        assertThat(sim).isCloseTo(wc.droopOhms(), within(1e-4 * wc.droopOhms()));
    }

    static PowerNetwork scaled(PowerNetwork n, double k) {
        return new PowerNetwork(n.regulatorResistanceOhms() * k, n.regulatorInductanceH() * k,
                n.boardBranches().stream().map(b -> scale(b, k)).toList(), n.hasPackage(),
                n.packageResistanceOhms() * k, n.packageInductanceH() * k,
                n.loadBranches().stream().map(b -> scale(b, k)).toList());
    }

    private static SeriesBranch scale(SeriesBranch b, double k) {
        return new SeriesBranch(b.label(), b.resistanceOhms() * k, b.inductanceH() * k, b.capacitanceF() / k);
    }
}
