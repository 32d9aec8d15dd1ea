package breakwater.timedomain;

import breakwater.network.PowerNetwork;
import breakwater.network.SeriesBranch;

import java.util.List;

/**
 * The impedance at the load node in pole–residue form (docs/worst-case.md#pole-residue-form):
 * <pre>
 *   Z(s) = s·L∞ + D₀ + Σ_i r_i/(s − p_i)
 * </pre>
 * with L∞ = 0 and D₀ = D = Z(∞) when a capacitance sits at the load node with no series inductance;
 * otherwise Z(∞) is infinite and the load node looks like D₀ + s·L∞ at high frequency. The impulse
 * response is h(t) = L∞·δ'(t) + D₀·δ(t) + Σ r_i e^{p_i t}.
 *
 * <p>Construction (circuit theory: the poles of Z are the natural frequencies of the network with the
 * load port open, i.e. the zeros of the admittance Y(s) seen from the load node):
 * <ol>
 * <li>First guesses: the finite eigenvalues of the circuit's descriptor pencil by a real
 *     shift-and-invert ({@link PencilEigenvalues}), or a neighbour's poles ({@link #near}).</li>
 * <li>Every guess is polished by Newton's method on Y(s) = 0 to full double precision; guesses that are
 *     not zeros of Y (modes the load cannot see) are dropped; residues r_i = 1/Y'(p_i)
 *     ({@link ZeroPolisher}).</li>
 * <li>D₀ and L∞ from the asymptotic expansion Y(s) = a/s + b/s² + … of the ladder at s → ∞:
 *     L∞ = 1/a, D₀ = −b/a² (or D = 1/Y(∞) when Y(∞) &gt; 0) ({@link #highFrequencyLimit}).</li>
 * </ol>
 * Self-checks before a model is returned, else {@link ModelException} ({@link ModelSelfCheck}): every
 * Re p_i &lt; 0; the identity Z(0) = D₀ + Σ r_i/(−p_i) to 1e-5 relative; and Z(jω) of the model equal to
 * {@link PowerNetwork#impedance} to 1e-6 relative at the pole frequencies and beyond both ends.
 *
 * <p>Storage: real poles once (weight 1); each complex-conjugate pair once with Im p &gt; 0 (weight 2),
 * so that every sum over modes reads Σ w_i·Re(r_i·f(p_i)). Modes are ordered by |p| descending.
 */
public final class PoleResidueModel {

    final int modes;
    final double[] pr;
    final double[] pi;
    final double[] rr;
    final double[] ri;
    final double[] weight;
    private final double directOhms;
    private final double constantOhms;
    private final double seriesInductanceH;
    private final double dcOhms;
    /** Finite eigenvalues of the circuit's pencil, each conjugate counted: the degree of its denominator. */
    private final int degree;
    private final long[] structure;
    /** Whether the poles came from a neighbour's poles ({@link #near}) rather than the eigenvalue search. */
    private final boolean warmStarted;

    private PoleResidueModel(int modes, double[] pr, double[] pi, double[] rr, double[] ri, double[] weight,
                             double directOhms, double constantOhms, double seriesInductanceH, double dcOhms,
                             int degree, long[] structure, boolean warmStarted) {
        this.modes = modes;
        this.pr = pr;
        this.pi = pi;
        this.rr = rr;
        this.ri = ri;
        this.weight = weight;
        this.directOhms = directOhms;
        this.constantOhms = constantOhms;
        this.seriesInductanceH = seriesInductanceH;
        this.dcOhms = dcOhms;
        this.degree = degree;
        this.structure = structure;
        this.warmStarted = warmStarted;
    }

    /**
     * Builds and self-checks the pole–residue model of the impedance at the load node.
     *
     * @throws ModelException when the network has an undamped or growing mode, or a self-check fails
     */
    public static PoleResidueModel of(PowerNetwork network) {
        double[] cand = PencilEigenvalues.candidatePoles(network);
        int degree = cand.length / 2;
        PoleResidueModel model = assemble(network, ZeroPolisher.polish(new Ladder(network), cand, degree, false),
                degree, false);
        ModelSelfCheck.check(model, network);
        return model;
    }

    /**
     * The model of {@code network}, a network of the same circuit structure as this model's (the same
     * branches, only other element values: the solver's neighbouring banks), found with this model's poles
     * as Newton's first guesses instead of the eigenvalue search. The warm start is taken only when every
     * guess converges to its own zero of Y, the zeros found number the circuit's degree (the count of
     * finite eigenvalues of the pencil, which for positive elements depends on the structure alone) and the
     * self-checks pass; otherwise, or when the structures differ, the result is {@link #of(PowerNetwork)}.
     * Either way the poles are Newton-polished zeros of the same Y, so the two agree to rounding.
     *
     * @throws ModelException as {@link #of(PowerNetwork)}
     */
    public PoleResidueModel near(PowerNetwork network) {
        return ZeroPolisher.warmStart(this, network).orElseGet(() -> of(network));
    }

