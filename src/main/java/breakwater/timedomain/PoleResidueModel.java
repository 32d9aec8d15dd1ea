package breakwater.timedomain;

import breakwater.network.PowerNetwork;
import breakwater.network.SeriesBranch;

import java.util.List;
import java.util.Locale;

/**
 * The impedance at the load node in pole–residue form (worst-case-math.md §1):
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
 * <li>The circuit is written as a descriptor system E x' = A x + B u (states: inductor and branch
 *     currents, capacitor voltages; node voltages and currents of inductance-free branches algebraic).
 *     Its finite eigenvalues are found by a real shift-and-invert: M = (A − σE)⁻¹E, restricted to the
 *     dynamic states, with σ &gt; 0 at the geometric mean of the network's natural rates; then
 *     λ = σ + 1/μ. Every passive pole lies in Re λ &lt; 0, so |λ − σ| &gt; σ and the map is well
 *     conditioned over the whole 1e3…1e11 rad/s range; infinite eigenvalues appear as μ ≈ 0.</li>
 * <li>Every eigenvalue is polished by Newton's method on Y(s) = 0 ({@link Ladder}, closed-form Y'),
 *     to full double precision. Eigenvalues that are not zeros of Y (modes that the load cannot see,
 *     e.g. two identical branches exchanging current, or the pole–zero cancellation of a
 *     constant-resistance network) do not converge and are dropped.</li>
 * <li>Residues r_i = 1/Y'(p_i) (Z = 1/Y has a simple pole where Y has a simple zero).</li>
 * <li>D₀ and L∞ from the asymptotic expansion Y(s) = a/s + b/s² + … of the ladder at s → ∞:
 *     L∞ = 1/a, D₀ = −b/a² (or D = 1/Y(∞) when Y(∞) &gt; 0).</li>
 * </ol>
 * Self-checks before a model is returned, else {@link ModelException}: every Re p_i &lt; 0; the
 * identity Z(0) = D₀ + Σ r_i/(−p_i) to 1e-6 relative; and Z(jω) of the model equal to
 * {@link PowerNetwork#impedance} to 1e-6 relative at the pole frequencies and beyond both ends.
 *
 * <p>Storage: real poles once (weight 1); each complex-conjugate pair once with Im p &gt; 0 (weight 2),
 * so that every sum over modes reads Σ w_i·Re(r_i·f(p_i)). Modes are ordered by |p| descending.
 */
public final class PoleResidueModel {

    /** Relative tolerance of the self-checks against the network (see class comment). */
    static final double CHECK_TOLERANCE = 1e-6;
    /**
     * Tolerance of the Z(0) identity, relative to Z(0). Looser than {@link #CHECK_TOLERANCE} because the
     * sum Σ r/(−p) is dominated by the slowest modes and loses digits when two of them nearly cancel
     * (seen at 1.4e-6 on a real candidate bank whose model agreed with the frequency domain to 1e-6);
     * 1e-5 is still far inside the 5e-4 accuracy of the worst case itself.
     */
    static final double IDENTITY_TOLERANCE = 1e-5;

    /**
     * Smallest accepted damping −Re p/|p| (a quality factor of 5e7): below it a mode is treated as
     * undamped, since its decay is no longer distinguishable from rounding of the eigenvalue.
     */
    static final double MIN_DAMPING = 1e-8;

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
    private boolean warmStarted;

    private PoleResidueModel(int modes, double[] pr, double[] pi, double[] rr, double[] ri, double[] weight,
                             double directOhms, double constantOhms, double seriesInductanceH, double dcOhms,
                             int degree, long[] structure) {
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
    }

