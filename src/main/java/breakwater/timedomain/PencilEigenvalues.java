package breakwater.timedomain;

import breakwater.network.PowerNetwork;
import breakwater.network.SeriesBranch;

import java.util.List;

/**
 * The finite natural frequencies of the network with the load port open, as first guesses for the poles
 * of Z ({@link ZeroPolisher} polishes them): the finite eigenvalues of the circuit's descriptor pencil.
 *
 * <p>The circuit is written as a descriptor system E x' = A x + B u (states: inductor and branch
 * currents, capacitor voltages; node voltages and currents of inductance-free branches algebraic). Its
 * finite eigenvalues are found by a real shift-and-invert: M = (A − σE)⁻¹E, restricted to the dynamic
 * states, with σ &gt; 0 at the geometric mean of the network's natural rates ({@link #rateRange}); then
 * λ = σ + 1/μ. Every passive pole lies in Re λ &lt; 0, so |λ − σ| &gt; σ and the map is well
 * conditioned over the whole 1e3…1e11 rad/s range; infinite eigenvalues appear as μ ≈ 0. The eigenvalues
 * of M come from {@link RealEigenvalues} (balancing, Hessenberg reduction, shifted QR); A − σE is
 * factored here by LU with partial pivoting. Accuracy: backward stable, so the guesses are as good as the
 * conditioning of each eigenvalue allows; Newton's method on Y(s) then gives full double precision.
 */
final class PencilEigenvalues {

    /**
     * An eigenvalue more than this many times the top of the network's rate bracket ({@link #rateRange}) is
     * an infinite eigenvalue of the pencil (μ at rounding level, so 1/μ some ten decades above any natural
     * rate) and is dropped. The bracket's top is already an upper estimate of the fastest natural rate, so
     * a factor of 1e3 keeps every finite one with room to spare while staying many decades below the
     * infinite ones; a spurious guess that got through would only cost a failed Newton run.
     */
    private static final double INFINITE_EIGENVALUE_FACTOR = 1e3;

    /**
     * Rate (rad/s, about 160 MHz) used as the bracket when the element values define none (no inductance
     * and capacitance, resistance and inductance or resistance and capacitance to pair): then the network
     * has no modes, and the value only places the shift σ and the self-check's frequencies.
     */
    private static final double FALLBACK_RATE_RAD_PER_S = 1e9;

    private PencilEigenvalues() {
    }

    /**
     * Finite eigenvalues of the descriptor pencil (A, E) as first guesses: interleaved re/im pairs.
     */
    static double[] candidatePoles(PowerNetwork net) {
        List<SeriesBranch> board = net.boardNodeBranches();
        List<SeriesBranch> load = net.loadBranches();
        List<breakwater.network.RegionPath> regions = net.spreadRegions();
        boolean pkg = net.hasPackage();
        int iVb = 0;
        int idx = 1;
        int iVl = pkg ? idx++ : iVb;
        int iReg = idx++;
        int iPkg = pkg ? idx++ : -1;
        // per region: its node voltage and its path current (board node → region node)
        int[] iVr = new int[regions.size()];
        int[] iPath = new int[regions.size()];
        for (int r = 0; r < regions.size(); r++) {
            iVr[r] = idx++;
            iPath[r] = idx++;
        }
        List<SeriesBranch> all = new java.util.ArrayList<>(board);
        List<Integer> nodeOf = new java.util.ArrayList<>(java.util.Collections.nCopies(board.size(), iVb));
        for (SeriesBranch b : load) {
            all.add(b);
            nodeOf.add(iVl);
        }
        for (int r = 0; r < regions.size(); r++) {
            for (SeriesBranch b : regions.get(r).branches()) {
                all.add(b);
                nodeOf.add(iVr[r]);
            }
        }
        int nb = all.size();
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
        // region paths: L_r i' = Vb − Vr − R_r i, the current leaving the board node and entering the region's
        for (int r = 0; r < regions.size(); r++) {
            int p = iPath[r];
            e[p] = regions.get(r).inductanceH();
            a[p][iVb] = 1;
            a[p][iVr[r]] = -1;
            a[p][p] = -regions.get(r).resistanceOhms();
            a[iVb][p] = -1;
            a[iVr[r]][p] = 1;
        }
        for (int k = 0; k < nb; k++) {
            SeriesBranch b = all.get(k);
            int node = nodeOf.get(k);
            a[node][iI[k]] = -1;
            e[iI[k]] = b.inductanceH();
            a[iI[k]][node] = 1;
            a[iI[k]][iI[k]] = -b.resistanceOhms();
            a[iI[k]][iV[k]] = -1;
            e[iV[k]] = b.capacitanceF();
            a[iV[k]][iI[k]] = 1;
        }
        RateRange rates = rateRange(net);
        double sigma = Math.sqrt(rates.lowRadPerS() * rates.highRadPerS());
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
        double maxRate = INFINITE_EIGENVALUE_FACTOR * rates.highRadPerS();
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
            if (lr * lr + li * li > maxRate * maxRate) {
                continue; // an infinite eigenvalue of the pencil
            }
            out[2 * c] = lr;
            out[2 * c + 1] = li;
            c++;
        }
        return java.util.Arrays.copyOf(out, 2 * c);
    }

    /**
     * A bracket of the natural rates of a network, rad/s.
     *
     * @param lowRadPerS  lower end, &gt; 0
     * @param highRadPerS upper end, &ge; {@code lowRadPerS}
     */
    record RateRange(double lowRadPerS, double highRadPerS) {
    }

    /**
     * Bracket [lo, hi] (rad/s) of the natural rates of the network from its element values:
     * 1/√(LC) over all pairs, R/L and 1/(RC). Used for the shift σ and to recognise infinite eigenvalues.
     */
    static RateRange rateRange(PowerNetwork net) {
        double lMin = Double.POSITIVE_INFINITY;
        double lMax = 0;
        double cMin = Double.POSITIVE_INFINITY;
        double cSum = 0;
        double rMin = Double.POSITIVE_INFINITY;
        double rMax = 0;
        List<breakwater.network.RegionPath> regions = net.spreadRegions();
        double[] ls = new double[2 + regions.size()];
        double[] rs = new double[2 + regions.size()];
        ls[0] = net.regulatorInductanceH();
        ls[1] = net.packageInductanceH();
        rs[0] = net.regulatorResistanceOhms();
        rs[1] = net.packageResistanceOhms();
        List<List<SeriesBranch>> lists = new java.util.ArrayList<>(List.of(net.boardNodeBranches(), net.loadBranches()));
        for (int r = 0; r < regions.size(); r++) {
            ls[2 + r] = regions.get(r).inductanceH();
            rs[2 + r] = regions.get(r).resistanceOhms();
            lists.add(regions.get(r).branches());
        }
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
        for (List<SeriesBranch> list : lists) {
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
            hi = FALLBACK_RATE_RAD_PER_S;
        }
        if (!(lo > 0) || !Double.isFinite(lo) || lo > hi) {
            lo = hi;
        }
        return new RateRange(lo, hi);
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
}