    /** Whether this model's poles were found from a neighbour's ({@link #near}), not by the eigenvalue search. */
    public boolean warmStarted() {
        return warmStarted;
    }

    /** Number of poles, each conjugate counted. */
    int weightedCount() {
        int c = 0;
        for (int k = 0; k < modes; k++) {
            c += (int) weight[k];
        }
        return c;
    }

    /** The degree of the circuit this model was built for (see {@link #near}). */
    int degree() {
        return degree;
    }

    /** The circuit structure this model was built for ({@link ZeroPolisher#structure}); not a copy. */
    long[] structure() {
        return structure;
    }

    /**
     * The model from polished {@code zeros}: weights, the damping check, the high-frequency terms; no
     * self-check against the network.
     */
    static PoleResidueModel assemble(PowerNetwork network, ZeroPolisher.Zeros zeros, int degree,
                                     boolean warmStarted) {
        int m = zeros.count();
        double[] pr = zeros.poleRe();
        double[] pi = zeros.poleIm();
        double[] w = new double[m];
        for (int k = 0; k < m; k++) {
            w[k] = pi[k] == 0.0 ? 1.0 : 2.0;
        }
        ModelSelfCheck.requireDecaying(pr, pi, m);
        HighFrequencyLimit asym = highFrequencyLimit(network);
        return new PoleResidueModel(m, pr, pi, zeros.residueRe(), zeros.residueIm(), w, asym.directOhms(),
                asym.constantOhms(), asym.seriesInductanceH(), network.dcResistanceOhms(), degree, ZeroPolisher.structure(network),
                warmStarted);
    }

    // ---- accessors --------------------------------------------------------------------------------

    /** Number of stored modes (real poles plus conjugate pairs, each pair once). */
    public int modeCount() {
        return modes;
    }

    /** Real parts of the stored poles, rad/s (copy). */
    public double[] poleRe() {
        return pr.clone();
    }

    /** Imaginary parts of the stored poles, rad/s, &ge; 0 (copy). */
    public double[] poleIm() {
        return pi.clone();
    }

    /** Real parts of the residues, Ω/s (copy). */
    public double[] residueRe() {
        return rr.clone();
    }

    /** Imaginary parts of the residues, Ω/s (copy). */
    public double[] residueIm() {
        return ri.clone();
    }

    /** 1 for a real pole, 2 for a stored conjugate pair. */
    public double modeWeight(int k) {
        return weight[k];
    }

    /** D = Z(∞) in Ω; {@code +Infinity} when the load node has series inductance (see class comment). */
    public double directTermOhms() {
        return directOhms;
    }

    /** Whether Z(∞) is finite. */
    public boolean hasFiniteDirectTerm() {
        return Double.isFinite(directOhms);
    }

    /** D₀, the constant of the polynomial part of Z(s); equals {@link #directTermOhms()} when finite. */
    public double constantTermOhms() {
        return constantOhms;
    }

    /** L∞, the inductance the load node shows at high frequency; 0 when Z(∞) is finite. */
    public double seriesInductanceH() {
        return seriesInductanceH;
    }

    /** Z(0) = R_reg + R_pkg, from the network. */
    public double dcResistanceOhms() {
        return dcOhms;
    }

    /** Smooth part of the impulse response, h(t) = Σ r_i e^{p_i t} for t &ge; 0, in Ω/s. */
    public double impulseResponse(double timeS) {
        double h = 0;
        for (int k = 0; k < modes; k++) {
            double e = Math.exp(pr[k] * timeS);
            double c = Math.cos(pi[k] * timeS);
            double s = Math.sin(pi[k] * timeS);
            h += weight[k] * e * (rr[k] * c - ri[k] * s);
        }
        return h;
    }

    /**
     * Step response for t &gt; 0 in Ω: S(t) = D₀ + Σ (r_i/p_i)(e^{p_i t} − 1); S(∞) = Z(0). The impulse
     * L∞·δ(t) of a series inductance at t = 0 is not part of it.
     */
    public double stepResponse(double timeS) {
        double v = constantOhms;
        for (int k = 0; k < modes; k++) {
            double e = Math.exp(pr[k] * timeS);
            double er = e * Math.cos(pi[k] * timeS) - 1;
            double ei = e * Math.sin(pi[k] * timeS);
            // (r/p) * (er + j ei)
            double m = 1.0 / (pr[k] * pr[k] + pi[k] * pi[k]);
            double qr = (rr[k] * pr[k] + ri[k] * pi[k]) * m;
            double qi = (ri[k] * pr[k] - rr[k] * pi[k]) * m;
            v += weight[k] * (qr * er - qi * ei);
        }
        return v;
    }

