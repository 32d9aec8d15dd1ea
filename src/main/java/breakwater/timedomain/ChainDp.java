package breakwater.timedomain;

/**
 * Exact solution of the chain linear program (docs/worst-case.md#the-dynamic-program):
 * <pre>
 *   maximise Σ_k w_k·u_k   subject to   0 ≤ u_k ≤ 1,   |u_{k+1} − u_k| ≤ c_k
 * </pre>
 * by dynamic programming over concave piecewise-linear value functions:
 * V_n(x) = w_n·x, V_k(x) = w_k·x + max{V_{k+1}(y) : |y − x| ≤ c_k, 0 ≤ y ≤ 1}.
 *
 * <p>Each V_k is stored as its value at x = 0 and its segments (length, slope) in order of decreasing
 * slope, in a gap buffer: the rising segments (slope &gt; 0) left of the gap, the falling ones right of
 * it, so the maximiser y* is the total length left of the gap. The window maximum trims c from the
 * outer end of the rising part (the rising part shifts left by c), inserts a flat segment of length
 * c + min(c, y*) at the gap and trims the surplus from the outer end of the falling part (it shifts
 * right by c, clipped at 1). Adding w_k·x adds w_k to every slope: a global offset, then segments whose
 * slope changed sign move across the gap. A window c_k &ge; 1 spans all of [0, 1]: then V_k is simply
 * w_k·x + max V_{k+1}, one segment. Cost: O(n) plus the moves, in practice a few per step.
 * The optimal u is recovered by a forward pass, u_{k+1} = clip(y*_{k+1}, u_k − c_k, u_k + c_k), which
 * is optimal because V_{k+1} is concave. Exact up to rounding (no discretisation of x).
 */
final class ChainDp {

    /** Reusable buffers (one per thread): the gap buffer grows with the chain, nothing else is allocated. */
    static final class Scratch {
        double[] len = new double[0];
        double[] sl = new double[0];

        void ensure(int capacity) {
            if (len.length < capacity) {
                int n = Math.max(capacity, 2 * len.length);
                len = new double[n];
                sl = new double[n];
            }
        }
    }

    private ChainDp() {
    }

    /**
     * Solves the chain LP.
     *
     * @param w weights, length n + 1
     * @param c step limits c_k &ge; 0 between u_k and u_{k+1}, length ≥ n
     * @param u out: an optimal u, length ≥ n + 1
     * @return the optimum Σ w_k u_k
     */
    static double solve(double[] w, double[] c, double[] u) {
        double[] clipped = new double[c.length];
        for (int k = 0; k < c.length; k++) {
            clipped[k] = Math.max(c[k], 0);
        }
        return solve(w, 1.0, clipped, w.length, u, new Scratch());
    }

    /**
     * Solves the chain LP for the weights sign·w[0 .. nodes − 1] (sign = ±1, applied exactly) and step
     * limits c[0 .. nodes − 2] &ge; 0, and writes an optimal u into {@code u}.
     */
    static double solve(double[] w, double sign, double[] c, int nodes, double[] u, Scratch s) {
        double[] ystar = new double[nodes];
        double best = run(w, sign, c, nodes, ystar, s);
        // forward pass
        u[0] = Math.min(1, Math.max(0, ystar[0]));
        for (int k = 0; k + 1 < nodes; k++) {
            double ck = Math.max(c[k], 0);
            double y = ystar[k + 1];
            double x = Math.min(Math.max(y, u[k] - ck), u[k] + ck);
            u[k + 1] = Math.min(1, Math.max(0, x));
        }
        return best;
    }

    /** The optimum alone (no pattern): the same value {@link #solve} returns, bit for bit. */
    static double maximum(double[] w, double sign, double[] c, int nodes, Scratch s) {
        return run(w, sign, c, nodes, null, s);
    }

    /** The backward dynamic program; {@code ystar} (may be null) receives the maximiser of every V_k. */
    private static double run(double[] w, double sign, double[] c, int nodes, double[] ystar, Scratch s) {
        int n = nodes - 1;
        int cap = n + 4;
        s.ensure(cap);
        double[] len = s.len;
        double[] sl = s.sl;
        double off = 0;
        // left stack [lo, g), right stack [g2, hi)
        int lo = 0;
        int g = 0;
        int g2 = cap;
        int hi = cap;
        double leftLen;
        double v0 = 0;
        double wn = sign * w[n];
        if (wn > 0) {
            len[g] = 1;
            sl[g] = wn;
            g++;
            leftLen = 1;
        } else {
            g2--;
            len[g2] = 1;
            sl[g2] = wn;
            leftLen = 0;
        }
        for (int k = n - 1; k >= 0; k--) {
            double ck = c[k];
            if (ystar != null) {
                ystar[k + 1] = leftLen;
            }
            double wk = sign * w[k];
            if (ck >= 1) {
                // the window spans [0, 1]: V_k(x) = w_k·x + max V_{k+1}
                for (int j = lo; j < g; j++) {
                    v0 += len[j] * (sl[j] + off);
                }
                off = 0;
                lo = 0;
                g2 = cap;
                hi = cap;
                if (wk > 0) {
                    len[0] = 1;
                    sl[0] = wk;
                    g = 1;
                    leftLen = 1;
                } else {
                    g = 0;
                    g2--;
                    len[g2] = 1;
                    sl[g2] = wk;
                    leftLen = 0;
                }
                continue;
            }
            // (a) window maximum: trim min(c, y*) from the left end of the rising part
            double m = ck < leftLen ? ck : leftLen;
            double need = m;
            while (need > 0 && lo < g) {
                double sv = sl[lo] + off;
                double l = len[lo];
                if (l <= need) {
                    v0 += l * sv;
                    need -= l;
                    lo++;
                } else {
                    v0 += need * sv;
                    len[lo] = l - need;
                    need = 0;
                }
            }
            if (lo == g) {
                lo = 0;
                g = 0;
                leftLen = 0;
            } else {
                leftLen -= m;
            }
            // flat segment at the gap
            double flat = ck + m;
            if (g2 < hi && sl[g2] + off == 0.0) {
                len[g2] += flat;
            } else {
                g2--;
                len[g2] = flat;
                sl[g2] = -off;
            }
            // trim the surplus ck from the right end of the falling part
            need = ck;
            while (need > 0 && g2 < hi) {
                int j = hi - 1;
                double l = len[j];
                if (l <= need) {
                    need -= l;
                    hi--;
                } else {
                    len[j] = l - need;
                    need = 0;
                }
            }
            if (g2 == hi) {
                g2 = cap;
                hi = cap;
            }
            // (b) add w_k·x
            off += wk;
            // (c) restore the sign split at the gap
            while (g > lo && sl[g - 1] + off <= 0) {
                g--;
                g2--;
                len[g2] = len[g];
                sl[g2] = sl[g];
                leftLen -= len[g];
            }
            while (g2 < hi && sl[g2] + off > 0) {
                len[g] = len[g2];
                sl[g] = sl[g2];
                leftLen += len[g];
                g++;
                g2++;
            }
            if (g == lo) {
                leftLen = 0;
            }
            if (leftLen > 1) {
                leftLen = 1;
            }
        }
        double best = v0;
        for (int j = lo; j < g; j++) {
            best += len[j] * (sl[j] + off);
        }
        if (ystar != null) {
            ystar[0] = leftLen;
        }
        return best;
    }
}
