package breakwater.timedomain;

/**
 * Objective weights of the slew-limited worst case: with u piecewise linear on lags τ_0 = 0 &lt; τ_1 &lt; …
 * (hat functions φ_k), (h ∗ u)(T) = Σ_k w_k u_k with hat weights w_k = ∫ h(τ) φ_k(τ) dτ
 * (docs/worst-case.md#the-chain-lp), the last node also collecting ∫_{τ_n}^∞ h (u holds beyond the grid), plus D₀
 * on u₀ and, for a load node with series inductance L∞, L∞/(τ₁ − τ₀) on u₀ and minus that on u₁.
 *
 * <p>Closed form per mode and segment [a, a + Δ] ({@link Waveform#hatIntegrals}):
 * ∫ e^{pτ}(a + Δ − τ)/Δ dτ = e^{pa}Δ·f_L(pΔ) to node a and ∫ e^{pτ}(τ − a)/Δ dτ = e^{pa}Δ·f_R(pΔ) to
 * node a + Δ, with f_R(z) = (z e^z − e^z + 1)/z² and f_L(z) = (e^z − 1 − z)/z² (power series for
 * |z| &lt; 0.5); the tail is ∫_{τ_n}^∞ e^{pτ} dτ = −e^{pτ_n}/p. Two routes to the same closed forms:
 * lag by lag on any lags ({@link #onLags}, the reference) and block by block on a {@link LagGrid}
 * ({@link #onGrid}, the fast path of the solver), equal up to rounding (measured below 4e-13 of Σ|w|).
 *
 * <p>An instance holds the per-mode tables of {@link #onGrid}; one instance is reused by one thread.
 */
final class HatWeights {

    /**
     * Nodes per block of the weight computation: powers e^{pmΔ}, m &le; BLOCK, are tabulated per run. A
     * speed setting, not an accuracy one: larger blocks amortise more of the per-block work but the tables
     * (4·BLOCK doubles per mode) leave the cache sooner; the rounding of the tabulated powers stays within
     * the measured 4e-13 of Σ|w| ({@code HatWeightsTest.blockWeightsEqualTheLagByLagSum}).
     */
    private static final int BLOCK = 128;

    /**
     * A mode is dropped once its amplitude times its whole remaining integral 1/|Re p| is below this
     * fraction of Σ|w r|/|Re p|: what it would still add is two decades below the rounding of the weights,
     * so dropping it saves the work without changing a figure beyond rounding. Both routes drop at the
     * same level.
     */
    private static final double NEGLIGIBLE_AMPLITUDE = 1e-18;

    /**
     * A pattern with a single lag (a constant load) is evaluated on the lags {0, this}: the two hat
     * weights sum to ∫₀^∞ h whatever the split, so any positive value gives the same result to rounding.
     */
    private static final double CONSTANT_PATTERN_SPLIT_S = 1e-9;

    private final double[] tmp = new double[BLOCK];
    private final double[] f = new double[4];
    // per active mode: amplitude, block amplitude, e^{pΔ}, F_R, negligible level, model index, tables
    private double[] ar = new double[0];
    private double[] ai = new double[0];
    private double[] cr = new double[0];
    private double[] ci = new double[0];
    private double[] er = new double[0];
    private double[] ei = new double[0];
    private double[] frr = new double[0];
    private double[] fri = new double[0];
    private double[] neg = new double[0];
    private int[] idx = new int[0];
    private double[][] qr = new double[0][];
    private double[][] qi = new double[0][];
    private double[][] gr = new double[0][];
    private double[][] gi = new double[0][];

    private void ensureModes(int m) {
        if (ar.length < m) {
            ar = new double[m];
            ai = new double[m];
            cr = new double[m];
            ci = new double[m];
            er = new double[m];
            ei = new double[m];
            frr = new double[m];
            fri = new double[m];
            neg = new double[m];
            idx = new int[m];
            qr = new double[m][BLOCK + 1];
            qi = new double[m][BLOCK + 1];
            gr = new double[m][BLOCK];
            gi = new double[m][BLOCK];
        }
    }