    /**
     * Builds and self-checks the pole–residue model of the impedance at the load node.
     *
     * @throws ModelException when the network has an undamped or growing mode, or a self-check fails
     */
    public static PoleResidueModel of(PowerNetwork network) {
        double[] cand = candidatePoles(network);
        PoleResidueModel model = build(network, cand, cand.length / 2, false);
        model.selfCheck(network);
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
        long[] shape = structure(network);
        if (java.util.Arrays.equals(shape, structure) && weightedCount() == degree && modes > 0) {
            double[] cand = new double[2 * modes];
            for (int k = 0; k < modes; k++) {
                cand[2 * k] = pr[k];
                cand[2 * k + 1] = pi[k];
            }
            try {
                PoleResidueModel model = build(network, cand, degree, true);
                if (model.weightedCount() == degree) {
                    model.selfCheck(network);
                    model.warmStarted = true;
                    return model;
                }
            } catch (ModelException notFromHere) {
                // fall through: the eigenvalue search decides
            }
        }
        return of(network);
    }

    /** Whether this model's poles were found from a neighbour's ({@link #near}), not by the eigenvalue search. */
    public boolean warmStarted() {
        return warmStarted;
    }

    /** Number of poles, each conjugate counted. */
    private int weightedCount() {
        int c = 0;
        for (int k = 0; k < modes; k++) {
            c += (int) weight[k];
        }
        return c;
    }

    /**
     * Poles polished from first guesses {@code cand} (interleaved re/im; guesses with Im &lt; 0 are left to
     * their conjugates), residues, ordering and the damping check; no self-check. With {@code retry} (first
     * guesses from a neighbour's poles, where every guess should find a zero), guesses that found none or
     * one already found are tried again by Newton's method with implicit deflation of the zeros found
     * (Maehly's correction), which cannot return to those; each zero so found is polished on Y itself.
     */
    private static PoleResidueModel build(PowerNetwork network, double[] cand, int degree, boolean retry) {
        Ladder ladder = new Ladder(network);
        int nc = cand.length / 2;
        double[] pr = new double[nc];
        double[] pi = new double[nc];
        double[] rr = new double[nc];
        double[] ri = new double[nc];
        double[] root = new double[2];
        int m = 0;
        int[] missed = new int[nc];
        int nm = 0;
        int weighted = 0;
        for (int pass = 0; pass < 2; pass++) {
            int count = pass == 0 ? nc : nm;
            if (pass == 1 && !(retry && weighted < degree)) {
                break;
            }
            for (int g = 0; g < count && (pass == 0 || weighted < degree); g++) {
                int c = pass == 0 ? g : missed[g];
                double sr = cand[2 * c];
                double si = cand[2 * c + 1];
                if (si < 0) {
                    continue; // the conjugate is handled with its partner
                }
                if (pass == 1) {
                    if (!deflatedNewton(ladder, sr, si, pr, pi, m, root)) {
                        continue;
                    }
                    sr = root[0];
                    si = root[1];
                }
                if (!newton(ladder, sr, si, root)) {
                    if (pass == 0) {
                        missed[nm++] = c; // tried again once, in the second pass
                    }
                    continue;
                }
                double qr = root[0];
                double qi = root[1];
                if (Math.abs(qi) <= 1e-9 * Math.hypot(qr, qi)) {
                    if (!newton(ladder, qr, 0.0, root)) {
                        if (pass == 0) {
                            missed[nm++] = c; // tried again once, in the second pass
                        }
                        continue;
                    }
                    qr = root[0];
                    qi = 0.0;
                } else if (qi < 0) {
                    qi = -qi; // Newton went to the conjugate root: store the upper one
                }
                boolean duplicate = false;
                for (int k = 0; k < m; k++) {
                    if (Math.hypot(pr[k] - qr, pi[k] - qi) <= 1e-7 * Math.hypot(qr, qi)) {
                        duplicate = true;
                        break;
                    }
                }
                if (duplicate) {
                    if (pass == 0) {
                        missed[nm++] = c; // tried again once, in the second pass
                    }
                    continue;
                }
                ladder.eval(qr, qi);
                // r = 1/Y'(p)
                double dm = 1.0 / (ladder.dr * ladder.dr + ladder.di * ladder.di);
                pr[m] = qr;
                pi[m] = qi;
                rr[m] = ladder.dr * dm;
                ri[m] = qi == 0.0 ? 0.0 : -ladder.di * dm;
                m++;
                weighted += qi == 0.0 ? 1 : 2;
            }
        }
        // order by |p| descending
        for (int i = 1; i < m; i++) {
            for (int j = i; j > 0 && Math.hypot(pr[j], pi[j]) > Math.hypot(pr[j - 1], pi[j - 1]); j--) {
                swap(pr, j);
                swap(pi, j);
                swap(rr, j);
                swap(ri, j);
            }
        }
        double[] w = new double[m];
        for (int k = 0; k < m; k++) {
            w[k] = pi[k] == 0.0 ? 1.0 : 2.0;
            if (!(-pr[k] >= MIN_DAMPING * Math.hypot(pr[k], pi[k]))) {
                throw new ModelException(String.format(Locale.ROOT,
                        "network has an undamped or growing mode at %.6g%+.6gj rad/s; every mode of a "
                                + "passive network with losses decays. Maybe a branch has zero resistance "
                                + "everywhere around a loop", pr[k], pi[k]));
            }
        }
        double[] asym = highFrequencyLimit(network);
        return new PoleResidueModel(m, trim(pr, m), trim(pi, m), trim(rr, m), trim(ri, m), w,
                asym[0], asym[1], asym[2], network.dcResistanceOhms(), degree, structure(network));
    }