    /** Z(j2πf) of the model into {@code out[0]} (real, Ω) and {@code out[1]} (imaginary, Ω). */
    public void impedance(double frequencyHz, double[] out) {
        double w = 2 * Math.PI * frequencyHz;
        double zr = constantOhms;
        double zi = w * seriesInductanceH;
        for (int k = 0; k < modes; k++) {
            // r/(jw - p)
            double ar = -pr[k];
            double ai = w - pi[k];
            double m = 1.0 / (ar * ar + ai * ai);
            zr += (rr[k] * ar + ri[k] * ai) * m;
            zi += (ri[k] * ar - rr[k] * ai) * m;
            if (weight[k] == 2.0) {
                // conj(r)/(jw - conj p)
                double br = -pr[k];
                double bi = w + pi[k];
                double n = 1.0 / (br * br + bi * bi);
                zr += (rr[k] * br - ri[k] * bi) * n;
                zi += (-ri[k] * br - rr[k] * bi) * n;
            }
        }
        out[0] = zr;
        out[1] = zi;
    }

    /**
     * How the load node behaves at high frequency: Z(s) = s·L∞ + D₀ + O(1/s).
     *
     * @param directOhms        D = Z(∞); +∞ when Y(∞) = 0 (series inductance at the load node)
     * @param constantOhms      D₀; equals D when D is finite
     * @param seriesInductanceH L∞; 0 when D is finite
     */
    record HighFrequencyLimit(double directOhms, double constantOhms, double seriesInductanceH) {
    }

    /**
     * High-frequency behaviour D, D₀ and L∞ of Z(s) = s·L∞ + D₀ + O(1/s), D = Z(∞) (+∞ when Y(∞) = 0). From
     * the expansions y = 1/(sL) − R/(s²L²) + … of every inductive element and y → 1/R of every
     * inductance-free one; Y = a/s + b/s² ⇒ Z = s/a − b/a² + O(1/s).
     */
    static HighFrequencyLimit highFrequencyLimit(PowerNetwork net) {
        Expansion board = new Expansion();
        board.addShunt(net.regulatorResistanceOhms(), net.regulatorInductanceH());
        board.addBranches(net.boardNodeBranches());
        // a region behind its path R_r + sL_r: its node's expansion, then the path in series, as for the package
        for (breakwater.network.RegionPath r : net.spreadRegions()) {
            Expansion node = new Expansion();
            node.addBranches(r.branches());
            board.addBehind(r.resistanceOhms(), r.inductanceH(), node);
        }
        if (!net.hasPackage()) {
            return board.finite() ? new HighFrequencyLimit(board.z(), board.z(), 0)
                    : new HighFrequencyLimit(Double.POSITIVE_INFINITY, board.d(), board.l());
        }
        Expansion load = new Expansion();
        load.addBehind(net.packageResistanceOhms(), net.packageInductanceH(), board);
        load.addBranches(net.loadBranches());
        if (load.finite()) {
            return new HighFrequencyLimit(load.z(), load.z(), 0);
        }
        return new HighFrequencyLimit(Double.POSITIVE_INFINITY, load.d(), load.l());
    }

    /**
     * A node's admittance for large s, Y = g + a/s + b/s² + …: g from its inductance-free branches (may be
     * +∞), a and b from the inductive ones (y = 1/(sL) − R/(s²L²) + …).
     */
    private static final class Expansion {
        double g;
        double a;
        double b;

        void addShunt(double r, double l) {
            if (l == 0) {
                g += 1 / r;
            } else {
                a += 1 / l;
                b -= r / sq(l);
            }
        }

        void addBranches(List<SeriesBranch> branches) {
            for (SeriesBranch x : branches) {
                addShunt(x.resistanceOhms(), x.inductanceH());
            }
        }

        boolean finite() {
            return g > 0;
        }

        /** Z(∞) of a finite node. */
        double z() {
            return 1 / g;
        }

        /** L∞: Z ≈ s·L∞ + D₀ for an inductive node, 0 for a finite one. */
        double l() {
            return finite() ? 0 : 1 / a;
        }

        /** D₀ of an inductive node (Z(∞) of a finite one). */
        double d() {
            return finite() ? 1 / g : -b * l() * l();
        }

        /** Adds {@code node} behind a series path R + sL. */
        void addBehind(double r, double l, Expansion node) {
            if (l == 0 && node.finite()) {
                g += 1 / (r + node.z());
            } else {
                double lp = l + node.l();
                double dp = r + node.d();
                a += 1 / lp;
                b -= dp / sq(lp);
            }
        }
    }

    private static double sq(double x) {
        return x * x;
    }
}