    /** Moves active mode slot {@code from} into slot {@code to} (tables by reference). */
    private void move(int from, int to) {
        ar[to] = ar[from];
        ai[to] = ai[from];
        cr[to] = cr[from];
        ci[to] = ci[from];
        er[to] = er[from];
        ei[to] = ei[from];
        frr[to] = frr[from];
        fri[to] = fri[from];
        neg[to] = neg[from];
        idx[to] = idx[from];
        double[] t = qr[to];
        qr[to] = qr[from];
        qr[from] = t;
        t = qi[to];
        qi[to] = qi[from];
        qi[from] = t;
        t = gr[to];
        gr[to] = gr[from];
        gr[from] = t;
        t = gi[to];
        gi[to] = gi[from];
        gi[from] = t;
    }

    /**
     * {@link #onLags} on a grid of runs, into {@code w[0 .. nodes − 1]}. Within a run of q
     * steps Δ from node j₀ the hat weights of one mode (amplitude a = w r e^{pτ_{j₀}}) are
     * Re(a·F_L) to node j₀, Re(a·e^{pmΔ}·G) with G = e^{pΔ}F_L + F_R to the inner node j₀ + 1 + m, and
     * Re(a·e^{p(q−1)Δ}·F_R) to node j₀ + q (F_L = Δ f_L(pΔ), F_R = Δ f_R(pΔ), {@link Waveform#hatIntegrals}).
     * The powers e^{pmΔ}, m ≤ {@value #BLOCK}, are tabulated per mode and run by repeated squaring; the
     * inner nodes are filled block by block, every mode adding its tabulated G·e^{pmΔ} times its block
     * amplitude (an element-wise loop), which then advances by e^{p·BLOCK·Δ}. The same closed forms as
     * the lag-by-lag sum, up to rounding (measured below 4e-13 of Σ|w|). A mode is dropped once its
     * amplitude is below {@value #NEGLIGIBLE_AMPLITUDE} of Σ|w r|/|Re p| times |Re p| (its whole remaining
     * integral).
     */
    void onGrid(PoleResidueModel m, LagGrid grid, double[] w) {
        int n = grid.nodes;
        java.util.Arrays.fill(w, 0, n, 0.0);
        int nm = m.modes;
        ensureModes(nm);
        double[] f = this.f;
        double[] tmp = this.tmp;
        double[] ar = this.ar;
        double[] ai = this.ai;
        double[] cr = this.cr;
        double[] ci = this.ci;
        double[] er = this.er;
        double[] ei = this.ei;
        double[] frr = this.frr;
        double[] fri = this.fri;
        double[] neg = this.neg;
        int[] idx = this.idx;
        double total = 0;
        for (int k = 0; k < nm; k++) {
            total += m.weight[k] * Math.hypot(m.rr[k], m.ri[k]) / -m.pr[k];
        }
        for (int k = 0; k < nm; k++) {
            ar[k] = m.weight[k] * m.rr[k];
            ai[k] = m.weight[k] * m.ri[k];
            neg[k] = NEGLIGIBLE_AMPLITUDE * total * -m.pr[k];
            idx[k] = k;
        }
        int na = nm;
        int j0 = 0;
        for (int r = 0; r < grid.runs && na > 0; r++) {
            double dt = grid.runStep[r];
            int q = grid.runCount[r];
            int b = Math.min(BLOCK, q - 1);
            double first = 0;
            for (int a = 0; a < na; a++) {
                int k = idx[a];
                double zr = m.pr[k] * dt;
                double zi = m.pi[k] * dt;
                double e = Math.exp(zr);
                double xr = e * Math.cos(zi);
                double xi = e * Math.sin(zi);
                Waveform.hatIntegrals(zr, zi, xr, xi, f);
                double flr = f[2] * dt;
                double fli = f[3] * dt;
                er[a] = xr;
                ei[a] = xi;
                frr[a] = f[0] * dt;
                fri[a] = f[1] * dt;
                // node j0: the left half-hat of the run's first segment
                first += ar[a] * flr - ai[a] * fli;
                // powers e^{pmΔ}, m = 0 … b, by doubling; G·e^{pmΔ}, m < b
                double[] pr = this.qr[a];
                double[] pi = this.qi[a];
                pr[0] = 1;
                pi[0] = 0;
                int have = 1;
                double pwr = xr;
                double pwi = xi;
                while (have <= b) {
                    int add = Math.min(have, b + 1 - have);
                    for (int i = 0; i < add; i++) {
                        pr[have + i] = pr[i] * pwr - pi[i] * pwi;
                        pi[have + i] = pr[i] * pwi + pi[i] * pwr;
                    }
                    have += add;
                    double t = pwr * pwr - pwi * pwi;
                    pwi = 2 * pwr * pwi;
                    pwr = t;
                }
                double glr = xr * flr - xi * fli + frr[a];
                double gli = xr * fli + xi * flr + fri[a];
                double[] g1 = this.gr[a];
                double[] g2 = this.gi[a];
                for (int i = 0; i < b; i++) {
                    g1[i] = glr * pr[i] - gli * pi[i];
                    g2[i] = glr * pi[i] + gli * pr[i];
                }
                cr[a] = ar[a];
                ci[a] = ai[a];
            }
            w[j0] += first;
            // inner nodes j0 + 1 + i, i = 0 … q − 2, in blocks of at most b
            int inner = q - 1;
            for (int i0 = 0; i0 < inner; ) {
                int len = Math.min(b, inner - i0);
                java.util.Arrays.fill(tmp, 0, len, 0.0);
                for (int a = 0; a < na; a++) {
                    double xr = cr[a];
                    double xi = ci[a];
                    double[] g1 = this.gr[a];
                    double[] g2 = this.gi[a];
                    for (int i = 0; i < len; i++) {
                        tmp[i] += xr * g1[i] - xi * g2[i];
                    }
                    double pr = this.qr[a][len];
                    double pi = this.qi[a][len];
                    cr[a] = xr * pr - xi * pi;
                    ci[a] = xr * pi + xi * pr;
                }
                System.arraycopy(tmp, 0, w, j0 + 1 + i0, len);
                i0 += len;
                na = dropNegligible(na, cr, ci);
            }
            // cr, ci: amplitude at node j0 + q − 1; its right half-hat goes to node j0 + q
            double last = 0;
            for (int a = 0; a < na; a++) {
                double lr = cr[a];
                double li = ci[a];
                last += lr * frr[a] - li * fri[a];
                ar[a] = lr * er[a] - li * ei[a];
                ai[a] = lr * ei[a] + li * er[a];
            }
            w[j0 + q] += last;
            j0 += q;
            na = dropNegligible(na, ar, ai);
        }
        for (int a = 0; a < na; a++) {
            // ∫_{τ_n}^∞ e^{pτ} dτ = −e^{pτ_n}/p
            int k = idx[a];
            double pr = m.pr[k];
            double pi = m.pi[k];
            w[n - 1] += -(ar[a] * pr + ai[a] * pi) / (pr * pr + pi * pi);
        }
        w[0] += m.constantTermOhms();
        if (m.seriesInductanceH() > 0) {
            double g = m.seriesInductanceH() / grid.runStep[0];
            w[0] += g;
            w[1] -= g;
        }
    }