    /**
     * The circuit's structure: branch counts, whether there is a package, and which elements are zero.
     * Two networks with equal structures have the same degree.
     */
    static long[] structure(PowerNetwork net) {
        List<SeriesBranch> board = net.boardBranches();
        List<SeriesBranch> load = net.loadBranches();
        int n = board.size() + load.size();
        long[] s = new long[2 + (n * 3 + 63) / 64];
        s[0] = ((long) board.size() << 32) | load.size();
        s[1] = (net.hasPackage() ? 1 : 0) | (net.regulatorInductanceH() > 0 ? 2 : 0)
                | (net.regulatorResistanceOhms() > 0 ? 4 : 0) | (net.packageInductanceH() > 0 ? 8 : 0)
                | (net.packageResistanceOhms() > 0 ? 16 : 0);
        int bit = 0;
        for (int k = 0; k < n; k++) {
            SeriesBranch b = k < board.size() ? board.get(k) : load.get(k - board.size());
            long flags = (b.resistanceOhms() > 0 ? 1 : 0) | (b.inductanceH() > 0 ? 2 : 0)
                    | (b.capacitanceF() > 0 ? 4 : 0);
            s[2 + bit / 64] |= flags << (bit % 64);
            bit += 3;
        }
        return s;
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

    // ---- construction -----------------------------------------------------------------------------

    /**
     * Newton's method on Y(s) = 0 from (sr, si), quadratically convergent at a simple zero. Succeeds when
     * the step falls below 1e-14·|s| (or Y vanishes to 1e-15 of the scale of its terms) and the final
     * |Y| is below 1e-9 of that scale; the root goes to {@code out}.
     */
    static boolean newton(Ladder ladder, double sr, double si, double[] out) {
        boolean stepConverged = false;
        for (int it = 0; it < 60; it++) {
            ladder.eval(sr, si);
            double yr = ladder.yr;
            double yi = ladder.yi;
            double dr = ladder.dr;
            double di = ladder.di;
            double dm = dr * dr + di * di;
            if (!(dm > 0) || !Double.isFinite(dm) || !Double.isFinite(yr) || !Double.isFinite(yi)) {
                return false;
            }
            if (Math.abs(yr) + Math.abs(yi) <= 1e-15 * ladder.scale) {
                stepConverged = true;
                break;
            }
            // delta = Y / Y'
            double xr = (yr * dr + yi * di) / dm;
            double xi = (yi * dr - yr * di) / dm;
            sr -= xr;
            si -= xi;
            if (Math.hypot(xr, xi) <= 1e-14 * Math.hypot(sr, si)) {
                stepConverged = true;
                break;
            }
        }
        if (!stepConverged) {
            return false;
        }
        ladder.eval(sr, si);
        if (!(Math.abs(ladder.yr) + Math.abs(ladder.yi) <= 1e-9 * ladder.scale)) {
            return false;
        }
        out[0] = sr;
        out[1] = si;
        return true;
    }

    /**
     * Newton's method on Y(s)/Π(s − z_k) over the zeros z_k found so far and their conjugates: the step
     * Y/(Y' − Y·Σ 1/(s − z_k)) (Maehly's correction) keeps it away from them. Succeeds when the step falls
     * below 1e-10·|s|, leaving the point (to be polished on Y itself) in {@code out}.
     */
    static boolean deflatedNewton(Ladder ladder, double sr, double si, double[] zr, double[] zi, int m,
                                  double[] out) {
        for (int it = 0; it < 60; it++) {
            ladder.eval(sr, si);
            double yr = ladder.yr;
            double yi = ladder.yi;
            // Σ 1/(s − z) over the found zeros and their conjugates
            double sumR = 0;
            double sumI = 0;
            for (int k = 0; k < m; k++) {
                double ar = sr - zr[k];
                double ai = si - zi[k];
                double d = ar * ar + ai * ai;
                sumR += ar / d;
                sumI -= ai / d;
                if (zi[k] != 0.0) {
                    double br = sr - zr[k];
                    double bi = si + zi[k];
                    double e = br * br + bi * bi;
                    sumR += br / e;
                    sumI -= bi / e;
                }
            }
            // den = Y' − Y·sum
            double dr = ladder.dr - (yr * sumR - yi * sumI);
            double di = ladder.di - (yr * sumI + yi * sumR);
            double dm = dr * dr + di * di;
            if (!(dm > 0) || !Double.isFinite(dm) || !Double.isFinite(yr) || !Double.isFinite(yi)) {
                return false;
            }
            double xr = (yr * dr + yi * di) / dm;
            double xi = (yi * dr - yr * di) / dm;
            sr -= xr;
            si -= xi;
            if (Math.hypot(xr, xi) <= 1e-10 * Math.hypot(sr, si)) {
                out[0] = sr;
                out[1] = Math.abs(si) <= 1e-9 * Math.hypot(sr, si) ? 0.0 : si;
                return true;
            }
        }
        return false;
    }

    /**
     * Finite eigenvalues of the descriptor pencil (A, E) as first guesses: interleaved re/im pairs.
     */
    static double[] candidatePoles(PowerNetwork net) {
        List<SeriesBranch> board = net.boardBranches();
        List<SeriesBranch> load = net.loadBranches();
        boolean pkg = net.hasPackage();
        int iVb = 0;
        int idx = 1;
        int iVl = pkg ? idx++ : iVb;
        int iReg = idx++;
        int iPkg = pkg ? idx++ : -1;
        int nb = board.size() + load.size();
        int[] iI = new int[nb];
        int[] iV = new int[nb];
        for (int k = 0; k < nb; k++) {
            iI[k] = idx++;
            iV[k] = idx++;
        }
        int n = idx;
        double[][] a = new double[n][n];
        double[] e = new double[n];
        // KCL at the board node: currents leaving through regulator and board branches, entering via package
        a[iVb][iReg] = -1;
        if (pkg) {
            a[iVb][iPkg] = 1;
            a[iVl][iPkg] = -1;
        }
        // regulator: L i' = Vb − R i
        e[iReg] = net.regulatorInductanceH();
        a[iReg][iVb] = 1;
        a[iReg][iReg] = -net.regulatorResistanceOhms();
        if (pkg) {
            e[iPkg] = net.packageInductanceH();
            a[iPkg][iVl] = 1;
            a[iPkg][iVb] = -1;
            a[iPkg][iPkg] = -net.packageResistanceOhms();
        }
        for (int k = 0; k < nb; k++) {
            SeriesBranch b = k < board.size() ? board.get(k) : load.get(k - board.size());
            int node = k < board.size() ? iVb : iVl;
            a[node][iI[k]] = -1;
            e[iI[k]] = b.inductanceH();
            a[iI[k]][node] = 1;
            a[iI[k]][iI[k]] = -b.resistanceOhms();
            a[iI[k]][iV[k]] = -1;
            e[iV[k]] = b.capacitanceF();
            a[iV[k]][iI[k]] = 1;
        }
        double[] rates = rateRange(net);
        double sigma = Math.sqrt(rates[0] * rates[1]);
        // G = A − σE, LU with partial pivoting
        int[] dyn = new int[n];
        int nd = 0;
        for (int i = 0; i < n; i++) {
            a[i][i] -= sigma * e[i];
            if (e[i] > 0) {
                dyn[nd++] = i;
            }
        }
        if (nd == 0) {
            return new double[0];
        }
        int[] perm = luDecompose(a, n);
        double[][] mpp = new double[nd][nd];
        double[] col = new double[n];
        for (int j = 0; j < nd; j++) {
            java.util.Arrays.fill(col, 0.0);
            col[dyn[j]] = e[dyn[j]];
            luSolve(a, perm, n, col);
            for (int i = 0; i < nd; i++) {
                mpp[i][j] = col[dyn[i]];
            }
        }
        double[] wr = new double[nd];
        double[] wi = new double[nd];
        RealEigenvalues.compute(mpp, nd, wr, wi);
        double maxRate = 1e3 * rates[1];
        double[] out = new double[2 * nd];
        int c = 0;
        for (int k = 0; k < nd; k++) {
            double mu2 = wr[k] * wr[k] + wi[k] * wi[k];
            if (!(mu2 > 0)) {
                continue;
            }
            // λ = σ + 1/μ
            double lr = sigma + wr[k] / mu2;
            double li = -wi[k] / mu2;
            if (Math.hypot(lr, li) > maxRate) {
                continue; // an infinite eigenvalue of the pencil
            }
            out[2 * c] = lr;
            out[2 * c + 1] = li;
            c++;
        }
        return java.util.Arrays.copyOf(out, 2 * c);
    }

    /**
     * Bracket [lo, hi] (rad/s) of the natural rates of the network from its element values:
     * 1/√(LC) over all pairs, R/L and 1/(RC). Used for the shift σ and to recognise infinite eigenvalues.
     */
    static double[] rateRange(PowerNetwork net) {
        double lMin = Double.POSITIVE_INFINITY;
        double lMax = 0;
        double cMin = Double.POSITIVE_INFINITY;
        double cSum = 0;
        double rMin = Double.POSITIVE_INFINITY;
        double rMax = 0;
        double[] ls = {net.regulatorInductanceH(), net.packageInductanceH()};
        double[] rs = {net.regulatorResistanceOhms(), net.packageResistanceOhms()};
        for (double l : ls) {
            if (l > 0) {
                lMin = Math.min(lMin, l);
                lMax = Math.max(lMax, l);
            }
        }
        for (double r : rs) {
            if (r > 0) {
                rMin = Math.min(rMin, r);
                rMax = Math.max(rMax, r);
            }
        }
        for (List<SeriesBranch> list : List.of(net.boardBranches(), net.loadBranches())) {
            for (SeriesBranch b : list) {
                if (b.inductanceH() > 0) {
                    lMin = Math.min(lMin, b.inductanceH());
                    lMax = Math.max(lMax, b.inductanceH());
                }
                if (b.resistanceOhms() > 0) {
                    rMin = Math.min(rMin, b.resistanceOhms());
                    rMax = Math.max(rMax, b.resistanceOhms());
                }
                cMin = Math.min(cMin, b.capacitanceF());
                cSum += b.capacitanceF();
            }
        }
        double hi = 0;
        double lo = Double.POSITIVE_INFINITY;
        if (lMax > 0 && cSum > 0) {
            hi = Math.max(hi, 1 / Math.sqrt(lMin * cMin));
            lo = Math.min(lo, 1 / Math.sqrt(lMax * cSum));
        }
        if (rMax > 0 && lMax > 0) {
            hi = Math.max(hi, rMax / lMin);
            lo = Math.min(lo, rMin / lMax);
        }
        if (rMax > 0 && cSum > 0) {
            hi = Math.max(hi, 1 / (rMin * cMin));
            lo = Math.min(lo, 1 / (rMax * cSum));
        }
        if (!(hi > 0) || !Double.isFinite(hi)) {
            hi = 1e9;
        }
        if (!(lo > 0) || !Double.isFinite(lo) || lo > hi) {
            lo = hi;
        }
        return new double[]{lo, hi};
    }

    /** In-place LU with partial pivoting; returns the row permutation. */
    private static int[] luDecompose(double[][] a, int n) {
        int[] perm = new int[n];
        for (int i = 0; i < n; i++) {
            perm[i] = i;
        }
        for (int k = 0; k < n; k++) {
            int p = k;
            double best = Math.abs(a[k][k]);
            for (int i = k + 1; i < n; i++) {
                double v = Math.abs(a[i][k]);
                if (v > best) {
                    best = v;
                    p = i;
                }
            }
            if (best == 0.0) {
                throw new ModelException("the network's circuit equations are singular (a node without any "
                        + "path to ground, or a loop of ideal elements)");
            }
            if (p != k) {
                double[] t = a[p];
                a[p] = a[k];
                a[k] = t;
                int ti = perm[p];
                perm[p] = perm[k];
                perm[k] = ti;
            }
            double[] rk = a[k];
            double inv = 1.0 / rk[k];
            for (int i = k + 1; i < n; i++) {
                double[] ri = a[i];
                double f = ri[k] * inv;
                if (f != 0.0) {
                    ri[k] = f;
                    for (int j = k + 1; j < n; j++) {
                        ri[j] -= f * rk[j];
                    }
                } else {
                    ri[k] = 0.0;
                }
            }
        }
        return perm;
    }

    private static void luSolve(double[][] lu, int[] perm, int n, double[] b) {
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = b[perm[i]];
        }
        for (int i = 0; i < n; i++) {
            double s = x[i];
            double[] r = lu[i];
            for (int j = 0; j < i; j++) {
                s -= r[j] * x[j];
            }
            x[i] = s;
        }
        for (int i = n - 1; i >= 0; i--) {
            double s = x[i];
            double[] r = lu[i];
            for (int j = i + 1; j < n; j++) {
                s -= r[j] * x[j];
            }
            x[i] = s / r[i];
        }
        System.arraycopy(x, 0, b, 0, n);
    }