    /** Drops the active modes whose amplitude (xr, xi) is negligible; returns the new count. */
    private int dropNegligible(int na, double[] xr, double[] xi) {
        for (int a = na - 1; a >= 0; a--) {
            if (Math.abs(xr[a]) + Math.abs(xi[a]) < this.neg[a]) {
                na--;
                if (a != na) {
                    move(na, a);
                }
            }
        }
        return na;
    }

    /**
     * Objective weights on a lag grid: hat weights w_k = ∫ h(τ) φ_k(τ) dτ (smooth part), the last node
     * also collecting ∫_{τ_n}^∞ h (u holds beyond the grid), plus D₀ on u₀ and L∞/(τ₁ − τ₀) on u₀, −that
     * on u₁. Per mode and segment [a, a + Δ]: ∫ e^{pτ}(a + Δ − τ)/Δ dτ = e^{pa}Δ·f_L(pΔ) to node a,
     * ∫ e^{pτ}(τ − a)/Δ dτ = e^{pa}Δ·f_R(pΔ) to node a + Δ ({@link Waveform#hatIntegrals}).
     */
    static double[] onLags(PoleResidueModel m, double[] lags) {
        double[] w = smoothOnLags(m, lags);
        w[0] += m.constantTermOhms();
        if (m.seriesInductanceH() > 0) {
            double g = m.seriesInductanceH() / (lags[1] - lags[0]);
            w[0] += g;
            w[1] -= g;
        }
        return w;
    }

    /** The smooth part of {@link #onLags}: hat weights of h only. */
    static double[] smoothOnLags(PoleResidueModel m, double[] lags) {
        int n = lags.length;
        double[] w = new double[n];
        double[] f = new double[4];
        double total = 0;
        for (int k = 0; k < m.modes; k++) {
            total += m.weight[k] * Math.hypot(m.rr[k], m.ri[k]) / -m.pr[k];
        }
        for (int k = 0; k < m.modes; k++) {
            double pr = m.pr[k];
            double pi = m.pi[k];
            double ar = m.weight[k] * m.rr[k];
            double ai = m.weight[k] * m.ri[k];
            double prevDt = Double.NaN;
            double er = 0;
            double ei = 0;
            double lr = 0;
            double li = 0;
            double rr = 0;
            double ri = 0;
            double negligible = NEGLIGIBLE_AMPLITUDE * total * -pr;
            int j = 0;
            for (; j < n - 1; j++) {
                double dt = lags[j + 1] - lags[j];
                if (dt != prevDt) {
                    prevDt = dt;
                    double zr = pr * dt;
                    double zi = pi * dt;
                    double e = Math.exp(zr);
                    er = e * Math.cos(zi);
                    ei = e * Math.sin(zi);
                    Waveform.hatIntegrals(zr, zi, er, ei, f);
                    rr = f[0] * dt;
                    ri = f[1] * dt;
                    lr = f[2] * dt;
                    li = f[3] * dt;
                }
                w[j] += ar * lr - ai * li;
                w[j + 1] += ar * rr - ai * ri;
                double nr = ar * er - ai * ei;
                ai = ar * ei + ai * er;
                ar = nr;
                if (Math.abs(ar) + Math.abs(ai) < negligible) {
                    ar = 0;
                    ai = 0;
                    break;
                }
            }
            if (j == n - 1) {
                // ∫_{τ_n}^∞ e^{pτ} dτ = −e^{pτ_n}/p
                double p2 = pr * pr + pi * pi;
                w[n - 1] += -(ar * pr + ai * pi) / p2;
            }
        }
        return w;
    }

    /**
     * (h ∗ u)(T) + D₀·u(0) + L∞·u'(T) for a piecewise-linear pattern, exactly (hat weights on the
     * pattern's own lags; a jump is a segment of zero length). The pattern holds its last value beyond
     * its last lag, for ever back.
     */
    static double response(PoleResidueModel model, LoadPattern pattern) {
        double[] lags = pattern.lagsS();
        if (lags.length < 2) {
            double[] two = {0, CONSTANT_PATTERN_SPLIT_S};
            double[] w = smoothOnLags(model, two);
            return (w[0] + w[1]) * pattern.value(0) + model.constantTermOhms() * pattern.value(0);
        }
        if (model.seriesInductanceH() > 0 && !(lags[1] > lags[0])) {
            throw new IllegalArgumentException("a jump at the worst instant into series inductance is unbounded");
        }
        double[] w = onLags(model, lags);
        double sum = 0;
        for (int k = 0; k < lags.length; k++) {
            sum += w[k] * pattern.value(k);
        }
        return sum;
    }
}