    /**
     * High-frequency behaviour {D, D₀, L∞}: D = Z(∞) (+∞ when Y(∞) = 0), D₀ and L∞ of
     * Z(s) = s·L∞ + D₀ + O(1/s). From the expansions y = 1/(sL) − R/(s²L²) + … of every inductive element
     * and y → 1/R of every inductance-free one; Y = a/s + b/s² ⇒ Z = s/a − b/a² + O(1/s).
     */
    static double[] highFrequencyLimit(PowerNetwork net) {
        double gB = 0; // Y_b(∞), conductance of inductance-free elements at the board node (may be +∞)
        double aB = 0;
        double bB = 0;
        if (net.regulatorInductanceH() == 0) {
            gB += 1 / net.regulatorResistanceOhms();
        } else {
            aB += 1 / net.regulatorInductanceH();
            bB -= net.regulatorResistanceOhms() / sq(net.regulatorInductanceH());
        }
        for (SeriesBranch b : net.boardBranches()) {
            if (b.inductanceH() == 0) {
                gB += 1 / b.resistanceOhms();
            } else {
                aB += 1 / b.inductanceH();
                bB -= b.resistanceOhms() / sq(b.inductanceH());
            }
        }
        boolean boardFinite = gB > 0;
        double zB = boardFinite ? 1 / gB : Double.NaN;
        double lB = boardFinite ? 0 : 1 / aB;
        double dB = boardFinite ? zB : -bB * lB * lB;
        if (!net.hasPackage()) {
            return boardFinite ? new double[]{zB, zB, 0} : new double[]{Double.POSITIVE_INFINITY, dB, lB};
        }
        double gL = 0;
        double aL = 0;
        double bL = 0;
        if (net.packageInductanceH() == 0 && boardFinite) {
            gL += 1 / (net.packageResistanceOhms() + zB);
        } else {
            double lp = net.packageInductanceH() + lB;
            double dp = net.packageResistanceOhms() + dB;
            aL += 1 / lp;
            bL -= dp / sq(lp);
        }
        for (SeriesBranch b : net.loadBranches()) {
            if (b.inductanceH() == 0) {
                gL += 1 / b.resistanceOhms();
            } else {
                aL += 1 / b.inductanceH();
                bL -= b.resistanceOhms() / sq(b.inductanceH());
            }
        }
        if (gL > 0) {
            double d = 1 / gL;
            return new double[]{d, d, 0};
        }
        double l = 1 / aL;
        return new double[]{Double.POSITIVE_INFINITY, -bL * l * l, l};
    }

    private void selfCheck(PowerNetwork net) {
        // Z(0) identity (worst-case-math.md §1)
        double z0 = constantOhms;
        double scale = Math.abs(constantOhms);
        for (int k = 0; k < modes; k++) {
            double m = 1.0 / (pr[k] * pr[k] + pi[k] * pi[k]);
            // r/(-p) = -r conj(p)/|p|^2, real part
            double v = -(rr[k] * pr[k] + ri[k] * pi[k]) * m * weight[k];
            z0 += v;
            scale += Math.abs(v);
        }
        double dc = net.dcResistanceOhms();
        if (!(Math.abs(z0 - dc) <= IDENTITY_TOLERANCE * Math.abs(dc) + 1e-12 * scale)) {
            throw new ModelException(String.format(Locale.ROOT,
                    "pole-residue model fails the identity Z(0) = D + sum r/(-p): %.12g Ohm from the model, "
                            + "%.12g Ohm from the network (%d modes)", z0, dc, modes));
        }
        // frequency-domain agreement
        double fLo = Double.POSITIVE_INFINITY;
        double fHi = 0;
        for (int k = 0; k < modes; k++) {
            double f = Math.hypot(pr[k], pi[k]) / (2 * Math.PI);
            fLo = Math.min(fLo, f);
            fHi = Math.max(fHi, f);
        }
        if (modes == 0) {
            double[] r = rateRange(net);
            fLo = r[0] / (2 * Math.PI);
            fHi = r[1] / (2 * Math.PI);
        }
        int nf = Math.min(modes, 12) + 2;
        double[] zm = new double[2];
        double[] zn = new double[2];
        for (int i = 0; i < nf; i++) {
            double f;
            if (i == 0) {
                f = 0.3 * fLo;
            } else if (i == 1) {
                f = 3 * fHi;
            } else {
                int k = (i - 2) * Math.max(1, modes / 12);
                f = (pi[k] > 0 ? pi[k] : Math.abs(pr[k])) / (2 * Math.PI);
            }
            impedance(f, zm);
            net.impedance(f, zn);
            double err = Math.hypot(zm[0] - zn[0], zm[1] - zn[1]);
            double mag = Math.hypot(zn[0], zn[1]);
            if (!(err <= CHECK_TOLERANCE * mag)) {
                throw new ModelException(String.format(Locale.ROOT,
                        "pole-residue model disagrees with the network impedance at %.6g Hz: "
                                + "|dZ|/|Z| = %.3g (limit %.1g, %d modes); the network is ill-conditioned",
                        f, err / mag, CHECK_TOLERANCE, modes));
            }
        }
    }

    private static double sq(double x) {
        return x * x;
    }

    private static void swap(double[] a, int j) {
        double t = a[j];
        a[j] = a[j - 1];
        a[j - 1] = t;
    }

    private static double[] trim(double[] a, int m) {
        return a.length == m ? a : java.util.Arrays.copyOf(a, m);
    }
}
